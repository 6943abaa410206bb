// What a cell name may be. Names are identifiers that do not collide with the
// formula language's own words or functions.

import { isName } from './tokens';

/** Words the parser reads as operators or constants. */
export const RESERVED = new Set([
  'and', 'or', 'not', 'xor', 'mod', 'to', 'in', 'true', 'false', 'null', 'undefined',
  'end', 'NaN', 'Infinity',
]);

export const MAX_NAME_LENGTH = 64;

/** Why `name` cannot name a cell, or undefined when it can. */
export function nameProblem(name: string, functionNames: ReadonlySet<string>): string | undefined {
  if (name === '') return 'the cell needs a name';
  if (name.length > MAX_NAME_LENGTH) return `a name may have at most ${MAX_NAME_LENGTH} characters`;
  if (!isName(name)) {
    return `"${name}" is not a valid name: use letters, digits and _, starting with a letter (e.g. fc, phi_Vc)`;
  }
  if (RESERVED.has(name)) return `"${name}" is a word of the formula language and cannot name a cell`;
  if (functionNames.has(name)) return `"${name}" is a function name and cannot name a cell`;
  return undefined;
}
