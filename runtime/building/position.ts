// Where a column sits in the slab, from the plan: its class for live load reduction
// (ASCE 7-22 Table 4.7-1, KLL) and for punching (ACI 318-19 §22.6.4, perimeter and αs).
//
// In plan, the four bays around a column decide: all four with slab, interior; two on one
// side, edge (the other side is free); one, corner; three, a re-entrant corner. A free
// side has a cantilever slab when that side's overhang is more than 0.

import { LibraryError } from '../library/types';
import { quadrants, type Overhang, type Plan, type PlacedMark, type Side } from './plan';

export type PlanClass = 'interior' | 'edge' | 'corner' | 're-entrant';

export interface PlanPosition {
  kind: PlanClass;
  /** Sides with no slab bay beyond the column (edge: one; corner: two). */
  free: Side[];
  /** Re-entrant corner: the two sides that face the bay without slab. */
  open: Side[];
}

/** The column's class in plan (see the header). */
export function planPosition(plan: Plan, m: PlacedMark): PlanPosition {
  const [ll, lr, ul, ur] = quadrants(plan.slab, m.i, m.j);
  const n = [ll, lr, ul, ur].filter(Boolean).length;
  if (n === 4) return { kind: 'interior', free: [], open: [] };
  if (n === 3) {
    const open: Side[] = [!ll || !ul ? 'left' : 'right', !ll || !lr ? 'bottom' : 'top'];
    return { kind: 're-entrant', free: [], open };
  }
  const free: Side[] = [];
  if (!ll && !ul) free.push('left');
  if (!lr && !ur) free.push('right');
  if (!ll && !lr) free.push('bottom');
  if (!ul && !ur) free.push('top');
  // n = 2 on one side gives one free side; n = 1 gives two (planIssues rejects diagonal pairs).
  return { kind: n === 2 ? 'edge' : 'corner', free, open: [] };
}

export interface KllClass {
  KLL: number;
  /** The Table 4.7-1 row (or the stated rule) it comes from. */
  element: string;
  rule: string;
}

const cantilevered = (o: Overhang, sides: Side[]) => sides.some((s) => o[s] > 0);

/**
 * KLL for a column (ASCE 7-22 Table 4.7-1): interior 4; exterior without cantilever slabs 4;
 * edge with cantilever slabs 3; corner with cantilever slabs 2. A corner with a cantilever on
 * one side only is taken as a corner with cantilever slabs (2: less reduction, conservative;
 * common practice). A re-entrant corner column is an exterior column: without a cantilever
 * its influence area is its three bays, 4 × AT (AT = three quarter-bays), so 4, the
 * "exterior without cantilever slabs" row; with a cantilever into the open bay it is taken
 * as an edge column with cantilever slabs, 3 (common practice; for a square bay s × s and
 * overhang o the influence/tributary ratio (3s² + 2os + o²)/(3s²/4 + os + o²) stays ≥ 3 up
 * to o = 0.41 s, so 3 errs on the side of less reduction there).
 */
export function kllClass(plan: Plan, pos: PlanPosition): KllClass {
  const o = plan.overhang;
  const T = 'ASCE 7-22 Table 4.7-1';
  switch (pos.kind) {
    case 'interior':
      return { KLL: 4, element: 'interior-column', rule: `${T}: interior column` };
    case 'edge':
      return cantilevered(o, pos.free)
        ? { KLL: 3, element: 'edge-column-cantilever', rule: `${T}: edge column with cantilever slab` }
        : { KLL: 4, element: 'exterior-column', rule: `${T}: exterior column without cantilever slabs` };
    case 'corner':
      return cantilevered(o, pos.free)
        ? { KLL: 2, element: 'corner-column-cantilever', rule: `${T}: corner column with cantilever slab(s) (one side only: common practice)` }
        : { KLL: 4, element: 'exterior-column', rule: `${T}: exterior column without cantilever slabs` };
    case 're-entrant':
      return cantilevered(o, pos.open)
        ? { KLL: 3, element: 'edge-column-cantilever', rule: `${T}: re-entrant corner with cantilever, taken as edge column with cantilever slab (common practice)` }
        : { KLL: 4, element: 'exterior-column', rule: `${T}: re-entrant corner, exterior column without cantilever slabs (influence area 4 AT)` };
  }
}

