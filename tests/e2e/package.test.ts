// `npm run calc -- A.lt B.lt C.lt --package OUT.html --pdf OUT.pdf` (issue 19, the package):
// the PDF read back with poppler (every sheet numbered across the package, the count the
// contents give, every check's label and ratio of every calc), and the HTML package opened
// in Chromium from file://, offline and with JavaScript off: the cover, the contents
// linking every calc, every calc's sheets, and the numbers running on without a gap.

import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseArgs } from '../../runtime/cli/args';
import { runCalc } from '../../runtime/cli/main';
import { pdfPages } from '../../runtime/cli/pdf-pages';
import type { CalcDocument } from '../../runtime/document';
import { createEngine } from '../../runtime/engine';
import { parse } from '../../runtime/format/index';
import { ratioText } from '../../runtime/handcalc/index';
import { artifactsDir, CHROMIUM_ARGS, ROOT } from './harness';

const FILES = ['load-path.lt', 'spread-footing.lt', 'two-way-ddm.lt'].map((f) => join(ROOT, 'docs-templates', f));
let dir: string;
let html: string;
let pdf: string;
let said: string;
let code: number;

const text = (file: string, page?: number) =>
  spawnSync('pdftotext', [...(page ? ['-f', String(page), '-l', String(page)] : []), file, '-'], { encoding: 'utf8' }).stdout.replace(/\s+/g, ' ');
const pageCount = (file: string) => Number(/Pages:\s+(\d+)/.exec(spawnSync('pdfinfo', [file], { encoding: 'utf8' }).stdout)?.[1]);

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'loadtrace-package-'));
  html = join(dir, 'package.html');
  pdf = join(dir, 'package.pdf');
  const err: string[] = [];
  const started = Date.now();
  code = await runCalc(parseArgs([...FILES, '--package', html, '--pdf', pdf, '--meta', 'project=Quayside Depot', '--meta', 'revision=C',
    '--cover', 'engineer=C. Marsh, PE', '--cover', 'license=PE 40417', '--cover', 'title=Gravity load path calculations']), () => {}, (s) => err.push(s));
  said = `${err.join('\n')}\n(${((Date.now() - started) / 1000).toFixed(1)} s in all)`;
  console.log(said);
}, 300_000);
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('calc --package', () => {
  it('prints one PDF numbered across the package: as many sheets as the contents count, "sheet n of m" on every one', () => {
    expect(code, said).toBe(0);
    const pages = pageCount(pdf);
    expect(said).toContain(`${pages} sheets on Letter`);
    expect(pdfPages(readFileSync(pdf)).pages.length).toBe(pages); // our reading of the page tree agrees with poppler's
    for (let n = 1; n <= pages; n++) expect(text(pdf, n), `sheet ${n}`).toMatch(new RegExp(`sheet ${n} of ${pages}\\b`, 'i'));
    // The contents' last range ends on the last sheet.
    expect(text(pdf, 2)).toMatch(new RegExp(`–${pages} `));
    console.log(`package PDF: ${pages} sheets, ${(statSync(pdf).size / 1e6).toFixed(2)} MB; HTML ${(statSync(html).size / 1e6).toFixed(2)} MB`);
  });

  it("holds every check's label and ratio of every calc, and each calc's title block on its sheets", async () => {
    const all = text(pdf);
    for (const file of FILES) {
      const doc: CalcDocument = parse(readFileSync(file, 'utf8')).doc;
      const engine = createEngine(doc);
      await engine.settled();
      try {
        expect(all).toContain(doc.meta.subject.slice(0, 40));
        for (const c of doc.cells) {
          if (c.kind !== 'check') continue;
          expect(all.includes(c.label!.replace(/\s+/g, ' ')), c.label).toBe(true);
          const ratio = engine.state(c.id)!.ratio;
          if (ratio !== undefined) expect(all).toContain(`${ratioText(ratio)} `);
        }
      } finally {
        engine.dispose();
      }
    }
    expect(all).toContain('C. Marsh, PE');
    expect(all).toContain('Codes and references cited');
    spawnSync('pdftoppm', ['-png', '-r', '50', '-f', '1', '-l', '3', pdf, join(artifactsDir(), 'package-pdf')]);
  });

  it('opens from file:// offline with JavaScript off: cover, contents linking every calc, numbers without a gap', async () => {
    const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS, headless: true });
    try {
      const context = await browser.newContext({ javaScriptEnabled: false, offline: true });
      const url = pathToFileURL(html).href;
      const asked: string[] = [];
      await context.route('**/*', (route) => {
        asked.push(route.request().url());
        return route.request().url() === url ? route.continue() : route.abort();
      });
      const page = await context.newPage();
      await page.goto(url);
      expect(await page.locator('.lt-pkg-cover h1').textContent()).toBe('Gravity load path calculations');
      await expect.poll(() => page.locator('[data-eor="license"]').textContent()).toBe('PE 40417');
      const rows = page.locator('.lt-pkg-contents tbody tr');
      expect(await rows.count()).toBe(FILES.length);
      let next = 0;
      let last = 0;
      for (let i = 0; i < FILES.length; i++) {
        const [from, to] = (await rows.nth(i).locator('.lt-pkg-at').textContent())!.split('–').map(Number);
        if (i === 0) expect(from).toBeGreaterThan(1); // the cover and contents come first
        else expect(from).toBe(next);
        expect(to).toBeGreaterThanOrEqual(from);
        next = to + 1;
        last = to;
        // The link lands on that calc's sheets, which show its own title block.
        await rows.nth(i).locator('a').click();
        const sheet = page.locator(`#lt-sheet-${i + 1}`);
        await expect.poll(() => sheet.isVisible()).toBe(true);
        const subject = parse(readFileSync(FILES[i], 'utf8')).doc.meta.subject;
        expect(await sheet.locator('[data-meta="subject"]').textContent()).toBe(subject);
        expect(await sheet.locator('.lt-summary tbody tr').count()).toBeGreaterThan(5);
        expect(await sheet.locator('[data-meta="project"]').textContent()).toBe('Quayside Depot');
      }
      expect(last).toBe(pageCount(pdf));
      expect(asked.filter((u) => u !== url && !u.startsWith(`${url}#`))).toEqual([]);
      await page.screenshot({ path: join(artifactsDir(), 'package-cover.png') });
    } finally {
      await browser.close();
    }
  });
});
