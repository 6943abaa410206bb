// Whether slenderness may be neglected for a braced (nonsway) column, ACI 318-19 §6.2.5.
// Sign convention of 318-14/-19: M1/M2 is negative in single curvature, positive in double.

import { LibraryError, defineFunction, type LibFunction } from './types';
import { finite, positive } from './support-args';
import { working } from '../working/recorder';

/** Radius of gyration r = 0.3h for a rectangular column (ACI 318-19 §6.2.5.2; clause number from memory). */
export function rRect(h: number): number {
  const r = 0.3 * positive('h', h);
  working()?.step('r', '0.3 * h', r, 'in', { vars: { h: [h, 'in'] }, clause: 'ACI 318-19 §6.2.5.2' });
  return r;
}

/** Radius of gyration r = 0.25D for a circular column (ACI 318-19 §6.2.5.2) [from memory]. */
export function rCircular(dia: number): number {
  const r = 0.25 * positive('D', dia);
  working()?.step('r', '0.25 * D', r, 'in', { vars: { D: [dia, 'in'] }, clause: 'ACI 318-19 §6.2.5.2 [from memory]' });
  return r;
}

/** Limit min(34 + 12 M1/M2, 40) on kℓu/r for a braced column (ACI 318-19 Eq. 6.2.5(b)). */
export function slenderLimitBraced(m1: number, m2: number): number {
  const M2 = finite('M2', m2);
  const M1 = finite('M1', m1);
  const w = working();
  if (M2 === 0) {
    // No end moments: take single curvature, M1/M2 = −1, the conservative case (common practice).
    if (M1 === 0) {
      w?.step('limit', '34 - 12', 22, '', { clause: 'ACI 318-19 Eq. 6.2.5(b)', note: 'no end moments: single curvature, M1/M2 = −1 (common practice)' });
      return 34 - 12;
    }
    throw new LibraryError('M2 must be the larger end moment: |M1| ≤ |M2|');
  }
  const ratio = M1 / M2;
  if (Math.abs(ratio) > 1 + 1e-12) throw new LibraryError(`M2 must be the larger end moment: |M1/M2| = ${Math.abs(ratio)} > 1`);
  const limit = Math.min(34 + 12 * ratio, 40);
  w?.step('limit', 'min(34 + 12 * M1 / M2, 40)', limit, '', {
    vars: { M1: [M1, 'kip*ft'], M2: [M2, 'kip*ft'] }, clause: 'ACI 318-19 Eq. 6.2.5(b)', governs: limit === 40, note: limit === 40 ? 'the limit 40 governs' : undefined,
  });
  return limit;
}

/** kℓu/r (ACI 318-19 §6.2.5). */
export function kLuR(k: number, lu: number, r: number): number {
  const K = positive('k', k);
  if (K < 0.5 || K > 1) throw new LibraryError(`k for a braced (nonsway) column must be between 0.5 and 1.0, got ${K}`);
  const s = (K * positive('ℓu', lu)) / positive('r', r);
  working()?.step('klu_r', 'k * lu / r', s, '', { vars: { k: K, lu: [lu, 'ft'], r: [r, 'in'] }, clause: 'ACI 318-19 §6.2.5' });
  return s;
}

/** True when slenderness may be neglected: kℓu/r ≤ min(34 + 12 M1/M2, 40) (ACI 318-19 §6.2.5(b)). */
export function shortBraced(k: number, lu: number, r: number, m1: number, m2: number): boolean {
  const s = kLuR(k, lu, r);
  const limit = slenderLimitBraced(m1, m2);
  working()?.step('short', 'klu_r <= limit', s <= limit, '', { clause: 'ACI 318-19 §6.2.5(b)', note: s <= limit ? 'slenderness may be neglected' : 'slender: magnify the moments (§6.6.4)' });
  return s <= limit;
}

const m12 = [
  { name: 'M1', type: 'N*m', doc: 'smaller end moment; sign gives M1/M2 < 0 in single curvature' },
  { name: 'M2', type: 'N*m', doc: 'larger end moment' },
];

export const functions: LibFunction[] = [
  defineFunction({
    name: 'r_rect',
    params: [{ name: 'h', type: 'm', doc: 'column dimension in the direction of buckling' }],
    returns: 'm',
    clause: 'ACI 318-19 §6.2.5.2: r = 0.30h for rectangular sections',
    doc: 'Radius of gyration of a rectangular column for slenderness',
    fn: rRect,
  }),
  defineFunction({
    name: 'r_circular',
    params: [{ name: 'D', type: 'm', doc: 'column diameter' }],
    returns: 'm',
    clause: 'ACI 318-19 §6.2.5.2: r = 0.25D for circular sections [from memory]',
    doc: 'Radius of gyration of a circular column for slenderness',
    fn: rCircular,
  }),
  defineFunction({
    name: 'klu_r',
    params: [
      { name: 'k', type: '1', doc: 'effective length factor, 0.5 to 1.0 for braced columns' },
      { name: 'lu', type: 'm', doc: 'unsupported length' },
      { name: 'r', type: 'm', doc: 'radius of gyration' },
    ],
    returns: '1',
    clause: 'ACI 318-19 §6.2.5: slenderness ratio kℓu/r',
    doc: 'Slenderness ratio of a braced column',
    fn: kLuR,
  }),
  defineFunction({
    name: 'slender_limit_braced',
    params: m12,
    returns: '1',
    clause: 'ACI 318-19 §6.2.5(b): kℓu/r ≤ 34 + 12(M1/M2) ≤ 40 (nonsway)',
    doc: 'Largest kℓu/r for which slenderness may be neglected in a braced column',
    fn: slenderLimitBraced,
  }),
  defineFunction({
    name: 'short_braced',
    params: [
      { name: 'k', type: '1', doc: 'effective length factor, 0.5 to 1.0' },
      { name: 'lu', type: 'm', doc: 'unsupported length' },
      { name: 'r', type: 'm', doc: 'radius of gyration' },
      ...m12,
    ],
    returns: 'bool',
    clause: 'ACI 318-19 §6.2.5(b): slenderness neglected when kℓu/r ≤ min(34 + 12M1/M2, 40)',
    doc: 'Whether a braced column is short (slenderness effects may be neglected)',
    fn: shortBraced,
  }),
];
