// Honest record states in Chromium (issue 14, items 1–3): a checker who opens the Rev 0
// record, changes inputs in review, comments and signs sees exactly what is signed
// (Rev 0 + unissued changes) and what is not in order (a check NOT OK, a cell in
// error, an open comment), all recorded; returning to the baseline makes that
// sign-off stale. A draft, a CLI export and a checker's copy each say what they are in
// the static page and the live app, and the checker's copy never takes the issued
// file's name. A sheet with lines that could not be read is not exported.
// Loads: ASCE 7-22 §2.3.1 combination 2 (1.2D + 1.6L) on the fixture's invented values.

import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createEngine } from '../../runtime/engine';
import { parse } from '../../runtime/format/index';
import { exportComputed, verifyRecordFile } from '../../runtime/record/node';
import { issueRevision } from '../../runtime/review/index';
import { ARTIFACTS, CHROMIUM_ARGS, artifactsDir } from './harness';
import { appDist } from './app-session';

let work: string;
let shell: string;
let browser: Browser;
let rev0File: string;
const fixture = parse(readFileSync(join(import.meta.dirname, 'fixtures/review.lt'), 'utf8')).doc;

const text = async (p: Page, sel: string) => (await p.locator(sel).innerText()).replace(/\s+/g, ' ').trim();

/** A record page opened from file://, live, and its whole-file check done. */
async function openRecord(file: string): Promise<{ context: BrowserContext; page: Page; errors: string[] }> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 }, acceptDownloads: true });
  await context.route('**/*', (r) => (r.request().url().startsWith('file://') ? r.continue() : r.abort()));
  const page = await context.newPage();
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  await page.goto(`file://${file}`);
  await page.waitForFunction(() => performance.getEntriesByName('loadtrace:record-checked').length > 0, null, { timeout: 60_000 });
  return { context, page, errors };
}

async function settle(p: Page): Promise<void> {
  await p.evaluate(async () => {
    await (window as any).loadtrace.engine.settled();
    await new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r)));
  });
}

async function setValue(p: Page, id: string, value: string): Promise<void> {
  const field = p.locator(`#cell-${id} input.value-field`);
  await field.fill(value);
  await field.press('Enter');
  await field.press('Escape');
}

/** Exports as a person does (the toolbar's Export) and returns the offered name and the file. */
async function exportByButton(p: Page, name: string): Promise<{ suggested: string; html: string }> {
  const download = p.waitForEvent('download');
  await p.click('.toolbar [data-record="export"]');
  const d = await download;
  const file = join(work, name);
  await d.saveAs(file);
  return { suggested: d.suggestedFilename(), html: readFileSync(file, 'utf8') };
}

/** The static page's state line and seal line of a record file, as a browser with JavaScript off shows them. */
async function staticLines(file: string): Promise<{ state: string; seal: string; noApp: boolean }> {
  const context = await browser.newContext({ javaScriptEnabled: false });
  const page = await context.newPage();
  await page.goto(`file://${file}`);
  const out = { state: await text(page, '#lt-static .lt-state'), seal: await text(page, '#lt-seal-line'), noApp: await page.locator('#lt-noapp').isVisible() };
  await context.close();
  return out;
}

beforeAll(async () => {
  work = mkdtempSync(join(tmpdir(), 'loadtrace-states-'));
  shell = readFileSync(join(appDist(), 'dist-record/record-shell.html'), 'utf8');
  const engine = createEngine(fixture);
  await engine.settled();
  const rev0 = issueRevision(fixture, (id) => engine.state(id), 'A. Preparer', '2026-12-01', 'Issued for check.');
  engine.dispose();
  rev0File = join(work, 'LT-TEST-07-rev0.html');
  writeFileSync(rev0File, (await exportComputed(rev0, shell, '2026-12-01T09:00:00Z')).html);
  browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS });
  artifactsDir();
}, 240_000);

afterAll(async () => {
  await browser?.close();
  if (work) rmSync(work, { recursive: true, force: true });
});

