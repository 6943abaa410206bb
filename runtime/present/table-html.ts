// A table drawn as HTML, once for both faces: the live sheet's (each value a field typed
// into where it stands, a bad one marked with its message) and the record's (values as
// typed, readable with JavaScript off). Used by tables and by the schedules of runs.

import type { TableCell } from '../document';
import type { TableProblem } from '../table/types';
import { escapeHtml } from './escape';
import { unitText } from './units-text';

/** A column heading: its name, and its unit under it (none for text, numbers, yes/no). */
export function columnHead(name: string, type: string): string {
  const unit = type === 'text' || type === 'number' || type === 'yes/no' ? '' : `<span class="tbl-unit">${escapeHtml(unitText(type))}</span>`;
  return `<th scope="col">${escapeHtml(name)}${unit}</th>`;
}

const problemAt = (problems: readonly TableProblem[], r: number, k: number) => problems.find((p) => p.row === r && p.column === k);

/** Live: the table with a field for every value; data-row/data-col say where an edit goes. */
export function liveTableHtml(cell: TableCell, problems: readonly TableProblem[]): string {
  const head = `<tr>${cell.columns.map((c) => columnHead(c.name, c.type)).join('')}</tr>`;
  const body = cell.rows.map((row, r) => `<tr>${cell.columns.map((c, k) => {
    const v = row[k] ?? '';
    const bad = problemAt(problems, r, k);
    const aria = `${cell.name} row ${r + 1} ${c.name}`;
    return `<td${bad ? ' class="tbl-bad"' : ''}><input class="value-field table-field" data-act="table-value" data-row="${r}" data-col="${k}" aria-label="${
      escapeHtml(aria)}"${bad ? ` aria-invalid="true" title="${escapeHtml(bad.message)}"` : ''} spellcheck="false" autocomplete="off" value="${
      escapeHtml(v)}" size="${Math.max(4, Math.min(16, v.length + 1))}"></td>`;
  }).join('')}</tr>`).join('');
  return `<div class="tbl-wrap"><table class="data-table" data-table="${escapeHtml(cell.name)}"><thead>${head}</thead><tbody>${body}</tbody></table></div>`;
}

/** Record: the table as typed, bad values marked. */
export function recordTableHtml(cell: TableCell, problems: readonly TableProblem[]): string {
  const head = `<tr>${cell.columns.map((c) => columnHead(c.name, c.type)).join('')}</tr>`;
  const body = cell.rows.map((row, r) => `<tr>${cell.columns.map((_c, k) => {
    const bad = problemAt(problems, r, k);
    return `<td${bad ? ' class="lt-tbl-bad"' : ''}>${escapeHtml(row[k] ?? '')}${bad ? ` <small>(${escapeHtml(bad.message)})</small>` : ''}</td>`;
  }).join('')}</tr>`).join('');
  return `<table class="lt-table"><thead>${head}</thead><tbody>${body}</tbody></table>`;
}
