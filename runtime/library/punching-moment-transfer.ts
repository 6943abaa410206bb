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
import { ended, quietly, working } from '../working/recorder';

/** γf = 1 / (1 + (2/3)√(b1/b2)), the fraction of Msc transferred by flexure (ACI 318-19 Eq. 8.4.2.2.2). */
export function gammaF(b1: number, b2: number): number {
  const g = 1 / (1 + (2 / 3) * Math.sqrt(positive('b1', b1) / positive('b2', b2)));
  working()?.step('gamma_f', '1 / (1 + 2 / 3 * sqrt(b1 / b2))', g, '', { vars: { b1: [b1, 'in'], b2: [b2, 'in'] }, clause: 'ACI 318-19 Eq. 8.4.2.2.2' });
  return g;
}

/** γv = 1 − γf, the fraction of Msc transferred by eccentric shear (ACI 318-19 Eq. 8.4.4.2.2). */
export function gammaV(b1: number, b2: number): number {
  const g = 1 - gammaF(b1, b2);
  working()?.step('gamma_v', '1 - gamma_f', g, '', { clause: 'ACI 318-19 Eq. 8.4.4.2.2' });
  return g;
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
  const w = working();
  if (w) {
    const vars = { n1, n2, d: [d, 'in'] } as const;
    if (pos === 'interior') w.step('c_AB', 'b1 / 2', xBar, 'in', { vars, clause: R8 });
    else {
      w.step('A_c', '(n1 * b1 + n2 * b2) * d', area, 'in^2', { vars, clause: R8 });
      w.step('c_AB', 'n1 * b1 * d * (b1 / 2) / A_c', xBar, 'in', { vars, clause: R8, note: 'centroid of the section from face AB' });
    }
    w.step('J_c', 'n1 * (d * b1^3 / 12 + b1 * d^3 / 12 + b1 * d * (b1 / 2 - c_AB)^2) + b2 * d * c_AB^2 + (n2 - 1) * b2 * d * (b1 - c_AB)^2',
      jc, 'in^4', { vars, clause: R8 });
    w.step('c_CD', 'b1 - c_AB', b1 - xBar, 'in', { clause: R8 });
  }
  return { cAB: xBar, cCD: b1 - xBar, jc };
}

/** vu at face AB = Vu/(bo d) + γv Msc cAB / Jc (ACI 318-19 R8.4.4.2.3). */
export function vuPunchMoment(vu: number, msc: number, c1: number, c2: number, d: number, pos: Position): number {
  const V = nonNegative('Vu', vu);
  const M = Math.abs(finite('Msc', msc));
  const w = working()?.open('vu_punch_moment', { Vu: [V, 'kip'], Msc: [msc, 'kip*ft'], c1: [c1, 'in'], c2: [c2, 'in'], d: [d, 'in'], position: pos }, 'ACI 318-19 §8.4.4.2.3');
  const bo = boPunch(c1, c2, d, pos);
  const p = sectionProperties(c1, c2, d, pos);
  const { b1, b2 } = quietly(() => criticalSection(c1, c2, d, pos));
  const v = V / (bo * d) + (gammaV(b1, b2) * M * p.cAB) / p.jc;
  w?.step('v_u', 'Vu / (bo * d) + gamma_v * abs(Msc) * c_AB / J_c', v, 'psi', {
    vars: { Vu: [V, 'kip'], Msc: [msc, 'kip*ft'], d: [d, 'in'] }, clause: 'ACI 318-19 R8.4.4.2.3', note: 'at face AB',
  });
  return ended(w, v, 'psi');
}

/** True when vuv > φ 2λsλ√f'c, so §8.6.1.2 minimum steel applies (ACI 318-19 only). */
export function punchMinSteelNeeded(vuv: number, fc: number, d: number, phi = 0.75, lambda = 1, ed: Edition = '318-19'): boolean {
  nonNegative('vuv', vuv);
  const w = working();
  if (ed === '318-14') {
    w?.lookup('needed', false, '', 'ACI 318-14 has no such rule', 'ACI 318-14');
    return false;
  }
  const f = phiFactor(phi);
  const limit = f * 2 * lambdaS(d, ed) * lambda * sqrtFcShearPsi(fc) * psi;
  w?.step('v_lim', 'phi * 2 * lambda_s * lambda * sqrt_fc', limit, 'psi', { vars: { phi: f, lambda }, code: true, clause: 'ACI 318-19 §8.6.1.2' });
  w?.step('needed', 'vuv > v_lim', vuv > limit, '', { vars: { vuv: [vuv, 'psi'] }, clause: 'ACI 318-19 §8.6.1.2' });
  return vuv > limit;
}

/** As,min = 5 vuv bslab bo / (φ αs fy) over the width bslab (ACI 318-19 Eq. 8.6.1.2) [from memory]. */
export function asMinPunch(vuv: number, bslab: number, bo: number, fy: number, pos: Position, phi = 0.75): number {
  const as = (5 * nonNegative('vuv', vuv) * positive('bslab', bslab) * positive('bo', bo)) /
    (phiFactor(phi) * alphaS(pos) * positive('fy', fy));
  working()?.step('As_min', '5 * vuv * bslab * bo / (phi * alpha_s * fy)', as, 'in^2', {
    vars: { vuv: [vuv, 'psi'], bslab: [bslab, 'in'], bo: [bo, 'in'], fy: [fy, 'psi'], phi }, clause: 'ACI 318-19 Eq. 8.6.1.2 [from memory]',
  });
  return as;
}

/** One property of the section, named again as the function's result. */
const props = (key: keyof SectionProperties, symbol: string) =>
  (c1: number, c2: number, d: number, p: string) => {
    const v = sectionProperties(c1, c2, d, position(p))[key];
    working()?.result(symbol, symbol, v, key === 'jc' ? 'in^4' : 'in');
    return v;
  };

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
    fn: props('jc', 'J_c'),
  }),
  defineFunction({
    name: 'c_ab_punch', params: geometryParams, returns: 'm', clause: R8,
    doc: 'Distance from the centroid of the critical section to its inner face AB',
    fn: props('cAB', 'c_AB'),
  }),
  defineFunction({
    name: 'c_cd_punch', params: geometryParams, returns: 'm', clause: R8,
    doc: 'Distance from the centroid of the critical section to its outer face CD',
    fn: props('cCD', 'c_CD'),
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
