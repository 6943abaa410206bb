// Every check of a spread footing under one column, as the single-column template makes
// them (docs-templates/load-path.lt, section "Spread footing"), through the same library
// functions, for a footing L (along x, the column side c1) × B (along y, c2) × h with one
// bar size each way. Moment and one-way shear are checked in both directions. Each check
// is demand ≤ capacity with its ratio, so a sizing search can say which one fails.

import { qNetAllow, aReqFooting } from '../library/footing-area';
import { vuPunchFooting, vuOnewayFooting, onewayShear } from '../library/footing-shear';
import { muFooting, asMinFooting } from '../library/footing-flexure';
import { ldBottom, ldAvailFooting } from '../library/footing-development';
import { a2Frustum, phiBnBearing } from '../library/footing-bearing';
import { punchingStrength } from '../library/punching-stress';
import { boPunch } from '../library/punching-perimeter';
import { phiMn } from '../library/flexure';
import { sMaxSlab } from '../library/reinforcement-limits';
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

/** One direction: bars along `span` (cantilever from column side c), spread across `width`. */
function direction(axis: 'x' | 'y', site: FootingSite, dem: FootingDemand, f: FootingDesign, d: number, out: Checks): boolean {
  const [span, width, c, n] = axis === 'x' ? [f.L, f.B, dem.c1, f.nx] : [f.B, f.L, dem.c2, f.ny];
  const bar = barData(f.bar);
  const ed = site.edition;
  const As = n * bar.area;
  const s = n > 1 ? (width - 2 * site.cover - bar.dia) / (n - 1) : Infinity;
  const rhoW = As / (width * d);
  return out.add(`one-way shear ${axis}`, 'ACI 318-19 §22.5.5.1, §13.2.7.2', vuOnewayFooting(dem.Pu, width, span, c, d),
    phiAction('shear') * onewayShear(site.fcFooting, width, d, rhoW, 1, ed).vc)
    && out.add(`flexure ${axis}`, 'ACI 318-19 §13.2.7.1, §22.2', muFooting(dem.Pu, width, span, c), phiMn(As, width, d, site.fcFooting, site.fy, ed))
    && out.add(`minimum steel ${axis}`, 'ACI 318-19 §13.3.3.1 (from memory)', asMinFooting(width, f.h, site.fy, ed), As)
    && out.add(`bar spacing ${axis}`, 'ACI 318-19 §8.7.2.2, §13.3.3 (as the template)', s, sMaxSlab(f.h, 'two-way'))
    // clear spacing at least max(db, 1 in) (ACI 318-19 §25.2.1, from memory; aggregate not checked)
    && out.add(`clear spacing ${axis}`, 'ACI 318-19 §25.2.1 (from memory)', Math.max(bar.dia, 1 * inch), s - bar.dia)
    && out.add(`development ${axis}`, 'ACI 318-19 §25.4.2, §13.2.8.1', ldBottom(bar.dia, site.fy, site.fcFooting, true, 1, 1, site.edition),
      (span - c) / 2 > site.cover ? ldAvailFooting(span, c, site.cover) : 0);
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
  const Ag = dem.c1 * dem.c2;
  void (out.add('two-way shear', 'ACI 318-19 §22.6.1.2, §13.2.7.2', vuPunchFooting(dem.Pu, f.B, f.L, dem.c1, dem.c2, d), phiAction('shear') * vc2 * bo * d)
    && direction('x', site, dem, f, d, out) && direction('y', site, dem, f, d, out)
    && out.add('bearing on the footing', 'ACI 318-19 §22.8.3.2', dem.Pu, phiBnBearing(site.fcFooting, Ag, a2Frustum(dem.c1, dem.c2, f.L, f.B, f.h)))
    && out.add('bearing on the column', 'ACI 318-19 §22.8.3.2', dem.Pu, phiBnBearing(site.fcColumn, Ag)));
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
