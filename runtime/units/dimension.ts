// Physical dimensions as exponent vectors over mathjs's nine base dimensions
// (mass, length, time, current, temperature, luminous intensity, amount, angle, bit).
// Engine values are plain numbers in SI base units; a unit is a factor and a dimension.

import { math } from './math';

export type Dims = readonly number[];

export const DIMLESS: Dims = Object.freeze([0, 0, 0, 0, 0, 0, 0, 0, 0]);

export interface UnitInfo {
  /** SI value of one of this unit. */
  factor: number;
  dims: Dims;
}

const cache = new Map<string, UnitInfo | Error>();

/** Factor and dimension of a unit text such as "kip*ft", "kN/m^3", "in^2". Throws on a bad unit. */
export function unitInfo(text: string): UnitInfo {
  const hit = cache.get(text);
  if (hit instanceof Error) throw hit;
  if (hit) return hit;
  try {
    const info = parseUnit(text);
    cache.set(text, info);
    return info;
  } catch (e) {
    const err = new Error(`"${text}" is not a unit Loadtrace knows`);
    cache.set(text, err);
    throw err;
  }
}

function parseUnit(text: string): UnitInfo {
  if (text.trim() === '' || text.trim() === '1') return { factor: 1, dims: DIMLESS };
  if (!/^[A-Za-z0-9_ *\/^().\-]+$/.test(text)) throw new Error('bad unit');
  const u = math.unit(text) as any;
  if (u.value !== null) throw new Error('a unit, not a quantity');
  let factor = 1;
  const dims = [0, 0, 0, 0, 0, 0, 0, 0, 0];
  for (const part of u.units as any[]) {
    if (part.unit.offset) throw new Error('offset units (temperatures) are not supported');
    factor *= Math.pow(part.unit.value * part.prefix.value, part.power);
    part.unit.base.dimensions.forEach((d: number, i: number) => (dims[i] += d * part.power));
  }
  return { factor, dims: Object.freeze(dims) };
}

/** Is `name` a single unit symbol (with prefix) that mathjs knows? */
export function isUnitName(name: string): boolean {
  try {
    return (math as any).Unit.isValuelessUnit(name) && !unitHasOffset(name);
  } catch {
    return false;
  }
}

function unitHasOffset(name: string): boolean {
  const u = math.unit(name) as any;
  return u.units.some((p: any) => p.unit.offset);
}

export function sameDims(a: Dims, b: Dims): boolean {
  for (let i = 0; i < 9; i++) if (Math.abs(a[i] - b[i]) > 1e-9) return false;
  return true;
}

export function isDimless(a: Dims): boolean {
  return sameDims(a, DIMLESS);
}

export function addDims(a: Dims, b: Dims, sign = 1): Dims {
  return a.map((x, i) => x + sign * b[i]);
}

export function scaleDims(a: Dims, k: number): Dims {
  return a.map((x) => x * k);
}

const NAMED: [string, string, string][] = [
  // [reference SI unit, name, SI unit shown]
  ['m', 'length', 'm'],
  ['m^2', 'area', 'm^2'],
  ['m^3', 'volume', 'm^3'],
  ['m^4', 'second moment of area', 'm^4'],
  ['N', 'force', 'N'],
  ['Pa', 'stress or pressure', 'Pa'],
  ['N m', 'moment', 'N*m'],
  ['N/m', 'force per length', 'N/m'],
  ['N/m^3', 'unit weight', 'N/m^3'],
  ['kg/m^3', 'density', 'kg/m^3'],
  ['kg', 'mass', 'kg'],
  ['s', 'time', 's'],
  ['rad', 'angle', 'rad'],
  ['Pa^0.5', 'square root of a stress', 'Pa^0.5'],
  ['m/s^2', 'acceleration', 'm/s^2'],
];
let named: { dims: Dims; name: string; unit: string }[] | null = null;

/** A name an engineer recognises for a dimension, e.g. "stress or pressure". */
export function describeDims(d: Dims): string {
  if (isDimless(d)) return 'pure number';
  named ??= NAMED.map(([u, name, unit]) => ({ dims: unitInfo(u).dims, name, unit }));
  const hit = named.find((n) => sameDims(n.dims, d));
  return hit ? hit.name : siUnitText(d);
}

const BASE_SYMBOLS = ['kg', 'm', 's', 'A', 'K', 'cd', 'mol', 'rad', 'bit'];

/** The dimension written in SI base units, e.g. "kg m^-1 s^-2". */
export function siUnitText(d: Dims): string {
  const parts: string[] = [];
  d.forEach((p, i) => {
    if (Math.abs(p) < 1e-9) return;
    const q = Math.round(p * 1000) / 1000;
    parts.push(q === 1 ? BASE_SYMBOLS[i] : `${BASE_SYMBOLS[i]}^${q}`);
  });
  return parts.join(' ') || '1';
}
