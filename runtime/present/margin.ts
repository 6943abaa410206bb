// The right-margin references of a cell: its own clause first, then the clauses of the
// library functions it calls, each once.

import type { CellState } from '../engine-types';
import { escapeHtml } from './escape';

/** The reference texts for the margin: the cell's own clause first, then library clauses, no repeats. */
export function marginRefs(clause: string | undefined, state: CellState | undefined): string[] {
  const refs = [clause, ...(state?.clauses ?? [])].filter((r): r is string => !!r && r.trim() !== '');
  return [...new Set(refs)];
}

/** HTML for the margin: the live sheet's class is cell-ref, the record's lt-ref. */
export function refsHtml(refs: string[], className: 'cell-ref' | 'lt-ref'): string {
  return `<aside class="${className}">${refs.map((r) => `<span>${escapeHtml(r)}</span>`).join('')}</aside>`;
}
