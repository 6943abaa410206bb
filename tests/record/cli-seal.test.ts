// The CLI and the record's seal (issue 14): `--verify` checks every part of a record
// file (parse5) and names the first that differs; running an altered record exits 2
// naming it; a document with lines that cannot be read is never exported, nor is an
// altered record written again under a fresh seal. The shell is the stub
// (LOADTRACE_SHELL), so no build runs here.

import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { calc, scratchWithStubShell } from '../cli/helpers';

const scratch = scratchWithStubShell('cli-seal');
const TEMPLATE = 'docs-templates/spread-footing.lt';

describe('--verify', () => {
  it('a record as written: every part ok, exit 0, with what the seal does not prove', async () => {
    const file = join(scratch(), 'ok.html');
    expect((await calc(TEMPLATE, '--export', file)).code).toBe(0);
    const r = await calc(file, '--verify');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/record SHA-256 [0-9a-f]{64}/);
    expect(r.out).toMatch(/as: Draft: never issued/); // the template was never issued
    expect(r.out).toContain('ok       the static rendering (what a reader sees without the app)');
    expect(r.out).toContain('verified: every part of the file is as Loadtrace wrote it.');
    expect(r.out).toContain('it is not a signature');
  });

  it('a forged result in the static page: exit 2 naming the static rendering, for --verify and for a plain run', async () => {
    const file = join(scratch(), 'ok2.html');
    await calc(TEMPLATE, '--export', file);
    const html = readFileSync(file, 'utf8');
    // The first ratio in the summary of checks, one digit changed (0.8… → 0.3…): what issue 14 item 4 did.
    const at = html.indexOf('<td class="lt-sum-r">0.') + '<td class="lt-sum-r">0.'.length;
    expect(at).toBeGreaterThan(100);
    const forged = join(scratch(), 'forged.html');
    writeFileSync(forged, html.slice(0, at) + (html[at] === '3' ? '4' : '3') + html.slice(at + 1));
    const v = await calc(forged, '--verify');
    expect(v.code).toBe(2);
    expect(v.out).toContain('DIFFERS  the static rendering (what a reader sees without the app)');
    expect(v.err).toBe(`${forged}: NOT VERIFIED: The file was altered in the static rendering (what a reader sees without the app): it is not as Loadtrace wrote it.`);
    const run = await calc(forged, '--json');
    expect(run.code).toBe(2);
    expect(run.err).toContain('The file was altered in the static rendering');
    expect(JSON.parse(run.out).length).toBeGreaterThan(5); // the results are still given
  });

  it('an .lt file is not a record: nothing to verify, exit 2', async () => {
    const r = await calc(TEMPLATE, '--verify');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/not a calc record/);
  });
});

describe('no record of a broken or altered document', () => {
  it('--export of a document with a block that cannot be read: exit 2 with the errors, no file', async () => {
    const text = readFileSync(TEMPLATE, 'utf8');
    const broken = join(scratch(), 'broken.lt');
    // An input block whose header has no "=": the reader reports it and drops the block.
    writeFileSync(broken, text.replace(/^input (\S+)\s+(\w+) = /m, 'input $1  $2 '));
    const out = join(scratch(), 'broken.html');
    const r = await calc(broken, '--export', out);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/broken\.lt:\d+:\d+: /);
    expect(r.err).toMatch(/--export .*broken\.html: not written: 1 line of .*broken\.lt could not be read/);
    expect(existsSync(out)).toBe(false);
  });

  it('--export from an altered record is refused (its new seal would vouch for the change)', async () => {
    const file = join(scratch(), 'ok3.html');
    await calc(TEMPLATE, '--export', file);
    const html = readFileSync(file, 'utf8');
    const altered = join(scratch(), 'altered.html');
    writeFileSync(altered, html.replace('fc = ', 'fc  = '));
    const out = join(scratch(), 'again.html');
    const r = await calc(altered, '--export', out);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/not written: .*altered\.html is not as Loadtrace wrote it/);
    expect(existsSync(out)).toBe(false);
  });
});
