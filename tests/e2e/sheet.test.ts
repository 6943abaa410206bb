// End to end in real Chromium: the demo record opens, edits recompute, undo and
// reload restore, bad values are reported in place, notes run nothing, completion
// offers cell names, two tabs do not overwrite each other. Screenshots go to
// test-artifacts/ (git-ignored) for a person to look at.

import { readFileSync } from 'node:fs';
import { savedView } from './saved-view';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse } from '../../runtime/format/index';
import { artifactsDir, launch, type Browser, type Served } from './harness';
import { openApp, type AppSession } from './app-session';

// A small sheet of our own, so the scenarios do not depend on the demo record's numbers.
const fixture = parse(readFileSync(join(import.meta.dirname, 'fixtures/strip.lt'), 'utf8'));

let app: AppSession;
let server: Served;
let browser: Browser;
let page: Page;
let pageErrors: string[];

async function shot(name: string, p: Page = page): Promise<void> {
  await p.screenshot({ path: join(artifactsDir(), `e2e-${name}.png`) });
}

async function ready(p: Page): Promise<void> {
  await p.waitForSelector('body[data-ready="true"]', { timeout: 30_000 });
}

/** The visible text of a cell. */
async function cellText(id: string, p: Page = page): Promise<string> {
  return (await p.locator(`#cell-${id}`).innerText()).replace(/\s+/g, ' ');
}

async function waitStatus(id: string, status: string, p: Page = page): Promise<void> {
  await p.waitForSelector(`#cell-${id}.st-${status}`, { timeout: 10_000 });
}

async function setValue(id: string, value: string, p: Page = page): Promise<void> {
  const field = p.locator(`#cell-${id} input.value-field`);
  await field.fill(value);
  await field.press('Enter');
  await field.press('Escape'); // leave the field, so sheet shortcuts apply
}

beforeAll(async () => {
  app = await openApp();
  ({ server, browser, page, pageErrors } = app);
}, 120_000);

afterAll(async () => {
  await app?.close();
});

