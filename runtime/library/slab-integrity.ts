// Detailing of a flat slab at its columns: how far the top bars run past the column face
// (ACI 318-19 Fig. 8.7.4.1.3, minimum extensions for slabs without beams) and whether they are
// developed there (§25.4.2, ψt for top bars), and the structural-integrity bottom bars that must
// pass through the column core (§8.7.4.2.2: at least two column-strip bottom bars each way within
// the region bounded by the column's longitudinal bars). Figure values and clause numbers are
// from memory.

import { LibraryError, defineFunction, type LibFunction } from './types';
import { EDITIONS, edition, finite, lambdaFactor, nonNegative, optional, positive, choice, type Edition } from './support-args';
import { ldStraight } from './footing-development';
import { barData, BARS } from './rebar';
import { inch } from '../units/si';
import { working } from '../working/recorder';

/** Tie size: No. 3 around longitudinal bars No. 10 and smaller, No. 4 around larger (ACI 318-19 §25.7.2.2) [from memory]. */
export function tieDia(dbLongitudinal: number): number {
  const small = positive('db', dbLongitudinal) / inch <= 1.27 + 1e-9;
  const d = (small ? 0.375 : 0.5) * inch;
  working()?.lookup('d_tie', d, 'in', small ? 'No. 3 ties around bars No. 10 and smaller' : 'No. 4 ties around larger bars', 'ACI 318-19 §25.7.2.2 [from memory]');
  return d;
}

export interface ColumnCore {
  tie: number; // m
  width: number; // between the centres of the outer longitudinal bars, m
}

/** Width bounded by the column's longitudinal bars: c − 2(cover + tie) − db (geometry; 1.5 in clear cover to the ties by default, the usual column cover [from memory]). */
export function columnCore(c: number, barCol: string, cover = 1.5 * inch): ColumnCore {
  const side = positive('c', c);
  const db = barData(barCol).dia;
  const tie = tieDia(db);
  const width = side - 2 * (nonNegative('cover', cover) + tie) - db;
  if (width <= 0) throw new LibraryError('the column is too small for its cover, ties and bars');
  working()?.step('b_core', 'c - 2 * (cover + d_tie) - d_b', width, 'in', {
    vars: { c: [side, 'in'], cover: [cover, 'in'], d_b: [db, 'in'] }, clause: 'ACI 318-19 §8.7.4.2.2 (geometry) [from memory]',
  });
  return { tie, width };
}

/** The fewest bars at spacing s that lie within a width w, wherever the bar grid falls: ⌊w/s⌋ (geometry). */
export function barsWithin(w: number, s: number): number {
  const n = Math.floor(nonNegative('w', w) / positive('s', s) + 1e-9);
  working()?.step('n', 'floor(w / s)', n, '', { vars: { w: [w, 'in'], s: [s, 'in'] }, clause: 'geometry' });
  return n;
}

export const TOP_BARS = ['column-strip-short', 'column-strip-long', 'middle-strip'] as const;
export type TopBars = (typeof TOP_BARS)[number];

/**
 * Minimum extension of top bars beyond the face of the support, slabs without beams (ACI 318-19
 * Fig. 8.7.4.1.3) [from memory]: column strip, the shorter half of the bars 0.20ℓn, the longer half
 * 0.30ℓn (0.33ℓn with drop panels); middle strip 0.22ℓn.
 */
export function topBarExtension(ln: number, bars: TopBars, dropPanels = false): number {
  const span = positive('ln', ln);
  const factor = bars === 'column-strip-short' ? 0.2 : bars === 'middle-strip' ? 0.22 : dropPanels ? 0.33 : 0.3;
  const ext = factor * span;
  working()?.step('l_ext', `${factor} * ln`, ext, 'ft', {
    vars: { ln: [span, 'ft'] }, clause: 'ACI 318-19 Fig. 8.7.4.1.3 [from memory]', note: `${bars.replace(/-/g, ' ')}${dropPanels && bars === 'column-strip-long' ? ', drop panels' : ''}`,
  });
  return ext;
}

export interface TopBarDevelopment {
  psiT: number;
  ld: number; // m
}

/**
 * ℓd of top bars, ACI 318-19 Table 25.4.2.3 with ψt = 1.3 where more than 12 in of fresh concrete is
 * cast below them (Table 25.4.2.5), ψtψe ≤ 1.7, ℓd ≥ 12 in [from memory].
 */
