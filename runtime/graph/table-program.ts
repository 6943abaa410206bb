// A table cell in the graph: its value is the table read from the cell (runtime/table),
// the same object while nothing in it changes. A value that cannot be read is reported at
// the table, by row and column, while the last good value there keeps the rest computing.

import type { TableCell } from '../document';
import { CellError } from '../formula/cell-error';
import { TABLE } from '../formula/value-type';
import { problemPlace, readTable } from '../table/value';
import { asCellError, failing, type CellProgram } from './cell-program';

export function tableProgram(cell: TableCell, previous?: CellProgram): CellProgram {
  let table;
  try {
    table = readTable(cell, previous?.table);
  } catch (e) {
    return failing(asCellError(e));
  }
  const value = table;
  const program: CellProgram = { type: TABLE, inputs: [], reads: [], clauses: [], unit: '', table, definition: () => value };
  if (table.problems.length) {
    const first = table.problems[0];
    const more = table.problems.length - 1;
    program.inputError = new CellError('range', `${problemPlace(cell, first)}: ${first.message}${more ? ` (and ${more} more, marked in the table)` : ''}`);
  }
  return program;
}
