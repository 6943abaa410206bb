// Typesetting is linear in the size of the formula: mathjs's own templates typeset a
// call's arguments twice, so nested calls cost 2^depth; the hand calc typesets each node once.
import { describe, expect, it, vi } from 'vitest';
import katex from 'katex';
import { formulaTex, parseForDisplay, type HandCalcScope } from '../../runtime/handcalc/index';

const scope: HandCalcScope = {
  isCell: (n) => n === 'n',
  state: () => ({ id: 'i1', status: 'ok', display: { value: 4, unit: 'ft', text: '4 ft' }, clauses: [], reads: [] }),
};

function nested(fn: string, depth: number): string {
  let e = 'n';
  for (let i = 0; i < depth; i++) e = `${fn}(${e})`;
  return e;
}

describe('hand-calc typesetting is linear in the formula', () => {
  it.each(['sqrt', 'abs', 'max'])('%s nested 16 deep typesets each node a bounded number of times', (fn) => {
    const expr = nested(fn, 16);
    const node = parseForDisplay(expr)!;
    const sqrtNode = node as any;
    // Count calls into mathjs's own typesetting of function calls.
    const spy = vi.spyOn(Object.getPrototypeOf(sqrtNode), '_toTex');
    const t = formulaTex('w', expr, undefined, scope, node);
    const calls = spy.mock.calls.length;
    spy.mockRestore();
    // 16 call nodes, two passes (symbolic and with values): at most 2 × 16 calls.
    expect(calls).toBeLessThanOrEqual(32);
    expect(t.symbolic).toBeDefined();
    // The value of n is put in once: one slot for its one occurrence.
    expect(t.substituted!.match(/4/g)!.length).toBe(1);
  });

  it('a 40-deep nest of calls typesets and KaTeX renders it', () => {
    const expr = nested('sqrt', 40);
    const t = formulaTex('w', expr, undefined, scope);
    expect(t.symbolic!.match(/\\sqrt/g)!.length).toBe(40);
    expect(() => katex.renderToString(t.line, { throwOnError: true, strict: 'ignore' })).not.toThrow();
  });
});

describe('a formula too long or too deep for the engine', () => {
  it('a 10 MB formula typesets as a short text saying how long it is, without throwing', () => {
    const expr = 'n + '.repeat(2_500_000) + 'n';
    const t = formulaTex('big', expr, undefined, scope);
    expect(t.symbolic!.length).toBeLessThan(400);
    expect(t.symbolic).toMatch(/10,000,001 characters/);
    expect(() => katex.renderToString(t.line, { throwOnError: true, strict: 'ignore' })).not.toThrow();
  });

  it('a check over 41-deep brackets typesets as its text', async () => {
    const { checkTex } = await import('../../runtime/handcalc/index');
    const expr = `${nested('sqrt', 41)} <= n`;
    const t = checkTex(expr, undefined, scope);
    expect(t.condition).toMatch(/^\\text\{sqrt\(sqrt/);
  });
});
