// Shear in a spread footing under a concentric interior column: two-way at d/2
// (ACI 318-19 §22.6, λs per edition) and one-way at d from the column face (§22.5).
// Footings have no stirrups, so 318-19 uses Table 22.5.5.1 (c) with λs and ρw;
// 318-14 used Vc = 2λ√f'c bw d (§22.5.5.1). The edition argument picks one.
// Chapter 13 clause numbers here are from memory (not read in a printed copy).

import { defineFunction, type LibFunction, type LibParam } from './types';
import { EDITIONS, edition, lambdaFactor, nonNegative, optional, positive, type Edition } from './support-args';
import { lambdaS, neglectLs, sqrtFcShearPsi, NEGLECT_LS_CLAUSE, NEGLECT_LS_PARAM } from './shear-size-effect';
import { quFooting } from './footing-area';
import { psi } from '../units/si';
import { working } from '../working/recorder';

/** Vu two-way = Pu − qu (c1 + d)(c2 + d), the part of the footing inside the section carries no shear (ACI 318-19 §22.6.4.1). */
export function vuPunchFooting(pu: number, b: number, l: number, c1: number, c2: number, d: number): number {
  const qu = quFooting(pu, b, l);
  const inside = Math.min(positive('c1', c1) + positive('d', d), l) * Math.min(positive('c2', c2) + d, b);
  const vu = Math.max(0, pu - qu * inside);
  const w = working();
  if (w) {
    const vars = { c1: [c1, 'in'], c2: [c2, 'in'], d: [d, 'in'], L: [l, 'ft'], B: [b, 'ft'], Pu: [pu, 'kip'] } as const;
    w.step('A_inside', 'min(c1 + d, L) * min(c2 + d, B)', inside, 'ft^2', { vars, clause: 'ACI 318-19 §22.6.4.1', note: 'inside the critical section at d/2' });
    w.step('Vu', 'max(0, Pu - q_u * A_inside)', vu, 'kip', { vars, clause: 'ACI 318-19 §22.6.4.1', note: 'the soil pressure inside the perimeter is subtracted' });
  }
  return vu;
}

/** Vu one-way at d from the face: qu · B · ((L − c)/2 − d) (ACI 318-19 §13.2.7.2, §7.4.3.2). */
export function vuOnewayFooting(pu: number, b: number, l: number, c: number, d: number): number {
  const qu = quFooting(pu, b, l);
  const arm = (l - positive('c', c)) / 2 - positive('d', d);
  const vu = qu * b * Math.max(0, arm);
  working()?.step('Vu', 'q_u * B * max(0, (L - c) / 2 - d)', vu, 'kip', {
    vars: { B: [b, 'ft'], L: [l, 'ft'], c: [c, 'in'], d: [d, 'in'] }, clause: 'ACI 318-19 §13.2.7.2, §7.4.3.2', note: 'section at d from the column face',
  });
  return vu;
}

export interface OnewayShear {
  vc: number;
  rule: string;
}

/** Vc one-way, no shear reinforcement, Nu = 0: 318-19 Table 22.5.5.1(c) capped at 5λ√f'c bw d; 318-14 2λ√f'c bw d. */
export function onewayShear(fc: number, bw: number, d: number, rhoW: number, lambda = 1, ed: Edition = '318-19', neglectSizeEffect = false): OnewayShear {
  positive('bw', bw);
  positive('d', d);
  const w = working()?.open('vc_oneway', { fc: [fc, 'psi'], bw: [bw, 'in'], d: [d, 'in'], rho_w: rhoW, lambda, edition: ed }, VC_CLAUSE);
  const root = sqrtFcShearPsi(fc) * psi;
  const area = bw * d;
  nonNegative('rho_w', rhoW);
  const vars = { bw: [bw, 'in'], d: [d, 'in'], lambda, rho_w: rhoW } as const;
  if (ed === '318-14') {
    const v = 2 * lambda * root * area;
    w?.step('Vc', '2 * lambda * sqrt_fc * bw * d', v, 'kip', { vars, clause: 'ACI 318-14 §22.5.5.1' });
    w?.end(v, 'kip');
    return { vc: v, rule: "ACI 318-14 §22.5.5.1: Vc = 2λ√f'c·bw·d" };
  }
  const ls = lambdaS(d, ed, neglectSizeEffect);
  const c = 8 * ls * lambda * Math.cbrt(rhoW) * root * area;
  const cap = 5 * lambda * root * area;
  const neglected = neglectSizeEffect ? ', λs neglected (§13.2.6.2)' : '';
  if (w) {
    w.step('Vc_c', '8 * lambda_s * lambda * cbrt(rho_w) * sqrt_fc * bw * d', c, 'kip', { vars, clause: 'ACI 318-19 Table 22.5.5.1(c)' });
    w.step('Vc_max', '5 * lambda * sqrt_fc * bw * d', cap, 'kip', { vars, clause: 'ACI 318-19 §22.5.5.1.1', governs: cap < c });
    w.step('Vc', 'min(Vc_c, Vc_max)', Math.min(c, cap), 'kip', { note: c <= cap ? `Table 22.5.5.1(c) governs${neglected}` : 'the 5λ√f′c·bw·d cap governs' });
    w.end(Math.min(c, cap), 'kip');
  }
  return c <= cap
    ? { vc: c, rule: `ACI 318-19 Table 22.5.5.1(c): Vc = 8λsλ(ρw)^(1/3)√f'c·bw·d (Av < Av,min)${neglected}` }
    : { vc: cap, rule: "ACI 318-19 §22.5.5.1.1: Vc capped at 5λ√f'c·bw·d" };
}

