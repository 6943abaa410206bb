// The P–M interaction of a rectangular tied column (column-section.ts) and what the
// templates ask of it: the design moment strength φMn at a factored axial load, the design
// axial strength φPn at an eccentricity, a demand/capacity ratio along the load line, and
// the design curve with the Pn,max cap of ACI 318-19 §22.4.2.1 for the interaction figure.
// The curve is found by walking the neutral axis depth c from the tension side to pure
// compression and bisecting where a quantity crosses the demand.

import { LibraryError, defineFunction, type LibFunction, type LibParam } from './types';
import { EDITIONS, edition, finite, nonNegative } from './support-args';
import { BARS, barArea } from './rebar';
import {
  axialLimits, balancedPoint, columnSection, designPoint,
  type AxialLimits, type ColumnSection, type DesignPoint,
} from './column-section';
import { ES } from './resistance-factors';
import { pmFigure, PM_REFERENCE, pointSteps, sectionSteps } from './column-working';
import { quietly, working } from '../working/recorder';

/**
 * Neutral axis depths walked: geometric from 1e-4 h to 60 h (pure compression is reached
 * well before), with both sides of each depth where the block reaches a bar row (the
 * row's displaced concrete comes off there, so Pn steps) and where it reaches the far face.
 */
function depths(s: ColumnSection, count = 160): number[] {
  const lo = 1e-4 * s.h, hi = 60 * s.h;
  const cs = Array.from({ length: count }, (_, i) => lo * Math.pow(hi / lo, i / (count - 1)));
  for (const y of [...s.rows.map((r) => r.y), s.h]) {
    const c = y / s.beta1;
    cs.push(c * (1 - 1e-12), c * (1 + 1e-12));
  }
  return cs.sort((x, y) => x - y);
}

/** Where a load line meets the design curve: the point just past it, and φPn, φMn there. */
export interface Crossing {
  point: DesignPoint;
  phiPn: number;
  phiMn: number;
}

/**
 * Every place along the walk where g changes sign, found by bisection on c. Where the
 * block reaches a bar row Pn steps down (the row's displaced concrete is taken off, the
 * usual hand-calc convention), so the curve has short straight pieces there: φPn and φMn
 * are interpolated across the last bracket by g. Where a load line meets the curve more
 * than once, the callers keep the least strength (conservative).
 */
function crossings(s: ColumnSection, g: (p: DesignPoint) => number): Crossing[] {
  const cs = depths(s);
  const pts = cs.map((c) => designPoint(s, c));
  const vals = pts.map(g);
  const at = (p: DesignPoint): Crossing => ({ point: p, phiPn: p.phiPn, phiMn: p.phiMn });
  const found: Crossing[] = pts.filter((_, k) => vals[k] === 0).map(at);
  for (let k = 0; k + 1 < vals.length; k++) {
    if (vals[k] === 0 || vals[k + 1] === 0 || (vals[k] < 0) === (vals[k + 1] < 0)) continue;
    let lo = pts[k], hi = pts[k + 1], gLo = vals[k], gHi = vals[k + 1];
    for (let n = 0; n < 50; n++) {
      const mid = designPoint(s, Math.sqrt(lo.c * hi.c));
      const gMid = g(mid);
      if (gMid === 0) {
        lo = hi = mid;
        gLo = gHi = 0;
        break;
      }
      if ((gMid < 0) === (gLo < 0)) [lo, gLo] = [mid, gMid];
      else [hi, gHi] = [mid, gMid];
    }
    const t = gHi === gLo ? 1 : -gLo / (gHi - gLo);
    found.push({ point: hi, phiPn: lo.phiPn + t * (hi.phiPn - lo.phiPn), phiMn: lo.phiMn + t * (hi.phiMn - lo.phiMn) });
  }
  return found;
}

const least = (xs: Crossing[], key: (x: Crossing) => number): Crossing | undefined =>
  xs.reduce<Crossing | undefined>((best, x) => (best === undefined || key(x) < key(best) ? x : best), undefined);

export interface MomentStrength {
  /** Design moment strength at Pu; 0 where Pu exceeds φPn,max. */
  phiMn: number;
  /** Where φPn = Pu (undefined beyond φPn,max). */
  point?: Crossing;
  limits: AxialLimits;
}