export type PunchingClass = 'interior' | 'edge' | 'corner';

export interface PunchingPosition {
  position: PunchingClass;
  /** αs of ACI 318-19 Table 22.6.5.2 for that position: 40, 30, 20. */
  alphaS: number;
  /** Sides where the critical section runs out to the slab edge. */
  openSides: Side[];
  rule: string;
}

const ALPHA_S: Record<PunchingClass, number> = { interior: 40, edge: 30, corner: 20 };

/** Perimeter of the section at d/2 with the sides in `open` run out to the slab edge (legs lengthened by e). */
function perimeter(c1: number, c2: number, d: number, e: Record<Side, number>, open: Set<Side>): number {
  const ext = (s: Side, c: number) => c / 2 + (open.has(s) ? e[s] : d / 2);
  const wx = ext('left', c1) + ext('right', c1);
  const wy = ext('bottom', c2) + ext('top', c2);
  return (open.has('left') ? 0 : wy) + (open.has('right') ? 0 : wy) + (open.has('bottom') ? 0 : wx) + (open.has('top') ? 0 : wx);
}

/**
 * Punching class of a column with sides c1 (along x) × c2 (along y) under a slab of
 * effective depth d. ACI 318-19 §22.6.4.1 places the critical section at d/2 from the
 * column faces so that bo is a minimum (from memory). On a free side with edge distance e
 * from the face (the overhang less c/2; 0 for a flush or overhanging column) the section
 * either closes round the face (only when e ≥ d/2) or runs out to the edge; of every
 * choice the least perimeter decides: no side open, interior; one, edge; two, corner. For
 * a single free side this closes the section when e ≥ c/2 + d (c the face along the edge).
 * A re-entrant corner column is interior when the section's corner in the open bay lies on
 * slab; otherwise it is taken as an edge column (three-sided section, αs = 30): common
 * practice, conservative since for a square column three sides 3c + 2d are less than the
 * interior perimeter with its open corner cut away, 3c + 3d at the least.
 */
export function punchingPosition(plan: Plan, pos: PlanPosition, c1: number, c2: number, d: number): PunchingPosition {
  if (!(c1 > 0) || !(c2 > 0) || !(d > 0)) throw new LibraryError('c1, c2 and d must be greater than 0');
  const o = plan.overhang;
  const clause = 'ACI 318-19 §22.6.4.1 (bo a minimum, from memory)';
  if (pos.kind === 're-entrant') {
    const [sx, sy] = pos.open;
    const cornerOnSlab = c1 / 2 + d / 2 <= o[sx] || c2 / 2 + d / 2 <= o[sy];
    return cornerOnSlab
      ? { position: 'interior', alphaS: 40, openSides: [], rule: `${clause}: re-entrant corner, section on slab` }
      : { position: 'edge', alphaS: 30, openSides: [], rule: 're-entrant corner, section cut by the open bay: taken as edge (common practice)' };
  }
  const e: Record<Side, number> = {
    left: Math.max(0, o.left - c1 / 2), right: Math.max(0, o.right - c1 / 2),
    bottom: Math.max(0, o.bottom - c2 / 2), top: Math.max(0, o.top - c2 / 2),
  };
  const free = pos.free;
  let best: { bo: number; open: Side[] } | undefined;
  for (let mask = 0; mask < 1 << free.length; mask++) {
    const open = free.filter((_, k) => mask & (1 << k));
    // A side that cannot hold the section at d/2 must run out to the edge.
    if (free.some((s) => !open.includes(s) && e[s] < d / 2)) continue;
    const bo = perimeter(c1, c2, d, e, new Set(open));
    if (!best || bo <= best.bo + 1e-12) best = { bo, open }; // a tie goes to the more open (lower αs)
  }
  const open = best!.open;
  const position: PunchingClass = open.length === 0 ? 'interior' : open.length === 1 ? 'edge' : 'corner';
  return { position, alphaS: ALPHA_S[position], openSides: open, rule: clause };
}
