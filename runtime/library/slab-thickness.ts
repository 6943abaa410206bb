// Minimum slab thickness for deflection control when deflections are not calculated.
// One-way: ACI 318-19 Table 7.3.1.1 with its fy and lightweight modifiers (§7.3.1.1.1-2).
// Two-way without interior beams: Table 8.3.1.1 with linear interpolation in fy and the
// absolute minimums of §8.3.1.1 (5 in without, 4 in with drop panels); its fy rows follow
// the edition (318-19: 40/60/80 ksi, 318-14: 40/60/75 ksi).

import { defineFunction, LibraryError, type LibFunction } from './types';
import { bool, choice, edition, positive, show, EDITIONS, type Edition } from './gravity-args';
import { inch, pcf, psi } from '../units/si';
import { working } from '../working/recorder';

export const ONE_WAY_SUPPORTS = ['simple', 'one-end', 'both-ends', 'cantilever'] as const;
export type OneWaySupport = (typeof ONE_WAY_SUPPORTS)[number];
const ONE_WAY_DIVISOR: Record<OneWaySupport, number> = { simple: 20, 'one-end': 24, 'both-ends': 28, cantilever: 10 };

/** ACI 318-19 §7.3.1.1.1: fy modifier 0.4 + fy/100,000 (psi). */
export function fyFactor(fy: number): number {
  const k = 0.4 + positive('fy', fy) / psi / 100000;
  working()?.step('k_fy', '0.4 + fy / 100000', k, '', { vars: { fy: [fy, 'psi'] }, code: true, clause: 'ACI 318-19 §7.3.1.1.1' });
  return k;
}

/** ACI 318-19 §7.3.1.1.2: lightweight modifier (1.65 − 0.005wc) ≥ 1.09 for wc 90-115 pcf; 1.0 above 115 pcf. */
export function lightweightFactor(wc: number): number {
  const w = positive('wc', wc) / pcf;
  if (w < 90 - 1e-9) throw new LibraryError(`h_min_one_way: wc = ${show(w)} pcf is below the 90 pcf the table covers`);
  const rec = working();
  const clause = 'ACI 318-19 §7.3.1.1.2';
  if (w > 115 * (1 + 1e-9)) {
    rec?.lookup('k_w', 1, '', 'wc > 115 pcf', clause);
    return 1;
  }
  const k = Math.max(1.65 - 0.005 * w, 1.09);
  rec?.step('k_w', 'max(1.65 - 0.005 * wc, 1.09)', k, '', { vars: { wc: [wc, 'pcf'] }, code: true, clause });
  return k;
}

/** ACI 318-19 Table 7.3.1.1: one-way slab h ≥ ℓ/20, ℓ/24, ℓ/28, ℓ/10, times the fy and lightweight modifiers. */
export function hMinOneWay(l: number, support: OneWaySupport, fy = 60000 * psi, wc?: number): number {
  const span = positive('l', l);
  const sup = choice('support', support, ONE_WAY_SUPPORTS);
  const lw = wc === undefined ? 1 : lightweightFactor(wc);
  const k = fyFactor(fy);
  const h = (span / ONE_WAY_DIVISOR[sup]) * k * lw;
  working()?.step('h_min', `l / ${ONE_WAY_DIVISOR[sup]} * k_fy * k_w`, h, 'in', {
    vars: { l: [span, 'ft'], k_w: lw }, clause: 'ACI 318-19 Table 7.3.1.1', note: `${sup.replace(/-/g, ' ')}: ℓ/${ONE_WAY_DIVISOR[sup]}`,
  });
  return h;
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
  const h = Math.max(hTable, hAbsolute);
  const w = working();
  if (w) {
    const table = `ACI ${edition(ed)} Table 8.3.1.1`;
    const [f0, f1] = [rows.fyKsi[row], rows.fyKsi[row + 1]];
    const [n0, n1] = [divisors[row], divisors[row + 1]];
    const vars = { ln: [span, 'in'], fy: [fyKsi * 1000 * psi, 'ksi'] } as const;
    const row0 = `${p.replace(/-/g, ' ')} panel, ${drop ? 'with' : 'without'} drop panels`;
    w.step('h_table', `ln / ${n0} + (fy - ${f0}) / (${f1} - ${f0}) * (ln / ${n1} - ln / ${n0})`, hTable, 'in', {
      vars, code: true, clause: table, note: `${row0}: ℓn/${n0} at ${f0} ksi, ℓn/${n1} at ${f1} ksi, linear in fy`,
    });
    // Written in ft and ksi above; the absolute minimum is in inches.
    w.step('h_min', `max(h_table, ${drop ? 4 : 5})`, h, 'in', {
      vars: { h_table: [hTable, 'in'] }, code: true, clause: 'ACI 318-19 §8.3.1.1', governs: h > hTable,
      note: h > hTable ? `the absolute minimum ${drop ? 4 : 5} in governs` : undefined,
    });
  }
  return h;
}

