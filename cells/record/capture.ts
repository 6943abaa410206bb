// The page exactly as loaded, before the app changes it: the shell that exporting
// again packs the record into. Imported first by entry.ts, so it runs before the app.

export const loadedPage: string = `<!doctype html>\n${document.documentElement.outerHTML}`;
