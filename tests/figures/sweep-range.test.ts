// A sweep's range follows its input (issue 19): as wide as the author wrote it, centred on
// the input's current value and kept within the input's least and greatest values, unless
// the author fixed it (`range fixed`). Plain arithmetic on the written widths.

import { describe, expect, it } from 'vitest';
import type { CalcDocument, SweepCell } from '../../runtime/document';
import { setInputValue } from '../../runtime/edit/index';
import { createEngine } from '../../runtime/engine';
import { parse, serialize } from '../../runtime/format/index';
import { sweepRange } from '../../runtime/graph/sweep-program';

const IN = 0.0254;
const inches = (xs: number[]) => xs.map((x) => Math.round((x / IN) * 1e9) / 1e9);

// demand = 1.25 kip/in · x against 12 kip; the sweep is written 4 in to 14 in (10 in wide).
const sheet = (x: string, limits = '', range = '') => `loadtrace 1

input i1  x = ${x}
  unit  in${limits}

formula f1  demand = 1.25 kip/in * x
  unit  kip

check k1  demand <= 12 kip
  name  ok

sweep w1  x
  from    4 in
  to      14 in
  steps   10${range}
  output  ok
`;

async function xsOf(doc: CalcDocument): Promise<number[]> {
  const engine = createEngine(doc);
  await engine.settled();
  const s = engine.state('w1')!;
  engine.dispose();
  expect(s.status).toBe('ok');
  return inches(s.sweep!.xs);
}

const load = (text: string) => {
  const r = parse(text);
  expect(r.errors).toEqual([]);
  return r.doc;
};

describe('sweepRange', () => {
  it('centres the written width on the current value, within the limits', () => {
    expect(sweepRange(4, 14, 8, {}, false)).toEqual([3, 13]); // 8 ∓ 10/2
    expect(sweepRange(4, 14, 6, { min: 2 }, false)).toEqual([2, 12]); // 1 would be below 2: moved up
    expect(sweepRange(4, 14, 19, { max: 20 }, false)).toEqual([10, 20]); // 24 would be above 20: moved down
    expect(sweepRange(4, 14, 8, { min: 5, max: 12 }, false)).toEqual([5, 12]); // 10 wide, only 7 allowed: cut to the limits
    expect(sweepRange(14, 4, 8, {}, false)).toEqual([13, 3]); // written downwards: kept so
    expect(sweepRange(4, 14, 30, {}, true)).toEqual([4, 14]); // fixed by the author
  });
});

describe('a sweep cell', () => {
  it('follows its input when it moves, so the range always holds the current value', async () => {
    const doc = load(sheet('8 in'));
    expect(await xsOf(doc)).toEqual([3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13]);
    // The defect: moved to 20 in, the written 4–14 in no longer held the input.
    const moved = setInputValue(doc, 'i1', '20 in');
    expect(await xsOf(moved)).toEqual([15, 16, 17, 18, 19, 20, 21, 22, 23, 24, 25]);
  });

  it('stays within the input\'s limits: no point is outside them', async () => {
    const limited = load(sheet('6 in', '\n  min   5 in\n  max   30 in'));
    expect(await xsOf(limited)).toEqual([5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15]); // 1–11 in moved up to start at 5 in
    const engine = createEngine(limited);
    await engine.settled();
    expect(engine.state('w1')!.sweep!.outside).toBeUndefined();
    engine.dispose();
  });

  it('keeps the range as written when the author fixed it, in the text format too', async () => {
    const text = sheet('20 in', '', '\n  range   fixed');
    const doc = load(text);
    expect((doc.cells.find((c) => c.id === 'w1') as SweepCell).fixed).toBe(true);
    expect(serialize(doc)).toMatch(/\n {2}range +fixed\n/);
    expect(parse(serialize(doc)).doc).toEqual(doc);
    expect(serialize(load(sheet('20 in')))).not.toMatch(/range/); // centred: no line
    expect(await xsOf(doc)).toEqual([4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14]);
    const bad = parse(sheet('8 in', '', '\n  range   wide'));
    expect(bad.errors.map((e) => [e.line, e.message])).toEqual([[16, 'range may only be "fixed" (keep from and to as written), not "wide"']]);
  });
});
