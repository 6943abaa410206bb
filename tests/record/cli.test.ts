// `npm run calc -- FILE --export OUT.html` and `npm run calc -- record.html --json`
// (runtime/cli): a record written headless reads back with the same results, and a
// damaged one is reported with exit code 2. The shell is the stub (LOADTRACE_SHELL),
// so no build runs here; the real shell is used in tests/e2e/record.test.ts.

import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseArgs } from '../../runtime/cli/args';
import { runCalc } from '../../runtime/cli/main';
import { parse, serialize } from '../../runtime/format/index';
import { unpack } from '../../runtime/record/index';
import { STUB_SHELL } from './fixtures';

let dir: string;
const TEMPLATE = 'docs-templates/spread-footing.lt';

async function calc(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await runCalc(parseArgs(argv), (s) => out.push(s), (s) => err.push(s));
  return { code, out: out.join('\n'), err: err.join('\n') };
}

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'loadtrace-cli-record-'));
  writeFileSync(join(dir, 'shell.html'), STUB_SHELL);
  process.env.LOADTRACE_SHELL = join(dir, 'shell.html');
});
afterAll(() => {
  delete process.env.LOADTRACE_SHELL;
  rmSync(dir, { recursive: true, force: true });
});

describe('calc and records', () => {
  it('--export writes a sealed record whose --json results equal the template\'s', async () => {
    const out = join(dir, 'footing.html');
    const exported = await calc(TEMPLATE, '--export', out, '--json');
    expect(exported.code).toBe(0);
    expect(exported.err).toMatch(/record written: .*footing\.html/);
    const back = await unpack(readFileSync(out, 'utf8'));
    expect(back.ok).toBe(true);
    expect(back.docText).toBe(serialize(parse(readFileSync(TEMPLATE, 'utf8')).doc)); // the document as the format writes it
    const again = await calc(out, '--json');
    expect(again.code).toBe(0);
    expect(again.err).toBe('');
    expect(JSON.parse(again.out)).toEqual(JSON.parse(exported.out));
  });

  it('--set and --export together: the record holds the overridden input', async () => {
    const out = join(dir, 'set.html');
    const r = await calc(TEMPLATE, '--set', 'fc=4000 psi', '--export', out);
    expect(r.code).toBeLessThan(2);
    expect((await unpack(readFileSync(out, 'utf8'))).docText).toMatch(/fc = 4000 psi/);
  });

  it('a tampered or cut-off record is read, reported, and exits 2', async () => {
    const out = join(dir, 'ok.html');
    await calc(TEMPLATE, '--export', out);
    const html = readFileSync(out, 'utf8');
    const digest = /data-sha256="([0-9a-f]{64})"/.exec(html)![1];
    writeFileSync(join(dir, 'bad.html'), html.replace(digest, '0'.repeat(64)));
    const bad = await calc(join(dir, 'bad.html'), '--json');
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/edited outside Loadtrace/);
    expect(JSON.parse(bad.out).length).toBeGreaterThan(5); // the results are still given
    writeFileSync(join(dir, 'cut.html'), html.slice(0, html.indexOf('</script>', html.indexOf('lt-doc')) - 40));
    const cut = await calc(join(dir, 'cut.html'));
    expect(cut.code).toBe(2);
    expect(cut.err).toMatch(/cut off inside the embedded document/);
  });
});
