// Flexure of a rectangular section with tension steel only: equivalent rectangular stress
// block 0.85f'c over a = β1c, εcu = 0.003 (ACI 318-19 §22.2.2). All in SI; the stress block
// is unit-consistent, only β1 and Es come from clauses stated in psi. fy is taken not above
// the flexure cap of Table 20.2.2.4(a) for the edition (100 ksi in 318-19, 80 ksi in 318-14).

import { defineFunction, LibraryError, type LibFunction } from './types';
import { edition, nonNegative, positive, show, type Edition, EDITIONS } from './gravity-args';
import { beta1 } from './concrete';
import { barArea, barData, BARS } from './rebar';
import { ES, epsTc, epsTy, phiEpsT } from './resistance-factors';
import { asMinSlab, fyDesign } from './reinforcement-limits';
import { inch, mm } from '../units/si';
import { ended, working } from '../working/recorder';

const ECU = 0.003; // ACI 318-19 §22.2.2.1
const PHI_TC = 0.9; // ACI 318-19 Table 21.2.2, tension-controlled

export interface SectionState {
  c: number; // neutral axis depth, m
  a: number; // stress block depth, m
  fs: number; // steel stress, Pa
  epsT: number; // net tensile strain
}

/** ACI 318-19 §22.2: force equilibrium with strain compatibility (steel elastic if it does not yield). */
export function section(As: number, b: number, d: number, fc: number, fy: number): SectionState {
  const A = positive('As', As);
  const bb = positive('b', b);
  const dd = positive('d', d);
  const f = positive('fc', fc);
  const y = positive('fy', fy);
  const b1 = beta1(f);
  const w = working();
  const vars = { As: [A, 'in^2'], b: [bb, 'in'], d: [dd, 'in'], fc: [f, 'psi'], fy: [y, 'psi'], Es: [ES, 'psi'] } as const;
  const clause = 'ACI 318-19 §22.2.2';
  let c = (A * y) / (0.85 * f * b1 * bb);
  w?.step('c', 'As * fy / (0.85 * fc * beta1 * b)', c, 'in', { vars, clause, note: 'steel taken as yielding' });
  let eps = (ECU * (dd - c)) / c;
  w?.step('eps_t', '0.003 * (d - c) / c', eps, '', { vars, clause: 'ACI 318-19 §22.2.2.1' });
  let fs = y;
  if (eps < epsTy(y)) {
    // Steel below yield: 0.85 f'c β1 b c² + As Es εcu c − As Es εcu d = 0.
    const qa = 0.85 * f * b1 * bb;
    const qb = A * ES * ECU;
    c = (-qb + Math.sqrt(qb * qb + 4 * qa * qb * dd)) / (2 * qa);
    w?.step('c', '(-(As * Es * 0.003) + sqrt((As * Es * 0.003)^2 + 4 * (0.85 * fc * beta1 * b) * (As * Es * 0.003) * d)) / (2 * 0.85 * fc * beta1 * b)', c, 'in', {
      vars, clause, note: "εt < εty: steel below yield, c from 0.85f′cβ1b·c² + AsEsεcu·c − AsEsεcu·d = 0",
    });
    eps = (ECU * (dd - c)) / c;
    w?.step('eps_t', '0.003 * (d - c) / c', eps, '', { vars, clause: 'ACI 318-19 §22.2.2.1' });
    fs = ES * eps;
    w?.step('fs', 'Es * eps_t', fs, 'psi', { vars, clause: 'ACI 318-19 §20.2.2.1' });
  } else {
    w?.step('fs', 'fy', fs, 'psi', { vars, note: 'εt ≥ εty: the steel yields' });
  }
  w?.step('a', 'beta1 * c', b1 * c, 'in', { clause: 'ACI 318-19 §22.2.2.4.1' });
  return { c, a: b1 * c, fs, epsT: eps };
}

