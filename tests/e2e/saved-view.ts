import type { Page } from 'playwright-core';

/** The scroll position the app saved for the open sheet, read from its IndexedDB store; waits
 *  (up to 10 s) until it is near `want`, since the app saves 200 ms after scrolling stops. */
export function savedView(page: Page, want: number): Promise<number | undefined> {
  return page.evaluate(async (want) => {
      const key = decodeURIComponent(location.hash.replace(/^#sheet=/, ''));
      const read = () => new Promise<{ scrollY: number } | undefined>((ok, no) => {
        const open = indexedDB.open('loadtrace');
        open.onerror = () => no(open.error);
        open.onsuccess = () => {
          const r = open.result.transaction('views').objectStore('views').get(key);
          r.onsuccess = () => { open.result.close(); ok(r.result); };
          r.onerror = () => no(r.error);
        };
      });
      for (let t = 0; t < 100; t++) {
        const view = await read();
        if (view !== undefined && Math.abs(view.scrollY - want) < 5) return view.scrollY;
        await new Promise((r) => setTimeout(r, 100));
      }
      return (await read())?.scrollY;
  }, want);
}
