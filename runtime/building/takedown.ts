// Load takedown of one column mark: a row per level, roof first, each the load at the foot
// of the storey below that level (as the single-column template's Pu_0, Pu_1 ... and PD,
// PL at the footing). Dead load: slab and superimposed dead load over the tributary area of
// every level carried, plus the column's weight over the full storey height of every
// storey carried (as col_dead does). Floor live load is reduced by ASCE 7-22 §4.7 with AT
// summed over the floors carried (§4.7.2, Eq. 4.7-1 and the 0.50 / 0.40 limits, the
// 400 ft² threshold): live_reduced of the library, applied per group of floors that follow
// one rule —
//   reducible floors (Lo ≤ 100 psf, not assembly, not garage): Eq. 4.7-1 on their summed AT;
//   Lo > 100 psf (§4.7.3) or passenger-vehicle garages (§4.7.4): at most 20 %, two or more floors;
//   assembly (§4.7.5) or marked not reducible by the engineer: not reduced.
// Counting only a group's own floors and area errs on the side of less reduction. Roof live
// load Lr and snow S are taken at the roof, unreduced (the roof reduction of §4.8 is not
// taken: conservative). Pu is the governing strength combination (named), Ps the governing
// service combination for the soil.
//
// Cost: one pass down the levels with running sums, one live_reduced call per group per
// level; the per-level numbers every mark shares come prepared (storeys.ts).

import { liveReduced, type Occupancy } from '../library/loads-reduction';
import { comboAsd, comboUGoverning, strengthCombos, type AsceEdition } from '../library/loads-combinations';
import { LibraryError } from '../library/types';
import { psf } from '../units/si';
import type { PreparedStoreys, StoreyInput } from './storeys';

export interface ColumnOnPlan {
  /** Tributary area of one level, m². */
  AT: number;
  /** Live load element factor, ASCE 7-22 Table 4.7-1. */
  KLL: number;
  /** Column sides, m. */
  c1: number;
  c2: number;
}

export interface TakedownRow {
  level: string;
  /** Floors carried below the roof (0 in the roof row). */
  floors: number;
  /** Service loads carried at the foot of the storey, N. */
  D: number;
  L: number;
  Lr: number;
  S: number;
  /** Floor live load carried before reduction, N. */
  Lo: number;
  /** Factored load and the strength combination that gives it. */
  Pu: number;
  combo: string;
  /** Service load on the soil (governing service combination), N. */
  Ps: number;
}

type Rule = 'equation' | 'limited' | 'none';

/** Which §4.7 rule a floor's live load follows (see the header). */
export function liveRule(s: StoreyInput): Rule {
  if (!s.reducible || s.occupancy === 'assembly') return 'none';
  if (s.live > 100 * psf * (1 + 1e-12) || s.occupancy === 'garage') return 'limited';
  return 'equation';
}

interface Group {
  n: number;
  sumLo: number;
  /** The floor whose Lo (the largest) stands for the group in live_reduced. */
  repLo: number;
  repOcc: Occupancy;
}

/** Reduced live load of a group: live_reduced is proportional to Lo within one rule. */
function groupLive(g: Group, AT: number, KLL: number, reduce: boolean): number {
  if (g.n === 0 || g.sumLo === 0) return 0;
  if (!reduce) return AT * g.sumLo;
  const ratio = liveReduced(g.repLo, g.n * AT, KLL, g.n, g.repOcc) / g.repLo;
  return AT * g.sumLo * ratio;
}

function addFloor(g: Group, s: StoreyInput): void {
  g.n += 1;
  g.sumLo += s.live;
  if (s.live > g.repLo) {
    g.repLo = s.live;
    g.repOcc = s.occupancy;
  }
}

const newGroup = (): Group => ({ n: 0, sumLo: 0, repLo: 0, repOcc: 'general' });

/** The takedown of one mark, a row per level, roof first (see the header). */
export function takedown(st: PreparedStoreys, col: ColumnOnPlan, wc: number, asce: AsceEdition = '7-22'): TakedownRow[] {
  const { AT, KLL, c1, c2 } = col;
  if (!(AT > 0) || !(KLL > 0) || !(c1 > 0) || !(c2 > 0)) throw new LibraryError('AT, KLL, c1 and c2 must be greater than 0');
  const wCol = c1 * c2 * wc;
  const groups: Record<Rule, Group> = { equation: newGroup(), limited: newGroup(), none: newGroup() };
  const rows: TakedownRow[] = [];
  let D = 0;
  let Lr = 0;
  let S = 0;
  st.rows.forEach((s, k) => {
    D += AT * st.deadArea[k] + wCol * s.height;
    if (k === 0) {
      Lr = AT * s.live;
      S = AT * s.snow;
    } else {
      addFloor(groups[liveRule(s)], s);
    }
    const L = groupLive(groups.equation, AT, KLL, true) + groupLive(groups.limited, AT, KLL, true)
      + groupLive(groups.none, AT, KLL, false);
    const Lo = AT * (groups.equation.sumLo + groups.limited.sumLo + groups.none.sumLo);
    const u = comboUGoverning(D, L, Lr, S, 0, asce);
    rows.push({ level: s.level, floors: k, D, L, Lr, S, Lo, Pu: u.value, combo: strengthCombos(asce)[u.index], Ps: comboAsd(D, L, Lr, S, 0, asce) });
  });
  return rows;
}

/** Loads the engineer gives for a mark in place of the computed ones at its base (N). */
export interface LoadOverride {
  D?: number;
  L?: number;
  Lr?: number;
  S?: number;
}

/** The base row with the engineer's loads put in, Pu and Ps combined again. */
export function baseWithOverride(base: TakedownRow, o: LoadOverride | undefined, asce: AsceEdition = '7-22'): TakedownRow {
  if (!o || (o.D === undefined && o.L === undefined && o.Lr === undefined && o.S === undefined)) return base;
  const D = o.D ?? base.D;
  const L = o.L ?? base.L;
  const Lr = o.Lr ?? base.Lr;
  const S = o.S ?? base.S;
  const u = comboUGoverning(D, L, Lr, S, 0, asce);
  return { ...base, D, L, Lr, S, Pu: u.value, combo: strengthCombos(asce)[u.index], Ps: comboAsd(D, L, Lr, S, 0, asce) };
}
