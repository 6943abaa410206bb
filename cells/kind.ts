// The small set of verbs every cell kind has, so the sheet view, the editors and the
// tests treat all kinds alike: parse its source, serialise it, bind it to the
// engine's state, render it (to an HTML string, so it also works without a page),
// and apply an edit of its source to the sheet.

import type { CalcDocument, Cell, CellKind } from '../runtime/document';
import type { CellState } from '../runtime/engine-types';
import { NAME_PATTERN } from '../runtime/formula/tokens';
import type { HandCalcScope } from '../runtime/handcalc/index';

/** A source that could not be read, with where (1-based column) and why. */
export interface SourceProblem {
  message: string;
  column: number;
}

export type ParsedSource<T> = { ok: true; value: T } | ({ ok: false } & SourceProblem);

/** What binding needs besides the cell: engine states and numbering. */
export interface BindContext {
  /** State of a cell by id. */
  state(id: string): CellState | undefined;
  /** Names and states of the cells of the sheet, for the hand calc. */
  scope: HandCalcScope;
  /** Reference number shown in the left margin ("2", "2.3"); '' for none. */
  number: string;
}

/** How a cell stands, for its class name and the summary; never shown by colour alone. */
export type ViewStatus = 'ok' | 'fail' | 'error' | 'pending' | 'plain';

/** Everything the renderer needs for one cell; plain data, so it can be compared. */
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

export interface CellKindModule<C extends Cell, P, V extends CellViewBase> {
  kind: C['kind'];
  /** Reads the text a person edits for this cell (e.g. `M_u = 1.2 D + 1.6 L`). */
  parse(source: string): ParsedSource<P>;
  /** The text a person edits for this cell; parse(serialize(c)) gives c's fields back. */
  serialize(cell: C): string;
  /** Joins the cell with the engine's state into a view (TeX, texts, status). */
  bind(cell: C, ctx: BindContext): V;
  /** HTML for the view: every document text escaped, math through KaTeX without trust. */
  render(view: V): string;
  /** Applies an edited source to the sheet through the pure edit operations. */
  edit(doc: CalcDocument, id: string, source: string): CalcDocument;
}

/** A source edit that cannot be applied; `column` (1-based) says where. */
export class SourceError extends Error {
  override name = 'SourceError';
  constructor(message: string, readonly column: number) {
    super(message);
  }
}

/** The parsed value, or a SourceError. */
export function orThrow<T>(p: ParsedSource<T>): T {
  if (!p.ok) throw new SourceError(p.message, p.column);
  return p.value;
}

/** Escapes text for HTML content and attribute values. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (ch) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[ch]!);
}

/** A value with unit as plain text reads better with ² and · than with ^2 and *. */
export function prettyUnits(text: string): string {
  return text.replace(/\^2(?![0-9])/g, '²').replace(/\^3(?![0-9])/g, '³').replace(/\*/g, '·');
}

/** `name =` at the start of a source (not `==`): the name, the = sign, the spaces after. */
const HEAD = new RegExp(String.raw`^\s*(${NAME_PATTERN})?\s*(=(?!=))?\s*`);

/** The name a source starts with (`name = ...`), and where what follows it starts (0-based). */
export function assignedName(source: string): { name: string; end: number } | undefined {
  const m = HEAD.exec(source)!;
  return m[1] && m[2] ? { name: m[1], end: m[0].length } : undefined;
}

/** Columns in a `name = expr` source: where the expression starts (0-based offset). */
export function exprOffset(source: string): number {
  return assignedName(source)?.end ?? 0;
}

/** Reads `name = rest`; `what` names the right-hand side in messages. */
export function parseAssignment(source: string, what: string): ParsedSource<{ name: string; rest: string }> {
  const m = HEAD.exec(source)!;
  if (!m[1]) return { ok: false, message: 'start with the cell name, then = (e.g. M_u = 1.2 M_D + 1.6 M_L)', column: source.length - source.trimStart().length + 1 };
  if (!m[2]) return { ok: false, message: `put = after the name ${m[1]}`, column: m[0].length + 1 };
  const rest = source.slice(m[0].length).trim();
  if (rest === '') return { ok: false, message: `the ${what} after = is empty`, column: source.length + 1 };
  return { ok: true, value: { name: m[1], rest } };
}

/** The reference texts for the margin: the cell's own clause first, then library clauses, no repeats. */
export function marginRefs(clause: string | undefined, state: CellState | undefined): string[] {
  const refs = [clause, ...(state?.clauses ?? [])].filter((r): r is string => !!r && r.trim() !== '');
  return [...new Set(refs)];
}

/** The view status for an engine state. */
export function statusOf(state: CellState | undefined): ViewStatus {
  if (!state) return 'pending';
  return state.status;
}

/** The error part of a view, from the engine state and the source it refers to. */
export function errorOf(state: CellState | undefined, source: string): CellViewBase['error'] {
  const e = state?.error;
  if (!e || state?.status !== 'error') return undefined;
  return { message: e.message, kind: e.kind, source, column: e.column };
}

/** HTML shared by every kind: the inline error message with a marker at its column. */
export function renderError(error: CellViewBase['error']): string {
  if (!error) return '';
  let where = '';
  if (error.source !== undefined && error.column !== undefined && error.column >= 1) {
    const at = Math.min(error.column - 1, error.source.length);
    where = `<code class="err-src">${escapeHtml(error.source.slice(0, at))}<mark class="err-at" title="here">${
      escapeHtml(error.source.slice(at, at + 1) || ' ')}</mark>${escapeHtml(error.source.slice(at + 1))}</code>`;
  }
  const lead = error.kind === 'upstream' ? 'Waiting on' : 'Problem';
  return `<div class="cell-error" role="alert"><span class="err-glyph" aria-hidden="true">⚠</span> <strong>${lead}:</strong> ${
    escapeHtml(error.message)}${where}</div>`;
}

/** HTML for the right-margin references. */
export function renderRefs(refs: string[]): string {
  if (refs.length === 0) return '<aside class="cell-ref"></aside>';
  return `<aside class="cell-ref">${refs.map((r) => `<span>${escapeHtml(r)}</span>`).join('')}</aside>`;
}

/** HTML for the left-margin number. */
export function renderNumber(number: string): string {
  return `<div class="cell-no">${escapeHtml(number)}</div>`;
}

/** The label line above a cell's math. */
export function renderLabel(label: string | undefined): string {
  return label ? `<div class="cell-label">${escapeHtml(label)}</div>` : '';
}
