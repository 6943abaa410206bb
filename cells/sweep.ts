// Sweep cell: a what-if chart — one input varied over a range, results and checks
// plotted across it, the current value and where a check starts to fail marked.

import type { SweepCell } from '../runtime/document';
import { parseSweepSource, setSweep, sweepSource, type SweepFields } from '../runtime/figures/edit';
import { renderSweep } from '../runtime/figures/render';
import {
  errorOf, marginRefs, orThrow, renderError, renderLabel, renderNumber, renderRefs, statusOf,
  type CellKindModule, type CellViewBase, type ParsedSource,
} from './kind';

export interface SweepView extends CellViewBase {
  kind: 'sweep';
  svg: string;
}

export const sweepKind: CellKindModule<SweepCell, SweepFields, SweepView> = {
  kind: 'sweep',

  parse: (source): ParsedSource<SweepFields> => parseSweepSource(source),

  serialize: (cell) => sweepSource(cell),

  bind(cell, ctx) {
    const state = ctx.state(cell.id);
    return {
      id: cell.id, kind: 'sweep', status: statusOf(state), number: ctx.number, label: cell.label,
      refs: marginRefs(cell.clause, state), error: errorOf(state, sweepSource(cell)),
      svg: state?.sweep ? renderSweep(state.sweep, cell.label ?? '') : '',
    };
  },

  render: (v) =>
    `${renderNumber(v.number)}<div class="cell-body">${renderLabel(v.label)}<figure class="figure-box" data-act="open">${
      v.svg}</figure>${renderError(v.error)}</div>${renderRefs(v.refs)}`,

  edit(doc, id, source) {
    return setSweep(doc, id, orThrow(sweepKind.parse(source)));
  },
};
