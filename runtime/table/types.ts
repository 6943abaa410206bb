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

