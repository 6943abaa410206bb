// Minimum slab thickness for deflection control when deflections are not calculated.
// One-way: ACI 318-19 Table 7.3.1.1 with its fy and lightweight modifiers (§7.3.1.1.1-2).
// Two-way without interior beams: Table 8.3.1.1 with linear interpolation in fy and the
// absolute minimums of §8.3.1.1 (5 in without, 4 in with drop panels); its fy rows follow
// the edition (318-19: 40/60/80 ksi, 318-14: 40/60/75 ksi).

import { defineFunction, LibraryError, type LibFunction } from './types';
import { bool, choice, edition, positive, show, EDITIONS, type Edition } from './gravity-args';
import { inch, pcf, psi } from '../units/si';

export const ONE_WAY_SUPPORTS = ['simple', 'one-end', 'both-ends', 'cantilever'] as const;
export type OneWaySupport = (typeof ONE_WAY_SUPPORTS)[number];
const ONE_WAY_DIVISOR: Record<OneWaySupport, number> = { simple: 20, 'one-end': 24, 'both-ends': 28, cantilever: 10 };

/** ACI 318-19 §7.3.1.1.1: fy modifier 0.4 + fy/100,000 (psi). */
export function fyFactor(fy: number): number {
  return 0.4 + positive('fy', fy) / psi / 100000;
}

/** ACI 318-19 §7.3.1.1.2: lightweight modifier (1.65 − 0.005wc) ≥ 1.09 for wc 90-115 pcf; 1.0 above 115 pcf. */
export function lightweightFactor(wc: number): number {
  const w = positive('wc', wc) / pcf;
  if (w < 90 - 1e-9) throw new LibraryError(`h_min_one_way: wc = ${show(w)} pcf is below the 90 pcf the table covers`);
  if (w > 115 * (1 + 1e-9)) return 1;
  return Math.max(1.65 - 0.005 * w, 1.09);
}

/** ACI 318-19 Table 7.3.1.1: one-way slab h ≥ ℓ/20, ℓ/24, ℓ/28, ℓ/10, times the fy and lightweight modifiers. */
export function hMinOneWay(l: number, support: OneWaySupport, fy = 60000 * psi, wc?: number): number {
  const span = positive('l', l);
  const sup = choice('support', support, ONE_WAY_SUPPORTS);
  const lw = wc === undefined ? 1 : lightweightFactor(wc);
  return (span / ONE_WAY_DIVISOR[sup]) * fyFactor(fy) * lw;
}

export const PANELS = ['exterior', 'exterior-edge-beam', 'interior'] as const;
export type Panel = (typeof PANELS)[number];

/**
 * Table 8.3.1.1 rows by edition: fy (ksi) and the divisors of ℓn, without / with drop panels.
 * ACI 318-14: 40, 60, 75 ksi. ACI 318-19: 40, 60, 80 ksi (the 80 ksi row replaces 75; from memory).
 */
const TWO_WAY_ROWS: Record<Edition, { fyKsi: number[]; none: Record<Panel, number[]>; drop: Record<Panel, number[]> }> = {
  '318-14': {
    fyKsi: [40, 60, 75],
    none: { exterior: [33, 30, 28], 'exterior-edge-beam': [36, 33, 31], interior: [36, 33, 31] },
    drop: { exterior: [36, 33, 31], 'exterior-edge-beam': [40, 36, 34], interior: [40, 36, 34] },
  },
  '318-19': {
    fyKsi: [40, 60, 80],
    none: { exterior: [33, 30, 27], 'exterior-edge-beam': [36, 33, 30], interior: [36, 33, 30] },
    drop: { exterior: [36, 33, 30], 'exterior-edge-beam': [40, 36, 33], interior: [40, 36, 33] },
  },
};

/**
 * ACI 318-19 / 318-14 Table 8.3.1.1: two-way slab without interior beams, h ≥ ℓn/divisor with ℓn the
 * longer clear span, h interpolated linearly in fy between the rows of the edition; ≥ 5 in (4 in with drop panels).
 */
export function hMinTwoWay(ln: number, panel: Panel, dropPanels = false, fy = 60000 * psi, ed: Edition = '318-19'): number {
  const span = positive('ln', ln);
  const p = choice('panel', panel, PANELS);
  const drop = bool('drop_panels', dropPanels, false);
  const rows = TWO_WAY_ROWS[edition(ed)];
  const fyKsi = positive('fy', fy) / psi / 1000;
  const [lo, , hi] = rows.fyKsi;
  if (fyKsi < lo - 1e-9 || fyKsi > hi + 1e-9) {
    throw new LibraryError(`fy = ${show(fyKsi)} ksi is outside the ${lo}-${hi} ksi range of ACI ${edition(ed)} Table 8.3.1.1`);
  }
  const divisors = rows[drop ? 'drop' : 'none'][p];
  const row = fyKsi <= rows.fyKsi[1] ? 0 : 1;
  const t = (fyKsi - rows.fyKsi[row]) / (rows.fyKsi[row + 1] - rows.fyKsi[row]);
  const hLow = span / divisors[row];
  const hHigh = span / divisors[row + 1];
  const hTable = hLow + t * (hHigh - hLow);
  const hAbsolute = (drop ? 4 : 5) * inch;
  return Math.max(hTable, hAbsolute);
}

const L = { name: 'l', type: 'm', doc: 'span length' };
const FY = { name: 'fy', type: 'Pa', doc: 'yield strength of the reinforcement (default 60 ksi)' };

export const functions: LibFunction[] = [
  defineFunction({
    name: 'h_min_one_way',
    params: [L, { name: 'support', type: 'text', choices: ONE_WAY_SUPPORTS, doc: 'simple, one-end, both-ends (continuous) or cantilever' },
      FY, { name: 'wc', type: 'N/m^3', doc: 'unit weight of lightweight concrete (omit for normal weight)' }],
    optional: 2, returns: 'm', clause: 'ACI 318-19 Table 7.3.1.1, §7.3.1.1.1-2',
    doc: 'Minimum thickness of a one-way slab',
    fn: (l: number, s: OneWaySupport, fy?: number, wc?: number) => hMinOneWay(l, s, fy, wc),
  }),
  defineFunction({
    name: 'h_min_two_way',
    params: [{ name: 'ln', type: 'm', doc: 'clear span in the long direction' },
      { name: 'panel', type: 'text', choices: PANELS, doc: 'exterior, exterior-edge-beam (αf ≥ 0.8) or interior' },
      { name: 'drop_panels', type: 'bool', doc: 'drop panels present (§8.2.4)' }, FY,
      { name: 'edition', type: 'text', choices: EDITIONS, doc: "'318-19' (default; rows 40/60/80 ksi) or '318-14' (rows 40/60/75 ksi)" }],
    optional: 3, returns: 'm', clause: 'ACI 318-19 Table 8.3.1.1, fy rows 40/60/80 ksi [80 ksi row from memory]; ACI 318-14 rows 40/60/75 ksi; linear in fy between rows',
    doc: 'Minimum thickness of a two-way slab without interior beams (ℓn = longer clear span)',
    fn: (ln: number, p: Panel, drop?: boolean, fy?: number, ed?: Edition) => hMinTwoWay(ln, p, drop, fy, edition(ed)),
  }),
];
