// The seal in Chromium and the CLI (issue 14, items 4 and 5): a forged result in the
// static page with one byte of the loader changed (the policy then refuses the loader,
// so the app never starts) shows the plain-HTML "the app did not start" message and an
// unverified digest line, and the CLI exits 2 naming the static rendering; a script put
// before the policy is reported and nothing says verified; a refresh element does not
// send the reader away and is reported; a changed byte of KaTeX is reported by name.

import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseArgs } from '../../runtime/cli/args';
import { runCalc } from '../../runtime/cli/main';
import { parse } from '../../runtime/format/index';
import { exportComputed } from '../../runtime/record/node';
import { ARTIFACTS, CHROMIUM_ARGS, ROOT, artifactsDir } from './harness';
import { appDist } from './app-session';

let work: string;
let html: string;
let browser: Browser;

const CSP_OPEN = '<head><meta http-equiv="Content-Security-Policy"';

function write(name: string, text: string): string {
  const file = join(work, name);
  writeFileSync(file, text);
  return file;
}

async function cli(...argv: string[]): Promise<{ code: number; err: string }> {
  const err: string[] = [];
  const code = await runCalc(parseArgs(argv), () => {}, (s) => err.push(s));
  return { code, err: err.join('\n') };
}

async function open(file: string, javaScriptEnabled = true): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ javaScriptEnabled, viewport: { width: 1280, height: 900 } });
  await context.route('**/*', (r) => (r.request().url().startsWith(`file://${work}/`) ? r.continue() : r.abort()));
  const page = await context.newPage();
  // 'commit': a page whose loader stopped a refresh never fires its load events.
  await page.goto(`file://${file}`, { waitUntil: 'commit' });
  return { context, page };
}

const checked = (page: Page) =>
  page.waitForFunction(() => performance.getEntriesByName('loadtrace:record-checked').length > 0, null, { timeout: 60_000 });

/** Every text on the page that claims the file was verified (the record line's, the status's, the static page's). */
const claimsVerified = (page: Page) => page.evaluate(() =>
  [...document.querySelectorAll('#status, #lt-record-line, #lt-static, body > p')]
    .map((el) => (el as HTMLElement).innerText)
    .filter((t) => /\bverified\b/i.test(t.replace(/not verified|unverified|NOT VERIFIED/gi, ''))));

beforeAll(async () => {
  work = mkdtempSync(join(tmpdir(), 'loadtrace-seal-'));
  const shell = readFileSync(join(appDist(), 'dist-record/record-shell.html'), 'utf8');
  html = (await exportComputed(parse(readFileSync(join(ROOT, 'docs-templates/load-path.lt'), 'utf8')).doc, shell)).html;
  browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS });
  artifactsDir();
}, 240_000);

afterAll(async () => {
  await browser?.close();
  if (work) rmSync(work, { recursive: true, force: true });
});

describe('item 4: a forged result, and a loader the policy refuses', () => {
  it('the reader is told in plain HTML that the app did not start and nothing was checked; the CLI exits 2 naming the static rendering', async () => {
    // Two bytes: the first ratio in the summary of checks (0.x → 0.3) and one in the loader.
    const ratio = html.indexOf('<td class="lt-sum-r">0.') + '<td class="lt-sum-r">0.'.length;
    const loader = html.indexOf('performance.mark(\'loadtrace:loader\')') + 20;
    expect(ratio).toBeGreaterThan(1000);
    expect(loader).toBeGreaterThan(ratio);
    let forged = html.slice(0, ratio) + (html[ratio] === '3' ? '4' : '3') + html.slice(ratio + 1);
    forged = forged.slice(0, loader) + (forged[loader] === 'x' ? 'y' : 'x') + forged.slice(loader + 1);
    const file = write('forged.html', forged);

    for (const js of [true, false]) {
      const { context, page } = await open(file, js);
      await page.waitForTimeout(js ? 3000 : 300); // the app would have been live well within this
      expect(await page.evaluate(() => document.documentElement.classList.contains('lt-app-running'))).toBe(false);
      const noApp = page.locator('#lt-noapp');
      expect(await noApp.isVisible()).toBe(true);
      expect(await noApp.innerText()).toBe('If this message stays, the live Loadtrace app did not start in this page: JavaScript is off, or the file was altered so that the browser refused its code. What follows is the copy written into the file, and nothing on this page has been checked.');
      expect(await page.locator('#lt-seal-line').innerText()).toMatch(/^Record SHA-256 [0-9a-f]{64}\. Not verified: this page cannot check itself\./);
      expect(await claimsVerified(page)).toEqual([]);
      await page.screenshot({ path: join(ARTIFACTS, `e2e-seal-forged-${js ? 'js' : 'no-js'}.png`) });
      await context.close();
    }
    const r = await cli(file);
    expect(r.code).toBe(2);
    expect(r.err).toContain('The file was altered in the static rendering (what a reader sees without the app)');
    const v = await cli(file, '--verify');
    expect(v.err).toContain('NOT VERIFIED: The file was altered in the static rendering');
  }, 120_000);
});

