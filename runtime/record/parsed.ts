// A parsed page as the record code reads it: a tree and the reader for its nodes.
// The CLI parses with parse5 (parse5-reader.ts), the app with the browser's parser
// (cells/record/dom-reader.ts); runtime/ itself never touches the DOM.

import type { TreeReader } from './canon';
import { readParts, type PageParts } from './seal-parts';
import { verifyParts, type RecordCheck } from './verify';

export interface ParsedHtml {
  reader: TreeReader<unknown>;
  /** The document node. */
  root: unknown;
}

/** Parses a whole HTML file. */
export type HtmlParse = (html: string) => ParsedHtml;

export function pageParts(page: ParsedHtml): PageParts {
  return readParts(page.reader, page.root);
}

/** Parses and checks a whole record file against its seal. */
export async function verifyHtml(html: string, parseHtml: HtmlParse): Promise<RecordCheck> {
  return verifyParts(pageParts(parseHtml(html)));
}
