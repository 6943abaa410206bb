// US customary ↔ SI display units: which unit a cell shows when the sheet switches
// systems. Only display units change; values as typed stay as they are.

import type { CalcDocument, Cell } from '../document';
import { hasFeetInches } from './feet-inches';

export type UnitSystem = 'US' | 'SI';

/** [US, SI] pairs, one physical quantity each. The first SI match is the way back. */
const PAIRS: readonly (readonly [string, string])[] = [
  ['in', 'mm'],
  ['ft', 'm'],
  ['in^2', 'mm^2'],
  ['ft^2', 'm^2'],
  ['in^3', 'mm^3'],
  ['in^4', 'mm^4'],
  ['psi', 'MPa'],
  ['ksi', 'MPa'],
  ['psf', 'kPa'],
  ['ksf', 'kPa'],
  ['lbf', 'N'],
  ['kip', 'kN'],
  ['kip*ft', 'kN*m'],
  ['kip*in', 'kN*m'],
  ['pcf', 'kN/m^3'],
  ['klf', 'kN/m'],
  ['plf', 'kN/m'],
  ['kip/in', 'kN/mm'],
  ['in^2/ft', 'mm^2/m'],
  ['kip*ft/ft', 'kN*m/m'],
];

/** Same unit written another common way, mapped to the spelling in PAIRS. */
const ALIASES: Record<string, string> = {
  inch: 'in', inches: 'in', feet: 'ft', foot: 'ft', kips: 'kip', lb: 'lbf',
  'ft*kip': 'kip*ft', 'kip-ft': 'kip*ft', 'k*ft': 'kip*ft', 'in*kip': 'kip*in', 'kip-in': 'kip*in',
  'lbf/in^2': 'psi', 'lbf/ft^2': 'psf', 'lbf/ft^3': 'pcf', 'lbf/ft': 'plf', 'kip/ft': 'klf',
  'm*kN': 'kN*m', 'kNm': 'kN*m', 'N/mm^2': 'MPa', 'kN/m^2': 'kPa',
  sqin: 'in^2', sqft: 'ft^2',
};

const US_TO_SI = new Map<string, string>();
const SI_TO_US = new Map<string, string>();
for (const [us, si] of PAIRS) {
  US_TO_SI.set(us, si);
  if (!SI_TO_US.has(si)) SI_TO_US.set(si, us);
}

/** The unit written one canonical way: no spaces, `·`/space products as `*`, aliases resolved. */
export function canonicalUnit(unit: string): string {
  const u = unit.trim().replace(/\s*([*/^·-])\s*/g, '$1').replace(/·/g, '*').replace(/\s+/g, '*');
  return ALIASES[u] ?? u;
}

/** Which system a unit belongs to, or undefined for a pure number or a shared unit (deg, rad). */
export function systemOf(unit: string): UnitSystem | undefined {
  const u = canonicalUnit(unit);
  if (US_TO_SI.has(u)) return 'US';
  if (SI_TO_US.has(u) || u === 'cm' || u === 'GPa' || u === 'Pa' || u === 'kN*mm') return 'SI';
  return undefined;
}

/** The unit a display unit becomes in `target`; unchanged when it is already there or has no counterpart. */
export function counterpart(unit: string, target: UnitSystem): string {
  const u = canonicalUnit(unit);
  if (target === 'SI') return US_TO_SI.get(u) ?? unit;
  return SI_TO_US.get(u) ?? unit;
}

/** Every pair known, for help text and tests. */
export function unitPairs(): readonly (readonly [string, string])[] {
  return PAIRS;
}

/** The unit written after the number in an input value (`18 in` → `in`), if any. */
export function typedUnit(value: string): string | undefined {
  if (hasFeetInches(value)) return 'in';
  const m = /^\s*[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?\s*(.*?)\s*$/.exec(value);
  const rest = m?.[1];
  if (!rest || !/^[A-Za-z]/.test(rest)) return undefined;
  return rest;
}

/** The display unit a cell shows now (its own, or for an input the one typed). */
function shownUnit(cell: Cell): string | undefined {
  if (cell.kind === 'formula') return cell.unit;
  if (cell.kind === 'input') return cell.unit ?? (cell.choices ? undefined : typedUnit(cell.value));
  return undefined;
}

/**
 * Units each cell showed before the last switch, so switching back restores them
 * exactly (ksi → MPa → ksi rather than psi). Keyed by cell id.
 */
export type UnitMemory = Readonly<Record<string, string>>;

// Cells are immutable: the system of each is worked out once.
const cellSystems = new WeakMap<Cell, UnitSystem | null>();

/** The system of the unit a cell shows, or null when it shows none or a shared one. */
export function cellSystem(cell: Cell): UnitSystem | null {
  let s = cellSystems.get(cell);
  if (s === undefined) {
    const u = shownUnit(cell);
    s = (u ? systemOf(u) : undefined) ?? null;
    cellSystems.set(cell, s);
  }
  return s;
}

/** The system most display units of the sheet are in (US when none says). */
export function sheetSystem(doc: CalcDocument): UnitSystem {
  let us = 0;
  let si = 0;
  for (const cell of doc.cells) {
    const s = cellSystem(cell);
    if (s === 'US') us++;
    else if (s === 'SI') si++;
  }
  return si > us ? 'SI' : 'US';
}

/**
 * Maps every input and formula display unit to `target`. Returns the new sheet and
 * the memory to pass to the next switch. Cells with no counterpart are left alone.
 */
export function switchSystem(
  doc: CalcDocument,
  target: UnitSystem,
  memory: UnitMemory = {},
): { doc: CalcDocument; memory: UnitMemory } {
  const nextMemory: Record<string, string> = {};
  let changed = false;
  const cells = doc.cells.map((cell) => {
    if (cell.kind !== 'input' && cell.kind !== 'formula') return cell;
    const from = shownUnit(cell);
    if (!from || systemOf(from) === target || systemOf(from) === undefined) return cell;
    const remembered = memory[cell.id];
    const to = remembered && canonicalUnit(counterpart(remembered, otherSystem(target))) === canonicalUnit(from)
      ? remembered
      : counterpart(from, target);
    if (to === from) return cell;
    nextMemory[cell.id] = from;
    changed = true;
    return { ...cell, unit: to };
  });
  return { doc: changed ? { ...doc, cells } : doc, memory: nextMemory };
}

function otherSystem(s: UnitSystem): UnitSystem {
  return s === 'US' ? 'SI' : 'US';
}
