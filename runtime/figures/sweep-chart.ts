// What-if chart of a sweep: one panel per plotted result over the swept input, the
// document's current input value marked, and for checks the line ratio = 1, the first
// point that fails and where the ratio crosses 1.

import { formatNumber } from '../formula/display';
import { unitInfo } from '../units/dimension';
import type { SweepResult, SweepSeries } from './spec';
import { el, line, n, rect, svgDoc, text } from './svg';

const W = 620, PANEL = 118, GAP = 34, LEFT = 78, RIGHT = 24;
const COLOURS = ['#1d4f91', '#7a3e9d', '#2e7d4f', '#a05a00', '#444'];

function factor(unit: string): number {
  if (!unit) return 1;
  try {
    return unitInfo(unit).factor;
  } catch {
    return 1;
  }
}

/** Round tick values covering lo..hi. */
export function niceTicks(lo: number, hi: number, count = 4): number[] {
  if (!(hi > lo)) return [lo];
  const raw = (hi - lo) / count;
  const mag = Math.pow(10, Math.floor(Math.log10(raw)));
  const step = [1, 2, 2.5, 5, 10].map((k) => k * mag).find((s) => s >= raw) ?? 10 * mag;
  const out: number[] = [];
  for (let v = Math.ceil(lo / step - 1e-9) * step; v <= hi + step * 1e-9; v += step) out.push(Math.abs(v) < step * 1e-9 ? 0 : v);
  return out;
}

function fmtX(r: SweepResult, si: number): string {
  const v = formatNumber(si / factor(r.unit), 3);
  return r.unit ? `${v} ${r.unit}` : v;
}

export function renderSweepChart(r: SweepResult, title: string): string {
  const count = Math.max(1, r.series.length);
  const height = 44 + count * (PANEL + GAP) + 24;
  const fx = factor(r.unit);
  const xlo = Math.min(...r.xs), xhi = Math.max(...r.xs);
  const X = (si: number) => LEFT + ((si - xlo) / (xhi - xlo || 1)) * (W - LEFT - RIGHT);
  let body = text(12, 20, title || `What if ${r.input} varies from ${fmtX(r, r.xs[0])} to ${fmtX(r, r.xs[r.xs.length - 1])}`, 'title');

  r.series.forEach((s, k) => {
    const top = 44 + k * (PANEL + GAP);
    body += panel(r, s, top, X, COLOURS[k % COLOURS.length]);
  });
  // The document's current value, across every panel.
  if (r.current >= xlo && r.current <= xhi) {
    const cx = X(r.current);
    body += line(cx, 36, cx, height - 44, 'now', { 'data-role': 'current' });
    body += text(cx + 3, 40, `now: ${fmtX(r, r.current)}`, 'small');
  }
  // x axis ticks under the last panel.
  const axisY = 44 + count * (PANEL + GAP) - GAP + 2;
  for (const t of niceTicks(xlo / fx, xhi / fx, 6)) {
    const x = X(t * fx);
    body += line(x, axisY, x, axisY + 4, 'axis') + text(x, axisY + 15, formatNumber(t, 3), 'small', { 'text-anchor': 'middle' });
  }
  body += text((LEFT + W - RIGHT) / 2, axisY + 30, `${r.input}${r.unit ? ` (${r.unit})` : ''}`, '', { 'text-anchor': 'middle' });
  return svgDoc(W, height, title || `Sweep of ${r.input}`, body, { 'data-figure': 'sweep' });
}

