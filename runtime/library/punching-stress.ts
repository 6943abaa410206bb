// Two-way (punching) shear strength without shear reinforcement, ACI 318-19 §22.6.5
// (Table 22.6.5.2), and the factored shear stress on the critical section.
// The code states vc in psi; we compute in psi and return Pa, so US and SI inputs agree.

import { defineFunction, type LibFunction, type LibParam } from './types';
import { EDITIONS, edition, lambdaFactor, nonNegative, optional, phiFactor, type Edition } from './support-args';
import { POSITIONS, boPunch, areaInsidePunch, geometryParams, position, type Position } from './punching-perimeter';
import { lambdaS, neglectLs, sqrtFcShearPsi, NEGLECT_LS_CLAUSE, NEGLECT_LS_PARAM } from './shear-size-effect';
import { psi } from '../units/si';
import { ended, working, type Recorder } from '../working/recorder';

/** αs: 40 interior, 30 edge, 20 corner columns (ACI 318-19 Table 22.6.5.2). */
export function alphaS(pos: Position): number {
  const a = pos === 'interior' ? 40 : pos === 'edge' ? 30 : 20;
  working()?.lookup('alpha_s', a, '', `${pos} column`, 'ACI 318-19 Table 22.6.5.2');
  return a;
}

export interface PunchingStrength {
  /** The three expressions of Table 22.6.5.2, in Pa. */
  a: number;
  b: number;
  c: number;
  /** The least of the three, in Pa, and its label for the hand calc. */
  vc: number;
  governs: string;
  lambdaS: number;
  beta: number;
  bo: number;
}

/** The three vc expressions of ACI 318-19 Table 22.6.5.2 (318-14: same, without λs) and the least. */
export function punchingStrength(
  fc: number, c1: number, c2: number, d: number, pos: Position,
  lambda = 1, ed: Edition = '318-19', neglectSizeEffect = false,
): PunchingStrength {
  const w = working()?.open('vc_punch', {
    fc: [fc, 'psi'], c1: [c1, 'in'], c2: [c2, 'in'], d: [d, 'in'], position: pos, lambda, edition: ed,
  }, CLAUSE);
  const bo = boPunch(c1, c2, d, pos);
  const ls = lambdaS(d, ed, neglectSizeEffect);
  const root = sqrtFcShearPsi(fc);
  const beta = Math.max(c1, c2) / Math.min(c1, c2);
  const k = ls * lambda * root * psi;
  const as = alphaS(pos);
  const a = 4 * k;
  const b = (2 + 4 / beta) * k;
  const c = (2 + (as * d) / bo) * k;
  const s = ed === '318-19' && !neglectSizeEffect ? 'λs·λ·√f\'c' : 'λ·√f\'c';
  const table = ed === '318-19' ? 'ACI 318-19 Table 22.6.5.2' : 'ACI 318-14 Table 22.6.5.2';
  const neglected = ed === '318-19' && neglectSizeEffect ? ', λs neglected (§13.2.6.2)' : '';
  let vc = a;
  let governs = `${table}(a) 4${s}`;
  if (b < vc) {
    vc = b;
    governs = `${table}(b) (2 + 4/β)${s}, β = ${beta.toFixed(2)}`;
  }
  if (c < vc) {
    vc = c;
    governs = `${table}(c) (2 + αs·d/bo)${s}, αs = ${alphaS(pos)}`;
  }
  if (w) {
    const clause = `${table}`;
    const least = vc === a ? 'a' : vc === b ? 'b' : 'c';
    w.step('beta', 'max(c1, c2) / min(c1, c2)', beta, '', { clause: 'ACI 318-19 §22.6.5.2' });
    w.step('vc_a', '4 * lambda_s * lambda * sqrt_fc', a, 'psi', { code: true, clause: `${clause}(a)`, governs: least === 'a' });
    w.step('vc_b', '(2 + 4 / beta) * lambda_s * lambda * sqrt_fc', b, 'psi', { code: true, clause: `${clause}(b)`, governs: least === 'b' });
    w.step('vc_c', '(2 + alpha_s * d / bo) * lambda_s * lambda * sqrt_fc', c, 'psi', {
      code: true, clause: `${clause}(c)`, governs: least === 'c', vars: { d: [d, 'in'], bo: [bo, 'in'] },
    });
    w.step('vc', 'min(vc_a, vc_b, vc_c)', vc, 'psi', { clause, note: `expression (${least}) governs${neglected}` });
  }
  w?.end(vc, 'psi');
  return { a, b, c, vc, governs: governs + neglected, lambdaS: ls, beta, bo };
}

