import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseArgs, UsageError } from '../../runtime/cli/args';
import { runCalc } from '../../runtime/cli/main';

async function calc(argv: string[]) {
  const out: string[] = [];
  const err: string[] = [];
  const code = await runCalc(parseArgs(argv), (s) => out.push(s), (s) => err.push(s));
  return { code, out: out.join('\n'), err: err.join('\n') };
}

const DEMO = 'docs-templates/demo.lt';

describe('npm run calc', () => {
  it('runs the demo record: every check passes, exit 0', async () => {
    const r = await calc([DEMO, '--json']);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const rows = JSON.parse(r.out);
    expect(rows.length).toBeGreaterThan(20);
    for (const row of rows) {
      expect(Object.keys(row).sort()).toEqual(['clause', 'error', 'id', 'kind', 'label', 'name', 'ratio', 'status', 'unit', 'value'].sort());
      expect(['ok', 'fail', 'error', 'pending']).toContain(row.status);
    }
    const checks = rows.filter((x: { kind: string }) => x.kind === 'check');
    expect(checks.length).toBeGreaterThan(3);
    for (const c of checks) {
      expect(c.status).toBe('ok');
      expect(typeof c.ratio === 'number' || c.ratio === null).toBe(true);
    }
  });

  it('prints an aligned table by default', async () => {
    const r = await calc([DEMO]);
    const lines = r.out.split('\n');
    expect(lines[0]).toMatch(/^name\s+label\s+value\s+unit\s+status$/);
    expect(r.out).toMatch(/fc\s+Specified compressive strength of concrete\s+5000\s+psi\s+ok/);
  });

  it('--set overrides an input; a failing check gives exit 1', async () => {
    const r = await calc([DEMO, '--set', 'B=8 ft', '--json']);
    expect(r.code).toBe(1);
    const rows = JSON.parse(r.out);
    expect(rows.some((x: { kind: string; status: string }) => x.kind === 'check' && x.status === 'fail')).toBe(true);
  });

  it('--set accepts SI values for US inputs', async () => {
    const r = await calc([DEMO, '--set', 'fc=34.5 MPa', '--json']);
    expect(r.code).toBe(0);
    const fc = JSON.parse(r.out).find((x: { name: string }) => x.name === 'fc');
    expect(fc.unit).toBe('psi');
    expect(fc.value).toBeCloseTo(5004, 0); // 34.5 MPa / 6894.757 Pa/psi = 5003.8 psi
  });

  it('a bad override is a clear error and exit 2', async () => {
    const bad = await calc([DEMO, '--set', 'fc=lots']);
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/--set fc=lots: .*not a number with a unit/);
    const unknown = await calc([DEMO, '--set', 'nope=1']);
    expect(unknown.code).toBe(2);
    expect(unknown.err).toMatch(/no input named nope/);
    const range = await calc([DEMO, '--set', 'fc=20000 psi']);
    expect(range.code).toBe(2);
    expect(range.err).toMatch(/above the allowed maximum/);
  });

  it('a broken document exits 2 and says where', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'lt-'));
    const file = join(dir, 'broken.lt');
    writeFileSync(file, 'loadtrace 1\n\ninput a  x = 2 in\n\nformula b  y = x + 1 kip\n  unit kip\n\nbogus z\n');
    const r = await calc([file, '--json']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/broken\.lt:8:1: /);
    const rows = JSON.parse(r.out);
    expect(rows.find((x: { name: string }) => x.name === 'y').error).toMatch(/cannot add a length \(in\) and a force \(kip\)/);
  });

  it('usage errors', () => {
    expect(() => parseArgs([])).toThrow(UsageError);
    expect(() => parseArgs(['a.lt', '--set', 'novalue'])).toThrow(/NAME=VALUE/);
    expect(() => parseArgs(['a.lt', '--bogus'])).toThrow(/unknown option/);
  });

  it('works as a command (npm run calc)', () => {
    const p = spawnSync('npx', ['tsx', 'runtime/cli/main.ts', DEMO, '--json'], { encoding: 'utf8' });
    expect(p.status).toBe(0);
    expect(JSON.parse(p.stdout)[0]).toHaveProperty('id');
  });
});
