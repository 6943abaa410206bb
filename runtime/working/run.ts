// Asking for the working of one call: the library function runs again on the same
// argument values under a recorder, the same code path that computed the value the
// sheet shows, and hands back its steps with its value.

import type { LibFunction, LibValue, ValueType } from '../library/types';
import { Recorder, withRecorder, type Group, type Shown, type Step } from './recorder';

export interface Working {
  /** The call: the function, its arguments by param name, its steps and value. */
  root: Group;
  /** The value returned (undefined when the call failed). */
  value?: LibValue;
  /** The error message when the call failed; the steps up to it are kept. */
  error?: string;
  /** A computation opened a group it did not end (a slip in the library: a test fails on it). */
  unbalanced?: true;
}

/**
 * The US customary unit a value of a param type reads best in, when the formula did not
 * say: lengths of a span in ft and of a section in in, areas of a floor in ft² and of steel
 * in in², pressures of soil and floors in psf and strengths in psi (common practice).
 */
export function usUnitFor(type: ValueType, v: number): string {
  const a = Math.abs(v);
  switch (type) {
    case 'm': return a >= 1.5 ? 'ft' : 'in';
    case 'm^2': return a >= 0.5 ? 'ft^2' : 'in^2';
    case 'm^4': return 'in^4';
    case 'Pa':
    case 'N/m^2': return a >= 0.5e6 ? 'psi' : 'psf';
    case 'N': return 'kip';
    case 'N*m': return 'kip*ft';
    case 'N/m': return 'klf';
    case 'N/m^3': return 'pcf';
    case 'rad': return 'deg';
    case 'kg/m': return 'kg/m';
    default: return '';
  }
}

/** An argument as shown: numbers of a physical type carry a unit (the one written, else the usual). */
export function shownArg(type: ValueType, v: LibValue, unit?: string): Shown {
  if (typeof v !== 'number' || type === '1' || type === 'text' || type === 'bool') return v;
  return [v, unit || usUnitFor(type, v)];
}

/**
 * Runs `lib` on `args` under a recorder. `units` are the US (or SI) units the formula wrote
 * each argument in, when known. The function's own result is the working's value.
 */
export function workingOf(lib: LibFunction<unknown>, args: readonly LibValue[], units: readonly (string | undefined)[] = []): Working {
  const inputs = lib.params.slice(0, args.length).map((p, i) => ({ name: p.name, value: shownArg(p.type, args[i], units[i]) }));
  const root: Group = { kind: 'group', fn: lib.name, inputs, entries: [], clause: lib.clause };
  const rec = new Recorder(root, new Map(inputs.map((i) => [i.name, i.value])));
  try {
    const value = withRecorder(rec, () => lib.fn(...args));
    // A figure function (LibFunction<FigureSpec>) gives a drawing: it has no working of values.
    if (typeof value !== 'number' && typeof value !== 'string' && typeof value !== 'boolean') throw new Error(`${lib.name} gives no value`);
    root.value = value;
    const last = lastEntry(root);
    root.unit = last?.unit
      ? last.unit
      : typeof value === 'number' ? usUnitFor(lib.returns, value) : '';
    return rec.depth === 0 ? { root, value } : { root, value, unbalanced: true };
  } catch (e) {
    return { root, error: e instanceof Error ? e.message : String(e) };
  }
}

/** The last step or nested call of a working: what its value must equal. */
export function lastEntry(g: Group): Step | Group | undefined {
  for (let i = g.entries.length - 1; i >= 0; i--) {
    const e = g.entries[i];
    if (e.kind === 'step' || e.kind === 'group') return e;
  }
  return undefined;
}