/** Factored shear on the section: column reaction less the factored load inside it (ACI 318-19 §22.6.4.1). */
export function vuPunch(reaction: number, qu: number, c1: number, c2: number, d: number, pos: Position): number {
  const r = nonNegative('Vu (column reaction)', reaction);
  const q = nonNegative('qu', qu);
  const w = working()?.open('vu_punch', { R: [r, 'kip'], qu: [q, 'psf'], c1: [c1, 'in'], c2: [c2, 'in'], d: [d, 'in'], position: pos }, VU_CLAUSE);
  const inside = areaInsidePunch(c1, c2, d, pos);
  const vu = Math.max(0, r - q * inside);
  w?.step('Vu', 'max(0, R - qu * A_inside)', vu, 'kip', { clause: VU_CLAUSE, note: 'the load inside the critical section is subtracted' });
  return ended(w, vu, 'kip');
}

const VU_CLAUSE = 'ACI 318-19 §22.6.4.1: Vu = reaction − qu × area inside the critical section';

/** Factored shear stress vu = Vu / (bo d) on the critical section (ACI 318-19 §22.6.1.2). */
export function vuPunchStress(reaction: number, qu: number, c1: number, c2: number, d: number, pos: Position): number {
  const w = working()?.open('vu_punch_stress', { R: [reaction, 'kip'], qu: [qu, 'psf'], c1: [c1, 'in'], c2: [c2, 'in'], d: [d, 'in'], position: pos }, 'ACI 318-19 §22.6.1.2');
  const Vu = vuPunch(reaction, qu, c1, c2, d, pos);
  const bo = boPunch(c1, c2, d, pos);
  const vu = Vu / (bo * d);
  w?.step('v_u', 'Vu / (bo * d)', vu, 'psi', { clause: 'ACI 318-19 §22.6.1.2' });
  return ended(w, vu, 'psi');
}

export const strengthParams: LibParam[] = [
  { name: 'fc', type: 'Pa', doc: 'specified concrete compressive strength' },
  ...geometryParams,
  { name: 'lambda', type: '1', doc: 'lightweight concrete factor (default 1.0)' },
  { name: 'edition', type: 'text', choices: EDITIONS, doc: "'318-19' (default) or '318-14'" },
  NEGLECT_LS_PARAM,
];

/** A function over the strength: `pick` takes one result (and names it in the working when it is not vc). */
const strength = (pick: (s: PunchingStrength, d: number, w: Recorder | undefined) => number | string) =>
  (fc: number, c1: number, c2: number, d: number, p: string, lambda?: number, ed?: string, n?: boolean) => {
    const w = working();
    return pick(punchingStrength(fc, c1, c2, d, position(p), optional(lambda, 1, lambdaFactor), edition(ed), neglectLs(n)), d, w);
  };

/** One of the three expressions, named as the function's result. */
const expression = (which: 'a' | 'b' | 'c') => strength((s, _d, w) => {
  w?.result(`vc_${which}`, `vc_${which}`, s[which], 'psi');
  return s[which];
});

const CLAUSE = `ACI 318-19 §22.6.5.2, Table 22.6.5.2 (√f'c ≤ 100 psi, §22.6.3.1; 318-14: no λs); ${NEGLECT_LS_CLAUSE}`;

const loadParams: LibParam[] = [
  { name: 'Vu', type: 'N', doc: 'factored column reaction' },
  { name: 'qu', type: 'Pa', doc: 'factored uniform load on the slab (or net soil pressure under a footing)' },
  ...geometryParams,
];

/** Demand/capacity vu / (φ vc) for two-way shear without moment transfer (ACI 318-19 §22.6.1.2, φ Table 21.2.1). */
export function punchRatio(
  reaction: number, qu: number, fc: number, c1: number, c2: number, d: number, pos: Position,
  phi = 0.75, lambda = 1, ed: Edition = '318-19',
): number {
  const f = phiFactor(phi);
  const w = working()?.open('punch_ratio', {
    Vu: [reaction, 'kip'], qu: [qu, 'psf'], fc: [fc, 'psi'], c1: [c1, 'in'], c2: [c2, 'in'], d: [d, 'in'], position: pos, phi: f, lambda, edition: ed,
  }, CLAUSE);
  const vu = vuPunchStress(reaction, qu, c1, c2, d, pos);
  const vc = punchingStrength(fc, c1, c2, d, pos, lambda, ed).vc;
  const ratio = vu / (f * vc);
  w?.step('ratio', 'v_u / (phi * vc)', ratio, '', { clause: 'ACI 318-19 §22.6.1.2; φ = 0.75, Table 21.2.1' });
  return ended(w, ratio);
}

