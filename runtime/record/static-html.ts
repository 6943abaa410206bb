// The static rendering of a calc record: title block, caution, check summary, then
// every cell as a calc sheet reads (hand-calc equation, result column, clause), and
// the review state when the document has one. Plain HTML from escaped text and
// KaTeX output only, so it reads with JavaScript off and prints as calc sheets.

import type { CalcDocument, Cell, CheckCell, DocMeta } from '../document';
import { cellName } from '../document';
import type { CellState } from '../engine-types';
import { cellsInError, inErrorText } from '../graph/in-error';
import { ratioText, type HandCalcScope } from '../handcalc/index';
import { describe } from '../kinds/index';
import { done } from '../present/result';
import { numberCells } from '../present/numbering';
import { sheetSystem } from '../units/systems';
import type { LibraryCall } from '../working/calls';
import { cellWorkingsHtml, recordOpen } from '../working/sheet';
import { escapeHtml } from './escape';
import { reviewHtml } from './static-review';
import { texHtml } from './tex';

export const CAUTION = "Results are an aid to, not a substitute for, a licensed engineer's judgement; local codes govern.";

export interface StaticOptions {
  /** SHA-256 of the embedded document, shown in the footer so a printout names its file. */
  digest?: string;
  /** When the record was written (ISO text); shown in the footer. */
  exportedAt?: string;
  /** A plain message for the top of the page (e.g. a failed seal). */
  warning?: string;
  /** The library calls of a formula or check (Engine.libraryCalls), to print their working. */
  calls?: (id: string) => LibraryCall[];
}

/** The working of each library call, open or folded by the sheet's setting (runtime/working). */
function recordWorkings(doc: CalcDocument, state: (id: string) => CellState | undefined, calls?: (id: string) => LibraryCall[]) {
  if (!calls) return undefined;
  const open = recordOpen(doc, state);
  const face = { tex: (t: string) => texHtml(t, false), system: sheetSystem(doc) };
  return (cell: Cell) => cellWorkingsHtml(calls(cell.id), face, open(cell.id));
}

export const META_LABELS: Record<keyof DocMeta, string> = {
  project: 'Project', job: 'Job no.', subject: 'Subject', preparedBy: 'Prepared by',
  checkedBy: 'Checked by', revision: 'Revision', date: 'Date',
};

export { numberCells };

interface Ctx {
  state: (id: string) => CellState | undefined;
  scope: HandCalcScope;
  numbers: Map<string, string>;
}

function titleBlockHtml(meta: DocMeta): string {
  const field = (k: keyof DocMeta, cls = '') =>
    `<div class="lt-tb-f${cls}"><span class="lt-tb-k">${META_LABELS[k]}</span><span class="lt-tb-v" data-meta="${k}">${
      escapeHtml(meta[k]) || '&#8212;'}</span></div>`;
  return `<header class="lt-tb" aria-label="Title block">${field('project')}${field('job')}${field('revision')}${field('date')}${
    field('subject')}${field('preparedBy')}${field('checkedBy', ' lt-span2')}</header>`;
}

