// The working of a library call in Chromium: opened in place on the sheet (folded by default),
// typeset, nested calls opened one level at a time, kept current across an edit; then the
// record printed to PDF with the working's text found in it (pdftotext), and the record
// read with JavaScript off showing the working of the governing check open. The values are
// those of tests/working/hand-worked.test.ts (ACI 318-19 Table 22.6.5.2 at 5000 psi, a 20 in
// column, d = 7.5 in: 4√f'c = 282.8 psi governs).

import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openPrinter, sheetsPage } from '../../runtime/cli/pdf';
import { createEngine } from '../../runtime/engine';
import { parse } from '../../runtime/format/index';
import { exportComputed } from '../../runtime/record/node';
import { callsOf } from '../../runtime/working/calls';
import { appDist, openApp, type AppSession } from './app-session';
import { CHROMIUM_ARGS, artifactsDir } from './harness';

const fixture = parse(readFileSync(join(import.meta.dirname, 'fixtures/punching-working.lt'), 'utf8'));
let app: AppSession;
let page: Page;
let dir: string;

const fold = (cell: string) => page.locator(`#cell-${cell} details.lt-wk-top`).first();

beforeAll(async () => {
  app = await openApp();
  page = app.page;
  dir = mkdtempSync(join(tmpdir(), 'loadtrace-working-'));
}, 120_000);

afterAll(async () => {
  await app?.close();
  rmSync(dir, { recursive: true, force: true });
});

describe('the working of a library call', () => {
  it('is folded on the sheet until opened; opened, its steps are typeset with the governing one marked', async () => {
    expect(fixture.errors).toEqual([]);
    await page.goto(app.server.url);
    await page.waitForSelector('body[data-ready="true"]', { timeout: 30_000 });
    await page.evaluate((doc) => (window as any).loadtraceOpen('e2e-working', doc), fixture.doc);
    await page.waitForSelector('#cell-k1.st-ok', { timeout: 10_000 });
    const vc = fold('f2');
    expect(await vc.locator('summary').innerText()).toBe('Working of vc_punch');
    expect(await vc.evaluate((d: HTMLDetailsElement) => d.open)).toBe(false);
    expect(await vc.locator('.lt-wk-step').count()).toBe(0); // nothing made while folded

    await vc.locator('summary').click();
    await page.waitForSelector('#cell-f2 details.lt-wk-top[open] .lt-wk-step .katex');
    const text = (await vc.innerText()).replace(/\s+/g, ' ');
    for (const s of ['282.8', '424.3', '334.3', '70.71', 'expression (a) governs', 'ACI 318-19 Table 22.6.5.2(a)']) expect(text).toContain(s);
    expect(await vc.locator('.lt-wk-gov .lt-wk-mark').innerText()).toBe('governs');
    // The nested call (bo_punch) is a fold of its own, opened on its own.
    const inner = vc.locator('details.lt-working:not(.lt-wk-top)').first();
    expect(await inner.evaluate((d: HTMLDetailsElement) => d.open)).toBe(false);
    await inner.locator('summary').click();
    expect((await inner.innerText()).replace(/\s+/g, ' ')).toContain('110');
    await page.locator('#cell-f2').scrollIntoViewIfNeeded();
    await page.locator('#cell-f2').screenshot({ path: join(artifactsDir(), 'e2e-working-01-open.png') });
    expect(app.pageErrors).toEqual([]);
  });

  it('stays open through an edit and shows the working of the new values', async () => {
    const field = page.locator('#cell-i1 input.value-field');
    await field.fill('6000 psi');
    await field.press('Enter');
    // √6000 = 77.46 psi; 4 · 77.46 = 309.8 psi (ACI 318-19 Table 22.6.5.2(a))
    await page.waitForFunction(() => document.querySelector('#cell-f2 details.lt-wk-top')?.textContent?.includes('309.8'));
    expect(await fold('f2').evaluate((d: HTMLDetailsElement) => d.open)).toBe(true);
    await field.fill('5000 psi');
    await field.press('Enter');
    await page.waitForFunction(() => document.querySelector('#cell-f2 details.lt-wk-top')?.textContent?.includes('282.8'));
  });

  it('prints in the record: the governing check’s working is in the PDF’s text', async () => {
    const engine = createEngine(fixture.doc);
    await engine.settled();
    const pdf = join(dir, 'working.pdf');
    const printer = await openPrinter();
    try {
      await printer.print(await sheetsPage(fixture.doc, (id) => engine.state(id), undefined, callsOf(engine)), pdf, 'Letter');
    } finally {
      await printer.close();
      engine.dispose();
    }
    const text = spawnSync('pdftotext', [pdf, '-'], { encoding: 'utf8' }).stdout.replace(/\s+/g, ' ');
    for (const s of ['Working of vc_punch', 'expression (a) governs', 'governs', 'ACI 318-19 Table 22.6.5.2(a)', '282.8', '334.3']) {
      expect(text.includes(s), `"${s}" in the PDF`).toBe(true);
    }
    // The load inside the critical section, subtracted in vu_punch's working (§22.6.4.1).
    expect(text).toContain('the load inside the critical section is subtracted');
  });

  it('reads with JavaScript off: the record shows the working of the governing check open', async () => {
    const shell = readFileSync(join(appDist(), 'dist-record/record-shell.html'), 'utf8');
    const file = join(dir, 'working.html');
    writeFileSync(file, (await exportComputed(fixture.doc, shell)).html);
    const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS, headless: true });
    const context = await browser.newContext({ javaScriptEnabled: false, viewport: { width: 1100, height: 900 } });
    try {
      const p = await context.newPage();
      await p.goto(`file://${file}`);
      const open = p.locator('#lt-static details.lt-working.lt-wk-top[open]');
      expect(await open.count()).toBe(3); // vu_punch, vc_punch and bo_punch: the formulas the only check rests on
      const vc = p.locator('#lt-c-f2 details.lt-wk-top[open]');
      expect(await vc.locator('math').count()).toBeGreaterThan(5);
      const text = (await vc.innerText()).replace(/\s+/g, ' ');
      expect(text).toContain('expression (a) governs');
      expect(await vc.locator('.lt-wk-gov .lt-wk-mark').first().isVisible()).toBe(true);
      await p.locator('#lt-c-f2').screenshot({ path: join(artifactsDir(), 'e2e-working-02-record-no-js.png') });
    } finally {
      await browser.close();
    }
  });
});
