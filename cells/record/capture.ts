// The page exactly as loaded, before the app changes it: the shell that exporting
// again packs the record into. Imported first by entry.ts, so it runs before the app.
// At start only a clone is kept (cheap: text is shared, not copied); it is written out
// as HTML the first time an export asks, so opening a record pays nothing for it.
// The static rendering is left out (export writes a fresh one).

const htmlClone = document.documentElement.cloneNode(false) as Element;
const headClone = document.head.cloneNode(true) as Element;
const bodyClone = document.body.cloneNode(false) as Element;
for (const node of Array.from(document.body.childNodes)) {
  bodyClone.append(node instanceof Element && node.id === 'lt-static' ? Object.assign(document.createElement('div'), { id: 'lt-static' }) : node.cloneNode(true));
}

let written: string | undefined;

function pageAsLoaded(): string {
  const [htmlOpen] = htmlClone.outerHTML.split('</html>');
  const [bodyOpen] = (bodyClone.cloneNode(false) as Element).outerHTML.split('</body>');
  let body = '';
  for (const node of Array.from(bodyClone.childNodes)) {
    if (node instanceof Element) body += node.outerHTML;
    else if (node.nodeType === Node.COMMENT_NODE) body += `<!--${(node as Comment).data}-->`;
    else body += (node.textContent ?? '').replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
  }
  return `<!doctype html>\n${htmlOpen}${headClone.outerHTML}${bodyOpen}${body}</body></html>`;
}

/** The loaded page as HTML (written on first use). */
export function loadedPage(): string {
  written ??= pageAsLoaded();
  return written;
}
