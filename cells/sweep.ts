// Sweep cell: a what-if chart — one input varied over a range, results and checks
// plotted across it, the current value and where a check starts to fail marked, and a
// line saying which points lie outside the input's limits (not computed).

import type { SweepCell } from '../runtime/document';
import { parseSweepSource, setSweep, sweepSource, type SweepFields } from '../runtime/figures/edit';
import { renderSweep, type SweepResult } from '../runtime/figures/render';
import {
  errorOf, escapeHtml, marginRefs, orThrow, renderError, renderLabel, renderNumber, renderRefs, statusOf,
  type CellKindModule, type CellViewBase, type ParsedSource,
} from './kind';

export interface SweepView extends CellViewBase {
  kind: 'sweep';
  svg: string;
  /** "3 of 21 points are outside the limits of h (≥ 5 in, ≤ 16 in) …", or '' when none are. */
  outside: string;
}

/** The sentence under the chart when some points lie beyond the input's min/max. */
export function outsideText(r: SweepResult): string {
  const n = r.outside?.length ?? 0;
  if (!n) return '';
  const all = n === r.xs.length;
  return `${all ? `All ${n}` : `${n} of ${r.xs.length}`} points ${n === 1 ? 'is' : 'are'} outside the limits of ${r.input} (${r.limits}): not computed, marked ×.`;
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
      outside: state?.sweep ? outsideText(state.sweep) : '',
    };
  },

  render: (v) =>
    `${renderNumber(v.number)}<div class="cell-body">${renderLabel(v.label)}<figure class="figure-box" data-act="open">${
      v.svg}</figure>${
      v.outside ? `<div class="cell-about" data-role="sweep-outside">${escapeHtml(v.outside)}</div>` : ''}${
      renderError(v.error)}</div>${renderRefs(v.refs)}`,

  edit(doc, id, source) {
    return setSweep(doc, id, orThrow(sweepKind.parse(source)));
  },
};