/** ACI 318-19 §22.2.2.4 Whitney block: As for Mu with φ = 0.9, ρ = 0.85f'c/fy·(1 − √(1 − 2Rn/(0.85f'c))). */
export function asRequired(Mu: number, b: number, d: number, fc: number, fy: number, ed: Edition = '318-19'): number {
  const M = nonNegative('Mu', Mu);
  const bb = positive('b', b);
  const dd = positive('d', d);
  const f = positive('fc', fc);
  const w = working()?.open('as_required', { Mu: [M, 'kip*ft'], b: [bb, 'in'], d: [dd, 'in'], fc: [f, 'psi'], fy: [fy, 'psi'], edition: ed }, 'ACI 318-19 §22.2.2.4');
  const y = fyDesign(fy, 'flexure', edition(ed));
  const Rn = M / (PHI_TC * bb * dd * dd);
  const vars = { Mu: [M, 'kip*ft'], b: [bb, 'in'], d: [dd, 'in'], fc: [f, 'psi'], fy: [y, 'psi'], phi: PHI_TC } as const;
  w?.step('R_n', 'Mu / (phi * b * d^2)', Rn, 'psi', { vars, clause: 'ACI 318-19 §22.2.2.4, φ = 0.90 (Table 21.2.2)' });
  const root = 1 - (2 * Rn) / (0.85 * f);
  if (root < 0) {
    throw new LibraryError(
      `Mu is more than the section can carry with tension steel only (Rn = ${show(Rn / 1e6)} MPa > 0.425 f'c); deepen the section`,
    );
  }
  const rho = ((0.85 * f) / y) * (1 - Math.sqrt(root));
  w?.step('rho', '0.85 * fc / fy * (1 - sqrt(1 - 2 * R_n / (0.85 * fc)))', rho, '', { vars, clause: 'ACI 318-19 §22.2.2.4 (Whitney block)' });
  const As = rho * bb * dd;
  w?.step('As_req', 'rho * b * d', As, 'in^2', { vars });
  return ended(w, As, 'in^2');
}

/** ACI 318-19 §22.2.2.1: net tensile strain εt = 0.003(d − c)/c of the extreme tension steel. */
export function epsT(As: number, b: number, d: number, fc: number, fy: number, ed: Edition = '318-19'): number {
  const e = section(As, b, d, fc, fyDesign(fy, 'flexure', edition(ed))).epsT;
  working()?.result('eps_t', 'eps_t', e);
  return e;
}

/** ACI 318-19 Table 21.2.2: true when εt reaches the tension-controlled limit. */
export function tensionControlled(As: number, b: number, d: number, fc: number, fy: number, ed: Edition = '318-19'): boolean {
  const fyD = fyDesign(fy, 'flexure', edition(ed));
  const e = epsT(As, b, d, fc, fy, ed);
  const tc = epsTc(fyD, edition(ed));
  const ok = e >= tc - 1e-12;
  working()?.step('tension_controlled', 'eps_t >= eps_tc', ok, '', { vars: { eps_t: e, eps_tc: tc - 1e-12 }, clause: 'ACI 318-19 Table 21.2.2' });
  return ok;
}

/** ACI 318-19 §22.2 and Table 21.2.2: design strength φMn = φ As fs (d − a/2), φ from εt. */
export function phiMn(As: number, b: number, d: number, fc: number, fy: number, ed: Edition = '318-19'): number {
  const w = working()?.open('phi_mn', { As: [As, 'in^2'], b: [b, 'in'], d: [d, 'in'], fc: [fc, 'psi'], fy: [fy, 'psi'], edition: ed }, 'ACI 318-19 §22.2, Table 21.2.2');
  const fyD = fyDesign(fy, 'flexure', edition(ed));
  const s = section(As, b, d, fc, fyD);
  const phi = phiEpsT(s.epsT, fyD, 'other', edition(ed));
  const m = phi * As * s.fs * (d - s.a / 2);
  w?.step('phi_Mn', 'phi * As * fs * (d - a / 2)', m, b === 1 ? 'kip*ft/ft' : 'kip*ft', {
    vars: { As: [As, 'in^2'], d: [d, 'in'] }, clause: 'ACI 318-19 §22.2.2.4',
  });
  return ended(w, m, b === 1 ? 'kip*ft/ft' : 'kip*ft');
}

/** Steel area per unit width of bars at spacing s (area/s). */
export function asProvided(bar: string, s: number): number {
  const ss = positive('s', s);
  const As = barArea(bar) / ss;
  working()?.step('As', 'A_b / s', As, 'in^2/ft', { vars: { s: [ss, 'in'] } });
  return As;
}

