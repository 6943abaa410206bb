// From a computed value (or error) to the CellState the view, the CLI and the
// record export read.

import type { Cell } from '../document';
import type { CellState } from '../engine-types';
import type { CellError } from '../formula/cell-error';
import { displayNumber, displayOther } from '../formula/display';
import type { CellProgram, CheckResult } from './cell-program';
import type { FigureSpec, SweepResult } from '../figures/spec';

export function buildState(
  cell: Cell,
  program: CellProgram | undefined,
  outcome: { value: unknown } | { error: CellError },
): CellState {
  const state: CellState = {
    id: cell.id,
    status: 'ok',
    clauses: program?.clauses ?? [],
    reads: program?.reads ?? [],
  };
  if ('error' in outcome) {
    state.status = 'error';
    state.error = outcome.error.toData();
    return state;
  }
  const precision = cell.kind === 'formula' ? cell.precision : undefined;
  const unit = program?.unit ?? '';
  const v = outcome.value;
  if (cell.kind === 'check') {
    const r = v as CheckResult;
    state.value = r.value;
    state.status = r.pass ? 'ok' : 'fail';
    if (typeof r.value === 'number') {
      state.ratio = r.value;
      const du = program?.demandUnit ?? '';
      state.demand = displayNumber(r.demand!, du);
      state.capacity = displayNumber(r.capacity!, du);
    }
    state.display = typeof r.value === 'number' ? displayNumber(r.value, '', 3) : displayOther(r.value);
    return state;
  }
  if (cell.kind === 'figure' || cell.kind === 'sweep') {
    if (v === undefined || v === null) state.status = 'pending';
    else if (cell.kind === 'figure') state.figure = v as FigureSpec;
    else state.sweep = v as SweepResult;
    return state;
  }
  if (v === undefined || v === null) {
    state.status = 'pending';
    return state;
  }
  state.value = v as number | string | boolean;
  state.display = typeof v === 'number' ? displayNumber(v, unit, precision) : displayOther(v as string | boolean);
  if (cell.kind === 'input' && program?.inputError) {
    // The last good value keeps computing; the bad text is reported here.
    state.status = 'error';
    state.error = program.inputError.toData();
  }
  return state;
}

export function sameState(a: CellState, b: CellState): boolean {
  return (
    a.status === b.status &&
    a.value === b.value &&
    a.display?.text === b.display?.text &&
    a.ratio === b.ratio &&
    a.demand?.text === b.demand?.text &&
    a.capacity?.text === b.capacity?.text &&
    a.error?.message === b.error?.message &&
    a.error?.column === b.error?.column &&
    a.clauses.join('\n') === b.clauses.join('\n') &&
    a.reads.join(',') === b.reads.join(',') &&
    a.figure === b.figure &&
    a.sweep === b.sweep
  );
}
