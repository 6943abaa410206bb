// The page exactly as loaded, before the app changes it: the shell that exporting
// again packs the record into. Imported first by entry.ts, so it runs before the app.
// The static rendering is left out (export writes a fresh one): serialising its
// MathML would cost the opening of every record time for nothing.

function pageAsLoaded(): string {
  const [htmlOpen] = (document.documentElement.cloneNode(false) as Element).outerHTML.split('</html>');
  const bodyEl = document.body;
  const [bodyOpen] = (bodyEl.cloneNode(false) as Element).outerHTML.split('</body>');
  let body = '';
  for (const node of Array.from(bodyEl.childNodes)) {
    if (node instanceof Element) body += node.id === 'lt-static' ? '<div id="lt-static"></div>' : node.outerHTML;
    else if (node.nodeType === Node.COMMENT_NODE) body += `<!--${(node as Comment).data}-->`;
    else body += (node.textContent ?? '').replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
  }
  return `<!doctype html>\n${htmlOpen}${document.head.outerHTML}${bodyOpen}${body}</body></html>`;
}

export const loadedPage: string = pageAsLoaded();
