// The computing state: shown only when the engine has not settled within about
// 100 ms of a change (most edits settle within a frame, and a flash of "computing"
// would only distract). While it shows, other status messages wait behind it, so a
// "Saved" written mid-compute does not hide it; the latest one returns afterwards.

/** A computing state shows only when an update takes longer than this. */
export const COMPUTING_AFTER_MS = 100;
export const COMPUTING_TEXT = 'Computing…';

export interface ComputingHost {
  /** What the status line says now. */
  said(): string;
  /** Writes the status line. */
  say(text: string): void;
  /** Marks the sheet as computing, or not. */
  mark(on: boolean): void;
}

export class ComputingState {
  private timer?: ReturnType<typeof setTimeout>;
  /** Counts the changes followed: only the latest one's outcome counts. */
  private generation = 0;
  private shown = false;
  /** The status message to show again once computing is over. */
  private held = '';

  constructor(private readonly host: ComputingHost, private readonly after = COMPUTING_AFTER_MS) {}

  get showing(): boolean {
    return this.shown;
  }

  /** Follows a change: shows the state if `settled` has not resolved within the delay. */
  watch(settled: Promise<void>): void {
    const generation = ++this.generation;
    clearTimeout(this.timer);
    this.timer = setTimeout(() => this.show(true), this.after);
    void settled.then(() => {
      if (generation !== this.generation) return; // a later change is being followed
      clearTimeout(this.timer);
      this.show(false);
    });
  }

  /** A status message: shown now, or held until computing is over. */
  status(text: string): void {
    if (this.shown) this.held = text;
    else this.host.say(text);
  }

  private show(on: boolean): void {
    if (on === this.shown) return;
    this.shown = on;
    if (on) this.held = this.host.said();
    this.host.mark(on);
    this.host.say(on ? COMPUTING_TEXT : this.held);
  }
}
