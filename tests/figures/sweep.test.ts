// Sweep cells and engine.whatIf: each point equals a fresh engine run with the input set
// there; the document and the running engine are left exactly as they were; the first
// failing point and the crossing of ratio = 1 are where the arithmetic puts them.

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { CalcDocument, InputCell, SweepCell } from '../../runtime/document';
import { createEngine } from '../../runtime/engine';
import { setInputValue } from '../../runtime/edit/index';
import { parse } from '../../runtime/format/index';
import { sweepPoints, sweepRange } from '../../runtime/graph/sweep-program';
import { bindSweep, outsideText, renderSweepView } from '../../runtime/kinds/sweep';
import { renderSweepChart } from '../../runtime/figures/sweep-chart';

const IN = 0.0254, FT = 0.3048;

function load(text: string): CalcDocument {
  const r = parse(text);
  expect(r.errors).toEqual([]);
  return r.doc;
}

// demand = k·x grows with x; capacity fixed: ratio = 1.25 kip/in · x / 12 kip, so it
// crosses 1 at x = 12 / 1.25 = 9.6 in (arithmetic). root = √(x − 5 in) breaks below 5 in.
// The range is fixed as written (range fixed); a centred one is tested in sweep-range.test.ts.
const LINEAR = `loadtrace 1

input i1  x = 8 in
  unit  in

input i2  k = 1.25 kip/in
  unit  kip/in

input i3  cap = 12 kip
  unit  kip

formula f1  demand = k * x
  unit  kip

check k1  demand <= cap
  name  ok

formula f2  root = sqrt(x - 5 in)
  unit  in^0.5

sweep w1  x
  from    4 in
  to      14 in
  steps   10
  range   fixed
  output  ok
  output  demand
  output  root
`;

describe('sweep cell', () => {
  it('finds the first failing point and the crossing of ratio = 1', async () => {
    const engine = createEngine(load(LINEAR));
    await engine.settled();
    const st = engine.state('w1')!;
    expect(st.status).toBe('ok');
    const sw = st.sweep!;
    expect(sw.xs.map((x) => Math.round((x / IN) * 1e9) / 1e9)).toEqual([4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14]);
    expect(sw.current).toBeCloseTo(8 * IN, 12);
    const ok = sw.series[0];
    expect(ok.kind).toBe('ratio');
    expect(ok.firstFail).toBe(6); // x = 10 in: ratio 12.5/12 = 1.042 > 1; at 9 in 11.25/12 = 0.9375
    expect(ok.crossings).toHaveLength(1);
    expect(ok.crossings![0] / IN).toBeCloseTo(9.6, 9); // linear ratio: interpolation is exact
    expect(ok.values[4]).toBeCloseTo(10 / 12, 12); // x = 8 in: 1.25 × 8 / 12
    const demand = sw.series[1];
    expect(demand.kind).toBe('value');
    expect(demand.unit).toBe('kip');
    expect(demand.values[0]! / 4448.2216152605).toBeCloseTo(5, 9); // 1.25 kip/in × 4 in (1 kip = 4448.222 N, NIST SP 811)
    // The root breaks below 5 in and only there.
    const root = sw.series[2];
    expect(root.values[0]).toBeNull();
    expect(Object.keys(root.errors ?? {})).toEqual(['0']);
    expect(root.values.slice(1).every((v) => v !== null)).toBe(true);
    engine.dispose();
  });

  it('recomputes when the inputs it reads change, and reports what is wrong with it', async () => {
    const d = load(LINEAR);
    const engine = createEngine(d);
    await engine.settled();
    const before = engine.state('w1')!.sweep!;
    engine.update(setInputValue(d, 'i3', '15 kip'));
    await engine.settled();
    const after = engine.state('w1')!.sweep!;
    expect(after).not.toBe(before);
    expect(after.series[0].crossings![0] / IN).toBeCloseTo(12, 9); // 15 / 1.25
    const bad = (patch: Partial<SweepCell>) => ({ ...d, cells: d.cells.map((c) => (c.id === 'w1' ? { ...c, ...patch } as SweepCell : c)) });
    for (const [patch, kind, msg] of [
      [{ input: 'nothing' }, 'unknown-name', /not the name of any cell/],
      [{ input: 'demand' }, 'not-allowed', /not an input cell/],
      [{ from: '4 kip' }, 'unit', /must be a length/],
      [{ outputs: [] }, 'syntax', /at least one/],
      [{ steps: 0 }, 'range', /steps must be/],
      [{ to: '4 in' }, 'range', /same value/],
    ] as const) {
      engine.update(bad(patch as Partial<SweepCell>));
      await engine.settled();
      const s = engine.state('w1')!;
      expect(s.status).toBe('error');
      expect(s.error!.kind).toBe(kind);
      expect(s.error!.message).toMatch(msg);
    }
    engine.dispose();
  });
});

