// The toolbar in Chromium: whatever the status line says (nothing, "Saving…",
// "Computing…", a long warning), the toolbar keeps its height and the sheet under it
// stays put; a long message is cut with an ellipsis on screen but kept whole in the
// live region and the title; every button stays on screen and clickable, at a
// 1280 px and a 900 px wide window. Screenshots: test-artifacts/e2e-toolbar-*.png.

import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { COMPUTING_TEXT } from '../../cells/computing';
import { artifactsDir, type Browser, type Served } from './harness';
import { openApp, type AppSession } from './app-session';

// The warning main.ts shows when IndexedDB is missing, and a longer one of our own.
const LONG = 'This browser cannot save (IndexedDB unavailable): changes last until the page closes.';
const LONGER = `${LONG} ${LONG}`;
const STATUSES = ['Saving…', COMPUTING_TEXT, 'Saved', 'Display units: SI', LONG, LONGER];

let app: AppSession;
let server: Served;
let browser: Browser;
let page: Page;
let pageErrors: string[];

interface Layout {
  toolbarHeight: number;
  /** The first cell's top, in page coordinates. */
  cellTop: number;
  text: string;
  title: string;
  /** The status text is wider than its box (cut short on screen). */
  cut: boolean;
}

/** Writes the status through the app and reads the layout after the next frames. */
async function layoutWith(status: string): Promise<Layout> {
  return page.evaluate(async (text) => {
    (window as any).loadtrace.setStatus(text);
    await new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r)));
    const el = document.querySelector<HTMLElement>('#status')!;
    return {
      toolbarHeight: document.querySelector('.toolbar')!.getBoundingClientRect().height,
      cellTop: document.querySelector('#cells article.cell')!.getBoundingClientRect().top + window.scrollY,
      text: el.textContent ?? '',
      title: el.title,
      cut: el.scrollWidth > el.clientWidth,
    };
  }, status);
}

/** Toolbar buttons that are not fully on screen or not the topmost element at their centre. */
async function unusableButtons(): Promise<string[]> {
  return page.evaluate(() => {
    const bad: string[] = [];
    for (const b of document.querySelectorAll<HTMLButtonElement>('.toolbar button')) {
      const r = b.getBoundingClientRect();
      const hit = document.elementFromPoint(r.left + r.width / 2, r.top + r.height / 2);
      const onScreen = r.width > 0 && r.left >= 0 && r.right <= window.innerWidth && r.top >= 0;
      if (!onScreen || hit?.closest('button') !== b) bad.push(b.textContent ?? '?');
    }
    return bad;
  });
}

beforeAll(async () => {
  app = await openApp();
  ({ server, browser, page, pageErrors } = app);
  await page.goto(server.url);
  await page.waitForSelector('body[data-ready="true"]', { timeout: 30_000 });
}, 120_000);

afterAll(async () => {
  await app?.close();
});

describe('the toolbar in Chromium', () => {
  for (const width of [1280, 900]) {
    it(`keeps its height and the sheet in place whatever the status says, ${width} px wide`, async () => {
      await page.setViewportSize({ width, height: 900 });
      await page.evaluate(() => window.scrollTo(0, 0));
      const empty = await layoutWith('');
      await page.screenshot({ path: join(artifactsDir(), `e2e-toolbar-${width}-empty.png`), clip: { x: 0, y: 0, width, height: 140 } });
      for (const status of STATUSES) {
        const now = await layoutWith(status);
        expect({ status, height: now.toolbarHeight, top: now.cellTop }).toEqual({ status, height: empty.toolbarHeight, top: empty.cellTop });
        // nothing is lost: the live region holds the whole text, and so does the title
        expect(now.text).toBe(status);
        expect(now.title).toBe(status);
      }
      const long = await layoutWith(LONGER);
      expect(long.cut).toBe(true);
      expect(await page.locator('#status').evaluate((el) => getComputedStyle(el).textOverflow)).toBe('ellipsis');
      await page.screenshot({ path: join(artifactsDir(), `e2e-toolbar-${width}-long.png`), clip: { x: 0, y: 0, width, height: 140 } });
      expect(await unusableButtons()).toEqual([]);
      // a button at the end of the toolbar still works with a long message showing
      await page.locator('.toolbar [data-cmd="help"]').click();
      expect(await page.locator('#help').evaluate((d) => (d as HTMLDialogElement).open)).toBe(true);
      await page.keyboard.press('Escape');
      await page.waitForFunction(() => !(document.querySelector('#help') as HTMLDialogElement).open);
      await layoutWith('');
    });
  }

  for (const width of [1280, 900]) {
    it(`the banner sits under the toolbar when the sheet is scrolled, ${width} px wide`, async () => {
      await page.setViewportSize({ width, height: 900 });
      const gap = await page.evaluate(async () => {
        const banner = document.querySelector<HTMLElement>('#banner')!;
        banner.hidden = false;
        banner.textContent = 'A message at the top of the sheet';
        window.scrollTo(0, 1500);
        await new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r)));
        const g = banner.getBoundingClientRect().top - document.querySelector('.toolbar')!.getBoundingClientRect().bottom;
        banner.hidden = true;
        banner.textContent = '';
        window.scrollTo(0, 0);
        return g;
      });
      // Stuck right under the toolbar (its bottom edge, to the pixel), not over its second row.
      expect(Math.abs(gap)).toBeLessThan(1);
    });
  }

  it('raised no page errors', () => {
    expect(pageErrors).toEqual([]);
  });
});
