// Reading pages in the browser for the record's seal (runtime/record/seal-parts.ts):
// DOM nodes through the same reader interface parse5's trees use in the CLI, and
// whole files parsed with DOMParser (the browser's own HTML parser, which runs nothing).

import type { ParsedHtml, TreeReader } from '../../runtime/record/index';

const TEMPLATE = 'TEMPLATE';

export const domReader: TreeReader<Node> = {
  type: (n) => n.nodeType,
  name: (n) => (n.nodeType === Node.ELEMENT_NODE ? (n as Element).localName : n.nodeType === Node.DOCUMENT_TYPE_NODE ? (n as DocumentType).name : ''),
  ns: (n) => (n.nodeType === Node.ELEMENT_NODE ? (n as Element).namespaceURI ?? '' : ''),
  attrs: (n) => {
    if (n.nodeType !== Node.ELEMENT_NODE) return [];
    const list = (n as Element).attributes;
    const out: [string, string][] = [];
    for (let i = 0; i < list.length; i++) out.push([list[i].name, list[i].value]);
    return out;
  },
  children: (n) => Array.from((n.nodeName === TEMPLATE && n instanceof HTMLTemplateElement ? n.content : n).childNodes),
  data: (n) => {
    if (n.nodeType === Node.DOCUMENT_TYPE_NODE) return `${(n as DocumentType).publicId}\n${(n as DocumentType).systemId}`;
    return n.nodeType === Node.TEXT_NODE || n.nodeType === Node.COMMENT_NODE ? (n as CharacterData).data : '';
  },
};

/** A whole file parsed by the browser's parser, as a page that runs scripts would read it. */
export function parseWithDom(html: string): ParsedHtml {
  return { reader: domReader as TreeReader<unknown>, root: new DOMParser().parseFromString(html, 'text/html') };
}
