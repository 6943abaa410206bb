// npm run bench:ui — in headless Chromium, the median time from an input edit (typed
// value + Enter) to the last of its 10 dependent cells re-typeset on the page, on the
// demo record and on a generated 2,000-cell record with the same 10 dependents.
// Prints medians, 90th percentiles and the ratio.

import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import type { CalcDocument, Cell } from '../runtime/document';
import { parse } from '../runtime/format/index';
import { buildApp, launch, ROOT, serve } from '../tests/e2e/harness';

const EDITS = 30;
const WARMUP = 5;
const SIZE = 2000;

/** Ten cells that read the edited input `e_bench`: eight formulas and two checks, with units. */
function benchBlock(): Cell[] {
  const cells: Cell[] = [
    { kind: 'section', id: 'bench-s', title: 'Benchmark block' },
    { kind: 'input', id: 'bench-e', name: 'e_bench', value: '2 in', label: 'Edited input' },
  ];
  for (let i = 0; i < 8; i++) {
    cells.push({
      kind: 'formula', id: `bench-t${i}`, name: `t_${i}`, unit: i % 2 ? 'in^2' : 'in',
      expr: i % 2 ? `e_bench * ${i + 1} in + 0.5 in^2` : `${i + 1} * e_bench + sqrt(e_bench * 4 in) / 3`,
      label: `Dependent ${i + 1}`,
    });
  }
  cells.push({ kind: 'check', id: 'bench-k1', expr: 'e_bench <= 2.5 in', label: 'Dependent 9' });
  cells.push({ kind: 'check', id: 'bench-k2', expr: '3 * e_bench >= 5 in', label: 'Dependent 10' });
  return cells;
}

/** Unrelated input/formula pairs in sections, up to `size` cells in all. */
function withFiller(doc: CalcDocument, size: number): CalcDocument {
  const cells = doc.cells.slice();
  for (let k = 0; cells.length < size; k++) {
    if (k % 24 === 0) cells.push({ kind: 'section', id: `fill-s${k}`, title: `Filler group ${k / 24 + 1}` });
    else if (k % 2) cells.push({ kind: 'input', id: `fill-x${k}`, name: `x_${k}`, value: `${(k % 17) + 1} ft`, label: 'Filler input' });
    else cells.push({ kind: 'formula', id: `fill-y${k}`, name: `y_${k}`, expr: `2 * x_${k - 1} + 3 in`, unit: 'in', label: 'Filler result' });
  }
  return { ...doc, cells: cells.slice(0, size) };
}

function stats(xs: number[]): { median: number; p90: number } {
  const s = [...xs].sort((a, b) => a - b);
  const at = (q: number) => s[Math.min(s.length - 1, Math.floor(q * (s.length - 1) + 0.5))];
  return { median: at(0.5), p90: at(0.9) };
}

/** One edit in the page: type a value into the input, press Enter, time until all 10 dependents re-render. */
interface EditTiming {
  /** Edit (Enter) to the last dependent re-typeset. */
  ms: number;
  /** The edit's own handler: history, engine update, view sync. */
  sync: number;
  /** After the handler, in the same task: the engine's compute and the re-typeset. */
  work: number;
  /** From the edit to the start of the next frame (whose paint shows the result). */
  frame: number;
  /** The last dependent was re-typeset before that frame started. */
  inFirstFrame: boolean;
  /** From the edit to the end of that frame's rendering (style, layout, paint): when it shows. */
  rendered: number;
  seen: number;
}

async function editOnce(page: Page, value: string): Promise<EditTiming> {
  return page.evaluate(async (v) => {
    const ids = [...Array(8).keys()].map((i) => `bench-t${i}`).concat(['bench-k1', 'bench-k2']);
    const field = document.querySelector<HTMLInputElement>('#cell-bench-e input.value-field')!;
    const seen = new Set<string>();
    let last = 0;
    const done = new Promise<void>((resolve) => {
      const obs = new MutationObserver((records) => {
        const now = performance.now();
        for (const r of records) {
          const id = (r.target as HTMLElement).closest?.('article.cell')?.id.replace(/^cell-/, '');
          if (id && ids.includes(id)) seen.add(id);
        }
        last = now;
        if (seen.size === ids.length) {
          obs.disconnect();
          resolve();
        }
      });
      for (const id of ids) obs.observe(document.querySelector(`#cell-${id} .cell-content`)!, { childList: true, subtree: true });
      setTimeout(() => (obs.disconnect(), resolve()), 3000);
    });
    field.focus();
    field.value = v;
    let frameAt = 0;
    let renderedAt = 0;
    requestAnimationFrame(() => {
      frameAt = performance.now();
      // a message posted in the frame's callback arrives once the frame is rendered
      const ch = new MessageChannel();
      ch.port1.onmessage = () => {
        renderedAt = performance.now();
        ch.port1.close();
      };
      ch.port2.postMessage(null);
    });
    const t0 = performance.now();
    field.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true, cancelable: true }));
    const sync = performance.now() - t0;
    await done;
    await new Promise((r) => requestAnimationFrame(() => setTimeout(r, 60)));
    return { ms: last - t0, sync, work: last - t0 - sync, frame: frameAt - t0, inFirstFrame: last <= frameAt, rendered: renderedAt - t0, seen: seen.size };
  }, value);
}

