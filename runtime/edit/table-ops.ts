// Edits of a table's values, one at a time as typed into the sheet. The row edited is a
// new array; the others stay the same objects, so the engine recomputes what reads that row.

import type { CalcDocument, TableCell } from '../document';
import { EditError, updateCell } from './ops';

/** Sets the value at `row`, `column` (0-based) of table `id`, as typed (trimmed). */
export function setTableValue(doc: CalcDocument, id: string, row: number, column: number, value: string): CalcDocument {
  return updateCell<TableCell>(doc, id, (cell) => {
    if (cell.kind !== 'table') throw new EditError(`cell "${cell.id}" is a ${(cell as { kind: string }).kind}, not a table`);
    const r = cell.rows[row];
    if (!r || column < 0 || column >= cell.columns.length) throw new EditError(`the table ${cell.name} has no row ${row + 1}, column ${column + 1}`);
    const v = value.trim();
    if ((r[column] ?? '') === v) return cell;
    const next = cell.columns.map((_c, k) => (k === column ? v : r[k] ?? ''));
    return { ...cell, rows: cell.rows.map((x, k) => (k === row ? next : x)) };
  });
}
