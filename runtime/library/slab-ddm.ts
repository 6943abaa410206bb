// Direct Design Method for two-way slabs, ACI 318-19 §8.10: applicability, total static
// moment Mo, its split between negative and positive sections, and the column-strip share.
// Table values are from memory except where the test file names a confirmed source.

import { defineFunction, LibraryError, type LibFunction } from './types';
import { choice, count, nonNegative, positive, show } from './gravity-args';
import { working } from '../working/recorder';

interface Applicability { ok: boolean; reason: string }

/** ACI 318-19 §8.10.2.1, .2, .3, .6: spans each way, span ratio, successive spans, L/D. */
function applicability(
  nx: number, ny: number, l1: number, l2: number, D: number, L: number, l1Next?: number, l2Next?: number,
): Applicability {
  const n1 = count('n1', nx, 1);
  const n2 = count('n2', ny, 1);
  const a = positive('l1', l1);
  const b = positive('l2', l2);
  const d = positive('D', D);
  const live = nonNegative('L', L);
  const a2 = l1Next === undefined ? a : positive('l1_next', l1Next);
  const b2 = l2Next === undefined ? b : positive('l2_next', l2Next);
  const fail = (reason: string): Applicability => ({ ok: false, reason: `DDM not applicable: ${reason}` });
  const w = working();
  const vars = { n1, n2, l1: [a, 'ft'], l2: [b, 'ft'], l1_next: [a2, 'ft'], l2_next: [b2, 'ft'], D: [d, 'psf'], L: [live, 'psf'] } as const;
  w?.step('spans_ok', 'min(n1, n2) >= 3', n1 >= 3 && n2 >= 3, '', { vars, clause: 'ACI 318-19 §8.10.2.1' });
  if (n1 < 3 || n2 < 3) return fail(`§8.10.2.1 needs at least 3 continuous spans each way (${n1} × ${n2})`);
  const ratio = Math.max(a, b) / Math.min(a, b);
  w?.step('ratio', 'max(l1, l2) / min(l1, l2)', ratio, '', { vars, clause: 'ACI 318-19 §8.10.2.3' });
  w?.step('ratio_ok', 'ratio <= 2', !(ratio > 2 + 1e-9), '');
  if (ratio > 2 + 1e-9) return fail(`§8.10.2.3 panel ℓlong/ℓshort = ${ratio.toFixed(2)} > 2`);
  for (const [x, y, dir] of [[a, a2, 1], [b, b2, 2]] as const) {
    const diff = Math.abs(x - y) / Math.max(x, y);
    w?.step(`diff_${dir}`, `abs(l${dir} - l${dir}_next) / max(l${dir}, l${dir}_next)`, diff, '', { vars, clause: 'ACI 318-19 §8.10.2.2' });
    w?.step(`diff_${dir}_ok`, `diff_${dir} <= 1 / 3`, !(diff > 1 / 3 + 1e-9), '');
    if (diff > 1 / 3 + 1e-9) {
      return fail(`§8.10.2.2 successive spans in direction ${dir} differ by ${(100 * diff).toFixed(0)} % of the longer (> 1/3)`);
    }
  }
  w?.step('L_D', 'L / D', live / d, '', { vars, clause: 'ACI 318-19 §8.10.2.6' });
  w?.step('L_D_ok', 'L_D <= 2', !(live > 2 * d * (1 + 1e-12)), '');
  if (live > 2 * d * (1 + 1e-12)) return fail(`§8.10.2.6 L/D = ${(live / d).toFixed(2)} > 2`);
  return {
    ok: true,
    reason: 'DDM applicable: §8.10.2.1 spans, .2 successive spans, .3 ratio and .6 L/D met (column offsets, .4, and beam stiffness, .7, not checked)',
  };
}

