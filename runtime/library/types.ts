// The contract between the engine and the structural function library.
//
// Every library function works on plain numbers in SI base units (m, N, Pa, N*m, rad)
// and declares the physical type of each argument and of its result. The engine checks
// those types once, when a formula is compiled, and then calls the function on plain
// numbers. A function that computes in the units its clause states (psi, in) converts
// with the constants in runtime/units/si.ts.

/**
 * The physical type of a value: an SI unit expression mathjs understands
 * ('m', 'm^2', 'Pa', 'N', 'N*m', 'N/m', 'N/m^3', 'rad', '1' for a pure number),
 * or 'text' (a choice such as "interior", "#5", "318-19"), or 'bool'.
 */
export type ValueType = string;

export interface LibParam {
  name: string;
  type: ValueType;
  doc?: string;
  /** For 'text' parameters: the allowed values, used for completion and errors. */
  choices?: readonly string[];
}

export type LibValue = number | string | boolean;

export interface LibFunction {
  /** Name as called in formulas: a short trade symbol, lower_snake (e.g. `beta1`, `punch_bo`). */
  name: string;
  params: LibParam[];
  /** How many trailing params may be left out (the function then gets `undefined`). */
  optional?: number;
  returns: ValueType;
  /** Clause or published source, e.g. 'ACI 318-19 Table 22.2.2.4.3'. Shown in the hand calc. */
  clause: string;
  /** One line for completion and the help panel. */
  doc: string;
  fn: (...args: any[]) => LibValue;
}

/** An error a library function raises about its arguments; shown at the calling cell. */
export class LibraryError extends Error {
  override name = 'LibraryError';
}

/** Identity helper that keeps the literal types checked. */
export function defineFunction(def: LibFunction): LibFunction {
  return def;
}
