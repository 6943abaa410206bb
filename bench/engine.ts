// npm run bench:engine — prints medians for
//  (a) one input edit that reaches 10 dependents, in a 100-cell and a 2,000-cell document;
//  (b) a full recompute of the 2,000-cell document against a bare loop that evaluates the
//      same formulas, compiled by mathjs, in topological order on plain numbers;
//  (c) the main template (load-path.lt, every library function it calls): an edit of f'c and
//      of the floor count, each recomputing most of the sheet through the library.
// BENCH_BASE=DIR (another checkout with node_modules) runs (c) with that checkout's engine and
// library too, alternating, and prints both side by side with their ratio: before and after a
// change, in one run under the same load.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { all, create } from 'mathjs';
import type { CalcDocument, Cell } from '../runtime/document';
import { emptyMeta } from '../runtime/document';
import { setInputValue } from '../runtime/edit/index';
import { createEngine } from '../runtime/engine';

/** A document of `n` cells: a root input every formula depends on (through a chain),
 *  and a separate input with exactly 10 dependents. */
export function generated(n: number): CalcDocument {
  const cells: Cell[] = [
    { kind: 'input', id: 'root', name: 'r', value: '1.5' },
    { kind: 'input', id: 'edit', name: 'e', value: '2' },
  ];
  for (let i = 0; i < 10; i++) cells.push({ kind: 'formula', id: `t${i}`, name: `t${i}`, expr: `e * ${i + 1} + sqrt(abs(e)) / 3` });
  let seed = 7;
  const rand = () => (seed = (seed * 48271) % 2147483647) / 2147483647;
  for (let i = 0; cells.length < n; i++) {
    const prev = i === 0 ? 'r' : `g${i - 1}`;
    const other = i > 1 ? `g${Math.floor(rand() * (i - 1))}` : 'r';
    cells.push({ kind: 'formula', id: `g${i}`, name: `g${i}`, expr: `(${prev} * 0.5 + ${other} * 0.25 + r) / 1.75 + max(${prev}, 0.1) ^ 0.5 / 100` });
  }
  return { meta: emptyMeta(), cells };
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

async function timeEdits(doc: CalcDocument, id: string, values: string[], reps: number): Promise<number> {
  const engine = createEngine(doc);
  await engine.settled();
  const times: number[] = [];
  for (let k = 0; k < reps; k++) {
    const next = setInputValue(engine.doc, id, values[k % values.length]);
    const t0 = performance.now();
    engine.update(next);
    await engine.settled();
    times.push(performance.now() - t0);
  }
  engine.dispose();
  return median(times.slice(Math.floor(reps / 5))); // drop warm-up
}

function bareLoop(doc: CalcDocument, reps: number): number {
  const math = create(all);
  const formulas = doc.cells.filter((c): c is Extract<Cell, { kind: 'formula' }> => c.kind === 'formula');
  const compiled = formulas.map((f) => ({ name: f.name, code: math.compile(f.expr) }));
  // The generated document is already in topological order.
  const times: number[] = [];
  for (let k = 0; k < reps; k++) {
    const scope: Record<string, number> = { r: 1.5 + (k % 2) * 0.5, e: 2 };
    const t0 = performance.now();
    for (const { name, code } of compiled) scope[name] = code.evaluate(scope) as number;
    times.push(performance.now() - t0);
  }
  return median(times.slice(Math.floor(reps / 5)));
}

/** What (c) needs of a checkout: its parser, its edit operation and its engine. */
interface Checkout {
  label: string;
  parse(text: string): { doc: CalcDocument };
  setInputValue(doc: CalcDocument, id: string, value: string): CalcDocument;
  createEngine(doc: CalcDocument): ReturnType<typeof createEngine>;
  template: string;
}

async function checkout(dir: string, label: string): Promise<Checkout> {
  const load = (p: string) => import(pathToFileURL(join(dir, p)).href);
  const [format, edit, engine] = await Promise.all([load('runtime/format/index.ts'), load('runtime/edit/index.ts'), load('runtime/engine.ts')]);
  return {
    label, parse: format.parse, setInputValue: edit.setInputValue, createEngine: engine.createEngine,
    template: readFileSync(join(dir, 'docs-templates/load-path.lt'), 'utf8'),
  };
}

/** One timed template edit per call, alternating between the given values. */
async function templateEdits(c: Checkout, id: string, values: string[], reps: number): Promise<number[]> {
  const engine = c.createEngine(c.parse(c.template).doc);
  await engine.settled();
  const times: number[] = [];
  for (let k = 0; k < reps; k++) {
    const next = c.setInputValue(engine.doc, id, values[k % values.length]);
    const t0 = performance.now();
    engine.update(next);
    await engine.settled();
    times.push(performance.now() - t0);
  }
  engine.dispose();
  return times.slice(Math.floor(reps / 5));
}

/** (c) for each checkout, in rounds that alternate between them so both see the same load. */
async function templateBench(checkouts: Checkout[], reps: number): Promise<void> {
  const cases = [{ name: "f'c 5000 ↔ 6000 psi", id: 'i15', values: ['6000 psi', '5000 psi'] }, { name: 'floors 4 ↔ 5', id: 'i5', values: ['5', '4'] }];
  const rounds = 5;
  for (const c of cases) {
    const samples = checkouts.map(() => [] as number[]);
    for (let r = 0; r < rounds; r++) {
      for (let i = 0; i < checkouts.length; i++) samples[i].push(...await templateEdits(checkouts[i], c.id, c.values, Math.ceil(reps / rounds) + 4));
    }
    const meds = samples.map(median);
    const parts = checkouts.map((k, i) => `${k.label} ${meds[i].toFixed(3)} ms`);
    const ratio = meds.length > 1 ? `   ratio ${(meds[0] / meds[1]).toFixed(2)}` : '';
    console.log(`(c) main template, edit ${c.name}:   ${parts.join('   ')}${ratio}`);
  }
}

async function main() {
  const reps = Number(process.env.BENCH_REPS ?? 60);
  const small = generated(100);
  const large = generated(2000);
  const editSmall = await timeEdits(small, 'edit', ['3', '4'], reps);
  const editLarge = await timeEdits(large, 'edit', ['3', '4'], reps);
  const fullEngine = await timeEdits(large, 'root', ['2', '1.5'], reps);
  const fullBare = bareLoop(large, reps);
  const f = (x: number) => `${x.toFixed(3)} ms`;
  console.log('Loadtrace engine benchmark (medians of', reps, 'runs, Node', process.version + ')');
  console.log(`(a) edit reaching 10 dependents:  100 cells ${f(editSmall)}   2000 cells ${f(editLarge)}   ratio ${(editLarge / editSmall).toFixed(2)} (target <= 1.5)`);
  console.log(`(b) full recompute, 2000 cells:   engine ${f(fullEngine)}   bare mathjs loop ${f(fullBare)}   ratio ${(fullEngine / fullBare).toFixed(2)} (target <= 3)`);
  const here = await checkout(join(import.meta.dirname, '..'), process.env.BENCH_BASE ? 'this checkout' : 'engine');
  const base = process.env.BENCH_BASE ? [await checkout(process.env.BENCH_BASE, 'base')] : [];
  await templateBench([here, ...base], reps);
}

if (import.meta.url === `file://${process.argv[1]}`) void main();