describe('what-if on a real template (docs-templates/figures-demo.lt)', () => {
  const text = readFileSync(new URL('../../docs-templates/figures-demo.lt', import.meta.url), 'utf8');

  it('every point of the footing sweep equals a fresh engine run with B_f set there', async () => {
    const d = load(text);
    const engine = createEngine(d);
    await engine.settled();
    const sw = engine.state('w2')!.sweep!;
    const id = (name: string) => d.cells.find((c) => 'name' in c && c.name === name)!.id;
    const input = d.cells.find((c) => c.id === id('B_f')) as InputCell;
    // Written 7 ft to 12 ft; centred on B_f = 9.5 ft that is 7 ft to 12 ft again (9.5 ∓ 2.5 ft).
    const pts = sweepPoints(...sweepRange(7 * FT, 12 * FT, 9.5 * FT, {}, false), 20);
    expect([pts[0] / FT, pts[20] / FT]).toEqual([expect.closeTo(7, 12), expect.closeTo(12, 12)]);
    expect(sw.xs).toEqual(pts);
    for (const [i, x] of pts.entries()) {
      if (i % 4 !== 0 && i !== 13) continue; // a spread of points, keeping the run short
      const fresh = createEngine(setInputValue(d, input.id, `${x / FT} ft`));
      await fresh.settled();
      const soil = fresh.state(id('soil_ok'))!;
      const punch = fresh.state(id('footing_punch_ok'))!;
      const qs = fresh.state(id('q_s'))!;
      expect(sw.series[0].values[i]).toBeCloseTo(soil.ratio!, 10);
      expect(sw.series[0].pass![i]).toBe(soil.status === 'ok');
      expect(sw.series[1].values[i]).toBeCloseTo(punch.ratio!, 10);
      expect(sw.series[2].values[i]! / (qs.value as number)).toBeCloseTo(1, 12);
      fresh.dispose();
    }
    // Soil: q_s = 300 kip / B² ≤ q_net = 3.36 ksf ⇒ B ≥ √(300/3.36) = 9.449 ft (hand); the
    // sweep steps by 0.25 ft, so the last failing point is 9.25 ft and the crossing near 9.45 ft.
    const s0 = sw.series[0];
    expect(s0.firstFail).toBe(0);
    expect(s0.pass!.lastIndexOf(false)).toBe(9); // 7 + 9 × 0.25 = 9.25 ft
    expect(s0.crossings).toHaveLength(1);
    expect(Math.abs(s0.crossings![0] / FT - 9.449)).toBeLessThan(0.01); // interpolated on a curve: within 0.01 ft
    engine.dispose();
  });

  it('engine.whatIf leaves the document and every cell state as they were', async () => {
    const d = load(text);
    const snapshot = JSON.stringify(d);
    const engine = createEngine(d);
    await engine.settled();
    const states = new Map(d.cells.map((c) => [c.id, engine.state(c.id)]));
    const frozen = JSON.stringify([...states]);
    let notified = 0;
    const off = engine.subscribe(() => notified++);
    const got = engine.whatIf!('h', [6 * IN, 8 * IN, 10 * IN, 12 * IN], ['punch_ok', 'phiVc', 'bo']);
    expect(got).toHaveLength(4);
    // Hand: φVc = 0.75 × 4√5000 psi × bo × d (λs = 1 for d ≤ 10 in; ACI 318-19 Table 22.6.5.2(a), §22.5.5.1.3):
    // h = 6 in: d = 4.75, bo = 69.5 in → 70.0 kip < 100 kip (fails); h = 8 in: d = 6.75, bo = 73.5 in → 105.2 kip (passes)
    expect(got.map((p) => p.punch_ok.pass)).toEqual([false, true, true, true]);
    expect(got[1].phiVc.value as number / 4448.2216152605).toBeCloseTo(0.75 * 4 * Math.sqrt(5000) * 73.5 * 6.75 / 1000, 6);
    await engine.settled();
    await new Promise((r) => setTimeout(r, 20));
    expect(notified).toBe(0);
    expect(JSON.stringify(d)).toBe(snapshot);
    expect(engine.doc).toBe(d);
    for (const c of d.cells) expect(engine.state(c.id)).toBe(states.get(c.id)); // the very same state objects
    expect(JSON.stringify([...states])).toBe(frozen);
    // Edge column: bo = 2(c1 + d/2) + (c2 + d) with d = h − 1.25 in (ACI 318-19 §22.6.4.1)
    expect(got[0].bo.value as number / IN).toBeCloseTo(2 * (20 + 4.75 / 2) + 20 + 4.75, 9);
    expect(() => engine.whatIf!('d', [1], ['bo'])).toThrow(/not the name of an input/);
    off();
    engine.dispose();
  });
});