describe('item 1: a sign-off names the state it covers', () => {
  it('signing the changed sheet in review: the dialog says what is signed and lists what is not in order; all recorded; stale after returning to the baseline', async () => {
    const { context, page, errors } = await openRecord(rev0File);
    expect(await text(page, '#lt-record-line .lt-rl-state')).toBe('Issued: Rev 0, 2026-12-01');
    await page.click('.toolbar [data-rv="review"]');
    // 1.2 × 100 + 1.6 × 150 = 360 psf > 250 psf: q_ok NOT OK (ASCE 7-22 §2.3.1, combination 2).
    await setValue(page, 'i2', '150 psf');
    // A strip width typed as a pressure: an error at the input.
    await setValue(page, 'i3', '10 psf');
    await page.click('#cell-i1 [data-rv="thread"]');
    const form = page.locator('#cell-i1 form.rv-new-comment');
    await form.locator('textarea').fill('Finishes included in D?');
    await form.locator('input[name="author"]').fill('B. Checker');
    await form.locator('button[type="submit"]').click();
    await settle(page);
    expect(await text(page, '#lt-record-line .lt-rl-state')).toBe('Working copy from review of Rev 0');

    const signoff = page.locator('#review-panel form.rv-signoff-form');
    await signoff.locator('select[name="scope"]').selectOption('document');
    await signoff.locator('input[name="date"]').fill('2026-12-03');
    await signoff.locator('button[type="submit"]').click();
    const dialog = page.locator('#rv-signoff');
    await dialog.waitFor({ state: 'visible' });
    expect(await text(page, '#rv-signoff .rv-note')).toBe('By B. Checker on 2026-12-03. You sign the working state: Rev 0 + unissued changes '
      + '(2 inputs, 2 results and 1 check changed since Rev 0). The sign-off will say so; it does not sign Rev 0 as issued. To sign Rev 0, cancel and use Return to baseline first.');
    expect((await dialog.locator('.rv-findings li').allInnerTexts()).map((s) => s.replace(/\s+/g, ' ').trim())).toEqual([
      'NOT OK k1 q_ok: Factored load within capacity',
      'Error i3 w: Strip width',
      'Open comment cm1 on i1: Finishes included in D?',
    ]);
    await page.screenshot({ path: join(ARTIFACTS, 'e2e-states-signoff-dialog.png') });
    await dialog.locator('button[type="submit"]').click();
    await settle(page);
    expect(await text(page, '#review-title-line .rv-signoff')).toBe(
      '✓ Signed off the whole record: B. Checker, 2026-12-03 (Rev 0 + unissued changes) — with 1 check NOT OK, 1 cell in error and 1 open comment');
    const signed = await page.evaluate(() => (window as any).loadtrace.doc.review.signoffs[0]);
    expect(signed).toMatchObject({ scope: 'document', revision: '0', unissued: true });
    expect(signed.exceptions.map((x: { kind: string; id: string }) => `${x.kind} ${x.id}`)).toEqual(['not-ok k1', 'error i3', 'open-comment cm1']);
    expect(signed.seen).toMatch(/^[0-9a-f]{16}$/);

    // The checker's copy, exported: a working copy from review, never the issued file's name.
    const copy = await exportByButton(page, 'copy.html');
    expect(copy.suggested).toBe('LT-TEST-07-Floor-strip-factored-load-against-an-invented-capacity-review-copy-of-rev0.html');
    const copyFile = join(work, 'copy.html');
    const lines = await staticLines(copyFile);
    expect(lines.state).toBe('Working copy from review of Rev 0. This is a checker\'s working copy: Rev 0 (issued 2026-12-01) with changes made in review that are not issued. It is not the issued record.');
    expect(lines.seal).toMatch(/^Record SHA-256 [0-9a-f]{64}\. Not verified: this page cannot check itself\./);
    expect((await verifyRecordFile(copy.html)).manifest!.state.kind).toBe('review-copy');

    // Return to the baseline: the values signed are no longer the sheet's.
    await page.click('#review-panel [data-rv="baseline"]');
    await settle(page);
    expect(await text(page, '#review-title-line .rv-signoff')).toMatch(/^⚠ Sign-off of the whole record STALE: B\. Checker, 2026-12-03 \(Rev 0 \+ unissued changes\)/);
    expect(await text(page, '#lt-record-line .lt-rl-state')).toBe('Issued: Rev 0, 2026-12-01');
    await page.screenshot({ path: join(ARTIFACTS, 'e2e-states-stale.png') });
    expect(errors).toEqual([]);
    await context.close();
  }, 180_000);
});

