// `npm run calc -- A --diff B`: two revisions of one record side by side.
// Loads: ASCE 7-22 §2.3.1 combination 2 (1.2D + 1.6L) on invented values.

import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseArgs } from '../../runtime/cli/args';
import { runCalc } from '../../runtime/cli/main';
import { setInputValue } from '../../runtime/edit/index';
import { parse, serialize } from '../../runtime/format/index';
import { exportComputed } from '../../runtime/record/node';
import { issueRevision } from '../../runtime/review/index';
import { STUB_SHELL } from '../record/fixtures';
import { resultsOf, sheet } from './fixture';

async function calc(argv: string[]) {
  const out: string[] = [];
  const err: string[] = [];
  const code = await runCalc(parseArgs(argv), (s) => out.push(s), (s) => err.push(s));
  return { code, out: out.join('\n'), err: err.join('\n') };
}

/** Rev 0 and Rev 1 of the fixture sheet (L 50 → 60 psf) as two files. */
async function twoRevisions(): Promise<[string, string]> {
  const dir = mkdtempSync(join(tmpdir(), 'lt-diff-'));
  let doc = sheet();
  doc = issueRevision(doc, await resultsOf(doc), 'A. Preparer', '2026-12-01', 'For check');
  const a = join(dir, 'rev0.lt');
  writeFileSync(a, serialize(doc));
  doc = setInputValue(doc, 'i2', '60 psf');
  doc = issueRevision(doc, await resultsOf(doc), 'A. Preparer', '2026-12-04', 'L raised');
  const b = join(dir, 'rev1.lt');
  writeFileSync(b, serialize(doc));
  return [a, b];
}

describe('calc --diff', () => {
  it('prints the inputs, results and checks that differ side by side, exit 0', async () => {
    const [a, b] = await twoRevisions();
    const r = await calc([a, '--diff', b]);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const lines = r.out.split('\n');
    expect(lines[0]).toBe('Inputs (1 differs)');
    expect(lines[2]).toMatch(/^ {2}L\s+50 psf\s+60 psf$/);
    // qu: 1.2 × 100 + 1.6 × 50 = 200 psf → 1.2 × 100 + 1.6 × 60 = 216 psf (ASCE 7-22 §2.3.1)
    expect(r.out).toMatch(/\n {2}qu\s+200 psf\s+216 psf\n/);
    // q_ok: 200/250 = 0.8 → 216/250 = 0.864, Δ +0.064
    expect(r.out).toMatch(/\n {2}q_ok\s+0\.8 pass\s+0\.864 pass\s+\+0\.064$/m);
    expect(r.out).not.toMatch(/\bD\b.*100 psf/); // unchanged inputs are left out
  });

  it('--json gives the differing rows as data', async () => {
    const [a, b] = await twoRevisions();
    const r = await calc([a, '--diff', b, '--json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j.a).toBe(a);
    expect(j.inputs).toEqual([{ id: 'i2', name: 'L', before: '50 psf', after: '60 psf', changed: true }]);
    expect(j.checks).toHaveLength(1);
    expect(j.checks[0].deltaRatio).toBeCloseTo(216 / 250 - 200 / 250, 12);
  });

  it('the same record twice has no differences; an unreadable second file exits 2', async () => {
    const [a] = await twoRevisions();
    const same = await calc([a, '--diff', a]);
    expect([same.code, same.out]).toEqual([0, `no differences in the title block, inputs, results, checks, comments or sign-offs between ${a} and ${a}`]);
    const missing = await calc([a, '--diff', join(tmpdir(), 'no-such-record.lt')]);
    expect(missing.code).toBe(2);
    expect(missing.err).toMatch(/cannot read/);
  });

  it('reads exported .html records too (A.html --diff B.html)', async () => {
    const [a, b] = await twoRevisions();
    const html = async (file: string) => {
      const out = file.replace(/\.lt$/, '.html');
      const { doc } = parse(readFileSync(file, 'utf8'));
      writeFileSync(out, (await exportComputed(doc, STUB_SHELL, '2026-12-04T00:00:00Z')).html);
      return out;
    };
    const r = await calc([await html(a), '--diff', await html(b)]);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^Inputs \(1 differs\)\n.*\n {2}L\s+50 psf\s+60 psf\n/);
    expect(r.out).toMatch(/\n {2}q_ok\s+0\.8 pass\s+0\.864 pass\s+\+0\.064$/m); // 200/250 → 216/250
  });

  it('runs as npm run calc does', async () => {
    const [a, b] = await twoRevisions();
    const r = spawnSync('node_modules/.bin/tsx', ['runtime/cli/main.ts', a, '--diff', b], { encoding: 'utf8' });
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/^Inputs \(1 differs\)/);
  });
});
