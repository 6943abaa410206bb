// Dowels between a column and its footing, in compression: developed down into the
// footing (ℓdc, ACI 318-19 §25.4.9) within the depth the footing offers, and lapped up into
// the column (ℓsc, §25.5.5). Hooks do not count in compression (§25.4.1.2): the hooked ends
// sit on the bottom mat to hold the dowels in place while casting (common practice), so
// the straight length available is the thickness less the cover, the two bar layers of the
// mat and the dowel's own bend leg (common practice). The code writes these in psi and
// inches; computed here in those units and returned in metres.

import { LibraryError, defineFunction, type LibFunction, type LibParam } from './types';
import { finite, lambdaFactor, optional, positive } from './support-args';
import { sqrtFcShearPsi } from './shear-size-effect';
import { inch, psi } from '../units/si';
import { working } from '../working/recorder';

function psiR(v: number): number {
  if (v !== 1 && v !== 0.75) throw new LibraryError(`psi_r is 1.0, or 0.75 with the confining ties of §25.4.9.3 (got ${v})`);
  return v;
}

function barSize(db: number): number {
  const d = positive('db', db);
  // No. 11 is 1.41 in; the bigger bars (No. 14, No. 18) are not lapped in compression (§25.5.5.2 [from memory]).
  if (d / inch > 1.45) throw new LibraryError('compression laps are for No. 11 bars and smaller (ACI 318-19 §25.5.5.2)');
  return d;
}

/** ℓdc = max(0.02 fy ψr/(λ√f'c), 0.0003 fy ψr)·db ≥ 8 in, √f'c ≤ 100 psi (ACI 318-19 §25.4.9.2, §25.4.9.1, §25.4.1.4) [from memory]. */
export function ldc(db: number, fy: number, fc: number, psi_r = 1, lambda = 1): number {
  const d = positive('db', db);
  const fyPsi = positive('fy', fy) / psi;
  const root = sqrtFcShearPsi(fc);
  const byConcrete = (0.02 * fyPsi * psi_r) / (lambda * root);
  const bySteel = 0.0003 * fyPsi * psi_r;
  const l = Math.max(Math.max(byConcrete, bySteel) * d, 8 * inch);
  const w = working();
  if (w) {
    const vars = { fy: [fy, 'psi'], psi_r, lambda, db: [d, 'in'] } as const;
    const clause = 'ACI 318-19 §25.4.9.2 [from memory]';
    w.step('k_c', '0.02 * fy * psi_r / (lambda * sqrt_fc)', byConcrete, '', { vars, code: true, clause });
    w.step('k_s', '0.0003 * fy * psi_r', bySteel, '', { vars, code: true, clause });
    w.step('l_dc', 'max(max(k_c, k_s) * db, 8)', l, 'in', { vars, code: true, clause: 'ACI 318-19 §25.4.9.1 [from memory]', governs: l === 8 * inch, note: l === 8 * inch ? 'the 8 in minimum governs' : undefined });
  }
  return l;
}

/**
 * ℓsc = max(0.0005 fy db, 12 in) for fy ≤ 60 ksi, max((0.0009 fy − 24) db, 12 in) above,
 * one third more where f'c < 3000 psi (ACI 318-19 §25.5.5.1) [from memory].
 */
export function lsc(db: number, fy: number, fc: number): number {
  const d = barSize(db);
  const fyPsi = positive('fy', fy) / psi;
  if (fyPsi > 100000 * (1 + 1e-9)) throw new LibraryError('fy above 100 ksi is outside §25.5.5.1');
  const low = fyPsi <= 60000 * (1 + 1e-9);
  const perDb = low ? 0.0005 * fyPsi : 0.0009 * fyPsi - 24;
  const base = Math.max(perDb * d, 12 * inch);
  const weak = positive('fc', fc) / psi < 3000;
  const w = working();
  if (w) {
    const vars = { fy: [fy, 'psi'], db: [d, 'in'] } as const;
    const clause = 'ACI 318-19 §25.5.5.1 [from memory]';
    w.step('k_sc', low ? '0.0005 * fy' : '0.0009 * fy - 24', perDb, '', { vars, code: true, clause, note: low ? 'fy ≤ 60,000 psi' : 'fy above 60,000 psi' });
    w.step('l_sc', 'max(k_sc * db, 12)', base, 'in', { vars, code: true, clause, governs: base === 12 * inch });
    if (weak) w.step('l_sc', '4 / 3 * l_sc', (base * 4) / 3, 'in', { code: true, clause, note: "f′c below 3000 psi: one third more" });
  }
  return weak ? (base * 4) / 3 : base;
}

