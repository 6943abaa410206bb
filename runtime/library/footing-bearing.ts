// Bearing at the column–footing interface (ACI 318-19 §22.8) and the dowels across it:
// the compression beyond the bearing strength (§16.3.1.2(a)) and at least 0.005 Ag (§16.3.4.1). Table 22.8.3.2 and the clause numbers are from memory;
// the form Bn = 0.85 f'c A1 √(A2/A1), √(A2/A1) ≤ 2, φ = 0.65 is the textbook one.

import { LibraryError, defineFunction, type LibFunction } from './types';
import { nonNegative, optional, positive } from './support-args';
import { ksi } from '../units/si';
import { ended, working } from '../working/recorder';

/**
 * A2: base of the largest frustum with 1 vertical : 2 horizontal sides wholly inside the
 * footing, top = the column area A1, column centred (ACI 318-19 §22.8.3.2 / R22.8.3.2).
 */
export function a2Frustum(c1: number, c2: number, l: number, b: number, h: number): number {
  positive('c1', c1);
  positive('c2', c2);
  positive('h', h);
  if (positive('L', l) < c1 || positive('B', b) < c2) {
    throw new LibraryError('the column is larger than the footing');
  }
  // The slope spreads 2h each way at the bottom; the nearest footing edge may stop it sooner.
  const x = Math.min(2 * h, (l - c1) / 2, (b - c2) / 2);
  const a2 = (c1 + 2 * x) * (c2 + 2 * x);
  const w = working();
  if (w) {
    const vars = { c1: [c1, 'in'], c2: [c2, 'in'], L: [l, 'ft'], B: [b, 'ft'], h: [h, 'in'] } as const;
    const clause = 'ACI 318-19 §22.8.3.2 [from memory]';
    w.step('x', 'min(2 * h, (L - c1) / 2, (B - c2) / 2)', x, 'in', { vars, clause, note: x < 2 * h ? 'the footing edge stops the 1:2 slope' : 'the 1:2 slope over the depth' });
    w.step('A2', '(c1 + 2 * x) * (c2 + 2 * x)', a2, 'in^2', { vars, clause });
  }
  return a2;
}

/** Bn = 0.85 f'c A1 √(A2/A1), √(A2/A1) ≤ 2 (ACI 318-19 Table 22.8.3.2); A2 left out → 0.85 f'c A1. */
export function bnBearing(fc: number, a1: number, a2?: number): number {
  positive('fc', fc);
  positive('A1', a1);
  const area2 = a2 === undefined ? a1 : positive('A2', a2);
  if (area2 < a1) throw new LibraryError('A2 must not be smaller than A1');
  const w = working()?.open('bn_bearing', { fc: [fc, 'psi'], A1: [a1, 'in^2'], A2: [area2, 'in^2'] }, "ACI 318-19 Table 22.8.3.2");
  const k = Math.min(Math.sqrt(area2 / a1), 2);
  const bn = 0.85 * fc * a1 * k;
  if (w) {
    const vars = { fc: [fc, 'psi'], A1: [a1, 'in^2'], A2: [area2, 'in^2'] } as const;
    w.step('k_A', 'min(sqrt(A2 / A1), 2)', k, '', { vars, clause: 'ACI 318-19 Table 22.8.3.2 [from memory]', governs: k === 2, note: k === 2 ? '√(A2/A1) capped at 2' : undefined });
    w.step('Bn', '0.85 * fc * A1 * k_A', bn, 'kip', { vars, clause: 'ACI 318-19 Table 22.8.3.2 [from memory]' });
  }
  return ended(w, bn, 'kip');
}

/** φBn with φ = 0.65 for bearing (ACI 318-19 Table 21.2.1). */
export function phiBnBearing(fc: number, a1: number, a2?: number): number {
  const w = working()?.open('phi_bn_bearing', { fc: [fc, 'psi'], A1: [a1, 'in^2'], A2: a2 === undefined ? 'not given' : [a2, 'in^2'] }, "ACI 318-19 §22.8.3.2, φ = 0.65");
  const v = 0.65 * bnBearing(fc, a1, a2);
  w?.step('phi_Bn', '0.65 * Bn', v, 'kip', { clause: 'ACI 318-19 Table 21.2.1: φ = 0.65 for bearing' });
  return ended(w, v, 'kip');
}

/** As,min of dowels = 0.005 Ag of the supported column (ACI 318-19 §16.3.4.1). */
export function asDowelMin(ag: number): number {
  const as = 0.005 * positive('Ag', ag);
  working()?.step('As_min', '0.005 * Ag', as, 'in^2', { vars: { Ag: [ag, 'in^2'] }, clause: 'ACI 318-19 §16.3.4.1' });
  return as;
}

/** φ of bars in compression across the interface: compression-controlled, tied (Table 21.2.2; textbook use, from memory). */
const PHI_DOWEL = 0.65;
/** fy of bars in axial compression is not taken above 80 ksi (ACI 318-19 §22.4.2.1 / Table 20.2.2.4(a), from memory). */
const FY_AXIAL_CAP = 80 * ksi;

