// The states of one row's trace of a run, as the engine would give them had the sheet's
// bound inputs held that row's values: each cell's outcome in the row, settled by its
// kind as the sheet's own are. The same hand-calc views then draw that row's trace.

import type { Cell } from '../document';
import type { CellState } from '../engine-types';
import { CellError } from '../formula/cell-error';
import { describe } from '../kinds/index';
import type { CellProgram } from './cell-program';
import { buildState } from './cell-state';

export function traceStateLookup(
  run: CellState | undefined,
  row: number,
  cellOf: (id: string) => Cell | undefined,
  programOf: (id: string) => CellProgram | undefined,
  sheet: (id: string) => CellState | undefined,
): ((id: string) => CellState | undefined) | undefined {
  const trace = run?.run?.traces[row];
  if (!trace) return undefined;
  const built = new Map<string, CellState>();
  return (id) => {
    const outcome = trace.outcomes.get(id);
    if (!outcome) return sheet(id);
    let s = built.get(id);
    if (s) return s;
    const cell = cellOf(id);
    if (!cell) return undefined;
    const program = programOf(id);
    s = buildState(cell, program, outcome.ok ? { value: outcome.value } : { error: new CellError('library', outcome.error) },
      (value, state) => describe(cell.kind).program?.settle(cell, program, value, state));
    built.set(id, s);
    return s;
  };
}
