// The title block: each field's label (and the short one the printed page margins use),
// and the record's drawing of it. The live title block (cells/title-block.ts) and the
// record's print margins (runtime/record/static-css.ts) take the labels from here.

import type { DocMeta } from '../document';
import { escapeHtml } from './escape';

export const TITLE_LABELS: { [K in keyof DocMeta]: { label: string; short: string } } = {
  project: { label: 'Project', short: 'Project' },
  job: { label: 'Job no.', short: 'Job no.' },
  subject: { label: 'Subject', short: 'Subject' },
  preparedBy: { label: 'Prepared by', short: 'Prepared' },
  checkedBy: { label: 'Checked by', short: 'Checked' },
  revision: { label: 'Revision', short: 'Rev.' },
  date: { label: 'Date', short: 'Date' },
};

/** Each field's place in the record's grid: four boxes a row, the last box twice as wide. */
const RECORD_PLACE: { [K in keyof DocMeta]: number } = {
  project: 1, job: 2, revision: 3, date: 4, subject: 5, preparedBy: 6, checkedBy: 7,
};
const RECORD_GRID = (Object.keys(RECORD_PLACE) as (keyof DocMeta)[]).sort((a, b) => RECORD_PLACE[a] - RECORD_PLACE[b]);

/** Record: the title block, an em dash in an empty box. */
export function titleBlockHtml(meta: DocMeta): string {
  const field = (k: keyof DocMeta, i: number) =>
    `<div class="lt-tb-f${i === RECORD_GRID.length - 1 ? ' lt-span2' : ''}"><span class="lt-tb-k">${TITLE_LABELS[k].label}</span><span class="lt-tb-v" data-meta="${k}">${
      escapeHtml(meta[k]) || '&#8212;'}</span></div>`;
  return `<header class="lt-tb" aria-label="Title block">${RECORD_GRID.map(field).join('')}</header>`;
}
