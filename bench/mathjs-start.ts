// `npm run bench:mathjs`: what the one mathjs instance (runtime/units/math.ts) costs at
// start-up, in fresh Node processes (module state cannot be reset in one process):
//   import   loading what math.ts imports: the mathjs entry points (Node loads all of them;
//            a bundle only what is used) and trade.ts (the first TS module also warms up tsx)
//   build    importing runtime/units/math.ts once those are loaded: build() of the instance
//   first    the first real uses: parsing formulas and reading the units of inputs as they
//            are written in docs-templates/load-path.lt
// Prints the median of each over RUNS processes (default 15), and the machine's load.
// A/B on a loaded machine: MATH=path/a/math.ts,path/b/math.ts alternates the processes
// between two copies of runtime/units (each with its dimension.ts beside it).

import { spawnSync } from 'node:child_process';
import { availableParallelism, loadavg } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const RUNS = Number(process.env.RUNS ?? 15);
const HERE = fileURLToPath(import.meta.url);
const ROOT = join(dirname(HERE), '..');
const MODULES = (process.env.MATH ?? join(ROOT, 'runtime/units/math.ts')).split(',').map((p) => resolve(p));

// Entry points math.ts may import, loaded before it so `build` holds only the instance.
const MATHJS_ENTRIES = ['mathjs', 'mathjs/number'];

// From docs-templates/load-path.lt: formulas, and inputs as typed (each is parsed as an
// expression, and each name in it is looked up as a unit).
const FORMULAS = [
  'h * wc + SDL',
  'live_reduced(Lo, floors * AT, KLL, floors)',
  'ddm_cs_fraction("negative-interior", l2 / l1) * M_neg',
  'phi_action("shear") * vc * bo * d',
  'c2 + 3 * h',
  'ceil(As_f / bar_area(bar_f))',
  '6 in <= d_f',
];
const INPUTS = ['24 ft', '150 pcf', '25 psf', '5000 psi', '60 ksi', '0.75 in', '32 in', '120 pcf'];
const UNITS = ['ft^2', 'psf', 'kip', 'kip*ft', 'in^2', 'klf', 'ksf'];

interface Sample {
  import: number;
  build: number;
  first: number;
}

async function child(mathModule: string): Promise<void> {
  const t0 = performance.now();
  for (const entry of MATHJS_ENTRIES) await import(entry);
  await import(pathToFileURL(join(dirname(mathModule), 'trade.ts')).href);
  const t1 = performance.now();
  const { math } = (await import(pathToFileURL(mathModule).href)) as typeof import('../runtime/units/math');
  const t2 = performance.now();
  const dimension = pathToFileURL(join(dirname(mathModule), 'dimension.ts')).href;
  const { isUnitName, unitInfo } = (await import(dimension)) as typeof import('../runtime/units/dimension');
  const t3 = performance.now();
  let sink = 0;
  for (const f of FORMULAS) sink += JSON.stringify(math.parse(f)).length;
  for (const text of INPUTS) {
    const node = math.parse(text) as any;
    node.traverse((n: any) => {
      if (n.type === 'SymbolNode' && isUnitName(n.name)) sink += unitInfo(n.name).factor;
    });
  }
  for (const u of UNITS) sink += unitInfo(u).factor;
  const t4 = performance.now();
  if (!Number.isFinite(sink)) throw new Error('bad units');
  const sample: Sample = { import: t1 - t0, build: t2 - t1, first: t4 - t3 };
  process.stdout.write(JSON.stringify(sample));
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

function run(mathModule: string): Sample {
  const out = spawnSync(process.execPath, ['--import', 'tsx', HERE, '--child', mathModule], { cwd: ROOT, encoding: 'utf8' });
  if (out.status !== 0) throw new Error(`child failed:\n${out.stderr}`);
  return JSON.parse(out.stdout) as Sample;
}

function parent(): void {
  const samples = MODULES.map(() => [] as Sample[]);
  const load = [loadavg()[0]];
  // One warm-up process each (tsx fills its transform cache), then RUNS measured ones,
  // taking turns so that load from other work falls on every variant alike.
  MODULES.forEach((m) => run(m));
  for (let i = 0; i < RUNS; i++) {
    MODULES.forEach((m, k) => samples[k].push(run(m)));
    load.push(loadavg()[0]);
  }
  console.log(`mathjs instance start-up, median of ${RUNS} fresh Node processes each`);
  MODULES.forEach((m, k) => {
    if (MODULES.length > 1) console.log(`\n${m}`);
    const row = (label: string, xs: number[]) =>
      console.log(`${label.padEnd(34)} ${median(xs).toFixed(1).padStart(7)} ms   (min ${Math.min(...xs).toFixed(1)}, max ${Math.max(...xs).toFixed(1)})`);
    row('import mathjs entries, trade.ts', samples[k].map((s) => s.import));
    row('build the instance (math.ts)', samples[k].map((s) => s.build));
    row('first uses (parse, units)', samples[k].map((s) => s.first));
    row('build + first uses', samples[k].map((s) => s.build + s.first));
  });
  console.log(`\nload average (1 min) during the runs: ${Math.min(...load).toFixed(2)}–${Math.max(...load).toFixed(2)} on ${availableParallelism()} cores`);
}

const at = process.argv.indexOf('--child');
if (at >= 0) await child(process.argv[at + 1]);
else parent();
