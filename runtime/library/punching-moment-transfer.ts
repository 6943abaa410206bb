// Unbalanced moment transfer at slab-column connections: the fraction γv of Msc taken by
// eccentric shear on the critical section (ACI 318-19 §8.4.2.2, §8.4.4.2), and the
// §8.6.1.2 minimum slab steel at heavily stressed columns (new in 318-19).
// Jc sums the sides of the critical section; moment about the centroidal axis parallel
// to the b2 sides (for corner columns the product of inertia is neglected, common practice).

import { defineFunction, type LibFunction, type LibParam } from './types';
import { EDITIONS, edition, finite, lambdaFactor, nonNegative, optional, phiFactor, positive, type Edition } from './support-args';
import { boPunch, criticalSection, geometryParams, position, type Position } from './punching-perimeter';
import { alphaS } from './punching-stress';
import { lambdaS, sqrtFcShearPsi } from './shear-size-effect';
import { psi } from '../units/si';

/** γf = 1 / (1 + (2/3)√(b1/b2)), the fraction of Msc transferred by flexure (ACI 318-19 Eq. 8.4.2.2.2). */
export function gammaF(b1: number, b2: number): number {
  return 1 / (1 + (2 / 3) * Math.sqrt(positive('b1', b1) / positive('b2', b2)));
}

/** γv = 1 − γf, the fraction of Msc transferred by eccentric shear (ACI 318-19 Eq. 8.4.4.2.2). */
export function gammaV(b1: number, b2: number): number {
  return 1 - gammaF(b1, b2);
}

export interface SectionProperties {
  /** Distance from the centroid to the inner face AB (the face away from the free edge). */
  cAB: number;
  /** Distance from the centroid to the far face CD (the free edge for edge columns). */
  cCD: number;
  /** Property of the section analogous to the polar moment of inertia (ACI 318-19 R8.4.4.2.3). */
  jc: number;
}

/** Centroid distances and Jc of the critical section (ACI 318-19 R8.4.4.2.3; edge/corner by the same sum of sides). */
export function sectionProperties(c1: number, c2: number, d: number, pos: Position): SectionProperties {
  const { b1, b2, n1, n2 } = criticalSection(c1, c2, d, pos);
  // x measured from face AB toward the free edge; the b1 sides run from x = 0 to x = b1.
  const area = (n1 * b1 + n2 * b2) * d;
  const xBar = pos === 'interior' ? b1 / 2 : (n1 * b1 * d * (b1 / 2)) / area;
  const own = d * b1 ** 3 / 12 + b1 * d ** 3 / 12;
  let jc = n1 * (own + b1 * d * (b1 / 2 - xBar) ** 2);
  // b2 sides: at x = 0 (face AB) and, for interior columns, also at x = b1.
  jc += b2 * d * xBar ** 2;
  if (n2 === 2) jc += b2 * d * (b1 - xBar) ** 2;
  return { cAB: xBar, cCD: b1 - xBar, jc };
}

/** vu at face AB = Vu/(bo d) + γv Msc cAB / Jc (ACI 318-19 R8.4.4.2.3). */
export function vuPunchMoment(vu: number, msc: number, c1: number, c2: number, d: number, pos: Position): number {
  const V = nonNegative('Vu', vu);
  const M = Math.abs(finite('Msc', msc));
  const { b1, b2 } = criticalSection(c1, c2, d, pos);
  const p = sectionProperties(c1, c2, d, pos);
  return V / (boPunch(c1, c2, d, pos) * d) + (gammaV(b1, b2) * M * p.cAB) / p.jc;
}

/** True when vuv > φ 2λsλ√f'c, so §8.6.1.2 minimum steel applies (ACI 318-19 only). */
export function punchMinSteelNeeded(vuv: number, fc: number, d: number, phi = 0.75, lambda = 1, ed: Edition = '318-19'): boolean {
  nonNegative('vuv', vuv);
  if (ed === '318-14') return false;
  return vuv > phiFactor(phi) * 2 * lambdaS(d, ed) * lambda * sqrtFcShearPsi(fc) * psi;
}

/** As,min = 5 vuv bslab bo / (φ αs fy) over the width bslab (ACI 318-19 Eq. 8.6.1.2) [from memory]. */
export function asMinPunch(vuv: number, bslab: number, bo: number, fy: number, pos: Position, phi = 0.75): number {
  return (5 * nonNegative('vuv', vuv) * positive('bslab', bslab) * positive('bo', bo)) /
    (phiFactor(phi) * alphaS(pos) * positive('fy', fy));
}

const props = (pick: (p: SectionProperties) => number) =>
  (c1: number, c2: number, d: number, p: string) => pick(sectionProperties(c1, c2, d, position(p)));

