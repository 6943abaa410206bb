// The static rendering's MathML is KaTeX's, made shorter (runtime/record/tex.ts `slim`):
// in Chromium every equation of every template must set at the same size as KaTeX's
// own MathML (its letter runs joined, the one step meant to change the setting), so the
// shortening costs the printed record nothing.

import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import katex from 'katex';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { createEngine } from '../../runtime/engine';
import { parse } from '../../runtime/format/index';
import { staticHtml } from '../../runtime/record/index';
import { joinUprightRuns } from '../../runtime/record/tex';
import { launch, ROOT, type Browser } from './harness';

/** Every TeX the static rendering sets, as it asked for it. */
const asked = vi.hoisted(() => [] as { tex: string; display: boolean; html: string }[]);
vi.mock('../../runtime/record/tex', async (original) => {
  const mod = await original<typeof import('../../runtime/record/tex')>();
  return {
    ...mod,
    texHtml: (tex: string, display: boolean) => {
      const html = mod.texHtml(tex, display);
      asked.push({ tex, display, html });
      return html;
    },
  };
});

/**
 * KaTeX's MathML less its wrapper span and TeX annotation (neither is set by the
 * browser), with its upright letter runs joined: the one step of `slim` meant to change
 * the setting (a word kerned as a word). Every other step must not.
 */
function katexMathml(tex: string, display: boolean): string {
  const html = katex.renderToString(tex, { displayMode: display, strict: 'ignore', trust: false, output: 'mathml', maxExpand: 200, maxSize: 20, throwOnError: false });
  const math = /<math[\s\S]*<\/math>/.exec(html)![0];
  return joinUprightRuns(math.replace(/<annotation encoding="application\/x-tex">[\s\S]*?<\/annotation>/, ''));
}

let browser: Browser;
/** In CSS px: layout rounds to 1/64 px. */
const TOLERANCE = 0.02;

beforeAll(async () => {
  const dir = join(ROOT, 'docs-templates');
  for (const name of readdirSync(dir).filter((n) => n.endsWith('.lt'))) {
    const { doc, errors } = parse(readFileSync(join(dir, name), 'utf8'));
    expect(errors).toEqual([]);
    const engine = createEngine(doc);
    await engine.settled();
    staticHtml(doc, (id) => engine.state(id));
    engine.dispose();
  }
  browser = await launch();
}, 120_000);

afterAll(async () => {
  await browser?.close();
});

describe('the static rendering\'s MathML in Chromium', () => {
  it('sets every template equation at the size KaTeX\'s own MathML does, with fewer elements', async () => {
    const eqs = asked.filter((a) => a.html.startsWith('<math'));
    expect(eqs.length).toBeGreaterThan(500);
    const pairs = eqs.map((a) => [katexMathml(a.tex, a.display), a.html]);
    const count = (html: string) => html.match(/<m[a-z]+\b/g)!.length;
    const before = pairs.reduce((n, [k]) => n + count(k), 0);
    const after = pairs.reduce((n, [, s]) => n + count(s), 0);
    expect(before - after).toBeGreaterThan(pairs.length); // more than one element fewer an equation

    const page = await browser.context.newPage();
    // The static rendering's font and size for equations (static-css.ts: .lt-eq math); each
    // equation inline, so its box is as wide as what it sets (display style is kept).
    await page.setContent(`<!doctype html><meta charset="utf-8"><style>body{font:15px "DejaVu Serif",serif} math{font-size:1.12em;display:inline math}</style><body>${
      pairs.map(([k, s]) => `<div><span class="a">${k}</span></div><div><span class="b">${s}</span></div>`).join('')}</body>`);
    const sizes = await page.evaluate(() => {
      const box = (cls: string) => [...document.querySelectorAll(`.${cls} > math`)].map((m) => {
        const r = m.getBoundingClientRect();
        return [r.width, r.height];
      });
      return { a: box('a'), b: box('b') };
    });
    await page.close();
    expect(sizes.a).toHaveLength(pairs.length);
    expect(sizes.b).toHaveLength(pairs.length);
    const differ = pairs.flatMap((p, i) => {
      const [wa, ha] = sizes.a[i];
      const [wb, hb] = sizes.b[i];
      return Math.abs(wa - wb) > TOLERANCE || Math.abs(ha - hb) > TOLERANCE ? [{ tex: eqs[i].tex, katex: [wa, ha], slim: [wb, hb] }] : [];
    });
    expect(differ).toEqual([]);
  }, 120_000);
});
