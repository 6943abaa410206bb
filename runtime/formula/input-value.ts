// Reading an input cell's typed value: a quantity ("5000 psi", "450 mm",
// "1'-6\"", "2*1.5 ft"), a pure number, yes/no, or one of its choices.

import type { InputCell } from '../document';
import { DIMLESS, siUnitText, unitInfo, type Dims } from '../units/dimension';
import { normalizeFeetInchesMapped } from '../units/feet-inches';
import { CellError } from './cell-error';
import { compileExpression } from './compile';
import { formatNumber } from './display';
import { BOOL, describeType, numType, TEXT, type VType } from './value-type';
import { unknownWordMessage, wrongQuantityMessage } from './value-messages';

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

/** The largest magnitude (in SI) an input's value may have; beyond it no quantity of the trade lies. */
export const LARGEST_VALUE = 1e15;
/** The smallest non-zero magnitude (in SI): below it a value is a slip, and shows as 0. */
export const SMALLEST_VALUE = 1e-15;

/**
 * A constant quantity typed by a person. Throws CellError with a plain message whose
 * column counts in `text` as typed (not after feet-inch notation is rewritten).
 */
export function parseQuantityText(text: string, where = 'the value'): { si: number; dims: Dims; hint?: string } {
  const lead = text.length - text.trimStart().length;
  const typed = text.trim();
  const { text: src, typedColumn } = normalizeFeetInchesMapped(typed);
  const at = (column: number | undefined) => (column === undefined ? undefined : typedColumn(column) + lead);
  if (src === '') throw new CellError('syntax', `${where} is empty: type a number, with its unit if it has one`, 1);
  let compiled;
  try {
    compiled = compileExpression(src, NO_CELLS);
  } catch (e) {
    if (!(e instanceof CellError)) throw e;
    if (e.kind === 'unknown-name') throw new CellError('syntax', unknownWordMessage(src, e.column, where, typed), at(e.column));
    throw new CellError(e.kind, e.message.replace(/^cannot read the formula/, `cannot read ${where}`), at(e.column));
  }
  if (compiled.type.t !== 'num') throw new CellError('unit', `${where} must be a number, got ${describeType(compiled.type)}`);
  const si = compiled.run([]) as number;
  if (!Number.isFinite(si)) throw new CellError('non-finite', `${where} is not a finite number`);
  return { si, dims: compiled.type.dims, hint: compiled.type.hint };
}

/** An input's value beyond any quantity of the trade (1e308, a denormal length) is a slip, not a value. */
function checkMagnitude(si: number, where: string, typed: string): void {
  const size = Math.abs(si);
  if (size <= LARGEST_VALUE && (size === 0 || size >= SMALLEST_VALUE)) return;
  const bound = size > 1 ? `at most ${formatNumber(LARGEST_VALUE)}` : `at least ${formatNumber(SMALLEST_VALUE)}, or 0,`;
  throw new CellError('range', `${where}, ${typed}, is ${size > 1 ? 'larger' : 'smaller'} than any quantity Loadtrace computes with (${bound} in SI units)`);
}

function checkUnitAgrees(cell: InputCell, unit: string, q: { dims: Dims; hint?: string }): void {
  let info;
  try {
    info = unitInfo(unit);
  } catch {
    throw new CellError('unit', `the display unit "${unit}" of ${cell.name} is not a unit Loadtrace knows`);
  }
  if (sameDimsLoose(info.dims, q.dims)) return;
  throw new CellError('unit', wrongQuantityMessage(cell.name, cell.value.trim(), unit, info.dims, q.dims));
}

function sameDimsLoose(a: Dims, b: Dims): boolean {
  return a.every((x, i) => Math.abs(x - b[i]) < 1e-9);
}

export function parseInput(cell: InputCell): InputValue {
  const raw = cell.value;
  if (cell.choices && cell.choices.length > 0) {
    const v = raw.trim();
    if (!cell.choices.includes(v)) {
      throw new CellError('range', `${cell.name}: "${v}" is not one of the choices: ${cell.choices.join(', ')}`);
    }
    return { type: TEXT, value: v, unit: '' };
  }
  const word = raw.trim().toLowerCase();
  const yes = word === 'yes' || word === 'true';
  if (yes || word === 'no' || word === 'false') {
    if (cell.unit) checkUnitAgrees(cell, cell.unit, { dims: DIMLESS });
    return { type: BOOL, value: yes, unit: '' };
  }

  const q = parseQuantityText(raw, `the value of ${cell.name}`);
  checkMagnitude(q.si, `the value of ${cell.name}`, raw.trim());
  const type = numType(q.dims, cell.unit || q.hint);
  const unit = cell.unit ?? simpleUnit(q.hint) ?? '';
  if (cell.unit) checkUnitAgrees(cell, cell.unit, q);
  else if (!unit && !q.dims.every((d) => d === 0)) {
    throw new CellError('unit', `${cell.name} is ${describeType(type)}; give the input a display unit (unit line), for example ${siUnitText(q.dims)}`);
  }
  const out: InputValue = { type, value: q.si, unit };
  for (const [bound, label] of [[cell.min, 'minimum'], [cell.max, 'maximum']] as const) {
    if (bound === undefined || bound.trim() === '') continue;
    const b = parseQuantityText(bound, `the ${label} of ${cell.name}`);
    if (!sameDimsLoose(b.dims, q.dims)) {
      throw new CellError('unit', `the ${label} of ${cell.name}, ${bound.trim()}, is ${describeType(numType(b.dims, b.hint))} but its value is ${describeType(numType(q.dims, q.hint))}: give both in units of one kind`);
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
