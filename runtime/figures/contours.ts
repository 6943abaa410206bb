// Contour lines of a field on a regular grid by marching squares: for each level, the
// segments where the bilinear surface crosses it, cell by cell.

export type Segment = [number, number, number, number];

/** Up to `count` round levels strictly between lo and hi. */
export function contourLevels(lo: number, hi: number, count = 8): number[] {
  if (!(hi > lo)) return [];
  const raw = (hi - lo) / (count + 1);
  const mag = Math.pow(10, Math.floor(Math.log10(raw)));
  const step = [1, 2, 2.5, 5, 10].map((k) => k * mag).find((s) => s >= raw) ?? 10 * mag;
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v < hi; v += step) {
    const r = Math.round(v / step) * step;
    if (r > lo && r < hi) out.push(Math.abs(r) < step * 1e-9 ? 0 : r);
  }
  return out;
}

/**
 * Segments of the level line in grid coordinates (ix, iy as fractions), for a field of
 * nx × ny nodes with value (ix, iy) at iy·nx + ix.
 */
export function contourSegments(values: ArrayLike<number>, nx: number, ny: number, level: number): Segment[] {
  const out: Segment[] = [];
  const v = (i: number, j: number) => values[j * nx + i];
  const t = (a: number, b: number) => (a === b ? 0.5 : (level - a) / (b - a));
  for (let j = 0; j < ny - 1; j++) {
    for (let i = 0; i < nx - 1; i++) {
      const a = v(i, j), b = v(i + 1, j), c = v(i + 1, j + 1), d = v(i, j + 1);
      const pts: [number, number][] = [];
      // Edges bottom (a-b), right (b-c), top (d-c), left (a-d), in order round the cell.
      if ((a < level) !== (b < level)) pts.push([i + t(a, b), j]);
      if ((b < level) !== (c < level)) pts.push([i + 1, j + t(b, c)]);
      if ((d < level) !== (c < level)) pts.push([i + t(d, c), j + 1]);
      if ((a < level) !== (d < level)) pts.push([i, j + t(a, d)]);
      if (pts.length === 2) out.push([pts[0][0], pts[0][1], pts[1][0], pts[1][1]]);
      else if (pts.length === 4) {
        // Saddle: pair by the centre value.
        const centre = (a + b + c + d) / 4;
        if ((centre < level) === (a < level)) out.push([...pts[0], ...pts[1]] as Segment, [...pts[2], ...pts[3]] as Segment);
        else out.push([...pts[0], ...pts[3]] as Segment, [...pts[1], ...pts[2]] as Segment);
      }
    }
  }
  return out;
}
