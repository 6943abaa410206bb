// Size-effect factor λs and the √f'c used in the ACI shear expressions.
// The code writes these in psi and inches; the engine hands us SI, so convert here.

import { defineFunction, LibraryError, type LibFunction } from './types';
import { edition, positive, type Edition, EDITIONS } from './support-args';
import { inch, psi } from '../units/si';
import { working } from '../working/recorder';

/** √f'c in psi, capped at 100 psi for shear (ACI 318-19 §22.5.3.1, §22.6.3.1). */
export function sqrtFcShearPsi(fc: number): number {
  const f = positive("f'c", fc) / psi;
  const root = Math.min(Math.sqrt(f), 100);
  const capped = Math.sqrt(f) > 100;
  working()?.step('sqrt_fc', 'min(sqrt(fc), 100)', root * psi, 'psi', {
    vars: { fc: [fc, 'psi'] }, code: true, clause: 'ACI 318-19 §22.5.3.1, §22.6.3.1',
    governs: capped, note: capped ? "√f′c capped at 100 psi (f′c above 10,000 psi)" : undefined,
  });
  return root;
}

/**
 * Size-effect factor λs = √(2/(1 + d/10)) ≤ 1, d in inches (ACI 318-19 §22.5.5.1.3); 1 in 318-14.
 * `neglected`: ACI 318-19 §13.2.6.2 (from memory) permits neglecting λs in the one-way and two-way
 * shear of one-way shallow foundations, isolated footings and mats; the caller says so knowingly.
 */
export function lambdaS(d: number, ed: Edition = '318-19', neglected = false): number {
  const dIn = positive('d', d) / inch;
  const w = working();
  if (ed === '318-14' || neglected) {
    w?.step('lambda_s', '1', 1, '', {
      note: ed === '318-14' ? 'ACI 318-14 has no size effect' : 'λs neglected, as §13.2.6.2 permits for footings and mats',
      clause: ed === '318-14' ? 'ACI 318-14 §22.6.5.2' : 'ACI 318-19 §13.2.6.2',
    });
    return 1;
  }
  const ls = Math.min(1, Math.sqrt(2 / (1 + dIn / 10)));
  w?.step('lambda_s', 'min(1, sqrt(2 / (1 + d / 10)))', ls, '', {
    vars: { d: [d, 'in'] }, code: true, clause: 'ACI 318-19 §22.5.5.1.3',
    note: ls === 1 ? 'd ≤ 10 in: no size effect' : undefined,
  });
  return ls;
}

/** The optional §13.2.6.2 switch, shared by the shear functions. */
export const NEGLECT_LS_PARAM = {
  name: 'neglect_lambda_s',
  type: 'bool',
  doc: 'footings and mats only: neglect λs as ACI 318-19 §13.2.6.2 permits (default false: λs applied)',
} as const;

export const NEGLECT_LS_CLAUSE = 'λs may be neglected for one-way shallow foundations, isolated footings and mats (ACI 318-19 §13.2.6.2) [from memory]';

/** Reads the optional switch. */
export function neglectLs(v: unknown): boolean {
  if (v === undefined) return false;
  if (typeof v !== 'boolean') throw new LibraryError('neglect_lambda_s must be true or false');
  return v;
}

export const functions: LibFunction[] = [
  defineFunction({
    name: 'lambda_s',
    params: [
      { name: 'd', type: 'm', doc: 'effective depth' },
      { name: 'edition', type: 'text', choices: EDITIONS, doc: "'318-19' (default) or '318-14'" },
      NEGLECT_LS_PARAM,
    ],
    optional: 2,
    returns: '1',
    clause: `ACI 318-19 §22.5.5.1.3: λs = √(2/(1 + d/10)) ≤ 1.0 (d in in.); ACI 318-14 has no λs (1.0); ${NEGLECT_LS_CLAUSE}`,
    doc: 'Size-effect factor for shear of members without (minimum) shear reinforcement',
    fn: (d: number, ed?: string, n?: boolean) => lambdaS(d, edition(ed), neglectLs(n)),
  }),
];