/** ACI 318-19 §8.10.2: the DDM limits checked here are all met. */
export function ddmApplicable(nx: number, ny: number, l1: number, l2: number, D: number, L: number, l1Next?: number, l2Next?: number): boolean {
  const a = applicability(nx, ny, l1, l2, D, L, l1Next, l2Next);
  working()?.step('applicable', undefined, a.ok, '', { note: a.reason, clause: 'ACI 318-19 §8.10.2' });
  return a.ok;
}

/** Why the DDM applies or not, naming the first limit that fails (ACI 318-19 §8.10.2). */
export function ddmApplicableReason(nx: number, ny: number, l1: number, l2: number, D: number, L: number, l1Next?: number, l2Next?: number): string {
  const a = applicability(nx, ny, l1, l2, D, L, l1Next, l2Next);
  working()?.step('reason', undefined, a.reason, '', { clause: 'ACI 318-19 §8.10.2' });
  return a.reason;
}

/** ACI 318-19 §8.10.3.2.2: clear span face to face of supports, not less than 0.65 ℓ1. */
export function ddmLn(l1: number, c1a: number, c1b?: number): number {
  const l = positive('l1', l1);
  const ca = nonNegative('c1a', c1a);
  const cb = c1b === undefined ? ca : nonNegative('c1b', c1b);
  const clear = l - ca / 2 - cb / 2;
  if (clear <= 0) throw new LibraryError(`supports of ${show(ca)} m and ${show(cb)} m leave no clear span in ${show(l)} m`);
  const ln = Math.max(clear, 0.65 * l);
  const w = working();
  if (w) {
    const vars = { l1: [l, 'ft'], c1a: [ca, 'in'], c1b: [cb, 'in'] } as const;
    w.step('l_clear', 'l1 - c1a / 2 - c1b / 2', clear, 'ft', { vars, clause: 'ACI 318-19 §8.10.3.2.2' });
    w.step('ln', 'max(l_clear, 0.65 * l1)', ln, 'ft', { vars, governs: ln > clear, note: ln > clear ? 'not less than 0.65ℓ1' : undefined });
  }
  return ln;
}

/** ACI 318-19 Eq. 8.10.3.2: Mo = qu ℓ2 ℓn²/8, with ℓn ≥ 0.65 ℓ1 (§8.10.3.2.2). */
export function ddmMo(qu: number, l2: number, ln: number, l1: number): number {
  const q = nonNegative('qu', qu);
  const b = positive('l2', l2);
  const n = positive('ln', ln);
  const a = positive('l1', l1);
  if (n > a) throw new LibraryError(`clear span ln = ${show(n)} m exceeds the centre-to-centre span l1 = ${show(a)} m`);
  const lnEff = Math.max(n, 0.65 * a);
  const Mo = (q * b * lnEff * lnEff) / 8;
  const w = working();
  if (w) {
    const vars = { qu: [q, 'psf'], l2: [b, 'ft'], ln: [n, 'ft'], l1: [a, 'ft'] } as const;
    w.step('ln', 'max(ln, 0.65 * l1)', lnEff, 'ft', { vars, clause: 'ACI 318-19 §8.10.3.2.2', governs: lnEff > n });
    w.step('Mo', 'qu * l2 * ln^2 / 8', Mo, 'kip*ft', { vars: { qu: vars.qu, l2: vars.l2 }, clause: 'ACI 318-19 Eq. 8.10.3.2' });
  }
  return Mo;
}

export const INTERIOR_LOCATIONS = ['negative', 'positive'] as const;
export type InteriorLocation = (typeof INTERIOR_LOCATIONS)[number];

/** ACI 318-19 §8.10.4.1: interior span, negative 0.65 Mo, positive 0.35 Mo. */
export function ddmInteriorCoef(location: InteriorLocation): number {
  const loc = choice('location', location, INTERIOR_LOCATIONS);
  const k = loc === 'negative' ? 0.65 : 0.35;
  working()?.lookup('k_Mo', k, '', `interior span, ${loc} moment`, 'ACI 318-19 §8.10.4.1');
  return k;
}

