import { describe, expect, it } from 'vitest';
import { check, doc, formula, input, run } from './helpers';

describe('errors stay at the cell where they arise', () => {
  it('syntax error with a column', async () => {
    const { byName } = await run(doc(formula('x', '1 + * 2')));
    expect(byName('x').error).toMatchObject({ kind: 'syntax', column: 5 });
  });
  it('unknown name suggests the nearest cell name and marks its column', async () => {
    const { byName } = await run(doc(input('Pu', '10 kip'), formula('x', '2 * Pq', 'kip')));
    expect(byName('x').error).toMatchObject({ kind: 'unknown-name', column: 5 });
    expect(byName('x').error?.message).toMatch(/did you mean Pu \(the input\)\?/);
  });
  it('a cycle names every cell in the loop', async () => {
    const { byName } = await run(doc(formula('a', 'c + 1'), formula('b', 'a + 1'), formula('c', 'b + 1'), formula('d', 'c * 2')));
    for (const n of ['a', 'b', 'c']) {
      expect(byName(n).error?.kind).toBe('cycle');
      expect(byName(n).error?.message).toMatch(/a reads c, c reads b, b reads a|b reads a, a reads c, c reads b|c reads b, b reads a, a reads c/);
    }
    expect(byName('d').error).toMatchObject({ kind: 'upstream', upstream: 'c' });
  });
  it('a cell that reads itself', async () => {
    const { byName } = await run(doc(formula('a', 'a + 1')));
    expect(byName('a').error?.message).toMatch(/a uses itself/);
  });
  it('duplicate names are reported at both cells, and readers say which upstream is broken', async () => {
    const { engine, byName } = await run(doc(input('h', '8 in'), input('h', '9 in'), formula('d', 'h - 1 in', 'in')));
    const [a, b] = engine.doc.cells;
    expect(engine.state(a.id)!.error?.kind).toBe('duplicate-name');
    expect(engine.state(b.id)!.error?.kind).toBe('duplicate-name');
    expect(byName('d').error).toMatchObject({ kind: 'upstream', upstream: 'h' });
  });
  it('input outside its allowed range', async () => {
    const { byName } = await run(doc(input('fc', '12000 psi', { min: '2500 psi', max: '10000 psi' } as never)));
    expect(byName('fc').error?.kind).toBe('range');
    expect(byName('fc').error?.message).toMatch(/12000 psi is above the allowed maximum 10000 psi/);
  });
  it('a choice outside its list', async () => {
    const { byName } = await run(doc(input('pos', 'middle', { choices: ['interior', 'edge'] } as never)));
    expect(byName('pos').error).toMatchObject({ kind: 'range' });
  });
  it('non-finite results', async () => {
    const { byName } = await run(doc(input('a', '0 in'), formula('x', '1 in / a'), formula('y', 'sqrt(-1)')));
    expect(byName('x').error?.kind).toBe('non-finite');
    expect(byName('y').error?.kind).toBe('non-finite');
  });
  it('downstream cells name the broken upstream and the rest keeps computing', async () => {
    const { byName } = await run(doc(
      input('a', 'twelve'), formula('b', 'a * 2', 'in'), formula('c', 'b + 1 in', 'in'),
      input('k', '3 ft'), formula('ok', 'k * 2', 'ft'),
    ));
    expect(byName('a').error?.kind).toBe('syntax');
    expect(byName('b').error).toMatchObject({ kind: 'upstream', upstream: 'a' });
    expect(byName('c').error).toMatchObject({ kind: 'upstream', upstream: 'b' });
    expect(byName('ok').display?.text).toBe('6 ft');
  });
  it('invalid cell names', async () => {
    const { byName } = await run(doc(input('sqrt', '1'), formula('and', '1')));
    expect(byName('sqrt').error?.message).toMatch(/function name/);
    expect(byName('and').error?.message).toMatch(/word of the formula language/);
  });
  it('a check with a bad expression is an error, not a pass', async () => {
    const { engine } = await run(doc(check('1 +')));
    expect(engine.state(engine.doc.cells[0].id)!.status).toBe('error');
  });
});

describe('the formula language is restricted', () => {
  const hostile = [
    'evaluate("1+1")', 'import({})', 'createUnit("foo")', 'parse("1")', 'compile("1")', 'simplify("x")',
    'derivative("x^2", "x")', 'resolve("x")', 'typed("f", {})', 'config({number: "BigNumber"})',
    'reviver', 'range(1, 1e8)', 'f(x) = x', 'a.b', 'x[1]', '[1, 2]', '{a: 1}', 'document', 'window',
    'globalThis', 'process', 'constructor', '__proto__', 'x = 2', 'a; b', '1:1e9', 'cos.constructor("return 1")()',
  ];
  it.each(hostile)('%s is refused at the cell', async (expr) => {
    const { byName } = await run(doc(formula('x', expr)));
    const s = byName('x');
    expect(s.status).toBe('error');
    expect(['not-allowed', 'unknown-name', 'syntax']).toContain(s.error?.kind);
  });
  it('deep nesting is an error, not a stack overflow', async () => {
    const { byName } = await run(doc(formula('x', '('.repeat(300) + '1' + ')'.repeat(300)), formula('y', '-'.repeat(1900) + '1')));
    expect(byName('x').error?.kind).toBe('syntax');
    expect(['syntax', 'ok']).toContain(byName('y').status === 'ok' ? 'ok' : byName('y').error?.kind);
  });
  it('over-long formulas are refused', async () => {
    const { byName } = await run(doc(formula('x', '1+'.repeat(1500) + '1')));
    expect(byName('x').error?.message).toMatch(/limit is 2000/);
  });
});
