// `npm run bench:record`: the exported main template as a calc record — its size, and
// medians over fresh Chromium profiles (headless, file://) of the time from opening it
// - to every cell rendered: the record's static rendering (each cell with its issued
//   hand calc, result and clause; it reads with no script) wholly in the page, and the
//   screen painted. Target (issue 5): ≤ 400 ms. Sizes: ≤ 1.5 MB.
// - to the live app: every cell recomputed by the engine and placed, those on screen
//   typeset (the rest as they come near the viewport); editable from then on.
// BENCH_BASE=DIR (another checkout with node_modules) exports the same template with that
// checkout too and opens the two records in turn, printing both side by side: before and
// after a change, in one run under the same load.
// - and when the app has checked the whole file against the record's seal (after live).

import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import { recordShellFile, ROOT } from '../runtime/cli/record-shell';
import { parse } from '../runtime/format/index';
import { exportComputed } from '../runtime/record/node';

const RUNS = Number(process.env.RUNS ?? 9);
const TEMPLATE = join(ROOT, 'docs-templates/load-path.lt');
const ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
  '--disable-background-networking', '--disable-component-update', '--disable-sync'];

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

const shell = recordShellFile((s) => console.error(s));
const { doc, errors } = parse(readFileSync(TEMPLATE, 'utf8'));
if (errors.length) throw new Error(`${TEMPLATE}: ${errors[0].message}`);
const record = await exportComputed(doc, shell);
const dir = mkdtempSync(join(tmpdir(), 'loadtrace-bench-record-'));
interface Rec { label: string; file: string; bytes: number; times: number[]; rendered: number[]; firstPaint: number[]; phases: Map<string, number[]> }
const PHASES = ['static-parsed', 'static-painted', 'loader', 'unpacked', 'app-started', 'record-open', 'record-shown', 'record-computed', 'record-live', 'live-painted', 'record-checked'];
const rec = (label: string, file: string, html: string): Rec => {
  writeFileSync(file, html);
  return { label, file, bytes: Buffer.byteLength(html), times: [], rendered: [], firstPaint: [], phases: new Map(PHASES.map((p) => [p, []])) };
};
const records = [rec(process.env.BENCH_BASE ? 'this checkout' : '', join(dir, 'main-template.html'), record.html)];
if (process.env.BENCH_BASE) {
  const base = process.env.BENCH_BASE;
  const out = join(dir, 'base.html');
  const r = spawnSync(join(base, 'node_modules/.bin/tsx'), ['runtime/cli/main.ts', 'docs-templates/load-path.lt', '--export', out], { cwd: base, encoding: 'utf8' });
  if (r.status !== 0 && r.status !== 1) throw new Error(`export with ${base} failed:\n${r.stderr}`);
  records.push(rec('base', join(dir, 'base-template.html'), readFileSync(out, 'utf8')));
}

const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ARGS });
let requests = 0;

/**
 * Runs in the page before it parses (a driver script: the record's CSP does not apply;
 * a string, as tsx would add helpers to a function). Marks `static-parsed` once the parser
 * has gone past the whole static rendering (a node follows #lt-static in the body: every
 * cell is in the page), and `static-painted` after the next frame (requestAnimationFrame,
 * then a task: the frame has been produced).
 */
const MARK_STATIC = `(() => {
  const seen = () => {
    const el = document.getElementById('lt-static');
    if (!el || !el.nextSibling) return false;
    performance.mark('loadtrace:static-parsed', { detail: el.querySelectorAll('[data-id]').length });
    requestAnimationFrame(() => setTimeout(() => performance.mark('loadtrace:static-painted')));
    return true;
  };
  // The whole document only until <body> exists, then only the body's children.
  const onBody = new MutationObserver(() => { if (seen()) onBody.disconnect(); });
  const onDoc = new MutationObserver(() => {
    if (!document.body) return;
    onDoc.disconnect();
    if (!seen()) onBody.observe(document.body, { childList: true });
  });
  onDoc.observe(document, { childList: true, subtree: true });
  // And when the first frame after the app's live mark has been produced (the app painted).
  const mark = performance.mark.bind(performance);
  performance.mark = (name, options) => {
    if (name === 'loadtrace:record-live') requestAnimationFrame(() => setTimeout(() => mark('loadtrace:live-painted')));
    return mark(name, options);
  };
})();`;

