// Compact difference between two versions of a sheet, so a saved undo history
// stores each step as the few cells it changed instead of a whole copy.

import type { CalcDocument, Cell, DocMeta } from '../document';
import type { ReviewState } from '../review/types';

export interface SheetDelta {
  /** Title-block fields that changed (whole meta when any did). */
  meta?: DocMeta;
  /** New cell order, when cells were added, removed or moved. */
  order?: string[];
  /** Cells whose content differs, by id (new cells included). */
  cells?: Cell[];
  /** The whole review state when it changed; null when it was removed. */
  review?: ReviewState | null;
}

/** What turns `from` into `to`. Cells are compared by identity first, then by content. */
export function diffSheets(from: CalcDocument, to: CalcDocument): SheetDelta {
  const delta: SheetDelta = {};
  if (from.meta !== to.meta && JSON.stringify(from.meta) !== JSON.stringify(to.meta)) delta.meta = to.meta;
  const old = new Map(from.cells.map((c) => [c.id, c]));
  const changed = to.cells.filter((c) => {
    const prev = old.get(c.id);
    return prev !== c && (prev === undefined || JSON.stringify(prev) !== JSON.stringify(c));
  });
  if (changed.length) delta.cells = changed;
  const sameOrder = from.cells.length === to.cells.length && from.cells.every((c, i) => c.id === to.cells[i].id);
  if (!sameOrder) delta.order = to.cells.map((c) => c.id);
  if (from.review !== to.review && JSON.stringify(from.review) !== JSON.stringify(to.review)) delta.review = to.review ?? null;
  return delta;
}

/** Applies a delta made by diffSheets(from, to) to `from`, giving a sheet equal to `to`. */
export function applyDelta(from: CalcDocument, delta: SheetDelta): CalcDocument {
  if (!delta.meta && !delta.order && !delta.cells && delta.review === undefined) return from;
  const byId = new Map(from.cells.map((c) => [c.id, c]));
  for (const c of delta.cells ?? []) byId.set(c.id, c);
  const order = delta.order ?? from.cells.map((c) => c.id);
  const cells = order.map((id) => {
    const c = byId.get(id);
    if (!c) throw new Error(`history step names cell "${id}" that it does not carry`);
    return c;
  });
  const review = delta.review === undefined ? from.review : delta.review ?? undefined;
  return review ? { meta: delta.meta ?? from.meta, cells, review } : { meta: delta.meta ?? from.meta, cells };
}

/** A list of sheets as the first one plus one delta a step. */
export function packSheets(sheets: readonly CalcDocument[]): { base: CalcDocument | null; steps: SheetDelta[] } {
  if (sheets.length === 0) return { base: null, steps: [] };
  const steps: SheetDelta[] = [];
  for (let i = 1; i < sheets.length; i++) steps.push(diffSheets(sheets[i - 1], sheets[i]));
  return { base: sheets[0], steps };
}

export function unpackSheets(base: CalcDocument | null, steps: readonly SheetDelta[]): CalcDocument[] {
  if (!base) return [];
  const out = [base];
  for (const step of steps) out.push(applyDelta(out[out.length - 1], step));
  return out;
}
