// Axial strength of a short column, ACI 318-19 §22.4 and the reinforcement limits of §10.6.1.1.
// Dimensionally consistent, so computed in SI directly; only the fy cap is a psi number.

import { LibraryError, defineFunction, type LibFunction, type LibParam } from './types';
import { choice, nonNegative, positive } from './support-args';
import { ksi } from '../units/si';

export const TRANSVERSE = ['tied', 'spiral'] as const;
export type Transverse = (typeof TRANSVERSE)[number];

/** Po = 0.85 f'c (Ag − Ast) + fy Ast, fy ≤ 80 ksi (ACI 318-19 Eq. 22.4.2.2, §22.4.2.1). */
export function poColumn(fc: number, ag: number, ast: number, fy: number): number {
  positive("f'c", fc);
  positive('Ag', ag);
  nonNegative('Ast', ast);
  positive('fy', fy);
  if (ast >= ag) throw new LibraryError('Ast must be less than Ag');
  return 0.85 * fc * (ag - ast) + Math.min(fy, 80 * ksi) * ast;
}

/** Pn,max = 0.80 Po tied, 0.85 Po spiral (ACI 318-19 Table 22.4.2.1). */
export function pnMax(fc: number, ag: number, ast: number, fy: number, t: Transverse): number {
  return (t === 'tied' ? 0.8 : 0.85) * poColumn(fc, ag, ast, fy);
}

/** φ Pn,max with φ = 0.65 tied, 0.75 spiral (compression-controlled, ACI 318-19 Table 21.2.2). */
export function phiPnMax(fc: number, ag: number, ast: number, fy: number, t: Transverse): number {
  return (t === 'tied' ? 0.65 : 0.75) * pnMax(fc, ag, ast, fy, t);
}

/** ρg = Ast / Ag (ACI 318-19 §10.6.1.1). */
export function rhoG(ast: number, ag: number): number {
  return nonNegative('Ast', ast) / positive('Ag', ag);
}

/** 0.01 ≤ ρg ≤ 0.08 (ACI 318-19 §10.6.1.1). */
export function rhoGOk(ast: number, ag: number): boolean {
  const r = rhoG(ast, ag);
  return r >= 0.01 && r <= 0.08;
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
