// A rectangular tied column section under axial load and uniaxial bending, by strain
// compatibility with the ACI 318-19 §22.2 assumptions: plane sections, εcu = 0.003 at the
// extreme compression fibre (§22.2.2.1), steel elastic-perfectly plastic with Es = 29,000 ksi
// (§20.2.2.1-2), concrete tension neglected and the Whitney block 0.85 f'c over a = β1 c
// (§22.2.2.4.1, β1 Table 22.2.2.4.3). φ from the net tensile strain εt of the extreme
// tension row (Table 21.2.2, with the transition). Each step is a named value so the
// working can be shown.
//
// Geometry: b is the width (parallel to the bending axis), h the depth in the direction of
// bending; y is measured from the compression face. Bars: nB on each of the two faces of
// width b, nH on each of the two faces of depth h, corners counted on both (so the total is
// 2nB + 2nH − 4), all at dS (face to bar centre) from the faces, evenly spaced. The layout is
// symmetric, so the plastic centroid is at h/2 and moments are taken about it.

import { LibraryError } from './types';
import { finite, positive, type Edition } from './support-args';
import { beta1 } from './concrete';
import { ES, phiEpsT } from './resistance-factors';
import { poColumn } from './column-axial';
import { ksi } from '../units/si';

/** Ultimate concrete strain, ACI 318-19 §22.2.2.1. */
export const EPS_CU = 0.003;

export interface BarRow {
  /** Depth of the row from the compression face, m. */
  y: number;
  count: number;
  /** Steel area of the row, m². */
  area: number;
}

export interface ColumnSection {
  b: number;
  h: number;
  fc: number;
  fy: number;
  rows: BarRow[];
  ast: number;
  ag: number;
  beta1: number;
  /** Depth of the extreme tension row, dt = h − dS. */
  dt: number;
  edition: Edition;
}

/** Greatest fy for longitudinal column steel: 100 ksi (318-19 Table 20.2.2.4(a)), 80 ksi (318-14) [from memory]. */
export function fyLimit(ed: Edition): number {
  return (ed === '318-19' ? 100 : 80) * ksi;
}

function barsOnFace(name: string, v: number): number {
  const n = finite(name, v);
  if (!Number.isInteger(n) || n < 2 || n > 30) {
    throw new LibraryError(`${name} must be a whole number of bars from 2 to 30 on each face, corners counted (got ${n})`);
  }
  return n;
}

/** The section with its bar rows (rows at dS, evenly between, and at h − dS). */
export function columnSection(
  fc: number, fy: number, b: number, h: number, nB: number, nH: number, barArea: number, dS: number,
  ed: Edition = '318-19',
): ColumnSection {
  positive('b', b);
  positive('h', h);
  positive('fy', fy);
  positive('bar area', barArea);
  positive('d_s', dS);
  const onB = barsOnFace('n_b', nB);
  const onH = barsOnFace('n_h', nH);
  if (2 * dS >= Math.min(b, h)) throw new LibraryError('the bars (d_s from each face) must sit inside the section: 2·d_s < b and h');
  if (fy > fyLimit(ed) * (1 + 1e-9)) {
    throw new LibraryError(`fy above ${ed === '318-19' ? 100 : 80} ksi is not permitted for column bars (ACI ${ed} Table 20.2.2.4(a))`);
  }
  const rows: BarRow[] = [];
  const step = (h - 2 * dS) / (onH - 1);
  for (let k = 0; k < onH; k++) {
    const count = k === 0 || k === onH - 1 ? onB : 2;
    rows.push({ y: dS + k * step, count, area: count * barArea });
  }
  const ast = rows.reduce((s, r) => s + r.area, 0);
  const ag = b * h;
  if (ast >= ag) throw new LibraryError('the bars take up more than the section: Ast ≥ Ag');
  return { b, h, fc, fy, rows, ast, ag, beta1: beta1(fc), dt: h - dS, edition: ed };
}

export interface RowResult extends BarRow {
  /** Strain, compression positive. */
  eps: number;
  /** Stress, compression positive, |fs| ≤ fy. */
  fs: number;
  /** Force of the row, with the concrete it displaces inside the block taken out. */
  force: number;
}

