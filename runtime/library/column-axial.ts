// Axial strength of a short column, ACI 318-19 §22.4 and the reinforcement limits of §10.6.1.1.
// Dimensionally consistent, so computed in SI directly; only the fy cap is a psi number.

import { LibraryError, defineFunction, type LibFunction, type LibParam } from './types';
import { choice, nonNegative, positive } from './support-args';
import { ksi } from '../units/si';
import { ended, working } from '../working/recorder';

export const TRANSVERSE = ['tied', 'spiral'] as const;
export type Transverse = (typeof TRANSVERSE)[number];

/** Po = 0.85 f'c (Ag − Ast) + fy Ast, fy ≤ 80 ksi (ACI 318-19 Eq. 22.4.2.2, §22.4.2.1). */
export function poColumn(fc: number, ag: number, ast: number, fy: number): number {
  positive("f'c", fc);
  positive('Ag', ag);
  nonNegative('Ast', ast);
  positive('fy', fy);
  if (ast >= ag) throw new LibraryError('Ast must be less than Ag');
  const fyUsed = Math.min(fy, 80 * ksi);
  const po = 0.85 * fc * (ag - ast) + fyUsed * ast;
  const w = working()?.open('po_column', { fc: [fc, 'psi'], Ag: [ag, 'in^2'], Ast: [ast, 'in^2'], fy: [fy, 'psi'] }, 'ACI 318-19 Eq. 22.4.2.2');
  if (w && fyUsed < fy) w.step('fy', 'min(fy, 80000)', fyUsed, 'psi', { vars: { fy: [fy, 'psi'] }, code: true, governs: true, clause: 'ACI 318-19 §22.4.2.1', note: 'fy taken not above 80 ksi' });
  w?.step('Po', '0.85 * fc * (Ag - Ast) + fy * Ast', po, 'kip', { vars: { fc: [fc, 'psi'], Ag: [ag, 'in^2'], Ast: [ast, 'in^2'] }, clause: 'ACI 318-19 Eq. 22.4.2.2' });
  return ended(w, po, 'kip');
}

/** Pn,max = 0.80 Po tied, 0.85 Po spiral (ACI 318-19 Table 22.4.2.1). */
export function pnMax(fc: number, ag: number, ast: number, fy: number, t: Transverse): number {
  const w = working()?.open('pn_max', { fc: [fc, 'psi'], Ag: [ag, 'in^2'], Ast: [ast, 'in^2'], fy: [fy, 'psi'], transverse: t }, 'ACI 318-19 Table 22.4.2.1');
  const k = t === 'tied' ? 0.8 : 0.85;
  const pn = k * poColumn(fc, ag, ast, fy);
  w?.step('Pn_max', `${k} * Po`, pn, 'kip', { clause: 'ACI 318-19 Table 22.4.2.1', note: `${t} column` });
  return ended(w, pn, 'kip');
}

/** φ Pn,max with φ = 0.65 tied, 0.75 spiral (compression-controlled, ACI 318-19 Table 21.2.2). */
export function phiPnMax(fc: number, ag: number, ast: number, fy: number, t: Transverse): number {
  const w = working()?.open('phi_pn_max', { fc: [fc, 'psi'], Ag: [ag, 'in^2'], Ast: [ast, 'in^2'], fy: [fy, 'psi'], transverse: t }, 'ACI 318-19 Table 22.4.2.1, Table 21.2.2');
  const phi = t === 'tied' ? 0.65 : 0.75;
  const v = phi * pnMax(fc, ag, ast, fy, t);
  w?.step('phi_Pn_max', `${phi} * Pn_max`, v, 'kip', { clause: 'ACI 318-19 Table 21.2.2', note: `φ = ${phi}, compression-controlled, ${t}` });
  return ended(w, v, 'kip');
}

/** ρg = Ast / Ag (ACI 318-19 §10.6.1.1). */
export function rhoG(ast: number, ag: number): number {
  const r = nonNegative('Ast', ast) / positive('Ag', ag);
  working()?.step('rho_g', 'Ast / Ag', r, '', { vars: { Ast: [ast, 'in^2'], Ag: [ag, 'in^2'] }, clause: 'ACI 318-19 §10.6.1.1' });
  return r;
}

/** 0.01 ≤ ρg ≤ 0.08 (ACI 318-19 §10.6.1.1). */
export function rhoGOk(ast: number, ag: number): boolean {
  const r = rhoG(ast, ag);
  const ok = r >= 0.01 && r <= 0.08;
  working()?.step('ok', 'rho_g >= 0.01 and rho_g <= 0.08', ok, '', { clause: 'ACI 318-19 §10.6.1.1' });
  return ok;
}

const sectionParams: LibParam[] = [
  { name: 'fc', type: 'Pa', doc: 'concrete strength' },
  { name: 'Ag', type: 'm^2', doc: 'gross area of the column' },
  { name: 'Ast', type: 'm^2', doc: 'total area of longitudinal steel' },
  { name: 'fy', type: 'Pa', doc: 'yield strength of the longitudinal steel (capped at 80 ksi)' },
];
const tParam: LibParam = { name: 'transverse', type: 'text', choices: TRANSVERSE, doc: "'tied' or 'spiral'" };
const tr = (v: unknown) => choice('transverse reinforcement', v, TRANSVERSE);

export const functions: LibFunction[] = [
  defineFunction({
    name: 'po_column',
    params: sectionParams,
    returns: 'N',
    clause: "ACI 318-19 Eq. 22.4.2.2: Po = 0.85f'c(Ag − Ast) + fy·Ast, fy ≤ 80 ksi (§22.4.2.1)",
    doc: 'Nominal axial strength at zero eccentricity',
    fn: poColumn,
  }),
  defineFunction({
    name: 'pn_max',
    params: [...sectionParams, tParam],
    returns: 'N',
    clause: 'ACI 318-19 Table 22.4.2.1: Pn,max = 0.80Po (ties), 0.85Po (spirals)',
    doc: 'Maximum nominal axial strength of a column',
    fn: (fc: number, ag: number, ast: number, fy: number, t: string) => pnMax(fc, ag, ast, fy, tr(t)),
  }),
  defineFunction({
    name: 'phi_pn_max',
    params: [...sectionParams, tParam],
    returns: 'N',
    clause: 'ACI 318-19 Table 22.4.2.1 with φ = 0.65 tied / 0.75 spiral (Table 21.2.2, compression-controlled)',
    doc: 'Design axial strength φPn,max of a column',
    fn: (fc: number, ag: number, ast: number, fy: number, t: string) => phiPnMax(fc, ag, ast, fy, tr(t)),
  }),
  defineFunction({
    name: 'rho_g',
    params: [sectionParams[2], sectionParams[1]],
    returns: '1',
    clause: 'ACI 318-19 §10.6.1.1: ρg = Ast/Ag',
    doc: 'Longitudinal reinforcement ratio of a column',
    fn: rhoG,
  }),
  defineFunction({
    name: 'rho_g_ok',
    params: [sectionParams[2], sectionParams[1]],
    returns: 'bool',
    clause: 'ACI 318-19 §10.6.1.1: 0.01Ag ≤ Ast ≤ 0.08Ag',
    doc: 'Whether the column steel ratio lies within the code limits',
    fn: rhoGOk,
  }),
];
