// Note: explanatory text with inline math ($...$), in a small Markdown subset.

import type { NoteCell } from '../document';
import { noteFormat } from '../format/kinds/note';
import { labelHtml, recordFrame, renderLabel, type CellViewBase, type ViewContext } from '../present/cell-frame';
import { marginRefs, refsHtml } from '../present/margin';
import { escapeHtml } from '../present/escape';
import { markdownRenderer } from '../present/markdown';
import { texHtml } from '../present/tex-live';
import { texHtml as mathml } from '../record/tex';
import { CLAUSE_FIELD, liveView, NO_ERROR_COLUMN } from './shared';
import type { KindDescription } from './types';

export interface NoteView extends CellViewBase {
  kind: 'note';
  text: string;
}

/** Live: math as KaTeX HTML, with its TeX as the reading for screen readers; links open a new tab. */
export const liveMarkdown = markdownRenderer({
  math: (tex) => `<span class="note-math" role="img" aria-label="${escapeHtml(tex)}">${texHtml(tex)}</span>`,
  newTab: true,
  longClass: 'note-long',
});

/** Record: math as MathML. */
export const recordMarkdown = markdownRenderer({ math: (tex) => `<span class="lt-math">${mathml(tex, false)}</span>`, longClass: 'lt-long' });

export function bindNote(cell: NoteCell, ctx: ViewContext): NoteView {
  return {
    id: cell.id, kind: 'note', status: 'plain', number: ctx.number, text: cell.text,
    label: cell.label, refs: marginRefs(cell.clause, undefined),
  };
}

export function renderNote(v: NoteView): string {
  return `<div class="cell-no"></div><div class="cell-body">${renderLabel(v.label)}<div class="note-text">${
    liveMarkdown(v.text)}</div></div>${refsHtml(v.refs, 'cell-ref')}`;
}

export const note: KindDescription<'note'> = {
  kind: 'note',
  stem: 'n',
  blank: (id) => ({ id, kind: 'note', text: 'Note.' }),
  named: false,
  fields: [CLAUSE_FIELD],
  refs: () => [],
  rename: (cell) => cell,
  format: noteFormat,
  source: {
    mode: 'note',
    write: (cell) => cell.text,
    // Any text is a note; trailing blank lines are not kept.
    read: (source) => ({ ok: true, value: { text: source.replace(/\s+$/, '') } }),
    owns: ['text'],
    errorAt: NO_ERROR_COLUMN,
  },
  numbering: 'none',
  program: null,
  summaryTitle: null,
  live: liveView(bindNote, renderNote, true),
  record: (cell, ctx) =>
    recordFrame(cell, ctx, `${labelHtml(cell.label)}<div class="lt-note">${recordMarkdown(cell.text)}</div>`, '', 'plain'),
};
