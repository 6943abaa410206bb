// Records in Node (the CLI, the tests, the benchmarks): export with an engine of its
// own, and read and verify whole files, both with parse5 as the HTML parser.

import type { CalcDocument } from '../document';
import { createEngine } from '../engine';
import { exportRecord, type ExportedRecord } from './export';
import { parseWithParse5 } from './parse5-reader';
import { verifyHtml } from './parsed';
import type { RecordCheck } from './verify';

/** Export with an engine of its own (headless): computes the document, then packs it. */
export async function exportComputed(doc: CalcDocument, shell: string, exportedAt?: string, reviewing = false): Promise<ExportedRecord> {
  const engine = createEngine(doc);
  try {
    await engine.settled();
    return await exportRecord(doc, (id) => engine.state(id), shell, {
      parseHtml: parseWithParse5, exportedAt, reviewing, calls: (id) => engine.libraryCalls?.(id) ?? [],
    });
  } finally {
    engine.dispose();
  }
}

/** Checks a whole record file against its seal. */
export function verifyRecordFile(html: string): Promise<RecordCheck> {
  return verifyHtml(html, parseWithParse5);
}

export { parseWithParse5 };
