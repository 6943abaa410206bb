// Styles of the static record: a paper sheet on screen, calc sheets in print. The
// printed title block sits in the page's top margin boxes, so it repeats on every
// sheet with "sheet n of m"; its texts come from the document, as escaped CSS strings.

import type { DocMeta } from '../document';
import { TITLE_LABELS } from '../present/title-block';
import { cssString } from './escape';
import { CAUTION } from './static-html';
import { WORKING_CSS } from '../working/css';

/** Printed title-block fields are cut to this many characters so the margin stays one or two lines. */
const FIELD_MAX = 80;

/** A field in a page margin: its short label in capitals, then its value. */
function field(key: keyof DocMeta, meta: DocMeta): string {
  const value = meta[key];
  const v = value.length > FIELD_MAX ? `${value.slice(0, FIELD_MAX)}…` : value;
  return `${cssString(`${TITLE_LABELS[key].short.toUpperCase()}  `)} ${cssString(v || '—')}`;
}

/**
 * The @page rules for a document's title block (screen rules do not depend on the
 * document); `name` makes them a named page's, for one sheet of a package.
 */
export function pageCss(meta: DocMeta, name?: string): string {
  const box = 'font: 8pt/1.5 system-ui, "DejaVu Sans", sans-serif; white-space: pre-wrap; vertical-align: bottom; border-bottom: 1.4pt solid #000; padding: 0 1mm 1.6mm; color: #000;';
  // Only the left and right boxes: a centre box is always centred on the page and would overlap a long left one.
  return `@page${name ? ` ${name}` : ''} {
  margin: 27mm 13mm 15mm 13mm;
  @top-left { ${box} width: 60%; text-align: left; content: ${field('project', meta)} "\\A " ${field('subject', meta)}; }
  @top-right { ${box} width: 40%; text-align: right; content: ${field('job', meta)} "   " ${field('revision', meta)} "   " ${field('date', meta)} "\\A " ${field('preparedBy', meta)} "   " ${field('checkedBy', meta)} "\\A SHEET " counter(page) " OF " counter(pages); }
  @bottom-center { font: 7pt system-ui, "DejaVu Sans", sans-serif; color: #000; content: ${cssString(CAUTION)}; }
}`;
}

