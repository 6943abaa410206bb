// Side-by-side tables of a comparison (issued vs current, or one record vs another)
// and the one-line marks shown on each changed cell in review mode. HTML strings
// from escaped text, so they render the same in the page and in tests.

import { changeName, type Comparison, type InputChange, type ResultChange } from '../../runtime/review/index';
import type { IssuedResult } from '../../runtime/review/types';
import { deltaText } from '../../runtime/review/diff-text';
import { escapeHtml } from '../../runtime/present/escape';
import { cellOfKey } from '../../runtime/review/table-inputs';

const VERDICT: Record<IssuedResult['status'], string> = { ok: 'OK', fail: 'NOT OK', error: 'error', pending: 'pending' };

/** A result as shown in a cell of the table: its text, and for a check its verdict in words. */
export function resultText(r: IssuedResult | undefined, check: boolean): string {
  if (!r) return '—';
  if (r.status === 'error' || r.status === 'pending') return VERDICT[r.status];
  return check ? `${r.text ?? ''} ${VERDICT[r.status]}`.trim() : (r.text ?? '');
}

// A table's value goes to its table.
const link = (key: string, text: string): string => {
  const id = cellOfKey(key);
  return `<a href="#cell-${escapeHtml(id)}" data-goto="${escapeHtml(id)}">${escapeHtml(text)}</a>`;
};

/** A row's name as calc --diff gives it: an unnamed check by its label. */
function nameCell(r: { id: string; name?: string; label?: string }): string {
  return link(r.id, changeName(r));
}

function verdictClass(r: IssuedResult | undefined): string {
  return r ? ` st-${r.status}` : '';
}

function inputRow(r: InputChange): string {
  const cls = r.changed ? 'rv-changed' : 'rv-same';
  return `<tr class="${cls}"><td>${nameCell(r)}</td><td>${escapeHtml(r.before ?? '—')}</td><td class="rv-arrow" aria-hidden="true">→</td><td>${
    escapeHtml(r.after ?? '—')}</td></tr>`;
}

function resultRow(r: ResultChange, check: boolean): string {
  const cls = r.changed ? 'rv-changed' : 'rv-same';
  const delta = check ? `<td class="rv-delta">${escapeHtml(deltaText(r.deltaRatio))}</td>` : '';
  return `<tr class="${cls}"><td>${nameCell(r)}</td><td class="rv-val${verdictClass(r.before)}">${escapeHtml(resultText(r.before, check))}</td>`
    + `<td class="rv-arrow" aria-hidden="true">→</td><td class="rv-val${verdictClass(r.after)}">${escapeHtml(resultText(r.after, check))}</td>${delta}</tr>`;
}

function table(title: string, left: string, right: string, rows: string[], extra = ''): string {
  if (rows.length === 0) return '';
  return `<table class="rv-table"><caption>${escapeHtml(title)}</caption><thead><tr><th>Name</th><th>${escapeHtml(left)}</th><th></th><th>${
    escapeHtml(right)}</th>${extra}</tr></thead><tbody>${rows.join('')}</tbody></table>`;
}

/** The three tables; with `onlyChanged`, rows that did not change are left out. */
export function comparisonHtml(c: Comparison, left: string, right: string, onlyChanged: boolean): string {
  const keep = <T extends { changed: boolean }>(list: T[]) => (onlyChanged ? list.filter((r) => r.changed) : list);
  const html = table('Inputs', left, right, keep(c.inputs).map(inputRow))
    + table('Results', left, right, keep(c.results).map((r) => resultRow(r, false)))
    + table('Checks', left, right, keep(c.checks).map((r) => resultRow(r, true)), '<th>Δ ratio</th>');
  return html || '<p class="rv-none">No input, result or check differs.</p>';
}

/** "2 inputs, 1 result and 1 check changed" (or "nothing changed"). */
export function changeCount(c: Comparison): string {
  const n = (list: { changed: boolean }[]) => list.filter((r) => r.changed).length;
  const parts = [[n(c.inputs), 'input'], [n(c.results), 'result'], [n(c.checks), 'check']]
    .filter(([k]) => (k as number) > 0)
    .map(([k, w]) => `${k} ${w}${k === 1 ? '' : 's'}`);
  if (parts.length === 0) return 'nothing changed';
  return `${parts.length > 1 ? `${parts.slice(0, -1).join(', ')} and ${parts[parts.length - 1]}` : parts[0]} changed`;
}

/** One line per changed cell for review mode: issued → now, and for a check the change in ratio. */
export function cellMarks(c: Comparison, revision: string): Map<string, string> {
  const marks = new Map<string, string>();
  const issued = `Rev ${revision}`;
  for (const r of c.inputs) {
    if (!r.changed || r.after === undefined) continue;
    const id = cellOfKey(r.id);
    // A table's changed values are listed on the table, each by its row and column.
    const what = id === r.id ? '' : `${escapeHtml(r.name)} `;
    const line = r.before === undefined
      ? `<span class="rv-new">${what}New since ${escapeHtml(issued)}</span>`
      : `<span class="rv-was">${what}${escapeHtml(issued)}: <b>${escapeHtml(r.before)}</b> → now <b>${escapeHtml(r.after)}</b></span>`;
    marks.set(id, (marks.has(id) ? `${marks.get(id)} ` : '') + line);
  }
  for (const [list, check] of [[c.results, false], [c.checks, true]] as const) {
    for (const r of list) {
      if (!r.changed || !r.after) continue;
      if (!r.before) {
        marks.set(r.id, `<span class="rv-new">New since ${escapeHtml(issued)}</span>`);
        continue;
      }
      const delta = check && r.deltaRatio !== undefined ? ` <span class="rv-delta">(Δ ratio ${escapeHtml(deltaText(r.deltaRatio))})</span>` : '';
      marks.set(r.id, `<span class="rv-was">${escapeHtml(issued)}: <b>${escapeHtml(resultText(r.before, check))}</b> → now <b>${
        escapeHtml(resultText(r.after, check))}</b>${delta}</span>`);
    }
  }
  return marks;
}
