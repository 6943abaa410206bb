// Development length of straight bottom bars in tension in a footing (ACI 318-19 §25.4.2),
// checked against the length available: cantilever length less the end cover.
// Two routes: the simplified Table 25.4.2.3 and the general Eq. 25.4.2.4(a).
// ψt = 1.0 (bottom bars). ψg exists only in 318-19 (Table 25.4.2.5); 318-14 has none.
// Coefficients and modification factors here are from memory (reference-values has none).

import { LibraryError, defineFunction, type LibFunction, type LibParam } from './types';
import { EDITIONS, edition, lambdaFactor, optional, positive, finite, type Edition } from './support-args';
import { sqrtFcShearPsi } from './shear-size-effect';
import { inch, ksi, psi } from '../units/si';
import { ended, working } from '../working/recorder';

/** ψg = 1.0 for Grade 40/60, 1.15 Grade 80, 1.3 Grade 100 (ACI 318-19 Table 25.4.2.5); 1.0 in 318-14. */
export function psiG(fy: number, ed: Edition = '318-19'): number {
  const f = positive('fy', fy) / ksi;
  const w = working();
  if (ed === '318-14') {
    w?.lookup('psi_g', 1, '', 'ACI 318-14 has no ψg', 'ACI 318-14 §25.4.2.4');
    return 1;
  }
  // Grades by the nearest name, so SI grades 420/550/690 MPa (60.9/79.8/100.1 ksi) land right.
  const g = f < 70 ? 1 : f < 90 ? 1.15 : 1.3;
  w?.lookup('psi_g', g, '', f < 70 ? 'Grade 40 or 60' : f < 90 ? 'Grade 80' : 'Grade 100', 'ACI 318-19 Table 25.4.2.5 [from memory]');
  return g;
}

function psiE(v: number): number {
  if (v < 1 || v > 1.5) throw new LibraryError(`psi_e must be between 1.0 (uncoated) and 1.5 (epoxy, small cover), got ${v}`);
  return v;
}

/** No. 6 and smaller (db ≤ 0.8 in, so a 19 or 20 mm bar counts) use the smaller coefficient. */
const smallBar = (db: number) => db / inch <= 0.8;

/** ℓd from ACI 318-19 Table 25.4.2.3 (simplified), ψt = 1, ≥ 12 in (§25.4.2.1), √f'c ≤ 100 psi (§25.4.1.4). */
export function ldBottom(db: number, fy: number, fc: number, spacingOk = true, lambda = 1, psie = 1, ed: Edition = '318-19'): number {
  return ldStraight(db, fy, fc, spacingOk, lambda, psie, ed, 1);
}

/** The same with the casting-position factor ψt (1.3 for top bars, Table 25.4.2.5); ψtψe ≤ 1.7. */
export function ldStraight(db: number, fy: number, fc: number, spacingOk: boolean, lambda: number, psie: number, ed: Edition, psiT: number): number {
  positive('db', db);
  const w = working()?.open('ld', { db: [db, 'in'], fy: [fy, 'psi'], fc: [fc, 'psi'], spacing_ok: spacingOk, lambda, psi_e: psie, psi_t: psiT }, 'ACI 318-19 Table 25.4.2.3');
  const root = sqrtFcShearPsi(fc); // same 100 psi cap applies to development (§25.4.1.4)
  const psiProduct = Math.min(psiT * psiE(psie), 1.7) * psiG(fy, ed);
  w?.step('psi', 'min(psi_t * psi_e, 1.7) * psi_g', psiProduct, '', { vars: { psi_t: psiT, psi_e: psie }, clause: 'ACI 318-19 §25.4.2.5 [from memory]' });
  const denom = spacingOk ? (smallBar(db) ? 25 : 20) : (smallBar(db) ? 50 / 3 : 40 / 3);
  w?.lookup('K', denom, '', `${smallBar(db) ? 'No. 6 and smaller' : 'No. 7 and larger'}, ${spacingOk ? 'spacing and cover met' : 'other cases'}`, 'ACI 318-19 Table 25.4.2.3 [from memory]');
  const ld = ((fy / psi) * psiProduct / (denom * lambda * root)) * db;
  const out = Math.max(ld, 12 * inch);
  if (w) {
    const vars = { fy: [fy, 'psi'], db: [db, 'in'], lambda } as const;
    w.step('l_d', 'fy * psi / (K * lambda * sqrt_fc) * db', ld, 'in', { vars, code: true, clause: 'ACI 318-19 Table 25.4.2.3 [from memory]' });
    w.step('l_d', 'max(l_d, 12)', out, 'in', { code: true, clause: 'ACI 318-19 §25.4.2.1', governs: out > ld, note: out > ld ? 'the 12 in minimum governs' : undefined });
  }
  return ended(w, out, 'in');
}