describe('sweep labels follow the cells', () => {
  it('a new display unit on a plotted result shows in the sweep without recompiling it', async () => {
    const d = load(LINEAR);
    const engine = createEngine(d);
    await engine.settled();
    expect(engine.state('w1')!.sweep!.series[1].unit).toBe('kip');
    const next = { ...d, cells: d.cells.map((c) => (c.id === 'f1' ? { ...c, unit: 'lbf' } : c)) };
    engine.update(next);
    await engine.settled();
    const s = engine.state('w1')!.sweep!;
    expect(s.series[1].unit).toBe('lbf');
    expect(s.series[1].values[0]! / 4448.2216152605).toBeCloseTo(5, 9); // values stay SI: 5 kip
    engine.dispose();
  });
});

describe("a sweep across the input's least and greatest values", () => {
  // LINEAR with x limited to 5 in ≤ x ≤ 12 in; the sweep still asks for 4 to 14 in.
  const LIMITED = LINEAR.replace('input i1  x = 8 in\n  unit  in\n', 'input i1  x = 8 in\n  unit  in\n  min   5 in\n  max   12 in\n');
  const inches = (xs: number[]) => xs.map((x) => Math.round((x / IN) * 1e9) / 1e9);

  it('keeps the range asked for, computes only the points inside the limits and lists the others as outside', async () => {
    const d = load(LIMITED);
    expect((d.cells.find((c) => c.id === 'i1') as InputCell).max).toBe('12 in');
    const engine = createEngine(d);
    await engine.settled();
    const st = engine.state('w1')!;
    expect(st.status).toBe('ok');
    const sw = st.sweep!;
    expect(inches(sw.xs)).toEqual([4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14]); // not silently clipped
    expect(sw.limits).toBe('≥ 5 in, ≤ 12 in');
    expect(sw.outside).toEqual([0, 9, 10]); // 4 in below; 13 and 14 in above; 5 and 12 in are allowed (limits inclusive)
    for (const s of sw.series) {
      expect(Object.keys(s.errors ?? {}).map(Number)).toEqual([0, 9, 10]);
      expect([0, 9, 10].map((i) => s.values[i])).toEqual([null, null, null]);
      expect(s.errors![0]).toBe('x = 4 in is below the allowed minimum 5 in; not computed');
      expect(s.errors![9]).toBe('x = 13 in is above the allowed maximum 12 in; not computed');
    }
    // Inside the limits every point is computed as before: demand = 1.25 kip/in · x (arithmetic).
    const demand = sw.series[1];
    for (const i of [1, 4, 8]) expect(demand.values[i]! / 4448.2216152605).toBeCloseTo(1.25 * (4 + i), 9);
    // The check's pass list skips the outside points; the first failure and the crossing stay where they were.
    const ok = sw.series[0];
    expect(ok.pass![0]).toBeNull();
    expect(ok.pass![10]).toBeNull();
    expect(ok.firstFail).toBe(6); // x = 10 in: 12.5/12 > 1
    expect(ok.crossings!.map((c) => c / IN)).toHaveLength(1);
    expect(ok.crossings![0] / IN).toBeCloseTo(9.6, 9);
    // The root (√(x − 5 in)) breaks nowhere inside: 5 in is its edge.
    expect(sw.series[2].values.filter((v) => v !== null)).toHaveLength(8);
    engine.dispose();
  });

  it('engine.whatIf refuses a value outside the limits the same way', async () => {
    const engine = createEngine(load(LIMITED));
    await engine.settled();
    const got = engine.whatIf!('x', [4 * IN, 8 * IN, 12 * IN, 12.5 * IN], ['demand', 'ok']);
    expect(got[0].demand).toEqual({ error: 'x = 4 in is below the allowed minimum 5 in; not computed' });
    expect(got[0].ok.error).toMatch(/below the allowed minimum/);
    expect(got[1].demand.value as number / 4448.2216152605).toBeCloseTo(10, 9); // 1.25 × 8
    expect(got[2].ok.pass).toBe(false); // 12 in is allowed: 15/12 > 1 fails, but is computed
    expect(got[3].demand.error).toMatch(/x = 12\.5 in is above the allowed maximum 12 in/);
    engine.dispose();
  });

  it('follows an edit of the limits, and says nothing for an input without any', async () => {
    const d = load(LIMITED);
    const engine = createEngine(d);
    await engine.settled();
    engine.update({ ...d, cells: d.cells.map((c) => (c.id === 'i1' ? { ...c, max: '16 in' } as InputCell : c)) });
    await engine.settled();
    const sw = engine.state('w1')!.sweep!;
    expect(sw.limits).toBe('≥ 5 in, ≤ 16 in');
    expect(sw.outside).toEqual([0]);
    expect(sw.series[1].values[10]! / 4448.2216152605).toBeCloseTo(17.5, 9); // 1.25 × 14
    engine.dispose();
    const plain = createEngine(load(LINEAR));
    await plain.settled();
    const none = plain.state('w1')!.sweep!;
    expect(none.limits).toBeUndefined();
    expect(none.outside).toBeUndefined();
    expect(outsideText(none)).toBe('');
    plain.dispose();
  });

  it('the view says how many points are outside and why they are blank', async () => {
    const d = load(LIMITED);
    const engine = createEngine(d);
    await engine.settled();
    const sw = engine.state('w1')!.sweep!;
    expect(outsideText(sw)).toBe('3 of 11 points are outside the limits of x (≥ 5 in, ≤ 12 in): not computed, marked ×.');
    expect(outsideText({ ...sw, outside: sw.xs.map((_, i) => i) })).toMatch(/^All 11 points are outside/);
    expect(outsideText({ ...sw, outside: [0] })).toBe('1 of 11 points is outside the limits of x (≥ 5 in, ≤ 12 in): not computed, marked ×.');
    const cell = d.cells.find((c) => c.id === 'w1') as SweepCell;
    const html = renderSweepView(bindSweep(cell, { state: (id) => engine.state(id), scope: { isCell: () => false, state: () => undefined }, number: '1' }));
    expect(html).toContain('data-role="sweep-outside"');
    expect(html).toContain('3 of 11 points are outside the limits of x (≥ 5 in, ≤ 12 in)');
    engine.dispose();
  });

  it('the chart (also in records) says the outside points were not computed, not that the calc broke there', async () => {
    const engine = createEngine(load(LIMITED));
    await engine.settled();
    const sw = engine.state('w1')!.sweep!;
    const svg = renderSweepChart(sw, 'limited');
    expect(svg).toContain('× 3 outside ≥ 5 in, ≤ 12 in: not computed');
    expect(svg).not.toContain('calc breaks');
    // A point that does break inside the limits is still told apart.
    const withBreak = { ...sw, series: sw.series.map((s, k) => (k === 2 ? { ...s, errors: { ...s.errors, 4: 'negative root' } } : s)) };
    expect(renderSweepChart(withBreak, 'limited')).toContain('× calc breaks at 1 point(s): negative root');
    engine.dispose();
  });
});
