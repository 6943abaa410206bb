// Reduction of uniform floor live loads, ASCE 7-22 §4.7 (mirrored by IBC §1607).
// Eq. 4.7-1 is written in ft² (15/√(KLL·AT)); the SI form uses 4.57 = 15/√10.764 in m².
// Inputs are SI, so converting AT to ft² exactly gives one answer for both forms.

import { defineFunction, type LibFunction } from './types';
import { choice, count, nonNegative, positive } from './gravity-args';
import { ft, psf } from '../units/si';
import { ended, working } from '../working/recorder';

/** ASCE 7-22 Table 4.7-1 live load element factor KLL, keyed by element. */
export const KLL_TABLE = {
  'interior-column': 4,
  'exterior-column': 4, // exterior column without cantilever slabs
  'edge-column-cantilever': 3,
  'corner-column-cantilever': 2,
  'edge-beam': 2, // edge beam without cantilever slabs
  'interior-beam': 2,
  'edge-beam-cantilever': 1,
  'cantilever-beam': 1,
  'one-way-slab': 1,
  'two-way-slab': 1,
  other: 1, // all other members, incl. members without continuous shear transfer normal to their span
} as const;
export type LlElement = keyof typeof KLL_TABLE;
export const ELEMENTS = Object.keys(KLL_TABLE) as LlElement[];

export const OCCUPANCIES = ['general', 'assembly', 'garage'] as const;
export type Occupancy = (typeof OCCUPANCIES)[number];

/** The KLL·AT area above which reduction is permitted: 400 ft² (ASCE 7-22 §4.7.2). */
export const INFLUENCE_MIN = 400 * ft * ft;

/** ASCE 7-22 Table 4.7-1: KLL for an element type. */
export function kll(element: LlElement): number {
  const e = choice('element', element, ELEMENTS);
  const k = KLL_TABLE[e];
  working()?.lookup('K_LL', k, '', `row: ${e.replace(/-/g, ' ')}`, 'ASCE 7-22 Table 4.7-1');
  return k;
}

/** ASCE 7-22 §4.7.2: true when KLL·AT ≥ 400 ft² (37.16 m²), so the live load may be reduced. */
export function lldApplies(AT: number, KLL: number): boolean {
  const a = nonNegative('AT', AT);
  const k = positive('KLL', KLL);
  const applies = k * a >= INFLUENCE_MIN * (1 - 1e-12);
  const w = working();
  if (w) {
    w.step('KLL_AT', 'KLL * AT', k * a, 'ft^2', { vars: { KLL: k, AT: [a, 'ft^2'] }, clause: 'ASCE 7-22 §4.7.2' });
    w.step('reducible', 'KLL_AT >= 400', applies, '', {
      code: true, clause: 'ASCE 7-22 §4.7.2',
      note: applies ? 'KLL·AT ≥ 400 ft²: reduction permitted' : 'KLL·AT < 400 ft²: no reduction',
    });
  }
  return applies;
}

/** ASCE 7-22 Eq. 4.7-1 factor L/Lo = 0.25 + 15/√(KLL·AT[ft²]), ≤ 1, ≥ 0.50 (one floor) or 0.40 (two or more). */
export function lldFactor(AT: number, KLL: number, floors: number): number {
  const a = nonNegative('AT', AT);
  const k = positive('KLL', KLL);
  const n = count('floors', floors, 1);
  const w = working();
  if (!lldApplies(a, k)) {
    w?.step('L_Lo', '1', 1, '', { note: 'not reduced (KLL·AT < 400 ft², §4.7.2)' });
    return 1;
  }
  const influenceFt2 = (k * a) / (ft * ft);
  const factor = 0.25 + 15 / Math.sqrt(influenceFt2);
  const floor = n >= 2 ? 0.4 : 0.5;
  const out = Math.min(1, Math.max(factor, floor));
  if (w) {
    w.step('L_Lo', '0.25 + 15 / sqrt(KLL_AT)', factor, '', { code: true, clause: 'ASCE 7-22 Eq. 4.7-1' });
    const bites = factor < floor;
    w.step('L_Lo', `min(1, max(L_Lo, ${floor}))`, out, '', {
      vars: { floors: n }, clause: 'ASCE 7-22 §4.7.2', governs: bites,
      note: bites
        ? `the limit ${floor.toFixed(2)} governs (${n >= 2 ? 'two or more floors: not below 0.40' : 'one floor: not below 0.50'})`
        : `above the ${floor.toFixed(2)} limit (${n >= 2 ? 'two or more floors' : 'one floor'})`,
    });
  }
  return out;
}

/**
 * ASCE 7-22 §4.7.2–4.7.5: reduced live load L. Assembly: not reduced (§4.7.5). Lo > 100 psf
 * (§4.7.3) or passenger-vehicle garages (§4.7.4): not reduced, except members supporting two
 * or more floors by at most 20 % and not below the Eq. 4.7-1 value.
 */
