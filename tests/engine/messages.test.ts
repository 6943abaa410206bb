// Messages that say what to do: each names the cell, what was expected and the fix,
// at the column of what was typed (issue 15, items 8 and 11).
import { describe, expect, it } from 'vitest';
import { setInputValueKeepUnit } from '../../runtime/edit/index';
import { parseArgs } from '../../runtime/cli/args';
import { runCalc } from '../../runtime/cli/main';
import { doc, formula, input, run } from './helpers';

async function typed(start: string, value: string, extra = {}) {
  const b = input('B', start, extra);
  const d0 = doc(b, formula('A', 'B * 2 ft', 'ft^2'));
  const d = setInputValueKeepUnit(d0, b.id, value);
  const r = await run(d);
  return { s: r.byName('B'), a: r.byName('A'), engine: r.engine };
}

describe('a bare number for a quantity', () => {
  it('is refused at the input: "B is a length: add a unit, for example 11 ft"', async () => {
    const { s, a, engine } = await typed('9 ft', '11');
    expect(s.status).toBe('error');
    expect(s.error?.message).toBe('B is a length: add a unit, for example 11 ft');
    expect(a.status).toBe('error'); // the last good value is kept, the error is at B
    engine.dispose();
  });

  it('a feet-inch input takes the inch as its unit: h = 18 asks for a unit', async () => {
    const { s, engine } = await typed(`1'-6"`, '18');
    expect(s.error?.message).toBe('B is a length: add a unit, for example 18 in');
    engine.dispose();
  });

  it('is refused in --set too, with a line naming the input', async () => {
    const err: string[] = [];
    const code = await runCalc(parseArgs(['docs-templates/spread-footing.lt', '--set', 'B=11']), () => {}, (s) => err.push(s));
    expect(code).toBe(2);
    expect(err).toContain('--set B=11: B is a length: add a unit, for example 11 ft');
  });
});

describe('a value of the wrong kind', () => {
  it('names the kind the input is and the kind typed, without crossing kind and unit', async () => {
    const { s, engine } = await typed('9 ft', '11 psi');
    expect(s.error?.message).toBe('B is a length (ft), but 11 psi is a stress or pressure: give a length, for example 11 ft');
    expect(s.error?.message).not.toMatch(/pressure \(ft\)/);
    engine.dispose();
  });
});

describe('the column of an error in a value', () => {
  it('counts what was typed, not the text after feet-inch notation is rewritten', async () => {
    const { s, engine } = await typed(`1'-6"`, `1'-6" x`);
    expect(s.error?.column).toBe(7); // 1'-6" is 5 characters, a space, then x at column 7
    expect(s.error?.message).toMatch(/"x" is not a unit/);
    engine.dispose();
  });

  it('a value that does not parse says "value", not "formula"', async () => {
    const { s, engine } = await typed('9 ft', '3 +');
    expect(s.error?.message).toMatch(/^cannot read the value of B: /);
    expect(s.error?.message).not.toMatch(/formula/);
    engine.dispose();
  });

  it('a mistyped unit suggests the unit meant', async () => {
    const { s, engine } = await typed('9 ft', '9 ftt');
    expect(s.error?.message).toMatch(/"ftt" is not a unit; did you mean ft\?/);
    expect(s.error?.column).toBe(3);
    engine.dispose();
  });
});

describe('names and functions in formulas', () => {
  it('"if" says how a choice is written, and suggests no look-alike cell', async () => {
    const { byName, engine } = await run(doc(input('Df', '4 ft'), formula('x', 'if(Df > 3 ft, 1, 2)')));
    const m = byName('x').error?.message ?? '';
    expect(m).not.toMatch(/Df\?/);
    expect(m).toMatch(/condition \? value_if_true : value_if_false/);
    engine.dispose();
  });

  it('"sum" says to add with +; an unknown function lists the general ones', async () => {
    const { byName, engine } = await run(doc(input('a', '1'), formula('x', 'sum(a, a)'), formula('y', 'zorblat(a)')));
    expect(byName('x').error?.message).toMatch(/add the terms with \+/);
    expect(byName('y').error?.message).toMatch(/the general ones are sqrt, cbrt, abs, min, max/);
    engine.dispose();
  });

  it('a suggestion prefers the name equal but for case, and says what kind of cell it is', async () => {
    const { byName, engine } = await run(doc(
      input('d', '7.5 in', { label: 'Effective depth' }), input('Dx', '1 ft'), formula('x', 'D * 2'),
    ));
    expect(byName('x').error?.message).toBe('"D" is not the name of any cell; did you mean d (the input "Effective depth")?');
    engine.dispose();
  });

  it('--set on a formula says it is a formula and which inputs it reads', async () => {
    const err: string[] = [];
    const code = await runCalc(parseArgs(['docs-templates/spread-footing.lt', '--set', 'Pu=100 kip']), () => {}, (s) => err.push(s));
    expect(code).toBe(2);
    expect(err.join('\n')).toMatch(/Pu is a formula \(Pu = combo_u_force\(PD, PL\)\), not an input; --set changes inputs only: set one it reads \(PD, PL\)/);
  });
});
