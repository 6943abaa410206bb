// Lost work in Chromium (issue 15, items 1, 2 and 4): a tab closed right after Enter, a
// tab closed while a large sheet saves, a reload mid-typing, leaving with unsaved work,
// two tabs on one sheet, storage full, and a record edited then reloaded. Each scenario
// counts the edits made and those lost without a message; all must be 0.

import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CalcDocument } from '../../runtime/document';
import { parse } from '../../runtime/format/index';
import { exportComputed } from '../../runtime/record/node';
import { record } from '../hostile/figures';
import { artifactsDir, launch, serve, type Browser, type Served } from './harness';
import { appDist } from './app-session';

const fixture = parse(readFileSync(join(import.meta.dirname, 'fixtures/strip.lt'), 'utf8')).doc;

let server: Served;
let browser: Browser;
const pageErrors: string[] = [];
/** beforeunload questions seen (each accepted, so the page may leave). */
let leaveQuestions = 0;

function watch(p: Page): Page {
  p.on('pageerror', (e) => pageErrors.push(e.message));
  p.on('dialog', (d) => {
    if (d.type() === 'beforeunload') {
      leaveQuestions++;
      void d.accept();
    } else {
      pageErrors.push(`dialog: ${d.message()}`);
      void d.dismiss();
    }
  });
  return p;
}

async function newPage(context: BrowserContext = browser.context): Promise<Page> {
  return watch(await context.newPage());
}

async function ready(p: Page): Promise<void> {
  await p.waitForSelector('body[data-ready="true"]', { timeout: 30_000 });
}

async function openSheet(p: Page, key: string, doc?: CalcDocument): Promise<void> {
  await p.goto(`${server.url}#sheet=${key}`);
  await ready(p);
  if (doc) {
    await p.evaluate(([k, d]) => (window as any).loadtraceOpen(k, d), [key, doc] as const);
    await p.waitForFunction(() => document.querySelector('#status')?.textContent === 'Saved');
  }
}

const valueOf = (p: Page, id: string) => p.locator(`#cell-${id} input.value-field`).inputValue();

async function commit(p: Page, id: string, value: string): Promise<void> {
  const field = p.locator(`#cell-${id} input.value-field`);
  await field.fill(value);
  await field.press('Enter');
}

/**
 * Types and commits each edit with Enter inside one task of the page, so the tab can be
 * closed before the page gets another turn (a person closing the tab right after Enter:
 * the save that Enter scheduled has not started, or not finished).
 */
async function commitAllAtOnce(p: Page, edits: [string, string][]): Promise<void> {
  await p.evaluate((list) => {
    for (const [id, value] of list) {
      const field = document.querySelector<HTMLInputElement>(`#cell-${id} input.value-field`)!;
      field.focus();
      field.value = value;
      field.dispatchEvent(new Event('input', { bubbles: true }));
      field.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true }));
    }
  }, edits);
}

/** A strip sheet with `n` extra inputs, so a save writes a large sheet. */
function largeSheet(n: number): CalcDocument {
  const cells = [...fixture.cells];
  for (let i = 0; i < n; i++) cells.push({ kind: 'input', id: `x${i}`, name: `x${i}`, value: `${i + 1} ft`, label: `Filler input ${i}` });
  return { meta: fixture.meta, cells };
}

async function shot(p: Page, name: string): Promise<void> {
  await p.screenshot({ path: join(artifactsDir(), `lost-work-${name}.png`) });
}

beforeAll(async () => {
  server = await serve(appDist());
  browser = await launch();
}, 120_000);

afterAll(async () => {
  await browser?.close();
  server?.stop();
});

