// Prints what the hostile suite measured (test-artifacts/hostile/figures.jsonl, written by
// tests/hostile/figures.ts's record()): renderer runs and their slowest time against the
// 2 s hang guard, and, per lost-work scenario, the edits made and those lost without a
// message. Exits 1 when an edit was lost or a run went over the guard.
import { existsSync, readFileSync } from 'node:fs';
import { HANG_MS } from '../tests/hostile/figures';

const FILE = 'test-artifacts/hostile/figures.jsonl';
if (!existsSync(FILE)) {
  console.log(`no figures: ${FILE} is missing (run the hostile tests first)`);
  process.exit(1);
}
type Figure = { file: string; what: string; kind?: string; ms?: number; edits?: number; lost?: number };
const figures = readFileSync(FILE, 'utf8').split('\n').filter(Boolean).map((l) => JSON.parse(l) as Figure);

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length ? (s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2) : NaN;
};

let bad = 0;
const renders = figures.filter((f) => f.kind === 'render' && typeof f.ms === 'number');
if (renders.length) {
  const ms = renders.map((f) => f.ms!);
  const over = ms.filter((m) => m > HANG_MS).length;
  bad += over;
  const slowest = renders.reduce((a, b) => (b.ms! > a.ms! ? b : a));
  console.log(`hostile renders: ${renders.length} runs, median ${median(ms).toFixed(1)} ms, slowest ${slowest.ms!.toFixed(1)} ms (${slowest.what}), ${over} over ${HANG_MS} ms`);
}
const lostWork = figures.filter((f) => f.kind === 'lost-work');
if (lostWork.length) {
  // A scenario retried by the runner appears more than once: its last run counts.
  const last = new Map(lostWork.map((f) => [f.what, f]));
  let edits = 0;
  let lost = 0;
  for (const f of last.values()) {
    edits += f.edits ?? 0;
    lost += f.lost ?? 0;
    console.log(`  lost work, ${f.what}: ${f.edits} edits, ${f.lost} lost without a message`);
  }
  bad += lost;
  console.log(`lost work in Chromium: ${last.size} scenarios, ${edits} edits, ${lost} lost without a message`);
}
process.exit(bad > 0 ? 1 : 0);
