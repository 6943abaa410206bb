// Checker review end to end in real Chromium (issue 7): the preparer issues Rev 0;
// the checker changes two inputs and sees old → new and the change in ratio, adds a
// comment, returns to the baseline and signs a section; the preparer edits the signed
// section and the sign-off shows stale; the exported record, opened again, keeps it
// all. Screenshots: test-artifacts/e2e-review-*.png.
// Loads: ASCE 7-22 §2.3.1 combination 2 (1.2D + 1.6L) on the fixture's invented values.

import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse } from '../../runtime/format/index';
import { artifactsDir, type Browser, type Served } from './harness';
import { openApp, type AppSession } from './app-session';

const fixture = parse(readFileSync(join(import.meta.dirname, 'fixtures/review.lt'), 'utf8'));

let app: AppSession;
let server: Served;
let browser: Browser;
let page: Page;
let pageErrors: string[];
let rev0Record = '';

/** What the person sees: the window, scrolled to `at` (centred) when given. */
async function shot(name: string, at?: string, p: Page = page): Promise<void> {
  if (at) await p.locator(at).evaluate((el) => el.scrollIntoView({ block: 'center' }));
  else await p.evaluate(() => window.scrollTo(0, 0));
  await p.screenshot({ path: join(artifactsDir(), `e2e-review-${name}.png`) });
}
const text = async (sel: string, p: Page = page) => (await p.locator(sel).innerText()).replace(/\s+/g, ' ').trim();

async function setValue(id: string, value: string): Promise<void> {
  const field = page.locator(`#cell-${id} input.value-field`);
  await field.fill(value);
  await field.press('Enter');
  await field.press('Escape');
}

/** Waits until the page's engine has settled and the review has redrawn (one frame later). */
async function settle(p: Page = page): Promise<void> {
  await p.evaluate(async () => {
    await (window as any).loadtrace.engine.settled();
    await new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r)));
  });
}

// The shared build carries the record shell where the app fetches it (cells/record/shell.ts).
beforeAll(async () => {
  app = await openApp();
  ({ server, browser, page, pageErrors } = app);
}, 180_000);

afterAll(async () => {
  await app?.close();
});