/** φMn at the factored axial load Pu: the c where φPn(c) = Pu (ACI 318-19 §22.4.2, Table 21.2.2). */
export function momentStrengthAt(s: ColumnSection, pu: number): MomentStrength {
  const P = finite('Pu', pu);
  const limits = axialLimits(s);
  if (P > limits.phiPnMax) return { phiMn: 0, limits };
  if (P < limits.phiPnt) {
    throw new LibraryError('Pu is a tension beyond the design tensile strength φfy·Ast of the bars');
  }
  const point = least(crossings(s, (p) => p.phiPn - P), (x) => x.phiMn);
  if (!point) throw new LibraryError('no point of the interaction curve carries this axial load');
  return { phiMn: Math.max(0, point.phiMn), point, limits };
}

export interface AxialStrength {
  /** Design axial strength on the line M = e·P, capped at φPn,max. */
  phiPn: number;
  /** Where the line meets the curve, φPn there not capped. */
  point: Crossing;
  capped: boolean;
  limits: AxialLimits;
}

/** φPn at eccentricity e = Mu/Pu about the plastic centroid (e ≥ 0), capped at φPn,max (§22.4.2.1). */
export function axialStrengthAt(s: ColumnSection, e: number): AxialStrength {
  const ecc = nonNegative('e', e);
  const limits = axialLimits(s);
  if (ecc === 0) {
    // Concentric: the cap governs (0.65 of the squash load is at least 0.65·0.80·Po).
    const p = designPoint(s, 60 * s.h);
    return { phiPn: limits.phiPnMax, point: { point: p, phiPn: p.phiPn, phiMn: 0 }, capped: true, limits };
  }
  // Along the walk from the tension side, e·Pn − Mn changes sign where the line M = e·P is met.
  const point = least(crossings(s, (p) => ecc * p.pn - p.mn).filter((x) => x.point.pn > 0), (x) => x.phiPn);
  if (!point) throw new LibraryError('no point of the interaction curve lies at this eccentricity');
  const capped = point.phiPn > limits.phiPnMax;
  return { phiPn: Math.min(point.phiPn, limits.phiPnMax), point, capped, limits };
}

/**
 * Demand/capacity along the load line from the origin through (Pu, Mu): the distance to
 * the demand over the distance to the design curve (common practice). Pu ≥ 0.
 */
export function pmRatio(s: ColumnSection, pu: number, mu: number): number {
  const P = nonNegative('Pu', pu);
  const M = Math.abs(finite('Mu', mu));
  if (P === 0 && M === 0) return 0;
  if (M === 0) return P / axialLimits(s).phiPnMax;
  if (P === 0) {
    const m0 = momentStrengthAt(s, 0).phiMn;
    return m0 > 0 ? M / m0 : Infinity;
  }
  const cap = axialStrengthAt(s, M / P);
  return P / cap.phiPn;
}

export interface CurvePoint {
  pn: number;
  mn: number;
  phiPn: number;
  phiMn: number;
  epsT: number;
  phi: number;
}

export interface InteractionCurve {
  /** From pure compression (c large) to pure tension (c → 0): nominal and design values. */
  points: CurvePoint[];
  balanced: CurvePoint;
  limits: AxialLimits;
}

const curvePoint = (p: DesignPoint): CurvePoint =>
  ({ pn: p.pn, mn: p.mn, phiPn: p.phiPn, phiMn: p.phiMn, epsT: p.epsT, phi: p.phi });

/** The nominal and design curves (design not yet capped: the figure draws the cap at φPn,max). */
export function interactionCurve(s: ColumnSection, count = 120): InteractionCurve {
  const points = depths(s, count).reverse().map((c) => curvePoint(designPoint(s, c)));
  const limits = axialLimits(s);
  const tension = { pn: limits.pnt, mn: 0, phiPn: limits.phiPnt, phiMn: 0, epsT: Infinity, phi: 0.9 };
  return { points: [...points, tension], balanced: curvePoint(balancedPoint(s)), limits };
}

// ---- formula functions ----------------------------------------------------------------

export const SECTION_PARAMS: LibParam[] = [
  { name: 'fc', type: 'Pa', doc: "concrete strength f'c" },
  { name: 'fy', type: 'Pa', doc: 'yield strength of the column bars' },
  { name: 'b', type: 'm', doc: 'column side parallel to the bending axis' },
  { name: 'h', type: 'm', doc: 'column side in the direction of bending' },
  { name: 'n_b', type: '1', doc: 'bars on each face of width b, corners counted' },
  { name: 'n_h', type: '1', doc: 'bars on each face of depth h, corners counted' },
  { name: 'bar', type: 'text', choices: BARS, doc: 'bar size' },
  { name: 'd_s', type: 'm', doc: 'distance from the face to the bar centres' },
  { name: 'edition', type: 'text', choices: EDITIONS, doc: "'318-19' (default) or '318-14' (φ transition to 0.005)" },
];

