// Work put off until the page has painted, then done a few items a task (so a long
// list never makes one long task). The sheet view uses it for the cells just beyond
// the screen: the screen itself is typeset first.

export class LaterBatches {
  private readonly queued = new Set<string>();
  private scheduled = false;

  constructor(private readonly run: (id: string) => void, private readonly batch = 8) {}

  /** Runs `id` after the next frame, with the others queued by then, `batch` a task. */
  add(id: string): void {
    this.queued.add(id);
    if (this.scheduled) return;
    this.scheduled = true;
    const next = () => {
      for (const i of [...this.queued].slice(0, this.batch)) {
        this.queued.delete(i);
        this.run(i);
      }
      if (this.queued.size) setTimeout(next, 0);
      else this.scheduled = false;
    };
    requestAnimationFrame(() => setTimeout(next, 0));
  }
}
