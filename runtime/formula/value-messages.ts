// What a typed value's error says: the cell, what was expected, and the fix
// ("B is a length: add a unit, for example 11 ft").

import { describeDims, isDimless, type Dims } from '../units/dimension';
import { nearestName } from './suggest';

/** Units people type most; an unknown word is compared with these for "did you mean". */
const COMMON_UNITS = [
  'in', 'ft', 'yd', 'mm', 'cm', 'm', 'psi', 'ksi', 'psf', 'ksf', 'pcf', 'plf', 'klf', 'lbf', 'kip', 'kips',
  'kipft', 'N', 'kN', 'MN', 'Pa', 'kPa', 'MPa', 'GPa', 'deg', 'rad', 'lbf/ft^3', 'kN/m^2', 'kN/m^3',
];

/** "a length", "a stress or pressure", "a pure number". */
function quantity(dims: Dims): string {
  const what = describeDims(dims);
  return `${/^[aeiou]/.test(what) ? 'an' : 'a'} ${what}`;
}

/** The number a person typed, for an example with the right unit ("11" of "11 psi"). */
function numberPart(typed: string): string {
  return /^[-+−]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?/.exec(typed)?.[0] ?? '1';
}

/** A value of one kind where the input is of another (or a bare number where it has a unit). */
export function wrongQuantityMessage(name: string, typed: string, unit: string, want: Dims, got: Dims): string {
  const example = `for example ${numberPart(typed)} ${unit}`;
  if (isDimless(got)) return `${name} is ${quantity(want)}: add a unit, ${example}`;
  if (isDimless(want)) return `${name} is a pure number, but ${typed} is ${quantity(got)}: type the number alone`;
  return `${name} is ${quantity(want)} (${unit}), but ${typed} is ${quantity(got)}: give ${quantity(want)}, ${example}`;
}

/** A word in a value that is neither a number nor a unit ("9 ftt", "sum(1)"). */
export function unknownWordMessage(src: string, column: number | undefined, where: string, typed: string): string {
  const word = column === undefined ? undefined : /^[A-Za-z_][A-Za-z0-9_]*/.exec(src.slice(column - 1))?.[0];
  if (!word || !/^[-+−.\d]/.test(typed)) return `${where} "${typed}" is not a number with a unit (e.g. 5000 psi, 450 mm, 1'-6")`;
  const near = nearestName(word, COMMON_UNITS);
  return `${where}: "${word}" is not a unit${near ? `; did you mean ${near}?` : ''} (type a number with a unit, e.g. 5000 psi, 450 mm, 1'-6")`;
}
