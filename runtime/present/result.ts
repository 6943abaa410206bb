// The record's result column: a computed value as text, so every result reads without
// fonts or scripts.

import type { CellState } from '../engine-types';
import { escapeHtml } from './escape';
import { unitText } from './units-text';

/** A text result longer than this is written under the hand calc, not in the result column. */
const LONG_TEXT = 28;

/** Computed: a value (passing or failing), not pending or broken. */
export const done = (s: CellState | undefined): boolean => s?.status === 'ok' || s?.status === 'fail';

/** A text result too long for the result column. */
export const longText = (s: CellState | undefined): boolean =>
  done(s) && typeof s!.display?.value === 'string' && s!.display.text.length > LONG_TEXT;

/** Record: the result column of a value cell. */
export function resultHtml(s: CellState | undefined): string {
  if (s?.status === 'error') return '<span class="lt-res-err">error</span>';
  if (!done(s) || !s!.display) return '<span class="lt-res-none">—</span>';
  if (longText(s)) return '<span class="lt-res-none">see left</span>';
  return escapeHtml(unitText(s!.display.text));
}
