// The summary of checks near the top of the sheet (its rows, order and words are
// runtime/present/summary.ts's, shared with the record), written into the page.

import type { Cell } from '../runtime/document';
import type { CellState } from '../runtime/engine-types';
import { describe } from '../runtime/kinds/index';
import { summaryListHtml, summaryOf } from '../runtime/present/summary';

/** Is the cell listed in the summary of checks? */
export function inSummary(cell: Cell | undefined): boolean {
  return !!cell && describe(cell.kind).summaryTitle !== null;
}

/** Writes the summary of `cells`' checks (and cells in error) into `host`, when it reads differently from what is there. */
export function writeSummary(
  host: HTMLElement,
  cells: readonly Cell[],
  state: (id: string) => CellState | undefined,
  numbers: ReadonlyMap<string, string>,
): void {
  const html = summaryListHtml(summaryOf({ cells }, state, numbers));
  if (host.dataset.html === html) return;
  host.innerHTML = html;
  host.dataset.html = html;
}