const phiParam: LibParam = { name: 'phi', type: '1', doc: 'shear strength reduction factor (default 0.75)' };
const R8 = 'ACI 318-19 R8.4.4.2.3 (interior; edge and corner by the same sum over the sides)';

export const functions: LibFunction[] = [
  defineFunction({
    name: 'gamma_f',
    params: [{ name: 'b1', type: 'm', doc: 'critical section side in the direction of the span' }, { name: 'b2', type: 'm', doc: 'critical section side perpendicular to b1' }],
    returns: '1',
    clause: 'ACI 318-19 Eq. 8.4.2.2.2: γf = 1/(1 + (2/3)√(b1/b2))',
    doc: 'Fraction of the unbalanced moment transferred by flexure',
    fn: gammaF,
  }),
  defineFunction({
    name: 'gamma_v',
    params: [{ name: 'b1', type: 'm', doc: 'critical section side in the direction of the span' }, { name: 'b2', type: 'm', doc: 'critical section side perpendicular to b1' }],
    returns: '1',
    clause: 'ACI 318-19 Eq. 8.4.4.2.2: γv = 1 − γf',
    doc: 'Fraction of the unbalanced moment transferred by eccentric shear',
    fn: gammaV,
  }),
  defineFunction({
    name: 'jc_punch', params: geometryParams, returns: 'm^4', clause: R8,
    doc: 'Polar-moment-like property Jc of the critical section, about the axis parallel to the edge',
    fn: props((p) => p.jc),
  }),
  defineFunction({
    name: 'c_ab_punch', params: geometryParams, returns: 'm', clause: R8,
    doc: 'Distance from the centroid of the critical section to its inner face AB',
    fn: props((p) => p.cAB),
  }),
  defineFunction({
    name: 'c_cd_punch', params: geometryParams, returns: 'm', clause: R8,
    doc: 'Distance from the centroid of the critical section to its outer face CD',
    fn: props((p) => p.cCD),
  }),
  defineFunction({
    name: 'vu_punch_moment',
    params: [
      { name: 'Vu', type: 'N', doc: 'factored shear on the critical section' },
      { name: 'Msc', type: 'N*m', doc: 'factored unbalanced moment about the centroid of the critical section' },
      ...geometryParams,
    ],
    returns: 'Pa',
    clause: 'ACI 318-19 §8.4.4.2.3, R8.4.4.2.3: vu = Vu/(bo d) + γv Msc cAB/Jc',
    doc: 'Largest factored shear stress on the critical section with unbalanced moment transfer',
    fn: (v: number, m: number, c1: number, c2: number, d: number, p: string) => vuPunchMoment(v, m, c1, c2, d, position(p)),
  }),
  defineFunction({
    name: 'punch_min_steel_needed',
    params: [
      { name: 'vuv', type: 'Pa', doc: 'factored shear stress from Vu alone (no moment)' },
      { name: 'fc', type: 'Pa', doc: 'concrete strength' },
      { name: 'd', type: 'm', doc: 'effective depth' },
      phiParam,
      { name: 'lambda', type: '1', doc: 'lightweight concrete factor (default 1.0)' },
      { name: 'edition', type: 'text', choices: EDITIONS, doc: "'318-19' (default) or '318-14' (no such rule)" },
    ],
    optional: 3,
    returns: 'bool',
    clause: "ACI 318-19 §8.6.1.2: applies when vuv > φ2λsλ√f'c (not in 318-14)",
    doc: 'Whether the §8.6.1.2 minimum top steel over the column is required',
    fn: (v: number, fc: number, d: number, phi?: number, lambda?: number, ed?: string) =>
      punchMinSteelNeeded(v, fc, d, optional(phi, 0.75, phiFactor), optional(lambda, 1, lambdaFactor), edition(ed)),
  }),
  defineFunction({
    name: 'as_min_punch',
    params: [
      { name: 'vuv', type: 'Pa', doc: 'factored shear stress from Vu alone (no moment)' },
      { name: 'bslab', type: 'm', doc: 'effective slab width over which the steel is placed' },
      { name: 'bo', type: 'm', doc: 'perimeter of the critical section' },
      { name: 'fy', type: 'Pa', doc: 'yield strength of the slab steel' },
      { name: 'position', type: 'text', choices: geometryParams[3].choices, doc: "'interior', 'edge' or 'corner'" },
      phiParam,
    ],
    optional: 1,
    returns: 'm^2',
    clause: 'ACI 318-19 Eq. 8.6.1.2: As,min = 5 vuv bslab bo/(φ αs fy) [from memory]',
    doc: 'Minimum flexural steel over bslab at a column where vuv > φ2λsλ√f\'c',
    fn: (v: number, bs: number, bo: number, fy: number, p: string, phi?: number) =>
      asMinPunch(v, bs, bo, fy, position(p), optional(phi, 0.75, phiFactor)),
  }),
];
