// The parts of a record that its seal lists, read from a parsed page: every node of
// the file belongs to exactly one part (what is not in a part of its own is "page"),
// so a change to anything a reader sees or that runs changes one part's digest. Also
// what must never be in a record at all: anything before the Content-Security-Policy,
// a second policy, a refresh (it navigates away, which no policy stops) or a base
// element (it sends the page's links elsewhere).

import { APP_CSS_ID, APP_ID, EDITOR_ID, KATEX_ID, PART_OF } from './app-payload';
import { COMMENT, DOCTYPE, ELEMENT, TEXT, attr, elements, marker, textOf, writeElement, writeNodes, type TreeReader } from './canon';
import { DOC_ID, STATIC_ID } from './layout';

/** The parts in file order, with the words a person reads when one differs. */
export const PARTS = [
  ['csp', 'the Content-Security-Policy'],
  ['document', 'the embedded document'],
  ['static-style', 'the static rendering\'s styles'],
  ['static', 'the static rendering (what a reader sees without the app)'],
  ['page', 'the page around the record (its head, toolbar and app markup)'],
  ['app-css', 'the app\'s styles'],
  ['app', 'the packed app code'],
  ['editor', 'the packed source editor'],
  ['katex', 'the packed KaTeX (equation typesetting)'],
  ['loader', 'the loader script'],
] as const;

export type PartName = (typeof PARTS)[number][0];
export const PART_NAMES: readonly PartName[] = PARTS.map(([n]) => n);
export const partLabel = (p: PartName): string => PARTS.find(([n]) => n === p)![1];

export const SEAL_ID = 'lt-seal';
export const SEAL_TYPE = 'application/x-loadtrace-seal';
export const LOADER_ID = 'lt-loader';
export const STATIC_STYLE_ID = 'lt-static-style';
/** The element of the static rendering that shows the record's digest (its text is checked apart). */
export const DIGEST_ID = 'lt-record-digest';

const BLOCKS: Record<string, PartName> = { [APP_ID]: 'app', [EDITOR_ID]: 'editor', [KATEX_ID]: 'katex' };
const SINGLE: Record<string, [string, PartName | 'seal']> = {
  [DOC_ID]: ['script', 'document'],
  [SEAL_ID]: ['script', 'seal'],
  [STATIC_STYLE_ID]: ['style', 'static-style'],
  [STATIC_ID]: ['div', 'static'],
  [APP_CSS_ID]: ['template', 'app-css'],
  [LOADER_ID]: ['script', 'loader'],
};

export interface PageParts {
  /** Canonical text of each part (canon.ts). */
  texts: Map<PartName, string>;
  /** The seal element's text, exactly; undefined when the page has none. */
  sealText?: string;
  /** The digest the static rendering shows; undefined when it shows none. */
  shownDigest?: string;
  /** The embedded document as found: its raw text and the digest written beside it. */
  doc?: { raw: string; sha256?: string };
  /** Plain sentences: what a record must never hold. */
  tampering: string[];
}

const isCsp = <N>(r: TreeReader<N>, el: N): boolean =>
  r.name(el) === 'meta' && (attr(r, el, 'http-equiv') ?? '').trim().toLowerCase() === 'content-security-policy';

function describe<N>(r: TreeReader<N>, n: N): string {
  const t = r.type(n);
  if (t === ELEMENT) return `a <${r.name(n)}> element`;
  if (t === COMMENT) return 'a comment';
  if (t === TEXT) return `text ("${r.data(n).trim().slice(0, 40)}")`;
  return 'a node';
}

const capital = (s: string): string => s.charAt(0).toUpperCase() + s.slice(1);

/** The policy element, when it is the head's first node; else what stands before it. */
function policyAtTop<N>(r: TreeReader<N>, root: N, tampering: string[]): N | undefined {
  const top = r.children(root).filter((n) => r.type(n) !== DOCTYPE);
  const html = top.find((n) => r.type(n) === ELEMENT && r.name(n) === 'html');
  for (const n of top) if (n !== html) tampering.push(`${capital(describe(r, n))} stands outside the page's <html> element, before or after it.`);
  const head = html && elements(r, html).find((n) => r.name(n) === 'head');
  const first = head ? r.children(head)[0] : undefined;
  if (first !== undefined && r.type(first) === ELEMENT && isCsp(r, first)) return first;
  const policy = head && r.children(head).find((n) => r.type(n) === ELEMENT && isCsp(r, n));
  if (!policy) tampering.push('The page has no Content-Security-Policy at the top of its head: nothing stops its code from being changed or requests from being made.');
  else tampering.push(`${capital(describe(r, r.children(head!)[0]))} was placed before the Content-Security-Policy, where the policy does not reach it.`);
  return undefined;
}

/** Reads every part of a parsed page (`root`: the document node). */
export function readParts<N>(r: TreeReader<N>, root: N): PageParts {
  const tampering: string[] = [];
  const csp = policyAtTop(r, root, tampering);
  const bufs = new Map<PartName, string[]>(PART_NAMES.map((p) => [p, []]));
  const taken = new Set<string>();
  const out: PageParts = { texts: new Map(), tampering };
  let inStatic = false;
  const warn = (s: string) => {
    if (!tampering.includes(s)) tampering.push(s);
  };

  const visit = (el: N, into: string[]): boolean => {
    const name = r.name(el);
    const equiv = (attr(r, el, 'http-equiv') ?? '').trim().toLowerCase();
    if (name === 'meta' && equiv === 'refresh') warn('The page holds a refresh element: it would send the reader to another page, which no policy stops.');
    if (name === 'base') warn('The page holds a base element: it would send the page\'s links elsewhere.');
    if (el !== csp && isCsp(r, el)) warn('The page holds a second Content-Security-Policy.');
    const id = attr(r, el, 'id');
    if (inStatic && name === 'code' && id === DIGEST_ID && out.shownDigest === undefined) {
      out.shownDigest = textOf(r, el);
      into.push(marker('digest'));
      return true;
    }
    let part: PartName | 'seal' | undefined;
    if (el === csp) part = 'csp';
    else if (name === 'script' && (BLOCKS[id ?? ''] ?? BLOCKS[attr(r, el, PART_OF) ?? ''])) part = BLOCKS[id ?? ''] ?? BLOCKS[attr(r, el, PART_OF)!];
    else if (id !== undefined && SINGLE[id]?.[0] === name && !taken.has(id)) {
      taken.add(id);
      part = SINGLE[id][1];
    }
    if (part === undefined) return false;
    into.push(marker(part));
    if (part === 'seal') {
      out.sealText = textOf(r, el);
      return true;
    }
    if (part === 'document') out.doc = { raw: textOf(r, el), sha256: attr(r, el, 'data-sha256') };
    if (part === 'static') inStatic = true;
    writeElement(r, el, bufs.get(part)!, visit);
    if (part === 'static') inStatic = false;
    return true;
  };

  writeNodes(r, r.children(root), bufs.get('page')!, visit);
  for (const [p, list] of bufs) out.texts.set(p, list.join(''));
  return out;
}
