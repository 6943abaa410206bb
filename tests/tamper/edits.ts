// Random single-byte edits of a record, spread over every part of the file, and what
// the CLI and the live app make of each (npm run test:tamper, and a sample in CI:
// tests/e2e/tamper.test.ts). An edit "changes what a reader sees or what runs" when the
// page a browser builds from the file differs: the whole parsed tree (parse5, the
// WHATWG algorithm) written out canonically differs from the original's. An edit that
// leaves the tree as it was (a tag name's case, a blank inside a tag) changes nothing
// a browser shows or runs.

import type { Browser } from 'playwright-core';
import { parse, type DefaultTreeAdapterMap } from 'parse5';
import { writeNodes } from '../../runtime/record/canon';
import { parse5Reader } from '../../runtime/record/parse5-reader';
import { readParts, PART_NAMES, DIGEST_ID, SEAL_ID, type PartName } from '../../runtime/record/seal-parts';
import { verifyParts } from '../../runtime/record/verify';

export type Region = PartName | 'seal';
export const REGIONS: readonly Region[] = [...PART_NAMES, 'seal'];

type Node = DefaultTreeAdapterMap['node'];
type El = DefaultTreeAdapterMap['element'];

/** Byte ranges [start, end) of each region of the file (the page: whatever no other region holds). */
export function regions(html: string): Map<Region, [number, number][]> {
  const tree = parse(html, { sourceCodeLocationInfo: true });
  const found = new Map<Region, [number, number][]>(REGIONS.map((r) => [r, []]));
  const ids: Record<string, Region> = {
    'lt-doc': 'document', [SEAL_ID]: 'seal', 'lt-static-style': 'static-style', 'lt-static': 'static', 'lt-app-css': 'app-css',
    'lt-loader': 'loader', 'lt-app': 'app', 'lt-editor': 'editor', 'lt-katex': 'katex', [DIGEST_ID]: 'seal',
  };
  const walk = (n: Node) => {
    if ('tagName' in n) {
      const el = n as El;
      const attr = (k: string) => el.attrs.find((a) => a.name === k)?.value;
      const region = el.tagName === 'meta' && attr('http-equiv') === 'Content-Security-Policy'
        ? 'csp' : ids[attr('id') ?? ''] ?? ids[attr('data-part-of') ?? ''];
      const loc = el.sourceCodeLocation;
      if (region && loc) {
        // The digest shown in the static page is the seal's: its element's text is the seal region.
        const range: [number, number] = region === 'seal' && el.tagName === 'code' && loc.startTag && loc.endTag
          ? [loc.startTag.endOffset, loc.endTag.startOffset] : [loc.startOffset, loc.endOffset];
        found.get(region)!.push(range);
      }
    }
    const kids = 'content' in n && n.nodeName === 'template' ? (n as DefaultTreeAdapterMap['template']).content.childNodes : 'childNodes' in n ? n.childNodes : [];
    for (const c of kids) walk(c);
  };
  walk(tree);
  // The static rendering holds the digest's text: that piece is the seal's.
  const digest = found.get('seal')!.find(([a]) => found.get('static')!.some(([s, e]) => a > s && a < e));
  if (digest) found.set('static', found.get('static')!.flatMap(([s, e]) => (digest[0] > s && digest[1] < e ? [[s, digest[0]], [digest[1], e]] : [[s, e]])) as [number, number][]);
  const taken = [...found.values()].flat().sort((a, b) => a[0] - b[0]);
  let at = 0;
  for (const [s, e] of taken) {
    if (s > at) found.get('page')!.push([at, s]);
    at = Math.max(at, e);
  }
  if (at < html.length) found.get('page')!.push([at, html.length]);
  // Character offsets to byte offsets (the static page holds non-ASCII text).
  const bytes = (i: number) => Buffer.byteLength(html.slice(0, i));
  for (const [r, list] of found) found.set(r, list.map(([s, e]) => [bytes(s), bytes(e)]));
  return found;
}