const vcParams: LibParam[] = [
  { name: 'fc', type: 'Pa', doc: 'concrete strength' },
  { name: 'bw', type: 'm', doc: 'width of the section (footing width B)' },
  { name: 'd', type: 'm', doc: 'effective depth' },
  { name: 'rho_w', type: '1', doc: 'As/(bw·d) of the flexural tension steel (unused by 318-14)' },
  { name: 'lambda', type: '1', doc: 'lightweight concrete factor (default 1.0)' },
  { name: 'edition', type: 'text', choices: EDITIONS, doc: "'318-19' (default) or '318-14'" },
  NEGLECT_LS_PARAM,
];
const vc = (pick: (s: OnewayShear) => number | string) =>
  (fc: number, bw: number, d: number, rho: number, lambda?: number, ed?: string, n?: boolean) =>
    pick(onewayShear(fc, bw, d, rho, optional(lambda, 1, lambdaFactor), edition(ed), neglectLs(n)));

const VC_CLAUSE = `ACI 318-19 Table 22.5.5.1(c) with λs and ρw (no shear reinforcement), ≤ 5λ√f'c bw d; edition '318-14': §22.5.5.1 Vc = 2λ√f'c bw d; √f'c ≤ 100 psi; ${NEGLECT_LS_CLAUSE}`;

export const functions: LibFunction[] = [
  defineFunction({
    name: 'vu_punch_footing',
    params: [
      { name: 'Pu', type: 'N', doc: 'factored column load' },
      { name: 'B', type: 'm', doc: 'footing width' },
      { name: 'L', type: 'm', doc: 'footing length' },
      { name: 'c1', type: 'm', doc: 'column side along L' },
      { name: 'c2', type: 'm', doc: 'column side along B' },
      { name: 'd', type: 'm', doc: 'effective depth of the footing' },
    ],
    returns: 'N',
    clause: 'ACI 318-19 §22.6.4.1: Vu = Pu − qu(c1 + d)(c2 + d), qu = Pu/(B·L)',
    doc: 'Factored two-way shear at d/2 around a column on a spread footing',
    fn: vuPunchFooting,
  }),
  defineFunction({
    name: 'vu_oneway_footing',
    params: [
      { name: 'Pu', type: 'N', doc: 'factored column load' },
      { name: 'B', type: 'm', doc: 'footing width (width of the section)' },
      { name: 'L', type: 'm', doc: 'footing length in the direction of the cantilever' },
      { name: 'c', type: 'm', doc: 'column side along L' },
      { name: 'd', type: 'm', doc: 'effective depth' },
    ],
    returns: 'N',
    clause: 'ACI 318-19 §13.2.7.2, §7.4.3.2: section at d from the column face, Vu = qu·B·((L − c)/2 − d)',
    doc: 'Factored one-way shear at d from the column face of a spread footing',
    fn: vuOnewayFooting,
  }),
  defineFunction({
    name: 'vc_oneway',
    params: vcParams,
    optional: 3,
    returns: 'N',
    clause: VC_CLAUSE,
    doc: 'Nominal one-way shear strength Vc of a slab or footing without stirrups (Nu = 0)',
    fn: vc((s) => s.vc),
  }),
  defineFunction({
    name: 'vc_oneway_rule',
    params: vcParams,
    optional: 3,
    returns: 'text',
    clause: VC_CLAUSE,
    doc: 'Which one-way shear expression vc_oneway used, as text for the hand calc',
    fn: vc((s) => {
      working()?.step('rule', undefined, s.rule, '', { note: 'the expression used' });
      return s.rule;
    }),
  }),
];
