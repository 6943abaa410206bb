// Undo and redo as a list of whole sheets. Sheets share unchanged cells, so a long
// history costs little; typing in one field coalesces into a single step.

import type { CalcDocument } from '../document';

export interface History {
  readonly past: readonly CalcDocument[];
  readonly present: CalcDocument;
  readonly future: readonly CalcDocument[];
  /** Key of the last step, so successive edits of one field merge (e.g. `value:i3`). */
  readonly lastKey?: string;
  readonly lastAt?: number;
}

export const HISTORY_LIMIT = 500;
/** Edits with the same key closer together than this merge into one undo step. */
export const COALESCE_MS = 1000;

export function startHistory(doc: CalcDocument, past: readonly CalcDocument[] = []): History {
  return { past: past.slice(-HISTORY_LIMIT), present: doc, future: [] };
}

/**
 * Records `doc` as the new present. With a `key` equal to the previous step's and
 * within COALESCE_MS, the step replaces the previous one instead of adding to it.
 */
export function record(h: History, doc: CalcDocument, key?: string, now = Date.now()): History {
  if (doc === h.present) return h;
  const merge = key !== undefined && key === h.lastKey && h.lastAt !== undefined && now - h.lastAt < COALESCE_MS
    && h.past.length > 0;
  const past = merge ? h.past : [...h.past, h.present].slice(-HISTORY_LIMIT);
  return { past, present: doc, future: [], lastKey: key, lastAt: now };
}

export function canUndo(h: History): boolean {
  return h.past.length > 0;
}

export function canRedo(h: History): boolean {
  return h.future.length > 0;
}

export function undo(h: History): History {
  if (!canUndo(h)) return h;
  const present = h.past[h.past.length - 1];
  return { past: h.past.slice(0, -1), present, future: [h.present, ...h.future] };
}

export function redo(h: History): History {
  if (!canRedo(h)) return h;
  const [present, ...future] = h.future;
  return { past: [...h.past, h.present], present, future };
}
