// Formula: `name = expression`, shown as a hand calc (symbol = formula = values put
// in = result) with its clause in the right margin.

import type { FormulaCell } from '../document';
import { formulaFormat } from '../format/kinds/formula';
import { structuralProblem } from '../formula/compile-check';
import { formulaProgram } from '../graph/cell-program';
import { settleValue } from '../graph/cell-state';
import { formulaTex } from '../handcalc/index';
import { labelHtml, liveFrame, recordFrame, renderLabel, statusOf, type CellViewBase, type ViewContext } from '../present/cell-frame';
import { errorHtml, errorOf, renderError } from '../present/error-line';
import { escapeHtml } from '../present/escape';
import { marginRefs } from '../present/margin';
import { longText, resultHtml } from '../present/result';
import { handCalcHtml } from '../present/tex-live';
import { HANDCALC_LIMIT, texHtml as mathml } from '../record/tex';
import { foldedWorkingsHtml } from '../working/sheet';
import { CLAUSE_FIELD, exprRefs, LABEL_FIELD, liveView, parseAssignment, renameInCellExpr, errorInExpr } from './shared';
import type { KindDescription } from './types';

/** Record: beyond this many characters of formula the hand calc is set one step a row (a printed line is narrow). */
const LONG_FORMULA = 24;
/** Or when the whole hand calc on one line is longer than this much TeX. */
const LONG_LINE = 110;

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

export function bindFormula(cell: FormulaCell, ctx: ViewContext): FormulaView {
  const state = ctx.state(cell.id);
  const t = formulaTex(cell.name, cell.expr, state, ctx.scope);
  return {
    id: cell.id, kind: 'formula', status: statusOf(state), number: ctx.number, label: cell.label,
    refs: marginRefs(cell.clause, state), error: errorOf(state, cell.expr), name: cell.name,
    symbol: t.symbol, parts: t.parts,
    reading: `${cell.name} = ${cell.expr}${state?.display && (state.status === 'ok' || state.status === 'fail') ? ` = ${state.display.text}` : ''}`,
    workings: foldedWorkingsHtml(cell.expr),
  };
}

export function renderFormula(v: FormulaView): string {
  return liveFrame(v, `${renderLabel(v.label)}<div class="cell-math" data-act="open">${
    handCalcHtml(v.symbol, v.parts.map((p) => ({ rel: '=', tex: p })), v.reading)}</div>${renderError(v.error)}${v.workings ?? ''}`);
}

/** Record: the hand calc, one step a row when it is long; a long text result as a sentence under it. */
function recordBody(cell: FormulaCell, ctx: ViewContext): string {
  const s = ctx.state(cell.id);
  let eq: string;
  if (cell.expr.length > HANDCALC_LIMIT) {
    eq = `<code class="lt-tex-raw">${escapeHtml(cell.name)} = ${escapeHtml(cell.expr.slice(0, 200))}…</code>`;
  } else if (longText(s)) {
    const t = formulaTex(cell.name, cell.expr, undefined, ctx.scope);
    eq = `${mathml(t.line, true)}<p class="lt-textres">= ${escapeHtml(s!.display!.text)}</p>`;
  } else {
    const t = formulaTex(cell.name, cell.expr, s, ctx.scope);
    // One step a line, each its own equation (MathML Core has no column alignment for `aligned`).
    eq = t.parts.length > 2 && (cell.expr.length > LONG_FORMULA || t.line.length > LONG_LINE)
      ? t.parts.map((p, i) => mathml(i === 0 ? `${t.symbol} = ${p}` : `\\qquad = ${p}`, true)).join('')
      : mathml(t.line, true);
  }
  return `${labelHtml(cell.label)}<div class="lt-eq">${eq}</div>${errorHtml(s)}${ctx.workings?.(cell) ?? ''}`;
}

export const formula: KindDescription<'formula'> = {
  kind: 'formula',
  stem: 'f',
  blank: (id, freshName) => ({ id, kind: 'formula', name: freshName('y'), expr: '1' }),
  named: 'required',
  fields: [
    LABEL_FIELD,
    { key: 'unit', label: 'Display unit', size: 10, hint: 'e.g. kip*ft' },
    {
      key: 'precision', label: 'Sig. figures', size: 3, type: 'integer',
      check: (v) => (Number.isInteger(v) && (v as number) >= 1 && (v as number) <= 15
        ? undefined : 'precision is a whole number of significant figures from 1 to 15'),
    },
    CLAUSE_FIELD,
  ],
  refs: (cell) => exprRefs(cell.expr),
  rename: renameInCellExpr,
  format: formulaFormat,
  source: {
    mode: 'formula',
    write: (cell) => `${cell.name} = ${cell.expr}`,
    read(source) {
      const p = parseAssignment(source, 'expression');
      return p.ok ? { ok: true, value: { name: p.value.name, expr: p.value.rest } } : p;
    },
    owns: ['name', 'expr'],
    errorAt: errorInExpr,
  },
  numbering: 'item',
  program: {
    compile: (cell, env) => formulaProgram(cell, env.scope(cell.expr)),
    ownProblem: (cell, env) => structuralProblem(cell.expr, env.functions),
    settle: (cell, program, value, state) => settleValue(program, value, state, cell.precision),
    followsUnits: false,
  },
  summaryTitle: null,
  live: liveView(bindFormula, renderFormula),
  record: (cell, ctx) => recordFrame(cell, ctx, recordBody(cell, ctx), resultHtml(ctx.state(cell.id)), 'pending'),
};
