// Reading an input cell's typed value: a quantity ("5000 psi", "450 mm",
// "1'-6\"", "2*1.5 ft"), a pure number, yes/no, or one of its choices.

import type { InputCell } from '../document';
import { unitInfo, type Dims } from '../units/dimension';
import { normalizeFeetInches } from '../units/feet-inches';
import { CellError } from './cell-error';
import { compileExpression } from './compile';
import { formatNumber } from './display';
import { BOOL, describeType, numType, TEXT, type VType } from './value-type';

export interface InputValue {
  type: VType;
  value: number | string | boolean;
  /** Unit to show the value in ('' for a pure number, text or boolean). */
  unit: string;
  /** The least and greatest values allowed (SI, and as typed), when the input has them. */
  min?: InputLimit;
  max?: InputLimit;
}

export interface InputLimit {
  si: number;
  text: string;
}

/** "≥ 5 in, ≤ 16 in", as the sheet shows an input's limits ('' when it has none). */
export function limitsText(v: Pick<InputValue, 'min' | 'max'>): string {
  return [v.min && `≥ ${v.min.text}`, v.max && `≤ ${v.max.text}`].filter(Boolean).join(', ');
}

/** Why `si` is not allowed by the limits, or undefined when it is. */
export function outsideLimits(si: number, v: Pick<InputValue, 'min' | 'max' | 'unit'>): string | undefined {
  const tooLow = v.min !== undefined && si < v.min.si * (1 - 1e-12);
  const tooHigh = v.max !== undefined && si > v.max.si * (1 + 1e-12);
  if (!tooLow && !tooHigh) return undefined;
  const shown = v.unit ? `${formatNumber(si / unitInfo(v.unit).factor)} ${v.unit}` : formatNumber(si);
  return `${shown} is ${tooLow ? `below the allowed minimum ${v.min!.text}` : `above the allowed maximum ${v.max!.text}`}`;
}

const NO_CELLS = {
  lookup: () => undefined,
  isCell: () => false,
  names: () => [],
  functions: new Map(),
};

/** A constant quantity typed by a person. Throws CellError with a plain message. */
export function parseQuantityText(text: string, where = 'the value'): { si: number; dims: Dims; hint?: string } {
  const src = normalizeFeetInches(text.trim());
  if (src === '') throw new CellError('syntax', `${where} is empty`, 1);
  let compiled;
  try {
    compiled = compileExpression(src, NO_CELLS);
  } catch (e) {
    if (e instanceof CellError && e.kind === 'unknown-name') {
      throw new CellError('syntax', `${where} "${text.trim()}" is not a number with a unit (e.g. 5000 psi, 450 mm, 1'-6")`, e.column);
    }
    throw e;
  }
  if (compiled.type.t !== 'num') throw new CellError('unit', `${where} must be a number, got ${describeType(compiled.type)}`);
  const si = compiled.run([]) as number;
  if (!Number.isFinite(si)) throw new CellError('non-finite', `${where} is not a finite number`);
  return { si, dims: compiled.type.dims, hint: compiled.type.hint };
}

function checkUnitAgrees(unit: string, dims: Dims, typed: VType, what: string): void {
  let info;
  try {
    info = unitInfo(unit);
  } catch {
    throw new CellError('unit', `the display unit "${unit}" is not a unit Loadtrace knows`);
  }
  const want = numType(info.dims, unit);
  if (!sameDimsLoose(info.dims, dims)) {
    throw new CellError('unit', `${what} is ${describeType(typed)} but the display unit ${unit} is ${describeType(want).replace(/^an? /, 'a ').replace(/ \(.*\)$/, '')}`);
  }
}

function sameDimsLoose(a: Dims, b: Dims): boolean {
  return a.every((x, i) => Math.abs(x - b[i]) < 1e-9);
}

export function parseInput(cell: InputCell): InputValue {
  const raw = cell.value;
  if (cell.choices && cell.choices.length > 0) {
    const v = raw.trim();
    if (!cell.choices.includes(v)) {
      throw new CellError('range', `"${v}" is not one of the choices: ${cell.choices.join(', ')}`);
    }
    return { type: TEXT, value: v, unit: '' };
  }
  const word = raw.trim().toLowerCase();
  if (word === 'yes' || word === 'true') return { type: BOOL, value: true, unit: '' };
  if (word === 'no' || word === 'false') return { type: BOOL, value: false, unit: '' };

  const q = parseQuantityText(raw);
  const type = numType(q.dims, cell.unit || q.hint);
  const unit = cell.unit ?? simpleUnit(q.hint) ?? '';
  if (cell.unit) checkUnitAgrees(cell.unit, q.dims, type, 'the value');
  else if (!unit && !q.dims.every((d) => d === 0)) {
    throw new CellError('unit', `the value is ${describeType(type)}; give the input a display unit`);
  }
  const out: InputValue = { type, value: q.si, unit };
  for (const [bound, label] of [[cell.min, 'minimum'], [cell.max, 'maximum']] as const) {
    if (bound === undefined || bound.trim() === '') continue;
    const b = parseQuantityText(bound, `the ${label}`);
    if (!sameDimsLoose(b.dims, q.dims)) {
      throw new CellError('unit', `the ${label} ${bound} is ${describeType(numType(b.dims, b.hint))} but the value is ${describeType(type)}`);
    }
    out[label === 'minimum' ? 'min' : 'max'] = { si: b.si, text: bound.trim() };
  }
  const outside = outsideLimits(q.si, out);
  if (outside) throw new CellError('range', outside);
  return out;
}

// The unit a person typed after the number, when it is one plain unit expression.
function simpleUnit(hint: string | undefined): string | undefined {
  if (!hint) return undefined;
  try {
    unitInfo(hint);
    return hint;
  } catch {
    return undefined;
  }
}
