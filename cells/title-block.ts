// The title block: project, job number, subject, prepared by, checked by, revision
// and date (labels from runtime/present/title-block.ts). Edited in place; printed at
// the top of every page.

import type { DocMeta } from '../runtime/document';
import { META_KEYS } from '../runtime/document';
import { TITLE_LABELS } from '../runtime/present/title-block';

export class TitleBlock {
  constructor(private readonly host: HTMLElement, onEdit: (key: keyof DocMeta, value: string) => void) {
    host.innerHTML = `<div class="tb-grid">${META_KEYS.map((k) =>
      `<label class="tb-field tb-${k}"><span class="tb-label">${TITLE_LABELS[k].label}</span><input data-meta="${k}" spellcheck="false" autocomplete="off"><span class="tb-print" data-print="${k}"></span></label>`,
    ).join('')}</div>`;
    host.addEventListener('input', (e) => {
      const t = e.target as HTMLInputElement;
      if (t.dataset.meta) onEdit(t.dataset.meta as keyof DocMeta, t.value);
    });
  }

  show(meta: DocMeta): void {
    for (const k of META_KEYS) {
      const field = this.host.querySelector<HTMLInputElement>(`input[data-meta="${k}"]`)!;
      if (field.value !== meta[k] && document.activeElement !== field) field.value = meta[k];
      field.title = meta[k];
      // Printed pages repeat the title block; form fields do not repeat their values, text does.
      this.host.querySelector<HTMLElement>(`[data-print="${k}"]`)!.textContent = meta[k];
    }
  }
}
