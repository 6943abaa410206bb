// The static type of a formula value: a number with a dimension, a text or a boolean.
// Checked once when a formula compiles; evaluation then runs on plain values.

import { describeDims, DIMLESS, isDimless, sameDims, siUnitText, unitInfo, type Dims } from '../units/dimension';

export type VType =
  | { t: 'num'; dims: Dims; /** unit to name in messages, when one is known */ hint?: string }
  | { t: 'text' }
  | { t: 'bool' }
  /** A drawing spec from a figure function (runtime/figures); only a figure cell holds one. */
  | { t: 'figure' }
  /** Rows under typed columns (runtime/table); read by library functions that take a table. */
  | { t: 'table' };

export const NUMBER: VType = { t: 'num', dims: DIMLESS };
export const TEXT: VType = { t: 'text' };
export const BOOL: VType = { t: 'bool' };
export const FIGURE: VType = { t: 'figure' };
export const TABLE: VType = { t: 'table' };

export function numType(dims: Dims, hint?: string): VType {
  return hint ? { t: 'num', dims, hint } : { t: 'num', dims };
}

export function sameType(a: VType, b: VType): boolean {
  if (a.t !== b.t) return false;
  return a.t !== 'num' || sameDims(a.dims, (b as { dims: Dims }).dims);
}

/** For messages: "a force (kip)", "a length (in SI: m)", "a text", "true/false". */
export function describeType(v: VType): string {
  if (v.t === 'text') return 'a text';
  if (v.t === 'bool') return 'a true/false value';
  if (v.t === 'figure') return 'a figure';
  if (v.t === 'table') return 'a table';
  if (isDimless(v.dims)) return 'a pure number';
  const what = describeDims(v.dims);
  const si = siUnitText(v.dims);
  if (what === si) return `a quantity in ${v.hint ?? si}${v.hint ? ` (SI: ${si})` : ''}`;
  const article = /^[aeiou]/.test(what) ? 'an' : 'a';
  return `${article} ${what} (${v.hint ?? si})`;
}

/** The type a library parameter declares: 'text', 'bool' or an SI unit expression. */
export function typeFromDeclaration(decl: string): VType {
  if (decl === 'text') return TEXT;
  if (decl === 'bool') return BOOL;
  if (decl === 'figure') return FIGURE;
  if (decl === 'table') return TABLE;
  return numType(unitInfo(decl).dims, decl === '1' ? undefined : decl);
}
