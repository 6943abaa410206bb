// The right-margin references of a cell: its own clause first, then the clauses of the
// library functions it calls, each once.

import type { CellState } from '../engine-types';
import { escapeHtml } from './escape';

/** The reference texts for the margin: the cell's own clause first, then library clauses, no repeats. */
export function marginRefs(clause: string | undefined, state: CellState | undefined): string[] {
  const refs = [clause, ...(state?.clauses ?? [])].filter((r): r is string => !!r && r.trim() !== '');
  return [...new Set(refs)];
}

/** Live: HTML for the right-margin references. */
export function renderRefs(refs: string[]): string {
  if (refs.length === 0) return '<aside class="cell-ref"></aside>';
  return `<aside class="cell-ref">${refs.map((r) => `<span>${escapeHtml(r)}</span>`).join('')}</aside>`;
}

/** Record: HTML for the right-margin references. */
export function refsHtml(refs: string[]): string {
  return `<aside class="lt-ref">${refs.map((r) => `<span>${escapeHtml(r)}</span>`).join('')}</aside>`;
}