/** Governing first: failures, errors, pending, passes; within each the highest ratio first. */
function summaryHtml(doc: CalcDocument, ctx: Ctx): string {
  const rank = { fail: 0, error: 1, pending: 2, ok: 3 } as const;
  const rows = doc.cells
    .filter((c): c is CheckCell => c.kind === 'check')
    .map((c, order) => ({ c, s: ctx.state(c.id), order }))
    .sort((a, b) => rank[a.s?.status ?? 'pending'] - rank[b.s?.status ?? 'pending']
      || (b.s?.ratio ?? -Infinity) - (a.s?.ratio ?? -Infinity) || a.order - b.order);
  const inError = cellsInError(doc, ctx.state);
  if (rows.length === 0 && inError.length === 0) return '';
  const failing = rows.filter((r) => r.s?.status === 'fail').length;
  const broken = rows.filter((r) => r.s?.status === 'error' || !done(r.s)).length;
  const head = `${rows.length} check${rows.length === 1 ? '' : 's'}: ${failing ? `${failing} NOT OK` : 'none NOT OK'}${
    broken ? `, ${broken} without a result` : ''}${inError.length ? `; ${inErrorText(inError)}` : ''}`;
  const words = { ok: '✓ OK', fail: '✗ NOT OK', error: '⚠ ERROR', pending: '… pending' } as const;
  // Cells other than checks whose error is their own come first (summary of every cell in error).
  const sources = inError.filter((e) => e.source && e.kind !== 'check').map((e) => `<tr class="lt-st-error"><td class="lt-sum-v">${
    words.error}</td><td class="lt-sum-r">—</td><td class="lt-sum-no"><a href="#lt-c-${escapeHtml(e.id)}">${
    escapeHtml(ctx.numbers.get(e.id) ?? '')}</a></td><td>${escapeHtml(`${e.title}: ${e.message}`)}</td><td class="lt-sum-ref"></td></tr>`);
  const body = rows.map(({ c, s }) => {
    const st = s?.status ?? 'pending';
    return `<tr class="lt-st-${st}"><td class="lt-sum-v">${words[st]}</td><td class="lt-sum-r">${
      s?.ratio !== undefined ? escapeHtml(ratioText(s.ratio)) : '—'}</td><td class="lt-sum-no"><a href="#lt-c-${escapeHtml(c.id)}">${
      escapeHtml(ctx.numbers.get(c.id) ?? '')}</a></td><td>${escapeHtml(c.label || c.name || c.expr.slice(0, 200))}</td><td class="lt-sum-ref">${
      escapeHtml(c.clause ?? s?.clauses.join('; ') ?? '')}</td></tr>`;
  });
  return `<section class="lt-summary" aria-label="Summary of checks"><h2>Summary of checks <small>${escapeHtml(head)}</small></h2>
<table><thead><tr><th>Outcome</th><th>Ratio</th><th>No.</th><th>Check</th><th>Reference</th></tr></thead><tbody>${sources.join('')}${body.join('')}</tbody></table></section>`;
}

/** The whole static rendering (one element, id "lt-static") for the given engine states. */
export function staticHtml(
  doc: CalcDocument,
  state: (id: string) => CellState | undefined,
  options: StaticOptions = {},
): string {
  const byName = new Map<string, string>();
  for (const c of doc.cells) {
    const n = cellName(c);
    if (n !== undefined && !byName.has(n)) byName.set(n, c.id);
  }
  const ctx: Ctx = {
    state,
    numbers: numberCells(doc.cells),
    scope: { isCell: (n) => byName.has(n), state: (n) => state(byName.get(n) ?? '') },
  };
  const workings = recordWorkings(doc, state, options.calls);
  const warning = options.warning ? `<p class="lt-warning" role="alert">${escapeHtml(options.warning)}</p>` : '';
  const foot = [
    'Calc record written by Loadtrace',
    options.exportedAt && `on ${escapeHtml(options.exportedAt)}`,
    options.digest && `· document SHA-256 <code>${escapeHtml(options.digest)}</code>`,
  ].filter(Boolean).join(' ');
  return `<div id="lt-static" class="lt-static" lang="en">${warning}${titleBlockHtml(doc.meta)}
<p class="lt-caution" role="note">△ ${CAUTION}</p>
<p class="lt-howto">This is the issued calc record. Open the file in a web browser with JavaScript on to edit and recompute it; the document it was computed from is kept inside the file.</p>
${summaryHtml(doc, ctx)}
<main class="lt-calc">${doc.cells.map((c) => describe(c.kind).record(c, { state, scope: ctx.scope, number: ctx.numbers.get(c.id) ?? '', workings })).join('\n')}</main>
${reviewHtml(doc)}
<footer class="lt-foot">${foot}</footer></div>`;
}