function panel(r: SweepResult, s: SweepSeries, top: number, X: (si: number) => number, colour: string): string {
  const bottom = top + PANEL;
  const fy = s.kind === 'value' ? factor(s.unit) : 1;
  const vals = s.values.map((v) => (v === null ? null : v / fy));
  const finite = vals.filter((v): v is number => v !== null && Number.isFinite(v));
  let lo: number, hi: number;
  if (s.kind === 'ratio') {
    lo = 0;
    hi = Math.max(1.25, ...finite.map((v) => v * 1.05));
  } else if (s.kind === 'condition') {
    lo = -0.5;
    hi = 1.5;
  } else {
    lo = finite.length ? Math.min(...finite) : 0;
    hi = finite.length ? Math.max(...finite) : 1;
    const pad = (hi - lo) * 0.08 || Math.abs(hi) * 0.1 || 1;
    lo -= pad;
    hi += pad;
  }
  const Y = (v: number) => bottom - ((v - lo) / (hi - lo)) * PANEL;
  const left = X(Math.min(...r.xs)), right = X(Math.max(...r.xs));
  let g = rect(left, top, right - left, PANEL, 'grid', { fill: '#fcfbf8' });
  const label = s.kind === 'ratio' ? `${s.name}: demand / capacity` : s.kind === 'condition' ? `${s.name}: pass or fail` : `${s.name}${s.unit ? ` (${s.unit})` : ''}`;
  g += text(left, top - 6, label, '', { 'font-weight': 600 });

  if (s.kind === 'condition') {
    g += text(left - 8, Y(1) + 4, 'pass', 'small', { 'text-anchor': 'end' }) + text(left - 8, Y(0) + 4, 'fail', 'small', { 'text-anchor': 'end' });
  } else {
    for (const t of niceTicks(lo, hi, 4)) {
      if (t < lo || t > hi) continue;
      g += line(left, Y(t), right, Y(t), 'grid') + text(left - 6, Y(t) + 4, formatNumber(t, 3), 'small', { 'text-anchor': 'end' });
    }
  }
  if (s.kind === 'ratio') {
    g += rect(left, top, right - left, Y(1) - top, '', { fill: '#b0261e', opacity: 0.07 });
    g += line(left, Y(1), right, Y(1), 'one', { 'data-role': 'ratio-one' }) + text(right - 2, Y(1) - 4, 'ratio = 1', 'small', { 'text-anchor': 'end' });
  }

  // The curve, broken where the calc broke.
  let d = '';
  let pen = false;
  vals.forEach((v, i) => {
    const y = s.kind === 'condition' ? (s.pass?.[i] == null ? null : s.pass[i] ? 1 : 0) : v;
    if (y === null || !Number.isFinite(y)) {
      pen = false;
      return;
    }
    d += `${pen ? 'L' : 'M'}${n(X(r.xs[i]))} ${n(Y(Math.min(Math.max(y, lo), hi)))}`;
    pen = true;
  });
  g += el('path', { d: d || 'M0 0', class: 'series', stroke: colour, 'data-role': 'series', 'data-name': s.name });
  vals.forEach((v, i) => {
    const x = X(r.xs[i]);
    if (v === null) g += text(x, bottom - 4, '×', 'small', { 'text-anchor': 'middle', fill: '#b0261e' });
    else if (s.pass && s.pass[i] === false) g += el('circle', { cx: x, cy: Y(s.kind === 'condition' ? 0 : Math.min(v, hi)), r: 2.6, fill: '#b0261e' });
    else g += el('circle', { cx: x, cy: Y(s.kind === 'condition' ? 1 : Math.max(Math.min(v, hi), lo)), r: 2, fill: colour });
  });
  // Points outside the input's limits are not computed: said as such, not as breaks of the calc.
  const outside = new Set(r.outside ?? []);
  const broken = Object.entries(s.errors ?? {}).filter(([i]) => !outside.has(Number(i)));
  if (outside.size) g += text(X(r.xs[0]), bottom + 12, `× ${outside.size} outside ${r.limits ?? 'the limits'}: not computed`.slice(0, 50), 'small');
  if (broken.length) g += text(right, bottom + 12, `× calc breaks at ${broken.length} point(s): ${broken[0][1]}`.slice(0, outside.size ? 60 : 110), 'small', { 'text-anchor': 'end' });

  // Where the check starts to fail.
  if (s.crossings?.length) {
    s.crossings.forEach((c, i) => {
      const cx = X(c);
      g += line(cx, top, cx, bottom, 'one', { 'data-role': 'crossing' });
      g += text(cx + 4, top + 24 + 12 * i, `ratio = 1 at ${fmtX(r, c)}`, 'small', { 'data-role': 'crossing-label' });
    });
    if (s.firstFail !== undefined) {
      const fx0 = X(r.xs[s.firstFail]);
      g += text(fx0 + 4, bottom - 6, `first failing point: ${fmtX(r, r.xs[s.firstFail])}`, 'small', { 'data-role': 'first-fail-label' });
    }
  } else if (s.firstFail !== undefined) {
    const cx = X(r.xs[s.firstFail]);
    g += line(cx, top, cx, bottom, 'one', { 'data-role': 'first-fail' });
    g += text(cx + 4, top + 12, `fails from ${fmtX(r, r.xs[s.firstFail])}`, 'small', { 'data-role': 'first-fail-label' });
  } else if (s.pass) {
    g += text(right - 2, bottom - 6, s.pass.every((p) => p !== false) ? 'passes over the whole range' : '', 'small', { 'text-anchor': 'end' });
  }
  return el('g', { 'data-role': 'panel', 'data-name': s.name }, g);
}
