// A fault inside the engine is Loadtrace's, not the document's: the CLI exits 2 with a
// message, never 1 (which means "a check fails") and never with a bare stack trace.
import { describe, expect, it, vi } from 'vitest';

vi.mock('../../runtime/engine', () => ({
  createEngine: () => {
    throw new RangeError('Maximum call stack size exceeded');
  },
}));

const { runCalc } = await import('../../runtime/cli/main');
const { parseArgs } = await import('../../runtime/cli/args');

describe('npm run calc when the engine crashes', () => {
  it('exits 2 and says the engine failed', async () => {
    const err: string[] = [];
    const code = await runCalc(parseArgs(['docs-templates/demo.lt']), () => {}, (s) => err.push(s));
    expect(code).toBe(2);
    expect(err.join('\n')).toMatch(/the engine failed \(RangeError: Maximum call stack size exceeded\).*fault in Loadtrace/);
  });
});
