// The summary of checks near the top of a sheet, live and in the record: which cells
// it lists (those whose kind has a summary title), their order (governing first:
// failures, then errors, then pending, then passes; within each the highest ratio
// first, conditions after ratios, then sheet order), the line that counts them, and
// each row's words. Cells of other kinds whose error is their own are listed first and
// counted (nothing reads past them). The live list and the record's table are two
// drawings of the same rows.

import type { CellStatus } from '../cell-status';
import type { Cell } from '../document';
import type { CellState } from '../engine-types';
import { cellsInError, inErrorText, type CellInError } from '../graph/in-error';
import { ratioText } from '../handcalc/index';
import { describe } from '../kinds/index';
import { escapeHtml } from './escape';
import { ratioBarPercent, STATUS_WORDS, statusText } from './words';

export interface SummaryRow {
  id: string;
  number: string;
  title: string;
  status: CellStatus;
  ratio?: number;
  /** The check's own clause, else the clauses of the functions it calls. */
  reference: string;
}

/** Rank of a status: the governing ones first. */
const RANK: Record<CellStatus, number> = { fail: 0, error: 1, pending: 2, ok: 3 };
/** A row's title is cut to this many characters. */
const TITLE_LIMIT = 200;

/** The rows of the summary, governing first. */
export function summaryRows(
  cells: readonly Cell[],
  state: (id: string) => CellState | undefined,
  numbers: ReadonlyMap<string, string>,
): SummaryRow[] {
  const rows: (SummaryRow & { order: number })[] = [];
  for (const cell of cells) {
    const s = state(cell.id);
    const title = describe(cell.kind).summaryTitle?.(cell, s);
    if (title === undefined) continue;
    rows.push({
      id: cell.id, number: numbers.get(cell.id) ?? '', title: title.slice(0, TITLE_LIMIT), status: s?.status ?? 'pending',
      ratio: s?.ratio, reference: cell.clause ?? s?.clauses.join('; ') ?? '', order: rows.length,
    });
  }
  return rows
    .sort((a, b) => RANK[a.status] - RANK[b.status] || (b.ratio ?? -Infinity) - (a.ratio ?? -Infinity) || a.order - b.order)
    .map(({ order: _order, ...row }) => row);
}

/**
 * "12 checks: all OK", "12 checks: 2 NOT OK, 1 without a result", "3 checks: none NOT OK,
 * 1 without a result", "1 check: none NOT OK; 2 cells in error, 1 at its source".
 */
export function summaryCount(rows: readonly SummaryRow[], inError: readonly CellInError[] = []): string {
  const failing = rows.filter((r) => r.status === 'fail').length;
  const open = rows.filter((r) => r.status === 'error' || r.status === 'pending').length;
  const verdict = failing ? `${failing} ${STATUS_WORDS.fail.word}`
    : open || inError.length ? `none ${STATUS_WORDS.fail.word}` : `all ${STATUS_WORDS.ok.word}`;
  return `${rows.length} check${rows.length === 1 ? '' : 's'}: ${verdict}${open ? `, ${open} without a result` : ''}${
    inError.length ? `; ${inErrorText(inError)}` : ''}`;
}

/** The summary as drawn: its rows (cells in error at their source first, then the checks) and its count line. */
export interface Summary {
  rows: SummaryRow[];
  count: string;
}

/** The summary of a document's cells, or undefined when there is no check and no cell in error. */
export function summaryOf(
  doc: { cells: readonly Cell[] },
  state: (id: string) => CellState | undefined,
  numbers: ReadonlyMap<string, string>,
): Summary | undefined {
  const checks = summaryRows(doc.cells, state, numbers);
  const inError = cellsInError(doc, state);
  if (checks.length === 0 && inError.length === 0) return undefined;
  // A check in error is already a row of its own; other kinds are listed by their error.
  const sources: SummaryRow[] = inError.filter((c) => c.source && describe(c.kind).summaryTitle === null)
    .map((c) => ({ id: c.id, number: numbers.get(c.id) ?? '', title: `${c.title}: ${c.message}`, status: 'error', reference: '' }));
  return { rows: [...sources, ...checks], count: summaryCount(checks, inError) };
}

/** Live: the list, each row a link to its cell, with a ratio bar. */
export function summaryListHtml(summary: Summary | undefined): string {
  if (!summary) return '';
  const items = summary.rows.map((r) => {
    const w = STATUS_WORDS[r.status];
    const ratio = r.ratio === undefined
      ? '<span class="sum-ratio">—</span><span class="sum-bar none"></span>'
      : `<span class="sum-ratio">${escapeHtml(ratioText(r.ratio))}</span><span class="sum-bar"><span class="ratio-fill" style="width:${
        ratioBarPercent(r.ratio).toFixed(1)}%"></span><span class="ratio-one"></span></span>`;
    return `<li class="sum-row st-${r.status}"><a href="#cell-${escapeHtml(r.id)}" data-goto="${escapeHtml(r.id)}"><span class="sum-verdict"><span aria-hidden="true">${
      w.glyph}</span> ${w.word}</span>${ratio}<span class="sum-no">${escapeHtml(r.number)}</span><span class="sum-title">${escapeHtml(r.title)}</span></a></li>`;
  });
  return `<h2 class="summary-head">Summary of checks <span class="summary-count">${escapeHtml(summary.count)}</span></h2><ol class="summary-list">${items.join('')}</ol>`;
}

/** Record: the table, with each check's reference. */
export function summaryTableHtml(summary: Summary | undefined): string {
  if (!summary) return '';
  const body = summary.rows.map((r) => `<tr class="lt-st-${r.status}"><td class="lt-sum-v">${statusText(r.status)}</td><td class="lt-sum-r">${
    r.ratio !== undefined ? escapeHtml(ratioText(r.ratio)) : '—'}</td><td class="lt-sum-no"><a href="#lt-c-${escapeHtml(r.id)}">${
    escapeHtml(r.number)}</a></td><td>${escapeHtml(r.title)}</td><td class="lt-sum-ref">${escapeHtml(r.reference)}</td></tr>`);
  return `<section class="lt-summary" aria-label="Summary of checks"><h2>Summary of checks <small>${escapeHtml(summary.count)}</small></h2>
<table><thead><tr><th>Outcome</th><th>Ratio</th><th>No.</th><th>Check</th><th>Reference</th></tr></thead><tbody>${body.join('')}</tbody></table></section>`;
}
