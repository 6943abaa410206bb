// KaTeX for the static record, as MathML only: the browser sets it natively, with no
// fonts or stylesheet (so it reads with JavaScript off and prints), and it is a third of
// the size of KaTeX's HTML. No trust (no links or HTML from TeX), strict off for text
// people type. Overlong TeX is shown as text: a record must never hang.

import katex from 'katex';
import { escapeHtml } from './escape';

/** Beyond this many characters, TeX is shown as its source rather than typeset. */
export const TEX_LIMIT = 4000;
/** Formulas longer than this are not typeset as a hand calc (the engine refuses them too). */
export const HANDCALC_LIMIT = 2000;

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
 * Shorter MathML: fewer elements is less time opening a record (in a test page the
 * static rendering painted ~19 µs sooner per MathML element removed). Only the run join
 * changes how it sets: a word is kerned as a word ("AT" 1.9 px narrower).
 */
export function slim(html: string): string {
  return unwrapRow(dropEmptySpaces(joinUprightRuns(bare(html))));
}

/** KaTeX's <math> alone: no wrapper span, no namespace attribute (the HTML parser knows <math>), no TeX annotation (the record keeps the source). */
function bare(html: string): string {
  return html
    .replace(/^<span class="katex(?:-display)?">(?:<span class="katex">)?/, '')
    .replace(/(?:<\/span>)+$/, '')
    .replace(' xmlns="http://www.w3.org/1998/Math/MathML"', '')
    .replace(/<semantics>([\s\S]*)<annotation encoding="application\/x-tex">[\s\S]*?<\/annotation><\/semantics>/, '$1');
}

/** A run of upright letters as one <mi> (a multi-letter <mi> is upright by default). */
export function joinUprightRuns(html: string): string {
  return html.replace(/<mrow>((?:<mi mathvariant="normal">[^<]<\/mi>){2,})<\/mrow>/g, (_all, run: string) =>
    `<mi>${run.replace(/<mi mathvariant="normal">([^<])<\/mi>/g, '$1')}</mi>`);
}

/**
 * No empty <mspace>: it has no size, and space-like elements do not count when an
 * operator's form is inferred (MathML Core, from memory), so the operators around keep
 * their spacing.
 */
function dropEmptySpaces(html: string): string {
  return html.replaceAll('<mspace></mspace>', '');
}

/** `<math …><mrow>X</mrow></math>` as `<math …>X</math>` when that one row holds all of it (<math> is itself a row). */
function unwrapRow(html: string): string {
  const m = /^(<math\b[^>]*>)<mrow>([\s\S]*)<\/mrow>(<\/math>)$/.exec(html);
  if (!m) return html;
  let depth = 0;
  for (const tag of m[2].matchAll(/<(\/?)mrow>/g)) {
    depth += tag[1] ? -1 : 1;
    if (depth < 0) return html; // the first row closes before the end: it is not the only child
  }
  return depth === 0 ? m[1] + m[2] + m[3] : html;
}
