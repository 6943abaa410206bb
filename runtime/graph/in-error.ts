// Every cell in error, not only the checks: a broken formula that no check reads is
// still a fault of the document, counted by the summary and listed first by Issue and
// sign-off (so neither goes ahead past an error nobody saw).

import { cellName, type Cell } from '../document';
import type { CellState } from '../engine-types';

export interface CellInError {
  id: string;
  kind: Cell['kind'];
  /** Its name, or else its label, or its kind: what a list shows. */
  title: string;
  message: string;
  /** The error is the cell's own (not "reads X, which has an error"). */
  source: boolean;
}

/** The cells in error, in document order, those whose error is their own first. */
export function cellsInError(doc: { cells: readonly Cell[] }, state: (id: string) => CellState | undefined): CellInError[] {
  const out: CellInError[] = [];
  for (const cell of doc.cells) {
    const s = state(cell.id);
    if (s?.status !== 'error') continue;
    const name = cellName(cell);
    const label = cell.label && cell.label.length > 80 ? `${cell.label.slice(0, 80)}…` : cell.label;
    out.push({
      id: cell.id, kind: cell.kind, title: name ?? label ?? cell.kind,
      message: s.error?.message ?? 'error', source: s.error?.kind !== 'upstream',
    });
  }
  return [...out.filter((c) => c.source), ...out.filter((c) => !c.source)];
}

/** "3 cells in error, 1 at its source" (or '' when none). */
export function inErrorText(list: readonly CellInError[]): string {
  if (list.length === 0) return '';
  const sources = list.filter((c) => c.source).length;
  const n = `${list.length} cell${list.length === 1 ? '' : 's'} in error`;
  return sources === list.length ? n : `${n}, ${sources} at ${sources === 1 ? 'its' : 'their'} source`;
}
