// Concrete properties, ACI 318-19. The code states these in psi and pcf; every function
// converts its SI arguments, computes in the stated units and converts back, so a template
// in MPa and one in psi give the same number (the SI edition's rounded constants, e.g.
// 4700√f'c MPa, differ by under 1 % and are not used).

import { defineFunction, LibraryError, type LibFunction } from './types';
import { choice, positive, show } from './gravity-args';
import { MPa, pcf, psi } from '../units/si';
import { working } from '../working/recorder';

/** Lowest f'c accepted: 17 MPa (SI edition; 2500 psi in inch-pound), ACI 318-19 §19.2.1.1. */
export const FC_MIN = 17 * MPa;

function fcPsi(fc: number): number {
  const f = positive('fc', fc);
  if (f < FC_MIN * (1 - 1e-9)) {
    throw new LibraryError(`f'c = ${show(f / MPa)} MPa is below the 17 MPa (2500 psi) minimum of ACI 318-19 §19.2.1.1`);
  }
  return f / psi;
}

/** ACI 318-19 Table 22.2.2.4.3: β1 = 0.85 to 4000 psi, less 0.05 per 1000 psi, not below 0.65. */
export function beta1(fc: number): number {
  const f = fcPsi(fc);
  const w = working();
  const clause = 'ACI 318-19 Table 22.2.2.4.3';
  if (f <= 4000 || f >= 8000) {
    const b = f <= 4000 ? 0.85 : 0.65;
    w?.lookup('beta1', b, '', f <= 4000 ? "row 2500 ≤ f′c ≤ 4000 psi" : "row f′c ≥ 8000 psi", clause);
    return b;
  }
  const b = 0.85 - (0.05 * (f - 4000)) / 1000;
  w?.step('beta1', '0.85 - 0.05 * (fc - 4000) / 1000', b, '', {
    vars: { fc: [fc, 'psi'] }, code: true, clause, note: "row 4000 < f′c < 8000 psi",
  });
  return b;
}

/** ACI 318-19 §19.2.2.1(b): Ec = 57,000 √f'c psi for normal-weight concrete. */
export function ecConcrete(fc: number): number {
  const Ec = 57000 * Math.sqrt(fcPsi(fc)) * psi;
  working()?.step('Ec', '57000 * sqrt(fc)', Ec, 'psi', { vars: { fc: [fc, 'psi'] }, code: true, clause: 'ACI 318-19 §19.2.2.1(b)' });
  return Ec;
}

/** ACI 318-19 §19.2.2.1(a): Ec = wc^1.5 · 33 √f'c psi, wc in pcf between 90 and 160. */
export function ecConcreteWc(fc: number, wc: number): number {
  const f = fcPsi(fc);
  const w = positive('wc', wc) / pcf;
  if (w < 90 - 1e-9 || w > 160 + 1e-9) {
    throw new LibraryError(`ec_concrete_wc: wc = ${show(w)} pcf is outside 90-160 pcf (ACI 318-19 §19.2.2.1(a))`);
  }
  const Ec = Math.pow(w, 1.5) * 33 * Math.sqrt(f) * psi;
  working()?.step('Ec', 'wc^1.5 * 33 * sqrt(fc)', Ec, 'psi', {
    vars: { fc: [fc, 'psi'], wc: [wc, 'pcf'] }, code: true, clause: 'ACI 318-19 §19.2.2.1(a)',
  });
  return Ec;
}

/** ACI 318-19 Table 19.2.4.2: λ by the composition of the aggregate. */
export const LAMBDA_TABLE = {
  normal: 1.0,
  'sand-lightweight': 0.85,
  'all-lightweight': 0.75,
} as const;
export type ConcreteType = keyof typeof LAMBDA_TABLE;
export const CONCRETE_TYPES = Object.keys(LAMBDA_TABLE) as ConcreteType[];

/** ACI 318-19 Table 19.2.4.2: modification factor λ for lightweight concrete. */
export function lambdaConcrete(type: ConcreteType): number {
  const t = choice('type', type, CONCRETE_TYPES);
  const l = LAMBDA_TABLE[t];
  working()?.lookup('lambda', l, '', `row: ${t} concrete`, 'ACI 318-19 Table 19.2.4.2');
  return l;
}

/** ACI 318-19 Table 19.2.4.1(a), from memory: λ = 0.75 to 100 pcf, 0.0075 wc to 135 pcf, 1.0 above. */
export function lambdaWc(wc: number): number {
  const w = positive('wc', wc) / pcf;
  const rec = working();
  const clause = 'ACI 318-19 Table 19.2.4.1(a) [from memory]';
  if (w <= 100 || w > 135) {
    const l = w <= 100 ? 0.75 : 1.0;
    rec?.lookup('lambda', l, '', w <= 100 ? 'row wc ≤ 100 pcf' : 'row wc > 135 pcf', clause);
    return l;
  }
  const l = Math.min(1, 0.0075 * w);
  rec?.step('lambda', 'min(1, 0.0075 * wc)', l, '', { vars: { wc: [wc, 'pcf'] }, code: true, clause, note: 'row 100 < wc ≤ 135 pcf' });
  return l;
}

const FC = { name: 'fc', type: 'Pa', doc: "specified compressive strength f'c" };
const WC = { name: 'wc', type: 'N/m^3', doc: 'unit weight of the concrete' };

export const functions: LibFunction[] = [
  defineFunction({
    name: 'beta1', params: [FC], returns: '1', clause: 'ACI 318-19 Table 22.2.2.4.3',
    doc: 'Depth factor β1 of the equivalent rectangular stress block',
    fn: (fc: number) => beta1(fc),
  }),
  defineFunction({
    name: 'ec_concrete', params: [FC], returns: 'Pa', clause: 'ACI 318-19 §19.2.2.1(b)',
    doc: "Modulus of elasticity of normal-weight concrete, 57,000√f'c psi",
    fn: (fc: number) => ecConcrete(fc),
  }),
  defineFunction({
    name: 'ec_concrete_wc', params: [FC, WC], returns: 'Pa', clause: 'ACI 318-19 §19.2.2.1(a)',
    doc: "Modulus of elasticity, wc^1.5·33√f'c psi (wc 90-160 pcf)",
    fn: (fc: number, wc: number) => ecConcreteWc(fc, wc),
  }),
  defineFunction({
    name: 'lambda_concrete',
    params: [{ name: 'type', type: 'text', choices: CONCRETE_TYPES, doc: 'aggregate composition' }],
    returns: '1', clause: 'ACI 318-19 Table 19.2.4.2',
    doc: 'Lightweight concrete factor λ by concrete type',
    fn: (t: ConcreteType) => lambdaConcrete(t),
  }),
  defineFunction({
    name: 'lambda_wc', params: [WC], returns: '1', clause: 'ACI 318-19 Table 19.2.4.1(a)',
    doc: 'Lightweight concrete factor λ from the equilibrium density',
    fn: (wc: number) => lambdaWc(wc),
  }),
];
