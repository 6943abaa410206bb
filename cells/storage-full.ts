// When the browser's storage is full: recognising the error, and the plain-text way out
// that needs nothing but the page (the sheet as a .lt file).

import { serialize } from '../runtime/format/index';
import type { App } from './app';
import { sheetTitle } from './templates';

/** IndexedDB's and localStorage's "no room" errors, under the names browsers give them. */
export function isStorageFull(e: unknown): boolean {
  const name = (e as { name?: string } | null)?.name ?? '';
  const message = String((e as { message?: string } | null)?.message ?? e);
  return name === 'QuotaExceededError' || name === 'NS_ERROR_DOM_QUOTA_REACHED' || /quota/i.test(message);
}

/** Offers the open sheet as a .lt text file. */
export function downloadSheet(app: App): void {
  const name = `${sheetTitle(app.doc, app.key).replace(/[^\w.-]+/g, '-').replace(/^-|-$/g, '').slice(0, 80) || 'sheet'}.lt`;
  const url = URL.createObjectURL(new Blob([serialize(app.doc)], { type: 'text/plain' }));
  const a = document.createElement('a');
  a.href = url;
  a.download = name;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
  app.setStatus(`Sheet downloaded: ${name}`);
}