/** The lap of bars of two sizes: the larger of ℓdc of the larger bar and ℓsc of the smaller (ACI 318-19 §25.5.5.4) [from memory]. */
export function lapDowelColumn(dbDowel: number, dbColumn: number, fy: number, fcColumn: number, psi_r = 1, lambda = 1): number {
  const small = Math.min(barSize(dbDowel), barSize(dbColumn));
  const large = Math.max(dbDowel, dbColumn);
  const w = working();
  if (w) w.method('ℓdc of the larger bar and ℓsc of the smaller, the larger governs', 'ACI 318-19 §25.5.5.4 [from memory]');
  const dc = ldc(large, fy, fcColumn, psi_r, lambda);
  const sc = lsc(small, fy, fcColumn);
  w?.step('l_lap', 'max(l_dc, l_sc)', Math.max(dc, sc), 'in', { governs: true, note: dc >= sc ? 'ℓdc of the larger bar governs' : 'ℓsc of the smaller bar governs' });
  return Math.max(dc, sc);
}

/** Straight length for the dowels in the footing: h − cover − 2 db(mat) − db(dowel) (common practice). */
export function ldcAvailFooting(h: number, cover: number, dbMat: number, dbDowel: number): number {
  const avail = positive('h', h) - positive('cover', cover) - 2 * positive('db_mat', dbMat) - positive('db_dowel', dbDowel);
  if (avail <= 0) throw new LibraryError('no depth is left for the dowels: h − cover − 2·db(mat) − db(dowel) ≤ 0');
  working()?.step('l_avail', 'h - cover - 2 * db_mat - db_dowel', avail, 'in', {
    vars: { h: [h, 'in'], cover: [cover, 'in'], db_mat: [dbMat, 'in'], db_dowel: [dbDowel, 'in'] }, clause: 'common practice',
  });
  return avail;
}

const DB: LibParam = { name: 'db', type: 'm', doc: 'bar diameter' };
const FY: LibParam = { name: 'fy', type: 'Pa', doc: 'bar yield strength' };
const FC: LibParam = { name: 'fc', type: 'Pa', doc: 'strength of the concrete the bar is developed in' };
const PSI_R: LibParam = { name: 'psi_r', type: '1', doc: 'confining reinforcement factor ψr: 1.0, or 0.75 with qualifying ties (default 1.0)' };
const LAMBDA: LibParam = { name: 'lambda', type: '1', doc: 'lightweight concrete factor (default 1.0)' };
const pr = (v: unknown) => optional(v, 1, (x) => psiR(finite('psi_r', x)));
const lam = (v: unknown) => optional(v, 1, lambdaFactor);

export const functions: LibFunction[] = [
  defineFunction({
    name: 'ldc',
    params: [DB, FY, FC, PSI_R, LAMBDA],
    optional: 2,
    returns: 'm',
    clause: "ACI 318-19 §25.4.9.2: ℓdc = max(0.02fyψr/(λ√f'c), 0.0003fyψr)·db ≥ 8 in (§25.4.9.1) [from memory]",
    doc: 'Development length of a deformed bar in compression',
    fn: (db: number, fy: number, fc: number, r?: number, l?: number) => ldc(db, fy, fc, pr(r), lam(l)),
  }),
  defineFunction({
    name: 'lsc',
    params: [DB, FY, FC],
    returns: 'm',
    clause: "ACI 318-19 §25.5.5.1: ℓsc = 0.0005fy·db (fy ≤ 60 ksi) or (0.0009fy − 24)db, ≥ 12 in, +1/3 where f'c < 3000 psi [from memory]",
    doc: 'Compression lap splice length of a deformed bar',
    fn: (db: number, fy: number, fc: number) => lsc(db, fy, fc),
  }),
  defineFunction({
    name: 'lap_dowel_col',
    params: [{ name: 'db_dowel', type: 'm', doc: 'dowel diameter' }, { name: 'db_col', type: 'm', doc: 'column bar diameter' },
      FY, { name: 'fc_col', type: 'Pa', doc: 'column concrete strength' }, PSI_R, LAMBDA],
    optional: 2,
    returns: 'm',
    clause: 'ACI 318-19 §25.5.5.4: the greater of ℓdc of the larger bar and ℓsc of the smaller [from memory]',
    doc: 'Length the dowels lap the column bars above the footing',
    fn: (a: number, b: number, fy: number, fc: number, r?: number, l?: number) => lapDowelColumn(a, b, fy, fc, pr(r), lam(l)),
  }),
  defineFunction({
    name: 'ldc_avail_footing',
    params: [{ name: 'h', type: 'm', doc: 'footing thickness' }, { name: 'cover', type: 'm', doc: 'cover to the bottom bars' },
      { name: 'db_mat', type: 'm', doc: 'bottom bar diameter (two layers)' }, { name: 'db_dowel', type: 'm', doc: 'dowel diameter' }],
    returns: 'm',
    clause: 'Straight length h − cover − 2db(mat) − db(dowel), hooks on the mat not counted (ACI 318-19 §25.4.1.2; common practice)',
    doc: 'Depth available to develop the dowels in compression in the footing',
    fn: ldcAvailFooting,
  }),
];
