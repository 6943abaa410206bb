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

/**
 * A function a formula calls. Its result is a value (LibValue) for the structural library;
 * a figure function's is a figure spec (runtime/figures/functions.ts), and code that takes
 * either (the formula compiler, the working) reads LibFunction<unknown>.
 */
export interface LibFunction<R = LibValue> {
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
  /**
   * Called with one value per param, in order, of the param's type (checked when the
   * formula compiles; undefined for a left-out optional one). Method syntax: each
   * function declares its own argument types, kept in step by defineFunction.
   */
  fn(...args: unknown[]): R;
}

/** An error a library function raises about its arguments; shown at the calling cell. */
export class LibraryError extends Error {
  override name = 'LibraryError';
}

/**
 * The argument a param hands the function: a string for 'text', a boolean for 'bool', a
 * number for a physical type. A param whose type was widened to `string` (declared as
 * LibParam) is not checked (never: any argument type is accepted for it).
 */
type ArgOf<P> = P extends { type: infer T }
  ? string extends T ? never
    : T extends 'text' ? (P extends { choices: readonly (infer C)[] } ? C : string)
      : T extends 'bool' ? boolean : number
  : never;
/** One argument per param; params built from an array of unknown length are not checked. */
export type ArgsOf<Ps extends readonly LibParam[]> = number extends Ps['length'] ? never[] : { -readonly [I in keyof Ps]: ArgOf<Ps[I]> };

/** The function takes exactly as many arguments as there are params (optional ones included). */
type ArgCount<F> = F extends (...args: infer A) => unknown ? Required<A>['length'] : never;
export type SameCount<Ps extends readonly LibParam[], F> =
  number extends Ps['length'] ? unknown
    : ArgCount<F> extends Ps['length'] ? unknown
      : { error: 'the function takes another number of arguments than there are params' };

/**
 * A library function, with its params and its function kept in step: the function takes
 * one argument per param, a string for a 'text' param, a boolean for 'bool', a number for
 * the rest. A mismatch is a compile error at the definition.
 */
export function defineFunction<const Ps extends readonly LibParam[], F extends (...args: ArgsOf<Ps>) => LibValue>(
  def: Omit<LibFunction, 'params' | 'fn'> & { params: Ps; fn: F & SameCount<Ps, F> },
): LibFunction {
  return { ...def, params: [...def.params], fn: def.fn };
}
