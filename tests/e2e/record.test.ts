// The calc record in Chromium (issue 5): the exported main template opens from file://
// with every request blocked and none made, renders every cell, recomputes after an
// input edit, re-exports losslessly, reads with JavaScript off, prints as calc sheets,
// and hostile or damaged records run nothing and say what is wrong.

import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { resultRows, type ResultRow } from '../../runtime/cli/report';
import type { CalcDocument } from '../../runtime/document';
import { setInputValue } from '../../runtime/edit/index';
import { createEngine } from '../../runtime/engine';
import { parse } from '../../runtime/format/index';
import { unpack } from '../../runtime/record/index';
import { exportComputed } from '../../runtime/record/node';
import { unitText as resultText } from '../../runtime/present/units-text';
import { hostileDocument } from '../record/fixtures';
import { ARTIFACTS, CHROMIUM_ARGS, ROOT, artifactsDir } from './harness';
import { appDist } from './app-session';

const MAIN_TEMPLATE = join(ROOT, 'docs-templates/load-path.lt');
let work: string;
let shell: string;
let doc: CalcDocument;
let docText: string;
let recordFile: string;
let rows: ResultRow[];
let browser: Browser;

async function computed(d: CalcDocument): Promise<ResultRow[]> {
  const engine = createEngine(d);
  await engine.settled();
  const r = resultRows(d, engine);
  engine.dispose();
  return r;
}

/** A context where every request but the record file itself is aborted and counted. */
async function offline(javaScriptEnabled = true): Promise<{ context: BrowserContext; page: Page; requests: string[]; blocked: string[] }> {
  const context = await browser.newContext({ javaScriptEnabled, viewport: { width: 1280, height: 900 }, acceptDownloads: true });
  const requests: string[] = [];
  const blocked: string[] = [];
  await context.route('**/*', (route) => {
    const url = route.request().url();
    if (url.startsWith(`file://${work}/`) && route.request().isNavigationRequest()) return route.continue();
    blocked.push(url);
    return route.abort();
  });
  const page = await context.newPage();
  page.on('request', (r) => requests.push(r.url()));
  page.on('dialog', (d) => {
    blocked.push(`dialog: ${d.message()}`);
    void d.dismiss();
  });
  return { context, page, requests, blocked };
}

/** A page less the template holding the app's styles. */
const outsideAppCss = (html: string) => html.replace(/<template id="lt-app-css">[\s\S]*?<\/template>/, '');

const live = (page: Page) => page.waitForFunction(() => document.documentElement.classList.contains('lt-live'), null, { timeout: 60_000 });

function write(name: string, html: string): string {
  const file = join(work, name);
  writeFileSync(file, html);
  return file;
}

beforeAll(async () => {
  work = mkdtempSync(join(tmpdir(), 'loadtrace-record-'));
  shell = readFileSync(join(appDist(), 'dist-record/record-shell.html'), 'utf8'); // built once for all e2e files
  const parsed = parse(readFileSync(MAIN_TEMPLATE, 'utf8'));
  expect(parsed.errors).toEqual([]);
  doc = parsed.doc;
  const record = await exportComputed(doc, shell);
  docText = record.docText;
  recordFile = write('main-template.html', record.html);
  rows = await computed(doc);
  browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS });
  artifactsDir();
}, 240_000);

afterAll(async () => {
  await browser?.close();
  if (work) rmSync(work, { recursive: true, force: true });
});

