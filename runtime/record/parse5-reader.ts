// Reading a record in Node with parse5, an HTML parser that follows the WHATWG
// parsing algorithm as browsers do (scripting on, as in a page that runs), so the CLI
// sees the tree a browser builds from the same bytes, not what a regular expression
// guesses. Node only: the app reads pages with the browser's own parser.

import { parse } from 'parse5';
import type { DefaultTreeAdapterMap } from 'parse5';
import { COMMENT, DOCTYPE, DOCUMENT, ELEMENT, TEXT, type TreeReader } from './canon';
import type { HtmlParse } from './parsed';

type Node = DefaultTreeAdapterMap['node'];
type Element = DefaultTreeAdapterMap['element'];

const TYPES: Record<string, number> = { '#document': DOCUMENT, '#documentType': DOCTYPE, '#text': TEXT, '#comment': COMMENT };

export const parse5Reader: TreeReader<Node> = {
  type: (n) => TYPES[n.nodeName] ?? ELEMENT,
  name: (n) => ('tagName' in n ? n.tagName : 'name' in n ? (n as { name: string }).name : ''),
  ns: (n) => ('namespaceURI' in n ? n.namespaceURI : ''),
  attrs: (n) => ('attrs' in n ? (n as Element).attrs.map((a) => [a.prefix ? `${a.prefix}:${a.name}` : a.name, a.value]) : []),
  children: (n) => {
    if ('content' in n && n.nodeName === 'template') return (n as DefaultTreeAdapterMap['template']).content.childNodes;
    return 'childNodes' in n ? n.childNodes : [];
  },
  data: (n) => {
    if (n.nodeName === '#text') return (n as DefaultTreeAdapterMap['textNode']).value;
    if (n.nodeName === '#comment') return (n as DefaultTreeAdapterMap['commentNode']).data;
    if (n.nodeName === '#documentType') {
      const d = n as DefaultTreeAdapterMap['documentType'];
      return `${d.publicId}\n${d.systemId}`;
    }
    return '';
  },
};

/** Parses a whole HTML file as a browser with scripting on would. */
export const parseWithParse5: HtmlParse = (html) => ({ reader: parse5Reader as TreeReader<unknown>, root: parse(html) });
