// Reinforcing bar tables. Designations (our notation):
//   "#3".."#18"     inch-pound sizes of ASTM A615 (number = diameter in eighths of an inch);
//   "#10M".."#57M"  the soft-metric sizes of ASTM A615M (same bars, metric numbers);
//   "D8".."D40"     metric bars of ISO 6935-2 / EN 10080 by nominal diameter in mm.
// Values are stored as printed in the standards' tables (in, in², lb/ft; mm, mm², kg/m)
// and converted exactly to SI base units on the way out.

import { defineFunction, LibraryError, type LibFunction } from './types';
import { inch, ft, lbf, mm } from '../units/si';
import { working } from '../working/recorder';

export interface BarData {
  dia: number; // m
  area: number; // m²
  mass: number; // kg/m
  system: 'inch-pound' | 'metric';
}

const LB = lbf / 9.80665; // kg in one pound mass

/** ASTM A615 inch-pound bars: diameter in, area in², weight lb/ft. */
const A615: [string, number, number, number][] = [
  ['#3', 0.375, 0.11, 0.376], ['#4', 0.5, 0.2, 0.668], ['#5', 0.625, 0.31, 1.043],
  ['#6', 0.75, 0.44, 1.502], ['#7', 0.875, 0.6, 2.044], ['#8', 1.0, 0.79, 2.67],
  ['#9', 1.128, 1.0, 3.4], ['#10', 1.27, 1.27, 4.303], ['#11', 1.41, 1.56, 5.313],
  ['#14', 1.693, 2.25, 7.65], ['#18', 2.257, 4.0, 13.6],
];

/** ASTM A615M soft-metric bars: diameter mm, area mm², mass kg/m. */
const A615M: [string, number, number, number][] = [
  ['#10M', 9.5, 71, 0.56], ['#13M', 12.7, 129, 0.994], ['#16M', 15.9, 199, 1.552],
  ['#19M', 19.1, 284, 2.235], ['#22M', 22.2, 387, 3.042], ['#25M', 25.4, 510, 3.973],
  ['#29M', 28.7, 645, 5.06], ['#32M', 32.3, 819, 6.404], ['#36M', 35.8, 1006, 7.907],
  ['#43M', 43.0, 1452, 11.38], ['#57M', 57.3, 2581, 20.24],
];

/** ISO 6935-2 nominal diameters, mm; area πd²/4 and mass at 7850 kg/m³ (common practice). */
const ISO_DIAS = [8, 10, 12, 14, 16, 20, 25, 28, 32, 40];
const STEEL_DENSITY = 7850; // kg/m³

const TABLE = new Map<string, BarData>();
for (const [k, d, a, w] of A615) {
  TABLE.set(k, { dia: d * inch, area: a * inch * inch, mass: (w * LB) / ft, system: 'inch-pound' });
}
for (const [k, d, a, w] of A615M) {
  TABLE.set(k, { dia: d * mm, area: a * mm * mm, mass: w, system: 'metric' });
}
for (const d of ISO_DIAS) {
  const area = (Math.PI * (d * mm) ** 2) / 4;
  TABLE.set(`D${d}`, { dia: d * mm, area, mass: area * STEEL_DENSITY, system: 'metric' });
}

export const BARS: readonly string[] = [...TABLE.keys()];

/** The table row of a bar, by its exact designation ("#5", "#16M", "D16"). */
export function barData(bar: string): BarData {
  if (typeof bar !== 'string') throw new LibraryError(`bar must be a designation such as "#5", "#16M" or "D16"`);
  const row = TABLE.get(bar);
  if (!row) {
    throw new LibraryError(
      `unknown bar "${bar}"; use "#3".."#18" (ASTM A615), "#10M".."#57M" (A615M) or "D8".."D40" (ISO 6935-2): ${BARS.join(' ')}`,
    );
  }
  return row;
}

/** ASTM A615 / A615M / ISO 6935-2 nominal area of one bar. */
export function barArea(bar: string): number {
  const a = barData(bar).area;
  working()?.lookup('A_b', a, 'in^2', `${bar} bar`, sourceOf(bar));
  return a;
}

/** ASTM A615 / A615M / ISO 6935-2 nominal diameter. */
export function barDia(bar: string): number {
  const d = barData(bar).dia;
  working()?.lookup('d_b', d, 'in', `${bar} bar`, sourceOf(bar));
  return d;
}

/** ASTM A615 / A615M nominal mass per metre (ISO bars: 7850 kg/m³ × area). */
export function barMass(bar: string): number {
  const m = barData(bar).mass;
  working()?.lookup('m_b', m, 'kg/m', `${bar} bar`, sourceOf(bar));
  return m;
}

/** The table a bar's row comes from. */
function sourceOf(bar: string): string {
  return bar.startsWith('D') ? 'ISO 6935-2 (πd²/4, 7850 kg/m³)' : bar.endsWith('M') ? 'ASTM A615M' : 'ASTM A615';
}

const BAR = { name: 'bar', type: 'text', choices: BARS, doc: 'bar designation: "#5", "#16M" or "D16"' };
const CLAUSE = 'ASTM A615 / A615M; ISO 6935-2 (πd²/4)';

export const functions: LibFunction[] = [
  defineFunction({
    name: 'bar_area', params: [BAR], returns: 'm^2', clause: CLAUSE,
    doc: 'Nominal cross-section area of one bar',
    fn: (bar: string) => barArea(bar),
  }),
  defineFunction({
    name: 'bar_dia', params: [BAR], returns: 'm', clause: CLAUSE,
    doc: 'Nominal diameter of one bar',
    fn: (bar: string) => barDia(bar),
  }),
  defineFunction({
    name: 'bar_mass', params: [BAR], returns: 'kg/m', clause: CLAUSE,
    doc: 'Nominal mass per length of one bar',
    fn: (bar: string) => barMass(bar),
  }),
];
