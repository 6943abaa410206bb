// Export a document as a calc record: serialise it, render it statically from the
// engine's states, seal it and pack it into the app shell. DOM-free: the browser
// passes its live engine, the CLI runs one here.

import type { CalcDocument } from '../document';
import type { CellState } from '../engine-types';
import type { LibraryCall } from '../working/calls';
import { createEngine } from '../engine';
import { serialize } from '../format/index';
import { pack } from './pack';
import { sha256Hex } from './seal';
import { staticHtml } from './static-html';

export interface ExportedRecord {
  html: string;
  /** The embedded document text, exactly as written into the file. */
  docText: string;
  digest: string;
}

export async function exportRecord(
  doc: CalcDocument,
  state: (id: string) => CellState | undefined,
  shell: string,
  exportedAt: string = new Date().toISOString(),
  calls?: (id: string) => LibraryCall[],
): Promise<ExportedRecord> {
  const docText = serialize(doc);
  const digest = await sha256Hex(docText);
  const html = await pack({ shell, docText, digest, meta: doc.meta, staticHtml: staticHtml(doc, state, { digest, exportedAt, calls }) });
  return { html, docText, digest };
}

/** Export with an engine of its own (headless): computes the document, then packs it. */
export async function exportComputed(doc: CalcDocument, shell: string, exportedAt?: string): Promise<ExportedRecord> {
  const engine = createEngine(doc);
  try {
    await engine.settled();
    return await exportRecord(doc, (id) => engine.state(id), shell, exportedAt, (id) => engine.libraryCalls?.(id) ?? []);
  } finally {
    engine.dispose();
  }
}
