// The error line under a cell: what is wrong, and in the live sheet where in the
// source (a marker at the column the engine names).

import type { CellState } from '../engine-types';
import type { CellViewBase } from './cell-frame';
import { escapeHtml } from './escape';
import { errorLead, STATUS_WORDS } from './words';

/** The error part of a live view, from the engine state and the source it refers to. */
export function errorOf(state: CellState | undefined, source: string): CellViewBase['error'] {
  const e = state?.error;
  if (!e || state?.status !== 'error') return undefined;
  return { message: e.message, kind: e.kind, source, column: e.column };
}

/** Live: the inline error message with a marker at its column. */
export function renderError(error: CellViewBase['error']): string {
  if (!error) return '';
  let where = '';
  if (error.source !== undefined && error.column !== undefined && error.column >= 1) {
    const at = Math.min(error.column - 1, error.source.length);
    where = `<code class="err-src">${escapeHtml(error.source.slice(0, at))}<mark class="err-at" title="here">${
      escapeHtml(error.source.slice(at, at + 1) || ' ')}</mark>${escapeHtml(error.source.slice(at + 1))}</code>`;
  }
  return `<div class="cell-error" role="alert"><span class="err-glyph" aria-hidden="true">${STATUS_WORDS.error.glyph}</span> <strong>${errorLead(error.kind)}:</strong> ${
    escapeHtml(error.message)}${where}</div>`;
}

/** Record: the error line. */
export function errorHtml(s: CellState | undefined): string {
  if (s?.status !== 'error' || !s.error) return '';
  return `<p class="lt-err" role="alert">${STATUS_WORDS.error.glyph} <strong>${errorLead(s.error.kind)}:</strong> ${escapeHtml(s.error.message)}</p>`;
}
