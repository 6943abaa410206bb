// Sizing a spread footing: the smallest plan in the engineer's step (square by default; or
// L/B held to a ratio, or B held to a width the site allows, L growing) for which some
// thickness passes every check, then the smallest thickness in its own step at that plan,
// then the bars: of the bar sizes allowed, the one with the least steel (ties: fewer bars)
// that passes every check, with the dowels the bearing excess needs. So one step smaller in
// plan fails a check at every thickness, and one step thinner fails a check with every bar
// (the property the tests hold it to). A footing of fixed size is only checked (bars chosen
// when not given).
//
// Thickness starts where the depth above the bars can reach 6 in (ACI 318-19 §13.3.1.2) and
// stops at the base depth Df (the footing cannot rise above grade).

import { asFooting, muFooting } from '../library/footing-flexure';
import { barData } from '../library/rebar';
import { LibraryError } from '../library/types';
import { aReqFooting } from '../library/footing-area';
import { barsNeeded, footingSMax } from './footing-bars';
import { inch } from '../units/si';
import {
  dowelAreaRequired, firstFailure, footingChecks, footingDepth, governing, netPressure, passes,
  type FootingCheck, type FootingDemand, type FootingDesign, type FootingSite,
} from './footing-checks';

export interface SizingRules {
  /** Plan step, m (3 in by default). */
  planStep: number;
  /** Thickness step, m (1 in by default). */
  thicknessStep: number;
  /** Bar sizes allowed, e.g. ["#5", "#6", "#7", "#8"]. */
  bars: readonly string[];
  /** Plan shape sought (square when absent). */
  shape?: FootingShape;
  /** Dowel bar size (#7 when absent, as the template). */
  dowelBar?: string;
}

/** The plans a search walks through: square; L = ratio·B (rounded up to the step); or B fixed, L sized. */
export type FootingShape = { kind: 'square' } | { kind: 'aspect'; ratio: number } | { kind: 'width'; B: number };

export const DEFAULT_DOWEL = '#7';
/** At least four dowels, one at each corner of the column (common practice). */
export const MIN_DOWELS = 4;

/** Plan number k of a shape (L along x, B along y). */
export function planAt(shape: FootingShape | undefined, k: number, step: number): { L: number; B: number } {
  if (!shape || shape.kind === 'square') return { L: k * step, B: k * step };
  if (shape.kind === 'aspect') return { L: Math.ceil((shape.ratio * k * step) / step - 1e-9) * step, B: k * step };
  return { L: k * step, B: shape.B };
}

export const DEFAULT_STEPS = { planStep: 3 * inch, thicknessStep: 1 * inch } as const;

export interface FootingResult {
  design: FootingDesign;
  checks: FootingCheck[];
  governing: FootingCheck;
  ok: boolean;
}

export type SizingOutcome = ({ sized: true } & FootingResult) | { sized: false; reason: string; check?: FootingCheck };

/** Bars each way for a footing of given size: `bar`, enough for the moment, the minimum and the greatest spacing; dowels for the bearing excess. */
export function barsFor(site: FootingSite, dem: FootingDemand, L: number, B: number, h: number, bar: string, dowelBar = DEFAULT_DOWEL): FootingDesign | undefined {
  const d = footingDepth(site, h, bar);
  if (d <= 0 || L <= dem.c1 || B <= dem.c2) return undefined;
  const sMax = footingSMax(site, h);
  const count = (axis: 'x' | 'y', span: number, width: number, c: number) => {
    let As: number;
    try {
      As = asFooting(muFooting(dem.Pu, width, span, c), width, d, h, site.fcFooting, site.fy, 0.9, site.edition);
    } catch (e) {
      if (e instanceof LibraryError) return undefined; // too shallow for the moment: flexure fails
      throw e;
    }
    return barsNeeded(site, { L, B, bar }, axis, As, sMax);
  };
  const nx = count('x', L, B, dem.c1);
  const ny = count('y', B, L, dem.c2);
  if (nx === undefined || ny === undefined) return undefined;
  const nDowel = Math.max(MIN_DOWELS, Math.ceil(dowelAreaRequired(site, dem, { L, B, h }) / barData(dowelBar).area - 1e-9));
  const design: FootingDesign = { L, B, h, bar, nx: nx.n, ny: ny.n, dowelBar, nDowel };
  // the short-direction bars of a rectangular footing say how many lie in the band
  if (nx.nBand !== nx.n) design.nBand = nx.nBand;
  if (ny.nBand !== ny.n) design.nBand = ny.nBand;
  return design;
}

/** The passing design with the least steel at this size, or the least-bad failure. */
export function chooseBars(site: FootingSite, dem: FootingDemand, L: number, B: number, h: number, bars: readonly string[], dowelBar = DEFAULT_DOWEL): FootingResult {
  let best: FootingResult | undefined;
  let leastBad: FootingResult | undefined;
  const steel = (f: FootingDesign) => (f.nx * f.B + f.ny * f.L) * barData(f.bar).area;
  for (const bar of bars) {
    const design = barsFor(site, dem, L, B, h, bar, dowelBar) ?? { L, B, h, bar, nx: 2, ny: 2 };
    const checks = footingChecks(site, dem, design);
    const r: FootingResult = { design, checks, governing: governing(checks), ok: passes(checks) };
    if (r.ok) {
      const better = !best || steel(design) < steel(best.design) - 1e-12
        || (Math.abs(steel(design) - steel(best.design)) <= 1e-12 && design.nx + design.ny < best.design.nx + best.design.ny);
      if (better) best = r;
    } else if (!leastBad || r.governing.ratio < leastBad.governing.ratio) {
      leastBad = r;
    }
  }
  return best ?? leastBad!;
}

