// The app shell to pack a record into. A record (or the single-file build) carries
// its own: the page as loaded, less the script the loader added. Any other page (the
// dev server, the multi-file build) reads the built shell from dist-record/.

import { appBlock, withoutRunScript } from '../../runtime/record/app-payload';
import { loadedPage } from './capture';

/** Where `npm run build:record` writes the shell (a .txt copy, which servers hand over untouched), from the site root. */
export const SHELL_PATH = '/dist-record/record-shell.txt';

let fetched: Promise<string> | undefined;

/** Does this page carry the packed app (is it a record or the single-file shell)? */
export function pageIsShell(): boolean {
  return appBlock(loadedPage()) !== undefined;
}

export function recordShell(): Promise<string> {
  if (pageIsShell()) return Promise.resolve(withoutRunScript(loadedPage()));
  fetched ??= fetch(new URL(SHELL_PATH, location.href))
    .then(async (r) => {
      if (!r.ok) throw new Error(`status ${r.status}`);
      const html = await r.text();
      if (appBlock(html) === undefined) throw new Error('it holds no packed app');
      return html;
    })
    .catch((e: unknown) => {
      fetched = undefined;
      throw new Error(`the record shell could not be read from ${SHELL_PATH} (${(e as Error).message}); build it with "npm run build:record", or export from an opened record`);
    });
  return fetched;
}
