// The calc document as plain, serialisable data. Everything else (engine, view,
// record export) reads this; all editing is a pure operation that returns a new one.

import type { WorkingSetting } from './format/settings';
import type { ReviewState } from './review/types';

/**
 * Title-block fields, printed at the top of every sheet, in the order the text format
 * writes them. A new field here is a compile error wherever it still needs a label, a
 * format keyword or an empty value (DEVELOPERS: "Add a title-block field").
 */
export const META_KEYS = ['project', 'job', 'subject', 'preparedBy', 'checkedBy', 'revision', 'date'] as const;

export type DocMeta = { [K in (typeof META_KEYS)[number]]: string };

/** Fields every cell has. `id` is stable for the life of the document. */
export interface CellBase {
  id: string;
  /** Short human description shown beside the symbol. */
  label?: string;
  /** Code clause or published source, shown in the right margin. */
  clause?: string;
}

export interface SectionCell extends CellBase {
  kind: 'section';
  title: string;
}

/** Free text with inline math ($...$) and a small Markdown subset. */
export interface NoteCell extends CellBase {
  kind: 'note';
  text: string;
}

/** A typed value with a unit (e.g. "5000 psi", "1'-6\"") or one of a list of choices. */
export interface InputCell extends CellBase {
  kind: 'input';
  name: string;
  /** Exactly as typed; a bad value is kept and reported, never dropped. */
  value: string;
  /** Display unit; when absent the unit typed in `value` is shown. */
  unit?: string;
  /** Allowed range, each a quantity as typed (e.g. "2500 psi"). */
  min?: string;
  max?: string;
  /** When present the input is a pick-list and `value` must be one of these. */
  choices?: string[];
  /** Longer explanation than the label. */
  description?: string;
}

/** `name = expression`, shown as a hand calc. */
export interface FormulaCell extends CellBase {
  kind: 'formula';
  name: string;
  expr: string;
  /** Display unit; also fixes the dimension the formula must have. */
  unit?: string;
  /** Significant figures shown (default 4). */
  precision?: number;
}

/**
 * A demand against a capacity (`demand <= capacity` or `capacity >= demand`),
 * giving a ratio, or any other condition, giving pass or fail only.
 */
export interface CheckCell extends CellBase {
  kind: 'check';
  /** Optional name, so other cells and scripts can refer to the check. */
  name?: string;
  expr: string;
}

/** A drawing computed from cell values: `expr` calls a figure function (runtime/figures). */
export interface FigureCell extends CellBase {
  kind: 'figure';
  expr: string;
}

/**
 * A what-if plot: the input cell `input` swept over a range as wide as `from` to `to`
 * (quantities as typed) in `steps` equal intervals, with the named results or checks
 * computed at each point.
 */
export interface SweepCell extends CellBase {
  kind: 'sweep';
  input: string;
  from: string;
  to: string;
  /** Equal intervals between from and to (default 20, so 21 points). */
  steps?: number;
  /** Names of formula or check cells to plot. */
  outputs: string[];
  /**
   * The author fixed the range: swept from `from` to `to` as written. Otherwise the range
   * keeps its width and is centred on the input's current value, within its limits.
   */
  fixed?: true;
}

/** One column of a table: its name and what its values are (a unit, `text` or `number`). */
export interface TableColumn {
  name: string;
  /** A unit its quantities are in (`ft`, `psf`), `number` for pure numbers, or `text`. */
  type: string;
}

/**
 * Rows of typed values under named columns (storeys, column marks). Each value is kept
 * exactly as typed; a bare number in a quantity column is in the column's unit.
 */
export interface TableCell extends CellBase {
  kind: 'table';
  name: string;
  columns: TableColumn[];
  /** One array a row, one text a column, as typed. */
  rows: string[][];
}

/**
 * The trace written once in the sheet (the cells of the sections `trace`), run again for
 * every row of the table `table`: an input of the trace whose name is a column of the
 * table takes that row's value. Publishes, under `name`, a table of each row's `results`.
 */
export interface RunCell extends CellBase {
  kind: 'run';
  name: string;
  table: string;
  /** Ids of the sections whose cells are the trace. */
  trace: string[];
  /** Names of formulas and checks of the trace, shown as the result table's columns. */
  results: string[];
}

export type Cell = SectionCell | NoteCell | InputCell | FormulaCell | CheckCell | FigureCell | SweepCell | TableCell | RunCell;
export type CellKind = Cell['kind'];

export interface CalcDocument {
  meta: DocMeta;
  cells: Cell[];
  /** Issued revisions, checker's comments and sign-offs (runtime/review); absent until the first. */
  review?: ReviewState;
  /** How the record shows the working of library calls; absent: open for the governing checks. */
  working?: WorkingSetting;
}

export function emptyMeta(): DocMeta {
  return { project: '', job: '', subject: '', preparedBy: '', checkedBy: '', revision: '', date: '' };
}

/** The name a cell publishes to the graph, if any: the `name` of a kind that has one. */
export function cellName(cell: Cell): string | undefined {
  return 'name' in cell ? cell.name : undefined;
}
