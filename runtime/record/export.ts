// Export a document as a calc record: serialise it, render it statically from the
// engine's states with the record's state and digest line, seal it and pack it into
// the app shell. DOM-free: the browser passes its live engine and its own HTML parser,
// the CLI runs an engine and parses with parse5 (node.ts).

import type { CalcDocument } from '../document';
import type { CellState } from '../engine-types';
import type { LibraryCall } from '../working/calls';
import { serialize } from '../format/index';
import { recordState } from '../review/state';
import type { HtmlParse } from './parsed';
import { pack } from './pack';
import { DIGEST_PLACEHOLDER } from './record-lines';
import { sha256Hex } from './seal';
import { staticHtml } from './static-html';

export interface ExportedRecord {
  html: string;
  /** The embedded document text, exactly as written into the file. */
  docText: string;
  digest: string;
}

export interface ExportOptions {
  /** An HTML parser: the seal lists the digest of every part as parsed. */
  parseHtml: HtmlParse;
  /** When the record was written (ISO text); now by default. */
  exportedAt?: string;
  /** Written in review (the checker's side): a changed sheet is a working copy from review. */
  reviewing?: boolean;
  /** The library calls of a formula or check (Engine.libraryCalls), to print their working. */
  calls?: (id: string) => LibraryCall[];
}

export async function exportRecord(
  doc: CalcDocument,
  state: (id: string) => CellState | undefined,
  shell: string,
  options: ExportOptions,
): Promise<ExportedRecord> {
  const docText = serialize(doc);
  const digest = await sha256Hex(docText);
  const exportedAt = options.exportedAt ?? new Date().toISOString();
  const rs = recordState(doc, { results: state, reviewing: options.reviewing });
  const rendered = staticHtml(doc, state, {
    digest, exportedAt, calls: options.calls, record: { state: rs, recordDigest: DIGEST_PLACEHOLDER, known: { kind: 'unchecked' } },
  });
  const html = await pack({ shell, docText, digest, meta: doc.meta, staticHtml: rendered, state: rs, written: exportedAt, parseHtml: options.parseHtml });
  return { html, docText, digest };
}