/** ACI 318-19 Table 8.10.4.2 rows: [interior negative, positive, exterior negative] fractions of Mo. */
export const END_SPAN_TABLE = {
  unrestrained: [0.75, 0.63, 0], // exterior edge unrestrained
  'beams-all': [0.7, 0.57, 0.16], // slab with beams between all supports
  'no-beams': [0.7, 0.52, 0.26], // no beams between interior supports, no edge beam
  'edge-beam': [0.7, 0.5, 0.3], // no beams between interior supports, with edge beam
  restrained: [0.65, 0.35, 0.65], // exterior edge fully restrained
} as const;
export type EndCase = keyof typeof END_SPAN_TABLE;
export const END_CASES = Object.keys(END_SPAN_TABLE) as EndCase[];
export const END_LOCATIONS = ['negative-interior', 'positive', 'negative-exterior'] as const;
export type EndLocation = (typeof END_LOCATIONS)[number];

/** ACI 318-19 Table 8.10.4.2: end span moment as a fraction of Mo. */
export function ddmEndCoef(endCase: EndCase, location: EndLocation): number {
  const c = choice('case', endCase, END_CASES);
  const loc = choice('location', location, END_LOCATIONS);
  const k = END_SPAN_TABLE[c][END_LOCATIONS.indexOf(loc)];
  working()?.lookup('k_Mo', k, '', `end span, ${c.replace(/-/g, ' ')}: ${loc.replace(/-/g, ' ')}`, 'ACI 318-19 Table 8.10.4.2');
  return k;
}

/** ACI 318-19 §8.4.1.5: column strip width, 0.25ℓ1 or 0.25ℓ2 (the smaller) each side of the column line. */
export function ddmCsWidth(l1: number, l2: number): number {
  const width = 2 * Math.min(0.25 * positive('l1', l1), 0.25 * positive('l2', l2));
  working()?.step('b_cs', '2 * min(0.25 * l1, 0.25 * l2)', width, 'ft', { vars: { l1: [l1, 'ft'], l2: [l2, 'ft'] }, clause: 'ACI 318-19 §8.4.1.5' });
  return width;
}

export const CS_LOCATIONS = ['negative-interior', 'negative-exterior', 'positive'] as const;
export type CsLocation = (typeof CS_LOCATIONS)[number];

const RATIOS = [0.5, 1, 2];
const CS_NO_BEAMS = { 'negative-interior': [0.75, 0.75, 0.75], positive: [0.6, 0.6, 0.6] };
const CS_BEAMS = [0.9, 0.75, 0.45]; // αf1ℓ2/ℓ1 ≥ 1.0, interior negative and positive alike

/** Piecewise-linear in ℓ2/ℓ1 over 0.5, 1, 2; the working shows the interpolation as `symbol`. */
function byRatio(row: readonly number[], r: number, symbol: string, table: string): number {
  const i = r <= 1 ? 0 : 1;
  const t = (r - RATIOS[i]) / (RATIOS[i + 1] - RATIOS[i]);
  const v = row[i] + t * (row[i + 1] - row[i]);
  working()?.step(symbol, `${row[i]} + (l2_l1 - ${RATIOS[i]}) / (${RATIOS[i + 1]} - ${RATIOS[i]}) * (${row[i + 1]} - ${row[i]})`, v, '', {
    vars: { l2_l1: r }, clause: table, note: `linear between ℓ2/ℓ1 = ${RATIOS[i]} and ${RATIOS[i + 1]}`,
  });
  return v;
}

/**
 * ACI 318-19 Tables 8.10.5.1 (interior negative), 8.10.5.2 (exterior negative, with βt) and
 * 8.10.5.5 (positive): column-strip fraction, linear in ℓ2/ℓ1 (0.5-2), in αf1ℓ2/ℓ1 (0-1) and βt (0-2.5).
 */
