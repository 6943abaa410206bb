// Argument guards shared by the gravity library (part 1). Each guard either returns the
// value in the type the formula needs or throws a LibraryError that names the argument and
// what was expected. The engine prefixes the function name when it shows the message.

import { LibraryError } from './types';

export const EDITIONS = ['318-19', '318-14'] as const;
export type Edition = (typeof EDITIONS)[number];

/** Short number text for messages (4 significant digits). */
export function show(v: unknown): string {
  return typeof v === 'number' ? String(Number(v.toPrecision(4))) : JSON.stringify(v);
}

/** A finite number. */
export function num(name: string, v: unknown): number {
  if (typeof v !== 'number' || !Number.isFinite(v)) {
    throw new LibraryError(`${name} must be a finite number (got ${show(v)})`);
  }
  return v;
}

/** A number > 0 (spans, depths, strengths). */
export function positive(name: string, v: unknown): number {
  const x = num(name, v);
  if (x <= 0) throw new LibraryError(`${name} must be positive (got ${show(x)})`);
  return x;
}

/** A number >= 0 (loads, overhangs, ratios that may be zero). */
export function nonNegative(name: string, v: unknown): number {
  const x = num(name, v);
  if (x < 0) throw new LibraryError(`${name} must not be negative (got ${show(x)})`);
  return x;
}

/** An optional non-negative number; undefined gives the default. */
export function optNonNegative(name: string, v: unknown, dflt: number): number {
  return v === undefined ? dflt : nonNegative(name, v);
}

/** A whole number >= min (floors, spans). */
export function count(name: string, v: unknown, min: number): number {
  const x = num(name, v);
  if (!Number.isInteger(x) || x < min) {
    throw new LibraryError(`${name} must be a whole number >= ${min} (got ${show(x)})`);
  }
  return x;
}

/** One of a fixed set of texts; undefined gives the default when there is one. */
export function choice<T extends string>(
  name: string, v: unknown, choices: readonly T[], dflt?: T,
): T {
  if (v === undefined && dflt !== undefined) return dflt;
  if (typeof v === 'string' && (choices as readonly string[]).includes(v)) return v as T;
  throw new LibraryError(
    `unknown ${name} ${show(v)}; expected one of ${choices.map((c) => `"${c}"`).join(', ')}`,
  );
}

/** The ACI 318 edition; '318-19' when left out. */
export function edition(v: unknown): Edition {
  return choice('edition', v, EDITIONS, '318-19');
}

/** A boolean argument. */
export function bool(name: string, v: unknown, dflt?: boolean): boolean {
  if (v === undefined && dflt !== undefined) return dflt;
  if (typeof v !== 'boolean') throw new LibraryError(`${name} must be true or false (got ${show(v)})`);
  return v;
}
