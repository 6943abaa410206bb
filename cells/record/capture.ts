// The page exactly as loaded, before the app changes it: the shell that exporting
// again packs the record into, and the tree the record's seal is checked against.
// Imported first by entry.ts, so it runs before the app (the loader has only added
// the script that runs it, as the body's last element).
// At start only clones are kept (cheap: text is shared, not copied); the shell is
// written out as HTML the first time an export asks, so opening a record pays nothing
// for it. The static rendering is left out of the shell (export writes a fresh one)
// and kept as it is for the seal (the app never changes it in place).

import type { ParsedHtml, TreeReader } from '../../runtime/record/index';
import { RUN_ID } from '../../runtime/record/app-payload';
import { domReader } from './dom-reader';

const htmlClone = document.documentElement.cloneNode(false) as Element;
const headClone = document.head.cloneNode(true) as Element;
const bodyClone = document.body.cloneNode(false) as Element;
const staticAsLoaded = document.getElementById('lt-static');
/** The body's children for the seal: as loaded, the real static rendering, without the loader's run script. */
const bodyAsLoaded: Node[] = [];
for (const node of Array.from(document.body.childNodes)) {
  if (node instanceof Element && node.id === 'lt-static') {
    bodyClone.append(Object.assign(document.createElement('div'), { id: 'lt-static' }));
    bodyAsLoaded.push(node);
  } else {
    const copy = node.cloneNode(true);
    bodyClone.append(copy);
    bodyAsLoaded.push(copy);
  }
}
const run = bodyAsLoaded.at(-1);
if (run instanceof Element && run.id === RUN_ID) bodyAsLoaded.pop();
/** Around the html element (a doctype, comments) and inside it (head, body, text between). */
const documentAsLoaded: Node[] = Array.from(document.childNodes, (n) => (n === document.documentElement ? htmlClone : n.cloneNode(true)));
const htmlAsLoaded: Node[] = Array.from(document.documentElement.childNodes, (n) =>
  n === document.head ? headClone : n === document.body ? bodyClone : n.cloneNode(true));

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

const loadedReader: TreeReader<Node> = {
  ...domReader,
  children: (n) => (n === document ? documentAsLoaded : n === htmlClone ? htmlAsLoaded : n === bodyClone ? bodyAsLoaded : domReader.children(n)),
};

/** The page's tree as the browser parsed it from the file, for checking against the record's seal. */
export function loadedTree(): ParsedHtml {
  return { reader: loadedReader as TreeReader<unknown>, root: document };
}

/** Whether the page carried a static rendering (a record page) when loaded. */
export const hadStatic = staticAsLoaded !== null;
