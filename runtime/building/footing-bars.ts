// Where a footing's bars lie across its width, and how many it needs. Square footings, and
// the long-direction bars of a rectangular one, are spread uniformly across the width
// (ACI 318-19 §13.3.3.2, from memory). The short-direction bars of a rectangular footing are
// not: a portion γs = 2/(β + 1) of them goes in a central band as wide as the short side and
// the rest is spread uniformly outside it (§13.3.3.3, Eq. 13.3.3.3). Each group's spacing is
// held to the greatest spacing, min(2h, 18 in) (§8.7.2.2 via §13.3.4, as the template) and the
// crack-control spacing of Table 24.3.2 with fs = 2/3 fy (as the template's s_crack_f).
//
// Spacing of a group that owns a strip: strip / bars, each bar at the middle of its share
// (common practice); the uniform layer spans the width less the covers, (w − 2c − db)/(n − 1),
// as the template writes it.

import { gammaSBand } from '../library/footing-flexure';
import { sMaxCrack, sMaxSlab } from '../library/reinforcement-limits';
import { barData } from '../library/rebar';

/** What the layout reads of the site and the footing (kept here so the checks can import this file). */
interface BarSite { fy: number; cover: number }
interface Plan { L: number; B: number }
interface PlanBar extends Plan { bar: string }

export type Axis = 'x' | 'y';

/** Bars along `axis`: the span they cantilever over (from column side c) and the width they lie across. */
export function spanOf(f: Plan, axis: Axis): { span: number; width: number } {
  return axis === 'x' ? { span: f.L, width: f.B } : { span: f.B, width: f.L };
}

/** The bars along `axis` are the short-direction bars of a rectangular footing (a band is needed). */
export function banded(f: Plan, axis: Axis): boolean {
  const { span, width } = spanOf(f, axis);
  return width > span * (1 + 1e-9);
}

/** Greatest spacing of footing bars: min(2h, 18 in) and the crack-control spacing. */
export function footingSMax(site: BarSite, h: number): number {
  return Math.min(sMaxSlab(h, 'two-way'), sMaxCrack((2 / 3) * site.fy, site.cover));
}

export interface Layout {
  /** Bars in the central band (all of them when not banded). */
  nBand: number;
  /** Bars outside the band, on both sides together. */
  nOut: number;
  /** Least and greatest centre-to-centre spacing of the layer. */
  sMin: number;
  sMax: number;
  /** γs of Eq. 13.3.3.3 (1 when not banded). */
  gammaS: number;
}

/** The layout of `n` bars along `axis`; `nBand` as given or the least that holds γs of them. */
export function layout(site: BarSite, f: PlanBar, axis: Axis, n: number, nBandGiven?: number): Layout {
  const { span, width } = spanOf(f, axis);
  const db = barData(f.bar).dia;
  if (!banded(f, axis)) {
    const s = n > 1 ? (width - 2 * site.cover - db) / (n - 1) : Infinity;
    return { nBand: n, nOut: 0, sMin: s, sMax: s, gammaS: 1 };
  }
  const gammaS = gammaSBand(span, width);
  // a design given without its band count: the band's share of the bars as of the area
  const nBand = Math.min(n, nBandGiven ?? Math.ceil(gammaS * n - 1e-9));
  const nOut = n - nBand;
  const sBand = nBand > 0 ? span / nBand : Infinity;
  // the outside bars, half on each side (with an odd count the side with fewer spaces wider)
  const side = (width - span) / 2 - site.cover - db / 2;
  const perSide = Math.floor(nOut / 2);
  const sOut = perSide > 0 ? side / perSide : Infinity;
  return { nBand, nOut, sMin: Math.min(sBand, sOut), sMax: Math.max(sBand, sOut), gammaS };
}

/**
 * Least bars along `axis` for a steel area `asReq` (the larger of the moment's and the minimum)
 * with every group within `sMax`: uniform, or γs·As in the band and (1 − γs)·As outside it,
 * half on each side (§13.3.3.3). `nBand` is the band's share (all when not banded).
 */
export function barsNeeded(site: BarSite, f: PlanBar, axis: Axis, asReq: number, sMax: number): { n: number; nBand: number } {
  const { span, width } = spanOf(f, axis);
  const { dia: db, area } = barData(f.bar);
  const byArea = (a: number) => Math.ceil(a / area - 1e-9);
  if (!banded(f, axis)) {
    const n = Math.max(byArea(asReq), Math.ceil((width - 2 * site.cover - db) / sMax - 1e-9) + 1, 2);
    return { n, nBand: n };
  }
  const gammaS = gammaSBand(span, width);
  const side = (width - span) / 2 - site.cover - db / 2;
  const nBand = Math.max(byArea(gammaS * asReq), Math.ceil(span / sMax - 1e-9), 1);
  const perSide = Math.max(Math.ceil(byArea((1 - gammaS) * asReq) / 2), Math.ceil(side / sMax - 1e-9), 1);
  return { n: nBand + 2 * perSide, nBand };
}
