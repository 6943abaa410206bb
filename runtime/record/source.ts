// A file as given to the CLI or the app's open dialog: Loadtrace text, or an HTML
// record whose embedded document is taken out and checked against its seal.

import { looksLikeRecord, unpack } from './unpack';

export interface DocumentSource {
  /** The document text to parse ('' when none could be read). */
  docText: string;
  /** The file was an HTML record. */
  record: boolean;
  /** For a record: its seal holds and the file is whole. */
  sealOk: boolean;
  /** Plain sentences about what is wrong with the file (empty when nothing is). */
  problems: string[];
}

export async function readDocumentSource(fileText: string): Promise<DocumentSource> {
  if (!looksLikeRecord(fileText)) return { docText: fileText, record: false, sealOk: true, problems: [] };
  const u = await unpack(fileText);
  return { docText: u.docText ?? '', record: true, sealOk: u.sealOk, problems: u.problems };
}
