// Limits on flexural reinforcement: minimum area (slabs and footings, beams), the most
// steel a section can take and stay tension-controlled, and maximum bar spacing.
// Clauses in psi and inches are evaluated in those units after exact conversion.

import { defineFunction, LibraryError, type LibFunction } from './types';
import { choice, edition, nonNegative, positive, show, type Edition, EDITIONS } from './gravity-args';
import { beta1 } from './concrete';
import { epsTc } from './resistance-factors';
import { inch, MPa, psi } from '../units/si';
import { ended, quietly, working } from '../working/recorder';

/** ACI 318-19 Tables 7.6.1.1 / 8.6.1.1, §24.4.3.2: ρmin = 0.0018 of Ag for deformed bars (318-14: 0.0020 below Grade 60, else 0.0018·60,000/fy ≥ 0.0014). */
export function rhoMinSlab(fy: number, ed: Edition = '318-19'): number {
  const f = positive('fy', fy) / psi;
  const w = working();
  const look = (rho: number, row: string, clause: string) => {
    w?.lookup('rho_min', rho, '', row, clause);
    return rho;
  };
  if (edition(ed) === '318-19') return look(0.0018, 'deformed bars, any fy', 'ACI 318-19 Tables 7.6.1.1, 8.6.1.1');
  if (f < 60000 * (1 - 1e-9)) return look(0.002, 'deformed bars, fy < 60,000 psi', 'ACI 318-14 Table 7.6.1.1');
  // Grade 420 (60.9 ksi) is Grade 60: 0.0018, as 318M-14 gives it (0.0018·420/fy).
  if (fy <= 420 * MPa * (1 + 1e-9)) return look(0.0018, 'deformed bars, Grade 60 (420)', 'ACI 318-14 Table 7.6.1.1');
  const rho = Math.max((0.0018 * 60000) / f, 0.0014);
  w?.step('rho_min', 'max(0.0018 * 60000 / fy, 0.0014)', rho, '', {
    vars: { fy: [fy, 'psi'] }, code: true, clause: 'ACI 318-14 Table 7.6.1.1', note: 'deformed bars, fy > 60,000 psi',
  });
  return rho;
}

/** ACI 318-19 §7.6.1.1 / §8.6.1.1 / §24.4.3.2: As,min = ρmin·b·h of a slab or footing strip. */
export function asMinSlab(b: number, h: number, fy: number, ed: Edition = '318-19'): number {
  const bb = positive('b', b);
  const hh = positive('h', h);
  const w = working()?.open('as_min_slab', { b: [bb, 'in'], h: [hh, 'in'], fy: [fy, 'psi'], edition: ed }, 'ACI 318-19 Tables 7.6.1.1, 8.6.1.1');
  const As = rhoMinSlab(fy, ed) * bb * hh;
  w?.step('As_min', 'rho_min * b * h', As, 'in^2', { vars: { b: [bb, 'in'], h: [hh, 'in'] }, clause: 'ACI 318-19 §7.6.1.1, §8.6.1.1, §24.4.3.2' });
  return ended(w, As, 'in^2');
}

/** ACI 318-19 §9.6.1.2: As,min = max(3√f'c/fy, 200/fy)·bw·d for beams (psi). */
export function asMinBeam(bw: number, d: number, fc: number, fy: number): number {
  const b = positive('bw', bw);
  const dd = positive('d', d);
  const f = positive('fc', fc) / psi;
  const y = positive('fy', fy) / psi;
  const As = Math.max((3 * Math.sqrt(f)) / y, 200 / y) * b * dd;
  working()?.step('As_min', 'max(3 * sqrt(fc) / fy, 200 / fy) * bw * d', As, 'in^2', {
    vars: { fc: [fc, 'psi'], fy: [fy, 'psi'], bw: [b, 'in'], d: [dd, 'in'] }, code: true, clause: 'ACI 318-19 §9.6.1.2',
  });
  return As;
}

