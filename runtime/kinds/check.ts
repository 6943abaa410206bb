// Check: a demand against a capacity (or any condition). Shows the condition, the
// values, the ratio as a figure and a bar, and the outcome as a word and a glyph, so it
// reads without colour.

import type { CheckCell } from '../document';
import type { CellState } from '../engine-types';
import { checkFormat } from '../format/kinds/check';
import { structuralProblem } from '../formula/compile-check';
import { checkProgram } from '../graph/cell-program';
import { settleCheck } from '../graph/cell-state';
import { checkTex, nameTex, ratioText } from '../handcalc/index';
import { labelHtml, liveFrame, recordFrame, renderLabel, statusOf, type CellViewBase, type ViewContext } from '../present/cell-frame';
import { errorHtml, errorOf, renderError } from '../present/error-line';
import { escapeHtml } from '../present/escape';
import { marginRefs } from '../present/margin';
import { done } from '../present/result';
import { handCalcHtml } from '../present/tex-live';
import { unitText } from '../present/units-text';
import { ratioBarPercent, STATUS_WORDS, statusText } from '../present/words';
import { HANDCALC_LIMIT, texHtml as mathml } from '../record/tex';
import { foldedWorkingsHtml } from '../working/sheet';
import { assignedName, CLAUSE_FIELD, exprRefs, LABEL_FIELD, liveView, renameInCellExpr, errorInExpr } from './shared';
import type { KindDescription } from './types';

export interface CheckView extends CellViewBase {
  kind: 'check';
  name?: string;
  /** Symbol of a named check, or ''. */
  symbol: string;
  /** Condition, values and ratio, each a step of the line. */
  steps: { rel: string; tex: string }[];
  /** The condition and its values in plain words, for screen readers. */
  reading: string;
  ratio?: number;
  demand?: string;
  capacity?: string;
  /** 'pass' / 'fail' once computed. */
  verdict?: 'pass' | 'fail';
  /** Folds for the working of each library call (runtime/working/sheet.ts). */
  workings?: string;
}

export function bindCheck(cell: CheckCell, ctx: ViewContext): CheckView {
  const state = ctx.state(cell.id);
  const t = checkTex(cell.expr, state, ctx.scope);
  const steps = [
    { rel: '', tex: t.condition },
    ...(t.substituted ? [{ rel: '\\Rightarrow', tex: t.substituted }] : []),
    ...(t.ratio ? [{ rel: '\\quad', tex: t.ratio }] : []),
  ];
  const verdict = state?.status === 'ok' ? 'pass' : state?.status === 'fail' ? 'fail' : undefined;
  return {
    id: cell.id, kind: 'check', status: statusOf(state), number: ctx.number, label: cell.label,
    refs: marginRefs(cell.clause, state), error: errorOf(state, cell.expr), name: cell.name,
    symbol: cell.name ? `${nameTex(cell.name)}:` : '', steps,
    reading: `${cell.expr}${state?.demand && state.capacity ? `: ${state.demand.text} against ${state.capacity.text}` : ''}`,
    ratio: state?.ratio, demand: state?.demand?.text, capacity: state?.capacity?.text, verdict,
    workings: foldedWorkingsHtml(cell.expr),
  };
}

export function renderCheck(v: CheckView): string {
  return liveFrame(v, `${renderLabel(v.label)}<div class="cell-math" data-act="open">${
    handCalcHtml(v.symbol, v.steps, v.reading)}</div>${renderVerdict(v)}${renderError(v.error)}${v.workings ?? ''}`);
}

/** Live: outcome row: glyph + word, ratio figure and a bar with a mark at 1.00. */
export function renderVerdict(v: CheckView): string {
  if (!v.verdict) return '';
  const { word, glyph } = STATUS_WORDS[v.verdict === 'pass' ? 'ok' : 'fail'];
  let ratio = '';
  if (v.ratio !== undefined) {
    const pct = ratioBarPercent(v.ratio);
    ratio = `<span class="ratio-fig">ratio ${escapeHtml(ratioText(v.ratio))}</span><span class="ratio-bar" role="meter" aria-label="demand over capacity" aria-valuemin="0" aria-valuemax="1" aria-valuenow="${
      Number.isFinite(v.ratio) ? v.ratio.toFixed(3) : '999'}"><span class="ratio-fill" style="width:${pct.toFixed(1)}%"></span><span class="ratio-one"></span></span>`;
  }
  const dc = v.demand && v.capacity
    ? `<span class="dc">demand ${escapeHtml(unitText(v.demand))} · capacity ${escapeHtml(unitText(v.capacity))}</span>`
    : '';
  return `<div class="verdict verdict-${v.verdict}"><span class="verdict-word"><span class="glyph" aria-hidden="true">${glyph}</span> ${word}</span>${ratio}${dc}</div>`;
}

