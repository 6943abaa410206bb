// Argument checks shared by the support-side library (punching, column, footing, soil).
// Library functions get plain SI numbers from the engine; a bad value must come back
// as a LibraryError that names the argument, never as NaN in a hand calc. Messages quote
// pure numbers only: a length arrives in metres, which the user may never have typed.

import { LibraryError } from './types';

/** ACI 318 editions the support functions know; 318-19 is the default. */
export const EDITIONS = ['318-19', '318-14'] as const;
export type Edition = (typeof EDITIONS)[number];

function num(name: string, v: unknown): number {
  if (typeof v !== 'number' || !Number.isFinite(v)) {
    throw new LibraryError(`${name} must be a finite number, got ${String(v)}`);
  }
  return v;
}

/** A finite number of any sign. */
export function finite(name: string, v: unknown): number {
  return num(name, v);
}

/** A length, force or stress that must be greater than zero. */
export function positive(name: string, v: unknown): number {
  const x = num(name, v);
  if (x <= 0) throw new LibraryError(`${name} must be greater than 0 (it is ${x === 0 ? 'zero' : 'negative'})`);
  return x;
}

/** A value that may be zero but not negative (loads, fill depth, cohesion). */
export function nonNegative(name: string, v: unknown): number {
  const x = num(name, v);
  if (x < 0) throw new LibraryError(`${name} must not be negative`);
  return x;
}

/** An optional argument: the default when left out, else checked by `check`. */
export function optional<T>(v: unknown, fallback: T, check: (v: unknown) => T): T {
  return v === undefined ? fallback : check(v);
}

/** A strength reduction factor: 0 < φ ≤ 1 (ACI 318-19 §21.2). */
export function phiFactor(v: unknown, name = 'φ'): number {
  const x = num(name, v);
  if (x <= 0 || x > 1) throw new LibraryError(`${name} must be in (0, 1], got ${x}`);
  return x;
}

/** Lightweight-concrete modification factor λ: 0.75 ≤ λ ≤ 1 (ACI 318-19 §19.2.4). */
export function lambdaFactor(v: unknown): number {
  const x = num('λ', v);
  if (x < 0.75 || x > 1) throw new LibraryError(`λ must be between 0.75 and 1.0, got ${x}`);
  return x;
}

/** One of a fixed set of words, compared without case or surrounding blanks. */
export function choice<T extends string>(name: string, v: unknown, choices: readonly T[]): T {
  if (typeof v !== 'string') {
    throw new LibraryError(`${name} must be one of ${choices.map((c) => `'${c}'`).join(', ')}`);
  }
  const key = v.trim().toLowerCase();
  const hit = choices.find((c) => c.toLowerCase() === key);
  if (!hit) {
    throw new LibraryError(
      `unknown ${name} '${v}': expected one of ${choices.map((c) => `'${c}'`).join(', ')}`,
    );
  }
  return hit;
}

/** The code edition argument; left out means ACI 318-19. */
export function edition(v: unknown): Edition {
  return v === undefined ? '318-19' : choice('edition', v, EDITIONS);
}
