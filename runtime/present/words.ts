// The words (and glyphs) for how a check or cell stands, and the ratio bar's reach:
// the live sheet, its summary and the record's static page all say it this way, so a
// status never reads by colour alone and never reads two ways.

import type { CellStatus } from '../cell-status';

/** Glyph and word for each status of a computed cell. */
export const STATUS_WORDS: Record<CellStatus, { glyph: string; word: string }> = {
  ok: { glyph: '✓', word: 'OK' },
  fail: { glyph: '✗', word: 'NOT OK' },
  error: { glyph: '⚠', word: 'ERROR' },
  pending: { glyph: '…', word: 'pending' },
};

/** "✓ OK", "✗ NOT OK", ... */
export function statusText(status: CellStatus): string {
  const w = STATUS_WORDS[status];
  return `${w.glyph} ${w.word}`;
}

/** The ratio bar spans 0 to 1.25: how far along it a ratio reaches, in percent (0–100). */
export function ratioBarPercent(ratio: number): number {
  return Math.max(0, Math.min(100, (ratio / 1.25) * 100));
}

/** The lead of an error line: a cell that waits on a broken one says so. */
export function errorLead(kind: string): string {
  return kind === 'upstream' ? 'Waiting on' : 'Problem';
}