/** φMn per unit width of a slab with bars at spacing s (ACI 318-19 §22.2, Table 21.2.2). */
export function phiMnBars(bar: string, s: number, d: number, fc: number, fy: number, ed: Edition = '318-19'): number {
  const w = working()?.open('phi_mn_bars', { bar, s: [s, 'in'], d: [d, 'in'], fc: [fc, 'psi'], fy: [fy, 'psi'], edition: ed }, 'ACI 318-19 §22.2, Table 21.2.2');
  return ended(w, phiMn(asProvided(bar, s), 1, d, fc, fy, ed), 'kip*ft/ft');
}

/** Design steel of a slab strip: the larger of as_required and As,min (ACI 318-19 §22.2, §7.6.1.1 / §8.6.1.1). */
export function asSlab(Mu: number, b: number, d: number, h: number, fc: number, fy: number, ed: Edition = '318-19'): number {
  if (positive('h', h) < positive('d', d)) throw new LibraryError('as_slab: h must not be less than d');
  const w = working()?.open('as_slab', { Mu: [Mu, 'kip*ft'], b: [b, 'in'], d: [d, 'in'], h: [h, 'in'], fc: [fc, 'psi'], fy: [fy, 'psi'], edition: ed }, 'ACI 318-19 §22.2.2.4; Tables 7.6.1.1, 8.6.1.1');
  const req = asRequired(Mu, b, d, fc, fy, ed);
  const min = asMinSlab(b, h, fy, ed);
  const As = Math.max(req, min);
  w?.step('As', 'max(As_req, As_min)', As, 'in^2', {
    governs: true, note: req >= min ? 'the steel for Mu governs' : 'the minimum steel governs',
    clause: req >= min ? 'ACI 318-19 §22.2.2.4' : 'ACI 318-19 §7.6.1.1 / §8.6.1.1',
  });
  return ended(w, As, 'in^2');
}

/** Practical spacing increments (common practice): 0.5 in for inch-pound bars, 25 mm for metric bars. */
export const SPACING_STEP = { 'inch-pound': 0.5 * inch, metric: 25 * mm } as const;

/**
 * Bar spacing for a required steel area per unit width: area/As_req, not more than s_max,
 * rounded down to the practical increment (common practice). Refuses a spacing below the
 * minimum clear spacing max(1 in, db) of ACI 318-19 §25.2.1 (aggregate size not checked).
 */
export function barSpacing(AsReqPerWidth: number, bar: string, sMax: number): number {
  const req = nonNegative('As_req', AsReqPerWidth);
  const row = barData(bar);
  const cap = positive('s_max', sMax);
  const step = SPACING_STEP[row.system];
  const raw = req > 0 ? Math.min(row.area / req, cap) : cap;
  const s = Math.floor(raw / step + 1e-9) * step;
  const w = working();
  if (w) {
    const clause = 'Practical increment (common practice)';
    w.lookup('A_b', row.area, 'in^2', `${bar} bar`, row.system === 'metric' ? 'ASTM A615M / ISO 6935-2' : 'ASTM A615');
    w.step('s', req > 0 ? 'min(A_b / As_req, s_max)' : 's_max', raw, 'in', { vars: { As_req: [req, 'in^2/ft'], s_max: [cap, 'in'] } });
    w.step('s', 'floor(s / step) * step', s, 'in', { vars: { s: [raw, 'in'], step: [step, 'in'] }, clause, note: 'rounded down to the increment' });
  }
  const sMin = row.dia + Math.max(1 * inch, row.dia);
  if (s < sMin || s <= 0) {
    throw new LibraryError(
      `${bar} would need a spacing of ${show(raw / mm)} mm, below the minimum ${show(sMin / mm)} mm (§25.2.1); use a larger bar`,
    );
  }
  return s;
}

const B = { name: 'b', type: 'm', doc: 'width of the section or strip' };
const D = { name: 'd', type: 'm', doc: 'effective depth' };
const FC = { name: 'fc', type: 'Pa', doc: "specified compressive strength f'c" };
const FY = { name: 'fy', type: 'Pa', doc: 'specified yield strength of the reinforcement' };
const AS = { name: 'As', type: 'm^2', doc: 'area of tension steel' };
const BAR = { name: 'bar', type: 'text', choices: BARS, doc: 'bar designation: "#5", "#16M" or "D16"' };
const S = { name: 's', type: 'm', doc: 'bar spacing' };
const ED = { name: 'edition', type: 'text', choices: EDITIONS, doc: "ACI 318 edition, '318-19' (default) or '318-14'" };

