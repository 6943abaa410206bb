// The check summary near the top of the sheet: every check with its ratio, the
// governing ones first (failures, then the highest ratios), each a link to its cell.

import type { CalcDocument, Cell, CheckCell } from '../runtime/document';
import { cellsInError, inErrorText, type CellInError } from '../runtime/graph/in-error';
import type { CellState } from '../runtime/engine-types';
import { ratioText } from '../runtime/handcalc/index';
import { describe } from '../runtime/kinds/index';
import { escapeHtml } from '../runtime/present/escape';

export interface SummaryRow {
  id: string;
  number: string;
  title: string;
  status: CellState['status'] | 'pending';
  ratio?: number;
}

/** Order: failures, then errors, then passes; within each, highest ratio first; conditions after ratios. */
export function summaryRows(
  checks: readonly CheckCell[],
  state: (id: string) => CellState | undefined,
  numbers: ReadonlyMap<string, string>,
): SummaryRow[] {
  const rank = { fail: 0, error: 1, pending: 2, ok: 3 } as const;
  return checks
    .map((c, i) => {
      const s = state(c.id);
      return {
        id: c.id, number: numbers.get(c.id) ?? '', title: c.label || c.name || c.expr,
        status: s?.status ?? 'pending', ratio: s?.ratio, order: i,
      };
    })
    .sort((a, b) =>
      rank[a.status] - rank[b.status]
      || (b.ratio ?? -Infinity) - (a.ratio ?? -Infinity)
      || a.order - b.order)
    .map(({ order: _order, ...row }) => row);
}

const WORDS: Record<SummaryRow['status'], [string, string]> = {
  ok: ['✓', 'OK'], fail: ['✗', 'NOT OK'], error: ['⚠', 'ERROR'], pending: ['…', 'pending'],
};

export function summaryHtml(rows: SummaryRow[], inError: readonly CellInError[] = [], numbers?: ReadonlyMap<string, string>): string {
  if (rows.length === 0 && inError.length === 0) return '';
  const failing = rows.filter((r) => r.status === 'fail').length;
  const broken = rows.filter((r) => r.status === 'error').length;
  const head = `${rows.length} check${rows.length === 1 ? '' : 's'}: ${
    failing ? `${failing} NOT OK` : broken || inError.length ? 'none NOT OK' : 'all OK'}${broken ? `, ${broken} with errors` : ''}${
    inError.length ? `; ${inErrorText(inError)}` : ''}`;
  // Cells other than checks whose error is their own come first: nothing reads past them.
  const sources: SummaryRow[] = inError.filter((c) => c.source && c.kind !== 'check')
    .map((c) => ({ id: c.id, number: numbers?.get(c.id) ?? '', title: `${c.title}: ${c.message}`, status: 'error' }));
  const items = [...sources, ...rows].map((r) => {
    const [glyph, word] = WORDS[r.status];
    const pct = r.ratio === undefined ? 0 : Math.max(0, Math.min(100, (r.ratio / 1.25) * 100));
    const ratio = r.ratio === undefined
      ? '<span class="sum-ratio">—</span><span class="sum-bar none"></span>'
      : `<span class="sum-ratio">${escapeHtml(ratioText(r.ratio))}</span><span class="sum-bar"><span class="ratio-fill" style="width:${
        pct.toFixed(1)}%"></span><span class="ratio-one"></span></span>`;
    return `<li class="sum-row st-${r.status}"><a href="#cell-${escapeHtml(r.id)}" data-goto="${escapeHtml(r.id)}"><span class="sum-verdict"><span aria-hidden="true">${
      glyph}</span> ${word}</span>${ratio}<span class="sum-no">${escapeHtml(r.number)}</span><span class="sum-title">${escapeHtml(r.title)}</span></a></li>`;
  });
  return `<h2 class="summary-head">Summary of checks <span class="summary-count">${escapeHtml(head)}</span></h2><ol class="summary-list">${items.join('')}</ol>`;
}

/** Is the cell listed in the summary of checks? */
export function inSummary(cell: Cell | undefined): boolean {
  return !!cell && describe(cell.kind).summaryTitle !== null;
}

/** Writes the summary of `cells`' checks into `host`, when it reads differently from what is there. */
export function writeSummary(
  host: HTMLElement,
  cells: readonly Cell[],
  state: (id: string) => CellState | undefined,
  numbers: ReadonlyMap<string, string>,
): void {
  const inError = cellsInError({ meta: {} as CalcDocument['meta'], cells: [...cells] }, state);
  const html = summaryHtml(summaryRows(cells.filter((c): c is CheckCell => c.kind === 'check'), state, numbers), inError, numbers);
  if (host.dataset.html === html) return;
  host.innerHTML = html;
  host.dataset.html = html;
}
