// The working on a sheet: the calls a cell makes and their argument values (from the engine),
// which workings the record shows open (the sheet's `working` setting, round-tripped by the
// text format), and the record's static page carrying them. Values: ACI 318-19 Table 22.6.5.2
// and §22.6.4.1 at 5000 psi, a 20 in column, d = 7.5 in (bo = 4 · 27.5 = 110 in, 4√f'c = 282.8 psi).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { createEngine } from '../../runtime/engine';
import { parse, serialize } from '../../runtime/format/index';
import { staticHtml } from '../../runtime/record/static-html';
import { inch, psi } from '../../runtime/units/si';
import { callsOf } from '../../runtime/working/calls';
import { calledFunctions, callFor, governingWorkings, recordOpen } from '../../runtime/working/sheet';

const text = readFileSync(new URL('../e2e/fixtures/punching-working.lt', import.meta.url), 'utf8');

async function computed(source = text) {
  const { doc, errors } = parse(source);
  expect(errors).toEqual([]);
  const engine = createEngine(doc);
  await engine.settled();
  return { doc, engine, state: (id: string) => engine.state(id) };
}

const withSetting = (value: string) => text.replace('date      2026-12-01\n', `date      2026-12-01\nworking   ${value}\n`);

describe('the calls of a cell, with their values', () => {
  it('gives each library call its arguments as the engine computed them, with the units written', async () => {
    const { engine } = await computed();
    const calls = engine.libraryCalls!('f3');
    expect(calls.map((c) => c.lib.name)).toEqual(['bo_punch']);
    expect(calls[0].args).toEqual([20 * inch, 20 * inch, 7.5 * inch, 'interior']);
    expect(calls[0].units.slice(0, 3)).toEqual(['in', 'in', 'in']);
    expect(engine.libraryCalls!('i1')).toEqual([]); // an input calls nothing
    engine.dispose();
  });

  it('orders folds as the engine calls them, so a fold finds its own call', async () => {
    const src = text.replace('formula f3  phiVc = 0.75 * vc * bo_punch(c1, c2, d, "interior") * d',
      'formula f3  phiVc = 0.75 * vc * (bo_punch(c1, c2, d, "interior") + 0 * b1_punch(c1, c2, d, "interior")) * d');
    const { doc, engine } = await computed(src);
    const expr = (doc.cells.find((c) => c.id === 'f3') as { expr: string }).expr;
    expect(calledFunctions(expr)).toEqual(['bo_punch', 'b1_punch']);
    const calls = engine.libraryCalls!('f3');
    expect(callFor(calls, expr, 1)!.lib.name).toBe('b1_punch');
    expect(callFor(calls, expr, 0)!.args[0]).toBe(20 * inch);
    engine.dispose();
  });
});

describe('which workings the record shows open', () => {
  it('by default: those the governing check rests on (here the only check: Vu, vc and phiVc)', async () => {
    const { doc, engine, state } = await computed();
    expect([...governingWorkings(doc, state)].sort()).toEqual(['f1', 'f2', 'f3']);
    const open = recordOpen(doc, state);
    expect(open('f2')).toBe(true);
    engine.dispose();
  });

  it("'working open' opens every one, 'working folded' none; the setting round-trips", async () => {
    for (const [value, want] of [['open', true], ['folded', false], ['governing', true]] as const) {
      const { doc, engine, state } = await computed(withSetting(value));
      expect(doc.working).toBe(value);
      expect(serialize(doc)).toContain(`\nworking   ${value}\n`);
      expect(parse(serialize(doc)).doc).toEqual(doc);
      expect(recordOpen(doc, state)('f2')).toBe(want);
      engine.dispose();
    }
  });

  it('a bad setting is an error at its column; one after the first cell is refused', () => {
    const bad = parse(withSetting('sometimes'));
    expect(bad.errors[0]).toMatchObject({ column: 11 });
    expect(bad.errors[0].message).toContain('governing, open, folded');
    const late = parse(`${text}\nworking   open\n`);
    expect(late.errors[0].message).toContain('before the first cell');
  });
});

describe("the record's static page", () => {
  it('prints the open workings in full, as MathML, and the rest folded with a line on how to see them', async () => {
    const { doc, engine, state } = await computed();
    const html = staticHtml(doc, state, { calls: callsOf(engine) });
    const f2 = html.slice(html.indexOf('id="lt-c-f2"'), html.indexOf('id="lt-c-f3"'));
    expect(f2).toContain('<details class="lt-working lt-wk-top" open><summary>Working of vc_punch</summary>');
    expect(f2).toContain('expression (a) governs');
    expect(f2).toContain('<math');
    expect(f2).toContain('282.8');
    const folded = staticHtml(parse(withSetting('folded')).doc, state, { calls: callsOf(engine) });
    expect(folded).not.toContain('lt-wk-top" open');
    expect(folded).toContain('Folded in this record');
    expect(staticHtml(doc, state)).not.toContain('lt-working'); // no engine given: no working
    engine.dispose();
  });

  it('shows the working of the values now, not of the ones it had when the sheet was opened', async () => {
    const { doc, engine } = await computed();
    engine.update({ ...doc, cells: doc.cells.map((c) => (c.id === 'i1' && c.kind === 'input' ? { ...c, value: '6000 psi' } : c)) });
    await engine.settled();
    const call = engine.libraryCalls!('f2')[0];
    expect(Math.abs((call.args[0] as number) / (6000 * psi) - 1)).toBeLessThan(1e-9);
    engine.dispose();
  });
});
