// KaTeX for the static record, as MathML only: the browser sets it natively, with no
// fonts or stylesheet (so it reads with JavaScript off and prints), and it is a third of
// the size of KaTeX's HTML. No trust (no links or HTML from TeX), strict off for text
// people type. Overlong TeX is shown as text: a record must never hang.

import katex from 'katex';
import { escapeHtml } from './escape';

/** Beyond this many characters, TeX is shown as its source rather than typeset. */
export const TEX_LIMIT = 4000;

export function texHtml(tex: string, display: boolean): string {
  if (tex.length > TEX_LIMIT) return `<code class="lt-tex-raw">${escapeHtml(tex.slice(0, TEX_LIMIT))}…</code>`;
  const base = { displayMode: display, strict: 'ignore' as const, trust: false, output: 'mathml' as const, maxExpand: 200, maxSize: 20 };
  try {
    return slim(katex.renderToString(tex, { ...base, throwOnError: true }));
  } catch {
    try {
      return slim(katex.renderToString(tex, { ...base, throwOnError: false, errorColor: 'inherit' }));
    } catch {
      return `<code class="lt-tex-raw">${escapeHtml(tex)}</code>`;
    }
  }
}

/**
 * Shorter MathML with the same rendering: runs of upright letters as one <mi> (a
 * multi-letter <mi> is upright by default), no wrapper span, no namespace attribute
 * (the HTML parser knows <math>), no TeX annotation (the record keeps the source).
 */
function slim(html: string): string {
  return html
    .replace(/^<span class="katex(?:-display)?">(?:<span class="katex">)?/, '')
    .replace(/(?:<\/span>)+$/, '')
    .replace(' xmlns="http://www.w3.org/1998/Math/MathML"', '')
    .replace(/<semantics>([\s\S]*)<annotation encoding="application\/x-tex">[\s\S]*?<\/annotation><\/semantics>/, '$1')
    .replace(/<mrow>((?:<mi mathvariant="normal">[^<]<\/mi>){2,})<\/mrow>/g, (_all, run: string) =>
      `<mi>${run.replace(/<mi mathvariant="normal">([^<])<\/mi>/g, '$1')}</mi>`);
}
