// Saves every change to IndexedDB shortly after it happens, and stops (with a
// warning) when another tab has saved the same sheet in the meantime.

import type { History } from '../runtime/edit/index';
import type { SavedSheet, SheetStore } from './store';
import type { TabGuard } from './tab-guard';

export interface AutosaveHooks {
  /** A change is waiting to be written. */
  saving(): void;
  /** Another tab saved this sheet; saving here is paused until the person chooses. */
  conflict(theirs: SavedSheet | undefined): void;
  saved(version: number): void;
  failed(error: unknown): void;
}


export class Autosave {
  key = '';
  version = 0;
  private title = '';
  private pending?: History;
  /** Being written: not safe until the store says so. */
  private writing?: History;
  private timer?: number;
  private running = Promise.resolve();
  paused = false;

  /** `store` may still be opening (a record page does not wait for it): the first save waits. */
  constructor(private readonly store: SheetStore | Promise<SheetStore | undefined>, private readonly guard: TabGuard, private readonly hooks: AutosaveHooks) {
    guard.onForeignSave((n) => {
      if (n.key === this.key && n.version !== this.version) {
        this.paused = true;
        hooks.conflict(undefined);
      }
    });
  }

  /** Starts following a sheet at `version` (0 when it was never saved). */
  follow(key: string, version: number): void {
    this.flushNow();
    this.key = key;
    this.version = version;
    this.paused = false;
  }

  /**
   * Writes the change right after the next frame is drawn: soon enough that a reload
   * finds it, late enough not to hold up the recompute of the edit itself.
   */
  schedule(h: History, title: string): void {
    this.pending = h;
    this.title = title;
    if (this.paused) return;
    this.hooks.saving();
    if (this.timer !== undefined) return;
    this.timer = requestAnimationFrame(() => setTimeout(() => void this.flushNow(), 0));
  }

  /** Writes what is pending now (on leaving the page, switching sheets). */
  flushNow(): Promise<void> {
    if (this.timer !== undefined) cancelAnimationFrame(this.timer);
    this.timer = undefined;
    const h = this.pending;
    if (!h || this.paused || !this.key) return this.running;
    this.pending = undefined;
    const key = this.key;
    this.running = this.running.then(async () => {
      this.writing = h;
      try {
        const store = await this.store;
        if (!store) throw new Error('this browser cannot save (IndexedDB unavailable)');
        const out = await store.save(key, this.title, h, this.version, this.guard.tabId);
        if (key !== this.key) return;
        if (out.ok) {
          this.version = out.version;
          this.guard.announce(key, out.version);
          this.writing = undefined; // stored: not dirty when the saved hook asks
          if (!this.pending) this.hooks.saved(out.version);
        } else {
          this.paused = true;
          this.pending = h;
          this.hooks.conflict(out.theirs);
        }
      } catch (e) {
        // Kept as pending: the next change or the next time the page is hidden tries again,
        // and the journal (keep-work.ts) holds it meanwhile.
        if (key === this.key && !this.pending) this.pending = h;
        this.hooks.failed(e);
      } finally {
        this.writing = undefined;
      }
    });
    return this.running;
  }

  /** Whether this tab has changes not yet written. */
  get dirty(): boolean {
    return this.pending !== undefined || this.writing !== undefined;
  }

  /** The latest history not yet safely in the store (pending, or being written), if any. */
  get unsaved(): History | undefined {
    return this.pending ?? this.writing;
  }

  /** The title the sheet is saved under. */
  get sheetTitle(): string {
    return this.title;
  }
}
