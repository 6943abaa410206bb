// The unit to show a value in when nothing names one (e.g. both sides of a check
// are expressions): the usual trade unit of its dimension in the sheet's system.

import { sameDims, unitInfo, type Dims } from './dimension';
import { counterpart, type UnitSystem } from './systems';

const PREFERRED: Record<UnitSystem, string[]> = {
  US: ['in', 'in^2', 'in^3', 'in^4', 'psi', 'kip', 'kip*ft', 'klf', 'pcf', 'deg'],
  SI: ['mm', 'mm^2', 'mm^3', 'mm^4', 'MPa', 'kN', 'kN*m', 'kN/m', 'kN/m^3', 'deg'],
};

/** '' for a pure number or a dimension with no usual unit (then SI base units are shown). */
export function preferredUnit(dims: Dims, system: UnitSystem): string {
  if (dims.every((d) => d === 0)) return '';
  return PREFERRED[system].find((u) => sameDims(unitInfo(u).dims, dims)) ?? '';
}

/**
 * Display unit for a value with no cell unit of its own: the unit it was written in
 * (`6 in`), moved into the sheet's system by the pair a switch uses for formula units,
 * else the usual unit of its dimension.
 */
export function unitInSystem(written: string, dims: Dims, system: UnitSystem): string {
  return written ? counterpart(written, system) : preferredUnit(dims, system);
}
