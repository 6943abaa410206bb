// `npm run bench:record`: the exported main template as a calc record — its size, and
// the median time from opening it (file://, headless Chromium, fresh profile each run)
// to the live app showing it: every cell placed and computed, and the cells on screen
// typeset (the app typesets the others as they come near the viewport). Also printed:
// when the record's static rendering (every cell, readable without the app) is parsed
// and first painted. Targets (issue 5): ≤ 1.5 MB, ≤ 400 ms.

import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import { recordShellFile, ROOT } from '../runtime/cli/record-shell';
import { parse } from '../runtime/format/index';
import { exportComputed } from '../runtime/record/index';

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
const file = join(dir, 'main-template.html');
writeFileSync(file, record.html);
const bytes = Buffer.byteLength(record.html);

const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ARGS });
const times: number[] = [];
const staticParsed: number[] = [];
const staticPainted: number[] = [];
const PHASES = ['loader', 'unpacked', 'app-started', 'record-open', 'record-shown', 'record-computed', 'record-live'];
const phases = new Map<string, number[]>(PHASES.map((p) => [p, []]));
let requests = 0;
try {
  for (let i = 0; i < RUNS + 1; i++) {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    await context.route('**/*', (r) => (r.request().url() === `file://${file}` ? r.continue() : (requests++, r.abort())));
    const page = await context.newPage();
    await page.goto(`file://${file}`);
    await page.waitForFunction(() => performance.getEntriesByName('loadtrace:record-live').length > 0, null, { timeout: 60_000 });
    const ms = await page.evaluate(() => performance.getEntriesByName('loadtrace:record-live')[0].startTime);
    const [parsed, painted] = await page.evaluate(() => [
      (performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming).domInteractive,
      performance.getEntriesByName('first-contentful-paint')[0]?.startTime ?? NaN,
    ]);
    const marks = await page.evaluate((names) => names.map((n) => performance.getEntriesByName(`loadtrace:${n}`)[0]?.startTime ?? NaN), PHASES);
    const cells = await page.$$eval('#cells article', (els) => els.length);
    if (cells !== doc.cells.length) throw new Error(`only ${cells} of ${doc.cells.length} cells placed`);
    const pending = await page.evaluate(() => {
      const app = (window as any).loadtrace;
      return app.doc.cells.filter((c: { id: string }) => app.engine.state(c.id)?.status === 'pending').length;
    });
    if (pending) throw new Error(`${pending} cells still pending`);
    if (i > 0) { // the first run warms the disk cache
      times.push(ms);
      staticParsed.push(parsed);
      staticPainted.push(painted);
      PHASES.forEach((p, k) => phases.get(p)!.push(marks[k]));
    }
    await context.close();
  }
} finally {
  await browser.close();
  rmSync(dir, { recursive: true, force: true });
}

console.log(`record of ${TEMPLATE.replace(`${ROOT}/`, '')}: ${doc.cells.length} cells`);
console.log(`size: ${(bytes / 1e6).toFixed(3)} MB (${bytes} bytes; app shell ${(Buffer.byteLength(shell) / 1e6).toFixed(3)} MB)   target ≤ 1.5 MB`);
console.log(`open → live (all cells computed, on-screen ones typeset): median ${median(times).toFixed(0)} ms (min ${Math.min(...times).toFixed(0)}, max ${Math.max(...times).toFixed(0)}, ${times.length} runs)   target ≤ 400 ms`);
console.log(`static rendering (every cell, no app needed): parsed ${median(staticParsed).toFixed(0)} ms, first painted ${median(staticPainted).toFixed(0)} ms (medians from navigation start)`);
console.log(`  phases (median ms from navigation start): ${PHASES.map((p) => `${p} ${median(phases.get(p)!).toFixed(0)}`).join(', ')}`);
console.log(`requests blocked: ${requests}; machine load (1 min): ${loadavg()[0].toFixed(1)} on ${(await import('node:os')).cpus().length} cores`);
