// When the engine is settled and who hears about it: cells being computed are
// counted, and once none is left the changed cells go to every subscriber in one
// call, then every settled() promise resolves.

export class Notifier {
  private readonly listeners = new Set<(changed: string[]) => void>();
  private readonly busyIds = new Set<string>();
  private readonly changed = new Set<string>();
  private waiting: (() => void)[] = [];
  private queued = false;
  private closed = false;

  /** `widen` adds, before listeners hear, the cells that must re-show too (readers of changed cells). */
  constructor(private readonly widen: (changed: Set<string>) => void) {}

  markChanged(id: string): void {
    this.changed.add(id);
  }

  busy(id: string): void {
    this.busyIds.add(id);
  }

  idle(id: string): void {
    if (this.busyIds.delete(id) && this.busyIds.size === 0) this.queue();
  }

  subscribe(listener: (changed: string[]) => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  settled(): Promise<void> {
    if (this.busyIds.size === 0 && !this.queued) return Promise.resolve();
    return new Promise((resolve) => this.waiting.push(resolve));
  }

  /** Settle soon: after the current task, if nothing is computing then. */
  queue(): void {
    if (this.queued) return;
    this.queued = true;
    queueMicrotask(() => {
      this.queued = false;
      if (this.busyIds.size > 0 || this.closed) return;
      this.flush();
    });
  }

  close(): void {
    this.closed = true;
    this.listeners.clear();
    this.release();
  }

  private flush(): void {
    if (this.changed.size) {
      this.widen(this.changed);
      const changed = [...this.changed];
      this.changed.clear();
      for (const l of this.listeners) l(changed);
    }
    this.release();
  }

  private release(): void {
    const waiting = this.waiting;
    this.waiting = [];
    waiting.forEach((w) => w());
  }
}
