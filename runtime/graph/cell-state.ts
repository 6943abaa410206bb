// From a computed value (or error) to the CellState the view, the CLI and the
// record export read. What a value means differs by kind: each kind's description
// settles its state with one of the helpers below (runtime/kinds/).

import type { Cell } from '../document';
import type { CellState } from '../engine-types';
import type { CellError } from '../formula/cell-error';
import { displayNumber, displayOther } from '../formula/display';
import type { CellProgram, CheckResult } from './cell-program';
import type { FigureSpec, SweepResult } from '../figures/spec';

/** Fills a state from a value; the kind's own part of buildState. */
export type Settle = (value: unknown, state: CellState) => void;

export function buildState(
  cell: Cell,
  program: CellProgram | undefined,
  outcome: { value: unknown } | { error: CellError },
  settle: Settle,
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
  settle(outcome.value, state);
  return state;
}

/** A number, text or boolean shown in the program's display unit (`precision` significant figures). */
export function settleValue(program: CellProgram | undefined, v: unknown, state: CellState, precision?: number): void {
  if (v === undefined || v === null) {
    state.status = 'pending';
    return;
  }
  state.value = v as number | string | boolean;
  state.display = typeof v === 'number' ? displayNumber(v, program?.unit ?? '', precision) : displayOther(v as string | boolean);
}

/** A check: pass or fail, and for demand ≤ capacity the ratio with both sides shown. */
export function settleCheck(program: CellProgram | undefined, v: unknown, state: CellState): void {
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
}

/** A drawing: the figure's spec. */
export function settleFigure(v: unknown, state: CellState): void {
  if (v === undefined || v === null) state.status = 'pending';
  else state.figure = v as FigureSpec;
}

/** A what-if sweep: its points and series. */
export function settleSweep(v: unknown, state: CellState): void {
  if (v === undefined || v === null) state.status = 'pending';
  else state.sweep = v as SweepResult;
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
    a.sweep === b.sweep &&
    a.table === b.table &&
    a.run === b.run
  );
}
