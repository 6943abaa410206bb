// What the editors offer and highlight: cell names (with their current values),
// functions (structural library and general ones, with signature and clause) and units.

import { BUILTINS } from '../runtime/formula/builtins';
import { libraryFunctions } from '../runtime/library/index';
import { TRADE_UNIT_NAMES } from '../runtime/units/trade';
import { unitPairs } from '../runtime/units/systems';

export interface NameEntry {
  name: string;
  /** Current value as shown, e.g. "24 ft"; undefined while pending or broken. */
  value?: string;
  label?: string;
}

export interface FunctionEntry {
  name: string;
  signature: string;
  doc: string;
  clause?: string;
}

export interface Vocabulary {
  names: NameEntry[];
  functions: FunctionEntry[];
  units: string[];
}

/** Common units besides the trade ones; mathjs reads all of them. */
const COMMON_UNITS = [
  'in', 'ft', 'yd', 'mm', 'cm', 'm', 'lbf', 'N', 'kN', 'MN', 'Pa', 'kPa', 'MPa', 'GPa', 'psi',
  'deg', 'rad', 'kg', 'lb', 's',
];

let functionCache: FunctionEntry[] | undefined;

export function functionEntries(): FunctionEntry[] {
  if (!functionCache) {
    const lib = libraryFunctions.map((f) => ({
      name: f.name,
      signature: `${f.name}(${f.params.map((p, i) => (i >= f.params.length - (f.optional ?? 0) ? `${p.name}?` : p.name)).join(', ')})`,
      doc: f.doc,
      clause: f.clause,
    }));
    const general = [...BUILTINS.values()].map((b) => ({ name: b.name, signature: b.signature, doc: b.doc }));
    functionCache = [...lib, ...general].sort((a, b) => a.name.localeCompare(b.name));
  }
  return functionCache;
}

let unitCache: string[] | undefined;

export function unitNames(): string[] {
  if (!unitCache) {
    const fromPairs = unitPairs().flatMap(([a, b]) => [a, b]).filter((u) => /^[A-Za-z]+$/.test(u));
    unitCache = [...new Set([...TRADE_UNIT_NAMES, ...COMMON_UNITS, ...fromPairs])].sort();
  }
  return unitCache;
}