describe('item 2: every record says what it is', () => {
  it('the issued record, a draft never issued and a CLI export with a failing check', async () => {
    const issued = await staticLines(rev0File);
    expect(issued.state).toBe('Issued: Rev 0, 2026-12-01. This is Rev 0 (issued 2026-12-01) exactly as issued: inputs and results unchanged since.');
    expect(issued.noApp).toBe(true); // JavaScript off: said in plain HTML
    expect(issued.seal).toMatch(/^Record SHA-256 [0-9a-f]{64}\. Not verified: this page cannot check itself\./);

    // A CLI export with a failing check (1.2 × 100 + 1.6 × 150 = 360 psf > 250 psf): a draft, never issued.
    const failing = { ...fixture, cells: fixture.cells.map((c) => (c.id === 'i2' && c.kind === 'input' ? { ...c, value: '150 psf' } : c)) };
    const draftFile = join(work, 'draft.html');
    writeFileSync(draftFile, (await exportComputed(failing, shell)).html);
    const draft = await staticLines(draftFile);
    expect(draft.state).toBe('Draft: never issued. This sheet has never been issued: its values are a draft, not an issued calculation.');
    const { context, page } = await openRecord(draftFile);
    expect(await text(page, '#lt-record-line .lt-rl-state')).toBe('Draft: never issued');
    expect(await page.locator('#status').textContent()).toBe('Record opened: every part of the file verified against its seal');
    expect((await exportByButton(page, 'again.html')).suggested).toBe('LT-TEST-07-Floor-strip-factored-load-against-an-invented-capacity-draft.html');
    // Changed after the issue, outside review: a draft after Rev 0.
    await context.close();
    const rev0Page = await openRecord(rev0File);
    expect((await exportByButton(rev0Page.page, 'same.html')).suggested).toBe('LT-TEST-07-Floor-strip-factored-load-against-an-invented-capacity-rev0.html');
    await setValue(rev0Page.page, 'i4', '260 psf');
    await settle(rev0Page.page);
    expect(await text(rev0Page.page, '#lt-record-line .lt-rl-state')).toBe('Draft: changed since Rev 0');
    expect((await exportByButton(rev0Page.page, 'after.html')).suggested).toBe('LT-TEST-07-Floor-strip-factored-load-against-an-invented-capacity-draft-after-rev0.html');
    await rev0Page.page.screenshot({ path: join(ARTIFACTS, 'e2e-states-draft-after-rev0.png') });
    await rev0Page.context.close();
  }, 180_000);
});

describe('item 3: a sheet with lines that could not be read is not exported', () => {
  it('opened from a file with a broken block: Export says why and writes nothing', async () => {
    const { context, page } = await openRecord(rev0File);
    const broken = readFileSync(join(import.meta.dirname, 'fixtures/review.lt'), 'utf8').replace('input i3  w = 10 ft', 'input i3  w 10 ft');
    await page.evaluate((t) => (window as any).loadtraceRecord.openText(t, 'broken.lt'), broken);
    await page.waitForFunction(() => (window as any).loadtrace.doc.cells.every((c: { id: string }) => c.id !== 'i3'));
    let downloads = 0;
    page.on('download', () => downloads++);
    await page.click('.toolbar [data-record="export"]');
    await page.locator('#lt-record-banner').filter({ hasText: 'not exported' }).waitFor();
    expect(await text(page, '#lt-record-banner')).toContain('1 line of broken.lt could not be read; it is not in this sheet, and a record written now would leave it out.');
    await page.waitForTimeout(500);
    expect(downloads).toBe(0);
    await context.close();
  }, 120_000);
});