/** Does some allowed bar pass every check at this size? (stops at the first that does) */
function anyBarPasses(site: FootingSite, dem: FootingDemand, L: number, B: number, h: number, bars: readonly string[], dowelBar: string): boolean {
  for (const bar of bars) {
    const design = barsFor(site, dem, L, B, h, bar, dowelBar);
    if (design && !firstFailure(footingChecks(site, dem, design, true))) return true;
  }
  return false;
}

/** Thicknesses to try, in the step: from where d can reach 6 in with the smallest bar, up to Df. */
function thicknesses(site: FootingSite, rules: SizingRules): number[] {
  const smallest = Math.min(...rules.bars.map((b) => barData(b).dia));
  const out: number[] = [];
  const step = rules.thicknessStep;
  // whole multiples of the step, so 28 in stays 28 in
  for (let k = Math.ceil((6 * inch + site.cover + smallest) / step - 1e-9); k * step <= site.Df + 1e-9; k++) out.push(k * step);
  return out;
}

/** The first plan number k whose plan is no smaller than `area` and wider than the column both ways. */
function firstPlan(shape: FootingShape | undefined, step: number, area: number, dem: FootingDemand): number | undefined {
  if (shape?.kind === 'width' && shape.B <= dem.c2) return undefined;
  const fits = (k: number) => {
    const p = planAt(shape, k, step);
    return p.L * p.B >= area * (1 - 1e-12) && p.L > dem.c1 && p.B > dem.c2;
  };
  // plans grow with k: find a k that fits by doubling, then the least by bisection
  let hi = 1;
  while (!fits(hi)) if ((hi *= 2) > 1e7) return undefined;
  let lo = 0;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (fits(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}

/** Size a footing for one column (see the header). */
export function sizeFooting(site: FootingSite, dem: FootingDemand, rules: SizingRules): SizingOutcome {
  if (rules.bars.length === 0) return { sized: false, reason: 'no bar sizes allowed' };
  if (!(rules.planStep > 0) || !(rules.thicknessStep > 0)) return { sized: false, reason: 'the plan and thickness steps must be greater than 0' };
  const shape = rules.shape;
  if (shape?.kind === 'aspect' && !(shape.ratio > 0)) return { sized: false, reason: 'the ratio L/B must be greater than 0' };
  const dowelBar = rules.dowelBar ?? DEFAULT_DOWEL;
  const hs = thicknesses(site, rules);
  if (hs.length === 0) return { sized: false, reason: 'the base is too shallow for any footing with 6 in above its bars' };
  // The least plan any thickness could need: area at the lightest footing, and wider than the column.
  // Heavier concrete than soil: the net pressure falls as h grows, so once the area fails it fails for every thicker footing.
  const areaFallsWithH = site.wc >= site.gammaSoil;
  const q0 = netPressure(site, areaFallsWithH ? hs[0] : hs[hs.length - 1]);
  if (q0 === undefined) return { sized: false, reason: 'no soil pressure is left for the column at the thinnest footing' };
  const step = rules.planStep;
  const first = firstPlan(shape, step, aReqFooting(dem.Ps, q0), dem);
  if (first === undefined) return { sized: false, reason: 'the fixed width is no wider than the column' };
  // Past 10 ft wider than the area needs, a spread footing is no longer the answer.
  const lastK = first + Math.ceil((10 * 12 * inch) / step);
  for (let k = first; k <= lastK; k++) {
    const { L, B } = planAt(shape, k, step);
    for (const h of hs) {
      const q = netPressure(site, h);
      if (q === undefined || aReqFooting(dem.Ps, q) > L * B * (1 + 1e-9)) {
        if (areaFallsWithH) break;
        continue;
      }
      if (anyBarPasses(site, dem, L, B, h, rules.bars, dowelBar)) return { sized: true, ...chooseBars(site, dem, L, B, h, rules.bars, dowelBar) };
    }
  }
  const limit = planAt(shape, lastK, step);
  const last = chooseBars(site, dem, limit.L, limit.B, hs[hs.length - 1], rules.bars, dowelBar);
  const ftIn = (v: number) => (v / inch / 12).toFixed(1);
  return { sized: false, reason: `no footing up to ${ftIn(limit.L)} × ${ftIn(limit.B)} ft and ${(site.Df / inch).toFixed(0)} in thick passes ${last.governing.name}`, check: last.governing };
}

/** Check a footing of fixed size; bars chosen from `bars` when the design gives none. */
export function checkFooting(site: FootingSite, dem: FootingDemand, f: Omit<FootingDesign, 'bar' | 'nx' | 'ny'> & Partial<FootingDesign>, bars: readonly string[], dowelBar = DEFAULT_DOWEL): FootingResult {
  if (f.bar !== undefined && f.nx !== undefined && f.ny !== undefined) {
    const given = f as FootingDesign;
    // dowels the engineer did not give are chosen as for a sized footing
    const design = given.nDowel !== undefined ? given : { ...given, dowelBar: given.dowelBar ?? dowelBar,
      nDowel: Math.max(MIN_DOWELS, Math.ceil(dowelAreaRequired(site, dem, given) / barData(given.dowelBar ?? dowelBar).area - 1e-9)) };
    const checks = footingChecks(site, dem, design);
    return { design, checks, governing: governing(checks), ok: passes(checks) };
  }
  return chooseBars(site, dem, f.L, f.B, f.h, f.bar !== undefined ? [f.bar] : bars, f.dowelBar ?? dowelBar);
}
