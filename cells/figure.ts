// Figure cell: an expression calling a figure function (punching_plan, footing_drawing,
// plate_map, load_path), drawn as SVG from the engine's spec; re-drawn when it changes.

import type { FigureCell } from '../runtime/document';
import { setFigureExpr } from '../runtime/figures/edit';
import { renderFigure } from '../runtime/figures/render';
import {
  errorOf, marginRefs, orThrow, renderError, renderLabel, renderNumber, renderRefs, statusOf,
  type CellKindModule, type CellViewBase, type ParsedSource,
} from './kind';

export interface FigureView extends CellViewBase {
  kind: 'figure';
  /** The drawing (our own renderer: every text in it escaped), or '' until computed. */
  svg: string;
}

export const figureKind: CellKindModule<FigureCell, { expr: string }, FigureView> = {
  kind: 'figure',

  parse(source): ParsedSource<{ expr: string }> {
    const expr = source.trim();
    if (expr === '') return { ok: false, message: 'a figure calls a figure function, e.g. punching_plan(c1, c2, d, position)', column: 1 };
    return { ok: true, value: { expr } };
  },

  serialize: (cell) => cell.expr,

  bind(cell, ctx) {
    const state = ctx.state(cell.id);
    return {
      id: cell.id, kind: 'figure', status: statusOf(state), number: ctx.number, label: cell.label,
      refs: marginRefs(cell.clause, state), error: errorOf(state, cell.expr),
      svg: state?.figure ? renderFigure(state.figure) : '',
    };
  },

  render: (v) =>
    `${renderNumber(v.number)}<div class="cell-body">${renderLabel(v.label)}<figure class="figure-box" data-act="open">${
      v.svg}</figure>${renderError(v.error)}</div>${renderRefs(v.refs)}`,

  edit(doc, id, source) {
    return setFigureExpr(doc, id, orThrow(figureKind.parse(source)).expr);
  },
};
