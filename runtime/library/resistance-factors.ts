// Strength reduction factors φ, ACI 318-19 §21.2. For moment and axial force φ depends on
// the net tensile strain εt of the extreme tension steel (Table 21.2.2). The edition
// matters there: 318-19 puts the tension-controlled limit at εty + 0.003 (0.00507 for
// Grade 60), 318-14 at 0.005; both start the transition at εty = fy/Es (§21.2.2.1).

import { defineFunction, type LibFunction } from './types';
import { choice, edition, num, positive, type Edition, EDITIONS } from './gravity-args';
import { psi } from '../units/si';
import { working } from '../working/recorder';

/** ACI 318-19 §20.2.2.2: Es = 29,000,000 psi for nonprestressed bars. */
export const ES = 29e6 * psi;

/** ACI 318-19 Table 21.2.1 (0.90 and bearing 0.65 from memory; plain concrete Table 21.2.1(h) from memory). */
export const PHI_TABLE = {
  'tension-controlled': 0.9,
  'compression-tied': 0.65,
  'compression-spiral': 0.75,
  shear: 0.75,
  torsion: 0.75,
  bearing: 0.65,
  'plain-concrete': 0.6,
} as const;
export type Action = keyof typeof PHI_TABLE;
export const ACTIONS = Object.keys(PHI_TABLE) as Action[];

export const TRANSVERSE = ['other', 'spiral'] as const;
export type Transverse = (typeof TRANSVERSE)[number];

/** ACI 318-19 Table 21.2.1: φ for an action. */
export function phiAction(action: Action): number {
  const a = choice('action', action, ACTIONS);
  const phi = PHI_TABLE[a];
  working()?.lookup('phi', phi, '', `row: ${a.replace(/-/g, ' ')}`, 'ACI 318-19 Table 21.2.1');
  return phi;
}

/** ACI 318-19 §21.2.2.1: yield strain εty = fy/Es. */
export function epsTy(fy: number): number {
  const e = positive('fy', fy) / ES;
  working()?.step('eps_ty', 'fy / Es', e, '', { vars: { fy: [fy, 'psi'], Es: [ES, 'psi'] }, clause: 'ACI 318-19 §21.2.2.1, §20.2.2.2' });
  return e;
}

/** ACI 318-19 Table 21.2.2: tension-controlled strain limit, εty + 0.003 (318-14: 0.005). */
export function epsTc(fy: number, ed: Edition = '318-19'): number {
  const e = edition(ed);
  if (e === '318-19') {
    const tc = epsTy(fy) + 0.003;
    working()?.step('eps_tc', 'eps_ty + 0.003', tc, '', { clause: 'ACI 318-19 Table 21.2.2' });
    return tc;
  }
  working()?.lookup('eps_tc', 0.005, '', 'tension-controlled limit of ACI 318-14', 'ACI 318-14 Table 21.2.2');
  return 0.005;
}

/** ACI 318-19 Table 21.2.2: φ for moment/axial force from εt, linear between εty and the tension-controlled limit. */
export function phiEpsT(epsT: number, fy: number, transverse: Transverse = 'other', ed: Edition = '318-19'): number {
  const et = num('eps_t', epsT);
  const tr = choice('transverse', transverse, TRANSVERSE, 'other');
  const ety = epsTy(fy);
  const etc = epsTc(fy, edition(ed));
  const low = tr === 'spiral' ? 0.75 : 0.65;
  const w = working();
  const clause = 'ACI 318-19 Table 21.2.2';
  if (et <= ety || et >= etc) {
    const phi = et <= ety ? low : 0.9;
    w?.step(et <= ety ? 'compression_controlled' : 'tension_controlled', et <= ety ? 'eps_t <= eps_ty' : 'eps_t >= eps_tc', true, '', {
      vars: { eps_t: et, eps_ty: ety, eps_tc: etc }, clause,
    });
    w?.lookup('phi', phi, '', et <= ety ? `compression-controlled (${tr === 'spiral' ? 'spiral' : 'other'})` : 'tension-controlled', clause);
    return phi;
  }
  const phi = low + ((0.9 - low) * (et - ety)) / (etc - ety);
  w?.step('phi', `${low} + (0.9 - ${low}) * (eps_t - eps_ty) / (eps_tc - eps_ty)`, phi, '', {
    vars: { eps_t: et, eps_ty: ety, eps_tc: etc }, clause, note: 'transition: εty < εt < εt,tc',
  });
  return phi;
}

const FY = { name: 'fy', type: 'Pa', doc: 'specified yield strength of the reinforcement' };
const ED = { name: 'edition', type: 'text', choices: EDITIONS, doc: "ACI 318 edition, '318-19' (default) or '318-14'" };

export const functions: LibFunction[] = [
  defineFunction({
    name: 'phi_action',
    params: [{ name: 'action', type: 'text', choices: ACTIONS, doc: 'action or section class' }],
    returns: '1', clause: 'ACI 318-19 Table 21.2.1',
    doc: 'Strength reduction factor φ for an action',
    fn: (a: Action) => phiAction(a),
  }),
  defineFunction({
    name: 'eps_ty', params: [FY], returns: '1', clause: 'ACI 318-19 §21.2.2.1, §20.2.2.2',
    doc: 'Yield strain of the reinforcement εty = fy/Es',
    fn: (fy: number) => epsTy(fy),
  }),
  defineFunction({
    name: 'eps_tc', params: [FY, ED], optional: 1, returns: '1', clause: 'ACI 318-19 Table 21.2.2 (318-14: 0.005)',
    doc: 'Net tensile strain at the tension-controlled limit',
    fn: (fy: number, ed?: Edition) => epsTc(fy, ed),
  }),
  defineFunction({
    name: 'phi_eps_t',
    params: [
      { name: 'eps_t', type: '1', doc: 'net tensile strain of the extreme tension steel' },
      FY,
      { name: 'transverse', type: 'text', choices: TRANSVERSE, doc: "'other' (ties, slabs) or 'spiral'" },
      ED,
    ],
    optional: 2, returns: '1', clause: 'ACI 318-19 Table 21.2.2',
    doc: 'φ for moment and axial force from the net tensile strain',
    fn: (et: number, fy: number, tr?: Transverse, ed?: Edition) => phiEpsT(et, fy, tr, ed),
  }),
];
