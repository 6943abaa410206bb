// Tributary area of every column mark by the mid-span rule: each part of the slab goes to
// the column nearest to it, so the boundary between two columns is the perpendicular
// bisector of the line joining them: on a full rectangular grid, the mid-span lines
// (common practice: the half-bay rule). The overhang beyond an edge falls to the edge and
// corner columns; the area of an omitted column goes to its neighbours by the same rule,
// split at the mid-span lines between the columns that remain.
//
// On a full grid the nearest column to a point is the one at the nearest x line and the
// nearest y line (distances add up per axis), so most pieces are assigned by lookup. Only
// pieces whose nearest intersection has no column are cut by bisectors (polygon.ts).

import type { Plan, PlacedMark } from './plan';
import { slabPieces } from './slab';
import { clipNearer, polygonArea, rectDistance, rectFarthest, rectPolygon, type Point, type Polygon, type Rect } from './polygon';

export interface MarkTributary {
  mark: string;
  /** Tributary area of one level, m². */
  area: number;
  /** The plan pieces that make it up (rectangles, and polygons where a column is omitted). */
  pieces: Polygon[];
}

export interface Tributary {
  /** One entry per mark, in the order of plan.marks. */
  marks: MarkTributary[];
  /** Slab area of one level, m² (the sum of every mark's area). */
  slabArea: number;
}

function nearestIndex(lines: number[], v: number): number {
  let lo = 0;
  let hi = lines.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (lines[mid] <= v) lo = mid;
    else hi = mid;
  }
  return Math.abs(v - lines[lo]) <= Math.abs(v - lines[hi]) ? lo : hi;
}

/** Split a piece among the marks nearest to its points (a bounded Voronoi cut). */
function splitByNearest(r: Rect, marks: PlacedMark[]): { k: number; poly: Polygon }[] {
  const at = (m: PlacedMark): Point => [m.x, m.y];
  // Every point of r is within `reach` of some mark; a mark farther than that from all of r owns none of it.
  let reach = Infinity;
  for (const m of marks) reach = Math.min(reach, rectFarthest(r, at(m)));
  const near = marks.map((m, k) => ({ m, k })).filter(({ m }) => rectDistance(r, at(m)) <= reach + 1e-9);
  const out: { k: number; poly: Polygon }[] = [];
  for (const a of near) {
    let poly = rectPolygon(r);
    for (const b of near) {
      if (b === a) continue;
      poly = clipNearer(poly, at(a.m), at(b.m));
      if (poly.length === 0) break;
    }
    if (poly.length > 0) out.push({ k: a.k, poly });
  }
  return out;
}

/** Tributary area of each mark on one level (see the header). */
export function tributary(plan: Plan): Tributary {
  const byNode = new Map<string, number>();
  plan.marks.forEach((m, k) => byNode.set(`${m.i},${m.j}`, k));
  const marks: MarkTributary[] = plan.marks.map((m) => ({ mark: m.mark, area: 0, pieces: [] }));
  let total = 0;
  for (const r of slabPieces(plan)) {
    const area = (r.x1 - r.x0) * (r.y1 - r.y0);
    total += area;
    const i = nearestIndex(plan.xs, (r.x0 + r.x1) / 2);
    const j = nearestIndex(plan.ys, (r.y0 + r.y1) / 2);
    const k = byNode.get(`${i},${j}`);
    if (k !== undefined) {
      marks[k].area += area;
      marks[k].pieces.push(rectPolygon(r));
      continue;
    }
    for (const part of splitByNearest(r, plan.marks)) {
      marks[part.k].area += polygonArea(part.poly);
      marks[part.k].pieces.push(part.poly);
    }
  }
  return { marks, slabArea: total };
}