export const functions: LibFunction[] = [
  defineFunction({
    name: 'alpha_s',
    params: [{ name: 'position', type: 'text', choices: POSITIONS, doc: "'interior', 'edge' or 'corner'" }],
    returns: '1',
    clause: 'ACI 318-19 Table 22.6.5.2 (αs = 40 interior, 30 edge, 20 corner)',
    doc: 'Column location factor αs for two-way shear',
    fn: (p: string) => alphaS(position(p)),
  }),
  defineFunction({
    name: 'vc_punch',
    params: strengthParams,
    optional: 3,
    returns: 'Pa',
    clause: CLAUSE,
    doc: 'Two-way shear stress capacity vc: least of the three Table 22.6.5.2 expressions',
    fn: strength((s) => s.vc),
  }),
  defineFunction({
    name: 'vc_punch_governs',
    params: strengthParams,
    optional: 3,
    returns: 'text',
    clause: CLAUSE,
    doc: 'Which expression of Table 22.6.5.2 governs vc, as text for the hand calc',
    fn: strength((s, _d, w) => {
      w?.step('governs', undefined, s.governs, '', { note: 'the least of the three expressions' });
      return s.governs;
    }),
  }),
  defineFunction({
    name: 'vc_punch_a',
    params: strengthParams,
    optional: 3,
    returns: 'Pa',
    clause: "ACI 318-19 Table 22.6.5.2(a): 4λsλ√f'c",
    doc: 'Two-way shear expression (a)',
    fn: expression('a'),
  }),
  defineFunction({
    name: 'vc_punch_b',
    params: strengthParams,
    optional: 3,
    returns: 'Pa',
    clause: "ACI 318-19 Table 22.6.5.2(b): (2 + 4/β)λsλ√f'c",
    doc: 'Two-way shear expression (b), β = long/short side of the column',
    fn: expression('b'),
  }),
  defineFunction({
    name: 'vc_punch_c',
    params: strengthParams,
    optional: 3,
    returns: 'Pa',
    clause: "ACI 318-19 Table 22.6.5.2(c): (2 + αs d/bo)λsλ√f'c",
    doc: 'Two-way shear expression (c), αs = 40/30/20',
    fn: expression('c'),
  }),
  defineFunction({
    name: 'vn_punch',
    params: strengthParams,
    optional: 3,
    returns: 'N',
    clause: CLAUSE + '; Vc = vc·bo·d',
    doc: 'Nominal two-way shear force capacity without shear reinforcement, vc·bo·d',
    fn: strength((s, d, w) => {
      const Vc = s.vc * s.bo * d;
      w?.step('Vc', 'vc * bo * d', Vc, 'kip', { vars: { d: [d, 'in'] }, clause: 'ACI 318-19 §22.6.1.2' });
      return Vc;
    }),
  }),
  defineFunction({
    name: 'vu_punch',
    params: loadParams,
    returns: 'N',
    clause: 'ACI 318-19 §22.6.4.1: Vu = reaction − qu × area inside the critical section',
    doc: 'Factored two-way shear on the critical section',
    fn: (r: number, q: number, c1: number, c2: number, d: number, p: string) => vuPunch(r, q, c1, c2, d, position(p)),
  }),
  defineFunction({
    name: 'vu_punch_stress',
    params: loadParams,
    returns: 'Pa',
    clause: 'ACI 318-19 §22.6.1.2: vu = Vu/(bo·d)',
    doc: 'Factored two-way shear stress on the critical section, no moment transfer',
    fn: (r: number, q: number, c1: number, c2: number, d: number, p: string) =>
      vuPunchStress(r, q, c1, c2, d, position(p)),
  }),
  defineFunction({
    name: 'punch_ratio',
    params: [
      loadParams[0], loadParams[1], strengthParams[0], ...geometryParams,
      { name: 'phi', type: '1', doc: 'strength reduction factor for shear (default 0.75)' },
      strengthParams[5], strengthParams[6],
    ],
    optional: 3,
    returns: '1',
    clause: CLAUSE + '; vu ≤ φvc, φ = 0.75 (Table 21.2.1)',
    doc: 'Two-way shear demand/capacity ratio vu/(φ·vc), no moment transfer',
    fn: (r: number, q: number, fc: number, c1: number, c2: number, d: number, p: string,
      phi?: number, lambda?: number, ed?: string) =>
      punchRatio(r, q, fc, c1, c2, d, position(p), optional(phi, 0.75, phiFactor),
        optional(lambda, 1, lambdaFactor), edition(ed)),
  }),
];