describe('item 5: what runs or navigates outside the policy', () => {
  it('a script before the policy that rewrites the live summary is reported, and nothing says verified', async () => {
    const script = '<script>addEventListener("DOMContentLoaded", () => setInterval(() => { const s = document.querySelector("#summary h2"); if (s) s.textContent = "All checks OK (forged)"; }, 50));</script>';
    const file = write('before-policy.html', html.replace(CSP_OPEN, `<head>${script}<meta http-equiv="Content-Security-Policy"`));
    const { context, page } = await open(file);
    await checked(page);
    expect(await page.locator('#status').textContent()).toBe('Record opened: NOT verified (see the message above)');
    expect(await page.locator('#lt-record-line .lt-rl-altered').innerText()).toContain('A <script> element was placed before the Content-Security-Policy');
    expect(await page.locator('#lt-record-banner').innerText()).toContain('placed before the Content-Security-Policy');
    expect(await claimsVerified(page)).toEqual([]);
    await page.screenshot({ path: join(ARTIFACTS, 'e2e-seal-script-before-policy.png') });
    await context.close();
    const r = await cli(file, '--verify');
    expect(r.code).toBe(2);
    expect(r.err).toContain('NOT VERIFIED: A <script> element was placed before the Content-Security-Policy');
  }, 120_000);

  it('a refresh element does not send the reader elsewhere, and is reported', async () => {
    write('elsewhere.html', '<!doctype html><title>forged</title><p>All checks OK (forged)</p>');
    // The refresh right after the policy (before it would be reported as such too).
    const placed = html.replace(/(<head><meta http-equiv="Content-Security-Policy" content="[^"]*">)/, '$1<meta http-equiv="refresh" content="0; url=elsewhere.html">');
    expect(placed).not.toBe(html);
    const file = write('refresh.html', placed);
    const { context, page } = await open(file);
    await checked(page);
    await page.waitForTimeout(1000);
    expect(page.url()).toBe(`file://${file}`);
    expect(await page.locator('#lt-record-line .lt-rl-altered').innerText()).toContain('refresh element');
    expect(await claimsVerified(page)).toEqual([]);
    await context.close();
    const r = await cli(file, '--verify');
    expect(r.code).toBe(2);
    expect(r.err).toContain('The page holds a refresh element');
  }, 120_000);

  it('one byte of the KaTeX block changed: reported by name, not opened as verified', async () => {
    const at = html.indexOf('id="lt-katex" data-encoding="gzip base64">') + 200;
    const file = write('katex.html', html.slice(0, at) + (html[at] === 'A' ? 'B' : 'A') + html.slice(at + 1));
    const { context, page } = await open(file);
    await checked(page);
    expect(await page.locator('#lt-record-line .lt-rl-altered').innerText()).toContain('The file was altered in the packed KaTeX (equation typesetting)');
    expect(await claimsVerified(page)).toEqual([]);
    await context.close();
    expect((await cli(file)).code).toBe(2);
  }, 120_000);
});
