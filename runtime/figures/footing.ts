// Spread footing, plan and section A–A to one scale: the column, the two-way shear
// section at d/2 from its faces (ACI 318-19 §22.6.4.1), the one-way sections at d
// (§13.2.7.2), the bottom bars each way at their spacing, and the factored soil
// pressure under the footing. L is drawn horizontal, B vertical; the section cuts along L.

import type { FootingSpec } from './spec';
import { dimension, el, line, rect, svgDoc, text } from './svg';
import { show } from './units';

const W = 640;
/** Clear cover to the bar ends in plan, drawn only (ACI 318-19 Table 20.5.1.3.1: 3 in cast against earth). */
const COVER = 0.0762;

/** Bar positions across a width at spacing s, centred, inside the cover. */
export function barPositions(width: number, s: number): number[] {
  const room = Math.max(width - 2 * COVER, 0);
  const count = Math.floor(room / s + 1e-9) + 1;
  const first = -((count - 1) * s) / 2;
  return Array.from({ length: count }, (_, i) => first + i * s);
}

export function renderFootingDrawing(spec: FootingSpec): string {
  const { B, L, h, c1, c2, d, s, db, qu } = spec;
  const scale = Math.min((W - 170) / L, 290 / B, 150 / h);
  const cx = 90 + (L * scale) / 2 + Math.max(0, (W - 170 - L * scale) / 2);
  const X = (m: number) => cx + m * scale;
  const planTop = 58;
  const PY = (m: number) => planTop + (B / 2 + m) * scale;
  const stub = Math.max(1.2 * c1, h) * scale;
  const secTop = planTop + B * scale + 60 + stub;
  const SY = (m: number) => secTop + m * scale; // m measured down from the top of the footing
  const height = secTop + h * scale + 92;

  let body = text(12, 20, `Spread footing: plan and section A–A (to scale), bars ${spec.bar} at ${show(spec, 's', 'length', s)} each way`, 'title');

  // ---- plan --------------------------------------------------------------
  body += rect(X(-L / 2), PY(-B / 2), L * scale, B * scale, 'concrete', { 'data-role': 'footing-plan' });
  for (const y of barPositions(B, s)) body += line(X(-L / 2 + COVER), PY(y), X(L / 2 - COVER), PY(y), 'bar', { 'data-role': 'bar-l' });
  for (const x of barPositions(L, s)) body += line(X(x), PY(-B / 2 + COVER), X(x), PY(B / 2 - COVER), 'bar', { 'data-role': 'bar-b', opacity: 0.55 });
  body += rect(X(-(c1 + d) / 2), PY(-(c2 + d) / 2), (c1 + d) * scale, (c2 + d) * scale, 'crit', { 'data-role': 'two-way-section' });
  for (const sx of [-1, 1]) {
    const x = sx * (c1 / 2 + d);
    if (Math.abs(x) < L / 2) body += line(X(x), PY(-B / 2), X(x), PY(B / 2), 'oneway', { 'data-role': 'one-way-section' });
    const y = sx * (c2 / 2 + d);
    if (Math.abs(y) < B / 2) body += line(X(-L / 2), PY(y), X(L / 2), PY(y), 'oneway', { 'data-role': 'one-way-section', opacity: 0.6 });
  }
  body += rect(X(-c1 / 2), PY(-c2 / 2), c1 * scale, c2 * scale, 'column', { 'data-role': 'column-plan' });
  body += dimension(X(-L / 2), PY(-B / 2), X(L / 2), PY(-B / 2), -16, `L = ${show(spec, 'L', 'span', L)}`);
  body += dimension(X(-L / 2), PY(-B / 2), X(-L / 2), PY(B / 2), 18, `B = ${show(spec, 'B', 'span', B)}`);
  body += dimension(X(-c1 / 2), PY(B / 2), X(c1 / 2), PY(B / 2), 14, `c1 = ${show(spec, 'c1', 'length', c1)}`);
  body += dimension(X(L / 2), PY(-c2 / 2), X(L / 2), PY(c2 / 2), -16, `c2 = ${show(spec, 'c2', 'length', c2)}`);
  // Section mark A–A along the cut.
  body += line(X(-L / 2) - 50, PY(0), X(-L / 2) - 36, PY(0), 'outline') + text(X(-L / 2) - 62, PY(0) + 4, 'A', 'title');
  body += line(X(L / 2) + 36, PY(0), X(L / 2) + 50, PY(0), 'outline') + text(X(L / 2) + 53, PY(0) + 4, 'A', 'title');

  // ---- section A–A ---------------------------------------------------------
  body += text(12, secTop - stub - 10, 'Section A–A', 'title');
  body += rect(X(-c1 / 2), secTop - stub, c1 * scale, stub, 'column', { 'data-role': 'column-section' });
  body += el('path', { d: `M${X(-c1 / 2) - 4} ${secTop - stub + 4} l${c1 * scale / 2} -8 l0 8 l${c1 * scale / 2 + 8} -8`, class: 'outline' });
  body += rect(X(-L / 2), SY(0), L * scale, h * scale, 'concrete', { 'data-role': 'footing-section' });
  body += line(X(-L / 2 + COVER), SY(d), X(L / 2 - COVER), SY(d), 'bar', { 'stroke-width': Math.max(1.5, db * scale), 'data-role': 'bar-l-section' });
  const r = Math.max(1.4, (db * scale) / 2);
  for (const x of barPositions(L, s)) body += el('circle', { cx: X(x), cy: SY(d) - r - Math.max(0.75, (db * scale) / 2), r, class: 'bar-dot' });
  for (const sx of [-1, 1]) {
    const x2 = sx * (c1 + d) / 2;
    body += line(X(x2), SY(0) - 6, X(x2), SY(h) + 6, 'crit', { 'data-role': 'two-way-section-cut' });
    const x1 = sx * (c1 / 2 + d);
    if (Math.abs(x1) < L / 2) body += line(X(x1), SY(0) - 6, X(x1), SY(h) + 6, 'oneway', { 'data-role': 'one-way-section-cut' });
  }
  body += dimension(X(L / 2), SY(0), X(L / 2), SY(h), -16, `h = ${show(spec, 'h', 'length', h)}`);
  body += dimension(X(-L / 2), SY(0), X(-L / 2), SY(d), 16, `d = ${show(spec, 'd', 'length', d)}`);

  // Soil pressure: a uniform block of arrows pushing up on the footing.
  const base = SY(h), depth = 30;
  body += rect(X(-L / 2), base + 2, L * scale, depth, 'soil', { opacity: 0.5 });
  body += line(X(-L / 2), base + depth + 2, X(L / 2), base + depth + 2, 'load');
  const arrows = Math.max(4, Math.min(14, Math.round((L * scale) / 34)));
  for (let i = 0; i <= arrows; i++) {
    const x = X(-L / 2) + (i * L * scale) / arrows;
    body += el('line', { x1: x, y1: base + depth + 2, x2: x, y2: base + 3, class: 'load', 'marker-end': 'url(#lt-arrow)' });
  }
  body += text(X(0), base + depth + 16, `factored net soil pressure qu = ${show(spec, 'qu', 'soil', qu)}`, '', { 'text-anchor': 'middle' });

  // Key.
  const ky = height - 22;
  body += line(14, ky, 40, ky, 'crit') + text(44, ky + 4, 'two-way shear at d/2', 'small');
  body += line(170, ky, 196, ky, 'oneway') + text(200, ky + 4, 'one-way shear at d from the column face', 'small');

  return svgDoc(W, height, `Spread footing ${show(spec, 'B', 'span', B)} × ${show(spec, 'L', 'span', L)}`, body,
    { 'data-scale': scale, 'data-figure': 'footing' });
}