describe('the calc sheet in Chromium', () => {
  it('opens the demo record with title block, summary, hand calcs and the caution', async () => {
    await page.goto(server.url);
    await ready(page);
    expect(page.url()).toMatch(/#sheet=demo$/);
    expect(await page.inputValue('input[data-meta="project"]')).not.toBe('');
    const checks = await page.evaluate(() => (window as any).loadtrace.doc.cells.filter((c: any) => c.kind === 'check').length);
    expect(checks).toBeGreaterThan(0);
    expect(await page.locator('.sum-row').count()).toBe(checks);
    expect(await page.locator('#cells article.cell').count()).toBe(await page.evaluate(() => (window as any).loadtrace.doc.cells.length));
    // Every formula and check typeset so far reads as a hand calc. The title block and the check
    // summary (a row per check) may fill the first screen, so go to the first formula first.
    await page.locator('#cells article.kind-formula').first().scrollIntoViewIfNeeded();
    const typeset = page.locator('#cells article.kind-formula:not(.unrendered), #cells article.kind-check:not(.unrendered)');
    await page.waitForFunction(() => document.querySelector('#cells article.kind-formula:not(.unrendered)') !== null, null, { timeout: 10_000 });
    expect(await typeset.count()).toBeGreaterThan(0);
    await page.waitForFunction(() => document.querySelectorAll('#cells article.kind-formula:not(.unrendered):not(:has(.katex)), #cells article.kind-check:not(.unrendered):not(:has(.katex))').length === 0, null, { timeout: 10_000 });
    await page.evaluate(() => window.scrollTo(0, 0));
    // cells far below the viewport wait as source text until they come near (or the sheet is printed)
    expect(await page.locator('#cells article.unrendered').count()).toBeGreaterThan(0);
    const caution = page.locator('.caution-bar');
    expect(await caution.isVisible()).toBe(true);
    expect(await caution.innerText()).toContain("not a substitute for, a licensed engineer's judgement; local codes govern");
    await shot('01-open-demo');
    const last = page.locator('#cells article.cell').last();
    await last.scrollIntoViewIfNeeded();
    await page.waitForFunction(() => !document.querySelector('#cells article.cell:last-child')?.classList.contains('unrendered'));
    await page.evaluate(() => window.scrollTo(0, 0));
    await page.pdf({ format: 'Letter' });
    expect(await page.locator('#cells article.unrendered').count()).toBe(0);
  });

  it('opens a sheet of its own through the page', async () => {
    expect(fixture.errors).toEqual([]);
    await page.evaluate((doc) => (window as any).loadtraceOpen('e2e-strip', doc), fixture.doc);
    await waitStatus('k1', 'ok');
    // d = h − cover − db = 9 − 0.75 − 0.625 = 7.625 in (the fixture's own formula)
    expect(await cellText('f1')).toContain('7.625in');
    // 1.2 × 132.5 psf + 1.6 × 50 psf = 239 psf (ASCE 7-22 §2.3.1, combination 2)
    expect(await cellText('f3')).toContain('239psf');
    expect(await cellText('k1')).toContain('✓ OK');
    await shot('02-fixture');
  });

  it('an edited input recomputes a dependent result and flips a check from OK to NOT OK', async () => {
    await setValue('i1', '180 mm');
    await waitStatus('k1', 'fail');
    // 180 mm = 7.087 in (1 in = 25.4 mm exactly, NIST SP 811 App. B); the display unit in is kept
    expect(await cellText('i1')).toContain('= 7.087 in');
    // d = 7.087 − 0.75 − 0.625 = 5.712 in
    expect(await cellText('f1')).toContain('5.712in');
    expect(await cellText('k1')).toContain('✗ NOT OK');
    expect(await page.locator('.sum-row.st-fail').count()).toBe(1);
    await shot('03-edited-check-fails');
  });

  it('undo restores the value and the check; redo brings the edit back', async () => {
    await page.keyboard.press('Control+z');
    await waitStatus('k1', 'ok');
    expect(await page.inputValue('#cell-i1 input.value-field')).toBe('9 in');
    expect(await cellText('f1')).toContain('7.625in');
    await shot('04-undone');
    await page.keyboard.press('Control+Shift+z');
    await waitStatus('k1', 'fail');
    expect(await page.inputValue('#cell-i1 input.value-field')).toBe('180 mm');
  });

  it('a reload keeps the edit and the undo history', async () => {
    await page.waitForFunction(() => document.querySelector('#status')?.textContent === 'Saved');
    await page.reload();
    await ready(page);
    expect(page.url()).toMatch(/#sheet=e2e-strip$/);
    expect(await page.inputValue('#cell-i1 input.value-field')).toBe('180 mm');
    await waitStatus('k1', 'fail');
    await shot('05-reloaded');
    await page.locator('#cell-k1 .cell-no').click();
    await page.keyboard.press('Control+z');
    await waitStatus('k1', 'ok');
    expect(await page.inputValue('#cell-i1 input.value-field')).toBe('9 in');
  });

  it('a bad value shows its message in place while the rest keeps computing', async () => {
    await setValue('i1', '9 inches of rain');
    await page.waitForSelector('#cell-i1 .cell-error');
    expect(await page.locator('#cell-i1 .cell-error').innerText()).toMatch(/"of" is not a unit \(type a number with a unit/);
    // the last good value (9 in) keeps the dependents computing
    expect(await cellText('f1')).toContain('7.625in');
    expect(await page.locator('#cell-f1 .cell-error').count()).toBe(0);
    await waitStatus('k1', 'ok');
    await shot('06-bad-value');
    await setValue('i1', `0'-9"`); // feet-inch notation is read too
    await page.waitForSelector('#cell-i1 .cell-error', { state: 'detached' });
    expect(await cellText('i1')).toContain('= 9 in');
  });

  it('a note with HTML and a javascript: link runs nothing', async () => {
    await page.locator('#cell-n1 .cell-no').click();
    await page.keyboard.press('Enter');
    await page.locator('#cell-n1 .cm-content').waitFor();
    await page.waitForFunction(() => document.activeElement?.closest('.cm-editor') !== null);
    await page.keyboard.press('Control+a');
    await page.keyboard.insertText(
      'Hostile <img src=x onerror="window.__pwned=1"> and <script>window.__pwned=2</script>\n'
      + '[click me](javascript:window.__pwned=3) and [ok](https://example.org) with $\\href{javascript:window.__pwned=4}{x}$',
    );
    await page.keyboard.press('Control+Enter');
    await page.waitForFunction(() => document.querySelector('#cell-n1 .note-text')?.textContent?.includes('Hostile'));
    const note = page.locator('#cell-n1 .note-text');
    expect(await note.locator('img, script, iframe, [onerror]').count()).toBe(0);
    expect(await note.locator('a[href^="javascript"]').count()).toBe(0);
    expect(await note.locator('a[href="https://example.org"]').count()).toBe(1);
    await note.getByText('[click me](javascript:window.__pwned=3)').click();
    await page.locator('#cell-n1 .note-math').click();
    await page.waitForTimeout(200);
    expect(await page.evaluate(() => (window as unknown as { __pwned?: number }).__pwned)).toBeUndefined();
    expect(pageErrors).toEqual([]);
    await shot('07-hostile-note');
  });

  it('completion in a formula offers a cell name with its value', async () => {
    await page.locator('#cell-f1 .cell-no').click();
    await page.keyboard.press('Enter');
    await page.waitForFunction(() => document.activeElement?.closest('#cell-f1 .cm-editor') !== null);
    await page.keyboard.press('End');
    await page.keyboard.type(' + 0 * cov');
    const option = page.locator('.cm-tooltip-autocomplete li', { hasText: 'cover' });
    await option.first().waitFor({ timeout: 5000 });
    expect(await option.first().innerText()).toContain('= 0.75 in');
    await shot('08-completion');
    await page.keyboard.press('Enter'); // takes the completion
    await page.waitForFunction(() => document.querySelector('#cell-f1 .cm-content')?.textContent?.endsWith('0 * cover'));
    await page.keyboard.press('Enter'); // finishes the formula
    await page.waitForFunction(() => document.querySelector('#cell-f1 .cell-math')?.textContent?.includes('+0⋅cover'));
    expect(await cellText('f1')).toContain('7.625in');
  });

  it('marks a formula error at its column in the editor', async () => {
    await page.locator('#cell-f1 .cell-no').click();
    await page.keyboard.press('Enter');
    await page.waitForFunction(() => document.activeElement?.closest('#cell-f1 .cm-editor') !== null);
    await page.keyboard.press('End');
    await page.keyboard.type(' + nosuchname');
    await page.locator('#cell-f1 .cm-lt-error').waitFor({ timeout: 5000 });
    expect(await page.locator('#cell-f1 .cm-lt-error').innerText()).toBe('n');
    expect(await page.locator('#cell-f1 .cell-error').innerText()).toMatch(/nosuchname/);
    await shot('09-error-at-column');
    await page.keyboard.press('Escape');
    await page.keyboard.press('Control+z');
    await page.waitForSelector('#cell-f1.st-ok');
  });

  it('switches display units to SI and back', async () => {
    await page.locator('#btn-units').click();
    await page.waitForFunction(() => document.querySelector('#cell-f1 .hc')?.textContent?.includes('mm'));
    // 7.625 in × 25.4 = 193.7 mm (1 in = 25.4 mm exactly, NIST SP 811 App. B)
    expect(await cellText('f1')).toContain('193.7mm');
    // checks follow: d >= 7 in shows 7 in = 177.8 mm (NIST SP 811 App. B), w_u <= 300 psf in kPa
    const dc = (id: string) => page.locator(`#cell-${id} .verdict .dc`).innerText();
    await page.waitForFunction(() => document.querySelector('#cell-k1 .verdict .dc')?.textContent?.includes('mm'));
    expect(await dc('k1')).toMatch(/^demand 177\.8 mm · capacity 193\.7 mm$/);
    expect(await dc('k2')).toMatch(/^demand [\d.]+ kPa · capacity 14\.36 kPa$/); // 300 psf × 0.04788026 kPa/psf (NIST SP 811 App. B)
    await shot('10-si-units');
    await page.locator('#btn-units').click();
    await page.waitForFunction(() => !document.querySelector('#cell-f1 .hc')?.textContent?.includes('mm'));
    await page.waitForFunction(() => document.querySelector('#cell-k1 .verdict .dc')?.textContent?.includes(' in'));
    expect(await dc('k1')).toMatch(/^demand 7 in · capacity 7\.625 in$/);
    expect(await dc('k2')).toMatch(/^demand [\d.]+ psf · capacity 300 psf$/);
  });

  it('a second tab on the same sheet warns instead of overwriting', async () => {
    const second = await browser.context.newPage();
    await second.goto(page.url());
    await ready(second);
    await setValue('i5', '60 psf');
    await second.waitForSelector('#banner:not([hidden])', { timeout: 5000 });
    expect(await second.locator('#banner').innerText()).toMatch(/changed in another tab/);
    await shot('11-second-tab-warns', second);
    await second.getByText("Load the other tab's version").click();
    await second.waitForFunction(() => (document.querySelector('#cell-i5 input') as HTMLInputElement)?.value === '60 psf');
    await second.close();
  });

  it('adds, duplicates, moves and deletes cells from the keyboard, each undoable', async () => {
    const ids = () => page.evaluate(() => (window as any).loadtrace.doc.cells.map((c: any) => c.id) as string[]);
    const start = await ids();
    await page.locator('#cell-f2 .cell-no').click();
    await page.keyboard.press('d');
    const dup = await ids();
    expect(dup.length).toBe(start.length + 1);
    const copy = dup[dup.indexOf('f2') + 1];
    expect(await page.evaluate((id) => (window as any).loadtrace.doc.cells.find((c: any) => c.id === id).name, copy)).toBe('D_2');
    await page.keyboard.press('Alt+ArrowUp');
    expect((await ids()).indexOf(copy)).toBe((await ids()).indexOf('f2') - 1);
    await page.keyboard.press('Delete');
    expect(await ids()).toEqual(start);
    await shot('12-keyboard-edits');
    await page.keyboard.press('Control+z');
    expect((await ids()).length).toBe(start.length + 1);
    await page.keyboard.press('Control+z');
    await page.keyboard.press('Control+z');
    expect(await ids()).toEqual(start);
    await page.keyboard.press('f'); // a new formula below, with its editor open
    await page.waitForFunction(() => document.activeElement?.closest('.cell-editor') !== null);
    expect((await ids()).length).toBe(start.length + 1);
    await page.keyboard.press('Escape');
    await page.keyboard.press('Control+z');
    expect(await ids()).toEqual(start);
  });

  it('lists the shortcuts in a help panel', async () => {
    await page.locator('#cell-k1 .cell-no').click();
    await page.keyboard.press('?');
    const help = page.locator('#help');
    await help.waitFor({ state: 'visible' });
    expect(await help.innerText()).toContain('Duplicate the selected cell');
    await shot('13-help');
    await page.keyboard.press('Escape');
    await help.waitFor({ state: 'hidden' });
  });

  it('restores the scroll position on reopening', async () => {
    const y = await page.evaluate(() => {
      window.scrollTo(0, Math.min(300, document.documentElement.scrollHeight - window.innerHeight - 20));
      return window.scrollY;
    });
    expect(y).toBeGreaterThan(100);
    // The view is saved 200 ms after scrolling stops; wait until it is in the browser's store
    // (on a busy machine the write can take longer than any fixed pause).
    const saved = await savedView(page, y);
    expect(saved).toBeCloseTo(y, -1);
    await page.reload();
    await ready(page);
    await page.waitForFunction((want) => Math.abs(window.scrollY - want) < 5, y, { timeout: 5000 });
  });

  it('starts a new sheet from a template', async () => {
    const fixtureUrl = page.url();
    await page.locator('#cell-k1 .cell-no').click();
    await page.keyboard.press('n');
    const picker = page.locator('#picker');
    await picker.waitFor({ state: 'visible' });
    const choices = picker.locator('[data-template]');
    expect(await choices.count()).toBeGreaterThan(1);
    await shot('14-template-picker');
    const name = await choices.nth(1).getAttribute('data-template');
    await choices.nth(1).click();
    await page.waitForFunction((n) => location.hash.startsWith(`#sheet=${n}-`), name);
    expect(await page.locator('#cells article.cell').count()).toBeGreaterThan(3);
    await page.goto(fixtureUrl);
    await page.waitForFunction(() => location.hash === '#sheet=e2e-strip' && document.querySelector('#cell-k1') !== null);
  });

  it('prints with the title block and the caution', async () => {
    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('.toolbar').isVisible()).toBe(false);
    expect(await page.locator('thead .title-block').isVisible()).toBe(true);
    expect(await page.locator('tfoot .print-caution').isVisible()).toBe(true);
    // the repeated title block prints text, not form fields (which would repeat empty)
    expect(await page.locator('thead [data-print="project"]').innerText()).toBe('Ferncliff Depot (browser-test fixture)');
    expect(await page.locator('thead input[data-meta="project"]').isVisible()).toBe(false);
    await page.evaluate(() => window.scrollTo(0, 0));
    await shot('15-print');
    const pdf = await page.pdf({ format: 'Letter' });
    expect(pdf.subarray(0, 4).toString()).toBe('%PDF');
    await page.emulateMedia({ media: 'screen' });
  });

  it('an edit re-typesets the values in a dependent hand calc, keeping its unchanged symbolic step', async () => {
    await page.evaluate(() => {
      const [head, tail] = document.querySelectorAll('#cell-f1 .hc-step');
      (window as any).__steps = { head, tail };
    });
    const before = await cellText('f1');
    await setValue('i1', '10 in');
    await page.waitForFunction((t) => document.querySelector('#cell-f1')!.textContent!.replace(/\s+/g, ' ') !== t, before.replace(/\s+/g, ' '));
    // d = 10 − 0.75 − 0.625 = 8.625 in (the fixture's own formula)
    expect(await cellText('f1')).toContain('8.625in');
    const kept = await page.evaluate(() => {
      const [head, tail] = document.querySelectorAll('#cell-f1 .hc-step');
      const was = (window as any).__steps;
      return { head: head === was.head, tail: tail === was.tail, attached: was.head.isConnected };
    });
    expect(kept).toEqual({ head: true, tail: false, attached: true });
  });

  it('Enter finishes a formula typed quickly, before any completion has shown', async () => {
    // Typing starts a completion query that is answered a moment later; an Enter pressed in
    // that moment (a fast typist, or a busy machine) must finish the formula, not vanish.
    await page.locator('#cell-f1 .cell-no').click();
    await page.keyboard.press('Enter');
    await page.waitForFunction(() => document.activeElement?.closest('#cell-f1 .cm-editor') !== null);
    await page.keyboard.press('End');
    await page.keyboard.type(' + 0');
    await page.keyboard.press('Enter');
    await page.locator('#cell-f1 .cm-editor').waitFor({ state: 'detached', timeout: 5000 });
    expect(await page.evaluate(() => (window as any).loadtrace.doc.cells.find((c: { id: string }) => c.id === 'f1').expr as string)).toMatch(/\+ 0$/);
  });
});

describe('the source editor, loaded on first use', () => {
  it('what is typed before CodeMirror has loaded carries over into it, caret and all', async () => {
    const fresh = await launch(); // its own profile: a first visit, nothing cached
    try {
      // Hold the editor's code back, as a slow disk would, until the text is typed.
      let release!: () => void;
      const held = new Promise<void>((r) => (release = r));
      let asked = 0;
      await fresh.context.route(/\/assets\/source-editor-[^/]*\.js$/, async (route) => {
        asked++;
        await held;
        await route.continue();
      });
      const p = fresh.context.pages()[0] ?? (await fresh.context.newPage());
      await p.goto(server.url);
      await ready(p);
      const id = await p.evaluate(() => (window as any).loadtrace.doc.cells.find((c: { kind: string }) => c.kind === 'formula').id as string);
      // The first formula may sit below the first screen's rendered cells: bring it into view first.
      await p.locator(`#cell-${id}`).scrollIntoViewIfNeeded();
      await p.locator(`#cell-${id} .cell-no`).click();
      await p.keyboard.press('Enter');
      const plain = p.locator(`#cell-${id} textarea.src-plain`);
      await plain.waitFor();
      expect(await p.evaluate(() => document.activeElement?.classList.contains('src-plain'))).toBe(true);
      const before = await plain.inputValue();
      await p.keyboard.press('End');
      await p.keyboard.type(' * 1');
      await shot('16-editor-loading', p);
      expect(asked).toBeGreaterThan(0);
      expect(await p.locator(`#cell-${id} .cm-editor`).count()).toBe(0);
      release();
      await p.waitForFunction((i) => document.activeElement?.closest(`#cell-${i} .cm-editor`) !== null, id);
      expect(await p.locator(`#cell-${id} .cm-content`).textContent()).toBe(`${before} * 1`);
      await p.keyboard.type('0'); // the caret is where it was: at the end
      await p.waitForFunction((i) => document.querySelector(`#cell-${i} .cm-content`)?.textContent?.endsWith(' * 10'), id);
      await shot('17-editor-loaded', p);
      await p.keyboard.press('Enter'); // finishes the formula
      await p.locator(`#cell-${id} .cm-editor`).waitFor({ state: 'detached' });
      expect(await p.evaluate((i) => (window as any).loadtrace.doc.cells.find((c: { id: string }) => c.id === i).expr as string, id)).toMatch(/\* 10$/);
    } finally {
      await fresh.close();
    }
  });
});
