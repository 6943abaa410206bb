// Figures and sweeps in real Chromium: the figures demo opens with every drawing, the
// punching perimeter as drawn measures bo, the footing is to scale, an input edit
// re-draws the figure, and screenshots of each go to test-artifacts/ to be looked at.

import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { artifactsDir, type Browser, type Served } from './harness';
import { openApp, type AppSession } from './app-session';

const IN = 0.0254, FT = 0.3048;

let app: AppSession;
let server: Served;
let browser: Browser;
let page: Page;
let pageErrors: string[];

beforeAll(async () => {
  app = await openApp();
  ({ server, browser, page, pageErrors } = app);
  await page.setViewportSize({ width: 1280, height: 1000 });
  await page.goto(`${server.url}#sheet=figures-demo`);
  await page.waitForSelector('body[data-ready="true"]', { timeout: 30_000 });
}, 180_000);

afterAll(async () => {
  await app?.close();
});

/** Drawn length of a role's path in model metres: the browser's own path length over the drawing scale. */
async function drawnLength(cellId: string, role: string): Promise<number> {
  return page.locator(`#cell-${cellId} svg`).evaluate((svg, r) => {
    const p = svg.querySelector(`[data-role="${r}"]`) as SVGPathElement;
    return p.getTotalLength() / Number(svg.getAttribute('data-scale'));
  }, role);
}

// Cells are typeset as they come near the view: bring the cell there and wait for its text.
async function cellText(id: string): Promise<string> {
  const cell = page.locator(`#cell-${id}`);
  await cell.scrollIntoViewIfNeeded();
  await page.waitForFunction((sel) => (document.querySelector(sel) as HTMLElement | null)?.innerText.trim() !== '', `#cell-${id}`, { timeout: 10_000 });
  return (await cell.innerText()).replace(/\s+/g, ' ');
}

describe('figures in the browser', () => {
  it('draws every figure and sweep of the figures demo', async () => {
    for (const id of ['g1', 'g2', 'g3', 'g4', 'g5', 'w1', 'w2']) {
      // Cells are typeset as they come near the view (those far below the first screen wait).
      await page.locator(`#cell-${id}`).scrollIntoViewIfNeeded();
      await page.waitForSelector(`#cell-${id} svg`, { timeout: 30_000 });
      expect(await page.locator(`#cell-${id} svg`).count()).toBe(1);
      const box = await page.locator(`#cell-${id} svg`).boundingBox();
      expect(box!.width).toBeGreaterThan(300);
      await page.locator(`#cell-${id}`).screenshot({ path: join(artifactsDir(), `figures-${id}.png`) });
    }
    expect(await page.locator('#cell-w2 svg [data-role="series"]').count()).toBeGreaterThan(0);
    expect(pageErrors).toEqual([]);
  });

  it('the drawn critical perimeter measures bo, as the bo cell shows it', async () => {
    // bo cell f2 shows 75.5 in: edge column 2(c1 + d/2) + (c2 + d) = 2(23.875) + 27.75 (ACI 318-19 §22.6.4.1)
    expect(await cellText('f2')).toContain('75.5');
    expect((await drawnLength('g1', 'critical-perimeter')) / IN).toBeCloseTo(75.5, 1);
    // The drop panel's outer section: bo = 4(84 + 7.75) = 367 in (f5)
    expect(await cellText('f5')).toContain('367');
    expect((await drawnLength('g2', 'outer-perimeter')) / IN).toBeCloseTo(367, 0);
  });

  it('the footing is drawn to scale', async () => {
    const size = await page.locator('#cell-g3 svg').evaluate((svg) => {
      const k = Number(svg.getAttribute('data-scale'));
      const box = (r: string) => (svg.querySelector(`[data-role="${r}"]`) as SVGGraphicsElement).getBBox();
      return { plan: box('footing-plan').width / k, B: box('footing-plan').height / k, h: box('footing-section').height / k, col: box('column-plan').width / k };
    });
    expect(size.plan / FT).toBeCloseTo(9.5, 2); // B_f = 9.5 ft
    expect(size.B / FT).toBeCloseTo(9.5, 2);
    expect(size.h / IN).toBeCloseTo(24, 1); // h_f = 24 in
    expect(size.col / IN).toBeCloseTo(20, 1); // c1 = 20 in
  });

  it('an input edit re-draws the figure and moves the sweep’s current value', async () => {
    const before = await page.locator('#cell-g1 svg [data-role="critical-perimeter"]').getAttribute('d');
    const field = page.locator('#cell-i3 input.value-field');
    await field.fill('10 in');
    await field.press('Enter');
    await field.press('Escape');
    await page.waitForFunction((d) => document.querySelector('#cell-g1 svg [data-role="critical-perimeter"]')?.getAttribute('d') !== d, before, { timeout: 10_000 });
    // h = 10 in: d = 8.75 in, bo = 2(20 + 4.375) + 28.75 = 77.5 in (ACI 318-19 §22.6.4.1)
    await page.waitForFunction(() => /77\.5/.test(document.querySelector('#cell-f2')?.textContent ?? ''), undefined, { timeout: 10_000 });
    expect((await drawnLength('g1', 'critical-perimeter')) / IN).toBeCloseTo(77.5, 1);
    await page.waitForFunction(() => /now: 10 in/.test(document.querySelector('#cell-w1 svg')?.textContent ?? ''), undefined, { timeout: 10_000 });
    await page.locator('#cell-g1').screenshot({ path: join(artifactsDir(), 'figures-g1-after-edit.png') });
    await page.locator('#cell-w1').screenshot({ path: join(artifactsDir(), 'figures-w1-after-edit.png') });
    expect(pageErrors).toEqual([]);
  });
});
