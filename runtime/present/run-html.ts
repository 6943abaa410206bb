// A run's result table, once for both faces: a row per row of the table run (its key,
// each result in its display unit, a check as its ratio, the governing check and its
// ratio, the status in words). On the live sheet the key opens that row's trace.

import { displayNumber, displayOther } from '../formula/display';
import type { RunColumn, RunTrace, RunValue } from '../table/types';
import { escapeHtml } from './escape';
import { unitText } from './units-text';
import { statusText } from './words';

/** "30 rows: 2 NOT OK; governing C-4, punch_ok 1.07" */
export function runSummaryText(r: RunValue): string {
  const n = r.traces.length;
  const verdict = r.failing ? `${r.failing} NOT OK` : r.errors ? `${r.errors} in error` : 'all OK';
  const worst = r.worst ? `; governing ${r.traces[r.worst.row].key}, ${r.worst.name} ${r.worst.ratio.toFixed(2)}` : '';
  return `${n} row${n === 1 ? '' : 's'}: ${verdict}${r.errors && r.failing ? `, ${r.errors} in error` : ''}${worst}`;
}

/** One result of one row as people read it ('—' when it has none). */
export function resultText(c: RunColumn, v: unknown): string {
  if (v === undefined) return '—';
  if (typeof v === 'number') return unitText(c.kind === 'check' ? v.toFixed(2) : displayNumber(v, c.unit).text);
  if (typeof v === 'string' || typeof v === 'boolean') return displayOther(v).text;
  return 'table';
}

function rowHtml(r: RunValue, tr: RunTrace, row: number, live: boolean): string {
  const key = live
    ? `<button type="button" class="run-key" data-act="trace" data-row="${row}" title="Open the trace of ${escapeHtml(tr.key)}">${escapeHtml(tr.key)}</button>`
    : escapeHtml(tr.key);
  const cells = r.results.map((c, k) => `<td>${escapeHtml(resultText(c, tr.results[k]))}</td>`).join('');
  const gov = tr.governing ? `${escapeHtml(tr.governing.name)} ${tr.governing.ratio.toFixed(2)}` : '—';
  return `<tr class="st-${tr.status}" data-row="${row}"><th scope="row">${key}</th>${cells}<td>${gov}</td><td class="run-status">${escapeHtml(statusText(tr.status))}</td></tr>`;
}

/** The result table; `live` makes each key a button that opens the row's trace. */
export function runTableHtml(r: RunValue, live: boolean): string {
  const units = (c: RunColumn) => (c.unit ? `<span class="tbl-unit">${escapeHtml(unitText(c.unit))}</span>` : c.kind === 'check' ? '<span class="tbl-unit">ratio</span>' : '');
  const head = `<tr><th scope="col">${escapeHtml(r.table)}</th>${r.results.map((c) => `<th scope="col">${escapeHtml(c.name)}${units(c)}</th>`).join('')}<th scope="col">governing</th><th scope="col">status</th></tr>`;
  const body = r.traces.map((tr, row) => rowHtml(r, tr, row, live)).join('');
  return live
    ? `<div class="tbl-wrap"><table class="data-table run-table" data-run="${escapeHtml(r.name)}"><thead>${head}</thead><tbody>${body}</tbody></table></div>`
    : `<table class="lt-table lt-run"><thead>${head}</thead><tbody>${body}</tbody></table>`;
}