/** ℓd = (3/40)(fy/(λ√f'c)) ψtψeψsψg / ((cb + Ktr)/db) · db, (cb+Ktr)/db ≤ 2.5 (ACI 318-19 Eq. 25.4.2.4(a)). */
export function ldBottomGeneral(db: number, fy: number, fc: number, cb: number, ktr = 0, lambda = 1, psie = 1, ed: Edition = '318-19'): number {
  positive('db', db);
  positive('cb', cb);
  if (finite('Ktr', ktr) < 0) throw new LibraryError('Ktr must not be negative');
  const w = working();
  const root = sqrtFcShearPsi(fc);
  const psiS = smallBar(db) ? 0.8 : 1.0;
  w?.lookup('psi_s', psiS, '', smallBar(db) ? 'No. 6 and smaller' : 'No. 7 and larger', 'ACI 318-19 Table 25.4.2.5 [from memory]');
  const confinement = Math.min((cb + ktr) / db, 2.5);
  const vars = { cb: [cb, 'in'], Ktr: [ktr, 'in'], db: [db, 'in'], fy: [fy, 'psi'], lambda, psi_e: psie } as const;
  w?.step('k_conf', 'min((cb + Ktr) / db, 2.5)', confinement, '', { vars, clause: 'ACI 318-19 §25.4.2.4', governs: confinement === 2.5 });
  const psiProduct = Math.min(1 * psiE(psie), 1.7) * psiS * psiG(fy, ed);
  w?.step('psi', 'min(psi_e, 1.7) * psi_s * psi_g', psiProduct, '', { vars, note: 'ψt = 1.0, bottom bars' });
  const ld = (3 / 40) * ((fy / psi) / (lambda * root)) * (psiProduct / confinement) * db;
  const out = Math.max(ld, 12 * inch);
  w?.step('l_d', '3 / 40 * fy / (lambda * sqrt_fc) * psi / k_conf * db', ld, 'in', { vars, code: true, clause: 'ACI 318-19 Eq. 25.4.2.4(a) [from memory]' });
  w?.step('l_d', 'max(l_d, 12)', out, 'in', { code: true, clause: 'ACI 318-19 §25.4.2.1', governs: out > ld, note: out > ld ? 'the 12 in minimum governs' : undefined });
  return out;
}

/** Length available to develop a bottom bar: (L − c)/2 − end cover (common practice). */
export function ldAvailFooting(l: number, c: number, cover: number): number {
  const avail = (positive('L', l) - positive('c', c)) / 2 - positive('cover', cover);
  if (avail <= 0) throw new LibraryError('no length left to develop the bars: (L − c)/2 − cover ≤ 0');
  working()?.step('l_d_avail', '(L - c) / 2 - cover', avail, 'in', {
    vars: { L: [l, 'ft'], c: [c, 'in'], cover: [cover, 'in'] }, clause: 'ACI 318-19 §13.2.8.1 [from memory]',
  });
  return avail;
}

const head: LibParam[] = [
  { name: 'db', type: 'm', doc: 'bar diameter' },
  { name: 'fy', type: 'Pa', doc: 'bar yield strength' },
  { name: 'fc', type: 'Pa', doc: 'concrete strength' },
];
const tail: LibParam[] = [
  { name: 'lambda', type: '1', doc: 'lightweight concrete factor (default 1.0)' },
  { name: 'psi_e', type: '1', doc: 'coating factor ψe (default 1.0, uncoated)' },
  { name: 'edition', type: 'text', choices: EDITIONS, doc: "'318-19' (default) or '318-14' (no ψg)" },
];
const lam = (v: unknown) => optional(v, 1, lambdaFactor);
const pe = (v: unknown) => optional(v, 1, (x) => psiE(finite('psi_e', x)));

export const functions: LibFunction[] = [
  defineFunction({
    name: 'ld_bottom',
    params: [...head, { name: 'spacing_ok', type: 'bool', doc: 'clear spacing ≥ 2db and cover ≥ db (or ≥ db with minimum ties); default true' }, ...tail],
    optional: 4,
    returns: 'm',
    clause: "ACI 318-19 Table 25.4.2.3 (simplified), ψt = 1.0 bottom bars, ψg per Table 25.4.2.5, ℓd ≥ 12 in [from memory]",
    doc: 'Tension development length of straight bottom bars, simplified table',
    fn: (db: number, fy: number, fc: number, ok?: boolean, l?: number, e?: number, ed?: string) =>
      ldBottom(db, fy, fc, ok === undefined ? true : Boolean(ok), lam(l), pe(e), edition(ed)),
  }),
  defineFunction({
    name: 'ld_bottom_general',
    params: [...head, { name: 'cb', type: 'm', doc: 'smaller of cover to bar centre and half the bar spacing' },
      { name: 'Ktr', type: 'm', doc: 'transverse reinforcement index (0 in footings)' }, ...tail],
    optional: 4,
    returns: 'm',
    clause: 'ACI 318-19 Eq. 25.4.2.4(a), (cb + Ktr)/db ≤ 2.5, ψt = 1.0 bottom bars, ℓd ≥ 12 in [from memory]',
    doc: 'Tension development length of straight bottom bars, general equation',
    fn: (db: number, fy: number, fc: number, cb: number, k?: number, l?: number, e?: number, ed?: string) =>
      ldBottomGeneral(db, fy, fc, cb, optional(k, 0, (x) => finite('Ktr', x)), lam(l), pe(e), edition(ed)),
  }),
  defineFunction({
    name: 'ld_avail_footing',
    params: [
      { name: 'L', type: 'm', doc: 'footing length along the bars' },
      { name: 'c', type: 'm', doc: 'column side along the bars' },
      { name: 'cover', type: 'm', doc: 'end cover of the bars' },
    ],
    returns: 'm',
    clause: 'Available length (L − c)/2 − cover from the critical section at the column face (ACI 318-19 §13.2.8.1 [from memory])',
    doc: 'Length available to develop the footing bars beyond the column face',
    fn: ldAvailFooting,
  }),
];
