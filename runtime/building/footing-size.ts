// Sizing a square spread footing: the smallest plan side in the engineer's step for which
// some thickness passes every check, then the smallest thickness in its own step at that
// side, then the bars: of the bar sizes allowed, the one with the least steel (ties: fewer
// bars) that passes every check. So one step smaller in plan fails a check at every
// thickness, and one step thinner fails a check with every bar (the property the tests hold
// it to). A footing of fixed size is only checked (bars chosen when not given).
//
// Thickness starts where the depth above the bars can reach 6 in (ACI 318-19 §13.3.1.2) and
// stops at the base depth Df (the footing cannot rise above grade).

import { asFooting, muFooting } from '../library/footing-flexure';
import { sMaxSlab } from '../library/reinforcement-limits';
import { barData } from '../library/rebar';
import { LibraryError } from '../library/types';
import { aReqFooting } from '../library/footing-area';
import { phiBnBearing } from '../library/footing-bearing';
import { inch } from '../units/si';
import {
  firstFailure, footingChecks, footingDepth, governing, netPressure, passes,
  type FootingCheck, type FootingDemand, type FootingDesign, type FootingSite,
} from './footing-checks';

export interface SizingRules {
  /** Plan step, m (3 in by default). */
  planStep: number;
  /** Thickness step, m (1 in by default). */
  thicknessStep: number;
  /** Bar sizes allowed, e.g. ["#5", "#6", "#7", "#8"]. */
  bars: readonly string[];
}

export const DEFAULT_STEPS = { planStep: 3 * inch, thicknessStep: 1 * inch } as const;

export interface FootingResult {
  design: FootingDesign;
  checks: FootingCheck[];
  governing: FootingCheck;
  ok: boolean;
}

export type SizingOutcome = ({ sized: true } & FootingResult) | { sized: false; reason: string; check?: FootingCheck };

/** Bars each way for a footing of given size: `bar`, enough for the moment, the minimum and the greatest spacing. */
export function barsFor(site: FootingSite, dem: FootingDemand, L: number, B: number, h: number, bar: string): FootingDesign | undefined {
  const { area, dia } = barData(bar);
  const d = footingDepth(site, h, bar);
  if (d <= 0 || L <= dem.c1 || B <= dem.c2) return undefined;
  const sMax = sMaxSlab(h, 'two-way');
  const count = (span: number, width: number, c: number) => {
    let As: number;
    try {
      As = asFooting(muFooting(dem.Pu, width, span, c), width, d, h, site.fcFooting, site.fy, 0.9, site.edition);
    } catch (e) {
      if (e instanceof LibraryError) return undefined; // too shallow for the moment: flexure fails
      throw e;
    }
    const bySpacing = Math.ceil((width - 2 * site.cover - dia) / sMax - 1e-9) + 1;
    return Math.max(Math.ceil(As / area - 1e-9), bySpacing, 2);
  };
  const nx = count(L, B, dem.c1);
  const ny = count(B, L, dem.c2);
  if (nx === undefined || ny === undefined) return undefined;
  return { L, B, h, bar, nx, ny };
}

/** The passing design with the least steel at this size, or the least-bad failure. */
export function chooseBars(site: FootingSite, dem: FootingDemand, L: number, B: number, h: number, bars: readonly string[]): FootingResult {
  let best: FootingResult | undefined;
  let leastBad: FootingResult | undefined;
  const steel = (f: FootingDesign) => (f.nx * f.B + f.ny * f.L) * barData(f.bar).area;
  for (const bar of bars) {
    const design = barsFor(site, dem, L, B, h, bar) ?? { L, B, h, bar, nx: 2, ny: 2 };
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
function anyBarPasses(site: FootingSite, dem: FootingDemand, L: number, B: number, h: number, bars: readonly string[]): boolean {
  for (const bar of bars) {
    const design = barsFor(site, dem, L, B, h, bar);
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

/** Size a square footing for one column (see the header). */
export function sizeFooting(site: FootingSite, dem: FootingDemand, rules: SizingRules): SizingOutcome {
  if (rules.bars.length === 0) return { sized: false, reason: 'no bar sizes allowed' };
  if (!(rules.planStep > 0) || !(rules.thicknessStep > 0)) return { sized: false, reason: 'the plan and thickness steps must be greater than 0' };
  const hs = thicknesses(site, rules);
  if (hs.length === 0) return { sized: false, reason: 'the base is too shallow for any footing with 6 in above its bars' };
  // The least plan any thickness could need: area at the lightest footing, and wider than the column.
  // Heavier concrete than soil: the net pressure falls as h grows, so once the area fails it fails for every thicker footing.
  const areaFallsWithH = site.wc >= site.gammaSoil;
  const q0 = netPressure(site, areaFallsWithH ? hs[0] : hs[hs.length - 1]);
  if (q0 === undefined) return { sized: false, reason: 'no soil pressure is left for the column at the thinnest footing' };
  const step = rules.planStep;
  const first = Math.max(Math.ceil(Math.sqrt(aReqFooting(dem.Ps, q0)) / step - 1e-9), Math.ceil((Math.max(dem.c1, dem.c2) + 1e-6) / step));
  // Bearing on the column does not depend on the footing: no size can mend it.
  const colBearing = phiBnBearing(site.fcColumn, dem.c1 * dem.c2);
  if (dem.Pu > colBearing * (1 + 1e-9)) {
    return { sized: false, reason: 'bearing on the column fails whatever the footing (dowels must carry the excess)', check: { name: 'bearing on the column', clause: 'ACI 318-19 §22.8.3.2', demand: dem.Pu, capacity: colBearing, ratio: dem.Pu / colBearing } };
  }
  // Past 10 ft wider than the area needs, a spread footing is no longer the answer.
  const lastK = first + Math.ceil((10 * 12 * inch) / step);
  for (let k = first; k <= lastK; k++) {
    const B = k * step;
    for (const h of hs) {
      const q = netPressure(site, h);
      if (q === undefined || aReqFooting(dem.Ps, q) > B * B * (1 + 1e-9)) {
        if (areaFallsWithH) break;
        continue;
      }
      if (anyBarPasses(site, dem, B, B, h, rules.bars)) return { sized: true, ...chooseBars(site, dem, B, B, h, rules.bars) };
    }
  }
  const limit = lastK * step;
  const last = chooseBars(site, dem, limit, limit, hs[hs.length - 1], rules.bars);
  return { sized: false, reason: `no footing up to ${(limit / inch / 12).toFixed(1)} ft square and ${(site.Df / inch).toFixed(0)} in thick passes ${last.governing.name}`, check: last.governing };
}

/** Check a footing of fixed size; bars chosen from `bars` when the design gives none. */
export function checkFooting(site: FootingSite, dem: FootingDemand, f: Omit<FootingDesign, 'bar' | 'nx' | 'ny'> & Partial<FootingDesign>, bars: readonly string[]): FootingResult {
  if (f.bar !== undefined && f.nx !== undefined && f.ny !== undefined) {
    const design = f as FootingDesign;
    const checks = footingChecks(site, dem, design);
    return { design, checks, governing: governing(checks), ok: passes(checks) };
  }
  return chooseBars(site, dem, f.L, f.B, f.h, f.bar !== undefined ? [f.bar] : bars);
}