/** ACI 318-19 §22.2.2 + Table 21.2.2: largest As with εt at the tension-controlled limit (c = 0.003d/(0.003 + εt)). */
export function asMaxTc(b: number, d: number, fc: number, fy: number, ed: Edition = '318-19'): number {
  const bb = positive('b', b);
  const dd = positive('d', d);
  const f = positive('fc', fc);
  const y = fyDesign(fy, 'flexure', edition(ed));
  const w = working();
  const c = (0.003 / (0.003 + epsTc(y, edition(ed)))) * dd;
  w?.step('c', '0.003 / (0.003 + eps_tc) * d', c, 'in', { vars: { d: [dd, 'in'] }, clause: 'ACI 318-19 §22.2.2.1, Table 21.2.2' });
  const b1 = beta1(f);
  const As = (0.85 * f * b1 * c * bb) / y;
  w?.step('As_max', '0.85 * fc * beta1 * c * b / fy', As, 'in^2', {
    vars: { fc: [f, 'psi'], b: [bb, 'in'], fy: [y, 'psi'] }, clause: 'ACI 318-19 §22.2.2',
  });
  return As;
}

export const SPACING_KINDS = ['two-way', 'one-way', 'shrinkage'] as const;
export type SpacingKind = (typeof SPACING_KINDS)[number];
const SPACING_FACTOR: Record<SpacingKind, number> = { 'two-way': 2, 'one-way': 3, shrinkage: 5 };

/** ACI 318-19 §8.7.2.2 two-way min(2h, 18 in); §7.7.2.3 one-way min(3h, 18 in); §24.4.3.3 shrinkage min(5h, 18 in). */
export function sMaxSlab(h: number, kind: SpacingKind): number {
  const hh = positive('h', h);
  const k = choice('kind', kind, SPACING_KINDS);
  const s = Math.min(SPACING_FACTOR[k] * hh, 18 * inch);
  working()?.step('s_max', `min(${SPACING_FACTOR[k]} * h, 18)`, s, 'in', {
    vars: { h: [hh, 'in'] }, code: true, clause: SPACING_CLAUSE[k], governs: s === 18 * inch,
    note: `${k} slab bars${s === 18 * inch ? ': the 18 in limit governs' : ''}`,
  });
  return s;
}

const SPACING_CLAUSE: Record<SpacingKind, string> = { 'two-way': 'ACI 318-19 §8.7.2.2', 'one-way': 'ACI 318-19 §7.7.2.3', shrinkage: 'ACI 318-19 §24.4.3.3' };

/** ACI 318-19 Table 24.3.2, from memory: s ≤ 15(40,000/fs) − 2.5cc and ≤ 12(40,000/fs), in and psi; fs ≈ 2/3 fy. */
export function sMaxCrack(fs: number, cc: number): number {
  const f = positive('fs', fs) / psi;
  const c = nonNegative('cc', cc) / inch;
  const s = Math.min(15 * (40000 / f) - 2.5 * c, 12 * (40000 / f));
  if (s <= 0) throw new LibraryError(`s_max_crack: clear cover ${show(c)} in leaves no admissible spacing`);
  working()?.step('s_max', 'min(15 * (40000 / fs) - 2.5 * cc, 12 * (40000 / fs))', s * inch, 'in', {
    vars: { fs: [fs, 'psi'], cc: [cc, 'in'] }, code: true, clause: 'ACI 318-19 Table 24.3.2 [from memory]',
  });
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
  const f = positive('fy', fy);
  const cap = fyCap(use, ed);
  // Shown only where the cap bites: otherwise fy is what was given.
  if (f > cap) working()?.step('fy', 'min(fy, fy_max)', cap, 'psi', FY_STEP(f, cap, use));
  return Math.min(f, cap);
}

const FY_STEP = (f: number, cap: number, use: FyUse) => ({
  vars: { fy: [f, 'psi'] as const, fy_max: [cap, 'psi'] as const }, governs: f > cap,
  clause: 'ACI 318-19 Table 20.2.2.4(a) [from memory]', note: f > cap ? `fy capped for ${use}` : `fy within the ${use} cap`,
});

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
    fn: (fy: number, use?: FyUse, ed?: Edition) => {
      const u = use === undefined ? 'flexure' : choice('use', use, FY_USES);
      const f = quietly(() => fyDesign(fy, u, ed));
      working()?.step('fy', 'min(fy, fy_max)', f, 'psi', FY_STEP(fy, fyCap(u, ed), u));
      return f;
    },
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