export const STATIC_CSS = `
.lt-static { --lt-ink: #1b2129; --lt-soft: #59606c; --lt-rule: #d7d0bf; --lt-ok: #1d6638; --lt-fail: #a0171b;
  box-sizing: border-box; max-width: 62rem; margin: 1.2rem auto; padding: 1.4rem 1.6rem 2rem; background: #fffdf7; color: var(--lt-ink);
  font: 15px/1.45 Charter, "Bitstream Charter", "DejaVu Serif", Georgia, serif; border: 1px solid #d8d1c0;
  box-shadow: 0 1px 2px rgba(0,0,0,.12), 0 6px 18px rgba(60,50,30,.12); }
.lt-static * { box-sizing: border-box; }
.lt-static .lt-warning, .lt-load-failed { border: 2px solid #8a5a00; background: #fff4d6; padding: .5rem .8rem; font: 600 14px system-ui, sans-serif; margin: 0 0 1rem; }
.lt-load-failed { box-sizing: border-box; max-width: 62rem; margin: 1.2rem auto 0; color: #1b2129; }
.lt-tb { display: grid; grid-template-columns: 3fr 1.2fr 1.2fr 1fr; border: 1.5px solid var(--lt-ink); margin-bottom: .8rem; }
.lt-tb-f { display: flex; flex-direction: column; padding: .2rem .45rem; border-right: 1px solid #b9b09a; border-bottom: 1px solid #b9b09a; min-width: 0; overflow-wrap: anywhere; }
.lt-tb-f.lt-span2 { grid-column: span 2; }
.lt-summary a { color: inherit; }
.lt-tb-k { font: 10px/1.3 system-ui, sans-serif; text-transform: uppercase; letter-spacing: .08em; color: var(--lt-soft); }
.lt-tb-v { font-size: 14px; }
.lt-caution { font: 13px system-ui, sans-serif; border-left: 4px solid #8a5a00; padding: .3rem .6rem; background: #fbf5e4; margin: 0 0 .4rem; }
.lt-howto { font: 12px system-ui, sans-serif; color: var(--lt-soft); margin: 0 0 1rem; }
.lt-summary h2, .lt-review h3 { font-size: 1.05rem; margin: .8rem 0 .4rem; }
.lt-summary small, .lt-review small { font: 12px system-ui, sans-serif; color: var(--lt-soft); margin-left: .5rem; }
.lt-summary table, .lt-review table { width: 100%; border-collapse: collapse; font: 13px system-ui, sans-serif; }
.lt-summary th, .lt-summary td, .lt-review th, .lt-review td { text-align: left; padding: .15rem .4rem; border-bottom: 1px solid var(--lt-rule); vertical-align: top; overflow-wrap: anywhere; }
.lt-summary th, .lt-review th { font-weight: 600; color: var(--lt-soft); border-bottom: 1.5px solid var(--lt-ink); }
/* Outcome, ratio and number never break inside a word (a narrow column cut "Outcome" into "Outcom|e"). */
.lt-sum-v { white-space: nowrap; font-weight: 600; }
.lt-summary th, .lt-sum-r, .lt-sum-no { white-space: nowrap; overflow-wrap: normal; }
.lt-sum-r { font-variant-numeric: tabular-nums; }
.lt-st-fail .lt-sum-v, .lt-verdict.lt-fail { color: var(--lt-fail); }
.lt-st-ok .lt-sum-v, .lt-verdict.lt-pass { color: var(--lt-ok); }
.lt-calc { display: block; margin-top: 1rem; }
.lt-sec { font-size: 1.15rem; margin: 1.2rem 0 .3rem; padding-bottom: .15rem; border-bottom: 1.5px solid var(--lt-ink); overflow-wrap: anywhere; }
.lt-sec .lt-no { display: inline-block; min-width: 2.2rem; }
.lt-sec-ref { font: 12px system-ui, sans-serif; color: var(--lt-soft); }
.lt-sec-label { margin: 0 0 .3rem 2.2rem; color: var(--lt-soft); }
.lt-cell { display: grid; grid-template-columns: 2.6rem minmax(0, 1fr) 8.5rem 9.5rem; gap: 0 .6rem; padding: .35rem 0; border-bottom: 1px solid #ece6d6; }
.lt-cell > .lt-no { font: 12px system-ui, sans-serif; color: var(--lt-soft); padding-top: .2rem; }
.lt-body { min-width: 0; overflow-wrap: anywhere; }
.lt-label { font: 13px system-ui, sans-serif; color: var(--lt-soft); }
.lt-eq { overflow-x: auto; overflow-y: hidden; }
.lt-eq math { font-size: 1.12em; }
.lt-eq math[display="block"] { display: math; margin: .2rem 0 .2rem .6rem; }
.lt-textres { margin: .1rem 0 .2rem .6rem; font-style: italic; }
.lt-res { font: 600 14px system-ui, sans-serif; text-align: right; padding-top: .2rem; overflow-wrap: anywhere; font-variant-numeric: tabular-nums; }
.lt-check.lt-st-ok .lt-res { color: var(--lt-ok); }
.lt-check.lt-st-fail .lt-res { color: var(--lt-fail); }
.lt-res-none, .lt-res-err { color: var(--lt-soft); font-weight: 400; }
.lt-ref { font: 11.5px/1.35 system-ui, sans-serif; color: var(--lt-soft); padding-top: .2rem; overflow-wrap: anywhere; }
.lt-ref span { display: block; }
.lt-table { border-collapse: collapse; font: 13px system-ui, sans-serif; margin: .3rem 0; }
.lt-table th, .lt-table td { border: 1px solid var(--lt-rule); padding: .1rem .45rem; text-align: right; vertical-align: top; }
.lt-table th { font-weight: 600; color: var(--lt-soft); }
.lt-table .tbl-unit { display: block; font-weight: 400; font-size: 11px; }
.lt-table td:first-child, .lt-table th:first-child { text-align: left; }
.lt-tbl-bad { outline: 2px solid var(--lt-fail); }
.lt-meta, .lt-about { font: 12px system-ui, sans-serif; color: var(--lt-soft); margin: .1rem 0; }
.lt-verdict { font: 13px system-ui, sans-serif; margin: .1rem 0; }
.lt-ratio, .lt-dc { color: var(--lt-ink); margin-left: .5rem; }
.lt-err { font: 13px system-ui, sans-serif; color: #8a5a00; margin: .2rem 0; }
.lt-note p { margin: .2rem 0; }
.lt-tex-raw, .lt-long { font: 12px ui-monospace, "DejaVu Sans Mono", monospace; white-space: pre-wrap; overflow-wrap: anywhere; }
.lt-figure { margin: .3rem 0; }
.lt-figure svg { max-width: 100%; height: auto; }
.lt-review { margin-top: 1.4rem; }
.lt-comments { font: 13px system-ui, sans-serif; padding-left: 1.2rem; }
.lt-cstat { font-weight: 600; }
.lt-foot { margin-top: 1.4rem; font: 11px system-ui, sans-serif; color: var(--lt-soft); overflow-wrap: anywhere; }

/* Only what is on screen is laid out (a record opens faster); printing lays out all. */
@media screen { .lt-static .lt-cell, .lt-static .lt-sec, .lt-static .lt-summary tr { content-visibility: auto; contain-intrinsic-size: auto 3.5rem; } }

/* A record page before (or without) its script: only the static rendering shows. The
   app marks the page lt-live once it runs; printing always prints the static sheets.
   These styles are only ever in a record's head, and the app's markup follows the static
   rendering in its body (a loader message put before it stays in view); so sibling
   selectors, not :has(), which made the first paint ~35 ms later in a test page. */
html:not(.lt-live) > body > #lt-static ~ * { display: none !important; }
/* The desk the sheet lies on: the app's styles, which set it too, apply only once it runs. */
html:not(.lt-live) { background: #e7e3da; }
html:not(.lt-live) > body { margin: 0; }
html.lt-live > body > #lt-static { display: none; }

@media print {
  html:has(> body > #lt-static), html:has(> body > #lt-static) > body { background: #fff !important; padding: 0 !important; margin: 0 !important; }
  html:has(> body > #lt-static) > body > :not(#lt-static) { display: none !important; }
  html > body > #lt-static { display: block !important; }
  .lt-static { max-width: none; margin: 0; padding: 0; border: 0; box-shadow: none; background: #fff; font-size: 10pt; }
  .lt-static > .lt-tb, .lt-howto { display: none; }
  .lt-caution { font-size: 8.5pt; background: none; }
  .lt-cell { grid-template-columns: 1.8rem minmax(0, 1fr) 7rem 7.5rem; break-inside: avoid; page-break-inside: avoid; }
  .lt-eq, .lt-eq math, .lt-figure, .lt-summary tr, .lt-review tr { break-inside: avoid; page-break-inside: avoid; }
  .lt-eq { overflow: visible; }
  .lt-sec { break-after: avoid; page-break-after: avoid; }
  .lt-summary { break-after: page; }
  .lt-static a { color: inherit; text-decoration: none; }
  .lt-note a[href^="http"]::after { content: " (" attr(href) ")"; font-size: 8pt; }
}
${WORKING_CSS}
`;
