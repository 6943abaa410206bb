// Long recomputes in slices. Cells compute one after another in one task; after
// SLICE_MS of that, the next cell waits for a fresh task, so the page can paint, take
// input and show that it is computing (a timer cannot fire inside a task). An ordinary
// edit computes in well under a slice and never waits.

/** Longest stretch of cell computing in one task (the browser calls 50 ms a long task). */
export const SLICE_MS = 40;

const now = () => performance.now();

/** A promise settled in a new task: setImmediate in Node; a message in the browser (no 4 ms timer clamp). */
function nextTask(): Promise<void> {
  if (typeof setImmediate === 'function') return new Promise((r) => setImmediate(r));
  return new Promise((r) => {
    const ch = new MessageChannel();
    ch.port1.addEventListener('message', () => {
      ch.port1.close();
      r();
    });
    ch.port1.start(); // a listener added this way waits for start() (onmessage= starts by itself)
    ch.port2.postMessage(null);
  });
}

export class Pacer {
  private since = now();
  /** The next slice, once this one is used up: every waiting cell shares it. */
  private gate?: Promise<void>;

  /** A compute starts a slice (it runs right after the task of an edit). */
  begin(): void {
    this.since = now();
  }

  /** Runs `work` in this slice, or in a later one if this one is used up. */
  pace<T>(work: () => T): T | Promise<T> {
    if (!this.gate && now() - this.since < SLICE_MS) return work();
    this.gate ??= nextTask().then(() => {
      this.gate = undefined;
      this.begin();
    });
    // Re-checked when the gate opens: cells that waited together still share slices.
    return this.gate.then(() => this.pace(work));
  }
}