export function ddmCsFraction(location: CsLocation, l2OverL1: number, alphaRatio = 0, betaT = 0): number {
  const loc = choice('location', location, CS_LOCATIONS);
  const r = positive('l2_l1', l2OverL1);
  if (r < 0.5 - 1e-9 || r > 2 + 1e-9) throw new LibraryError(`ℓ2/ℓ1 = ${show(r)} is outside 0.5-2 (§8.10.2.3)`);
  const ta = Math.min(nonNegative('alpha_l2_l1', alphaRatio), 1);
  const w = working();
  const table = loc === 'positive' ? 'ACI 318-19 Table 8.10.5.5' : loc === 'negative-interior' ? 'ACI 318-19 Table 8.10.5.1' : 'ACI 318-19 Table 8.10.5.2';
  const beams = byRatio(CS_BEAMS, r, 'f_beams', `${table}, row αf1ℓ2/ℓ1 ≥ 1`);
  const alpha = { alpha_l2_l1: nonNegative('alpha_l2_l1', alphaRatio) };
  if (loc === 'negative-exterior') {
    const bt = nonNegative('beta_t', betaT);
    const tb = Math.min(bt, 2.5) / 2.5;
    const stiffEdge = 0.75 + ta * (beams - 0.75); // βt ≥ 2.5
    w?.step('f_stiff', '0.75 + min(alpha_l2_l1, 1) * (f_beams - 0.75)', stiffEdge, '', { vars: alpha, clause: table, note: 'row βt ≥ 2.5' });
    const f = 1 + tb * (stiffEdge - 1);
    w?.step('f_cs', '1 + min(beta_t, 2.5) / 2.5 * (f_stiff - 1)', f, '', { vars: { beta_t: bt }, clause: table, note: 'linear in βt from 1.0 at βt = 0' });
    return f;
  }
  const none = byRatio(CS_NO_BEAMS[loc], r, 'f_none', `${table}, row αf1ℓ2/ℓ1 = 0`);
  const f = none + ta * (beams - none);
  w?.step('f_cs', 'f_none + min(alpha_l2_l1, 1) * (f_beams - f_none)', f, '', { vars: alpha, clause: table, note: 'linear in αf1ℓ2/ℓ1' });
  return f;
}

/** ACI 318-19 §8.10.5.7.1: share of the column-strip moment taken by the beam, 0.85 at αf1ℓ2/ℓ1 ≥ 1, linear to 0. */
export function ddmBeamShare(alphaRatio: number): number {
  const a = nonNegative('alpha_l2_l1', alphaRatio);
  const share = 0.85 * Math.min(a, 1);
  working()?.step('f_beam', '0.85 * min(alpha_l2_l1, 1)', share, '', { vars: { alpha_l2_l1: a }, clause: 'ACI 318-19 §8.10.5.7.1' });
  return share;
}

const APPL_PARAMS = [
  { name: 'n1', type: '1', doc: 'number of continuous spans in direction 1' },
  { name: 'n2', type: '1', doc: 'number of continuous spans in direction 2' },
  { name: 'l1', type: 'm', doc: 'span centre to centre, direction 1' },
  { name: 'l2', type: 'm', doc: 'span centre to centre, direction 2' },
  { name: 'D', type: 'N/m^2', doc: 'unfactored dead load' },
  { name: 'L', type: 'N/m^2', doc: 'unfactored live load' },
  { name: 'l1_next', type: 'm', doc: 'next span in direction 1' },
  { name: 'l2_next', type: 'm', doc: 'next span in direction 2' },
];
const ALPHA = { name: 'alpha_l2_l1', type: '1', doc: 'αf1ℓ2/ℓ1 (0 for a flat plate)' };

