// Calls a gravity library function the way the engine does: by name, through its
// LibFunction entry, on plain SI values.
import { expect } from 'vitest';
import { gravityFunctions } from '../../runtime/library/group-gravity';
import { LibraryError, type LibValue } from '../../runtime/library/types';

const byName = new Map(gravityFunctions.map((f) => [f.name, f]));

export function g(name: string, ...args: unknown[]): LibValue {
  const f = byName.get(name);
  if (!f) throw new Error(`no gravity function ${name}`);
  return f.fn(...args);
}

export function gn(name: string, ...args: unknown[]): number {
  const v = g(name, ...args);
  if (typeof v !== 'number') throw new Error(`${name} returned ${typeof v}`);
  return v;
}

/** |actual/expected − 1| ≤ rel. */
export function expectRel(actual: number, expected: number, rel: number): void {
  expect(Math.abs(actual / expected - 1)).toBeLessThanOrEqual(rel);
}

/** The call throws a LibraryError whose message matches. */
export function expectLibError(f: () => unknown, message: RegExp): void {
  let err: unknown;
  try {
    f();
  } catch (e) {
    err = e;
  }
  expect(err).toBeInstanceOf(LibraryError);
  expect((err as Error).message).toMatch(message);
}
