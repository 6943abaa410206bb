// Note cell: explanatory text with inline math, in the small Markdown subset.

import type { NoteCell } from '../runtime/document';
import { setNoteText } from '../runtime/edit/index';
import { marginRefs, renderLabel, renderRefs, type CellKindModule, type CellViewBase } from './kind';
import { markdownHtml } from './markdown';

export interface NoteView extends CellViewBase {
  kind: 'note';
  text: string;
}

export const noteKind: CellKindModule<NoteCell, { text: string }, NoteView> = {
  kind: 'note',

  // Any text is a note; trailing blank lines are not kept.
  parse: (source) => ({ ok: true, value: { text: source.replace(/\s+$/, '') } }),

  serialize: (cell) => cell.text,

  bind: (cell, ctx) => ({
    id: cell.id, kind: 'note', status: 'plain', number: ctx.number, text: cell.text,
    label: cell.label, refs: marginRefs(cell.clause, undefined),
  }),

  render: (v) =>
    `<div class="cell-no"></div><div class="cell-body">${renderLabel(v.label)}<div class="note-text">${
      markdownHtml(v.text)}</div></div>${renderRefs(v.refs)}`,

  edit: (doc, id, source) => setNoteText(doc, id, source.replace(/\s+$/, '')),
};
