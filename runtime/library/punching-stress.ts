// Two-way (punching) shear strength without shear reinforcement, ACI 318-19 §22.6.5
// (Table 22.6.5.2), and the factored shear stress on the critical section.
// The code states vc in psi; we compute in psi and return Pa, so US and SI inputs agree.

import { defineFunction, type LibFunction, type LibParam } from './types';
import { EDITIONS, edition, lambdaFactor, nonNegative, optional, phiFactor, type Edition } from './support-args';
import { POSITIONS, boPunch, areaInsidePunch, geometryParams, position, type Position } from './punching-perimeter';
import { lambdaS, neglectLs, sqrtFcShearPsi, NEGLECT_LS_CLAUSE, NEGLECT_LS_PARAM } from './shear-size-effect';
import { psi } from '../units/si';

/** αs: 40 interior, 30 edge, 20 corner columns (ACI 318-19 Table 22.6.5.2). */
export function alphaS(pos: Position): number {
  return pos === 'interior' ? 40 : pos === 'edge' ? 30 : 20;
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
  const bo = boPunch(c1, c2, d, pos);
  const ls = lambdaS(d, ed, neglectSizeEffect);
  const root = sqrtFcShearPsi(fc);
  const beta = Math.max(c1, c2) / Math.min(c1, c2);
  const k = ls * lambda * root * psi;
  const a = 4 * k;
  const b = (2 + 4 / beta) * k;
  const c = (2 + (alphaS(pos) * d) / bo) * k;
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
  return { a, b, c, vc, governs: governs + neglected, lambdaS: ls, beta, bo };
}

/** Factored shear on the section: column reaction less the factored load inside it (ACI 318-19 §22.6.4.1). */
export function vuPunch(reaction: number, qu: number, c1: number, c2: number, d: number, pos: Position): number {
  const r = nonNegative('Vu (column reaction)', reaction);
  const q = nonNegative('qu', qu);
  return Math.max(0, r - q * areaInsidePunch(c1, c2, d, pos));
}

/** Factored shear stress vu = Vu / (bo d) on the critical section (ACI 318-19 §22.6.1.2). */
export function vuPunchStress(reaction: number, qu: number, c1: number, c2: number, d: number, pos: Position): number {
  return vuPunch(reaction, qu, c1, c2, d, pos) / (boPunch(c1, c2, d, pos) * d);
}

export const strengthParams: LibParam[] = [
  { name: 'fc', type: 'Pa', doc: 'specified concrete compressive strength' },
  ...geometryParams,
  { name: 'lambda', type: '1', doc: 'lightweight concrete factor (default 1.0)' },
  { name: 'edition', type: 'text', choices: EDITIONS, doc: "'318-19' (default) or '318-14'" },
  NEGLECT_LS_PARAM,
];

const strength = (pick: (s: PunchingStrength, d: number) => number | string) =>
  (fc: number, c1: number, c2: number, d: number, p: string, lambda?: number, ed?: string, n?: boolean) =>
    pick(punchingStrength(fc, c1, c2, d, position(p), optional(lambda, 1, lambdaFactor), edition(ed), neglectLs(n)), d);

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
  const vu = vuPunchStress(reaction, qu, c1, c2, d, pos);
  return vu / (phiFactor(phi) * punchingStrength(fc, c1, c2, d, pos, lambda, ed).vc);
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
    fn: strength((s) => s.governs),
  }),
  defineFunction({
    name: 'vc_punch_a',
    params: strengthParams,
    optional: 3,
    returns: 'Pa',
    clause: "ACI 318-19 Table 22.6.5.2(a): 4λsλ√f'c",
    doc: 'Two-way shear expression (a)',
    fn: strength((s) => s.a),
  }),
  defineFunction({
    name: 'vc_punch_b',
    params: strengthParams,
    optional: 3,
    returns: 'Pa',
    clause: "ACI 318-19 Table 22.6.5.2(b): (2 + 4/β)λsλ√f'c",
    doc: 'Two-way shear expression (b), β = long/short side of the column',
    fn: strength((s) => s.b),
  }),
  defineFunction({
    name: 'vc_punch_c',
    params: strengthParams,
    optional: 3,
    returns: 'Pa',
    clause: "ACI 318-19 Table 22.6.5.2(c): (2 + αs d/bo)λsλ√f'c",
    doc: 'Two-way shear expression (c), αs = 40/30/20',
    fn: strength((s) => s.c),
  }),
  defineFunction({
    name: 'vn_punch',
    params: strengthParams,
    optional: 3,
    returns: 'N',
    clause: CLAUSE + '; Vc = vc·bo·d',
    doc: 'Nominal two-way shear force capacity without shear reinforcement, vc·bo·d',
    fn: strength((s, d) => s.vc * s.bo * d),
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