describe('the exported main template in Chromium, offline', () => {
  it('opens from file:// with no request, renders every cell, recomputes after an edit, and re-exports losslessly', async () => {
    const { context, page, requests, blocked } = await offline();
    await page.goto(`file://${recordFile}`);
    await live(page);
    expect(requests).toEqual([`file://${recordFile}`]); // the page itself, nothing else (CSP connect-src 'none', issue 5)
    expect(blocked).toEqual([]);
    // The app typesets cells as they come near the viewport: scroll through the whole sheet.
    await page.evaluate(async () => {
      // A frame, or 100 ms if the page draws no frame meanwhile: the loop cannot hang.
      const frame = () => new Promise((r) => { const t = setTimeout(r, 100); requestAnimationFrame(() => setTimeout(() => { clearTimeout(t); r(null); }, 0)); });
      for (const el of document.querySelectorAll('#cells article')) {
        el.scrollIntoView({ block: 'center' });
        await frame();
      }
      for (let i = 0; i < 200 && document.querySelector('#cells article.unrendered'); i++) await frame();
      window.scrollTo(0, 0);
    });
    const cells = await page.$$eval('#cells article', (els) => els.map((e) => ({ id: (e as HTMLElement).dataset.id, cls: e.className })));
    expect(cells.map((c) => c.id)).toEqual(doc.cells.map((c) => c.id));
    expect(cells.filter((c) => /unrendered|st-pending|st-error/.test(c.cls))).toEqual([]);
    // The whole file is checked against its seal once the page is live; only then is it called verified.
    await page.waitForFunction(() => performance.getEntriesByName('loadtrace:record-checked').length > 0, null, { timeout: 30_000 });
    expect(await page.locator('#status').textContent()).toBe('Record opened: every part of the file verified against its seal');
    expect(await page.locator('#lt-record-line .lt-rl-verified').isVisible()).toBe(true);
    expect(await page.locator('#help-body').textContent()).toContain('Export the calc record'); // the shortcut is listed
    expect(await page.locator('.toolbar [data-record="export"]').isVisible()).toBe(true);
    await page.screenshot({ path: join(ARTIFACTS, 'record-opened.png') });

    // Export again, as a person does (Ctrl+S): the embedded document is byte-identical.
    const download = page.waitForEvent('download');
    await page.keyboard.press('Control+s');
    const file = join(work, 'again.html');
    await (await download).saveAs(file);
    const againHtml = readFileSync(file, 'utf8');
    const again = await unpack(againHtml);
    expect(again.ok).toBe(true);
    expect(again.docText).toBe(docText);
    // The app's styles: a copy of the shell's inert template in the head, KaTeX's fonts
    // with them. Exporting again keeps the one template and adds no style of its own.
    expect(await page.evaluate(() => [...document.styleSheets].flatMap((s) => [...s.cssRules])
      .filter((r) => r instanceof CSSFontFaceRule && r.style.fontFamily.includes('KaTeX')).length)).toBeGreaterThan(0);
    const recordHtml = readFileSync(recordFile, 'utf8');
    expect(againHtml.match(/<template id="lt-app-css">/g)).toHaveLength(1);
    expect(outsideAppCss(againHtml).match(/<style\b/g)).toEqual(outsideAppCss(recordHtml).match(/<style\b/g));

    // Edit fc where it stands: the engine recomputes what depends on it, as in Node.
    const fc = doc.cells.find((c) => c.kind === 'input' && c.name === 'fc')!;
    const edited = setInputValue(doc, fc.id, '6000 psi');
    const expected = await computed(edited);
    const changed = expected.filter((r, i) => r.kind === 'formula' && r.value !== rows[i].value);
    expect(changed.length).toBeGreaterThan(0);
    const dependent = page.locator(`#cell-${changed[0].id}`);
    await dependent.scrollIntoViewIfNeeded();
    const before = await dependent.textContent();
    await page.locator(`#cell-${fc.id} .value-field`).fill('6000 psi');
    await page.locator(`#cell-${fc.id} .value-field`).press('Enter');
    await dependent.scrollIntoViewIfNeeded(); // the app re-typesets cells near the viewport
    await expect.poll(() => dependent.textContent()).not.toBe(before);
    const engineRows = await page.evaluate(() => {
      const app = (window as any).loadtrace;
      return app.doc.cells.map((c: { id: string }) => ({ id: c.id, status: app.engine.state(c.id)?.status, value: app.engine.state(c.id)?.display?.value ?? null }));
    });
    expect(engineRows).toEqual(expected.map((r) => ({ id: r.id, status: r.status, value: r.value })));
    // The edit is kept in the browser: the store (IndexedDB) opened while the record did,
    // and the first save waited for it (cells/main.ts).
    await expect.poll(() => page.evaluate(() => (window as any).loadtrace.autosave.version), { timeout: 10_000 }).toBeGreaterThan(0);
    expect(await page.locator('#status').textContent()).toContain('Saved');

    // A formula's source opens in the full editor: its code is a block of its own in the
    // record, run under the record's CSP on first use (a blocked script would leave a
    // plain text area and no .cm-editor).
    await page.evaluate(() => document.addEventListener('securitypolicyviolation', (e) => ((window as any).__csp ??= []).push(`${e.violatedDirective} ${e.blockedURI}`)));
    const formula = doc.cells.find((c) => c.kind === 'formula')!;
    await page.locator(`#cell-${formula.id} .cell-no`).click();
    await page.keyboard.press('Enter');
    await page.waitForFunction((id) => document.activeElement?.closest(`#cell-${id} .cm-editor`) !== null, formula.id, { timeout: 10_000 });
    expect(await page.locator('#lt-editor-run').count()).toBe(1);
    await page.keyboard.press('Escape');
    await page.locator(`#cell-${formula.id} .cm-editor`).waitFor({ state: 'detached' });
    expect(await page.evaluate(() => (window as any).__csp ?? [])).toEqual([]);
    // KaTeX is a block of its own too, run when the app first typesets: the equations on
    // the page are KaTeX's (a blocked script would leave the TeX as text, class tex-raw).
    expect(await page.locator('#lt-katex-run').count()).toBe(1);
    expect(await page.locator('#cells .katex').count()).toBeGreaterThan(0);
    expect(await page.locator('#cells .tex-raw').count()).toBe(0);

    // Re-export after the edit: the new document and its results come back.
    const html = await page.evaluate(() => (window as any).loadtraceRecord.exportHtml());
    const back = await unpack(html);
    expect(back.ok).toBe(true);
    const reread = parse(back.docText!);
    expect(reread.doc).toStrictEqual(edited);
    expect(await computed(reread.doc)).toStrictEqual(expected);

    // Printing redraws the static sheets from the live values.
    await page.evaluate(() => window.dispatchEvent(new Event('beforeprint')));
    const pdf = join(ARTIFACTS, 'record-print-after-edit.pdf');
    await page.pdf({ path: pdf, printBackground: true });
    const text = spawnSync('pdftotext', ['-layout', pdf, '-'], { encoding: 'utf8' }).stdout;
    expect(text).toContain('6000 psi');
    expect(blocked).toEqual([]);
    await context.close();
  }, 180_000);

  it('with JavaScript off shows every result of the static rendering, and prints as calc sheets', async () => {
    const { context, page, requests } = await offline(false);
    await page.goto(`file://${recordFile}`);
    expect(requests).toEqual([`file://${recordFile}`]);
    expect(await page.locator('.toolbar').isVisible()).toBe(false);
    expect(await page.locator('#lt-static').isVisible()).toBe(true);
    // The app's styles stay in their inert template: only the static rendering's apply.
    expect(await page.evaluate(() => [...document.styleSheets].flatMap((s) => [...s.cssRules]).filter((r) => r instanceof CSSFontFaceRule).length)).toBe(0);
    for (const r of rows) {
      if (r.kind !== 'formula' && r.kind !== 'input' && r.kind !== 'check') continue;
      const res = (await page.locator(`#lt-c-${r.id} .lt-res`).textContent()) ?? '';
      if (r.kind === 'check') expect(res).toContain(r.status === 'ok' ? 'OK' : 'NOT OK');
      else expect(res.length).toBeGreaterThan(0);
      expect(r.status).toBe('ok');
    }
    // The result column holds the engine's display text for every formula and input.
    const texts = await page.$$eval('.lt-cell', (els) => els.map((e) => [(e as HTMLElement).dataset.id,
      e.querySelector('.lt-textres')?.textContent ?? e.querySelector('.lt-res')?.textContent ?? '']));
    const byId = new Map(texts as [string, string][]);
    const engine = createEngine(doc);
    await engine.settled();
    for (const c of doc.cells) {
      if (c.kind !== 'formula' && c.kind !== 'input') continue;
      const text = engine.state(c.id)!.display!.text;
      expect([resultText(text), `= ${text}`]).toContain(byId.get(c.id)); // result column, or the sentence under a long text result
    }
    engine.dispose();
    await page.screenshot({ path: join(ARTIFACTS, 'record-static-no-js.png') });

    const pdf = join(ARTIFACTS, 'record-print.pdf');
    await page.pdf({ path: pdf, printBackground: true, format: 'Letter' });
    const pages = Number(/Pages:\s+(\d+)/.exec(spawnSync('pdfinfo', [pdf], { encoding: 'utf8' }).stdout)?.[1]);
    expect(pages).toBeGreaterThan(2);
    const sheet = (n: number) => spawnSync('pdftotext', ['-f', String(n), '-l', String(n), '-layout', pdf, '-'], { encoding: 'utf8' }).stdout;
    // Title block on every sheet, with "sheet n of m"; the check summary first.
    for (const n of [1, 2, pages]) {
      const t = sheet(n);
      expect(t).toContain(doc.meta.project);
      expect(t).toContain(doc.meta.job);
      expect(t).toContain(`SHEET ${n} OF ${pages}`);
      expect(t).toContain('PREPARED');
      expect(t).toContain('CHECKED');
    }
    expect(sheet(1)).toContain('Summary of checks');
    spawnSync('pdftoppm', ['-png', '-r', '50', '-f', '1', '-l', '3', pdf, join(ARTIFACTS, 'record-print-sheet')]);
    await context.close();
  }, 120_000);
});

