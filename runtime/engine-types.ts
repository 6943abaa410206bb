// What the engine hands to its users (browser view, CLI, record export).
// Values are SI base units inside the engine; `display` is the value converted
// to the cell's display unit and formatted for people.

import type { CellStatus } from './cell-status';
import type { CalcDocument } from './document';
import type { FigureSpec, SweepResult } from './figures/spec';
import type { LibraryCall } from './library/call';
import type { RunValue, TableValue } from './table/types';

export type { CellStatus };

export type ErrorKind =
  | 'syntax'          // the text does not parse; `column` says where
  | 'unknown-name'    // a name that is no cell; message suggests the nearest one
  | 'cycle'           // message names every cell in the loop
  | 'duplicate-name'  // two cells publish the same name
  | 'unit'            // dimensions disagree; message says both units
  | 'range'           // input outside its allowed range or not one of its choices
  | 'non-finite'      // result is NaN or infinite
  | 'not-allowed'     // a function or construct the formula language forbids
  | 'library'         // a library function refused its arguments
  | 'upstream';       // an input cell is broken; `upstream` names it

export interface CellError {
  kind: ErrorKind;
  message: string;
  /** 1-based column in the cell's source text (expression or value), when known. */
  column?: number;
  /** For 'upstream': the name of the broken cell this one reads. */
  upstream?: string;
}

export interface DisplayValue {
  /** Number in the display unit, or the text/boolean value. */
  value: number | string | boolean;
  /** Display unit as written in the document ('' for a pure number). */
  unit: string;
  /** Formatted for people, e.g. "12.5 in", "0.85", "interior". */
  text: string;
}

export interface CellState {
  id: string;
  status: CellStatus;
  /** Raw engine value: a number in SI base units, a text or a boolean. */
  value?: number | string | boolean;
  display?: DisplayValue;
  /** Checks: demand, capacity and demand/capacity ratio (absent for a plain condition). */
  demand?: DisplayValue;
  capacity?: DisplayValue;
  ratio?: number;
  error?: CellError;
  /** Clauses of the library functions the formula calls, for the margin. */
  clauses: string[];
  /** Names of the cells this one reads, in first-use order. */
  reads: string[];
  /** Figure cells: the drawing's spec (render with runtime/figures/render). */
  figure?: FigureSpec;
  /** Sweep cells: the points swept and each plotted result. */
  sweep?: SweepResult;
  /** Table cells: the values read, and any that could not be. */
  table?: TableValue;
  /** Run cells: the result table, and every row's trace. */
  run?: RunValue;
}

/** One plotted result at one what-if point: a value (a check's ratio or condition) and, for checks, pass. */
export interface WhatIfOutcome {
  value?: number | string | boolean;
  pass?: boolean;
  error?: string;
}

export interface Engine {
  /** The document the engine is running now. */
  readonly doc: CalcDocument;
  /** Run a new version of the document: only cells that changed (and what depends on them) recompute. */
  update(doc: CalcDocument): void;
  state(id: string): CellState | undefined;
  /** Called after each settle with the ids whose state changed. Returns an unsubscribe function. */
  subscribe(listener: (changed: string[]) => void): () => void;
  /**
   * What if input `input` had each of `values` (SI numbers, texts or booleans)? The named
   * results and checks at each point, computed without changing the document or any state.
   */
  whatIf?(input: string, values: readonly (number | string | boolean)[], outputs: readonly string[]): Record<string, WhatIfOutcome>[];
  /**
   * The library calls of a formula or check with the values they were called with now, for
   * showing their working (runtime/working). Computed when asked, never on an edit.
   */
  libraryCalls?(id: string): LibraryCall[];
  /**
   * The states of row `row`'s trace of run `runId` (cells outside the trace: the sheet's),
   * or undefined when there is no such row.
   */
  traceStates?(runId: string, row: number): ((id: string) => CellState | undefined) | undefined;
  /** Resolves when every cell has a final state for the current document. */
  settled(): Promise<void>;
  dispose(): void;
}
