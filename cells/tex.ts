// KaTeX with the settings every document text gets (no trust: no links or HTML
// from TeX), and a small cache: the same equation is typeset once.

import katex from 'katex';

const cache = new Map<string, string>();
const LIMIT = 4000;

/** HTML for a TeX string; a TeX error shows as escaped source, never as a broken page. */
export function texHtml(tex: string, display = false): string {
  const key = (display ? 'D' : 'I') + tex;
  const hit = cache.get(key);
  if (hit !== undefined) return hit;
  let html: string;
  try {
    html = katex.renderToString(tex, { displayMode: display, throwOnError: true, strict: 'ignore', trust: false, output: 'htmlAndMathml' });
  } catch {
    html = katex.renderToString(tex, { displayMode: display, throwOnError: false, strict: 'ignore', trust: false, errorColor: 'inherit' });
  }
  if (cache.size >= LIMIT) cache.delete(cache.keys().next().value as string);
  cache.set(key, html);
  return html;
}

/**
 * A hand-calc line as a row of steps (`symbol = step = step ...`). Each step is its own
 * piece of inline math, so a long line wraps between steps, and inside a step after
 * an operator or a comma of a long call, instead of running off the sheet.
 */
export function handCalcHtml(symbol: string, steps: { rel: string; tex: string }[]): string {
  const head = symbol ? `<span class="hc-sym">${texHtml(`\\displaystyle ${symbol}`)}</span>` : '';
  const body = steps
    .map((s) => `<span class="hc-step">${s.rel ? `<span class="hc-rel">${texHtml(s.rel)}</span>` : ''}${texHtml(`\\displaystyle ${s.tex}`)}</span>`)
    .join('');
  return `<div class="hc">${head}${body}</div>`;
}
