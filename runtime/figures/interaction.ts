// P–M interaction diagram of a tied rectangular column: moment across, axial force up
// (tension below zero), the nominal curve (Pn, Mn) dashed and the design curve (φPn, φMn)
// solid with its flat top at φPn,max (ACI 318-19 §22.4.2.1), the balanced point, the
// factored demand (Pu, Mu) with its load line, and a sketch of the section with its bars
// and the compression face. Axes are linear; `data-*` on the <svg> give the origin and px
// per unit so a test can measure the drawing.

import { formatNumber } from '../formula/display';
import type { InteractionSpec, PMPoint } from './spec';
import { el, line, path, rect, svgDoc, text } from './svg';
import { niceTicks } from './sweep-chart';
import { show, unitText } from './units';

const W = 640, H = 470;
const PLOT = { x: 78, y: 46, w: 380, h: 360 };

export function renderInteraction(spec: InteractionSpec): string {
  const pu = unitText(spec, 'Pu', 'force');
  const mu = unitText(spec, 'Mu', 'bending');
  const all = [...spec.nominal, spec.demand];
  const mMax = Math.max(...all.map((q) => q.m)) * 1.08 || 1;
  const pMax = Math.max(...all.map((q) => q.p)) * 1.06 || 1;
  const pMin = Math.min(0, ...spec.nominal.map((q) => q.p)) * 1.06;
  const kx = PLOT.w / mMax, ky = PLOT.h / (pMax - pMin);
  const x0 = PLOT.x, y0 = PLOT.y + pMax * ky;
  const X = (m: number) => x0 + m * kx, Y = (p: number) => y0 - p * ky;
  const pts = (qs: PMPoint[]): [number, number][] => qs.map((q) => [X(q.m), Y(q.p)]);

  const size = `${show(spec, 'b', 'length', spec.b)} × ${show(spec, 'h', 'length', spec.h)}`;
  const bars = 2 * spec.nB + 2 * spec.nH - 4;
  let body = text(12, 20, `P–M interaction: tied column ${size}, ${bars} ${spec.bar} (h in the direction of bending)`, 'title');

  // Grid, ticks and axes.
  body += rect(PLOT.x, PLOT.y, PLOT.w, PLOT.h, 'grid', { fill: '#fcfbf8' });
  for (const t of niceTicks(pMin / pu.factor, pMax / pu.factor, 6)) {
    const y = Y(t * pu.factor);
    if (y < PLOT.y - 0.5 || y > PLOT.y + PLOT.h + 0.5) continue;
    body += line(PLOT.x, y, PLOT.x + PLOT.w, y, 'grid') + text(PLOT.x - 6, y + 4, formatNumber(t, 3), 'small', { 'text-anchor': 'end' });
  }
  for (const t of niceTicks(0, mMax / mu.factor, 5)) {
    const x = X(t * mu.factor);
    if (x > PLOT.x + PLOT.w + 0.5) continue;
    body += line(x, PLOT.y, x, PLOT.y + PLOT.h, 'grid') + text(x, PLOT.y + PLOT.h + 14, formatNumber(t, 3), 'small', { 'text-anchor': 'middle' });
  }
  body += line(x0, PLOT.y, x0, PLOT.y + PLOT.h, 'axis') + line(PLOT.x, y0, PLOT.x + PLOT.w, y0, 'axis', { 'data-role': 'zero-axial' });
  body += text(PLOT.x + PLOT.w / 2, PLOT.y + PLOT.h + 32, `moment (${mu.label})`, '', { 'text-anchor': 'middle' });
  body += text(24, PLOT.y + PLOT.h / 2, `axial force, compression up (${pu.label})`, '', {
    'text-anchor': 'middle', transform: `rotate(-90 24 ${PLOT.y + PLOT.h / 2})`,
  });

  // Curves, the cap and the balanced point.
  body += path(pts(spec.nominal), 'series', false, { stroke: '#7a7a7a', 'stroke-dasharray': '5 3', 'data-role': 'nominal' });
  body += path(pts(spec.design), 'series', false, { stroke: '#1d4f91', 'data-role': 'design' });
  const capEnd = Math.max(...spec.design.filter((q) => q.p >= spec.phiPnMax * (1 - 1e-9)).map((q) => q.m), 0);
  body += text(X(capEnd) + 6, Y(spec.phiPnMax) - 4, `φPn,max = ${show(spec, 'Pu', 'force', spec.phiPnMax)}`, 'small', { 'data-role': 'cap-label' });
  body += el('circle', { cx: X(spec.balanced.m), cy: Y(spec.balanced.p), r: 3.2, fill: '#7a7a7a', 'data-role': 'balanced' });
  body += text(X(spec.balanced.m) - 6, Y(spec.balanced.p) - 6, 'balanced (εt = εty)', 'small', { 'text-anchor': 'end' });

  // The demand, its load line from the origin and φMn at Pu.
  const { p, m } = spec.demand;
  const pass = spec.ratio <= 1;
  if (m > 0 || p > 0) body += line(X(0), Y(0), X(m), Y(p), 'dim', { 'data-role': 'load-line', 'stroke-dasharray': '4 3' });
  if (spec.phiMnAtPu > 0) {
    body += line(X(0), Y(p), X(spec.phiMnAtPu), Y(p), 'now', { 'data-role': 'phi-mn-at-pu' });
    body += el('circle', { cx: X(spec.phiMnAtPu), cy: Y(p), r: 2.6, fill: '#1d4f91' });
  }
  body += el('circle', { cx: X(m), cy: Y(p), r: 4.2, fill: pass ? '#2e7d4f' : '#b0261e', 'data-role': 'demand' });
  // The numbers beside the plot, under the section sketch.
  const lx = PLOT.x + PLOT.w + 28;
  const lines = [
    `Pu = ${show(spec, 'Pu', 'force', p)}`,
    `Mu = ${show(spec, 'Mu', 'bending', m)}`,
    spec.phiMnAtPu > 0 ? `φMn at Pu = ${show(spec, 'Mu', 'bending', spec.phiMnAtPu)}` : 'Pu above φPn,max',
    `ratio ${formatNumber(spec.ratio, 3)} ${pass ? '≤ 1' : '> 1'}`,
  ];
  lines.forEach((t, i) => {
    body += text(lx, PLOT.y + 232 + 15 * i, t, 'small', i === 3 ? { 'data-role': 'demand-label', 'font-weight': 600 } : {});
  });
  body += sectionSketch(spec, PLOT.x + PLOT.w + 28, PLOT.y + 10, W - (PLOT.x + PLOT.w + 28) - 30);
  // Key.
  const keyY = H - 16;
  body += line(14, keyY, 40, keyY, 'series', { stroke: '#1d4f91' }) + text(44, keyY + 4, 'design φPn, φMn', 'small');
  body += line(150, keyY, 176, keyY, 'series', { stroke: '#7a7a7a', 'stroke-dasharray': '5 3' }) + text(180, keyY + 4, 'nominal Pn, Mn', 'small');
  body += line(280, keyY, 306, keyY, 'dim', { 'stroke-dasharray': '4 3' }) + text(310, keyY + 4, 'load line through (Mu, Pu)', 'small');

  return svgDoc(W, H, `P–M interaction diagram, ${size}`, body, {
    'data-figure': 'interaction', 'data-x0': x0, 'data-y0': y0, 'data-kx': kx, 'data-ky': ky,
  });
}

