// A table's values as the engine holds them: each column typed once (a unit, a pure
// number, yes/no or text), each value read as typed into a plain SI number, a text or a
// boolean. A value that cannot be read is reported at its row and column; the table keeps
// computing with the last good value there, if it had one, so nothing typed is lost.

import type { TableCell, TableColumn } from '../document';
import { CellError } from '../formula/cell-error';
import { parseQuantityText } from '../formula/input-value';
import { describeType, BOOL, NUMBER, numType, TEXT, type VType } from '../formula/value-type';
import type { ColumnInfo, TableEntry, TableProblem, TableValue } from './types';
import { describeDims, isDimless, sameDims, unitInfo } from '../units/dimension';

export type { ColumnInfo, TableEntry, TableProblem, TableValue } from './types';

/** How a column's type word is read; throws CellError naming the column. */
export function columnInfo(c: TableColumn): ColumnInfo {
  const t = c.type.trim();
  if (t === 'text') return { name: c.name, type: TEXT, unit: '' };
  if (t === 'number') return { name: c.name, type: NUMBER, unit: '' };
  if (t === 'yes/no') return { name: c.name, type: BOOL, unit: '' };
  let info;
  try {
    info = unitInfo(t);
  } catch {
    throw new CellError('unit', `column ${c.name}: "${t}" is not a unit Loadtrace knows; a column is a unit (ft, psf), number, yes/no or text`);
  }
  return { name: c.name, type: numType(info.dims, t), unit: t };
}

/** One value as typed into its column's type; throws CellError with the message to show. */
export function readEntry(text: string, col: ColumnInfo): TableEntry {
  const typed = text.trim();
  const t = col.type;
  if (t.t === 'text') return typed;
  if (t.t === 'bool') {
    const w = typed.toLowerCase();
    if (w === 'yes' || w === 'true') return true;
    if (w === 'no' || w === 'false') return false;
    throw new CellError('syntax', `${col.name} takes yes or no, not "${typed}"`);
  }
  if (t.t !== 'num') throw new CellError('unit', `${col.name} holds ${describeType(t)}`);
  const q = parseQuantityText(typed, `the value of ${col.name}`);
  if (isDimless(q.dims) && col.unit) return q.si * unitInfo(col.unit).factor; // a bare number is in the column's unit
  if (sameDims(q.dims, t.dims)) return q.si;
  const want = col.unit ? `${describeDims(t.dims)} (${col.unit})` : 'a pure number';
  throw new CellError('unit', `${col.name} is ${want}; "${typed}" is ${describeDims(q.dims)}`);
}

/**
 * Reads every value of a table. A bad value takes the last good value at the same place
 * (`previous`, when the table's shape is unchanged) and is listed in `problems`.
 */
export function readTable(cell: TableCell, previous?: TableValue): TableValue {
  const columns = cell.columns.map(columnInfo);
  const names = new Set<string>();
  for (const c of columns) {
    if (names.has(c.name)) throw new CellError('duplicate-name', `the table has two columns named ${c.name}`);
    names.add(c.name);
  }
  if (columns.length === 0) throw new CellError('syntax', 'the table has no columns: add a line "column NAME TYPE"');
  const problems: TableProblem[] = [];
  let incomplete = false;
  const sameShape = previous && previous.columns.length === columns.length && previous.columns.every((c, k) => c.name === columns[k].name && c.unit === columns[k].unit);
  const rows = cell.rows.map((row, r) => {
    // An unchanged row is the same array as before: a run recomputes only the rows that changed.
    const was = sameShape ? previous!.typed[r] : undefined;
    if (was && was.length === row.length && was.every((v, k) => v === row[k]) && !previous!.problems.some((p) => p.row === r)) return previous!.rows[r];
    if (row.length !== columns.length) {
      problems.push({ row: r, column: Math.min(row.length, columns.length - 1), message: `row ${r + 1} has ${row.length} value${row.length === 1 ? '' : 's'}; the table has ${columns.length} columns` });
    }
    return columns.map((col, k) => {
      try {
        return readEntry(row[k] ?? '', col);
      } catch (e) {
        if (row.length === columns.length) problems.push({ row: r, column: k, message: e instanceof Error ? e.message : String(e) });
        const kept = sameShape ? previous!.rows[r]?.[k] : undefined;
        if (kept === undefined) incomplete = true;
        return kept ?? NaN;
      }
    });
  });
  return { name: cell.name, columns, rows, problems, incomplete, typed: cell.rows };
}

/** Where a problem is, in words: "row 3 (Roof), column LL". */
export function problemPlace(cell: TableCell, p: TableProblem): string {
  const key = cell.rows[p.row]?.[0];
  return `row ${p.row + 1}${key ? ` (${key})` : ''}, column ${cell.columns[p.column]?.name ?? p.column + 1}`;
}
