// Formula cell: `name = expression`, shown as a hand calc (symbol = formula =
// values put in = result) with its clause in the right margin.

import type { FormulaCell } from '../runtime/document';
import { renameCell, setExpr } from '../runtime/edit/index';
import { formulaTex } from '../runtime/handcalc/index';
import {
  errorOf, orThrow, marginRefs, parseAssignment, renderError, renderLabel, renderNumber, renderRefs, statusOf,
  type CellKindModule, type CellViewBase, type ParsedSource,
} from './kind';
import { handCalcHtml } from './tex';
import { foldedWorkingsHtml } from '../runtime/working/sheet';

export interface FormulaView extends CellViewBase {
  kind: 'formula';
  name: string;
  /** The hand calc as TeX: the symbol, then each step after an = sign. */
  symbol: string;
  parts: string[];
  /** The line in plain words for screen readers: `d = h - cover - db = 7.625 in`. */
  reading: string;
  /** Folds for the working of each library call (runtime/working/sheet.ts). */
  workings?: string;
}

export const formulaKind: CellKindModule<FormulaCell, { name: string; expr: string }, FormulaView> = {
  kind: 'formula',

  parse(source): ParsedSource<{ name: string; expr: string }> {
    const p = parseAssignment(source, 'expression');
    return p.ok ? { ok: true, value: { name: p.value.name, expr: p.value.rest } } : p;
  },

  serialize: (cell) => `${cell.name} = ${cell.expr}`,

  bind(cell, ctx) {
    const state = ctx.state(cell.id);
    const t = formulaTex(cell.name, cell.expr, state, ctx.scope);
    return {
      id: cell.id, kind: 'formula', status: statusOf(state), number: ctx.number, label: cell.label,
      refs: marginRefs(cell.clause, state), error: errorOf(state, cell.expr), name: cell.name,
      symbol: t.symbol, parts: t.parts,
      reading: `${cell.name} = ${cell.expr}${state?.display && (state.status === 'ok' || state.status === 'fail') ? ` = ${state.display.text}` : ''}`,
      workings: foldedWorkingsHtml(cell.expr),
    };
  },

  render: (v) =>
    `${renderNumber(v.number)}<div class="cell-body">${renderLabel(v.label)}<div class="cell-math" data-act="open">${
      handCalcHtml(v.symbol, v.parts.map((p) => ({ rel: '=', tex: p })), v.reading)}</div>${renderError(v.error)}${v.workings ?? ''}</div>${renderRefs(v.refs)}`,

  edit(doc, id, source) {
    const { name, expr } = orThrow(formulaKind.parse(source));
    return setExpr(renameCell(doc, id, name), id, expr);
  },
};