/** One open of a record in a fresh profile; the first run of each only warms the disk cache. */
async function openOnce(r: Rec, keep: boolean): Promise<void> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  await context.route('**/*', (q) => (q.request().url() === `file://${r.file}` ? q.continue() : (requests++, q.abort())));
  await context.addInitScript(MARK_STATIC);
  const page = await context.newPage();
  await page.goto(`file://${r.file}`);
  await page.waitForFunction(() => performance.getEntriesByName('loadtrace:live-painted').length > 0, null, { timeout: 60_000 });
  // A record that checks its file: wait for the check too (an older one has none).
  if (await page.$('#lt-seal')) await page.waitForFunction(() => performance.getEntriesByName('loadtrace:record-checked').length > 0, null, { timeout: 60_000 });
  const ms = await page.evaluate(() => performance.getEntriesByName('loadtrace:record-live')[0].startTime);
  const [painted, fcp, staticCells] = await page.evaluate(() => [
    performance.getEntriesByName('loadtrace:static-painted')[0]?.startTime ?? NaN,
    performance.getEntriesByName('first-contentful-paint')[0]?.startTime ?? NaN,
    (performance.getEntriesByName('loadtrace:static-parsed')[0] as PerformanceMark | undefined)?.detail as number,
  ]);
  if (staticCells !== doc.cells.length) throw new Error(`the static rendering held ${staticCells} of ${doc.cells.length} cells when marked`);
  const marks = await page.evaluate((names) => names.map((n) => performance.getEntriesByName(`loadtrace:${n}`)[0]?.startTime ?? NaN), PHASES);
  const cells = await page.$$eval('#cells article', (els) => els.length);
  if (cells !== doc.cells.length) throw new Error(`only ${cells} of ${doc.cells.length} cells placed`);
  const pending = await page.evaluate(() => {
    const app = (window as any).loadtrace;
    return app.doc.cells.filter((c: { id: string }) => app.engine.state(c.id)?.status === 'pending').length;
  });
  if (pending) throw new Error(`${pending} cells still pending`);
  if (keep) {
    r.times.push(ms);
    r.rendered.push(painted);
    r.firstPaint.push(fcp);
    PHASES.forEach((p, k) => r.phases.get(p)!.push(marks[k]));
  }
  await context.close();
}

try {
  for (let i = 0; i < RUNS + 1; i++) for (const r of records) await openOnce(r, i > 0);
} finally {
  await browser.close();
  rmSync(dir, { recursive: true, force: true });
}

const spread = (xs: number[]) => `median ${median(xs).toFixed(0)} ms (min ${Math.min(...xs).toFixed(0)}, max ${Math.max(...xs).toFixed(0)}, ${xs.length} runs)`;
const fmt = (x: number) => (Number.isFinite(x) ? x.toFixed(0) : '—');
console.log(`record of ${TEMPLATE.replace(`${ROOT}/`, '')}: ${doc.cells.length} cells`);
for (const r of records) {
  const who = r.label ? `[${r.label}] ` : '';
  console.log(`${who}size: ${(r.bytes / 1e6).toFixed(3)} MB (${r.bytes} bytes; app shell ${(Buffer.byteLength(shell) / 1e6).toFixed(3)} MB)   target ≤ 1.5 MB`);
  console.log(`${who}open → every cell rendered (static rendering: all ${doc.cells.length} cells in the page, the screen painted): ${spread(r.rendered)}   target ≤ 400 ms`);
  console.log(`${who}  first paint of the page: median ${median(r.firstPaint).toFixed(0)} ms`);
  console.log(`${who}open → live app (all cells recomputed, on-screen ones typeset, editable): ${spread(r.times)}   target ≤ 400 ms (if read as the live app)`);
  console.log(`${who}  the live app first painted: median ${median(r.phases.get('live-painted')!).toFixed(0)} ms; the whole file checked against its seal: ${fmt(median(r.phases.get('record-checked')!))} ms`);
  console.log(`${who}  phases (median ms from navigation start): ${PHASES.map((p) => `${p} ${fmt(median(r.phases.get(p)!))}`).join(', ')}`);
}
if (records.length > 1) {
  const [a, b] = records;
  console.log(`this checkout / base: size ${(a.bytes / b.bytes).toFixed(3)}, every cell rendered ${(median(a.rendered) / median(b.rendered)).toFixed(2)}, live ${(median(a.times) / median(b.times)).toFixed(2)}`);
  console.log(`  live app painted, this checkout / base: ${(median(a.phases.get('live-painted')!) / median(b.phases.get('live-painted')!)).toFixed(2)}`);
}
console.log(`requests blocked: ${requests}; machine load (1 min): ${loadavg()[0].toFixed(1)} on ${(await import('node:os')).cpus().length} cores`);
