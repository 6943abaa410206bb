// The Markdown of notes, one renderer for the live sheet and the record: paragraphs,
// **bold**, *italic*, `code`, - and 1. lists, [links](https://...) and inline $math$.
// markdown-it with only those rules on, made safe without the DOM: raw HTML is escaped
// (html: false), a link whose address is not http(s) stays as the text it is, nesting
// is capped, and a very long note is shown as plain text.

import markdownIt, { type MarkdownIt, type StateInline } from 'markdown-it';
import { escapeHtml } from './escape';

/** A note longer than this is shown as plain escaped text, not parsed. */
export const NOTE_LIMIT = 100_000;
/** Deeper nesting (lists in lists, emphasis in emphasis) than this is shown as text. */
const MAX_NESTING = 20;

export interface MarkdownOptions {
  /** HTML for inline math (live: KaTeX HTML; record: MathML). */
  math(tex: string): string;
  /** Links open in a new tab (the live sheet). */
  newTab?: boolean;
  /** Class of the paragraph a too-long note is shown in. */
  longClass: string;
}

const SAFE_LINK = /^https?:\/\/[^\s<>"'`\\]+$/i;

/** `$...$` on one line, not empty: inline math. */
function mathRule(state: StateInline, silent: boolean): boolean {
  const { src, pos, posMax } = state;
  if (src.charCodeAt(pos) !== 0x24 /* $ */) return false;
  const end = src.indexOf('$', pos + 1);
  if (end < 0 || end > posMax || end === pos + 1) return false;
  const tex = src.slice(pos + 1, end);
  if (tex.includes('\n')) return false;
  if (!silent) state.push('math_inline', 'math', 0).content = tex;
  state.pos = end + 1;
  return true;
}

function build(options: MarkdownOptions): MarkdownIt {
  const md = markdownIt('zero', { html: false, linkify: false, typographer: false, maxNesting: MAX_NESTING })
    .enable(['paragraph', 'list', 'emphasis', 'backticks', 'link', 'escape']);
  md.validateLink = (url) => SAFE_LINK.test(url);
  md.inline.ruler.before('emphasis', 'math', mathRule);
  md.renderer.rules.math_inline = (tokens, idx) => options.math(tokens[idx].content);
  md.renderer.rules.link_open = (tokens, idx, opts, _env, self) => {
    tokens[idx].attrSet('rel', 'noopener noreferrer nofollow');
    if (options.newTab) tokens[idx].attrSet('target', '_blank');
    return self.renderToken(tokens, idx, opts);
  };
  return md;
}

/** A renderer of notes' Markdown with these options (the parser is built on first use). */
export function markdownRenderer(options: MarkdownOptions): (text: string) => string {
  let md: MarkdownIt | undefined;
  return (text) => {
    if (text.length > NOTE_LIMIT) return `<p class="${options.longClass}">${escapeHtml(text)}</p>`;
    return (md ??= build(options)).render(text);
  };
}