export interface DowelDemand {
  excess: number; // Pu − φBn, not below 0, N
  fyUsed: number; // Pa
  asExcess: number; // (Pu − φBn)/(φ fy), m²
  asMin: number; // 0.005 Ag, m²
  asReq: number; // the larger, m²
}

/**
 * Dowels across the column–footing interface: the compression beyond the design bearing strength
 * goes to the bars, As ≥ (Pu − φBn)/(φ fy) (ACI 318-19 §16.3.1.2(a), from memory), and As ≥ 0.005 Ag (§16.3.4.1).
 */
export function dowelDemand(pu: number, phiBn: number, fy: number, ag: number): DowelDemand {
  const excess = Math.max(0, nonNegative('Pu', pu) - positive('φBn', phiBn));
  const fyUsed = Math.min(positive('fy', fy), FY_AXIAL_CAP);
  const asExcess = excess / (PHI_DOWEL * fyUsed);
  const w = working();
  if (w) {
    const vars = { Pu: [pu, 'kip'], phi_Bn: [phiBn, 'kip'], fy: [fyUsed, 'psi'] } as const;
    const clause = 'ACI 318-19 §16.3.1.2(a) [from memory]';
    w.step('P_excess', 'max(0, Pu - phi_Bn)', excess, 'kip', { vars, clause, note: excess > 0 ? 'the bearing excess goes to the dowels' : 'bearing carries the load' });
    w.step('As_excess', 'P_excess / (0.65 * fy)', asExcess, 'in^2', { vars, clause, note: fyUsed < fy ? 'fy taken as 80 ksi in compression' : undefined });
  }
  const asMin = asDowelMin(ag);
  const asReq = Math.max(asExcess, asMin);
  w?.step('As_dowel', 'max(As_excess, As_min)', asReq, 'in^2', { governs: true, note: asExcess >= asMin ? 'the bearing excess governs' : 'the 0.005Ag minimum governs' });
  return { excess, fyUsed, asExcess, asMin, asReq };
}

const bearingParams = [
  { name: 'fc', type: 'Pa', doc: 'concrete strength of the bearing member' },
  { name: 'A1', type: 'm^2', doc: 'loaded area' },
  { name: 'A2', type: 'm^2', doc: 'frustum base area in the support (left out: no confinement increase)' },
];

export const functions: LibFunction[] = [
  defineFunction({
    name: 'a2_frustum',
    params: [
      { name: 'c1', type: 'm', doc: 'column side along L' },
      { name: 'c2', type: 'm', doc: 'column side along B' },
      { name: 'L', type: 'm', doc: 'footing length' },
      { name: 'B', type: 'm', doc: 'footing width' },
      { name: 'h', type: 'm', doc: 'footing thickness' },
    ],
    returns: 'm^2',
    clause: 'ACI 318-19 §22.8.3.2: A2 = base of the 1:2 frustum wholly within the support [from memory]',
    doc: 'Area A2 for the bearing increase, from a 1 : 2 frustum inside a spread footing',
    fn: a2Frustum,
  }),
  defineFunction({
    name: 'bn_bearing',
    params: bearingParams,
    optional: 1,
    returns: 'N',
    clause: "ACI 318-19 Table 22.8.3.2: Bn = 0.85f'c·A1·√(A2/A1), √(A2/A1) ≤ 2",
    doc: 'Nominal bearing strength of concrete',
    fn: (fc: number, a1: number, a2?: number) => bnBearing(fc, a1, optional(a2, undefined, (v) => positive('A2', v))),
  }),
  defineFunction({
    name: 'phi_bn_bearing',
    params: bearingParams,
    optional: 1,
    returns: 'N',
    clause: "ACI 318-19 §22.8.3.2 with φ = 0.65 (Table 21.2.1)",
    doc: 'Design bearing strength φBn of concrete',
    fn: (fc: number, a1: number, a2?: number) => phiBnBearing(fc, a1, optional(a2, undefined, (v) => positive('A2', v))),
  }),
  defineFunction({
    name: 'as_dowel_min',
    params: [{ name: 'Ag', type: 'm^2', doc: 'gross area of the supported column' }],
    returns: 'm^2',
    clause: 'ACI 318-19 §16.3.4.1: dowels across the column–footing interface ≥ 0.005Ag',
    doc: 'Minimum area of dowels between a column and its footing',
    fn: asDowelMin,
  }),
  defineFunction({
    name: 'as_dowel_req',
    params: [
      { name: 'Pu', type: 'N', doc: 'factored column load at the interface' },
      { name: 'phiBn', type: 'N', doc: 'design bearing strength, the lesser of the column and the footing' },
      { name: 'fy', type: 'Pa', doc: 'dowel yield strength (taken ≤ 80 ksi in compression)' },
      { name: 'Ag', type: 'm^2', doc: 'gross area of the supported column' },
    ],
    returns: 'm^2',
    clause: 'ACI 318-19 §16.3.1.2(a): As ≥ (Pu − φBn)/(φ·fy), φ = 0.65, fy ≤ 80 ksi [from memory]; §16.3.4.1: As ≥ 0.005Ag',
    doc: 'Dowel area needed across the column–footing interface: the bearing excess and the minimum, the larger',
    fn: (pu: number, pb: number, fy: number, ag: number) => dowelDemand(pu, pb, fy, ag).asReq,
  }),
];
