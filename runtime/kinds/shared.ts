// Pieces several kinds' descriptions share: the names a formula reads, renaming them,
// and reading a `name = rest` source.

import { parseFormula, symbolNames } from '../formula/parse';
import { NAME_PATTERN, renameUses } from '../formula/tokens';
import type { CellViewBase, ViewContext } from '../present/cell-frame';
import type { LiveView, ParsedSource } from './types';

/** The names a formula mentions as values ([] when it does not parse: the engine reports that). */
export function exprRefs(expr: string): string[] {
  try {
    return symbolNames(parseFormula(expr));
  } catch {
    return [];
  }
}

/** A cell whose `expr` reads `from`, reading `to` instead (the same object when it does not read it). */
export function renameInCellExpr<C extends { expr: string }>(cell: C, from: string, to: string): C {
  const expr = renameUses(cell.expr, from, to);
  return expr === cell.expr ? cell : { ...cell, expr };
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

/** An engine error's column in the expression (or value) of a `[name =] expr` source, as an offset in the source. */
export function errorInExpr(source: string, column: number): number {
  return exprOffset(source) + column - 1;
}

/** For a kind whose errors point at no column. */
export const NO_ERROR_COLUMN = (): undefined => undefined;

/** Reads `name = rest`; `what` names the right-hand side in messages. */
export function parseAssignment(source: string, what: string): ParsedSource<{ name: string; rest: string }> {
  const m = HEAD.exec(source)!;
  if (!m[1]) return { ok: false, message: 'start with the cell name, then = (e.g. M_u = 1.2 M_D + 1.6 M_L)', column: source.length - source.trimStart().length + 1 };
  if (!m[2]) return { ok: false, message: `put = after the name ${m[1]}`, column: m[0].length + 1 };
  const rest = source.slice(m[0].length).trim();
  if (rest === '') return { ok: false, message: `the ${what} after = is empty`, column: source.length + 1 };
  return { ok: true, value: { name: m[1], rest } };
}

/** The common fields of the editor panel. */
export const LABEL_FIELD = { key: 'label', label: 'Label', size: 36 } as const;
export const CLAUSE_FIELD = { key: 'clause', label: 'Reference', size: 24 } as const;

/** A kind's live drawing from its two steps: the view (plain data) and its HTML. */
export function liveView<C, V extends CellViewBase>(
  bind: (cell: C, ctx: ViewContext) => V,
  render: (view: V) => string,
  fromMarkdown = false,
): (cell: C, ctx: ViewContext) => LiveView {
  return (cell, ctx) => {
    const view = bind(cell, ctx);
    return fromMarkdown ? { status: view.status, html: render(view), fromMarkdown } : { status: view.status, html: render(view) };
  };
}
