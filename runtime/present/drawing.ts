// Record: a cell whose result is a drawing (a figure, a sweep): its label, what it
// draws, the SVG (our own renderer: every text in it escaped) and the error line.

import type { Cell } from '../document';
import { labelHtml, recordFrame, type ViewContext } from './cell-frame';
import { errorHtml } from './error-line';
import { escapeHtml } from './escape';

/** `source` is the figure's expression ('' for none); `svg` the drawing ('' until computed). */
export function recordDrawing(cell: Cell, ctx: ViewContext, source: string, svg: string): string {
  const s = ctx.state(cell.id);
  const body = `${labelHtml(cell.label)}<div class="lt-meta">${escapeHtml(cell.kind)}${
    source ? `: <code>${escapeHtml(source.slice(0, 2000))}</code>` : ''}</div>${svg ? `<figure class="lt-figure">${svg}</figure>` : ''}${errorHtml(s)}`;
  return recordFrame(cell, ctx, body, typeof s?.display?.text === 'string' ? escapeHtml(s.display.text) : '', 'pending');
}
