// A parsed HTML page written out as one unambiguous text, so that the same tree gives
// the same digest whoever parsed it: parse5 in Node (the CLI), the browser's parser in
// the page (the live app) and DOMParser (exporting in the app). Every string is written
// with its length before it, so two different trees never give the same text; adjacent
// text nodes are joined first (a browser may split long text, parse5 does not).

/** Node types as the DOM numbers them. */
export const ELEMENT = 1;
export const TEXT = 3;
export const COMMENT = 8;
export const DOCUMENT = 9;
export const DOCTYPE = 10;

/** How to read a parsed tree, whichever parser made it. */
export interface TreeReader<N> {
  type(n: N): number;
  /** An element's local name (as the parser adjusted its case), a doctype's name. */
  name(n: N): string;
  /** An element's namespace URI. */
  ns(n: N): string;
  /** Attributes in source order, with prefixed names as "xlink:href". */
  attrs(n: N): [string, string][];
  /** Child nodes; for a template element, those of its content. */
  children(n: N): readonly N[];
  /** Text or comment data; for a doctype, its public and system ids joined by a newline. */
  data(n: N): string;
}

const NS: Record<string, string> = {
  'http://www.w3.org/1999/xhtml': 'h',
  'http://www.w3.org/2000/svg': 's',
  'http://www.w3.org/1998/Math/MathML': 'm',
};

/** Length-prefixed: `5:hello`. */
const str = (s: string): string => `${s.length}:${s}`;

/** A part of the page that is written elsewhere: its place is marked by name. */
export const marker = (part: string): string => `P${str(part)}`;

/**
 * Writes nodes out as canonical text into `out`. `visit` may take an element instead
 * (return true: it was handled, e.g. written as a marker and kept for a part of its own).
 */
export function writeNodes<N>(r: TreeReader<N>, nodes: readonly N[], out: string[], visit?: (el: N, out: string[]) => boolean): void {
  let text: string | undefined;
  const flush = () => {
    if (text !== undefined) out.push(`T${str(text)}`);
    text = undefined;
  };
  for (const n of nodes) {
    const t = r.type(n);
    if (t === TEXT) {
      text = (text ?? '') + r.data(n);
      continue;
    }
    flush();
    if (t === ELEMENT) {
      if (visit?.(n, out)) continue;
      writeElement(r, n, out, visit);
    } else if (t === COMMENT) out.push(`C${str(r.data(n))}`);
    else if (t === DOCTYPE) out.push(`D${str(r.name(n))}${str(r.data(n))}`);
    else out.push(`X${t}`);
  }
  flush();
}

/** One element and everything in it. */
export function writeElement<N>(r: TreeReader<N>, el: N, out: string[], visit?: (el: N, out: string[]) => boolean): void {
  const attrs = r.attrs(el);
  let head = `E${NS[r.ns(el)] ?? str(r.ns(el))}${str(r.name(el))}${attrs.length}`;
  for (const [k, v] of attrs) head += str(k) + str(v);
  out.push(head, '{');
  writeNodes(r, r.children(el), out, visit);
  out.push('}');
}

/** The element's attribute `name` (first, as the parser keeps it), if it has one. */
export function attr<N>(r: TreeReader<N>, el: N, name: string): string | undefined {
  for (const [k, v] of r.attrs(el)) if (k === name) return v;
  return undefined;
}

/** Joined text of an element's text children (the content of a script or style element). */
export function textOf<N>(r: TreeReader<N>, el: N): string {
  let s = '';
  for (const c of r.children(el)) if (r.type(c) === TEXT) s += r.data(c);
  return s;
}

/** Element children of a node. */
export function elements<N>(r: TreeReader<N>, n: N): N[] {
  return r.children(n).filter((c) => r.type(c) === ELEMENT);
}
