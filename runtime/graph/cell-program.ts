// Turning one cell into what the reactive graph runs: its published type, the
// variables it reads, and a definition that computes its value on plain numbers.

import type { CheckCell, FormulaCell, InputCell } from '../document';
import { CellError } from '../formula/cell-error';
import type { MathNode } from '../formula/nodes';
import { compileExpression, type CompileScope } from '../formula/compile';
import { compileCheck } from '../formula/compile-check';
import { displayNumber } from '../formula/display';
import { parseInput, type InputValue } from '../formula/input-value';
import { unitInfo } from '../units/dimension';
import { unitInSystem } from '../units/preferred';
import type { UnitSystem } from '../units/systems';
import type { TableValue } from '../table/types';
import { BOOL, describeType, NUMBER, numType, sameType, type VType } from '../formula/value-type';
import { isDimless } from '../units/dimension';

/** A check's value in the graph: what readers see (`value`) plus what the view shows. */
export interface CheckResult {
  value: number | boolean;
  pass: boolean;
  demand?: number;
  capacity?: number;
}

export interface CellProgram {
  /** Type other cells see when they read this one; undefined when broken. */
  type?: VType;
  inputs: string[];
  reads: string[];
  clauses: string[];
  definition: (...args: unknown[]) => unknown;
  /** Display unit of the value ('' for pure numbers, texts, booleans). */
  unit: string;
  /** Checks: display units of demand and capacity. */
  demandUnit?: string;
  form?: 'ratio' | 'condition';
  /** Inputs: an error to show while the last good value keeps computing. */
  inputError?: CellError;
  /** Inputs: the parsed value (for display). */
  input?: InputValue;
  /** Tables: the values read (the next reading keeps its good values where a new one is bad). */
  table?: TableValue;
  /** The graph holds a check's result `{ value, pass, ... }`: readers take its `value`. */
  unwrap?: boolean;
}

/** A program that only reports `error` (with the names it would have read). */
export function failing(error: CellError, reads: string[] = []): CellProgram {
  return {
    inputs: [],
    reads,
    clauses: [],
    unit: '',
    definition: () => {
      throw error;
    },
  };
}

export function inputProgram(cell: InputCell, lastGood?: CellProgram): CellProgram {
  try {
    const input = parseInput(cell);
    const value = input.value;
    return { type: input.type, inputs: [], reads: [], clauses: [], unit: input.unit, input, definition: () => value };
  } catch (e) {
    const error = asCellError(e);
    // A bad value is reported at the input while the last good one keeps the rest computing.
    if (lastGood?.input) return { ...lastGood, inputError: error };
    return failing(error);
  }
}

export function formulaProgram(cell: FormulaCell, scope: CompileScope): CellProgram {
  let compiled;
  try {
    compiled = compileExpression(cell.expr, scope);
  } catch (e) {
    return failing(asCellError(e));
  }
  const { reads, clauses, inputs } = compiled;
  const unit = cell.unit?.trim() ?? '';
  let type: VType = compiled.type;
  if (unit) {
    let info;
    try {
      info = unitInfo(unit);
    } catch {
      return failing(new CellError('unit', `the display unit "${unit}" is not a unit Loadtrace knows`), reads);
    }
    const want = numType(info.dims, unit);
    if (!sameType(compiled.type, want)) {
      return failing(new CellError('unit', `the formula gives ${describeType(compiled.type)} but its display unit ${unit} is for ${describeType(want).replace(/ \(.*\)$/, '')}`), reads);
    }
    type = want;
  } else if (type.t === 'num' && !isDimless(type.dims)) {
    return failing(new CellError('unit', `the formula gives ${describeType(type)}; give the cell a display unit for it`), reads);
  }
  const run = compiled.run;
  const name = cell.name;
  return {
    type,
    inputs,
    reads,
    clauses,
    unit,
    definition: (...args: unknown[]) => {
      const v = run(args);
      if (typeof v === 'number' && !Number.isFinite(v)) {
        throw new CellError('non-finite', `${name} is ${Number.isNaN(v) ? 'not a number' : 'infinite'}: look for a division by zero or the root of a negative value`);
      }
      return v;
    },
  };
}

export function checkProgram(
  cell: CheckCell,
  scope: CompileScope,
  unitOf: (source: MathNode) => string,
  system: UnitSystem,
): CellProgram {
  let compiled;
  try {
    compiled = compileCheck(cell.expr, scope);
  } catch (e) {
    return failing(asCellError(e));
  }
  const { reads, clauses, inputs, pass } = compiled;
  if (compiled.form === 'condition') {
    return {
      type: BOOL, inputs, reads, clauses, unit: '', form: 'condition', unwrap: true,
      definition: (...args: unknown[]): CheckResult => {
        const ok = !!pass(args);
        return { value: ok, pass: ok };
      },
    };
  }
  const d = compiled.demand!, k = compiled.capacity!;
  // The unit of a cell named on either side (it follows unit switches itself), else the
  // unit typed in a quantity or the usual one, in the sheet's system.
  const demandUnit = unitOf(d.source) || unitOf(k.source)
    || unitInSystem(knownUnit(d.type) || knownUnit(k.type), (d.type as { dims: readonly number[] }).dims, system);
  return {
    type: NUMBER, inputs, reads, clauses, unit: '', demandUnit, form: 'ratio', unwrap: true,
    definition: (...args: unknown[]): CheckResult => {
      const demand = d.run(args) as number;
      const capacity = k.run(args) as number;
      if (!Number.isFinite(demand) || !Number.isFinite(capacity)) {
        throw new CellError('non-finite', `the ${Number.isFinite(demand) ? 'capacity' : 'demand'} is not a finite number`);
      }
      const negative = negativeSide(demand, capacity, demandUnit);
      if (negative) throw new CellError('range', negative);
      const ratio = capacity === 0 ? (demand === 0 ? 0 : Infinity) : demand / capacity;
      return { value: ratio, pass: !!pass(args), demand, capacity };
    },
  };
}

/**
 * A check cannot pass on a negative demand or capacity (a ratio of −1 is not "OK"): it
 * says which side, its value, and what to look at.
 */
function negativeSide(demand: number, capacity: number, unit: string): string | undefined {
  const side = capacity < 0 ? 'capacity' : demand < 0 ? 'demand' : undefined;
  if (!side) return undefined;
  const v = side === 'capacity' ? capacity : demand;
  const shown = unit ? displayNumber(v, unit).text : String(v);
  return `the ${side} is negative (${shown}); a demand/capacity check needs both at least zero: look at the inputs it reads`;
}

function knownUnit(t: VType): string {
  if (t.t !== 'num' || !t.hint) return '';
  try {
    unitInfo(t.hint);
    return t.hint;
  } catch {
    return '';
  }
}

export function asCellError(e: unknown): CellError {
  if (e instanceof CellError) return e;
  return new CellError('library', e instanceof Error ? e.message : String(e));
}
