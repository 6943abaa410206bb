// Size-effect factor λs and the √f'c used in the ACI shear expressions.
// The code writes these in psi and inches; the engine hands us SI, so convert here.

import { defineFunction, type LibFunction } from './types';
import { edition, positive, type Edition, EDITIONS } from './support-args';
import { inch, psi } from '../units/si';

/** √f'c in psi, capped at 100 psi for shear (ACI 318-19 §22.5.3.1, §22.6.3.1). */
export function sqrtFcShearPsi(fc: number): number {
  return Math.min(Math.sqrt(positive("f'c", fc) / psi), 100);
}

/** Size-effect factor λs = √(2/(1 + d/10)) ≤ 1, d in inches (ACI 318-19 §22.5.5.1.3); 1 in 318-14. */
export function lambdaS(d: number, ed: Edition = '318-19'): number {
  const dIn = positive('d', d) / inch;
  if (ed === '318-14') return 1;
  return Math.min(1, Math.sqrt(2 / (1 + dIn / 10)));
}

export const functions: LibFunction[] = [
  defineFunction({
    name: 'lambda_s',
    params: [
      { name: 'd', type: 'm', doc: 'effective depth' },
      { name: 'edition', type: 'text', choices: EDITIONS, doc: "'318-19' (default) or '318-14'" },
    ],
    optional: 1,
    returns: '1',
    clause: 'ACI 318-19 §22.5.5.1.3: λs = √(2/(1 + d/10)) ≤ 1.0 (d in in.); ACI 318-14 has no λs (1.0)',
    doc: 'Size-effect factor for shear of members without (minimum) shear reinforcement',
    fn: (d: number, ed?: string) => lambdaS(d, edition(ed)),
  }),
];
