// When the reactive runtime computes: right after the task of an edit, in slices
// (pacer.ts) when the recompute is long. Kept apart from the engine because it reaches
// into @observablehq/runtime's internals, which an upgrade must re-check.

import type { Runtime } from '@observablehq/runtime';
import type { Pacer } from './pacer';

/** The runtime's internal scheduling hooks (writable prototype properties in 6.0.1). */
interface RuntimeScheduling {
  _disposed: boolean;
  _computeNow(): Promise<void>;
  _computeSoon(): Promise<void>;
}

/**
 * The runtime waits for the next animation frame before it recomputes, so an edit's
 * results would land a frame late and their work would delay that frame's paint. A
 * microtask computes right after the edit's task instead (in Node too, where it used
 * setImmediate). Edits made in one task still make one compute: `_compute` reuses the
 * pending `_computing` promise until the compute starts.
 */
export function computeAfterThisTask(runtime: Runtime, pacer: Pacer): Runtime {
  const r = runtime as unknown as RuntimeScheduling;
  r._computeSoon = () => Promise.resolve().then(() => {
    if (r._disposed) return undefined;
    pacer.begin();
    return r._computeNow();
  });
  return runtime;
}
