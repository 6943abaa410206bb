// The static rendering of a calc record: title block, caution, check summary, then
// every cell as a calc sheet reads (hand-calc equation, result column, clause), and
// the review state when the document has one. Plain HTML from escaped text and
// KaTeX output only, so it reads with JavaScript off and prints as calc sheets.

import type { CalcDocument, Cell } from '../document';
import { cellName } from '../document';
import type { CellState } from '../engine-types';
import type { HandCalcScope } from '../handcalc/index';
import { describe } from '../kinds/index';
import { numberCells } from '../present/numbering';
import { summaryOf, summaryTableHtml } from '../present/summary';
import { titleBlockHtml } from '../present/title-block';
import { sheetSystem } from '../units/systems';
import type { LibraryCall } from '../working/calls';
import { cellWorkingsHtml, recordOpen } from '../working/sheet';
import { escapeHtml } from './escape';
import { reviewHtml } from './static-review';
import { staticRecordLines, type RecordLines } from './record-lines';
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
  /** What the record is and what is known of its file (runtime/record/record-lines.ts). */
  record?: RecordLines;
  /** The element's id (a package holds several sheets); lt-static when absent. */
  id?: string;
}

/** The working of each library call, open or folded by the sheet's setting (runtime/working). */
function recordWorkings(doc: CalcDocument, state: (id: string) => CellState | undefined, calls?: (id: string) => LibraryCall[]) {
  if (!calls) return undefined;
  const open = recordOpen(doc, state);
  const face = { tex: (t: string) => texHtml(t, false), system: sheetSystem(doc) };
  return (cell: Cell) => cellWorkingsHtml(calls(cell.id), face, open(cell.id));
}

export { numberCells };

/**
 * The calc itself: the summary of checks, then every cell as its kind draws it for the
 * record, with the working of its library calls when `calls` gives them.
 */
export function calcHtml(doc: CalcDocument, state: (id: string) => CellState | undefined, calls?: (id: string) => LibraryCall[]): string {
  const byName = new Map<string, string>();
  for (const c of doc.cells) {
    const n = cellName(c);
    if (n !== undefined && !byName.has(n)) byName.set(n, c.id);
  }
  const scope: HandCalcScope = { isCell: (n) => byName.has(n), state: (n) => state(byName.get(n) ?? '') };
  const numbers = numberCells(doc.cells);
  const workings = recordWorkings(doc, state, calls);
  const cells = doc.cells.map((c) => describe(c.kind).record(c, { state, scope, number: numbers.get(c.id) ?? '', workings }));
  return `${summaryTableHtml(summaryOf(doc, state, numbers))}\n<main class="lt-calc">${cells.join('\n')}</main>`;
}

/**
 * The whole static rendering (one element, id "lt-static") for the given engine states:
 * the page's head (a warning, the title block, the caution, how to open the file), the
 * calc, the review state, and the footer that names the file.
 */
export function staticHtml(
  doc: CalcDocument,
  state: (id: string) => CellState | undefined,
  options: StaticOptions = {},
): string {
  const warning = options.warning ? `<p class="lt-warning" role="alert">${escapeHtml(options.warning)}</p>` : '';
  const foot = [
    'Calc record written by Loadtrace',
    options.exportedAt && `on ${escapeHtml(options.exportedAt)}`,
    options.digest && `· document SHA-256 <code>${escapeHtml(options.digest)}</code>`,
  ].filter(Boolean).join(' ');
  return `<div id="${escapeHtml(options.id ?? 'lt-static')}" class="lt-static" lang="en">${warning}${titleBlockHtml(doc.meta)}
<p class="lt-caution" role="note">△ ${CAUTION}</p>
${staticRecordLines(doc, state, options.record)}
${calcHtml(doc, state, options.calls)}
${reviewHtml(doc, state)}
<footer class="lt-foot">${foot}</footer></div>`;
}