/** A small deterministic generator (mulberry32, common practice), so a run can be repeated by its seed. */
export function random(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export interface Edit {
  region: Region;
  at: number;
  from: number;
  to: number;
}

/** `perRegion` edits in each region: a byte at a random place set to another random byte. */
export function makeEdits(file: Buffer, ranges: Map<Region, [number, number][]>, perRegion: number, seed: number): Edit[] {
  const rnd = random(seed);
  const out: Edit[] = [];
  for (const region of REGIONS) {
    const list = ranges.get(region)!;
    const total = list.reduce((n, [s, e]) => n + (e - s), 0);
    if (total === 0) throw new Error(`the record has no ${region}`);
    for (let i = 0; i < perRegion; i++) {
      let k = Math.floor(rnd() * total);
      const [s] = list.find(([a, b]) => (k < b - a ? true : ((k -= b - a), false)))!;
      const at = s + k;
      // Mostly printable ASCII (what a person types), sometimes any byte.
      let to = rnd() < 0.85 ? 0x20 + Math.floor(rnd() * 95) : Math.floor(rnd() * 256);
      if (to === file[at]) to = (to + 1) % 256;
      out.push({ region, at, from: file[at], to });
    }
  }
  return out;
}

export function applyEdit(file: Buffer, e: Edit): Buffer {
  const out = Buffer.from(file);
  out[e.at] = e.to;
  return out;
}

/** The whole parsed tree, written out canonically (canon.ts) with no part taken apart. */
export function treeText(html: string): string {
  const out: string[] = [];
  writeNodes(parse5Reader, parse(html).childNodes, out);
  return out.join('');
}

/** What the CLI's check says of the file, and whether the edit changed the page at all. */
export async function cliSays(edited: string, original: string): Promise<{ changed: boolean; reported: boolean; firstProblem?: string }> {
  const tree = parse(edited);
  const out: string[] = [];
  writeNodes(parse5Reader, tree.childNodes, out);
  const check = await verifyParts(readParts(parse5Reader, tree));
  return { changed: out.join('') !== original, reported: !check.verified, firstProblem: check.problems[0] };
}

export type AppVerdict = 'reported' | 'no-app-message' | 'verified' | 'silent';

/**
 * Opens the file in Chromium and reads what a person would: the app's verdict once it
 * has checked the file, or, when the app cannot start, whether the static page's
 * "the app did not start" message shows. Also whether anything claims "verified".
 */
export async function appSays(browser: Browser, url: string): Promise<{ verdict: AppVerdict; claimsVerified: boolean }> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  await context.route('**/*', (r) => (r.request().url() === url ? r.continue() : r.abort()));
  await context.addInitScript('document.addEventListener("securitypolicyviolation", () => { window.__blocked = (window.__blocked || 0) + 1; });');
  const page = await context.newPage();
  try {
    await page.goto(url, { waitUntil: 'domcontentloaded', timeout: 30_000 }).catch(() => undefined);
    // Checked, or the app cannot start (a script refused, the loader failed), or 8 s.
    await page.waitForFunction(`performance.getEntriesByName('loadtrace:record-checked').length > 0
      || ((window.__blocked || document.querySelector('.lt-load-failed')) && !document.documentElement.classList.contains('lt-app-running'))`,
    null, { timeout: 8_000 }).catch(() => undefined);
    // A refused app block shows itself only once the loader ran: give it a moment to start anyway.
    if (!(await page.evaluate('performance.getEntriesByName("loadtrace:record-checked").length > 0'))) await page.waitForTimeout(400);
    const state = await page.evaluate(`(() => {
      const checked = performance.getEntriesByName('loadtrace:record-checked').length > 0;
      const text = [...document.querySelectorAll('#status, #lt-record-line, #lt-static, body > p')].map((el) => el.innerText).join('\\n');
      const claims = /\\bverified\\b/i.test(text.replace(/not verified|unverified|NOT VERIFIED/gi, ''));
      const noApp = document.getElementById('lt-noapp');
      const noAppShown = !!noApp && getComputedStyle(noApp).display !== 'none' && noApp.offsetParent !== null;
      const status = document.querySelector('#status')?.textContent ?? '';
      return { checked, claims, noAppShown, status, running: document.documentElement.classList.contains('lt-app-running') };
    })()`) as { checked: boolean; claims: boolean; noAppShown: boolean; status: string; running: boolean };
    let verdict: AppVerdict;
    if (state.checked) verdict = /NOT verified/.test(state.status) ? 'reported' : 'verified';
    else verdict = state.noAppShown ? 'no-app-message' : 'silent';
    return { verdict, claimsVerified: state.claims };
  } finally {
    await context.close();
  }
}