/** Record: the outcome line under the check. */
function verdictHtml(s: CellState | undefined): string {
  if (!done(s)) return '';
  const ok = s!.status === 'ok';
  const ratio = s!.ratio !== undefined ? ` <span class="lt-ratio">ratio ${escapeHtml(ratioText(s!.ratio))}</span>` : '';
  const dc = s!.demand && s!.capacity
    ? ` <span class="lt-dc">demand ${escapeHtml(unitText(s!.demand.text))} · capacity ${escapeHtml(unitText(s!.capacity.text))}</span>` : '';
  return `<p class="lt-verdict lt-${ok ? 'pass' : 'fail'}"><strong>${statusText(s!.status)}</strong>${ratio}${dc}</p>`;
}

/** Record: the condition, values and ratio on one line, then the outcome. */
function recordBody(cell: CheckCell, ctx: ViewContext): string {
  const s = ctx.state(cell.id);
  let eq: string;
  if (cell.expr.length > HANDCALC_LIMIT) eq = `<code class="lt-tex-raw">${escapeHtml(cell.expr.slice(0, 200))}…</code>`;
  else {
    const t = checkTex(cell.expr, s, ctx.scope);
    const head = cell.name ? `${nameTex(cell.name)}:\\;` : '';
    eq = mathml(head + [t.condition, t.substituted && `\\Rightarrow\\; ${t.substituted}`, t.ratio].filter(Boolean).join('\\qquad '), true);
  }
  return `${labelHtml(cell.label)}<div class="lt-eq">${eq}</div>${verdictHtml(s)}${errorHtml(s)}${ctx.workings?.(cell) ?? ''}`;
}

/** Record: the result column of a check. */
function recordResult(s: CellState | undefined): string {
  if (s?.status === 'error') return '<span class="lt-res-err">error</span>';
  if (!done(s)) return '<span class="lt-res-none">—</span>';
  return `${statusText(s!.status)}${s!.ratio !== undefined ? `<br>${escapeHtml(ratioText(s!.ratio))}` : ''}`;
}

export const check: KindDescription<'check'> = {
  kind: 'check',
  stem: 'k',
  blank: (id) => ({ id, kind: 'check', expr: '1 <= 2' }),
  named: 'optional',
  fields: [LABEL_FIELD, CLAUSE_FIELD],
  refs: (cell) => exprRefs(cell.expr),
  rename: renameInCellExpr,
  format: checkFormat,
  source: {
    mode: 'formula',
    write: (cell) => (cell.name ? `${cell.name} = ${cell.expr}` : cell.expr),
    read(source) {
      const head = assignedName(source);
      const expr = (head ? source.slice(head.end) : source).trim();
      if (expr === '') return { ok: false, message: 'a check needs a condition, e.g. V_u <= phi_Vc', column: source.length + 1 };
      return { ok: true, value: head ? { name: head.name, expr } : { expr } };
    },
    owns: ['name', 'expr'],
    errorAt: errorInExpr,
  },
  numbering: 'item',
  program: {
    compile: (cell, env) => checkProgram(cell, env.scope(cell.expr), (node) => env.unitOfNode(node), env.system),
    ownProblem: (cell, env) => structuralProblem(cell.expr, env.functions),
    settle: (_cell, program, value, state) => settleCheck(program, value, state),
    followsUnits: true,
  },
  summaryTitle: (cell) => cell.label || cell.name || cell.expr,
  live: liveView(bindCheck, renderCheck),
  record: (cell, ctx) => recordFrame(cell, ctx, recordBody(cell, ctx), recordResult(ctx.state(cell.id)), 'pending'),
};