export function topBarDevelopment(db: number, fy: number, fc: number, concreteBelow: number, spacingOk = true, lambda = 1, psie = 1, ed: Edition = '318-19'): TopBarDevelopment {
  const below = nonNegative('concrete below', concreteBelow);
  const psiT = below > 12 * inch + 1e-12 ? 1.3 : 1.0;
  working()?.lookup('psi_t', psiT, '', psiT > 1 ? 'more than 12 in of fresh concrete below the bars' : '12 in or less of fresh concrete below', 'ACI 318-19 Table 25.4.2.5 [from memory]');
  const ld = ldStraight(db, fy, fc, spacingOk, lambda, psie, ed, psiT);
  return { psiT, ld };
}

export const functions: LibFunction[] = [
  defineFunction({
    name: 'ld_top',
    params: [
      { name: 'db', type: 'm', doc: 'bar diameter' },
      { name: 'fy', type: 'Pa', doc: 'bar yield strength' },
      { name: 'fc', type: 'Pa', doc: 'concrete strength' },
      { name: 'below', type: 'm', doc: 'depth of fresh concrete cast below the bars' },
      { name: 'spacing_ok', type: 'bool', doc: 'clear spacing ≥ 2db and cover ≥ db (default true)' },
      { name: 'lambda', type: '1', doc: 'lightweight concrete factor (default 1.0)' },
      { name: 'psi_e', type: '1', doc: 'coating factor ψe (default 1.0)' },
      { name: 'edition', type: 'text', choices: EDITIONS, doc: "'318-19' (default) or '318-14' (no ψg)" },
    ],
    optional: 4,
    returns: 'm',
    clause: 'ACI 318-19 Table 25.4.2.3 with ψt = 1.3 below more than 12 in of fresh concrete (Table 25.4.2.5), ψtψe ≤ 1.7, ℓd ≥ 12 in [from memory]',
    doc: 'Tension development length of straight top bars',
    fn: (db: number, fy: number, fc: number, below: number, ok?: boolean, l?: number, e?: number, ed?: string) =>
      topBarDevelopment(db, fy, fc, below, ok === undefined ? true : Boolean(ok), optional(l, 1, lambdaFactor),
        optional(e, 1, (x) => finite('psi_e', x)), edition(ed)).ld,
  }),
  defineFunction({
    name: 'top_bar_extension',
    params: [
      { name: 'ln', type: 'm', doc: 'clear span' },
      { name: 'bars', type: 'text', choices: TOP_BARS, doc: 'column-strip-short (0.20ℓn), column-strip-long (0.30ℓn) or middle-strip (0.22ℓn)' },
      { name: 'drop_panels', type: 'bool', doc: 'drop panels present (column-strip-long 0.33ℓn)' },
    ],
    optional: 1,
    returns: 'm',
    clause: 'ACI 318-19 Fig. 8.7.4.1.3, slabs without beams: top bars extend 0.20ℓn / 0.30ℓn (column strip), 0.22ℓn (middle strip) beyond the face [from memory]',
    doc: 'Minimum extension of slab top bars beyond the face of the column',
    fn: (ln: number, b: string, drop?: boolean) => topBarExtension(ln, choice('bars', b, TOP_BARS), drop === undefined ? false : Boolean(drop)),
  }),
  defineFunction({
    name: 'col_core_width',
    params: [
      { name: 'c', type: 'm', doc: 'column side across which the slab bars pass' },
      { name: 'bar_col', type: 'text', choices: BARS, doc: 'column longitudinal bar' },
      { name: 'cover', type: 'm', doc: 'clear cover to the ties (default 1.5 in)' },
    ],
    optional: 1,
    returns: 'm',
    clause: 'ACI 318-19 §8.7.4.2.2 (region bounded by the column bars): c − 2(cover + tie) − db, tie No. 3 for bars ≤ No. 10, else No. 4 (§25.7.2.2) [from memory]',
    doc: 'Width of the column core bounded by its longitudinal bars',
    fn: (c: number, bar: string, cover?: number) => columnCore(c, bar, optional(cover, 1.5 * inch, (v) => nonNegative('cover', v))).width,
  }),
  defineFunction({
    name: 'bars_within',
    params: [
      { name: 'w', type: 'm', doc: 'width' },
      { name: 's', type: 'm', doc: 'bar spacing' },
    ],
    returns: '1',
    clause: 'Geometry: at spacing s, at least ⌊w/s⌋ bars lie within any width w',
    doc: 'Fewest bars of a uniform layer that fall within a width',
    fn: barsWithin,
  }),
];
