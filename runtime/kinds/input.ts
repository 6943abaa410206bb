// Input: a value typed by the engineer (`f_c = 5000 psi`, `h = 1'-6"`), edited where it
// stands. The value is kept exactly as typed; the engine shows it in the cell's display
// unit and, when it is bad, keeps computing with the last good one.

import type { InputCell } from '../document';
import { inputFormat } from '../format/kinds/input';
import { inputProgram } from '../graph/cell-program';
import { settleValue } from '../graph/cell-state';
import { nameTex, quantityTex } from '../handcalc/index';
import { labelHtml, liveFrame, recordFrame, renderLabel, statusOf, type CellViewBase, type ViewContext } from '../present/cell-frame';
import { errorHtml, errorOf, renderError } from '../present/error-line';
import { escapeHtml } from '../present/escape';
import { marginRefs } from '../present/margin';
import { done, resultHtml } from '../present/result';
import { texHtml } from '../present/tex-live';
import { unitText } from '../present/units-text';
import { texHtml as mathml } from '../record/tex';
import { CLAUSE_FIELD, LABEL_FIELD, liveView, parseAssignment, errorInExpr } from './shared';
import type { KindDescription } from './types';

export interface InputView extends CellViewBase {
  kind: 'input';
  name: string;
  symbolTex: string;
  /** As typed. */
  value: string;
  /** As the engine shows it in the display unit, when that reads differently from the typed text. */
  shown?: string;
  /** The shown value is the last good one, kept while the typed text is bad. */
  stale?: boolean;
  choices?: string[];
  description?: string;
  range?: string;
}

function squash(text: string): string {
  return text.replace(/\s+/g, '').replace(/−/g, '-');
}

export function bindInput(cell: InputCell, ctx: ViewContext): InputView {
  const state = ctx.state(cell.id);
  const shownText = state?.display?.text;
  const range = cell.min || cell.max
    ? `${cell.min ? `≥ ${cell.min}` : ''}${cell.min && cell.max ? ', ' : ''}${cell.max ? `≤ ${cell.max}` : ''}`
    : undefined;
  return {
    id: cell.id, kind: 'input', status: statusOf(state), number: ctx.number, label: cell.label,
    refs: marginRefs(cell.clause, state), error: errorOf(state, cell.value),
    name: cell.name, symbolTex: nameTex(cell.name), value: cell.value,
    shown: shownText && squash(shownText) !== squash(cell.value) && !cell.choices ? shownText : undefined,
    stale: state?.status === 'error' && shownText !== undefined,
    choices: cell.choices, description: cell.description, range,
  };
}

export function renderInput(v: InputView): string {
  const aria = escapeHtml(v.label ? `${v.label} (${v.name})` : v.name);
  const field = v.choices
    ? `<select class="value-field" data-act="value" aria-label="${aria}">${
      v.choices.map((c) => `<option${c === v.value ? ' selected' : ''}>${escapeHtml(c)}</option>`).join('')}${
      v.choices.includes(v.value) ? '' : `<option selected>${escapeHtml(v.value)}</option>`}</select>`
    : `<input class="value-field" data-act="value" aria-label="${aria}" spellcheck="false" autocomplete="off" value="${
      escapeHtml(v.value)}" size="${Math.max(6, Math.min(28, v.value.length + 2))}">`;
  const shown = !v.shown ? ''
    : v.stale ? `<span class="as-shown stale">still computing with ${escapeHtml(unitText(v.shown))}</span>`
      : `<span class="as-shown">= ${escapeHtml(unitText(v.shown))}</span>`;
  const about = v.description || v.range
    ? `<div class="cell-about">${escapeHtml(v.description ?? '')}${v.range ? ` <span class="range">(${escapeHtml(v.range)})</span>` : ''}</div>`
    : '';
  return liveFrame(v, `${renderLabel(v.label)}<div class="cell-math input-line"><span class="sym" aria-hidden="true">${
    texHtml(v.symbolTex)}</span><span class="eq">=</span>${field}${shown}</div>${about}${renderError(v.error)}`);
}

/** Record: the input as an equation, its limits and choices, and the value as typed. */
function recordBody(cell: InputCell, ctx: ViewContext): string {
  const s = ctx.state(cell.id);
  const value = done(s) && s!.display ? quantityTex(s!.display) : `\\text{${cell.value.replace(/[\\{}$&#^_%~]/g, '')}}`;
  const eq = mathml(`${nameTex(cell.name)} = ${value}`, false);
  const extra: string[] = [];
  if (cell.choices?.length) extra.push(`one of: ${cell.choices.map(escapeHtml).join(' · ')}`);
  if (cell.min || cell.max) extra.push(`range ${escapeHtml(cell.min ?? '…')} to ${escapeHtml(cell.max ?? '…')}`);
  if (done(s) && s!.display && s!.display.text !== cell.value) extra.push(`as entered: ${escapeHtml(cell.value)}`);
  const about = cell.description ? `<p class="lt-about">${escapeHtml(cell.description)}</p>` : '';
  return `${labelHtml(cell.label)}<div class="lt-eq lt-eq-in">${eq}</div>${
    extra.length ? `<div class="lt-meta">${extra.join('; ')}</div>` : ''}${about}${errorHtml(s)}`;
}

export const input: KindDescription<'input'> = {
  kind: 'input',
  stem: 'i',
  blank: (id, freshName) => ({ id, kind: 'input', name: freshName('x'), value: '1' }),
  named: 'required',
  fields: [
    LABEL_FIELD,
    { key: 'unit', label: 'Display unit', size: 10, hint: 'e.g. in, MPa' },
    { key: 'min', label: 'Least', size: 10 },
    { key: 'max', label: 'Greatest', size: 10 },
    { key: 'choices', label: 'Choices', size: 24, hint: 'comma-separated', type: 'list' },
    { key: 'description', label: 'About', size: 36 },
    CLAUSE_FIELD,
  ],
  refs: () => [],
  rename: (cell) => cell,
  format: inputFormat,
  source: {
    mode: 'formula',
    write: (cell) => `${cell.name} = ${cell.value}`,
    read(source) {
      const p = parseAssignment(source, 'value');
      return p.ok ? { ok: true, value: { name: p.value.name, value: p.value.rest } } : p;
    },
    owns: ['name', 'value'],
    errorAt: errorInExpr,
  },
  numbering: 'item',
  program: {
    compile: (cell, env) => inputProgram(cell, env.previous),
    settle(_cell, program, value, state) {
      settleValue(program, value, state);
      if (state.status !== 'pending' && program?.inputError) {
        // The last good value keeps computing; the bad text is reported here.
        state.status = 'error';
        state.error = program.inputError.toData();
      }
    },
    followsUnits: false,
  },
  summaryTitle: null,
  live: liveView(bindInput, renderInput),
  record: (cell, ctx) => recordFrame(cell, ctx, recordBody(cell, ctx), resultHtml(ctx.state(cell.id)), 'pending'),
};
