// Reading a FILE the CLI was given: a .lt text document or an exported .html record (its
// embedded document checked against its seal, and the whole file against the record's seal).

import { readFileSync } from 'node:fs';
import type { CalcDocument } from '../document';
import { parse } from '../format/index';
import { readDocumentSource } from '../record/index';
import { parseWithParse5 } from '../record/node';
import { OLDER_RECORD } from '../record/verify';

export interface Loaded {
  doc: CalcDocument;
  /** Anything wrong: lines that could not be read, a record altered or not whole. */
  broken: boolean;
  /** Lines of the document that could not be read (their blocks are not in `doc`). */
  parseErrors: number;
}

/** A file's document, its faults reported through `err`; undefined when it cannot be read at all. */
export async function loadDocument(file: string, err: (s: string) => void): Promise<Loaded | undefined> {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    err(`cannot read ${file}: ${(e as Error).message}`);
    return undefined;
  }
  // An exported .html record: its embedded document checked against its seal, and the
  // whole file against the record's seal (read with a real HTML parser).
  const source = await readDocumentSource(text, parseWithParse5);
  for (const p of source.problems) err(`${file}: ${p}`);
  // A record written before whole-file seals is said to be so, and still runs as before.
  const altered = source.problems.some((p) => p !== OLDER_RECORD);
  const { doc, errors } = parse(source.docText);
  for (const e of errors) err(`${file}:${e.line}:${e.column}: ${e.message}`);
  return { doc, broken: errors.length > 0 || altered || (source.record && source.docText === ''), parseErrors: errors.length };
}

