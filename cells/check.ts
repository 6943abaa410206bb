// Check cell: a demand against a capacity (or any condition). Shows the condition,
// the values, the ratio as a figure and a bar, and the outcome as a word and a
// glyph, so it reads without colour.

import type { CheckCell } from '../runtime/document';
import { renameCell, setExpr } from '../runtime/edit/index';
import { checkTex, nameTex, ratioText } from '../runtime/handcalc/index';
import {
  assignedName, errorOf, escapeHtml, marginRefs, prettyUnits, orThrow, renderError, renderLabel, renderNumber, renderRefs, statusOf,
  type CellKindModule, type CellViewBase, type ParsedSource,
} from './kind';
import { handCalcHtml } from './tex';
import { foldedWorkingsHtml } from '../runtime/working/sheet';

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

export const checkKind: CellKindModule<CheckCell, { name?: string; expr: string }, CheckView> = {
  kind: 'check',

  parse(source): ParsedSource<{ name?: string; expr: string }> {
    const head = assignedName(source);
    const expr = (head ? source.slice(head.end) : source).trim();
    if (expr === '') return { ok: false, message: 'a check needs a condition, e.g. V_u <= phi_Vc', column: source.length + 1 };
    return { ok: true, value: head ? { name: head.name, expr } : { expr } };
  },

  serialize: (cell) => (cell.name ? `${cell.name} = ${cell.expr}` : cell.expr),

  bind(cell, ctx) {
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
  },

  render(v) {
    return `${renderNumber(v.number)}<div class="cell-body">${renderLabel(v.label)}<div class="cell-math" data-act="open">${
      handCalcHtml(v.symbol, v.steps, v.reading)}</div>${renderVerdict(v)}${renderError(v.error)}${v.workings ?? ''}</div>${renderRefs(v.refs)}`;
  },

  edit(doc, id, source) {
    const { name, expr } = orThrow(checkKind.parse(source));
    return setExpr(renameCell(doc, id, name ?? ''), id, expr);
  },
};

/** Outcome row: glyph + word, ratio figure and a bar with a mark at 1.00. */
export function renderVerdict(v: CheckView): string {
  if (!v.verdict) return '';
  const word = v.verdict === 'pass' ? 'OK' : 'NOT OK';
  const glyph = v.verdict === 'pass' ? '✓' : '✗';
  let ratio = '';
  if (v.ratio !== undefined) {
    const pct = Math.max(0, Math.min(100, (v.ratio / 1.25) * 100)); // bar spans 0 to 1.25
    ratio = `<span class="ratio-fig">ratio ${escapeHtml(ratioText(v.ratio))}</span><span class="ratio-bar" role="meter" aria-label="demand over capacity" aria-valuemin="0" aria-valuemax="1" aria-valuenow="${
      Number.isFinite(v.ratio) ? v.ratio.toFixed(3) : '999'}"><span class="ratio-fill" style="width:${pct.toFixed(1)}%"></span><span class="ratio-one"></span></span>`;
  }
  const dc = v.demand && v.capacity
    ? `<span class="dc">demand ${escapeHtml(prettyUnits(v.demand))} · capacity ${escapeHtml(prettyUnits(v.capacity))}</span>`
    : '';
  return `<div class="verdict verdict-${v.verdict}"><span class="verdict-word"><span class="glyph" aria-hidden="true">${glyph}</span> ${word}</span>${ratio}${dc}</div>`;
}