/** A point of the interaction as the walk along the curve needs it: SI, compression positive. */
export interface DesignPoint {
  c: number;
  pn: number;
  /** Moment about the plastic centroid (h/2), positive with compression at y = 0. */
  mn: number;
  /** Net tensile strain of the extreme tension row (tension positive). */
  epsT: number;
  phi: number;
  phiPn: number;
  phiMn: number;
}

/** The same point with every step named, for the working. */
export interface StrainPoint extends DesignPoint {
  /** Depth of the stress block, β1 c, not more than h. */
  a: number;
  /** Concrete force 0.85 f'c a b. */
  cc: number;
  rows: RowResult[];
}

/** Strain at depth y for neutral axis depth c, compression positive (plane sections, εcu = 0.003). */
const strainAt = (c: number, y: number) => (EPS_CU * (c - y)) / c;

/** Steel stress, elastic to ±fy (ACI 318-19 §20.2.2.1). */
const stressAt = (s: ColumnSection, eps: number) => Math.max(-s.fy, Math.min(s.fy, ES * eps));

/** A row's force with the concrete it displaces inside the block taken out (row centre inside: common practice). */
const rowForce = (s: ColumnSection, r: BarRow, fs: number, a: number) => r.area * (fs - (r.y < a ? 0.85 * s.fc : 0));

/** Pn, Mn and εt at depth c without the row detail: the walk along the curve calls this many times. */
export function forcesAt(s: ColumnSection, c: number): { pn: number; mn: number; epsT: number; a: number } {
  const a = Math.min(s.beta1 * c, s.h);
  const cc = 0.85 * s.fc * a * s.b;
  const centroid = s.h / 2;
  let pn = cc, mn = cc * (centroid - a / 2);
  for (const r of s.rows) {
    const f = rowForce(s, r, stressAt(s, strainAt(c, r.y)), a);
    pn += f;
    mn += f * (centroid - r.y);
  }
  return { pn, mn, epsT: -strainAt(c, s.dt), a };
}

/** Pn, Mn, εt and φ at depth c (ACI 318-19 §22.2, Table 21.2.2). */
export function designPoint(s: ColumnSection, c: number): DesignPoint {
  const { pn, mn, epsT } = forcesAt(s, c);
  const phi = phiEpsT(epsT, s.fy, 'other', s.edition);
  return { c, pn, mn, epsT, phi, phiPn: phi * pn, phiMn: phi * mn };
}

/** The same point with the block and every row's strain, stress and force. */
export function strainPoint(s: ColumnSection, c: number): StrainPoint {
  positive('c', c);
  const point = designPoint(s, c);
  const a = Math.min(s.beta1 * c, s.h);
  const rows = s.rows.map((r): RowResult => {
    const eps = strainAt(c, r.y);
    const fs = stressAt(s, eps);
    return { y: r.y, count: r.count, area: r.area, eps, fs, force: rowForce(s, r, fs, a) };
  });
  return { ...point, a, cc: 0.85 * s.fc * a * s.b, rows };
}

/** The balanced point: εt = εty = fy/Es, c = 0.003 dt / (0.003 + εty) (ACI 318-19 §21.2.2.1). */
export function balancedPoint(s: ColumnSection): StrainPoint {
  const epsTy = s.fy / ES;
  return strainPoint(s, (EPS_CU * s.dt) / (EPS_CU + epsTy));
}

export interface AxialLimits {
  /** Po with fy ≤ 80 ksi (Eq. 22.4.2.2, §22.4.2.1). */
  po: number;
  /** Pn,max = 0.80 Po for ties (Table 22.4.2.1). */
  pnMax: number;
  /** φPn,max, φ = 0.65 (Table 21.2.2, compression-controlled, tied). */
  phiPnMax: number;
  /** Axial tension strength −fy Ast (§22.4.3.1 [from memory]) and its design value, φ = 0.90. */
  pnt: number;
  phiPnt: number;
}

export function axialLimits(s: ColumnSection): AxialLimits {
  const po = poColumn(s.fc, s.ag, s.ast, s.fy);
  const pnMax = 0.8 * po;
  const pnt = -s.fy * s.ast;
  return { po, pnMax, phiPnMax: 0.65 * pnMax, pnt, phiPnt: 0.9 * pnt };
}