/** Build the section from the formula arguments (SECTION_PARAMS order). */
export function sectionOf(fc: number, fy: number, b: number, h: number, nB: number, nH: number, bar: string, dS: number, ed?: string): ColumnSection {
  return columnSection(fc, fy, b, h, nB, nH, barArea(bar), dS, edition(ed));
}

type SectionArgs = [number, number, number, number, number, number, string, number, string?];

const CLAUSE = "ACI 318-19 §22.2 (strain compatibility, εcu = 0.003, Whitney block, β1), Table 21.2.2 (φ from εt), §22.4.2.1 (Pn,max = 0.80Po, tied)";
/** φMn at Pu with its working: the section, the point where φPn = Pu, the result, the figure. */
function momentWorking(pu: number, a: SectionArgs, pick: 'phiMn' | 'phi'): number {
  const w = working();
  const s = sectionOf(...a);
  const r = quietly(() => momentStrengthAt(s, pu));
  const value = pick === 'phiMn' ? r.phiMn : r.point?.point.phi ?? 0.65;
  if (w) {
    const limits = sectionSteps(w, s);
    if (!r.point) {
      w.step('over', 'Pu > phi_Pn_max', true, '', { vars: { Pu: [pu, 'kip'], phi_Pn_max: [limits.phiPnMax, 'kip'] }, note: 'beyond the flat top of the design curve' });
    } else {
      pointSteps(w, r.point.point, 'neutral-axis depth where φPn = Pu');
    }
    pmFigure(w, pu, 0, a);
    if (pick === 'phiMn') w.lookup('phi_Mn', value, 'kip*ft', r.point ? 'on the design curve at Pu (interpolated across the last bracket)' : 'no moment strength above φPn,max', CLAUSE);
    else w.lookup('phi', value, '', r.point ? 'at the point where φPn = Pu' : 'compression-controlled (tied) above φPn,max', 'ACI 318-19 Table 21.2.2');
  }
  return value;
}

/** φPn at eccentricity e with its working. */
function axialWorking(e: number, a: SectionArgs): number {
  const w = working();
  const s = sectionOf(...a);
  const r = quietly(() => axialStrengthAt(s, e));
  if (w) {
    sectionSteps(w, s);
    if (e > 0) pointSteps(w, r.point.point, 'neutral-axis depth where the line M = e·P meets the curve');
    pmFigure(w, r.phiPn, r.phiPn * e, a);
    w.step('phi_Pn', 'min(phi_Pn_e, phi_Pn_max)', r.phiPn, 'kip', {
      vars: { phi_Pn_e: [r.point.phiPn, 'kip'] }, clause: 'ACI 318-19 §22.4.2.1', governs: r.capped,
      note: r.capped ? 'capped at φPn,max' : 'on the design curve at e',
    });
  }
  return r.phiPn;
}

/** Demand/capacity along the load line with its working. */
function ratioWorking(pu: number, mu: number, a: SectionArgs): number {
  const w = working();
  const s = sectionOf(...a);
  const ratio = quietly(() => pmRatio(s, pu, mu));
  if (w) {
    const limits = sectionSteps(w, s);
    const P = Math.max(0, pu);
    const M = Math.abs(mu);
    const vars = { Pu: [P, 'kip'], Mu: [M, 'kip*ft'] } as const;
    pmFigure(w, pu, mu, a);
    if (P === 0 && M === 0) w.step('ratio', '0', 0, '', { note: 'no demand' });
    else if (M === 0) w.step('ratio', 'Pu / phi_Pn_max', ratio, '', { vars, note: 'concentric: against φPn,max', clause: PM_REFERENCE });
    else if (P === 0) {
      const m0 = quietly(() => momentStrengthAt(s, 0).phiMn);
      w.lookup('phi_Mn', m0, 'kip*ft', 'on the design curve at Pu = 0', CLAUSE);
      w.step('ratio', 'Mu / phi_Mn', ratio, '', { vars, clause: PM_REFERENCE });
    } else {
      const cap = quietly(() => axialStrengthAt(s, M / P));
      w.step('e', 'Mu / Pu', M / P, 'in', { vars, note: 'the load line through (Pu, Mu)' });
      pointSteps(w, cap.point.point, 'neutral-axis depth where the load line meets the curve');
      w.step('phi_Pn', 'min(phi_Pn_e, phi_Pn_max)', cap.phiPn, 'kip', {
        vars: { phi_Pn_e: [cap.point.phiPn, 'kip'], phi_Pn_max: [limits.phiPnMax, 'kip'] }, governs: cap.capped,
        note: cap.capped ? 'capped at φPn,max' : undefined,
      });
      w.step('ratio', 'Pu / phi_Pn', ratio, '', { vars, clause: 'along the load line (common practice)' });
    }
  }
  return ratio;
}

