// Every check of a spread footing under one column, as the single-column template makes
// them (docs-templates/load-path.lt, section "Spread footing"), through the same library
// functions, for a footing L (along x, the column side c1) × B (along y, c2) × h with one
// bar size each way. Moment at the column face and one-way shear at d from it are checked
// in both directions (ACI 318-19 §13.2.7.1–2), for a rectangular column with its own side
// each way; the steel of a rectangular footing's short direction goes partly in a central
// band (§13.3.3.3, footing-bars.ts). Bearing beyond φBn goes to the dowels (§16.3.1.2(a),
// as_dowel_req), which must also develop in the footing (ℓdc, §25.4.9). Each check is
// demand ≤ capacity with its ratio, so a sizing search can say which one fails.

import { qNetAllow, aReqFooting } from '../library/footing-area';
import { vuPunchFooting, vuOnewayFooting, onewayShear } from '../library/footing-shear';
import { muFooting, asMinFooting, asFooting } from '../library/footing-flexure';
import { ldBottom, ldAvailFooting } from '../library/footing-development';
import { a2Frustum, phiBnBearing } from '../library/footing-bearing';
import { punchingStrength } from '../library/punching-stress';
import { boPunch } from '../library/punching-perimeter';
import { phiMn } from '../library/flexure';
import { footingSMax, layout, spanOf, type Axis } from './footing-bars';
import { dowelDemand } from '../library/footing-bearing';
import { ldc, ldcAvailFooting } from '../library/footing-dowels';
import { epsT } from '../library/flexure';
import { phiAction } from '../library/resistance-factors';
import { barData } from '../library/rebar';
import { LibraryError } from '../library/types';
import type { Edition } from '../library/support-args';
import { inch } from '../units/si';

/** What every footing of the building shares: soil and materials. SI numbers. */
export interface FootingSite {
  /** Allowable soil pressure, gross, Pa. */
  qAllow: number;
  /** Depth of the footing base below grade, m. */
  Df: number;
  /** Unit weight of soil and fill, N/m³. */
  gammaSoil: number;
  /** Slab on grade and surcharge over the footing, Pa. */
  surcharge: number;
  /** Unit weight of concrete, N/m³. */
  wc: number;
  /** Footing concrete f'c and the column concrete f'c (for bearing on the column), Pa. */
  fcFooting: number;
  fcColumn: number;
  fy: number;
  /** Clear cover to the bottom bars (cast against earth), m. */
  cover: number;
  edition: Edition;
}

/** The column's loads and size at the top of its footing. */
export interface FootingDemand {
  Pu: number;
  /** Service load for the soil, N. */
  Ps: number;
  c1: number;
  c2: number;
}

/** A footing: plan L (x) × B (y), thickness h, `nx` bars along x (spread across B) and `ny` along y. */
export interface FootingDesign {
  L: number;
  B: number;
  h: number;
  bar: string;
  nx: number;
  ny: number;
  /** Short-direction bars in the central band of a rectangular footing (§13.3.3.3); the least that holds γs of them when absent. */
  nBand?: number;
  /** Dowels into the column; when absent the dowel checks wait until they are chosen. */
  dowelBar?: string;
  nDowel?: number;
}

export interface FootingCheck {
  name: string;
  clause: string;
  demand: number;
  capacity: number;
  /** demand / capacity; ≤ 1 passes. */
  ratio: number;
}

const ok = (c: FootingCheck) => c.ratio <= 1 + 1e-9;

/** Net allowable pressure left for the column (footing, fill and surcharge off), or undefined when none is left. */
export function netPressure(site: FootingSite, h: number): number | undefined {
  try {
    return qNetAllow(site.qAllow, h, site.wc, site.Df - h, site.gammaSoil, site.surcharge);
  } catch (e) {
    if (e instanceof LibraryError) return undefined;
    throw e;
  }
}

/** Effective depth to the contact of the two bar layers, as the template takes it. */
export function footingDepth(site: FootingSite, h: number, bar: string): number {
  return h - site.cover - barData(bar).dia;
}

