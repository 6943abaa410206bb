// Document → text. Output is deterministic, so a file diffs line by line.

import type { CalcDocument, Cell } from '../document';
import { keyWidth, kindFormat } from './kinds/index';
import { FORMAT_TAG, FORMAT_VERSION, META_KEY_WIDTH, META_LINES } from './meta';
import { WORKING_KEYWORD } from './settings';
import { encodeNoteLine, encodeValue, isCellId } from './quote';
import { reviewBlocks } from './review/index';

/** The lines of one cell block (no blank line around it). */
export function serializeCell(cell: Cell): string[] {
  const format = kindFormat(cell.kind);
  // Writing a file that cannot be read back would lose the cell later; refuse now.
  if (!format) throw new Error(`no text format for cell kind ${JSON.stringify(cell.kind)}`);
  if (!isCellId(cell.id)) throw new Error(`cell id ${JSON.stringify(cell.id)} is not [A-Za-z0-9_-]+`);
  const tail = format.header.write(cell);
  const lines = [tail === '' ? `${cell.kind} ${cell.id}` : `${cell.kind} ${cell.id}  ${tail}`];
  const width = keyWidth(format);
  for (const attr of format.attrs) {
    for (const value of attr.write(cell)) lines.push(`  ${attr.key.padEnd(width)}${encodeValue(value)}`);
  }
  for (const text of format.body?.write(cell) ?? []) lines.push(encodeNoteLine(text));
  return lines;
}

export function serialize(doc: CalcDocument): string {
  const lines = [`${FORMAT_TAG} ${FORMAT_VERSION}`];
  for (const [word, field] of META_LINES) {
    const value = doc.meta[field];
    if (typeof value === 'string' && value !== '') lines.push(word.padEnd(META_KEY_WIDTH) + encodeValue(value));
  }
  if (doc.working) lines.push(WORKING_KEYWORD.padEnd(META_KEY_WIDTH) + doc.working);
  for (const cell of doc.cells) lines.push('', ...serializeCell(cell));
  for (const block of reviewBlocks(doc.review)) lines.push('', ...block);
  return lines.join('\n') + '\n';
}