/**
 * The Table 8.3.1.1 panel for the slab around a column at grid lines (line1, line2), counted from
 * 0 at one edge to n at the other: a line at or next to an edge (line ≤ 1 or ≥ n − 1) bounds an
 * end span, whose panel has a discontinuous edge and is exterior (every interior line of a
 * 3-span direction does). Edge beams, when present along that edge, give 'exterior-edge-beam'.
 */
export function panelAtColumn(n1: number, n2: number, line1: number, line2: number, edgeBeams = false): Panel {
  const spans1 = wholeAtLeast('n1', n1, 1);
  const spans2 = wholeAtLeast('n2', n2, 1);
  const at1 = lineOf('line1', line1, spans1);
  const at2 = lineOf('line2', line2, spans2);
  const endSpan1 = at1 <= 1 || at1 >= spans1 - 1;
  const endSpan2 = at2 <= 1 || at2 >= spans2 - 1;
  const exterior = endSpan1 || endSpan2;
  const panel: Panel = !exterior ? 'interior' : bool('edge_beams', edgeBeams, false) ? 'exterior-edge-beam' : 'exterior';
  const w = working();
  if (w) {
    const vars = { n1: spans1, n2: spans2, line1: at1, line2: at2 };
    const clause = 'ACI 318-19 Table 8.3.1.1';
    w.step('end_span_1', 'line1 <= 1 or line1 >= n1 - 1', endSpan1, '', { vars, clause });
    w.step('end_span_2', 'line2 <= 1 or line2 >= n2 - 1', endSpan2, '', { vars, clause });
    w.step('panel', undefined, panel, '', { clause, note: exterior ? 'the column bounds an end span: the panel has a discontinuous edge' : 'no end span at the column' });
  }
  return panel;
}

function wholeAtLeast(name: string, v: unknown, min: number): number {
  const x = positive(name, v);
  if (!Number.isInteger(x) || x < min) throw new LibraryError(`${name} must be a whole number >= ${min} (got ${show(x)})`);
  return x;
}

function lineOf(name: string, v: unknown, spans: number): number {
  if (typeof v !== 'number' || !Number.isInteger(v) || v < 0 || v > spans) {
    throw new LibraryError(`${name} must be a whole number from 0 (edge line) to ${spans} (got ${show(v)})`);
  }
  return v;
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
  defineFunction({
    name: 'panel_at_column',
    params: [
      { name: 'n1', type: '1', doc: 'number of spans in direction 1' },
      { name: 'n2', type: '1', doc: 'number of spans in direction 2' },
      { name: 'line1', type: '1', doc: 'column line in direction 1, 0 at the edge to n1' },
      { name: 'line2', type: '1', doc: 'column line in direction 2, 0 at the edge to n2' },
      { name: 'edge_beams', type: 'bool', doc: 'edge beams with αf ≥ 0.8 along the slab edges (default false)' },
    ],
    optional: 1, returns: 'text',
    clause: 'ACI 318-19 Table 8.3.1.1: a panel with a discontinuous edge is exterior; a column on or next to an edge line bounds an end span',
    doc: 'Panel of Table 8.3.1.1 that governs the slab around a column: interior, exterior or exterior-edge-beam',
    fn: (n1: number, n2: number, a: number, b: number, e?: boolean) => panelAtColumn(n1, n2, a, b, e),
  }),
];
