// Can the slab carry its own weight as a one-way strip? A sanity flag for thin or long
// slabs: the factored self-weight moment of a 1 m strip (1.4D, ASCE 7-22 §2.3.1 comb. 1, the same in 7-16)
// against φMn of the same strip with only the minimum steel (0.0018 b h, ACI 318-19
// Table 7.6.1.1). Elastic moment coefficients of a uniform beam (common practice): simple
// wℓ²/8, one end continuous (propped) wℓ²/8, both ends continuous (fixed) wℓ²/12,
// cantilever wℓ²/2.

import { defineFunction, LibraryError, type LibFunction } from './types';
import { choice, positive, type Edition, EDITIONS } from './gravity-args';
import { comboU1 } from './loads-combinations';
import { asMinSlab } from './reinforcement-limits';
import { phiMn } from './flexure';
import { ONE_WAY_SUPPORTS, type OneWaySupport } from './slab-thickness';
import { ended, working } from '../working/recorder';

const MOMENT_COEF: Record<OneWaySupport, number> = { simple: 1 / 8, 'one-end': 1 / 8, 'both-ends': 1 / 12, cantilever: 1 / 2 };

/** Demand/capacity of a 1 m strip under 1.4 × self-weight with minimum steel (see header). */
export function selfWeightRatio(
  h: number, d: number, span: number, support: OneWaySupport, fc: number, fy: number, wc: number, ed: Edition = '318-19',
): number {
  const hh = positive('h', h);
  const dd = positive('d', d);
  if (dd >= hh) throw new LibraryError(`d must be less than h`);
  const l = positive('span', span);
  const sup = choice('support', support, ONE_WAY_SUPPORTS);
  const w = positive('wc', wc);
  const rec = working()?.open('self_weight_ratio', { h: [hh, 'in'], d: [dd, 'in'], span: [l, 'ft'], support: sup, fc: [fc, 'psi'], fy: [fy, 'psi'], wc: [w, 'pcf'] }, CLAUSE);
  rec?.step('D', 'wc * h', w * hh, 'psf', { vars: { wc: [w, 'pcf'], h: [hh, 'in'] }, note: 'self-weight' });
  const qu = comboU1(w * hh); // N/m² = N/m on a 1 m strip
  const Mu = MOMENT_COEF[sup] * qu * l * l;
  rec?.step('Mu', `${MOMENT_TEX[sup]} * U1 * span^2`, Mu, 'kip*ft/ft', { vars: { span: [l, 'ft'] }, note: `${sup.replace(/-/g, ' ')}, per unit width (common practice)` });
  const capacity = phiMn(asMinSlab(1, hh, fy, ed), 1, dd, fc, fy, ed);
  const ratio = Mu / capacity;
  rec?.step('ratio', 'Mu / phi_Mn', ratio, '', { clause: CLAUSE });
  return ended(rec, ratio);
}

const MOMENT_TEX: Record<OneWaySupport, string> = { simple: '1 / 8', 'one-end': '1 / 8', 'both-ends': '1 / 12', cantilever: '1 / 2' };

/** True when the strip with minimum steel carries its factored self-weight (ratio ≤ 1). */
export function selfWeightOk(
  h: number, d: number, span: number, support: OneWaySupport, fc: number, fy: number, wc: number, ed: Edition = '318-19',
): boolean {
  const r = selfWeightRatio(h, d, span, support, fc, fy, wc, ed);
  working()?.step('ok', 'ratio <= 1', r <= 1, '', { vars: { ratio: r } });
  return r <= 1;
}

const PARAMS = [
  { name: 'h', type: 'm', doc: 'slab thickness' },
  { name: 'd', type: 'm', doc: 'effective depth of the minimum steel' },
  { name: 'span', type: 'm', doc: 'span of the strip' },
  { name: 'support', type: 'text', choices: ONE_WAY_SUPPORTS, doc: 'simple, one-end, both-ends or cantilever' },
  { name: 'fc', type: 'Pa', doc: "specified compressive strength f'c" },
  { name: 'fy', type: 'Pa', doc: 'yield strength of the reinforcement' },
  { name: 'wc', type: 'N/m^3', doc: 'unit weight of the concrete' },
  { name: 'edition', type: 'text', choices: EDITIONS, doc: "ACI 318 edition, '318-19' (default) or '318-14'" },
];
const CLAUSE = 'ASCE 7-22 §2.3.1 (1.4D); ACI 318-19 Table 7.6.1.1, §22.2';

export const functions: LibFunction[] = [
  defineFunction({
    name: 'self_weight_ratio', params: PARAMS, optional: 1, returns: '1', clause: CLAUSE,
    doc: 'Factored self-weight moment / φMn of a strip with minimum steel',
    fn: (h: number, d: number, l: number, s: OneWaySupport, fc: number, fy: number, wc: number, ed?: Edition) =>
      selfWeightRatio(h, d, l, s, fc, fy, wc, ed),
  }),
  defineFunction({
    name: 'self_weight_ok', params: PARAMS, optional: 1, returns: 'bool', clause: CLAUSE,
    doc: 'The slab carries its own factored weight as a one-way strip with minimum steel',
    fn: (h: number, d: number, l: number, s: OneWaySupport, fc: number, fy: number, wc: number, ed?: Edition) =>
      selfWeightOk(h, d, l, s, fc, fy, wc, ed),
  }),
];
