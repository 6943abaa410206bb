// Long dependency chains and long loops: the engine's graph walks are iterative, so
// a valid document of thousands of chained cells computes instead of overflowing the stack.
import { describe, expect, it } from 'vitest';
import type { Cell } from '../../runtime/document';
import { doc, formula, input, run } from './helpers';

/** a0 = a1 + 1 ft, a1 = a2 + 1 ft, …, then the input: each cell reads one written after it. */
function reversedChain(n: number): Cell[] {
  const cells: Cell[] = [];
  for (let i = 0; i < n; i++) cells.push(formula(`a${i}`, `a${i + 1} + 1 ft`, 'ft'));
  cells.push(input(`a${n}`, '1 ft'));
  return cells;
}

describe('deep graphs', () => {
  it('3,000 formulas written in reverse order compute (each adds 1 ft: 1 + 3000 = 3001 ft)', async () => {
    const { byName, engine } = await run(doc(...reversedChain(3000)));
    expect(byName('a0').status).toBe('ok');
    expect(byName('a0').display?.value).toBeCloseTo(3001, 6);
    engine.dispose();
  });

  it('a 5,000-cell ring is an error at every member, naming the loop briefly', async () => {
    const n = 5000;
    const cells: Cell[] = [];
    for (let i = 0; i < n; i++) cells.push(formula(`r${i}`, `r${(i + 1) % n} + 1 ft`, 'ft'));
    const { byName, engine } = await run(doc(...cells));
    for (const name of ['r0', 'r2500', 'r4999']) {
      const s = byName(name);
      expect(s.status).toBe('error');
      expect(s.error?.kind).toBe('cycle');
      expect(s.error?.message).toMatch(/r0 reads r1, r1 reads r2/);
      expect(s.error!.message.length).toBeLessThan(400);
      expect(s.error?.message).toMatch(/a loop of 5000 cells/);
    }
    engine.dispose();
  });
});
