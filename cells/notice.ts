// Notices about the person's work (a working copy reopened, changes restored after the
// page closed, storage full, the engine failing): a banner under the toolbar, not only
// the status line, each with its own id so one replaces its earlier self.

import { escapeHtml } from '../runtime/present/escape';

export interface NoticeAction {
  label: string;
  run(): void;
}

/** Shows (or replaces) the notice `id`: a sentence, optional detail, buttons, and Dismiss. */
export function showNotice(id: string, text: string, actions: NoticeAction[] = [], role: 'status' | 'alert' = 'status'): HTMLElement {
  let el = document.getElementById(`lt-notice-${id}`);
  if (!el) {
    el = document.createElement('div');
    el.id = `lt-notice-${id}`;
    el.className = 'banner lt-notice';
    const anchor = document.getElementById('banner') ?? document.querySelector('.toolbar');
    if (anchor) anchor.after(el);
    else document.body.prepend(el);
  }
  el.setAttribute('role', role);
  el.hidden = false;
  el.innerHTML = `<p>${escapeHtml(text)}</p>${actions.map((a, i) => `<button type="button" data-notice="${i}">${escapeHtml(a.label)}</button>`).join('')}<button type="button" data-notice="dismiss">Dismiss</button>`;
  el.onclick = (e) => {
    const act = (e.target as HTMLElement).closest<HTMLElement>('[data-notice]')?.dataset.notice;
    if (act === undefined) return;
    if (act !== 'dismiss') actions[Number(act)]?.run();
    hideNotice(id);
  };
  return el;
}

export function hideNotice(id: string): void {
  const el = document.getElementById(`lt-notice-${id}`);
  if (el) el.hidden = true;
}
