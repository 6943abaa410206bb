// Limits on flexural reinforcement: minimum area (slabs and footings, beams), the most
// steel a section can take and stay tension-controlled, and maximum bar spacing.
// Clauses in psi and inches are evaluated in those units after exact conversion.

import { defineFunction, LibraryError, type LibFunction } from './types';
import { choice, edition, nonNegative, positive, show, type Edition, EDITIONS } from './gravity-args';
import { beta1 } from './concrete';
import { epsTc } from './resistance-factors';
import { inch, MPa, psi } from '../units/si';

/** ACI 318-19 Tables 7.6.1.1 / 8.6.1.1, §24.4.3.2: ρmin = 0.0018 of Ag for deformed bars (318-14: 0.0020 below Grade 60, else 0.0018·60,000/fy ≥ 0.0014). */
export function rhoMinSlab(fy: number, ed: Edition = '318-19'): number {
  const f = positive('fy', fy) / psi;
  if (edition(ed) === '318-19') return 0.0018;
  if (f < 60000 * (1 - 1e-9)) return 0.002;
  // Grade 420 (60.9 ksi) is Grade 60: 0.0018, as 318M-14 gives it (0.0018·420/fy).
  if (fy <= 420 * MPa * (1 + 1e-9)) return 0.0018;
  return Math.max((0.0018 * 60000) / f, 0.0014);
}

/** ACI 318-19 §7.6.1.1 / §8.6.1.1 / §24.4.3.2: As,min = ρmin·b·h of a slab or footing strip. */
export function asMinSlab(b: number, h: number, fy: number, ed: Edition = '318-19'): number {
  return rhoMinSlab(fy, ed) * positive('b', b) * positive('h', h);
}

/** ACI 318-19 §9.6.1.2: As,min = max(3√f'c/fy, 200/fy)·bw·d for beams (psi). */
export function asMinBeam(bw: number, d: number, fc: number, fy: number): number {
  const b = positive('bw', bw);
  const dd = positive('d', d);
  const f = positive('fc', fc) / psi;
  const y = positive('fy', fy) / psi;
  return Math.max((3 * Math.sqrt(f)) / y, 200 / y) * b * dd;
}

/** ACI 318-19 §22.2.2 + Table 21.2.2: largest As with εt at the tension-controlled limit (c = 0.003d/(0.003 + εt)). */
export function asMaxTc(b: number, d: number, fc: number, fy: number, ed: Edition = '318-19'): number {
  const bb = positive('b', b);
  const dd = positive('d', d);
  const f = positive('fc', fc);
  const y = fyDesign(fy, 'flexure', edition(ed));
  const c = (0.003 / (0.003 + epsTc(y, edition(ed)))) * dd;
  return (0.85 * f * beta1(f) * c * bb) / y;
}

export const SPACING_KINDS = ['two-way', 'one-way', 'shrinkage'] as const;
export type SpacingKind = (typeof SPACING_KINDS)[number];
const SPACING_FACTOR: Record<SpacingKind, number> = { 'two-way': 2, 'one-way': 3, shrinkage: 5 };

/** ACI 318-19 §8.7.2.2 two-way min(2h, 18 in); §7.7.2.3 one-way min(3h, 18 in); §24.4.3.3 shrinkage min(5h, 18 in). */
export function sMaxSlab(h: number, kind: SpacingKind): number {
  const hh = positive('h', h);
  const k = choice('kind', kind, SPACING_KINDS);
  return Math.min(SPACING_FACTOR[k] * hh, 18 * inch);
}

/** ACI 318-19 Table 24.3.2, from memory: s ≤ 15(40,000/fs) − 2.5cc and ≤ 12(40,000/fs), in and psi; fs ≈ 2/3 fy. */
export function sMaxCrack(fs: number, cc: number): number {
  const f = positive('fs', fs) / psi;
  const c = nonNegative('cc', cc) / inch;
  const s = Math.min(15 * (40000 / f) - 2.5 * c, 12 * (40000 / f));
  if (s <= 0) throw new LibraryError(`s_max_crack: clear cover ${show(c)} in leaves no admissible spacing`);
  return s * inch;
}

export const FY_USES = ['flexure', 'shear'] as const;
export type FyUse = (typeof FY_USES)[number];

/**
 * Largest fy a design calculation may use, nonprestressed deformed bars outside special seismic
 * systems (ACI 318-19 Table 20.2.2.4(a), from memory): flexure, axial force, shrinkage and temperature
 * 100 ksi in 318-19, 80 ksi in 318-14; shear and torsion reinforcement 60 ksi. (Column Po takes
 * fy ≤ 80 ksi by §22.4.2.1, in column-axial.ts.)
 */
export function fyCap(use: FyUse, ed: Edition = '318-19'): number {
  if (use === 'shear') return 60000 * psi;
  return (edition(ed) === '318-19' ? 100000 : 80000) * psi;
}

