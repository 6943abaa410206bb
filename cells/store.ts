// Autosave in the browser's IndexedDB: each sheet with its undo history (as deltas),
// a version stamp so two tabs never silently overwrite each other, and the view
// state (scroll position) kept apart so scrolling never counts as an edit. The
// oldest sheet of the history (the base) is stored apart and written only when it
// changes, so a save after one edit writes a few cells, not the whole sheet.

import type { CalcDocument } from '../runtime/document';
import { diffSheets, unpackSheets, type History, type SheetDelta } from '../runtime/edit/index';

export interface SavedSheet {
  key: string;
  title: string;
  /** Filled in by load(); stored in the bases store under `baseId`. */
  base: CalcDocument;
  baseId?: string;
  steps: SheetDelta[];
  /** Position of the present sheet in base + steps. */
  present: number;
  /** Goes up by one with every save; a tab may only save over the version it last saw. */
  version: number;
  /** Id of the tab that saved last. */
  writer: string;
  savedAt: number;
}

/** How much undo history is kept on disk (the session itself keeps more). */
export const SAVED_PAST = 200;
export const SAVED_FUTURE = 100;

const DB_NAME = 'loadtrace';
const SHEETS = 'sheets';
const VIEWS = 'views';
const SETTINGS = 'settings';
const BASES = 'bases';

function request<T>(r: IDBRequest<T>): Promise<T> {
  return new Promise((resolve, reject) => {
    r.onsuccess = () => resolve(r.result);
    r.onerror = () => reject(r.error);
  });
}

// Each sheet remembers the delta from its predecessor, so saving after one edit
// diffs one pair of sheets, not the whole history.
const deltas = new WeakMap<CalcDocument, { prev: CalcDocument; delta: SheetDelta }>();

function deltaBetween(prev: CalcDocument, next: CalcDocument): SheetDelta {
  const hit = deltas.get(next);
  if (hit && hit.prev === prev) return hit.delta;
  const delta = diffSheets(prev, next);
  deltas.set(next, { prev, delta });
  return delta;
}

/** The history as stored: the oldest kept sheet and one delta a step. */
export function packHistory(h: History): { base: CalcDocument; steps: SheetDelta[]; present: number } {
  const past = h.past.slice(-SAVED_PAST);
  const sheets = [...past, h.present, ...h.future.slice(0, SAVED_FUTURE)];
  const steps: SheetDelta[] = [];
  for (let i = 1; i < sheets.length; i++) steps.push(deltaBetween(sheets[i - 1], sheets[i]));
  return { base: sheets[0], steps, present: past.length };
}

/** Rebuilds the history from a saved record. */
export function unpackHistory(saved: SavedSheet): History {
  const sheets = unpackSheets(saved.base, saved.steps);
  const at = Math.min(saved.present, sheets.length - 1);
  return { past: sheets.slice(0, at), present: sheets[at], future: sheets.slice(at + 1) };
}

export type SaveOutcome = { ok: true; version: number } | { ok: false; theirs: SavedSheet };

export class SheetStore {
  /** The base this tab last wrote or read for each sheet, with its id. */
  private readonly bases = new Map<string, { doc: CalcDocument; id: string }>();

  private constructor(private readonly db: IDBDatabase) {
    // A newer version of the app in another tab needs this connection closed to upgrade.
    db.onversionchange = () => db.close();
  }

  static open(): Promise<SheetStore> {
    return new Promise((resolve, reject) => {
      const req = indexedDB.open(DB_NAME, 2);
      req.onupgradeneeded = () => {
        const db = req.result;
        if (!db.objectStoreNames.contains(SHEETS)) db.createObjectStore(SHEETS, { keyPath: 'key' });
        if (!db.objectStoreNames.contains(VIEWS)) db.createObjectStore(VIEWS);
        if (!db.objectStoreNames.contains(SETTINGS)) db.createObjectStore(SETTINGS);
        if (!db.objectStoreNames.contains(BASES)) db.createObjectStore(BASES);
      };
      req.onsuccess = () => resolve(new SheetStore(req.result));
      req.onerror = () => reject(req.error);
    });
  }

  async load(key: string): Promise<SavedSheet | undefined> {
    const tx = this.db.transaction([SHEETS, BASES]);
    const [record, base] = await Promise.all([
      request(tx.objectStore(SHEETS).get(key)) as Promise<SavedSheet | undefined>,
      request(tx.objectStore(BASES).get(key)) as Promise<{ id: string; doc: CalcDocument } | undefined>,
    ]);
    if (!record) return undefined;
    if (record.baseId) {
      if (!base || base.id !== record.baseId) throw new Error(`the saved history of "${key}" is incomplete`);
      record.base = base.doc;
    }
    if (record.base && record.baseId) this.bases.set(key, { doc: record.base, id: record.baseId });
    return record;
  }

  /**
   * Saves over `expected` (the version this tab last read or wrote; 0 for a new sheet).
   * When another tab saved in between, nothing is written and its record comes back.
   */
  save(key: string, title: string, h: History, expected: number, writer: string): Promise<SaveOutcome> {
    const { base, ...packed } = packHistory(h);
    const known = this.bases.get(key);
    const baseId = known?.doc === base ? known.id : `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}`;
    return new Promise((resolve, reject) => {
      const tx = this.db.transaction([SHEETS, BASES], 'readwrite');
      const store = tx.objectStore(SHEETS);
      let outcome: SaveOutcome;
      /** A put that throws at once (no room, a value it cannot store) fails the save with its own error. */
      let thrown: unknown;
      const get = store.get(key);
      get.onsuccess = () => {
        try {
          write();
        } catch (e) {
          thrown = e;
          tx.abort();
        }
      };
      const write = () => {
        const current = get.result as SavedSheet | undefined;
        const have = current?.version ?? 0;
        if (have !== expected) {
          outcome = { ok: false, theirs: current! };
          return;
        }
        // Same version as this tab last saw, so the stored base is the one this tab knows.
        if (known?.doc !== base || current?.baseId !== baseId) tx.objectStore(BASES).put({ id: baseId, doc: base }, key);
        const record = { key, title, ...packed, baseId, version: have + 1, writer, savedAt: Date.now() };
        store.put(record);
        outcome = { ok: true, version: record.version };
      };
      tx.oncomplete = () => {
        if (outcome?.ok) this.bases.set(key, { doc: base, id: baseId });
        resolve(outcome);
      };
      tx.onerror = () => reject(thrown ?? tx.error);
      tx.onabort = () => reject(thrown ?? tx.error);
    });
  }

  async list(): Promise<{ key: string; title: string; savedAt: number }[]> {
    const all = (await request(this.db.transaction(SHEETS).objectStore(SHEETS).getAll())) as SavedSheet[];
    return all.map(({ key, title, savedAt }) => ({ key, title, savedAt })).sort((a, b) => b.savedAt - a.savedAt);
  }

  async saveView(key: string, view: { scrollY: number }): Promise<void> {
    await request(this.db.transaction(VIEWS, 'readwrite').objectStore(VIEWS).put(view, key));
  }

  loadView(key: string): Promise<{ scrollY: number } | undefined> {
    return request(this.db.transaction(VIEWS).objectStore(VIEWS).get(key));
  }

  async setSetting(name: string, value: unknown): Promise<void> {
    await request(this.db.transaction(SETTINGS, 'readwrite').objectStore(SETTINGS).put(value, name));
  }

  getSetting<T>(name: string): Promise<T | undefined> {
    return request(this.db.transaction(SETTINGS).objectStore(SETTINGS).get(name));
  }
}
