// A table's values as inputs of a revision: each value is frozen on issue, so Review shows
// a changed table value old → new as it does an input's, and "return to issued" puts it
// back. Each is keyed by the table's id, row and column ("t1--3-2"), and called by the
// table's name, the row's first value and the column ("storeys[Roof].LL").

import type { TableCell } from '../document';
import type { IssuedInput } from './types';

const KEY = /^(.+)--([0-9]+)-([0-9]+)$/;

/** Every value of a table as an issued input. */
export function tableInputs(cell: TableCell): IssuedInput[] {
  const out: IssuedInput[] = [];
  cell.rows.forEach((row, r) => cell.columns.forEach((c, k) => {
    out.push({ id: `${cell.id}--${r + 1}-${k + 1}`, name: `${cell.name}[${row[0] || r + 1}].${c.name}`, value: row[k] ?? '' });
  }));
  return out;
}

/** The table cell with its values set back to the issued ones that `values` (id → value) holds; the same object when none differ. */
export function tableAtIssue(cell: TableCell, values: ReadonlyMap<string, string>): TableCell {
  let changed = false;
  const rows = cell.rows.map((row, r) => {
    let copy: string[] | undefined;
    cell.columns.forEach((_c, k) => {
      const v = values.get(`${cell.id}--${r + 1}-${k + 1}`);
      if (v === undefined || v === (row[k] ?? '')) return;
      copy ??= cell.columns.map((_x, j) => row[j] ?? '');
      copy[k] = v;
    });
    if (copy) changed = true;
    return copy ?? row;
  });
  return changed ? { ...cell, rows } : cell;
}

/** The id of the cell an issued input belongs to: the table of a table value's key, else the id itself. */
export function cellOfKey(id: string): string {
  return KEY.exec(id)?.[1] ?? id;
}