interface OpenTiming {
  /** Open call to the engine settled (placeholders on the page). */
  firstView: number;
  /** Open call to every cell near the viewport typeset (the rest is typeset when scrolled near). */
  allRendered: number;
  /** The longest main-thread task while opening (a frozen page would show here). */
  longestTask: number;
}

async function open(page: Page, key: string, doc: CalcDocument): Promise<OpenTiming> {
  await page.evaluate(() => {
    (window as any).__long = 0;
    new PerformanceObserver((list) => {
      for (const e of list.getEntries()) (window as any).__long = Math.max((window as any).__long, e.duration);
    }).observe({ type: 'longtask' });
  });
  return page.evaluate(async ([k, d]) => {
    const t0 = performance.now();
    await (window as any).loadtraceOpen(k, d);
    const app = (window as any).loadtrace;
    await app.engine.settled();
    const firstView = performance.now() - t0;
    await app.view.whenRendered();
    const allRendered = performance.now() - t0;
    await new Promise((r) => setTimeout(r, 100));
    return { firstView, allRendered, longestTask: (window as any).__long as number };
  }, [key, doc] as const);
}

async function measure(page: Page, key: string, doc: CalcDocument): Promise<{ edits: EditTiming[]; opened: OpenTiming }> {
  const opened = await open(page, key, doc);
  const times: EditTiming[] = [];
  for (let i = 0; i < WARMUP + EDITS; i++) {
    const t = await editOnce(page, i % 2 ? '2 in' : '3 in');
    if (t.seen !== 10) throw new Error(`only ${t.seen} of 10 dependents re-rendered on edit ${i}`);
    if (i >= WARMUP) times.push(t);
  }
  return { edits: times, opened };
}

/** Builds another checkout's app (BENCH_BASE) with that checkout's own vite. */
function buildBase(dir: string): string {
  const outDir = mkdtempSync(join(tmpdir(), 'loadtrace-dist-base-'));
  const r = spawnSync(join(dir, 'node_modules/.bin/vite'), ['build', '--outDir', outDir, '--emptyOutDir', '--logLevel', 'warn'], { cwd: dir, encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`vite build of ${dir} failed:\n${r.stdout}\n${r.stderr}`);
  return outDir;
}

/**
 * BENCH_BASE=DIR (another checkout with node_modules) measures its app too, each record
 * alternating between the two builds in one browser, and prints both side by side with the
 * ratio: before and after a change, in one run under the same load.
 */
async function main(): Promise<void> {
  const demo = parse(readFileSync(join(ROOT, 'docs-templates/demo.lt'), 'utf8')).doc;
  const small: CalcDocument = { ...demo, cells: [...benchBlock(), ...demo.cells] };
  const big = withFiller(small, SIZE);
  const builds = [{ label: process.env.BENCH_BASE ? 'this checkout' : '', dir: buildApp() }];
  if (process.env.BENCH_BASE) builds.push({ label: 'base', dir: buildBase(process.env.BENCH_BASE) });
  const servers = await Promise.all(builds.map((b) => serve(b.dir)));
  const browser = await launch();
  // Printed only after the browser and server are closed, so a closed pipe cannot leave them running.
  const out: string[] = [];
  try {
    const page = browser.context.pages()[0] ?? (await browser.context.newPage());
    const fmt = (x: number) => x.toFixed(1).padStart(6);
    const opens: string[] = [];
    const medians: number[][] = builds.map(() => []);
    out.push(`edit → last of 10 dependents re-typeset (${EDITS} edits each, headless Chromium)`);
    for (const [name, doc] of [['demo record', small], ['generated record', big]] as const) {
      for (let i = 0; i < builds.length; i++) {
        await page.goto(servers[i].url);
        await page.waitForSelector('body[data-ready="true"]', { timeout: 30_000 });
        const { edits: t, opened: o } = await measure(page, `bench-${name.split(' ')[0]}-${i}`, doc);
        const all = stats(t.map((x) => x.ms));
        const part = (f: (x: EditTiming) => number) => fmt(stats(t.map(f)).median);
        const first = t.filter((x) => x.inFirstFrame).length;
        const label = `${`${name} (${doc.cells.length} cells)`.padEnd(31)}${builds[i].label ? ` ${builds[i].label.padEnd(13)}` : ''}`;
        out.push(`  ${label} median ${fmt(all.median)} ms   p90 ${fmt(all.p90)} ms   (medians: handler ${part((x) => x.sync)}, then compute + re-typeset ${part((x) => x.work)}; edit to next frame start ${part((x) => x.frame)}, to that frame rendered ${part((x) => x.rendered)}; done before that frame in ${first} of ${t.length} edits)`);
        opens.push(`  ${label} engine settled ${fmt(o.firstView)} ms, cells in and near view typeset ${fmt(o.allRendered)} ms, longest task ${fmt(o.longestTask)} ms`);
        medians[i].push(all.median);
      }
    }
    out.push(`  ratio 2,000-cell / demo (medians): ${medians.map((m) => (m[1] / m[0]).toFixed(2)).join(' / ')}`);
    if (builds.length > 1) {
      out.push(`  this checkout / base (medians): demo ${(medians[0][0] / medians[1][0]).toFixed(2)}, generated ${(medians[0][1] / medians[1][1]).toFixed(2)}`);
    }
    out.push('opening the record (one run each)', ...opens);
  } finally {
    await browser.close();
    servers.forEach((s) => s.stop());
    for (const b of builds) rmSync(b.dir, { recursive: true, force: true });
  }
  process.stdout.write(`${out.join('\n')}\n`);
}

await main();
