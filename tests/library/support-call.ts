// Test helper: call a support-group library function by its formula name, as the engine does.
import { supportFunctions } from '../../runtime/library/group-support';
import type { LibValue } from '../../runtime/library/types';

export function call(name: string, ...args: unknown[]): LibValue {
  const f = supportFunctions.find((x) => x.name === name);
  if (!f) throw new Error(`no support function named ${name}`);
  return f.fn(...args);
}

/** Call a function expected to return a number. */
export function num(name: string, ...args: unknown[]): number {
  const v = call(name, ...args);
  if (typeof v !== 'number') throw new Error(`${name} returned ${typeof v}`);
  return v;
}