/** The balanced point with its working: εty, cb, and Pb or Mb there. */
function balancedWorking(a: SectionArgs, pick: 'pn' | 'mn'): number {
  const w = working();
  const s = sectionOf(...a);
  const b = quietly(() => balancedPoint(s));
  if (w) {
    sectionSteps(w, s);
    w.step('eps_ty', 'fy / Es', s.fy / ES, '', { vars: { fy: [s.fy, 'psi'], Es: [ES, 'psi'] }, clause: 'ACI 318-19 §21.2.2.1' });
    w.step('c_b', '0.003 * d_t / (0.003 + eps_ty)', b.c, 'in', { vars: { d_t: [s.dt, 'in'] }, clause: 'ACI 318-19 §22.2.2.1', note: 'εt = εty at the extreme tension row' });
    w.lookup('a', b.a, 'in', 'β1·c_b', 'ACI 318-19 §22.2.2.4.1');
    pmFigure(w, b.pn, b.mn, a);
    if (pick === 'pn') w.lookup('P_b', b.pn, 'kip', 'concrete block and every bar row at c_b', PM_REFERENCE);
    else w.lookup('M_b', b.mn, 'kip*ft', 'about the plastic centroid, at c_b', PM_REFERENCE);
  }
  return pick === 'pn' ? b.pn : b.mn;
}

const PU: LibParam = { name: 'Pu', type: 'N', doc: 'factored axial load (compression positive)' };
const MU: LibParam = { name: 'Mu', type: 'N*m', doc: 'factored moment about the same axis' };

export const functions: LibFunction[] = [
  defineFunction({
    name: 'col_phi_mn',
    params: [PU, ...SECTION_PARAMS],
    optional: 1,
    returns: 'N*m',
    clause: CLAUSE,
    doc: 'Design moment strength φMn of a tied rectangular column at the axial load Pu (0 above φPn,max)',
    fn: (pu: number, ...a: SectionArgs) => momentWorking(pu, a, 'phiMn'),
  }),
  defineFunction({
    name: 'col_phi_at',
    params: [PU, ...SECTION_PARAMS],
    optional: 1,
    returns: '1',
    clause: 'ACI 318-19 Table 21.2.2: φ from εt, 0.65 (tied) to 0.90',
    doc: 'Strength reduction factor φ at the point of the interaction curve where φPn = Pu',
    fn: (pu: number, ...a: SectionArgs) => momentWorking(pu, a, 'phi'),
  }),
  defineFunction({
    name: 'col_phi_pn_e',
    params: [{ name: 'e', type: 'm', doc: 'eccentricity Mu/Pu about the centre of the section' }, ...SECTION_PARAMS],
    optional: 1,
    returns: 'N',
    clause: CLAUSE,
    doc: 'Design axial strength φPn of a tied rectangular column at eccentricity e, capped at φPn,max',
    fn: (e: number, ...a: SectionArgs) => axialWorking(e, a),
  }),
  defineFunction({
    name: 'col_pm_ratio',
    params: [PU, MU, ...SECTION_PARAMS],
    optional: 1,
    returns: '1',
    clause: CLAUSE + '; ratio along the load line (common practice)',
    doc: 'Demand/capacity of (Pu, Mu) against the design interaction curve, along the line from the origin',
    fn: (pu: number, mu: number, ...a: SectionArgs) => ratioWorking(pu, mu, a),
  }),
  defineFunction({
    name: 'col_pb',
    params: SECTION_PARAMS,
    optional: 1,
    returns: 'N',
    clause: 'ACI 318-19 §21.2.2.1, §22.2: balanced point, εt = εty = fy/Es',
    doc: 'Nominal axial strength Pb at the balanced point',
    fn: (...a: SectionArgs) => balancedWorking(a, 'pn'),
  }),
  defineFunction({
    name: 'col_mb',
    params: SECTION_PARAMS,
    optional: 1,
    returns: 'N*m',
    clause: 'ACI 318-19 §21.2.2.1, §22.2: balanced point, εt = εty = fy/Es',
    doc: 'Nominal moment strength Mb at the balanced point',
    fn: (...a: SectionArgs) => balancedWorking(a, 'mn'),
  }),
];
