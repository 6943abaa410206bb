// Figure cells through the engine, the text format and the view modules: type-checked
// like formulas, labelled in the units of the cells they read, re-drawn on change.

import { describe, expect, it } from 'vitest';
import type { CalcDocument, FigureCell, SweepCell } from '../../runtime/document';
import { createEngine } from '../../runtime/engine';
import { renameCell, setInputValue } from '../../runtime/edit/index';
import { switchSystem } from '../../runtime/units/systems';
import { parse, serialize } from '../../runtime/format/index';
import { applySource } from '../../runtime/edit/index';
import { bindFigure, renderFigureView } from '../../runtime/kinds/figure';
import { bindSweep, parseSweepSource, renderSweepView, sweep as sweepKind, sweepSource } from '../../runtime/kinds/sweep';
import { checkXml, pathLength } from './xml';

const IN = 0.0254;

const TEXT = `loadtrace 1

input i1  c1 = 18 in
  unit  in

input i2  d = 6 in
  unit  in

input i3  pos = interior
  choice interior
  choice edge
  choice corner

formula f1  bo = bo_punch(c1, c1, d, pos)
  unit      in

figure g1  punching_plan(c1, c1, d, pos)
  label  Plan at the column

sweep w1  d
  from   4 in
  to     10 in
  steps  6
  output bo
  label  bo against d
`;

function load(): CalcDocument {
  const r = parse(TEXT);
  expect(r.errors).toEqual([]);
  return r.doc;
}

function withFigure(d: CalcDocument, expr: string): CalcDocument {
  return applySource(d, 'g1', expr);
}

describe('figure cell in the engine', () => {
  it('computes a spec whose perimeter is the bo cell, labelled in the cells’ units', async () => {
    const engine = createEngine(load());
    await engine.settled();
    const st = engine.state('g1')!;
    expect(st.status).toBe('ok');
    expect(st.figure!.figure).toBe('punching');
    expect(st.figure!.units).toEqual({ c1: 'in', c2: 'in', d: 'in' });
    expect(st.figure!.system).toBe('US');
    expect(st.clauses[0]).toMatch(/ACI 318-19 §22\.6\.4\.1/);
    const bo = engine.state('f1')!.value as number;
    expect((st.figure as { bo: number }).bo).toBe(bo);
    expect(bo / IN).toBeCloseTo(4 * (18 + 6), 9); // 2(c1 + d) + 2(c2 + d), ACI 318-19 §22.6.4.1
    engine.dispose();
  });

  it('is re-drawn when a value it reads changes', async () => {
    const d = load();
    const engine = createEngine(d);
    await engine.settled();
    const first = engine.state('g1')!.figure!;
    const changed: string[][] = [];
    engine.subscribe((ids) => changed.push(ids));
    engine.update(setInputValue(d, 'i3', 'corner'));
    await engine.settled();
    const next = engine.state('g1')!;
    expect(changed.flat()).toContain('g1');
    expect(next.figure).not.toBe(first);
    const svg = renderFigureView(bindFigure(d.cells.find((c) => c.id === 'g1') as FigureCell, {
      state: (id) => engine.state(id), scope: { isCell: () => false, state: () => undefined }, number: '1.1',
    }));
    const els = checkXml(svg.slice(svg.indexOf('<svg'), svg.indexOf('</svg>') + 6)).elements;
    const crit = els.find((e) => e.attrs['data-role'] === 'critical-perimeter')!;
    const drawn = pathLength(crit.attrs.d) / Number(els[0].attrs['data-scale']);
    expect(drawn / IN).toBeCloseTo(2 * (18 + 3), 1); // corner: (c1 + d/2) + (c2 + d/2), ACI 318-19 §22.6.4.1
    engine.dispose();
  });

  it('follows a switch of the sheet to SI and back: labels in the new units of the cells it reads', async () => {
    const d = load();
    const engine = createEngine(d);
    await engine.settled();
    const si = switchSystem(d, 'SI');
    engine.update(si.doc);
    await engine.settled();
    expect(engine.state('g1')!.figure!.units).toEqual({ c1: 'mm', c2: 'mm', d: 'mm' });
    expect(engine.state('g1')!.figure!.system).toBe('SI');
    engine.update(switchSystem(si.doc, 'US', si.memory).doc);
    await engine.settled();
    expect(engine.state('g1')!.figure!.units).toEqual({ c1: 'in', c2: 'in', d: 'in' });
    engine.dispose();
  });

  it('takes SI labels from units typed after numbers', async () => {
    const engine = createEngine(withFigure(load(), 'punching_plan(500 mm, 400 mm, 180 mm, "edge")'));
    await engine.settled();
    const f = engine.state('g1')!.figure!;
    expect(f.units).toEqual({ c1: 'mm', c2: 'mm', d: 'mm' });
    expect(f.system).toBe('SI');
    engine.dispose();
  });

  it('type-checks like a formula: wrong units, non-figures and figure functions in formulas are errors', async () => {
    const base = load();
    const cases: [CalcDocument, string, RegExp][] = [
      [withFigure(base, 'punching_plan(c1, c1, 5 psi, pos)'), 'unit', /argument 3 \(d\) must be a length/],
      [withFigure(base, 'c1 * 2'), 'not-allowed', /calls a figure function/],
      [withFigure(base, 'punching_plan(c1, c1, d, pos, 40 in)'), 'library', /x1, x2 and d_slab together/],
      [withFigure(base, 'punching_plan(c1, c1, d, "middle")'), 'library', /position must be one of/],
      [{ ...base, cells: [...base.cells, { kind: 'formula', id: 'f9', name: 'z', expr: 'punching_plan(c1, c1, d, pos)' }] }, 'unknown-name', /no function "punching_plan"/],
    ];
    for (const [d, kind, msg] of cases) {
      const engine = createEngine(d);
      await engine.settled();
      const id = d.cells.some((c) => c.id === 'f9') ? 'f9' : 'g1';
      const s = engine.state(id)!;
      expect(s.status).toBe('error');
      expect(s.error!.kind).toBe(kind);
      expect(s.error!.message).toMatch(msg);
      engine.dispose();
    }
  });
});