describe('opening records in the app', () => {
  it('opens a record from the file picker and an .lt sheet dropped on the page', async () => {
    const { context, page, blocked } = await offline();
    await page.goto(`file://${recordFile}`);
    await live(page);
    // The picker: the footing template's record.
    const footing = parse(readFileSync(join(ROOT, 'docs-templates/spread-footing.lt'), 'utf8')).doc;
    const footingFile = write('footing.html', (await exportComputed(footing, shell)).html);
    const chooser = page.waitForEvent('filechooser');
    await page.locator('.toolbar [data-record="open"]').click();
    await (await chooser).setFiles(footingFile);
    await page.waitForFunction((subject) => (window as any).loadtrace.doc.meta.subject === subject, footing.meta.subject);
    expect(await page.$$eval('#cells article', (els) => els.length)).toBe(footing.cells.length);
    expect(await page.locator('#lt-record-banner').isVisible()).toBe(false); // seal intact: no message
    // Drag and drop: a .lt text file.
    const bearing = readFileSync(join(ROOT, 'docs-templates/bearing-capacity.lt'), 'utf8');
    const subject = parse(bearing).doc.meta.subject;
    await page.evaluate((text) => {
      const dt = new DataTransfer();
      dt.items.add(new File([text], 'bearing-capacity.lt', { type: 'text/plain' }));
      document.body.dispatchEvent(new DragEvent('drop', { dataTransfer: dt, bubbles: true, cancelable: true }));
    }, bearing);
    await page.waitForFunction((s) => (window as any).loadtrace.doc.meta.subject === s, subject);
    expect(blocked).toEqual([]);
    await page.screenshot({ path: join(ARTIFACTS, 'record-open-dropped.png') });
    await context.close();
  }, 120_000);
});

