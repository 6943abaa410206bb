// What a cell kind is, said once: the shape every kind's description fills in. The
// table in index.ts holds one description per kind of the Cell union, typed so that a
// kind without a description, or a description missing a piece, does not compile.
// Everything else (the text format, edits, the engine, the live sheet, the record's
// static page, the summary, numbering) reads the kinds from that table.

import type { Cell, CellBase, CellKind } from '../document';
import type { CellState } from '../engine-types';
import type { KindFormat } from '../format/types';
import type { CellError } from '../formula/cell-error';
import type { CellProgram } from '../graph/cell-program';
import type { ProgramEnv } from '../graph/program-env';
import type { ViewContext, ViewStatus } from '../present/cell-frame';

/** The cell type of a kind: CellOf<'formula'> is FormulaCell. */
export type CellOf<K extends CellKind> = Extract<Cell, { kind: K }>;

type OptionalKeys<T> = { [P in keyof T]-?: undefined extends T[P] ? P : never }[keyof T];

/** Whether a cell type has a name, read from the type: a description cannot say otherwise. */
type Naming<C> = 'name' extends keyof C ? (undefined extends C['name' & keyof C] ? 'optional' : 'required') : false;

/** Optional fields a person sets in a cell's editor panel (the name is set by renaming). */
export type FieldKey<C> = Exclude<OptionalKeys<C>, 'name'>;

/** Every such field of every kind, and the values they take (for setCellFields). */
export type AnyFieldKey = { [K in CellKind]: FieldKey<CellOf<K>> }[CellKind];
type FieldValue<F> = { [K in CellKind]: F extends keyof CellOf<K> ? Exclude<CellOf<K>[F], undefined> : never }[CellKind];
export type CellFields = { [F in AnyFieldKey]?: FieldValue<F> };

/** The fields every kind carries besides its id (CellBase), which any cell may set. */
export const COMMON_FIELDS = ['label', 'clause'] as const satisfies readonly Exclude<keyof CellBase, 'id'>[];

/** One field of the editor panel: what it is called there, and how its text is read. */
export interface FieldSpec<C> {
  key: FieldKey<C>;
  label: string;
  /** Width of the box in characters. */
  size: number;
  hint?: string;
  /** 'list': comma-separated items; 'integer': a whole number; else the text as typed. */
  type?: 'text' | 'list' | 'integer';
  /** Why a value cannot be stored (e.g. precision out of range), or undefined. */
  check?(value: unknown): string | undefined;
}

/** A source that could not be read, with where (1-based column) and why. */
export interface SourceProblem {
  message: string;
  column: number;
}

export type ParsedSource<T> = { ok: true; value: T } | ({ ok: false } & SourceProblem);

/**
 * The text a person edits for a cell (`M_u = 1.2 M_D + 1.6 M_L`, a note's text, a
 * section's title). `mode` says how the editor shows it: one plain line, a formula
 * (highlighted and completed), or a note's text with $math$.
 */
export interface SourceSpec<C> {
  mode: 'line' | 'formula' | 'note';
  write(cell: C): string;
  /** The fields the source sets; `owns` those it may set, and one it leaves out is removed. */
  read(source: string): ParsedSource<Partial<C>>;
  owns: readonly (keyof C)[];
  /**
   * Where in the source text (0-based offset) an error the engine found at `column` of the
   * cell (CellError.column: in its expression or value) is to be marked; undefined for a
   * kind whose errors point at no column.
   */
  errorAt(source: string, column: number): number | undefined;
}

/** How a kind computes: its program for the reactive graph, and its state from a value. */
export interface ProgramSpec<C> {
  compile(cell: C, env: ProgramEnv): CellProgram;
  /** A fault of the cell's own, reported before a loop it is part of (formulas, checks). */
  ownProblem?(cell: C, env: ProgramEnv): CellError | undefined;
  /** Fills the state from a computed value (status, display, ratio, drawing, ...). */
  settle(cell: C, program: CellProgram | undefined, value: unknown, state: CellState): void;
  /**
   * Shows values in the display unit of the cells it names, or in the sheet's unit
   * system (checks, figures): recompiled when those change.
   */
  followsUnits: boolean;
  /** Reads cells it does not name (a run's trace): compiled again whenever cells are added, removed or renamed. */
  followsSheet?: boolean;
}

/** What the live sheet draws for a cell: its status (for the class name) and its HTML. */
export interface LiveView {
  status: ViewStatus;
  html: string;
  /** HTML made from document Markdown: the page passes it through its sanitizer once more. */
  fromMarkdown?: boolean;
}

export interface KindDescription<K extends CellKind> {
  kind: K;
  /** Readable stem of new ids: f → f1, f2. */
  stem: string;
  /**
   * A new cell with placeholder content that computes; `freshName` gives an unused cell
   * name. null for a kind a person does not add (e.g. a block kept because it could not be read).
   */
  blank: ((id: string, freshName: (stem: string) => string) => CellOf<K>) | null;
  /** Publishes its `name` to the graph (other cells read it by that name): always, when given, or never. */
  named: Naming<CellOf<K>>;
  /** The editor panel's fields, in order. */
  fields: readonly FieldSpec<CellOf<K>>[];
  /** Names of other cells its source mentions (cells or not), for the dependency graph. */
  refs(cell: CellOf<K>): string[];
  /** The cell with every reference to the name `from` written as `to` (the same object when none). */
  rename(cell: CellOf<K>, from: string, to: string): CellOf<K>;
  /** Its block in the text format (runtime/format/FORMAT.md). */
  format: KindFormat<CellOf<K>>;
  source: SourceSpec<CellOf<K>>;
  /** Reference numbers: a 'section' starts the next number, an 'item' counts under it, 'none' has none. */
  numbering: 'section' | 'item' | 'none';
  /** How it computes; null for a kind that does not (sections, notes). */
  program: ProgramSpec<CellOf<K>> | null;
  /** Its title in the summary of checks; null for a kind the summary does not list. */
  summaryTitle: ((cell: CellOf<K>, state?: CellState) => string) | null;
  /** The live sheet's drawing of the cell (HTML; math as KaTeX HTML). */
  live(cell: CellOf<K>, ctx: ViewContext): LiveView;
  /** The record's static drawing of the cell (HTML that reads with JavaScript off; math as MathML). */
  record(cell: CellOf<K>, ctx: ViewContext): string;
}

/** One description per kind of the Cell union. */
export type KindTable = { [K in CellKind]: KindDescription<K> };
