// What a table publishes to the graph (runtime/table/value.ts reads it from the cell).

import type { VType } from '../formula/value-type';

export type TableEntry = number | string | boolean;

/** A column as computed: its name, value type and display unit ('' for none). */
export interface ColumnInfo {
  name: string;
  type: VType;
  unit: string;
}

/** A value that could not be read: where (0-based row and column) and why. */
export interface TableProblem {
  row: number;
  column: number;
  message: string;
}

/** The value a table publishes: its columns, and its rows of SI numbers, texts and booleans. */
export interface TableValue {
  name: string;
  columns: ColumnInfo[];
  rows: TableEntry[][];
  /** Values that could not be read (the table then holds the last good value, or is in error). */
  problems: TableProblem[];
  /** A bad value has no last good value: the table cannot be used. */
  incomplete: boolean;
  /** The rows as typed, so the next reading keeps an unchanged row as the same array. */
  typed: readonly (readonly string[])[];
}


/** What computing one cell gave: a value, or why not (as what-if.ts has it). */
export type RowOutcome = { ok: true; value: unknown } | { ok: false; error: string };

/** One row of a run: its key, the outcome of every cell of the trace, and how it stands. */
export interface RunTrace {
  key: string;
  /** The table's row it ran (the same array while the row is unchanged). */
  source: readonly TableEntry[];
  /** Every computing cell of the trace, by id. */
  outcomes: ReadonlyMap<string, RowOutcome>;
  status: 'ok' | 'fail' | 'error';
  /** The check of the trace with the highest demand/capacity ratio. */
  governing?: { id: string; name: string; ratio: number };
  /** Each result's raw value (a check's ratio or condition), undefined on an error. */
  results: unknown[];
}

/** A result column of a run: the trace cell it shows. */
export interface RunColumn {
  name: string;
  id: string;
  kind: 'formula' | 'check';
  /** Display unit of a formula's value ('' for none). */
  unit: string;
}

/**
 * What a run publishes: a table (the key column, then each result; a check as its ratio)
 * that other cells can read, with each row's trace beside it.
 */
export interface RunValue extends TableValue {
  run: true;
  table: string;
  results: RunColumn[];
  traces: RunTrace[];
  /** The governing row: the highest ratio of a failing row, else of any row. */
  worst?: { row: number; name: string; ratio: number };
  failing: number;
  errors: number;
}