/** fy taken in the calculation: the specified fy, not above the cap of Table 20.2.2.4(a). */
export function fyDesign(fy: number, use: FyUse = 'flexure', ed: Edition = '318-19'): number {
  return Math.min(positive('fy', fy), fyCap(use, ed));
}

const FC = { name: 'fc', type: 'Pa', doc: "specified compressive strength f'c" };
const FY = { name: 'fy', type: 'Pa', doc: 'specified yield strength of the reinforcement' };
const ED = { name: 'edition', type: 'text', choices: EDITIONS, doc: "ACI 318 edition, '318-19' (default) or '318-14'" };

export const functions: LibFunction[] = [
  defineFunction({
    name: 'fy_design',
    params: [FY, { name: 'use', type: 'text', choices: FY_USES, doc: "'flexure' (default; also axial force, shrinkage) or 'shear'" }, ED],
    optional: 2, returns: 'Pa',
    clause: 'ACI 318-19 Table 20.2.2.4(a): fy ≤ 100 ksi for flexure (318-14: 80 ksi), ≤ 60 ksi for shear reinforcement [from memory]',
    doc: 'Yield strength used in design: the specified fy, capped where the code caps it',
    fn: (fy: number, use?: FyUse, ed?: Edition) => fyDesign(fy, use === undefined ? 'flexure' : choice('use', use, FY_USES), ed),
  }),
  defineFunction({
    name: 'rho_min_slab', params: [FY, ED], optional: 1, returns: '1',
    clause: 'ACI 318-19 Tables 7.6.1.1, 8.6.1.1; §24.4.3.2',
    doc: 'Minimum ratio of flexural / shrinkage steel to gross area, slabs and footings',
    fn: (fy: number, ed?: Edition) => rhoMinSlab(fy, ed),
  }),
  defineFunction({
    name: 'as_min_slab',
    params: [{ name: 'b', type: 'm', doc: 'strip width' }, { name: 'h', type: 'm', doc: 'slab thickness' }, FY, ED],
    optional: 1, returns: 'm^2', clause: 'ACI 318-19 Tables 7.6.1.1, 8.6.1.1; §24.4.3.2',
    doc: 'Minimum flexural steel of a slab or footing strip, ρmin·b·h',
    fn: (b: number, h: number, fy: number, ed?: Edition) => asMinSlab(b, h, fy, ed),
  }),
  defineFunction({
    name: 'as_min_beam',
    params: [{ name: 'bw', type: 'm', doc: 'web width' }, { name: 'd', type: 'm', doc: 'effective depth' }, FC, FY],
    returns: 'm^2', clause: 'ACI 318-19 §9.6.1.2',
    doc: "Minimum flexural steel of a beam, max(3√f'c, 200)/fy·bw·d",
    fn: (bw: number, d: number, fc: number, fy: number) => asMinBeam(bw, d, fc, fy),
  }),
  defineFunction({
    name: 'as_max_tc',
    params: [{ name: 'b', type: 'm', doc: 'width' }, { name: 'd', type: 'm', doc: 'effective depth' }, FC, FY, ED],
    optional: 1, returns: 'm^2', clause: 'ACI 318-19 §22.2.2, Table 21.2.2',
    doc: 'Largest tension steel that keeps the section tension-controlled',
    fn: (b: number, d: number, fc: number, fy: number, ed?: Edition) => asMaxTc(b, d, fc, fy, ed),
  }),
  defineFunction({
    name: 's_max_slab',
    params: [
      { name: 'h', type: 'm', doc: 'slab thickness' },
      { name: 'kind', type: 'text', choices: SPACING_KINDS, doc: 'two-way, one-way or shrinkage' },
    ],
    returns: 'm', clause: 'ACI 318-19 §8.7.2.2 / §7.7.2.3 / §24.4.3.3',
    doc: 'Maximum spacing of slab bars: min(2h | 3h | 5h, 18 in)',
    fn: (h: number, k: SpacingKind) => sMaxSlab(h, k),
  }),
  defineFunction({
    name: 's_max_crack',
    params: [
      { name: 'fs', type: 'Pa', doc: 'service stress in the bars (2/3 fy permitted)' },
      { name: 'cc', type: 'm', doc: 'clear cover to the bars' },
    ],
    returns: 'm', clause: 'ACI 318-19 Table 24.3.2: s ≤ 15(40,000/fs) − 2.5cc and ≤ 12(40,000/fs), fs = (2/3)fy permitted (§24.3.2.1) [from memory]; for one-way slabs and beams (§24.3.1), footings through §13.3.3.1 → Ch. 7 [from memory]',
    doc: 'Maximum spacing of the flexural bars nearest the tension face for crack control',
    fn: (fs: number, cc: number) => sMaxCrack(fs, cc),
  }),
];
