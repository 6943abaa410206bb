// What a sign-off covers, reduced to a short stable fingerprint, so that a later
// change to any of it shows the sign-off as stale. Not a security digest (the record's
// SHA-256 covers tampering); it only has to notice honest edits, in Node and browser alike.

import { cellName, type CalcDocument, type Cell } from '../document';
import { parseFormula, symbolNames } from '../formula/parse';
import { hasFeetInches } from '../units/feet-inches';
import { canonicalUnit, typedUnit } from '../units/systems';

/**
 * 64-bit fingerprint as 16 hex digits over UTF-16 code units: the first half is
 * FNV-1a 32 (Fowler–Noll–Vo, offset basis 0x811c9dc5, prime 0x01000193), the second a
 * second lane with another multiplier, so two different texts rarely share both.
 */
export function fingerprint(text: string): string {
  let h1 = 0x811c9dc5;
  let h2 = 0x9747b28c;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    h1 = Math.imul(h1 ^ c, 0x01000193);
    h2 = Math.imul(h2 ^ c, 0x5bd1e995);
    h2 ^= h2 >>> 15;
  }
  h2 = Math.imul(h2 ^ (h2 >>> 13), 0xc2b2ae35);
  h2 ^= h2 >>> 16;
  return (h1 >>> 0).toString(16).padStart(8, '0') + (h2 >>> 0).toString(16).padStart(8, '0');
}

/** JSON with keys sorted, so the same cell always gives the same text. */
export function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value && typeof value === 'object') {
    const obj = value as Record<string, unknown>;
    const keys = Object.keys(obj).filter((k) => obj[k] !== undefined).sort();
    return `{${keys.map((k) => `${JSON.stringify(k)}:${canonical(obj[k])}`).join(',')}}`;
  }
  return JSON.stringify(value) ?? 'null';
}

/** The cells of one section: its heading and everything up to the next heading. */
export function sectionCells(doc: CalcDocument, sectionId: string): Cell[] | undefined {
  const start = doc.cells.findIndex((c) => c.id === sectionId && c.kind === 'section');
  if (start < 0) return undefined;
  let end = start + 1;
  while (end < doc.cells.length && doc.cells[end].kind !== 'section') end++;
  return doc.cells.slice(start, end);
}

/** Names a cell's expression reads (none when it does not parse: the engine reports that). */
function readsOf(cell: Cell): string[] {
  const expr = (cell as { expr?: unknown }).expr;
  if (typeof expr !== 'string') return [];
  try {
    return symbolNames(parseFormula(expr));
  } catch {
    return [];
  }
}

/** Cells outside `own` that `own` reads, directly or through other cells, in sheet order. */
export function upstreamCells(doc: CalcDocument, own: readonly Cell[]): Cell[] {
  const byName = new Map<string, Cell>();
  for (const c of doc.cells) {
    const n = cellName(c);
    if (n !== undefined && !byName.has(n)) byName.set(n, c);
  }
  const inside = new Set(own.map((c) => c.id));
  const found = new Set<string>();
  const todo = [...own];
  while (todo.length) {
    for (const name of readsOf(todo.pop()!)) {
      const dep = byName.get(name);
      if (!dep || inside.has(dep.id) || found.has(dep.id)) continue;
      found.add(dep.id);
      todo.push(dep);
    }
  }
  return doc.cells.filter((c) => found.has(c.id));
}

/** What of an upstream cell decides the covered numbers: its name, value or expression, unit. */
function engineeringPart(cell: Cell): unknown {
  const c = cell as unknown as Record<string, unknown>;
  return [cell.id, cell.kind, cellName(cell) ?? null, c.value ?? c.expr ?? null, c.unit ?? null];
}

/**
 * Fingerprint of what a sign-off covers: every field of the section's own cells (or
 * of every cell, for the whole record), plus the name, value or expression and unit
 * of each cell they read from elsewhere, since a new load upstream changes the
 * checked numbers too. A section that no longer exists has no fingerprint.
 */
export function coverFingerprint(doc: CalcDocument, scope: 'document' | string): string | undefined {
  const whole = scope === 'document';
  const own = whole ? doc.cells : sectionCells(doc, scope);
  if (!own) return undefined;
  const upstream = whole ? [] : upstreamCells(doc, own);
  return fingerprint(canonical({ own, upstream: upstream.map(engineeringPart) }));
}

/**
 * An input's display unit when it only repeats the unit its value is typed in (the
 * editor pins it when a value is typed in another unit: 10 ft → 10 psf → back to 10 ft
 * leaves unit "ft" on a sheet that shows and computes exactly what it did) is left out.
 */
function asShown(cell: Cell): Cell {
  if (cell.kind !== 'input' || !cell.unit) return cell;
  const typed = typedUnit(cell.value);
  if (!typed || canonicalUnit(typed) !== canonicalUnit(cell.unit) || hasFeetInches(cell.value)) return cell;
  const { unit: _, ...rest } = cell;
  return rest;
}

/**
 * Fingerprint of the sheet itself: title block and every cell, every field (not the
 * review: comments and sign-offs do not change what was issued). Frozen with a
 * revision when it is issued, so any later edit shows (runtime/review/state.ts).
 */
export function sheetFingerprint(doc: CalcDocument): string {
  return fingerprint(canonical({ meta: doc.meta, cells: doc.cells.map(asShown) }));
}
