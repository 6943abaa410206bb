// A record page keeps the person's edits: its sheet is saved under a key made from the
// record's own digest, so opening the same record again reopens the edited working copy
// (saying so), with a way back to the record as issued (an undoable step). Before, each
// opening took a new key and a reload showed the record's values with no word of the
// edits saved under the old one.

import { serialize } from '../runtime/format/index';
import type { App } from './app';
import { showNotice } from './notice';
import { unpackHistory, type SheetStore } from './store';

/** The key a record page's sheet is saved under: one per record document. */
export function recordKey(digest: string): string {
  return `record-${digest.slice(0, 16)}`;
}

/** Once the store is open: the working copy of the record on screen, if one was saved. */
export async function reopenWorkingCopy(app: App, store: SheetStore): Promise<boolean> {
  const saved = await store.load(app.key).catch(() => undefined);
  // Edits made before the store opened stay as they are (the version check then says so).
  if (!saved || app.history.past.length > 0) return false;
  const issued = app.doc;
  const h = unpackHistory(saved);
  app.open(app.key, h, saved.version);
  if (serialize(h.present) === serialize(issued)) return false;
  const when = new Date(saved.savedAt).toLocaleString();
  showNotice('working-copy', `This is your working copy of this record, with the edits you made here (last saved ${when}). The record file itself is unchanged.`, [{
    label: 'Show the record as issued',
    run: () => {
      app.apply(issued);
      app.setStatus('The record as issued; Ctrl+Z returns to your working copy');
    },
  }]);
  app.setStatus('Your working copy of this record (edited here)');
  return true;
}
