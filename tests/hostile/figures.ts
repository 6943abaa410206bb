// The hostile suite's figures: each test file appends what it measured to
// test-artifacts/hostile/<file>.json; `npm run test:hostile` prints the totals.
import { appendFileSync, mkdirSync } from 'node:fs';
import { basename } from 'node:path';

/** A run over this is a hang (the threshold, an outcome guard, not a speed target). */
export const HANG_MS = 2000;
/** No CLI run may take longer than this. */
export const CLI_MS = 10_000;
/** Nor use more memory than this (resident set, bytes). */
export const MEMORY_BYTES = 1024 ** 3;

const DIR = 'test-artifacts/hostile';

/** Appends one figure line {file, what, ...} for the summary. */
export function record(what: string, figures: Record<string, number | string | boolean>): void {
  mkdirSync(DIR, { recursive: true });
  const file = basename(new Error().stack?.split('\n').find((l) => l.includes('.test.ts'))?.match(/([\w-]+\.test\.ts)/)?.[1] ?? 'unknown');
  appendFileSync(`${DIR}/figures.jsonl`, `${JSON.stringify({ file, what, ...figures })}\n`);
}

/** Runs `fn`, records how long it took, and returns both. */
export function timed<T>(what: string, fn: () => T): { ms: number; value: T } {
  const t = performance.now();
  const value = fn();
  const ms = performance.now() - t;
  record(what, { kind: 'render', ms });
  return { ms, value };
}
