import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { CalcDocument } from '../../runtime/document';
import { createEngine } from '../../runtime/engine';
import { doc, formula, input } from './helpers';

// Whatever is typed as a formula, the engine gives every cell a final state and never throws.
async function settlesCleanly(exprs: string[], unit?: string): Promise<void> {
  const d: CalcDocument = doc(
    input('a', '12 in'), input('b', '3 kip'), input('fc', '4000 psi'), input('pos', 'edge', { choices: ['interior', 'edge'] } as never),
    ...exprs.map((e, i) => formula(`x${i}`, e, i === 0 ? unit : undefined)),
    { kind: 'check', id: 'chk', expr: exprs[0] ?? '1' },
  );
  const engine = createEngine(d);
  await engine.settled();
  for (const c of d.cells) {
    const s = engine.state(c.id);
    expect(s, c.id).toBeDefined();
    expect(['ok', 'fail', 'error']).toContain(s!.status);
    if (s!.status === 'error') expect(s!.error!.message.length).toBeGreaterThan(0);
  }
  engine.dispose();
}

const leaf = fc.oneof(
  fc.constantFrom('a', 'b', 'fc', 'pos', 'x0', 'x1', 'L', 'in', 'ft', 'kip', 'psi', 'document', 'pi', 'e', 'phi', 'true', '"edge"', 'constructor', 'evaluate'),
  fc.double({ noNaN: false }).map(String),
  fc.integer({ min: -1000, max: 1000 }).map(String),
  fc.constantFrom('12 in', '3 kip', '150 lbf/ft^3', '5 kip ft', '2 kN*m', '1e308', '0'),
);
const expr: fc.Arbitrary<string> = fc.letrec((tie) => ({
  node: fc.oneof({ maxDepth: 5, depthIdentifier: 'expr' },
    leaf,
    fc.tuple(tie('node'), fc.constantFrom('+', '-', '*', '/', '^', '<=', '>=', '==', 'and', 'or', ' ', 'mod', 'to', '.', '%'), tie('node')).map(([x, op, y]) => `${x} ${op} ${y}`),
    tie('node').map((x) => `(${x})`),
    tie('node').map((x) => `-${x}`),
    fc.tuple(fc.constantFrom('sqrt', 'max', 'min', 'abs', 'ceil_to', 'evaluate', 'import', 'cos', 'nope', 'range', 'config'), fc.array(tie('node'), { maxLength: 3 })).map(([f, args]) => `${f}(${args.join(', ')})`),
    fc.tuple(tie('node'), tie('node'), tie('node')).map(([c, x, y]) => `${c} ? ${x} : ${y}`),
    fc.array(tie('node'), { maxLength: 3 }).map((xs) => `[${xs.join(', ')}]`),
  ),
})).node as fc.Arbitrary<string>;

describe('no formula crashes the engine (fast-check)', () => {
  it('random strings as formulas', async () => {
    await fc.assert(
      fc.asyncProperty(fc.array(fc.string({ maxLength: 60, unit: 'binary' }), { minLength: 1, maxLength: 3 }), fc.constantFrom(undefined, 'in', 'kip', 'psi'), async (xs, unit) => {
        await settlesCleanly(xs, unit);
      }),
      { numRuns: 1000 },
    );
  });
  it('random expression trees as formulas', async () => {
    await fc.assert(
      fc.asyncProperty(fc.array(expr, { minLength: 1, maxLength: 3 }), fc.constantFrom(undefined, 'in', 'kip*ft'), async (xs, unit) => {
        await settlesCleanly(xs, unit);
      }),
      { numRuns: 1200 },
    );
  });
  it('random input values', async () => {
    await fc.assert(
      fc.asyncProperty(fc.string({ maxLength: 40 }), fc.option(fc.constantFrom('in', 'psi', 'kip', 'nonsense', ''), { nil: undefined }), async (value, unit) => {
        const d = doc(input('a', value, unit === undefined ? {} : ({ unit } as never)), formula('b', 'a * 2', 'in'));
        const engine = createEngine(d);
        await engine.settled();
        for (const c of d.cells) expect(['ok', 'error']).toContain(engine.state(c.id)!.status);
        engine.dispose();
      }),
      { numRuns: 500 },
    );
  });
});
