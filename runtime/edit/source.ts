// The source a person edits for a cell (its kind's `source`: `M_u = 1.2 M_D + 1.6 M_L`,
// a note's text, a section's title), read and applied as one pure edit: a new name
// renames the cell and its readers, the other fields the source owns are set.

import type { CalcDocument, Cell } from '../document';
import { describe } from '../kinds/index';
import { EditError, indexOfCell, renameCell, updateCell, withFields } from './ops';

/** A source that cannot be applied; `column` (1-based) says where. */
export class SourceError extends EditError {
  override name = 'SourceError';
  constructor(message: string, readonly column: number) {
    super(message);
  }
}

/** The text a person edits for `cell`. */
export function cellSource(cell: Cell): string {
  return describe(cell.kind).source.write(cell);
}

/** Applies an edited source to cell `id`; a source that cannot be read throws SourceError. */
export function applySource(doc: CalcDocument, id: string, source: string): CalcDocument {
  const cell = doc.cells[indexOfCell(doc, id)];
  const spec = describe(cell.kind);
  const read = spec.source.read(source);
  if (!read.ok) throw new SourceError(read.message, read.column);
  const fields = read.value;
  const name = Reflect.get(fields, 'name');
  const renamed = spec.named ? renameCell(doc, id, typeof name === 'string' ? name : '') : doc;
  const owned = spec.source.owns.map(String).filter((k) => k !== 'name');
  return updateCell(renamed, id, (c) => withFields(c, owned.map((k): [string, unknown] => [k, Reflect.get(fields, k)])));
}
