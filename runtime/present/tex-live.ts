// KaTeX with the settings every document text gets (no trust: no links or HTML
// from TeX), and a small cache: the same equation is typeset once. Output is HTML
// only (half the size of HTML + MathML, so re-typesetting is cheaper); screen
// readers get a plain-text reading on the hand-calc line instead.

import katex from 'katex';
import { escapeHtml } from './escape';

const cache = new Map<string, string>();
const LIMIT = 4000;

/** HTML for a TeX string; a TeX error shows as escaped source, never as a broken page. */
export function texHtml(tex: string, display = false): string {
  const key = (display ? 'D' : 'I') + tex;
  const hit = cache.get(key);
  if (hit !== undefined) return hit;
  let html: string;
  try {
    html = katex.renderToString(tex, { displayMode: display, throwOnError: true, strict: 'ignore', trust: false, output: 'html' });
  } catch {
    try {
      html = katex.renderToString(tex, { displayMode: display, throwOnError: false, strict: 'ignore', trust: false, errorColor: 'inherit', output: 'html' });
    } catch {
      // KaTeX itself could not run (a record whose typesetting block is damaged): the TeX as text.
      html = `<code class="tex-raw">${escapeHtml(tex)}</code>`;
    }
  }
  if (cache.size >= LIMIT) cache.delete(cache.keys().next().value as string);
  cache.set(key, html);
  return html;
}

/**
 * A hand-calc line (`symbol = step = step ...`) as two pieces of inline math: the head
 * (symbol and the symbolic step, the same on every update, so typeset once and cached)
 * and the tail (values and result, typeset afresh). Inline math wraps after = signs,
 * operators and the commas of long calls, so a long line never runs off the sheet.
 */
export function handCalcHtml(symbol: string, steps: { rel: string; tex: string }[], reading: string): string {
  const open = `<div class="hc" role="img" aria-label="${escapeHtml(reading)}">`;
  if (steps.length === 0) return `${open}<span class="hc-step" aria-hidden="true">${texHtml(`\\displaystyle ${symbol}`)}</span></div>`;
  const [first, ...rest] = steps;
  const head = symbol ? `${symbol} ${first.rel || '\\;'} ${first.tex}` : `${first.rel} ${first.tex}`;
  const tail = rest.map((s) => `${s.rel}\\allowbreak\\; ${s.tex}`).join(' ');
  return `${open}<span class="hc-step" aria-hidden="true">${texHtml(`\\displaystyle ${head}`)}</span>${
    tail ? `<span class="hc-step" aria-hidden="true">${texHtml(`\\displaystyle ${tail}`)}</span>` : ''}</div>`;
}
