// Section: a numbered heading that starts a part of the calc.

import type { SectionCell } from '../document';
import { sectionFormat } from '../format/kinds/section';
import { renderLabel, type CellViewBase, type ViewContext } from '../present/cell-frame';
import { escapeHtml } from '../present/escape';
import { marginRefs, refsHtml } from '../present/margin';
import { CLAUSE_FIELD, liveView, NO_ERROR_COLUMN } from './shared';
import type { KindDescription } from './types';

export interface SectionView extends CellViewBase {
  kind: 'section';
  title: string;
}

export function bindSection(cell: SectionCell, ctx: ViewContext): SectionView {
  return {
    id: cell.id, kind: 'section', status: 'plain', number: ctx.number, title: cell.title,
    label: cell.label, refs: marginRefs(cell.clause, undefined),
  };
}

export function renderSection(v: SectionView): string {
  return `<div class="cell-no sec-no">${escapeHtml(v.number)}</div><div class="cell-body"><h2 class="section-title">${
    escapeHtml(v.title)}</h2>${renderLabel(v.label)}</div>${refsHtml(v.refs, 'cell-ref')}`;
}

export const section: KindDescription<'section'> = {
  kind: 'section',
  stem: 's',
  blank: (id) => ({ id, kind: 'section', title: 'New section' }),
  named: false,
  fields: [CLAUSE_FIELD],
  refs: () => [],
  rename: (cell) => cell,
  format: sectionFormat,
  source: {
    mode: 'line',
    write: (cell) => cell.title,
    read(source) {
      const title = source.replace(/\s+/g, ' ').trim();
      if (title === '') return { ok: false, message: 'a section needs a title', column: 1 };
      return { ok: true, value: { title } };
    },
    owns: ['title'],
    errorAt: NO_ERROR_COLUMN,
  },
  numbering: 'section',
  program: null,
  summaryTitle: null,
  live: liveView(bindSection, renderSection),
  record: (cell, ctx) => {
    const id = escapeHtml(cell.id);
    return `<h2 class="lt-sec" id="lt-c-${id}" data-id="${id}"><span class="lt-no">${escapeHtml(ctx.number)}</span> ${escapeHtml(cell.title)}${
      cell.clause ? ` <small class="lt-sec-ref">${escapeHtml(cell.clause)}</small>` : ''}</h2>${
      cell.label ? `<p class="lt-sec-label">${escapeHtml(cell.label)}</p>` : ''}`;
  },
};