describe('figure and sweep cells in the format, the edits and the view', () => {
  it('round-trip through the text format as written', () => {
    const d = load();
    expect(d.cells.find((c) => c.id === 'w1')).toEqual({
      kind: 'sweep', id: 'w1', input: 'd', from: '4 in', to: '10 in', steps: 6, outputs: ['bo'], label: 'bo against d',
    });
    const out = serialize(d);
    expect(out).toContain('figure g1  punching_plan(c1, c1, d, pos)\n  label  Plan at the column\n');
    expect(out).toContain('sweep w1  d\n  from   4 in\n  to     10 in\n  steps  6\n  output bo\n  label  bo against d\n');
    expect(parse(out).doc).toEqual(d);
  });

  it('renaming a cell renames it in figure expressions and in sweeps', () => {
    let d = renameCell(load(), 'i2', 'd_eff');
    d = renameCell(d, 'f1', 'b_o');
    expect((d.cells.find((c) => c.id === 'g1') as FigureCell).expr).toBe('punching_plan(c1, c1, d_eff, pos)');
    const w = d.cells.find((c) => c.id === 'w1') as SweepCell;
    expect([w.input, w.outputs]).toEqual(['d_eff', ['b_o']]);
  });

  it('the sweep source a person types reads back to the same cell', () => {
    const w = load().cells.find((c) => c.id === 'w1') as SweepCell;
    expect(sweepSource(w)).toBe('d from 4 in to 10 in steps 6 plot bo');
    expect(sweepKind.source.write(w)).toBe('d from 4 in to 10 in steps 6 plot bo');
    expect(parseSweepSource('h from 6 in to 1\'-0" plot punch_ok, phiVc')).toEqual({
      ok: true, value: { input: 'h', from: '6 in', to: '1\'-0"', outputs: ['punch_ok', 'phiVc'] },
    });
    const bad = parseSweepSource('h from 6 in to 12 in');
    expect(bad.ok).toBe(false);
    const edited = applySource(load(), 'w1', 'c1 from 12 in to 30 in steps 9 plot bo');
    expect(edited.cells.find((c) => c.id === 'w1')).toMatchObject({ input: 'c1', from: '12 in', to: '30 in', steps: 9, outputs: ['bo'] });
  });

  it('the sweep view draws the chart with the label as its title', async () => {
    const d = load();
    const engine = createEngine(d);
    await engine.settled();
    const cell = d.cells.find((c) => c.id === 'w1') as SweepCell;
    const html = renderSweepView(bindSweep(cell, { state: (id) => engine.state(id), scope: { isCell: () => false, state: () => undefined }, number: '1.2' }));
    const svg = html.slice(html.indexOf('<svg'), html.indexOf('</svg>') + 6);
    const { problems, elements } = checkXml(svg);
    expect(problems).toEqual([]);
    expect(elements.find((e) => e.name === 'title')!.text).toBe('bo against d');
    expect(elements.filter((e) => e.attrs['data-role'] === 'series')).toHaveLength(1);
    engine.dispose();
  });
});

describe('figures in the static record', () => {
  it('the static rendering embeds every figure and sweep as escaped SVG', async () => {
    const { staticHtml } = await import('../../runtime/record/static-html');
    const d = load();
    const engine = createEngine(d);
    await engine.settled();
    const html = staticHtml(d, (id) => engine.state(id));
    expect(html.match(/<svg [^>]*data-figure="punching"/g)).toHaveLength(1);
    expect(html.match(/<svg [^>]*data-figure="sweep"/g)).toHaveLength(1);
    const svg = html.slice(html.indexOf('<svg'), html.indexOf('</svg>') + 6);
    expect(checkXml(svg).problems).toEqual([]);
    engine.dispose();
  });
});