/** The section to its own scale: compression face on top, bars at d_s from the faces. */
function sectionSketch(spec: InteractionSpec, x: number, y: number, w: number): string {
  const k = Math.min(w / spec.b, 150 / spec.h);
  const bw = spec.b * k, hh = spec.h * k;
  let g = text(x, y, 'Section', 'title');
  const top = y + 12;
  g += rect(x, top, bw, hh, 'concrete', { 'data-role': 'section' });
  const r = Math.max(1.6, (spec.db * k) / 2);
  const xs = (n: number) => Array.from({ length: n }, (_, i) => spec.dS + (i * (spec.b - 2 * spec.dS)) / (n - 1));
  const ys = Array.from({ length: spec.nH }, (_, i) => spec.dS + (i * (spec.h - 2 * spec.dS)) / (spec.nH - 1));
  ys.forEach((yy, i) => {
    const row = i === 0 || i === ys.length - 1 ? xs(spec.nB) : [spec.dS, spec.b - spec.dS];
    for (const xx of row) g += el('circle', { cx: x + xx * k, cy: top + yy * k, r, class: 'bar-dot', 'data-role': 'bar' });
  });
  g += line(x, top - 2, x + bw, top - 2, 'crit') + text(x, top + hh + 14, 'compression face: top', 'small');
  g += el('line', { x1: x + bw + 10, y1: top + hh, x2: x + bw + 10, y2: top, class: 'load', 'marker-end': 'url(#lt-arrow)' });
  g += text(x + bw + 14, top + hh / 2, 'h', 'small');
  return g;
}