export function liveReduced(Lo: number, AT: number, KLL: number, floors: number, occupancy: Occupancy = 'general'): number {
  const lo = nonNegative('Lo', Lo);
  const occ = choice('occupancy', occupancy, OCCUPANCIES, 'general');
  const w = working()?.open('live_reduced', { Lo: [lo, 'psf'], AT: [AT, 'ft^2'], KLL, floors, occupancy: occ }, 'ASCE 7-22 §4.7.2-4.7.5');
  const factor = lldFactor(AT, KLL, floors);
  if (occ === 'assembly') {
    w?.step('L', 'Lo', lo, 'psf', { clause: 'ASCE 7-22 §4.7.5', note: 'assembly occupancy: not reduced' });
    return ended(w, lo, 'psf');
  }
  const heavy = lo > 100 * psf * (1 + 1e-12);
  if (heavy || occ === 'garage') {
    const why = heavy ? 'Lo > 100 psf (§4.7.3)' : 'passenger-vehicle garage (§4.7.4)';
    if (floors >= 2) {
      const out = lo * Math.max(factor, 0.8);
      w?.step('L', 'Lo * max(L_Lo, 0.8)', out, 'psf', {
        clause: heavy ? 'ASCE 7-22 §4.7.3' : 'ASCE 7-22 §4.7.4',
        note: `${why}: two or more floors, reduced by at most 20 %`, governs: factor < 0.8,
      });
      return ended(w, out, 'psf');
    }
    w?.step('L', 'Lo', lo, 'psf', { note: `${why}: one floor, not reduced` });
    return ended(w, lo, 'psf');
  }
  const out = lo * factor;
  w?.step('L', 'Lo * L_Lo', out, 'psf', { clause: 'ASCE 7-22 Eq. 4.7-1' });
  return ended(w, out, 'psf');
}

/** ASCE 7-22 §4.7.6: the tributary area of a one-way slab may not exceed 1.5 ls². */
export function atOneWaySlab(AT: number, ls: number): number {
  const a = nonNegative('AT', AT);
  const s = positive('ls', ls);
  const out = Math.min(a, 1.5 * s * s);
  working()?.step('AT', 'min(AT, 1.5 * ls^2)', out, 'ft^2', {
    vars: { AT: [a, 'ft^2'], ls: [s, 'ft'] }, clause: 'ASCE 7-22 §4.7.6',
    note: out < a ? 'capped at 1.5 ls²' : undefined, governs: out < a,
  });
  return out;
}

export const functions: LibFunction[] = [
  defineFunction({
    name: 'kll',
    params: [{ name: 'element', type: 'text', choices: ELEMENTS, doc: 'member type' }],
    returns: '1', clause: 'ASCE 7-22 Table 4.7-1',
    doc: 'Live load element factor KLL',
    fn: (e: LlElement) => kll(e),
  }),
  defineFunction({
    name: 'lld_applies',
    params: [
      { name: 'AT', type: 'm^2', doc: 'tributary area' },
      { name: 'KLL', type: '1', doc: 'live load element factor' },
    ],
    returns: 'bool', clause: 'ASCE 7-22 §4.7.2',
    doc: 'Reduction permitted: KLL·AT ≥ 400 ft² (37.16 m²)',
    fn: (AT: number, K: number) => lldApplies(AT, K),
  }),
  defineFunction({
    name: 'lld_factor',
    params: [
      { name: 'AT', type: 'm^2', doc: 'tributary area (summed over the floors supported)' },
      { name: 'KLL', type: '1', doc: 'live load element factor' },
      { name: 'floors', type: '1', doc: 'number of floors the member supports' },
    ],
    returns: '1', clause: 'ASCE 7-22 §4.7.2, Eq. 4.7-1',
    doc: 'Live load reduction factor L/Lo with the 0.50 / 0.40 floors',
    fn: (AT: number, K: number, n: number) => lldFactor(AT, K, n),
  }),
  defineFunction({
    name: 'live_reduced',
    params: [
      { name: 'Lo', type: 'N/m^2', doc: 'unreduced design live load' },
      { name: 'AT', type: 'm^2', doc: 'tributary area (summed over the floors supported)' },
      { name: 'KLL', type: '1', doc: 'live load element factor' },
      { name: 'floors', type: '1', doc: 'number of floors the member supports' },
      { name: 'occupancy', type: 'text', choices: OCCUPANCIES, doc: 'general, assembly or garage' },
    ],
    optional: 1, returns: 'N/m^2', clause: 'ASCE 7-22 §4.7.2-4.7.5',
    doc: 'Reduced live load L, with the heavy-load, garage and assembly rules',
    fn: (Lo: number, AT: number, K: number, n: number, occ?: Occupancy) => liveReduced(Lo, AT, K, n, occ),
  }),
  defineFunction({
    name: 'at_one_way_slab',
    params: [
      { name: 'AT', type: 'm^2', doc: 'tributary area' },
      { name: 'ls', type: 'm', doc: 'span of the one-way slab' },
    ],
    returns: 'm^2', clause: 'ASCE 7-22 §4.7.6',
    doc: 'Tributary area of a one-way slab, capped at 1.5 ls²',
    fn: (AT: number, ls: number) => atOneWaySlab(AT, ls),
  }),
];