describe('hostile and damaged records', () => {
  it('a record full of markup runs nothing and loses nothing', async () => {
    const hostile = hostileDocument();
    const record = await exportComputed(hostile, shell);
    const file = write('hostile.html', record.html);
    for (const js of [true, false]) {
      const { context, page, requests, blocked } = await offline(js);
      const errors: string[] = [];
      page.on('pageerror', (e) => errors.push(e.message));
      await page.goto(`file://${file}`);
      if (js) await live(page);
      expect(requests).toEqual([`file://${file}`]);
      expect(blocked).toEqual([]); // no request, no dialog
      expect(await page.evaluate(() => (window as any).__pwned)).toBeUndefined();
      expect(await page.$$eval('iframe, object, embed, img, #lt-static a[href^="javascript"], #cells a[href^="javascript"]', (els) => els.length)).toBe(0);
      expect(await page.locator('#lt-static').getAttribute('id')).toBe('lt-static');
      if (js) {
        expect(await page.$$eval('#cells article', (els) => els.length)).toBe(hostile.cells.length);
        const html = await page.evaluate(() => (window as any).loadtraceRecord.exportHtml());
        expect((await unpack(html)).docText).toBe(record.docText);
      }
      expect(errors).toEqual([]);
      await page.screenshot({ path: join(ARTIFACTS, `record-hostile-${js ? 'js' : 'no-js'}.png`) });
      await context.close();
    }
  }, 120_000);

  it('a record edited outside Loadtrace says so at the top and still opens', async () => {
    const html = readFileSync(recordFile, 'utf8').replace('input i15  fc = 5000 psi', 'input i15  fc = 9000 psi');
    const file = write('tampered.html', html);
    const { context, page } = await offline();
    await page.goto(`file://${file}`);
    await live(page);
    expect(await page.locator('#lt-record-banner').textContent()).toContain('edited outside Loadtrace');
    expect(await page.locator('#lt-record-banner').isVisible()).toBe(true);
    expect(await page.$$eval('#cells article', (els) => els.length)).toBe(doc.cells.length);
    expect(await page.evaluate(() => (window as any).loadtrace.doc.cells.find((c: any) => c.name === 'fc').value)).toBe('9000 psi');
    await page.screenshot({ path: join(ARTIFACTS, 'record-tampered.png') });
    await context.close();
  }, 60_000);

  it('a record whose packed app is damaged says so above its static rendering', async () => {
    const html = readFileSync(recordFile, 'utf8');
    const at = html.indexOf('>', html.indexOf('id="lt-app"')) + 1;
    const file = write('damaged-app.html', `${html.slice(0, at)}${'A'.repeat(400)}${html.slice(at + 400)}`);
    const { context, page, blocked } = await offline();
    await page.goto(`file://${file}`);
    const alert = page.locator('body > p[role="alert"]');
    await alert.waitFor({ timeout: 30_000 });
    expect(await alert.isVisible()).toBe(true);
    expect(await alert.textContent()).toBe('The app in this record could not start: its packed code (lt-app) is damaged. What follows is the static copy written into the file; it has not been checked.');
    expect(await page.locator('#lt-static .lt-summary').isVisible()).toBe(true);
    expect(await page.locator('.toolbar').isVisible()).toBe(false);
    expect(blocked).toEqual([]);
    await page.screenshot({ path: join(ARTIFACTS, 'record-damaged-app.png') });
    await context.close();
  }, 60_000);

  it('a cut-off record shows its static rendering and the CLI names the problem', async () => {
    const html = readFileSync(recordFile, 'utf8');
    const file = write('cut.html', html.slice(0, Math.floor(html.length * 0.8)));
    const { context, page } = await offline();
    await page.goto(`file://${file}`);
    await page.waitForTimeout(1500);
    expect(await page.locator('#lt-static .lt-summary').isVisible()).toBe(true);
    expect(await page.locator('#lt-static .lt-cell').count()).toBe(doc.cells.filter((c) => c.kind !== 'section').length);
    await page.screenshot({ path: join(ARTIFACTS, 'record-cut.png') });
    await context.close();
    const back = await unpack(readFileSync(file, 'utf8'));
    expect(back.docText).toBe(docText);
    expect(back.problems.join(' ')).toMatch(/cut short/);
  }, 60_000);
});
