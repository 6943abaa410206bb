// The slab in plan as disjoint rectangles. The slab is the union of the bays that have
// slab, each pushed out by the overhang of the side it faces (so the outer edges, and the
// edges at bays without slab, stand off their grid lines by that side's overhang; corners
// are square). Cutting the plan at every grid line, mid-span line and slab edge gives cells
// that lie wholly inside or wholly outside the slab, and wholly on one side of every
// mid-span line: the pieces the tributary split works on.

import type { Plan } from './plan';
import type { Rect } from './polygon';

/** Sorted coordinates with near-equal values (within 1e-9 m) merged. */
function cuts(values: number[]): number[] {
  const sorted = [...values].sort((a, b) => a - b);
  const out: number[] = [];
  for (const v of sorted) if (out.length === 0 || v - out[out.length - 1] > 1e-9) out.push(v);
  return out;
}

function axisCuts(lines: number[], before: number, after: number): number[] {
  const v: number[] = [];
  lines.forEach((x, k) => {
    v.push(x, x - before, x + after);
    if (k + 1 < lines.length) v.push((x + lines[k + 1]) / 2);
  });
  return cuts(v);
}

/** The bays with slab, each pushed out by the overhangs. */
export function slabRects(plan: Plan): Rect[] {
  const { xs, ys, overhang: o } = plan;
  const out: Rect[] = [];
  for (let i = 0; i + 1 < xs.length; i++) {
    for (let j = 0; j + 1 < ys.length; j++) {
      if (plan.slab[i][j]) out.push({ x0: xs[i] - o.left, x1: xs[i + 1] + o.right, y0: ys[j] - o.bottom, y1: ys[j + 1] + o.top });
    }
  }
  return out;
}

/** Index of the first value ≥ v in sorted `a` (binary search). */
function lowerBound(a: number[], v: number): number {
  let lo = 0;
  let hi = a.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (a[mid] < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Disjoint rectangles whose union is the slab (see the header). */
export function slabPieces(plan: Plan): Rect[] {
  const { xs, ys, overhang: o } = plan;
  const cx = axisCuts(xs, o.left, o.right);
  const cy = axisCuts(ys, o.bottom, o.top);
  const inside = Array.from({ length: cx.length - 1 }, () => new Array<boolean>(cy.length - 1).fill(false));
  // Mark the cells each pushed-out bay covers: its edges are among the cuts.
  for (const r of slabRects(plan)) {
    const a0 = lowerBound(cx, r.x0 - 1e-9);
    const b0 = lowerBound(cy, r.y0 - 1e-9);
    for (let a = a0; a + 1 < cx.length && cx[a + 1] <= r.x1 + 1e-9; a++) {
      for (let b = b0; b + 1 < cy.length && cy[b + 1] <= r.y1 + 1e-9; b++) inside[a][b] = true;
    }
  }
  const out: Rect[] = [];
  for (let a = 0; a + 1 < cx.length; a++) {
    for (let b = 0; b + 1 < cy.length; b++) if (inside[a][b]) out.push({ x0: cx[a], x1: cx[a + 1], y0: cy[b], y1: cy[b + 1] });
  }
  return out;
}

/** Plan area of the slab (one level), m². */
export function slabArea(plan: Plan): number {
  return slabPieces(plan).reduce((s, r) => s + (r.x1 - r.x0) * (r.y1 - r.y0), 0);
}
