// KaTeX for the static record: no trust (no links or HTML from TeX), strict off for
// text people type, HTML plus MathML so a formula still reads where the fonts or the
// stylesheet are missing. Overlong TeX is shown as text: a record must never hang.

import katex from 'katex';
import { escapeHtml } from './escape';

/** Beyond this many characters, TeX is shown as its source rather than typeset. */
export const TEX_LIMIT = 4000;

export function texHtml(tex: string, display: boolean): string {
  if (tex.length > TEX_LIMIT) return `<code class="lt-tex-raw">${escapeHtml(tex.slice(0, TEX_LIMIT))}…</code>`;
  const base = { displayMode: display, strict: 'ignore' as const, trust: false, output: 'htmlAndMathml' as const, maxExpand: 200, maxSize: 20 };
  try {
    return katex.renderToString(tex, { ...base, throwOnError: true });
  } catch {
    try {
      return katex.renderToString(tex, { ...base, throwOnError: false, errorColor: 'inherit' });
    } catch {
      return `<code class="lt-tex-raw">${escapeHtml(tex)}</code>`;
    }
  }
}
