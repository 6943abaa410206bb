// `--meta KEY=VALUE` (issue 19): the title block of what the CLI writes, with the text
// format's keywords as keys; a bad key is a usage error naming the keys allowed. And
// `--pdf` with no Chromium is a clear error, exit 2 (Chromium itself: tests/e2e/pdf.test.ts).

import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseArgs, UsageError } from '../../runtime/cli/args';
import { parse } from '../../runtime/format/index';
import { unpack } from '../../runtime/record/index';
import { calc, scratchWithStubShell } from './helpers';

const TEMPLATE = 'docs-templates/spread-footing.lt';
const scratch = scratchWithStubShell('cli-meta');

describe('calc --meta', () => {
  it('sets the title block of an exported record: its static rendering and its document', async () => {
    const out = join(scratch(), 'meta.html');
    const r = await calc(TEMPLATE, '--export', out,
      '--meta', 'project=Quayside Depot', '--meta', 'job=LT-27-015', '--meta', 'subject=Footing F-7',
      '--meta', 'by=A. Nwosu', '--meta', 'checked=P. Ferreira', '--meta', 'revision=2', '--meta=date=2027-03-01');
    expect(r.code).toBe(0);
    const html = readFileSync(out, 'utf8');
    const field = (k: string) => new RegExp(`data-meta="${k}">([^<]*)<`).exec(html)?.[1];
    expect([field('project'), field('job'), field('subject'), field('preparedBy'), field('checkedBy'), field('revision'), field('date')])
      .toEqual(['Quayside Depot', 'LT-27-015', 'Footing F-7', 'A. Nwosu', 'P. Ferreira', '2', '2027-03-01']);
    // The printed title block (page margins) and the browser tab's title too.
    expect(html).toContain('"LT-27-015"');
    expect(html).toContain('<title>LT-27-015 · Footing F-7 — calc record</title>');
    const meta = parse((await unpack(html)).docText!).doc.meta;
    expect(meta).toEqual({ project: 'Quayside Depot', job: 'LT-27-015', subject: 'Footing F-7', preparedBy: 'A. Nwosu',
      checkedBy: 'P. Ferreira', revision: '2', date: '2027-03-01' });
  });

  it('keeps the fields not given, and the later of two settings wins', async () => {
    const out = join(scratch(), 'some.html');
    await calc(TEMPLATE, '--export', out, '--meta', 'prepared=first', '--meta', 'by=second');
    const meta = parse((await unpack(readFileSync(out, 'utf8'))).docText!).doc.meta;
    const given = parse(readFileSync(TEMPLATE, 'utf8')).doc.meta;
    expect(meta).toEqual({ ...given, preparedBy: 'second' });
  });

  it('a bad key is a usage error naming the keys allowed, exit 2', () => {
    expect(() => parseArgs([TEMPLATE, '--meta', 'engineer=X'])).toThrow(UsageError);
    expect(() => parseArgs([TEMPLATE, '--meta', 'engineer=X'])).toThrow(
      '--meta engineer: no such title-block key; the keys are project, job, subject, by (or prepared), checked, revision, date');
    expect(() => parseArgs([TEMPLATE, '--meta', 'job'])).toThrow(/write it as KEY=VALUE/);
    expect(() => parseArgs([TEMPLATE, '--meta'])).toThrow(/--meta needs KEY=VALUE/);
    const p = spawnSync('npx', ['tsx', 'runtime/cli/main.ts', TEMPLATE, '--meta', 'engineer=X'], { encoding: 'utf8' });
    expect(p.status).toBe(2);
    expect(p.stderr).toMatch(/the keys are project, job, subject, by \(or prepared\), checked, revision, date/);
  });
});

describe('calc --pdf without Chromium', () => {
  it('says where Chromium was looked for and how to get it, exit 2, and writes nothing', async () => {
    process.env.LOADTRACE_CHROMIUM = join(scratch(), 'no-chromium-here');
    try {
      const out = join(scratch(), 'x.pdf');
      const r = await calc(TEMPLATE, '--pdf', out);
      expect(r.code).toBe(2);
      expect(r.err).toContain(`--pdf ${out}: printing to PDF needs Chromium at ${join(scratch(), 'no-chromium-here')}, which is not there: install Debian's (apt-get install chromium)`);
      expect(() => readFileSync(out)).toThrow();
    } finally {
      delete process.env.LOADTRACE_CHROMIUM;
    }
  });

  it('--paper takes letter or a4, and only with a PDF', () => {
    expect(parseArgs([TEMPLATE, '--pdf', 'a.pdf']).paper ?? 'Letter').toBe('Letter');
    expect(parseArgs([TEMPLATE, '--pdf', 'a.pdf', '--paper', 'A4']).paper).toBe('A4');
    expect(() => parseArgs([TEMPLATE, '--pdf', 'a.pdf', '--paper', 'legal'])).toThrow('--paper legal: the sizes are letter and a4');
    expect(() => parseArgs([TEMPLATE, '--paper', 'a4'])).toThrow(/--paper goes with --pdf/);
  });
});
