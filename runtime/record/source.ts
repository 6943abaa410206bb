// A file as given to the CLI or the app's open dialog: Loadtrace text, or an HTML
// record whose embedded document is taken out and checked against its seal.

import type { HtmlParse } from './parsed';
import { verifyHtml } from './parsed';
import { looksLikeRecord, unpack } from './unpack';
import type { RecordCheck } from './verify';

export interface DocumentSource {
  /** The document text to parse ('' when none could be read). */
  docText: string;
  /** The file was an HTML record. */
  record: boolean;
  /** For a record: its seal holds and the file is whole. */
  sealOk: boolean;
  /** Plain sentences about what is wrong with the file (empty when nothing is). */
  problems: string[];
  /** For a record read with an HTML parser: the whole file checked against the record's seal. */
  check?: RecordCheck;
}

/** The document in a file; with `parseHtml`, a record's whole file is checked against its seal too. */
export async function readDocumentSource(fileText: string, parseHtml?: HtmlParse): Promise<DocumentSource> {
  if (!looksLikeRecord(fileText)) return { docText: fileText, record: false, sealOk: true, problems: [] };
  const u = await unpack(fileText);
  const out: DocumentSource = { docText: u.docText ?? '', record: true, sealOk: u.sealOk, problems: u.problems };
  if (parseHtml) {
    out.check = await verifyHtml(fileText, parseHtml);
    out.problems = [...u.problems, ...out.check.problems.filter((p) => !u.problems.includes(p))];
  }
  return out;
}