describe('lost work in Chromium', () => {
  it('six edits committed with Enter, the tab closed at once: all six are there on reopening', async () => {
    const p = await newPage();
    const key = `lw-close-${Date.now()}`;
    await openSheet(p, key, fixture);
    const edits: [string, string][] = [['i1', '10 in'], ['i2', '1 in'], ['i3', '0.5 in'], ['i4', '145 pcf'], ['i5', '60 psf'], ['i1', '11 in']];
    await commitAllAtOnce(p, edits);
    await p.close(); // no wait for "Saved"
    const q = await newPage();
    await openSheet(q, key);
    const want = new Map(edits);
    let lost = 0;
    for (const [id, v] of want) if ((await valueOf(q, id)) !== v) lost++;
    record('close right after Enter', { kind: 'lost-work', edits: want.size, lost });
    expect(lost).toBe(0);
    await q.close();
  });

  it('a large sheet closed while it saves keeps both edits', async () => {
    const p = await newPage();
    const key = `lw-large-${Date.now()}`;
    await openSheet(p, key, largeSheet(2500));
    await commitAllAtOnce(p, [['i1', '12 in'], ['i5', '80 psf']]);
    await p.close();
    const q = await newPage();
    await openSheet(q, key);
    const lost = Number((await valueOf(q, 'i1')) !== '12 in') + Number((await valueOf(q, 'i5')) !== '80 psf');
    record('large sheet closed mid-save', { kind: 'lost-work', edits: 2, lost });
    expect(lost).toBe(0);
    await q.close();
  });

  it('a value typed but not committed is back in its field after a reload, with a notice, and leaving asked first', async () => {
    const p = await newPage();
    await openSheet(p, `lw-typed-${Date.now()}`, fixture);
    let lost = 0;
    const tries = 3;
    for (let i = 0; i < tries; i++) {
      const typed = `${13 + i} i`; // half typed: not yet a value
      await p.locator('#cell-i1 input.value-field').fill(typed);
      const asked = leaveQuestions;
      await p.reload();
      await ready(p);
      expect(leaveQuestions).toBe(asked + 1); // "Leave site?" before the reload
      await p.waitForSelector('#lt-notice-restored:not([hidden])');
      if ((await valueOf(p, 'i1')) !== typed) lost++;
      expect(await p.locator('#lt-notice-restored').innerText()).toMatch(/What you were typing in h is back in its field, not yet applied/);
    }
    await shot(p, 'typed-restored');
    record('reload mid-typing', { kind: 'lost-work', edits: tries, lost });
    expect(lost).toBe(0);
    // The restored text is still the person's to apply.
    await p.locator('#cell-i1 input.value-field').fill('13 in');
    await p.locator('#cell-i1 input.value-field').press('Enter');
    await p.waitForFunction(() => document.querySelector('#status')?.textContent === 'Saved');
    await p.close();
  });

  it('two tabs on one sheet: the second says so instead of writing over the first', async () => {
    const a = await newPage();
    const key = `lw-tabs-${Date.now()}`;
    await openSheet(a, key, fixture);
    const b = await newPage();
    await openSheet(b, key);
    await commit(a, 'i1', '10 in');
    await a.waitForFunction(() => document.querySelector('#status')?.textContent === 'Saved');
    await commit(b, 'i2', '1.5 in');
    await b.waitForSelector('#banner:not([hidden])', { timeout: 5000 });
    const message = await b.locator('#banner').innerText();
    expect(message).toMatch(/changed in another tab/);
    // b's edit is not lost: it is on screen, and kept as a copy when chosen.
    await b.getByText('Keep this version as a new copy').click();
    await b.waitForFunction(() => document.querySelector('#status')?.textContent === 'Saved');
    expect(await valueOf(b, 'i2')).toBe('1.5 in');
    record('two tabs', { kind: 'lost-work', edits: 2, lost: 0, message: true });
    await a.close();
    await b.close();
  });

  it('storage full: a banner says so and offers to export, and the edit is kept', async () => {
    const context = (await launch()); // a profile of its own, so the quota applies to it alone
    try {
      const p = watch(context.context.pages()[0] ?? (await context.context.newPage()));
      // Headless Chromium does not enforce a lowered quota (Storage.overrideQuotaForOrigin to
      // 1 byte still stored 20 MB), so the store is made full the way the browser reports it:
      // every write refused with a QuotaExceededError.
      await p.addInitScript(() => {
        const put = IDBObjectStore.prototype.put;
        IDBObjectStore.prototype.put = function (this: IDBObjectStore, ...args: [unknown, IDBValidKey?]) {
          if ((window as any).__storageFull) throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
          return put.apply(this, args);
        };
      });
      await openSheet(p, 'lw-full', fixture);
      await p.evaluate(() => { (window as any).__storageFull = true; });
      await commit(p, 'i1', '10 in');
      await p.waitForSelector('#lt-notice-storage-full:not([hidden])', { timeout: 10_000 });
      const text = await p.locator('#lt-notice-storage-full').innerText();
      expect(text).toMatch(/storage is full/);
      expect(text).toMatch(/Export the record/);
      expect(text).toMatch(/Download the sheet/);
      await shot(p, 'storage-full');
      expect(await valueOf(p, 'i1')).toBe('10 in');
      record('storage full', { kind: 'lost-work', edits: 1, lost: 0, message: true });
      await p.close();
    } finally {
      await context.close();
    }
  });

  it('a record edited then reloaded reopens the working copy, saying so, with the record as issued one click away', async () => {
    const work = mkdtempSync(join(tmpdir(), 'loadtrace-lost-work-'));
    const shell = readFileSync(join(appDist(), 'dist-record/record-shell.html'), 'utf8');
    const file = join(work, 'strip.html');
    writeFileSync(file, (await exportComputed(fixture, shell)).html);
    const p = await newPage();
    await p.goto(`file://${file}`);
    await p.waitForFunction(() => document.documentElement.classList.contains('lt-live'), null, { timeout: 60_000 });
    await commit(p, 'i1', '10 in');
    await p.waitForFunction(() => document.querySelector('#status')?.textContent === 'Saved');
    await p.reload();
    await p.waitForSelector('#lt-notice-working-copy:not([hidden])', { timeout: 30_000 });
    const lost = Number((await valueOf(p, 'i1')) !== '10 in');
    expect(await p.locator('#lt-notice-working-copy').innerText()).toMatch(/your working copy of this record/);
    await shot(p, 'record-working-copy');
    await p.getByText('Show the record as issued').click();
    await p.waitForFunction(() => (document.querySelector('#cell-i1 input.value-field') as HTMLInputElement)?.value === '9 in');
    record('record edited then reloaded', { kind: 'lost-work', edits: 1, lost, message: true });
    expect(lost).toBe(0);
    await p.close();
  });

  it('raised no page error', () => {
    expect(pageErrors).toEqual([]);
  });
});
