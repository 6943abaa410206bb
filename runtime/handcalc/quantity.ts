// Numbers and units as typeset: 12.5 in → 12.5\,\mathrm{in}, kN/m^3 → kN/m³ upright.

import type { DisplayValue } from '../engine-types';
import { textTex } from './names';

/** A formatted number ("−1.5", "2.4e−5", "∞", "12,500") as TeX. */
export function numberTex(text: string): string {
  const t = text.trim().replace(/−/g, '-');
  if (t === '∞' || t === 'Infinity') return '\\infty';
  if (t === '-∞' || t === '-Infinity') return '-\\infty';
  const m = /^(-?[\d,]*\.?\d+)(?:e([-+]?\d+))?$/i.exec(t);
  if (!m) return textTex(text);
  const mantissa = m[1].replace(/,/g, '{,}');
  return m[2] === undefined ? mantissa : `${mantissa}\\times10^{${m[2].replace('+', '')}}`;
}

/** A unit text as TeX: names upright, `*` as a centred dot, `^n` as a superscript. */
export function unitTex(unit: string): string {
  const u = unit.trim();
  if (u === '' || u === '1') return '';
  let out = '';
  const re = /\s*([A-Za-z]+|\^\s*\(?-?\d+(?:\.\d+)?\)?|[*/()·]|\s+)\s*/y;
  let pos = 0;
  while (pos < u.length) {
    re.lastIndex = pos;
    const m = re.exec(u);
    if (!m) return textTex(u); // not a unit we can set: show it as text
    const tok = m[1];
    if (/^[A-Za-z]+$/.test(tok)) out += `\\mathrm{${tok}}`;
    else if (tok.startsWith('^')) out += `^{${tok.replace(/[\s^()]/g, '')}}`;
    else if (tok === '*' || tok === '·' || tok.trim() === '') out += '\\cdot ';
    else if (tok === '/') out += '/';
    else out += tok === '(' ? '\\left(' : '\\right)';
    pos = re.lastIndex;
  }
  return out;
}

/** The number part of a display text, without its unit. */
function numberPart(d: DisplayValue): string {
  if (d.unit && d.text.endsWith(d.unit)) return d.text.slice(0, d.text.length - d.unit.length).trim();
  return d.text;
}

/** A displayed value (number with unit, text or yes/no) as TeX. */
export function quantityTex(d: DisplayValue): string {
  if (typeof d.value === 'boolean') return textTex(d.text);
  if (typeof d.value === 'string') return textTex(d.text);
  const unit = unitTex(d.unit);
  const num = numberTex(numberPart(d));
  return unit ? `${num}\\,${unit}` : num;
}

/** Whether a value needs brackets when put in place of a symbol inside a formula. */
export function needsBrackets(d: DisplayValue): boolean {
  if (typeof d.value !== 'number') return false;
  return d.unit.trim() !== '' || d.value < 0 || /e/i.test(d.text);
}