export const functions: LibFunction[] = [
  defineFunction({
    name: 'ddm_applicable', params: APPL_PARAMS, optional: 2, returns: 'bool', clause: 'ACI 318-19 §8.10.2',
    doc: 'The Direct Design Method limits are met',
    fn: (a: number, b: number, c: number, d: number, e: number, f: number, g?: number, h?: number) =>
      ddmApplicable(a, b, c, d, e, f, g, h),
  }),
  defineFunction({
    name: 'ddm_applicable_reason', params: APPL_PARAMS, optional: 2, returns: 'text', clause: 'ACI 318-19 §8.10.2',
    doc: 'Why the Direct Design Method applies or not',
    fn: (a: number, b: number, c: number, d: number, e: number, f: number, g?: number, h?: number) =>
      ddmApplicableReason(a, b, c, d, e, f, g, h),
  }),
  defineFunction({
    name: 'ddm_ln',
    params: [{ name: 'l1', type: 'm', doc: 'span centre to centre' }, { name: 'c1a', type: 'm', doc: 'support width at one end' },
      { name: 'c1b', type: 'm', doc: 'support width at the other end (default c1a)' }],
    optional: 1, returns: 'm', clause: 'ACI 318-19 §8.10.3.2.2',
    doc: 'Clear span face to face of supports, ≥ 0.65 ℓ1',
    fn: (l1: number, a: number, b?: number) => ddmLn(l1, a, b),
  }),
  defineFunction({
    name: 'ddm_mo',
    params: [{ name: 'qu', type: 'N/m^2', doc: 'factored load' }, { name: 'l2', type: 'm', doc: 'transverse span' },
      { name: 'ln', type: 'm', doc: 'clear span' }, { name: 'l1', type: 'm', doc: 'span centre to centre' }],
    returns: 'N*m', clause: 'ACI 318-19 Eq. 8.10.3.2',
    doc: 'Total factored static moment Mo = qu ℓ2 ℓn²/8',
    fn: (q: number, l2: number, ln: number, l1: number) => ddmMo(q, l2, ln, l1),
  }),
  defineFunction({
    name: 'ddm_interior_coef',
    params: [{ name: 'location', type: 'text', choices: INTERIOR_LOCATIONS, doc: 'negative or positive' }],
    returns: '1', clause: 'ACI 318-19 §8.10.4.1',
    doc: 'Interior span moment as a fraction of Mo (0.65 / 0.35)',
    fn: (l: InteriorLocation) => ddmInteriorCoef(l),
  }),
  defineFunction({
    name: 'ddm_end_coef',
    params: [{ name: 'case', type: 'text', choices: END_CASES, doc: 'edge condition of the end span' },
      { name: 'location', type: 'text', choices: END_LOCATIONS, doc: 'negative-interior, positive or negative-exterior' }],
    returns: '1', clause: 'ACI 318-19 Table 8.10.4.2',
    doc: 'End span moment as a fraction of Mo',
    fn: (c: EndCase, l: EndLocation) => ddmEndCoef(c, l),
  }),
  defineFunction({
    name: 'ddm_cs_width',
    params: [{ name: 'l1', type: 'm', doc: 'span in the direction of the moments' }, { name: 'l2', type: 'm', doc: 'transverse span' }],
    returns: 'm', clause: 'ACI 318-19 §8.4.1.5',
    doc: 'Column strip total width, 2·min(0.25ℓ1, 0.25ℓ2)',
    fn: (l1: number, l2: number) => ddmCsWidth(l1, l2),
  }),
  defineFunction({
    name: 'ddm_cs_fraction',
    params: [{ name: 'location', type: 'text', choices: CS_LOCATIONS, doc: 'negative-interior, negative-exterior or positive' },
      { name: 'l2_l1', type: '1', doc: 'ℓ2/ℓ1' }, ALPHA,
      { name: 'beta_t', type: '1', doc: 'torsional stiffness ratio βt of the edge beam (exterior negative)' }],
    optional: 2, returns: '1', clause: 'ACI 318-19 Tables 8.10.5.1, 8.10.5.2, 8.10.5.5',
    doc: 'Share of the moment taken by the column strip',
    fn: (l: CsLocation, r: number, a?: number, b?: number) => ddmCsFraction(l, r, a, b),
  }),
  defineFunction({
    name: 'ddm_beam_share', params: [ALPHA], returns: '1', clause: 'ACI 318-19 §8.10.5.7.1',
    doc: 'Share of the column-strip moment taken by the beam',
    fn: (a: number) => ddmBeamShare(a),
  }),
];
