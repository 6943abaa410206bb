// Figure: an expression calling a figure function (punching_plan, footing_drawing,
// plate_map, load_path), drawn as SVG from the engine's spec; re-drawn when it changes.

import type { FigureCell } from '../document';
import { renderFigure } from '../figures/render';
import { figureFormat } from '../format/kinds/figure';
import { settleFigure } from '../graph/cell-state';
import { figureProgram } from '../graph/figure-program';
import { liveFrame, renderLabel, statusOf, type CellViewBase, type ViewContext } from '../present/cell-frame';
import { recordDrawing } from '../present/drawing';
import { errorOf, renderError } from '../present/error-line';
import { marginRefs } from '../present/margin';
import { CLAUSE_FIELD, exprRefs, LABEL_FIELD, liveView, renameInCellExpr, errorInExpr } from './shared';
import type { KindDescription } from './types';

export interface FigureView extends CellViewBase {
  kind: 'figure';
  /** The drawing (our own renderer: every text in it escaped), or '' until computed. */
  svg: string;
}

export function bindFigure(cell: FigureCell, ctx: ViewContext): FigureView {
  const state = ctx.state(cell.id);
  return {
    id: cell.id, kind: 'figure', status: statusOf(state), number: ctx.number, label: cell.label,
    refs: marginRefs(cell.clause, state), error: errorOf(state, cell.expr),
    svg: state?.figure ? renderFigure(state.figure) : '',
  };
}

export function renderFigureView(v: FigureView): string {
  return liveFrame(v, `${renderLabel(v.label)}<figure class="figure-box" data-act="open">${v.svg}</figure>${renderError(v.error)}`);
}

export const figure: KindDescription<'figure'> = {
  kind: 'figure',
  stem: 'g',
  blank: (id) => ({ id, kind: 'figure', expr: 'punching_plan(12 in, 12 in, 6 in, "interior")' }),
  named: false,
  fields: [LABEL_FIELD, CLAUSE_FIELD],
  refs: (cell) => exprRefs(cell.expr),
  rename: renameInCellExpr,
  format: figureFormat,
  source: {
    mode: 'formula',
    write: (cell) => cell.expr,
    read(source) {
      const expr = source.trim();
      if (expr === '') return { ok: false, message: 'a figure calls a figure function, e.g. punching_plan(c1, c2, d, position)', column: 1 };
      return { ok: true, value: { expr } };
    },
    owns: ['expr'],
    errorAt: errorInExpr,
  },
  numbering: 'item',
  program: {
    compile: (cell, env) => figureProgram(cell, env.scope(cell.expr, true), (n) => env.unitOfName(n)),
    settle: (_cell, _program, value, state) => settleFigure(value, state),
    followsUnits: true,
  },
  summaryTitle: null,
  live: liveView(bindFigure, renderFigureView),
  record: (cell, ctx) => {
    const s = ctx.state(cell.id);
    return recordDrawing(cell, ctx, cell.expr, s?.figure ? renderFigure(s.figure) : '');
  },
};