export const functions: LibFunction[] = [
  defineFunction({
    name: 'as_required', params: [{ name: 'Mu', type: 'N*m', doc: 'factored moment' }, B, D, FC, FY, ED],
    optional: 1, returns: 'm^2', clause: 'ACI 318-19 §22.2.2.4 (φ = 0.90); fy ≤ 100 ksi (318-14: 80 ksi), Table 20.2.2.4(a)',
    doc: 'Tension steel for Mu by the rectangular stress block, φ = 0.90',
    fn: (Mu: number, b: number, d: number, fc: number, fy: number, ed?: Edition) => asRequired(Mu, b, d, fc, fy, ed),
  }),
  defineFunction({
    name: 'as_slab',
    params: [{ name: 'Mu', type: 'N*m', doc: 'factored moment on the strip' }, B, D,
      { name: 'h', type: 'm', doc: 'slab thickness' }, FC, FY, ED],
    optional: 1, returns: 'm^2', clause: 'ACI 318-19 §22.2.2.4; Tables 7.6.1.1, 8.6.1.1',
    doc: 'Slab steel: larger of the required and the minimum area',
    fn: (Mu: number, b: number, d: number, h: number, fc: number, fy: number, ed?: Edition) =>
      asSlab(Mu, b, d, h, fc, fy, ed),
  }),
  defineFunction({
    name: 'eps_t', params: [AS, B, D, FC, FY, ED], optional: 1, returns: '1', clause: 'ACI 318-19 §22.2.2.1; slabs and footings need εt ≥ 0.004 (§7.3.3.1, §8.3.3.1) [from memory]',
    doc: 'Net tensile strain in the extreme tension steel',
    fn: (As: number, b: number, d: number, fc: number, fy: number, ed?: Edition) => epsT(As, b, d, fc, fy, ed),
  }),
  defineFunction({
    name: 'tension_controlled', params: [AS, B, D, FC, FY, ED], optional: 1, returns: 'bool',
    clause: 'ACI 318-19 Table 21.2.2 (318-14: εt ≥ 0.005)',
    doc: 'Section is tension-controlled (εt ≥ εty + 0.003; 318-14: 0.005)',
    fn: (As: number, b: number, d: number, fc: number, fy: number, ed?: Edition) =>
      tensionControlled(As, b, d, fc, fy, ed),
  }),
  defineFunction({
    name: 'phi_mn', params: [AS, B, D, FC, FY, ED], optional: 1, returns: 'N*m',
    clause: 'ACI 318-19 §22.2, Table 21.2.2',
    doc: 'Design flexural strength φMn, φ from εt',
    fn: (As: number, b: number, d: number, fc: number, fy: number, ed?: Edition) => phiMn(As, b, d, fc, fy, ed),
  }),
  defineFunction({
    name: 'as_provided', params: [BAR, S], returns: 'm', clause: 'ASTM A615 / A615M; ISO 6935-2',
    doc: 'Steel area per unit width of bars at spacing s (m²/m)',
    fn: (bar: string, s: number) => asProvided(bar, s),
  }),
  defineFunction({
    name: 'phi_mn_bars', params: [BAR, S, D, FC, FY, ED], optional: 1, returns: 'N',
    clause: 'ACI 318-19 §22.2, Table 21.2.2',
    doc: 'φMn per unit width (N·m/m) of slab bars at spacing s',
    fn: (bar: string, s: number, d: number, fc: number, fy: number, ed?: Edition) => phiMnBars(bar, s, d, fc, fy, ed),
  }),
  defineFunction({
    name: 'bar_spacing',
    params: [{ name: 'As_req', type: 'm', doc: 'required steel per unit width (m²/m)' }, BAR,
      { name: 's_max', type: 'm', doc: 'maximum spacing allowed' }],
    returns: 'm', clause: 'Practical increment 0.5 in / 25 mm (common practice); ACI 318-19 §25.2.1',
    doc: 'Bar spacing for a required area per width, rounded down to 0.5 in / 25 mm',
    fn: (req: number, bar: string, sMax: number) => barSpacing(req, bar, sMax),
  }),
];
