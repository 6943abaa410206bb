// The computing state in Chromium: a recompute that genuinely takes long (a generated
// sheet of two-way panels, each a Kirchhoff plate solve) shows "Computing…" once it has
// run past 100 ms and paints it while the work goes on; an ordinary edit never shows it.
// Screenshot: test-artifacts/e2e-computing-*.png.

import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { COMPUTING_AFTER_MS, COMPUTING_TEXT } from '../../cells/computing';
import type { CalcDocument, Cell } from '../../runtime/document';
import { emptyMeta } from '../../runtime/document';
import { artifactsDir, type Browser, type Served } from './harness';
import { openApp, type AppSession } from './app-session';

const PANELS = 96;

/**
 * A floor of two-way panels sharing one short span la, with long spans from 20.5 ft up;
 * each panel's midspan moment coefficient is a plate solve (a new la gives new aspect
 * ratios, so the solver's cache cannot answer). Plus one cheap, unrelated input.
 */
function panelSheet(): CalcDocument {
  const cells: Cell[] = [
    { kind: 'section', id: 's1', title: 'Two-way panels of one floor' },
    { kind: 'input', id: 'la', name: 'la', value: '20 ft', unit: 'ft', label: 'Short span of every panel' },
    { kind: 'input', id: 'wu', name: 'wu', value: '250 psf', unit: 'psf', label: 'Factored load' },
    { kind: 'formula', id: 'wl', name: 'w_line', expr: 'wu * 10 ft', unit: 'klf', label: 'Load on a 10 ft strip' },
  ];
  for (let i = 0; i < PANELS; i++) {
    cells.push({
      kind: 'formula', id: `p${i}`, name: `bx_${i}`, expr: `plate_coef(la, ${20.5 + i / 2} ft, "CCSS", "mx")`,
      label: `Panel ${i + 1}: moment coefficient at midspan`,
    });
  }
  return { meta: { ...emptyMeta(), project: 'Computing-state probe', subject: 'Generated panel schedule' }, cells };
}

let app: AppSession;
let server: Served;
let browser: Browser;
let page: Page;
let pageErrors: string[];

interface Trace {
  /** ms after the edit: when the sheet was marked computing and when unmarked (-1: never). */
  on: number;
  off: number;
  /** Status texts seen after the edit, in order. */
  said: string[];
  /** Animation frames that ran while the state showed (it was painted). */
  framesWhileOn: number;
  settledAt: number;
}

/** Starts watching the status line and the sheet's class, then types `value` into the input `id` and presses Enter. */
async function editAndTrace(id: string, value: string): Promise<void> {
  await page.evaluate(([cellId, v]) => {
    const w = window as any;
    const sheet = document.querySelector('#cells')!;
    const status = document.querySelector('#status')!;
    const field = document.querySelector<HTMLInputElement>(`#cell-${cellId} input.value-field`)!;
    const trace = { on: -1, off: -1, said: [] as string[], framesWhileOn: 0, settledAt: -1 };
    w.__trace = trace;
    let t0 = 0;
    const mo = new MutationObserver(() => {
      const t = performance.now() - t0;
      const on = sheet.classList.contains('computing');
      if (on && trace.on < 0) trace.on = t;
      if (!on && trace.on >= 0 && trace.off < 0) trace.off = t;
      const text = status.textContent ?? '';
      if (trace.said[trace.said.length - 1] !== text) trace.said.push(text);
    });
    mo.observe(sheet, { attributes: true, attributeFilter: ['class'] });
    mo.observe(status, { childList: true, characterData: true, subtree: true });
    let frames = true;
    requestAnimationFrame(function frame() {
      if (sheet.classList.contains('computing')) trace.framesWhileOn++;
      if (frames) requestAnimationFrame(frame);
    });
    field.focus();
    field.value = v;
    t0 = performance.now();
    field.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true, cancelable: true }));
    void w.loadtrace.engine.settled().then(() => {
      trace.settledAt = performance.now() - t0;
      // let the page finish the frame after settling, then stop watching
      setTimeout(() => {
        frames = false;
        mo.disconnect();
        w.__traceDone = true;
      }, 400);
    });
    w.__traceDone = false;
  }, [id, value] as const);
}

async function traced(): Promise<Trace> {
  await page.waitForFunction(() => (window as any).__traceDone === true, undefined, { timeout: 30_000 });
  return page.evaluate(() => (window as any).__trace as Trace);
}

beforeAll(async () => {
  app = await openApp();
  ({ server, browser, page, pageErrors } = app);
  await page.goto(server.url);
  await page.waitForSelector('body[data-ready="true"]', { timeout: 30_000 });
  await page.evaluate(async (doc) => {
    const w = window as any;
    await w.loadtraceOpen('e2e-panels', doc);
    await w.loadtrace.engine.settled();
    await w.loadtrace.view.whenRendered();
  }, panelSheet());
}, 180_000);

afterAll(async () => {
  await app?.close();
});

describe('the computing state in Chromium', () => {
  it('a slow recompute shows "Computing…" (never before 100 ms), painted while it works, then clears', async () => {
    const before = await page.locator('#cell-p0 .cell-content').innerText();
    await editAndTrace('la', '19.37 ft');
    await page.waitForSelector('#cells.computing', { timeout: 10_000 });
    await page.screenshot({ path: join(artifactsDir(), 'e2e-computing-01-slow-recompute.png'), caret: 'initial' });
    const t = await traced();
    expect(t.settledAt).toBeGreaterThan(COMPUTING_AFTER_MS); // the recompute was genuinely slow
    expect(t.on).toBeGreaterThanOrEqual(COMPUTING_AFTER_MS);
    expect(t.on).toBeLessThan(t.settledAt);
    expect(t.framesWhileOn).toBeGreaterThan(0);
    expect(t.said).toContain(COMPUTING_TEXT);
    expect(t.off).toBeGreaterThanOrEqual(t.settledAt);
    expect(await page.locator('#cells.computing').count()).toBe(0);
    expect(await page.textContent('#status')).not.toBe(COMPUTING_TEXT);
    // the panels were recomputed: a shorter la changes every aspect ratio
    expect(await page.locator('#cell-p0 .cell-content').innerText()).not.toBe(before);
    await page.screenshot({ path: join(artifactsDir(), 'e2e-computing-02-done.png') });
  });

  it('an ordinary edit never shows it', async () => {
    const before = await page.locator('#cell-wl .cell-content').innerText();
    await editAndTrace('wu', '300 psf');
    const t = await traced();
    expect(t.on).toBe(-1);
    expect(t.said).not.toContain(COMPUTING_TEXT);
    // 300 psf × 10 ft = 3000 lbf/ft = 3 klf (arithmetic)
    expect(await page.locator('#cell-wl .cell-content').innerText()).not.toBe(before);
    expect(await page.locator('#cell-wl .cell-content').innerText()).toContain('3klf');
    await page.screenshot({ path: join(artifactsDir(), 'e2e-computing-03-fast-edit.png') });
  });

  it('no page errors', () => {
    expect(pageErrors).toEqual([]);
  });
});
