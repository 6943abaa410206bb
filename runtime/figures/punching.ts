// Punching plan: the column, the critical section at d/2 from its faces (interior, edge
// or corner: open along free edges, ACI 318-19 §22.6.4.1), and with a drop panel the
// second section at d_slab/2 outside it. To scale; dimensions in the sheet's units.
// Convention (as bo_punch): c1 ⟂ the free edge, drawn vertical; free edges at the top
// (edge) or top and left (corner); the column sits flush with them.

import type { PunchingSpec } from './spec';
import { dimension, frame, leader, line, path, rect, svgDoc, text, type Frame } from './svg';
import { show } from './units';

type Pt = [number, number];

/** Rectangle of size w (x) × h (y) around the column's place: centred, flush top, or flush top-left. */
function place(pos: PunchingSpec['position'], w: number, h: number): { x0: number; y0: number; x1: number; y1: number } {
  if (pos === 'interior') return { x0: -w / 2, y0: -h / 2, x1: w / 2, y1: h / 2 };
  if (pos === 'edge') return { x0: -w / 2, y0: 0, x1: w / 2, y1: h };
  return { x0: 0, y0: 0, x1: w, y1: h };
}

/**
 * The critical section around a w × h support (column or drop panel) at `off` from its
 * faces, as a polyline: closed for an interior column, open along free edges.
 */
export function sectionPoints(pos: PunchingSpec['position'], w: number, h: number, off: number): { pts: Pt[]; closed: boolean } {
  const r = place(pos, w, h);
  if (pos === 'interior') {
    return { pts: [[r.x0 - off, r.y0 - off], [r.x1 + off, r.y0 - off], [r.x1 + off, r.y1 + off], [r.x0 - off, r.y1 + off]], closed: true };
  }
  if (pos === 'edge') return { pts: [[r.x0 - off, 0], [r.x0 - off, r.y1 + off], [r.x1 + off, r.y1 + off], [r.x1 + off, 0]], closed: false };
  return { pts: [[r.x1 + off, 0], [r.x1 + off, r.y1 + off], [0, r.y1 + off]], closed: false };
}

export function polylineLength(pts: Pt[], closed: boolean): number {
  let s = 0;
  for (let i = 1; i < pts.length; i++) s += Math.hypot(pts[i][0] - pts[i - 1][0], pts[i][1] - pts[i - 1][1]);
  if (closed && pts.length > 1) s += Math.hypot(pts[0][0] - pts[pts.length - 1][0], pts[0][1] - pts[pts.length - 1][1]);
  return s;
}

const W = 520, H = 430;

export function renderPunching(spec: PunchingSpec): string {
  const { c1, c2, d, position: pos, drop } = spec;
  // Outermost thing drawn: the drop's outer section, else the column's section; plus a margin of slab.
  const outer = drop ? place(pos, drop.x2 + drop.dSlab, drop.x1 + drop.dSlab) : place(pos, c2 + d, c1 + d);
  if (pos !== 'interior') {
    // place() put a flush rectangle; extend the section reach by the offsets on the open sides.
    const o = drop ? drop.dSlab / 2 : d / 2;
    outer.y1 += o;
    if (pos === 'corner') outer.x1 += o;
  }
  const span = Math.max(outer.x1 - outer.x0, outer.y1 - outer.y0);
  const m = span * 0.18;
  const minX = pos === 'corner' ? 0 : outer.x0 - m, minY = pos === 'interior' ? outer.y0 - m : 0;
  const maxX = outer.x1 + m, maxY = outer.y1 + m;
  const f: Frame = frame(minX, minY, maxX, maxY, { x: 70, y: 50, w: W - 140, h: H - 110 });
  const X = (p: Pt): Pt => [f.x(p[0]), f.y(p[1])];

  let body = text(12, 20, `Punching shear: ${pos} column, critical section at d/2`, 'title');
  // Slab and its free edges.
  body += rect(f.x(minX), f.y(minY), (maxX - minX) * f.scale, (maxY - minY) * f.scale, 'concrete', { 'data-role': 'slab' });
  if (pos !== 'interior') body += line(f.x(minX), f.y(0), f.x(maxX), f.y(0), 'edge-free');
  if (pos === 'corner') body += line(f.x(0), f.y(0), f.x(0), f.y(maxY), 'edge-free');
  if (pos !== 'interior') body += text(f.x(maxX) - 4, f.y(0) - 5, 'slab edge', 'small', { 'text-anchor': 'end' });

  if (drop) {
    const r = place(pos, drop.x2, drop.x1);
    body += rect(f.x(r.x0), f.y(r.y0), (r.x1 - r.x0) * f.scale, (r.y1 - r.y0) * f.scale, 'drop', { 'data-role': 'drop-panel' });
    const s2 = sectionPoints(pos, drop.x2, drop.x1, drop.dSlab / 2);
    body += path(s2.pts.map(X), 'crit2', s2.closed, { 'data-role': 'outer-perimeter' });
    body += dimension(f.x(r.x0), f.y(r.y1), f.x(r.x1), f.y(r.y1), 26 + (drop.dSlab / 2) * f.scale, `x2 = ${show(spec, 'x2', 'length', drop.x2)}`);
    body += dimension(f.x(r.x1), f.y(r.y0), f.x(r.x1), f.y(r.y1), -(26 + (drop.dSlab / 2) * f.scale), `x1 = ${show(spec, 'x1', 'length', drop.x1)}`);
  }

  const col = place(pos, c2, c1);
  body += rect(f.x(col.x0), f.y(col.y0), c2 * f.scale, c1 * f.scale, 'column', { 'data-role': 'column' });
  const s1 = sectionPoints(pos, c2, c1, d / 2);
  body += path(s1.pts.map(X), 'crit', s1.closed, { 'data-role': 'critical-perimeter' });

  // Dimensions of the column and the offset d/2.
  const clear = 12 + (d / 2) * f.scale; // dimension lines just outside the critical section
  body += dimension(f.x(col.x0), f.y(col.y1), f.x(col.x1), f.y(col.y1), clear, `c2 = ${show(spec, 'c2', 'length', c2)}`);
  body += dimension(f.x(col.x0), f.y(col.y0), f.x(col.x0), f.y(col.y1), clear, `c1 = ${show(spec, 'c1', 'length', c1)}`);
  const sp = s1.pts[pos === 'corner' ? 1 : 2];
  body += leader(f.x(sp[0]) + 36, f.y(sp[1]) - 30, f.x(sp[0]) - 1, f.y(sp[1]) - 1, `d/2 = ${show(spec, 'd', 'length', d / 2)}`);

  // Key.
  const ky = H - 38;
  body += line(14, ky, 44, ky, 'crit') + text(50, ky + 4, `critical section at d/2 (d = ${show(spec, 'd', 'length', d)}): bo = ${show(spec, 'c1', 'length', spec.bo)}`, '');
  if (drop) body += line(14, ky + 18, 44, ky + 18, 'crit2') + text(50, ky + 22, `section at d_slab/2 outside the drop panel (d_slab = ${show(spec, 'd_slab', 'length', drop.dSlab)}): bo = ${show(spec, 'c1', 'length', drop.boOuter)}`, '');
  else if (pos !== 'interior') body += text(14, ky + 22, 'The section stops at the slab edge: free sides are not counted.', 'small');

  return svgDoc(W, H, `Punching plan, ${pos} column`, body, { 'data-scale': f.scale, 'data-figure': 'punching' });
}
