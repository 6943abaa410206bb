// Input cell: a value typed by the engineer (`f_c = 5000 psi`, `h = 1'-6"`), edited
// where it stands. The value is kept exactly as typed; the engine shows it in the
// cell's display unit and, when it is bad, keeps computing with the last good one.

import type { InputCell } from '../runtime/document';
import { renameCell, setInputValue } from '../runtime/edit/index';
import { nameTex } from '../runtime/handcalc/index';
import {
  errorOf, escapeHtml, marginRefs, prettyUnits, orThrow, parseAssignment, renderError, renderLabel, renderNumber, renderRefs,
  statusOf, type CellKindModule, type CellViewBase, type ParsedSource,
} from './kind';
import { texHtml } from './tex';

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

export const inputKind: CellKindModule<InputCell, { name: string; value: string }, InputView> = {
  kind: 'input',

  parse(source): ParsedSource<{ name: string; value: string }> {
    const p = parseAssignment(source, 'value');
    return p.ok ? { ok: true, value: { name: p.value.name, value: p.value.rest } } : p;
  },

  serialize: (cell) => `${cell.name} = ${cell.value}`,

  bind(cell, ctx) {
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
  },

  render(v) {
    const aria = escapeHtml(v.label ? `${v.label} (${v.name})` : v.name);
    const field = v.choices
      ? `<select class="value-field" data-act="value" aria-label="${aria}">${
        v.choices.map((c) => `<option${c === v.value ? ' selected' : ''}>${escapeHtml(c)}</option>`).join('')}${
        v.choices.includes(v.value) ? '' : `<option selected>${escapeHtml(v.value)}</option>`}</select>`
      : `<input class="value-field" data-act="value" aria-label="${aria}" spellcheck="false" autocomplete="off" value="${
        escapeHtml(v.value)}" size="${Math.max(6, Math.min(28, v.value.length + 2))}">`;
    const shown = !v.shown ? ''
      : v.stale ? `<span class="as-shown stale">still computing with ${escapeHtml(prettyUnits(v.shown))}</span>`
        : `<span class="as-shown">= ${escapeHtml(prettyUnits(v.shown))}</span>`;
    const about = v.description || v.range
      ? `<div class="cell-about">${escapeHtml(v.description ?? '')}${v.range ? ` <span class="range">(${escapeHtml(v.range)})</span>` : ''}</div>`
      : '';
    return `${renderNumber(v.number)}<div class="cell-body">${renderLabel(v.label)}<div class="cell-math input-line"><span class="sym" aria-hidden="true">${
      texHtml(v.symbolTex)}</span><span class="eq">=</span>${field}${shown}</div>${about}${renderError(v.error)}</div>${renderRefs(v.refs)}`;
  },

  edit(doc, id, source) {
    const { name, value } = orThrow(inputKind.parse(source));
    const renamed = renameCell(doc, id, name);
    return setInputValue(renamed, id, value);
  },
};
