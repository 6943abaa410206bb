// Nothing lost when the page closes. IndexedDB writes finish after the page may be gone
// (a tab closed right after Enter lost 4 of 6 edits), so whenever the page is hidden or
// closed, what is not yet safely stored (the sheet, and the text of a field being typed
// in) is written synchronously to localStorage, the journal, and put back the next time
// that sheet opens, with a notice. Leaving with unsaved work asks first.

import { parse, serialize } from '../runtime/format/index';
import type { App, Draft } from './app';
import type { Autosave } from './autosave';
import { showNotice } from './notice';

const SHEET = 'loadtrace-journal:';
const DRAFT = 'loadtrace-draft:';
/** A sheet this large is journalled only when the page is hidden (serialising it at every edit would cost more than the edit). */
const JOURNAL_EVERY_EDIT_UP_TO = 5000;

export interface Journal {
  key: string;
  /** The sheet as it stood, in the text format, when it was not yet stored. */
  doc?: string;
  /** Text typed in a field and not yet applied. */
  draft?: Draft;
  at: number;
}

function put(name: string, value: unknown): boolean {
  try {
    localStorage.setItem(name, JSON.stringify(value));
    return true;
  } catch {
    return false; // storage full or forbidden: IndexedDB may still have it
  }
}

function get<T>(name: string): T | undefined {
  try {
    const raw = localStorage.getItem(name);
    return raw ? (JSON.parse(raw) as T) : undefined;
  } catch {
    return undefined;
  }
}

function drop(name: string): void {
  try {
    localStorage.removeItem(name);
  } catch {
    /* nothing to drop */
  }
}

/** What the journal holds for a sheet: its unsaved text and its draft, each with its time. */
export function readJournal(key: string): Journal | undefined {
  const sheet = get<{ doc: string; at: number }>(SHEET + key);
  const draft = get<{ draft: Draft; at: number }>(DRAFT + key);
  if (!sheet && !draft) return undefined;
  return { key, doc: sheet?.doc, draft: draft?.draft, at: Math.max(sheet?.at ?? 0, draft?.at ?? 0) };
}

export function clearJournal(key: string): void {
  drop(SHEET + key);
  drop(DRAFT + key);
}

/** The sheet is stored: its journalled text is stale (a draft is not, and stays). */
export function sheetStored(key: string): void {
  drop(SHEET + key);
}

/** Journals the unsaved sheet now (synchronously), when there is one. */
export function journalSheet(app: App, autosave: Autosave | undefined, always = false): void {
  const unsaved = autosave ? autosave.unsaved : app.history;
  if (!app.key || !unsaved) return;
  if (!always && unsaved.present.cells.length > JOURNAL_EVERY_EDIT_UP_TO) return;
  put(SHEET + app.key, { doc: serialize(unsaved.present), at: Date.now() });
}

/**
 * Journals the text being typed in `field` (the focused one by default). A draft is
 * dropped only when the field it came from holds its cell's value again: leaving the page
 * may take the focus away first, and a save may finish meanwhile, and neither is a reason
 * to forget what was typed.
 */
export function journalDraft(app: App, field?: EventTarget | null): void {
  if (!app.key) return;
  const draft = app.draft(field);
  if (draft) {
    put(DRAFT + app.key, { draft, at: Date.now() });
    return;
  }
  const old = get<{ draft: Draft }>(DRAFT + app.key);
  if (old && field instanceof Element && app.cellIdOf(field) === old.draft.cellId) drop(DRAFT + app.key);
}

/**
 * Journals as work happens (a draft at each keystroke, the sheet at each edit: a write
 * made while the page is closing did not always reach the next page in Chromium) and again
 * on hide and close; asks before leaving while anything is unsaved.
 */
export function installKeepWork(app: App, autosave: Autosave | undefined): void {
  document.addEventListener('input', (e) => journalDraft(app, e.target), true);
  document.addEventListener('focusout', (e) => journalDraft(app, e.target), true);
  const leaving = () => {
    journalSheet(app, autosave, true);
    journalDraft(app);
  };
  window.addEventListener('pagehide', leaving);
  document.addEventListener('visibilitychange', () => {
    if (document.visibilityState === 'hidden') leaving();
  });
  window.addEventListener('beforeunload', (e) => {
    leaving();
    if (autosave?.dirty || app.draft()) {
      e.preventDefault();
      e.returnValue = ''; // Chromium shows its own "Leave site?" question
    }
  });
}

/**
 * After a sheet opens: puts back what its journal holds (an undoable edit for the sheet,
 * the draft in its field) and says so. Returns whether anything was restored.
 */
export function restoreJournal(app: App): boolean {
  const j = readJournal(app.key);
  if (!j) return false;
  clearJournal(app.key);
  const said: string[] = [];
  if (j.doc !== undefined && j.doc !== serialize(app.doc)) {
    const { doc, errors } = parse(j.doc);
    if (errors.length === 0) {
      app.apply(doc);
      said.push(`The changes not yet saved when this page closed (${new Date(j.at).toLocaleTimeString()}) are restored; Ctrl+Z takes them back.`);
    }
  }
  if (j.draft && !app.holds(j.draft) && app.restoreDraft(j.draft)) {
    said.push(`What you were typing in ${app.cellTitle(j.draft.cellId)} is back in its field, not yet applied.`);
  }
  if (said.length) showNotice('restored', said.join(' '));
  return said.length > 0;
}