function check(name: string, clause: string, demand: number, capacity: number): FootingCheck {
  return { name, clause, demand, capacity, ratio: capacity > 0 ? demand / capacity : Infinity };
}

/** Collects checks; with `failFast` it stops at the first that fails (a search only needs pass or fail). */
class Checks {
  readonly list: FootingCheck[] = [];
  constructor(private readonly failFast: boolean) {}
  /** Adds a check; false when the caller should stop. */
  add(name: string, clause: string, demand: number, capacity: number): boolean {
    const c = check(name, clause, demand, capacity);
    this.list.push(c);
    return !(this.failFast && !ok(c));
  }
}

/** One direction: bars along `axis` (cantilever from column side c), spread across the other side. */
function direction(axis: Axis, site: FootingSite, dem: FootingDemand, f: FootingDesign, d: number, out: Checks): boolean {
  const { span, width } = spanOf(f, axis);
  const [c, n] = axis === 'x' ? [dem.c1, f.nx] : [dem.c2, f.ny];
  const bar = barData(f.bar);
  const ed = site.edition;
  const As = n * bar.area;
  const lay = layout(site, f, axis, n, f.nBand);
  const rhoW = As / (width * d);
  const phiMnV = phiMn(As, width, d, site.fcFooting, site.fy, ed);
  return out.add(`one-way shear ${axis}`, 'ACI 318-19 §22.5.5.1, §13.2.7.2', vuOnewayFooting(dem.Pu, width, span, c, d),
    phiAction('shear') * onewayShear(site.fcFooting, width, d, rhoW, 1, ed).vc)
    && out.add(`flexure ${axis}`, 'ACI 318-19 §13.2.7.1, §22.2', muFooting(dem.Pu, width, span, c), phiMnV)
    // εt ≥ 0.004 (ACI 318-19 §7.3.3.1 / §8.3.3.1 for slabs, applied to footings as the template does; from memory)
    && out.add(`tension-controlled ${axis}`, 'ACI 318-19 §7.3.3.1, §21.2.2 (from memory)', 0.004, epsT(As, width, d, site.fcFooting, site.fy, ed))
    && out.add(`minimum steel ${axis}`, 'ACI 318-19 §13.3.3.1 (from memory)', asMinFooting(width, f.h, site.fy, ed), As)
    && (lay.gammaS === 1 || out.add(`central band ${axis}`, 'ACI 318-19 §13.3.3.3, Eq. 13.3.3.3', lay.gammaS * steelNeeded(site, dem, f, axis, d), lay.nBand * bar.area))
    && out.add(`bar spacing ${axis}`, 'ACI 318-19 §8.7.2.2, §13.3.3, Table 24.3.2 (fs = 2/3 fy)', lay.sMax, footingSMax(site, f.h))
    // clear spacing at least max(db, 1 in) (ACI 318-19 §25.2.1, from memory; aggregate not checked)
    && out.add(`clear spacing ${axis}`, 'ACI 318-19 §25.2.1 (from memory)', Math.max(bar.dia, 1 * inch), lay.sMin - bar.dia)
    && out.add(`development ${axis}`, 'ACI 318-19 §25.4.2, §13.2.8.1', ldBottom(bar.dia, site.fy, site.fcFooting, true, 1, 1, site.edition),
      (span - c) / 2 > site.cover ? ldAvailFooting(span, c, site.cover) : 0);
}

/** Steel the moment at the face needs along `axis`, at least the minimum (as_footing); Infinity when the section is too shallow. */
export function steelNeeded(site: FootingSite, dem: FootingDemand, f: FootingDesign, axis: Axis, d: number): number {
  const { span, width } = spanOf(f, axis);
  try {
    return asFooting(muFooting(dem.Pu, width, span, axis === 'x' ? dem.c1 : dem.c2), width, d, f.h, site.fcFooting, site.fy, 0.9, site.edition);
  } catch (e) {
    if (e instanceof LibraryError) return Infinity;
    throw e;
  }
}

