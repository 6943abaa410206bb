// Turning engine values (SI numbers, texts, booleans) into what people read:
// a number in the cell's display unit at a sensible precision.

import type { DisplayValue } from '../engine-types';
import { unitInfo } from '../units/dimension';

export const DEFAULT_PRECISION = 4;

/** Significant figures without float crumbs (11.999999999999998 → "12") or needless exponents. */
export function formatNumber(x: number, sig = DEFAULT_PRECISION): string {
  if (!Number.isFinite(x)) return Number.isNaN(x) ? 'NaN' : x > 0 ? '∞' : '−∞';
  if (x === 0) return '0';
  const ax = Math.abs(x);
  if (ax >= 1e-4 && ax < 1e15) {
    const digits = Math.floor(Math.log10(ax)) + 1;
    if (digits >= sig) return String(Math.round(x)).replace('-', '−');
    const fixed = x.toFixed(Math.min(20, sig - digits));
    return stripZeros(fixed).replace('-', '−');
  }
  const [m, e] = x.toExponential(sig - 1).split('e');
  return `${stripZeros(m)}e${e.replace('+', '')}`.replace('-', '−');
}

function stripZeros(s: string): string {
  return s.includes('.') ? s.replace(/\.?0+$/, '') : s;
}

/** A number in SI base units shown in `unit` ('' for a pure number). */
export function displayNumber(si: number, unit: string, precision = DEFAULT_PRECISION): DisplayValue {
  const value = unit ? si / unitInfo(unit).factor : si;
  const text = formatNumber(value, precision);
  return { value, unit, text: unit ? `${text} ${unit}` : text };
}

export function displayOther(v: string | boolean): DisplayValue {
  return { value: v, unit: '', text: typeof v === 'boolean' ? (v ? 'yes' : 'no') : v };
}
