// Grouping sized footings into types: a footing schedule lists a few types, not a size per
// column. Largest first, each footing joins the type opened by the largest one above it
// when every member's plan stays within the engineer's tolerance of the type's, both ways;
// otherwise it opens a new type. A type is as long (x) as its longest member, as wide (y) as its widest and as thick
// as its thickest, with the bars and dowels that pass every check for every member (thicker
// in the step when no bar size does): so a mark is only ever rounded up to its type, never
// down, in either plan direction or in thickness. Types are named prefix + number,
// the smallest first (F1, F2, ...).

import { barData } from '../library/rebar';
import { footingChecks, governing, passes, type FootingCheck, type FootingDemand, type FootingDesign, type FootingSite } from './footing-checks';
import { barsFor, DEFAULT_DOWEL, type SizingRules } from './footing-size';

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

/** The type's footing: bars that pass every member at L × B and thickness h, least steel; thicker when none does. */
function typeDesign(site: FootingSite, members: SizedMark[], L: number, B: number, h0: number, rules: GroupRules): { design: FootingDesign; checks: Map<string, FootingCheck[]>; ok: boolean } {
  let fallback: { design: FootingDesign; checks: Map<string, FootingCheck[]>; ok: boolean } | undefined;
  const dowelBar = rules.dowelBar ?? DEFAULT_DOWEL;
  for (let k = Math.round(h0 / rules.thicknessStep); k * rules.thicknessStep <= site.Df + 1e-9; k++) {
    const h = k * rules.thicknessStep;
    let best: { design: FootingDesign; checks: Map<string, FootingCheck[]>; steel: number } | undefined;
    for (const bar of rules.bars) {
      const each = members.map((m) => barsFor(site, m.demand, L, B, h, bar, dowelBar));
      if (each.some((d) => d === undefined)) continue;
      const most = (key: 'nx' | 'ny' | 'nDowel') => Math.max(...each.map((d) => d![key] ?? 0));
      const design: FootingDesign = { L, B, h, bar, nx: most('nx'), ny: most('ny'), dowelBar, nDowel: most('nDowel') };
      const checks = new Map(members.map((m) => [m.mark, footingChecks(site, m.demand, design)]));
      const steel = (design.nx * B + design.ny * L) * barData(bar).area;
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
  // a mark joins the open type when every member stays within the tolerance of the type's plan, both ways
  const spread = (ms: SizedMark[], key: 'L' | 'B') => Math.max(...ms.map((m) => m.footing[key])) - Math.min(...ms.map((m) => m.footing[key]));
  for (const m of order) {
    const open = groups[groups.length - 1];
    const joined = open ? [...open, m] : undefined;
    if (joined && spread(joined, 'B') <= rules.tolerance + 1e-9 && spread(joined, 'L') <= rules.tolerance + 1e-9) open.push(m);
    else groups.push([m]);
  }
  const types = groups.reverse().map((members, k): FootingType => {
    const L = Math.max(...members.map((m) => m.footing.L));
    const B = Math.max(...members.map((m) => m.footing.B));
    const h = Math.max(...members.map((m) => m.footing.h));
    const t = typeDesign(site, members, L, B, h, rules);
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
