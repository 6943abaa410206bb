// Sweep: a what-if chart — one input varied over a range, results and checks plotted
// across it, the current value and where a check starts to fail marked, and a line
// saying which points lie outside the input's limits (not computed). Its source is one
// line a person types: `h from 6 in to 12 in steps 12 plot punch_ok, phiVc`.

import type { SweepCell } from '../document';
import { renderSweep, type SweepResult } from '../figures/render';
import { sweepFormat } from '../format/kinds/sweep';
import { isName, NAME_PATTERN } from '../formula/tokens';
import { settleSweep } from '../graph/cell-state';
import { sweepProgram } from '../graph/sweep-program';
import { liveFrame, renderLabel, statusOf, type CellViewBase, type ViewContext } from '../present/cell-frame';
import { recordDrawing } from '../present/drawing';
import { errorOf, renderError } from '../present/error-line';
import { escapeHtml } from '../present/escape';
import { marginRefs } from '../present/margin';
import { CLAUSE_FIELD, LABEL_FIELD, liveView, NO_ERROR_COLUMN } from './shared';
import type { KindDescription, ParsedSource } from './types';

export type SweepFields = Pick<SweepCell, 'input' | 'from' | 'to' | 'outputs'> & { steps?: number };

export function sweepSource(c: Pick<SweepCell, 'input' | 'from' | 'to' | 'steps' | 'outputs'>): string {
  return `${c.input} from ${c.from} to ${c.to}${c.steps === undefined ? '' : ` steps ${c.steps}`} plot ${c.outputs.join(', ')}`;
}

const SOURCE = new RegExp(String.raw`^\s*(${NAME_PATTERN})\s+from\s+(.+?)\s+to\s+(.+?)(?:\s+steps\s+(\d+))?\s+plot\s+(.+?)\s*$`);

/** Reads the sweep source, or says what is missing (column 1-based). */
export function parseSweepSource(source: string): ParsedSource<SweepFields> {
  const m = SOURCE.exec(source);
  if (!m) {
    const missing = !/^\s*[A-Za-z_]/.test(source) ? 'start with the input to vary'
      : !/\sfrom\s/.test(source) ? 'write "from" and the first value'
      : !/\sto\s/.test(source) ? 'write "to" and the last value'
      : 'write "plot" and the results or checks to plot';
    return { ok: false, message: `${missing}, e.g. h from 6 in to 12 in steps 12 plot punch_ok, phiVc`, column: 1 };
  }
  const outputs = m[5].split(',').map((s) => s.trim()).filter(Boolean);
  const bad = outputs.find((o) => !isName(o));
  if (bad !== undefined) return { ok: false, message: `"${bad}" is not a cell name`, column: source.indexOf(bad) + 1 };
  const value: SweepFields = { input: m[1], from: m[2], to: m[3], outputs };
  if (m[4] !== undefined) value.steps = Number(m[4]);
  return { ok: true, value };
}

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

export function bindSweep(cell: SweepCell, ctx: ViewContext): SweepView {
  const state = ctx.state(cell.id);
  return {
    id: cell.id, kind: 'sweep', status: statusOf(state), number: ctx.number, label: cell.label,
    refs: marginRefs(cell.clause, state), error: errorOf(state, sweepSource(cell)),
    svg: state?.sweep ? renderSweep(state.sweep, cell.label ?? '') : '',
    outside: state?.sweep ? outsideText(state.sweep) : '',
  };
}

export function renderSweepView(v: SweepView): string {
  return liveFrame(v, `${renderLabel(v.label)}<figure class="figure-box" data-act="open">${v.svg}</figure>${
    v.outside ? `<div class="cell-about" data-role="sweep-outside">${escapeHtml(v.outside)}</div>` : ''}${renderError(v.error)}`);
}

export const sweep: KindDescription<'sweep'> = {
  kind: 'sweep',
  stem: 'w',
  blank: (id) => ({ id, kind: 'sweep', input: '', from: '', to: '', outputs: [] }),
  named: false,
  fields: [LABEL_FIELD, CLAUSE_FIELD],
  // A sweep names its input and outputs outright.
  refs: (cell) => [...new Set([cell.input, ...cell.outputs].filter((n) => n !== ''))],
  rename: (cell, from, to) => (cell.input !== from && !cell.outputs.includes(from) ? cell
    : { ...cell, input: cell.input === from ? to : cell.input, outputs: cell.outputs.map((o) => (o === from ? to : o)) }),
  format: sweepFormat,
  source: { mode: 'formula', write: sweepSource, read: parseSweepSource, owns: ['input', 'from', 'to', 'steps', 'outputs'], errorAt: NO_ERROR_COLUMN },
  numbering: 'item',
  program: {
    compile: (cell, env) => sweepProgram(cell, (n) => env.sweepInfo(n), env.whatIf),
    settle: (_cell, _program, value, state) => settleSweep(value, state),
    followsUnits: false,
  },
  summaryTitle: null,
  live: liveView(bindSweep, renderSweepView),
  record: (cell, ctx) => {
    const s = ctx.state(cell.id);
    return recordDrawing(cell, ctx, '', s?.sweep ? renderSweep(s.sweep, cell.label ?? '') : '');
  },
};
