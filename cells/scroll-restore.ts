// Scroll restore on reopening. Cells below the first screen are typeset after the first
// paint, so when the sheet is first shown the page can still be shorter than the saved
// position, and a single scrollTo stops short (seen on a busy machine). Keep asking for the
// saved position while the page grows, for a short while, until the reader takes over.

const PATIENCE_MS = 3000;

/** Resolves when the restore has ended: reached, given up, or taken over by the reader. */
export function restoreScroll(y: number): Promise<void> {
  let done!: () => void;
  const ended = new Promise<void>((ok) => (done = ok));
  const until = performance.now() + PATIENCE_MS;
  let stopped = false;
  const stop = () => {
    stopped = true;
    done();
    for (const t of USER_EVENTS) window.removeEventListener(t, stop, true);
  };
  // The reader scrolling or typing wins over the restore.
  const USER_EVENTS = ['wheel', 'keydown', 'pointerdown', 'touchstart'] as const;
  for (const t of USER_EVENTS) window.addEventListener(t, stop, { capture: true, passive: true });
  const step = () => {
    if (stopped) return;
    window.scrollTo(0, y);
    if (Math.abs(window.scrollY - y) < 1 || performance.now() > until) return stop();
    requestAnimationFrame(step);
  };
  step();
  return ended;
}
