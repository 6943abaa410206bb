// Plate map: a shaded plan of deflection or moment over the panel with contour lines,
// the largest values marked, each edge drawn by its support (S line, C hatched, F dashed)
// and labelled with the share of the load it takes (the two-way split). To scale.

import { formatNumber } from '../formula/display';
import { contourLevels, contourSegments } from './contours';
import type { PlateSpec } from './spec';
import { el, frame, line, n, rect, svgDoc, text } from './svg';
import { show, unitText } from './units';

const W = 600, H = 470;
const NAMES: Record<PlateSpec['field'], string> = { w: 'deflection w', mx: 'moment Mx', my: 'moment My', mxy: 'twisting moment Mxy' };
const SUPPORT: Record<string, string> = { S: 'simply supported', C: 'clamped', F: 'free' };

/** Sagging/downward values blue, hogging red, fading to white at zero. */
function shade(v: number, big: number): string {
  const t = Math.min(1, Math.abs(v) / (big || 1));
  const [r, g, b] = v >= 0 ? [43, 93, 155] : [176, 38, 30];
  const mix = (c: number) => Math.round(255 + (c - 255) * t * 0.85);
  return `rgb(${mix(r)},${mix(g)},${mix(b)})`;
}

export function renderPlateMap(spec: PlateSpec): string {
  const { a, b, nx, ny, values, field } = spec;
  const f = frame(0, 0, a, b, { x: 110, y: 64, w: W - 250, h: H - 150 });
  const X = (gx: number) => f.x((gx / (nx - 1)) * a);
  const Y = (gy: number) => f.y(b - (gy / (ny - 1)) * b); // y up
  const unit = spec.scaled ? unitText(spec, field === 'w' ? 'w' : 'm', field === 'w' ? 'deflection' : 'moment') : undefined;
  const fmt = (v: number) => (unit ? `${formatNumber(v / unit.factor, 3)} ${unit.label}` : formatNumber(v, 3));
  const what = spec.scaled ? NAMES[field] : field === 'w' ? 'α in w = α q a⁴/D' : `β in M = β q a² (${NAMES[field]})`;

  let lo = Infinity, hi = -Infinity;
  for (const v of values) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  const big = Math.max(Math.abs(lo), Math.abs(hi));
  let body = text(12, 20, `Plate ${show(spec, 'a', 'span', a)} × ${show(spec, 'b', 'span', b)}, edges ${spec.edges}: ${what}`, 'title');

  let cells = '';
  for (let j = 0; j < ny - 1; j++) for (let i = 0; i < nx - 1; i++) {
    const v = (values[j * nx + i] + values[j * nx + i + 1] + values[(j + 1) * nx + i] + values[(j + 1) * nx + i + 1]) / 4;
    cells += `<rect x="${n(X(i))}" y="${n(Y(j + 1))}" width="${n(X(i + 1) - X(i) + 0.3)}" height="${n(Y(j) - Y(j + 1) + 0.3)}" fill="${shade(v, big)}"/>`;
  }
  body += el('g', { 'shape-rendering': 'crispEdges', 'data-role': 'shading' }, cells);

  let contours = '';
  let labels = '';
  const levels = contourLevels(lo, hi, 7);
  for (const level of levels) {
    const segs = contourSegments(values, nx, ny, level);
    if (!segs.length) continue;
    contours += el('path', { d: segs.map(([x1, y1, x2, y2]) => `M${n(X(x1))} ${n(Y(y1))}L${n(X(x2))} ${n(Y(y2))}`).join(''), class: 'contour', 'data-level': level });
    const [x1, y1, x2, y2] = segs[Math.floor(segs.length / 3)];
    labels += text((X(x1) + X(x2)) / 2, (Y(y1) + Y(y2)) / 2 - 2, formatNumber(unit ? level / unit.factor : level, 2), 'small', { 'text-anchor': 'middle', 'paint-order': 'stroke', stroke: '#fff', 'stroke-width': 2.5 });
  }
  body += el('g', { 'data-role': 'contours' }, contours + labels);

  // Edges in code order x=0 (left), y=0 (bottom), x=a (right), y=b (top).
  // y is up: the edge y = 0 is drawn at the bottom (svg f.y(b)), y = b at the top (f.y(0)).
  const corners = [[f.x(0), f.y(0), f.x(0), f.y(b)], [f.x(0), f.y(b), f.x(a), f.y(b)], [f.x(a), f.y(0), f.x(a), f.y(b)], [f.x(0), f.y(0), f.x(a), f.y(0)]];
  const outward = [[-1, 0], [0, 1], [1, 0], [0, -1]];
  const edgeNames = ['x = 0', 'y = 0', 'x = a', 'y = b'];
  spec.edges.split('').forEach((c, i) => {
    const [x1, y1, x2, y2] = corners[i];
    const [ox, oy] = outward[i];
    if (c === 'C') {
      // Hatched strip just outside the clamped edge.
      const w = 7;
      const rx = ox < 0 ? x1 - w : ox > 0 ? x1 : Math.min(x1, x2);
      const ry = oy < 0 ? y1 - w : oy > 0 ? y1 : Math.min(y1, y2);
      body += rect(rx, ry, ox ? w : Math.abs(x2 - x1), oy ? w : Math.abs(y2 - y1), '', { fill: 'url(#lt-hatch)', stroke: 'none' });
    }
    body += line(x1, y1, x2, y2, c === 'F' ? 'dim' : 'outline', c === 'F' ? { 'stroke-dasharray': '5 3' } : { 'stroke-width': c === 'C' ? 2.6 : 1.8 });
    const share = `${(spec.shares[i] * 100).toFixed(1)} %`;
    const label = `${edgeNames[i]} (${c}, ${SUPPORT[c] ?? c}): ${share} of the load`;
    const mx = (x1 + x2) / 2 + ox * 14, my = (y1 + y2) / 2 + oy * 16 + (oy === 0 ? 0 : oy > 0 ? 6 : 0);
    body += ox !== 0
      ? text(mx, my, label, 'small', { 'text-anchor': 'middle', transform: `rotate(-90 ${n(mx)} ${n(my)})`, 'data-role': 'edge-share', 'data-edge': i })
      : text(mx, my, label, 'small', { 'text-anchor': 'middle', 'data-role': 'edge-share', 'data-edge': i });
  });

  // The largest values, marked where they occur.
  const mark = (e: PlateSpec['max'], tag: string) => {
    const px = f.x(e.x), py = f.y(b - e.y);
    return el('path', { d: `M${n(px - 5)} ${n(py)}H${n(px + 5)}M${n(px)} ${n(py - 5)}V${n(py + 5)}`, class: 'outline' })
      + text(px + 7, py - 5, `${tag} ${fmt(e.value)}`, 'small', { 'paint-order': 'stroke', stroke: '#fff', 'stroke-width': 3 });
  };
  if (spec.max.value > 0) body += mark(spec.max, 'max');
  if (spec.min.value < 0) body += mark(spec.min, 'min');

  // Legend.
  const lx = W - 118, ly = 70, lh = 220;
  const steps = 24;
  for (let k = 0; k < steps; k++) {
    const v = hi - ((hi - lo) * (k + 0.5)) / steps;
    body += rect(lx, ly + (k * lh) / steps, 16, lh / steps + 0.4, '', { fill: shade(v, big), stroke: 'none' });
  }
  body += rect(lx, ly, 16, lh, 'dim');
  body += text(lx + 22, ly + 8, fmt(hi), 'small') + text(lx + 22, ly + lh, fmt(lo), 'small');
  body += text(lx, ly - 10, unit ? `${NAMES[field]}, ${unit.label}` : field === 'w' ? 'α' : 'β', 'small');
  const step = levels.length > 1 ? levels[1] - levels[0] : undefined;
  const every = step === undefined ? '' : ` Contours every ${formatNumber(unit ? step / unit.factor : step, 2)}${unit ? ' ' + unit.label : ''}.`;
  body += text(12, H - 14, `x along a (left to right), y along b (bottom to top).${every} Blue: sagging or downward; red: hogging.`, 'small');

  return svgDoc(W, H, `Plate map of ${NAMES[field]}`, body, { 'data-scale': f.scale, 'data-figure': 'plate' });
}