describe('checker review in Chromium', () => {
  it('the preparer issues Rev 0: inputs and results frozen, title block and log show it', async () => {
    await page.goto(server.url);
    await page.waitForSelector('body[data-ready="true"]', { timeout: 30_000 });
    await page.evaluate((doc) => (window as any).loadtraceOpen('e2e-review', doc), fixture.doc);
    await settle();
    await page.click('.toolbar [data-rv="issue"]');
    const dialog = page.locator('#rv-issue');
    expect(await dialog.locator('input[name="label"]').inputValue()).toBe('0'); // our scheme: the first issue is Rev 0
    expect(await dialog.locator('input[name="by"]').inputValue()).toBe('A. Preparer');
    await dialog.locator('input[name="date"]').fill('2026-12-01');
    await dialog.locator('textarea[name="description"]').fill('Issued for check.');
    await shot('01-issue-dialog');
    await dialog.locator('button[type="submit"]').click();
    await settle();
    expect(await page.inputValue('input[data-meta="revision"]')).toBe('0');
    expect(await page.inputValue('input[data-meta="date"]')).toBe('2026-12-01');
    expect(await text('#revision-log')).toContain('0 2026-12-01 A. Preparer B. Checker Issued for check. First issue');
    const rev = await page.evaluate(() => (window as any).loadtrace.doc.review.revisions[0]);
    // 1.2 × 100 + 1.6 × 50 = 200 psf (ASCE 7-22 §2.3.1, combination 2); 200/250 = 0.8
    expect(rev.baseline.results.find((r: any) => r.id === 'f1').text).toBe('200 psf');
    expect(rev.baseline.results.find((r: any) => r.id === 'k1').ratio).toBeCloseTo(0.8, 12);
    rev0Record = await page.evaluate(() => (window as any).loadtraceRecord.exportHtml());
    writeFileSync(join(artifactsDir(), 'e2e-review-rev0.html'), rev0Record);
  });

  it('the checker changes two inputs and sees old → new and the ratio change', async () => {
    await page.click('.toolbar [data-rv="review"]');
    await setValue('i1', '120 psf');
    await setValue('i2', '60 psf');
    await settle();
    expect(await text('#review-panel .rv-against')).toBe('against Rev 0, issued 2026-12-01 by A. Preparer');
    const rows = await page.locator('#review-panel table.rv-table tbody tr').allInnerTexts();
    const clean = rows.map((r) => r.replace(/\s+/g, ' ').trim());
    expect(clean).toEqual([
      'D 100 psf → 120 psf',
      'L 50 psf → 60 psf',
      'w 10 ft → 10 ft',
      'q_cap 250 psf → 250 psf',
      // 1.2 × 120 + 1.6 × 60 = 240 psf; × 10 ft = 2400 plf (ASCE 7-22 §2.3.1)
      'qu 200 psf → 240 psf',
      'wu 2000 plf → 2400 plf',
      // 240/250 = 0.96 against 0.8 issued
      'q_ok 0.8 OK → 0.96 OK +0.160',
    ]);
    expect(await text('#cell-i1 .rv-diff')).toBe('Rev 0: 100 psf → now 120 psf');
    expect(await text('#cell-k1 .rv-diff')).toBe('Rev 0: 0.8 OK → now 0.96 OK (Δ ratio +0.160)');
    expect(await text('#review-panel .rv-count')).toBe('Since Rev 0: 2 inputs, 2 results and 1 check changed');
    expect(await page.locator('#review-panel tr.rv-same').count()).toBe(2); // w and q_cap, as issued
    await shot('02-review-changed', '#review-panel');
    // Only what changed: the unchanged inputs w and q_cap leave the tables and the sheet.
    await page.click('#review-panel [data-rv="only-changed"]');
    await settle();
    expect(await page.locator('#review-panel tr.rv-same').count()).toBe(0);
    expect(await page.locator('#cell-i3').isVisible()).toBe(false);
    expect(await page.locator('#cell-i1').isVisible()).toBe(true);
    await shot('03-only-changed', '#cell-k1');
    await page.click('#review-panel [data-rv="only-changed"]');
    await settle();
    expect(await page.locator('#cell-i3').isVisible()).toBe(true);
  });

  it('the checker comments on a cell; the title block counts it as open', async () => {
    await page.click('#cell-i2 [data-rv="thread"]');
    const form = page.locator('#cell-i2 form.rv-new-comment');
    await form.locator('textarea').fill('Where does 50 psf come from? Name the occupancy.');
    await form.locator('input[name="author"]').fill('B. Checker');
    await form.locator('button[type="submit"]').click();
    await settle();
    expect(await text('#review-title-line .rv-open-count')).toBe('Open comments: 1 of 1');
    expect(await text('#cell-i2 .rv-comment header')).toMatch(/^OPEN B\. Checker \d{4}-\d\d-\d\d \d\d:\d\d$/);
    await shot('04-comment', '#cell-i2');
  });

  it('return to baseline restores the issued inputs and keeps the comment', async () => {
    await page.click('#review-panel [data-rv="baseline"]');
    await settle();
    expect(await page.inputValue('#cell-i1 input.value-field')).toBe('100 psf');
    expect(await page.inputValue('#cell-i2 input.value-field')).toBe('50 psf');
    expect(await text('#review-panel .rv-count')).toBe('Since Rev 0: nothing changed');
    expect(await text('#review-title-line .rv-open-count')).toBe('Open comments: 1 of 1');
  });

  it('the checker signs off a section', async () => {
    const form = page.locator('#review-panel form.rv-signoff-form');
    await form.locator('select[name="scope"]').selectOption('s2');
    await form.locator('input[name="date"]').fill('2026-12-03');
    expect(await form.locator('input[name="author"]').inputValue()).toBe('B. Checker'); // remembered from the comment
    await form.locator('button[type="submit"]').click();
    // The sign-off dialog says what is signed; nothing within s2 is NOT OK, in error or open.
    const dialog = page.locator('#rv-signoff');
    await dialog.waitFor({ state: 'visible' });
    expect(await text('#rv-signoff .rv-note')).toContain('You sign Rev 0 as issued on 2026-12-01.');
    expect(await dialog.locator('.rv-findings').count()).toBe(0);
    await dialog.locator('button[type="submit"]').click();
    await settle();
    expect(await text('#cell-s2 .rv-diff')).toBe('✓ Signed off: B. Checker, 2026-12-03 (Rev 0)');
    await shot('05-signed', '#cell-s2');
  });

  it('a reload keeps the revision, the comment and the sign-off (autosaved with the sheet)', async () => {
    await page.waitForFunction(() => document.querySelector('#status')?.textContent === 'Saved');
    await page.reload();
    await page.waitForSelector('body[data-ready="true"]', { timeout: 30_000 });
    await settle();
    expect(await text('#review-title-line .rv-open-count')).toBe('Open comments: 1 of 1');
    expect(await text('#cell-s2 .rv-diff')).toBe('✓ Signed off: B. Checker, 2026-12-03 (Rev 0)');
    expect(await page.inputValue('input[data-meta="revision"]')).toBe('0');
    await page.click('.toolbar [data-rv="review"]'); // review mode is per visit: on again
    await settle();
    expect(await text('#review-panel .rv-count')).toBe('Since Rev 0: nothing changed');
  });

  it('the preparer edits the signed section: the sign-off shows stale', async () => {
    await page.click('.toolbar [data-rv="review"]'); // review mode off
    await setValue('i4', '260 psf');
    await settle();
    expect(await text('#cell-s2 .rv-diff')).toBe('⚠ Sign-off STALE: B. Checker, 2026-12-03 (Rev 0) — changed since signed');
    expect(await page.locator('#cell-s2 .rv-signoff.rv-stale').count()).toBe(1);
    await shot('06-stale', '#cell-s2');
  });

  it('the revision log prints with the sheet; the review controls do not', async () => {
    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('#revision-log').isVisible()).toBe(true);
    expect(await page.locator('.rv-buttons').isVisible()).toBe(false);
    expect(await page.locator('#cell-s2 .rv-signoff.rv-stale').isVisible()).toBe(true); // the printed sheet says so too
    await shot('07-print', '#revision-log');
    await page.emulateMedia({ media: 'screen' });
  });

  it('the exported record, opened again, keeps revisions, comments and sign-offs', async () => {
    const html: string = await page.evaluate(() => (window as any).loadtraceRecord.exportHtml());
    // The record's static rendering (readable with scripts off) carries the log too.
    expect(html).toContain('Revision log');
    expect(html).toContain('Issued for check.');
    const file = join(artifactsDir(), 'e2e-review-record.html');
    writeFileSync(file, html);
    const before = await page.evaluate(() => (window as any).loadtrace.doc.review);
    const second = await browser.context.newPage();
    second.on('pageerror', (e) => pageErrors.push(`record page: ${e.message}`));
    await second.goto(`file://${file}`);
    await second.waitForSelector('body[data-ready="true"]', { timeout: 30_000 });
    await settle(second);
    const after = await second.evaluate(() => (window as any).loadtrace.doc.review);
    expect(after).toEqual(before);
    expect(await text('#review-title-line .rv-open-count', second)).toBe('Open comments: 1 of 1');
    expect(await text('#cell-s2 .rv-diff', second)).toContain('Sign-off STALE');
    expect(await text('#revision-log', second)).toContain('Issued for check.');
    await shot('08-record-reopened', undefined, second);
    await second.close();
  });

  it('compares the open sheet with the Rev 0 record side by side', async () => {
    await page.click('.toolbar [data-rv="review"]');
    await page.setInputFiles('#rv-compare-file', { name: 'rev0.html', mimeType: 'text/html', buffer: Buffer.from(rev0Record) });
    const dialog = page.locator('#rv-compare');
    await dialog.waitFor({ state: 'visible' });
    await page.waitForSelector('#rv-compare table.rv-table');
    expect(await text('#rv-compare .rv-note')).toContain('every part verified against its seal');
    const rows = (await dialog.locator('tbody tr').allInnerTexts()).map((r) => r.replace(/\s+/g, ' ').trim());
    // The sheet now has q_cap = 260 psf; Rev 0 had 250 psf: 200/260 = 0.769 against 0.8
    expect(rows).toEqual(['q_cap 260 psf → 250 psf', 'q_ok 0.769 OK → 0.8 OK +0.031']);
    await shot('09-compare');
    await dialog.locator('button', { hasText: 'Close' }).click();
  });

  it('no page errors', () => {
    expect(pageErrors).toEqual([]);
  });
});
