// Grouping sized footings into types: a footing schedule lists a few types, not a size per
// column. Largest first, each footing joins the type opened by the largest one above it
// when its plan is within the engineer's tolerance of that type's; otherwise it opens a new
// type. A type is as wide as its widest member and as thick as its thickest, with the bars
// that pass every check for every member (thicker in the step when no bar size does): so a
// mark is only ever rounded up to its type, never down. Types are named prefix + number,
// the smallest first (F1, F2, ...).

import { barData } from '../library/rebar';
import { footingChecks, governing, passes, type FootingCheck, type FootingDemand, type FootingDesign, type FootingSite } from './footing-checks';
import { barsFor, type SizingRules } from './footing-size';

export interface SizedMark {
  mark: string;
  demand: FootingDemand;
  footing: FootingDesign;
}

export interface GroupRules extends SizingRules {
  /** Type names: prefix + number ("F" gives F1, F2, ...). */
  prefix: string;
  /** Largest plan difference, m, for which a footing takes the next larger type. */
  tolerance: number;
}

export interface FootingType {
  name: string;
  design: FootingDesign;
  marks: string[];
  /** Every member's checks on the type's footing. */
  checks: Map<string, FootingCheck[]>;
  /** The worst check over the members. */
  governing: { mark: string; check: FootingCheck };
  ok: boolean;
}

export interface Grouping {
  types: FootingType[];
  typeOf: Map<string, string>;
}

/** The type's footing: bars that pass every member at width B and thickness h, least steel; thicker when none does. */
function typeDesign(site: FootingSite, members: SizedMark[], B: number, h0: number, rules: GroupRules): { design: FootingDesign; checks: Map<string, FootingCheck[]>; ok: boolean } {
  let fallback: { design: FootingDesign; checks: Map<string, FootingCheck[]>; ok: boolean } | undefined;
  for (let k = Math.round(h0 / rules.thicknessStep); k * rules.thicknessStep <= site.Df + 1e-9; k++) {
    const h = k * rules.thicknessStep;
    let best: { design: FootingDesign; checks: Map<string, FootingCheck[]>; steel: number } | undefined;
    for (const bar of rules.bars) {
      const each = members.map((m) => barsFor(site, m.demand, B, B, h, bar));
      if (each.some((d) => d === undefined)) continue;
      const design: FootingDesign = { L: B, B, h, bar, nx: Math.max(...each.map((d) => d!.nx)), ny: Math.max(...each.map((d) => d!.ny)) };
      const checks = new Map(members.map((m) => [m.mark, footingChecks(site, m.demand, design)]));
      const steel = (design.nx + design.ny) * B * barData(bar).area;
      if ([...checks.values()].every(passes)) {
        if (!best || steel < best.steel - 1e-12) best = { design, checks, steel };
      } else if (!fallback) {
        fallback = { design, checks, ok: false };
      }
    }
    if (best) return { design: best.design, checks: best.checks, ok: true };
  }
  return fallback ?? { design: { ...members[0].footing }, checks: new Map(members.map((m) => [m.mark, footingChecks(site, m.demand, members[0].footing)])), ok: false };
}

/** Group sized footings into types (see the header). */
export function groupFootings(site: FootingSite, marks: readonly SizedMark[], rules: GroupRules): Grouping {
  const order = [...marks].sort((a, b) => b.footing.B - a.footing.B || b.footing.L - a.footing.L || b.footing.h - a.footing.h);
  const groups: SizedMark[][] = [];
  for (const m of order) {
    const open = groups[groups.length - 1];
    const lead = open?.[0].footing;
    if (lead && lead.B - m.footing.B <= rules.tolerance + 1e-9 && lead.L - m.footing.L <= rules.tolerance + 1e-9) open.push(m);
    else groups.push([m]);
  }
  const types = groups.reverse().map((members, k): FootingType => {
    const B = Math.max(...members.map((m) => Math.max(m.footing.B, m.footing.L)));
    const h = Math.max(...members.map((m) => m.footing.h));
    const t = typeDesign(site, members, B, h, rules);
    let worst: { mark: string; check: FootingCheck } | undefined;
    for (const [mark, checks] of t.checks) {
      const g = governing(checks);
      if (!worst || g.ratio > worst.check.ratio) worst = { mark, check: g };
    }
    return { name: `${rules.prefix}${k + 1}`, design: t.design, marks: members.map((m) => m.mark), checks: t.checks, governing: worst!, ok: t.ok };
  });
  const typeOf = new Map<string, string>();
  for (const t of types) for (const m of t.marks) typeOf.set(m, t.name);
  return { types, typeOf };
}
