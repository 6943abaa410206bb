// The run kind: a trace written once, computed for every row of a table, with the
// trace's inputs named like columns taking each row's value. Hand calc on invented values:
// factored load Pu = 1.2 P (the dead-load factor of ASCE 7-22 §2.3.1 combination 1 is 1.4;
// 1.2 here is only a number for the test), ratio = Pu / cap.

import { describe, expect, it } from 'vitest';
import type { CalcDocument } from '../../runtime/document';
import { setInputValue } from '../../runtime/edit/index';
import { setTableValue } from '../../runtime/edit/table-ops';
import { createEngine } from '../../runtime/engine';
import { parse, serialize } from '../../runtime/format/index';
import { staticHtml } from '../../runtime/record/static-html';
import { summaryRows } from '../../runtime/present/summary';

const TEXT = `loadtrace 1

table t1  cols
  column mark  text
  column P     kip
  | A | 100
  | B | 300

section s1  One column

input i1  P = 200 kip

input i2  cap = 250 kip

formula f1  Pu = 1.2*P
  unit      kip

check k1  Pu <= cap
  name   ok

section s2  Every column

run r1  rows
  over   cols
  trace  s1
  result Pu
  result ok
`;

function doc(): CalcDocument {
  const r = parse(TEXT);
  expect(r.errors).toEqual([]);
  return r.doc;
}

async function run(d: CalcDocument) {
  const engine = createEngine(d);
  await engine.settled();
  return engine;
}

describe('run', () => {
  it('round-trips its text block', () => {
    expect(serialize(doc())).toBe(TEXT);
  });

  it('computes the trace for every row, and names the governing row', async () => {
    const engine = await run(doc());
    const s = engine.state('r1')!;
    expect(s.error).toBeUndefined();
    const r = s.run!;
    expect(r.traces.map((t) => t.key)).toEqual(['A', 'B']);
    // A: Pu = 1.2 × 100 = 120 kip, 120/250 = 0.48; B: 1.2 × 300 = 360 kip, 360/250 = 1.44
    expect(r.traces[0].results[0]).toBeCloseTo(120 * 4448.2216152605, 3);
    expect(r.traces[0].results[1]).toBeCloseTo(0.48, 12);
    expect(r.traces[1].results[1]).toBeCloseTo(1.44, 12);
    expect(r.traces.map((t) => t.status)).toEqual(['ok', 'fail']);
    expect(s.status).toBe('fail');
    expect(r.worst).toEqual({ row: 1, name: 'ok', ratio: expect.closeTo(1.44, 12) });
    // The sheet's own trace keeps its own input: 1.2 × 200 = 240 kip.
    expect(engine.state('f1')!.display!.text).toBe('240 kip');
    // The summary of checks lists the run with its governing row.
    const rows = summaryRows(doc().cells, (id) => engine.state(id), new Map());
    expect(rows[0].title).toBe('rows, every row of cols: governing B (ok)');
    engine.dispose();
  });

  it('an edit of one row recomputes that row only; an edit the trace reads recomputes every row', async () => {
    let d = doc();
    const engine = await run(d);
    const before = engine.state('r1')!.run!;
    d = setTableValue(d, 't1', 0, 1, '150');
    engine.update(d);
    await engine.settled();
    const after = engine.state('r1')!.run!;
    expect(after.traces[1]).toBe(before.traces[1]);
    expect(after.traces[0]).not.toBe(before.traces[0]);
    expect(after.traces[0].results[1]).toBeCloseTo(0.72, 12); // 1.2 × 150 / 250
    d = setInputValue(d, 'i2', '400 kip');
    engine.update(d);
    await engine.settled();
    const third = engine.state('r1')!.run!;
    expect(third.traces[1]).not.toBe(after.traces[1]);
    expect(third.traces[1].results[1]).toBeCloseTo(0.9, 12); // 360 / 400
    expect(third.traces[1].status).toBe('ok');
    engine.dispose();
  });

  it('gives each row its trace, drawn with the row values', async () => {
    const engine = await run(doc());
    const states = engine.traceStates!('r1', 1)!;
    expect(states('f1')!.display!.text).toBe('360 kip');
    expect(states('k1')!.status).toBe('fail');
    expect(states('i2')!.display!.text).toBe('250 kip');
    expect(engine.traceStates!('r1', 5)).toBeUndefined();
    engine.dispose();
  });

  it('says what is wrong: no such table, no section, a column of another kind than its input', async () => {
    const bad = (from: string, to: string) => parse(TEXT.replace(from, to)).doc;
    let engine = await run(bad('over   cols', 'over   colz'));
    expect(engine.state('r1')!.error!.message).toBe('"colz" is not the name of any cell');
    engine.dispose();
    engine = await run(bad('trace  s1', 'trace  s9'));
    expect(engine.state('r1')!.error!.message).toBe('"s9" is not the id of a section');
    engine.dispose();
    engine = await run(bad('column P     kip', 'column P     ft'));
    expect(engine.state('r1')!.error!.message).toContain('column P of cols is a length');
    engine.dispose();
  });

  it('the record shows the result table with every row', async () => {
    const d = doc();
    const engine = await run(d);
    const html = staticHtml(d, (id) => engine.state(id));
    expect(html).toContain('<table class="lt-table lt-run">');
    expect(html).toContain('<th scope="row">B</th><td>360 kip</td><td>1.44</td><td>ok 1.44</td><td class="run-status">✗ NOT OK</td>');
    engine.dispose();
  });
});

describe('the run example in FORMAT.md', () => {
  it('reads with no error and is written back byte for byte', async () => {
    const { readFileSync } = await import('node:fs');
    const spec = readFileSync(new URL('../../runtime/format/FORMAT.md', import.meta.url), 'utf8');
    const example = [...spec.matchAll(/```loadtrace\n([\s\S]*?)```/g)].map((m) => m[1]).find((e) => e.startsWith('run '))!;
    const r = parse(`loadtrace 1\n\n${example}`);
    expect(r.errors).toEqual([]);
    expect(serialize(r.doc)).toBe(`loadtrace 1\n\n${example}`);
  });
});
