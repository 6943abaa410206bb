// The package's command line: several FILEs go with --package only; --cover keys are named
// when a bad one is given; options that do not make sense for a package are refused.

import { describe, expect, it } from 'vitest';
import { parseArgs, UsageError } from '../../runtime/cli/args';

const refused = (argv: string[]) => {
  try {
    parseArgs(argv);
  } catch (e) {
    expect(e).toBeInstanceOf(UsageError);
    return (e as Error).message;
  }
  throw new Error(`accepted: ${argv.join(' ')}`);
};

describe('calc --package arguments', () => {
  it('takes several files, the cover and the title block', () => {
    const a = parseArgs(['a.lt', 'b.lt', 'c.html', '--package', 'p.html', '--pdf', 'p.pdf', '--paper', 'a4', '--cover', 'engineer=C. Marsh, PE', '--cover', 'licence=PE 1', '--meta', 'job=LT-1']);
    expect(a.files).toEqual(['a.lt', 'b.lt', 'c.html']);
    expect(a.file).toBe('a.lt');
    expect(a.packageTo).toBe('p.html');
    expect(a.covers).toEqual([{ key: 'engineer', field: 'name', value: 'C. Marsh, PE' }, { key: 'licence', field: 'license', value: 'PE 1' }]);
    expect(a.paper).toBe('A4');
  });

  it('refuses several files without --package, a bad cover key, and options a package does not take', () => {
    expect(refused(['a.lt', 'b.lt'])).toMatch(/several go with --package/);
    expect(refused(['a.lt', '--package', 'p.html', '--cover', 'stamp=x'])).toBe('--cover stamp: no such cover key; the keys are title, engineer, license (or licence), firm');
    expect(refused(['a.lt', '--cover', 'title=x'])).toBe('--cover goes with --package');
    expect(refused(['a.lt', 'b.lt', '--package', 'p.html', '--set', 'B=9 ft'])).toMatch(/--set does not go with --package/);
    expect(refused(['a.lt', 'b.lt', '--package', 'p.html', '--export', 'r.html'])).toMatch(/--export does not go with --package/);
  });
});
