// Plane polygons for the tributary split: convex polygons cut by half-planes
// (Sutherland–Hodgman, one clipping edge) and their area (shoelace formula).

export type Point = readonly [number, number];
export type Polygon = Point[];

export interface Rect {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

export function rectPolygon(r: Rect): Polygon {
  return [[r.x0, r.y0], [r.x1, r.y0], [r.x1, r.y1], [r.x0, r.y1]];
}

/** Area of a simple polygon (shoelace formula), positive for either winding. */
export function polygonArea(p: Polygon): number {
  let twice = 0;
  for (let k = 0; k < p.length; k++) {
    const [x0, y0] = p[k];
    const [x1, y1] = p[(k + 1) % p.length];
    twice += x0 * y1 - x1 * y0;
  }
  return Math.abs(twice) / 2;
}

/** The part of convex polygon `p` where a·x + b·y ≤ c. */
export function clipHalfPlane(p: Polygon, a: number, b: number, c: number): Polygon {
  const out: Polygon = [];
  const side = (q: Point) => a * q[0] + b * q[1] - c;
  for (let k = 0; k < p.length; k++) {
    const cur = p[k];
    const next = p[(k + 1) % p.length];
    const sc = side(cur);
    const sn = side(next);
    if (sc <= 0) out.push(cur);
    if ((sc < 0 && sn > 0) || (sc > 0 && sn < 0)) {
      const t = sc / (sc - sn);
      out.push([cur[0] + t * (next[0] - cur[0]), cur[1] + t * (next[1] - cur[1])]);
    }
  }
  return out.length >= 3 ? out : [];
}

/** The part of convex polygon `p` nearer to point `a` than to point `b` (their perpendicular bisector). */
export function clipNearer(p: Polygon, a: Point, b: Point): Polygon {
  // |q − a|² ≤ |q − b|²  ⇔  2(b − a)·q ≤ |b|² − |a|²
  const nx = 2 * (b[0] - a[0]);
  const ny = 2 * (b[1] - a[1]);
  const c = b[0] * b[0] + b[1] * b[1] - a[0] * a[0] - a[1] * a[1];
  return clipHalfPlane(p, nx, ny, c);
}

/** Least distance from point q to rectangle r (0 inside). */
export function rectDistance(r: Rect, q: Point): number {
  const dx = Math.max(r.x0 - q[0], 0, q[0] - r.x1);
  const dy = Math.max(r.y0 - q[1], 0, q[1] - r.y1);
  return Math.hypot(dx, dy);
}

/** Greatest distance from point q to rectangle r (at one of its corners). */
export function rectFarthest(r: Rect, q: Point): number {
  const dx = Math.max(Math.abs(q[0] - r.x0), Math.abs(q[0] - r.x1));
  const dy = Math.max(Math.abs(q[1] - r.y0), Math.abs(q[1] - r.y1));
  return Math.hypot(dx, dy);
}