/** Bearing at the column–footing interface, the lesser of column and footing (ACI 318-19 Table 22.8.3.2). */
export function bearingStrength(site: FootingSite, dem: FootingDemand, f: Pick<FootingDesign, 'L' | 'B' | 'h'>): number {
  const Ag = dem.c1 * dem.c2;
  return Math.min(phiBnBearing(site.fcColumn, Ag), phiBnBearing(site.fcFooting, Ag, a2Frustum(dem.c1, dem.c2, f.L, f.B, f.h)));
}

/** Dowel area needed: the bearing excess over φBn and 0.005 Ag, the larger (as_dowel_req). */
export function dowelAreaRequired(site: FootingSite, dem: FootingDemand, f: Pick<FootingDesign, 'L' | 'B' | 'h'>): number {
  return dowelDemand(dem.Pu, bearingStrength(site, dem, f), site.fy, dem.c1 * dem.c2).asReq;
}

function dowels(site: FootingSite, dem: FootingDemand, f: FootingDesign, out: Checks): boolean {
  if (f.dowelBar === undefined || f.nDowel === undefined) return true;
  const db = barData(f.dowelBar);
  const avail = f.h - site.cover - 2 * barData(f.bar).dia - db.dia;
  return out.add('dowels', 'ACI 318-19 §16.3.1.2(a), §16.3.4.1, Table 22.8.3.2', dowelAreaRequired(site, dem, f), f.nDowel * db.area)
    && out.add('dowel embedment', 'ACI 318-19 §25.4.9.2 (ℓdc, from memory)', ldc(db.dia, site.fy, site.fcFooting),
      avail > 0 ? ldcAvailFooting(f.h, site.cover, barData(f.bar).dia, db.dia) : 0);
}

/**
 * Every check of the footing, in the template's order. A size the library refuses (the
 * column larger than the footing, no depth left) comes back as a failed check of its own,
 * never as an exception, so a search can step past it. `failFast` stops at the first failure.
 */
export function footingChecks(site: FootingSite, dem: FootingDemand, f: FootingDesign, failFast = false): FootingCheck[] {
  const out = new Checks(failFast);
  const d = footingDepth(site, f.h, f.bar);
  if (f.h > site.Df) {
    out.add('footing within its depth', 'geometry: h ≤ Df', f.h, site.Df);
    return out.list;
  }
  const qNet = netPressure(site, f.h);
  if (qNet === undefined) {
    out.add('net soil pressure', 'q_allow − footing, fill and surcharge > 0', 1, 0);
    return out.list;
  }
  const go = out.add('area', 'ACI 318-19 §13.3.1.1', aReqFooting(dem.Ps, qNet), f.L * f.B)
    && out.add('depth above bottom bars', 'ACI 318-19 §13.3.1.2', 6 * inch, d);
  if (!go || d <= 0) return out.list;
  if (f.L <= dem.c1 || f.B <= dem.c2) {
    out.add('column within the footing', 'geometry', Math.max(dem.c1 / f.L, dem.c2 / f.B), 0);
    return out.list;
  }
  const bo = boPunch(dem.c1, dem.c2, d, 'interior');
  const vc2 = punchingStrength(site.fcFooting, dem.c1, dem.c2, d, 'interior', 1, site.edition).vc;
  void (out.add('two-way shear', 'ACI 318-19 §22.6.1.2, §13.2.7.2', vuPunchFooting(dem.Pu, f.B, f.L, dem.c1, dem.c2, d), phiAction('shear') * vc2 * bo * d)
    && direction('x', site, dem, f, d, out) && direction('y', site, dem, f, d, out)
    && dowels(site, dem, f, out));
  return out.list;
}

/** The first check that fails, or undefined when all pass. */
export function firstFailure(checks: readonly FootingCheck[]): FootingCheck | undefined {
  return checks.find((c) => !ok(c));
}

/** The check with the largest ratio. */
export function governing(checks: readonly FootingCheck[]): FootingCheck {
  if (checks.length === 0) throw new LibraryError('no checks');
  return checks.reduce((a, b) => (b.ratio > a.ratio ? b : a));
}

export function passes(checks: readonly FootingCheck[]): boolean {
  return checks.every(ok);
}
