// What every cell's drawing shares: the context it is drawn in (engine states, the
// names for the hand calc, its reference number), its status, and the frame around
// its body: the number in the left margin, the label, the references on the right.
// The live sheet's frame and the record's static frame, each written once here.

import type { Cell, CellKind } from '../document';
import type { CellState } from '../engine-types';
import type { HandCalcScope } from '../handcalc/index';
import { escapeHtml } from './escape';
import { marginRefs, refsHtml } from './margin';

/** What drawing a cell needs besides the cell: engine states, names, its number. */
export interface ViewContext {
  /** State of a cell by id. */
  state(id: string): CellState | undefined;
  /** Names and states of the cells of the sheet, for the hand calc. */
  scope: HandCalcScope;
  /** Reference number shown in the left margin ("2", "2.3"); '' for none. */
  number: string;
  /**
   * The record's working of a cell's library calls, open or folded by the sheet's setting
   * (runtime/working); absent on the live sheet, whose views draw the folds themselves.
   */
  workings?(cell: Cell): string;
}

/** How a cell stands, for its class name and the summary; never shown by colour alone. */
export type ViewStatus = 'ok' | 'fail' | 'error' | 'pending' | 'plain';

/** What the live drawing of every kind carries; plain data, so it can be compared. */
export interface CellViewBase {
  id: string;
  kind: CellKind;
  status: ViewStatus;
  number: string;
  label?: string;
  /** Right-margin reference: the cell's clause and the clauses of the functions it calls. */
  refs: string[];
  /** Message shown inline under the cell, with the source and the column it points at. */
  error?: { message: string; source?: string; column?: number; kind: string };
}

/** The view status for an engine state. */
export function statusOf(state: CellState | undefined): ViewStatus {
  if (!state) return 'pending';
  return state.status;
}

/** Live: the left-margin number. */
export function renderNumber(number: string): string {
  return `<div class="cell-no">${escapeHtml(number)}</div>`;
}

/** Live: the label line above a cell's math. */
export function renderLabel(label: string | undefined): string {
  return label ? `<div class="cell-label">${escapeHtml(label)}</div>` : '';
}

/** Live: number, body, references. */
export function liveFrame(view: CellViewBase, body: string): string {
  return `${renderNumber(view.number)}<div class="cell-body">${body}</div>${refsHtml(view.refs, 'cell-ref')}`;
}

/** Record: the label line. */
export function labelHtml(label: string | undefined): string {
  return label ? `<div class="lt-label">${escapeHtml(label)}</div>` : '';
}

/**
 * Record: one row of the calc sheet: number, body, result column, references.
 * `idle` is the status shown before the engine has a state (plain for kinds that do
 * not compute).
 */
export function recordFrame(cell: Cell, ctx: ViewContext, body: string, result: string, idle: ViewStatus): string {
  const s = ctx.state(cell.id);
  const status = s?.status ?? idle;
  return `<div class="lt-cell lt-${cell.kind} lt-st-${status}" id="lt-c-${escapeHtml(cell.id)}" data-id="${escapeHtml(cell.id)}"><div class="lt-no">${
    escapeHtml(ctx.number)}</div><div class="lt-body">${body}</div><div class="lt-res">${result}</div>${refsHtml(marginRefs(cell.clause, s), 'lt-ref')}</div>`;
}
