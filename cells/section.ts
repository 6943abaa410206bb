// Section cell: a numbered heading that starts a part of the calc.

import type { SectionCell } from '../runtime/document';
import { setSectionTitle } from '../runtime/edit/index';
import { escapeHtml, marginRefs, orThrow, renderRefs, type CellKindModule, type CellViewBase, type ParsedSource } from './kind';

export interface SectionView extends CellViewBase {
  kind: 'section';
  title: string;
}

export const sectionKind: CellKindModule<SectionCell, { title: string }, SectionView> = {
  kind: 'section',

  parse(source: string): ParsedSource<{ title: string }> {
    const title = source.replace(/\s+/g, ' ').trim();
    if (title === '') return { ok: false, message: 'a section needs a title', column: 1 };
    return { ok: true, value: { title } };
  },

  serialize: (cell) => cell.title,

  bind: (cell, ctx) => ({
    id: cell.id, kind: 'section', status: 'plain', number: ctx.number, title: cell.title,
    label: cell.label, refs: marginRefs(cell.clause, undefined),
  }),

  render: (v) =>
    `<div class="cell-no sec-no">${escapeHtml(v.number)}</div><div class="cell-body"><h2 class="section-title">${
      escapeHtml(v.title)}</h2>${v.label ? `<div class="cell-label">${escapeHtml(v.label)}</div>` : ''}</div>${renderRefs(v.refs)}`,

  edit(doc, id, source) {
    return setSectionTitle(doc, id, orThrow(sectionKind.parse(source)).title);
  },
};
