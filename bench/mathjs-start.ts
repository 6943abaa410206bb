// `npm run bench:mathjs`: what the one mathjs instance (runtime/units/math.ts) costs at
// start-up, in fresh Node processes (module state cannot be reset in one process):
//   import   loading the mathjs entry points (Node loads all of them; a bundle only what is used)
//   build    importing runtime/units/math.ts once mathjs is loaded: build() of the instance
//   first    the first real uses: parsing formulas and reading the units of inputs as they
//            are written in docs-templates/load-path.lt
// Prints the median of each over RUNS processes (default 15), and the machine's load.

import { spawnSync } from 'node:child_process';
import { loadavg } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const RUNS = Number(process.env.RUNS ?? 15);
const HERE = fileURLToPath(import.meta.url);
const ROOT = join(dirname(HERE), '..');

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

async function child(): Promise<void> {
  const t0 = performance.now();
  for (const entry of MATHJS_ENTRIES) await import(entry);
  const t1 = performance.now();
  const { math } = await import('../runtime/units/math');
  const t2 = performance.now();
  const { isUnitName, unitInfo } = await import('../runtime/units/dimension');
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

function parent(): void {
  const samples: Sample[] = [];
  const load = [loadavg()[0]];
  // One warm-up process (tsx fills its transform cache), then RUNS measured ones.
  for (let i = 0; i < RUNS + 1; i++) {
    const out = spawnSync(process.execPath, ['--import', 'tsx', HERE, '--child'], { cwd: ROOT, encoding: 'utf8' });
    if (out.status !== 0) throw new Error(`child failed:\n${out.stderr}`);
    if (i > 0) samples.push(JSON.parse(out.stdout) as Sample);
    load.push(loadavg()[0]);
  }
  const row = (label: string, key: keyof Sample) => {
    const xs = samples.map((s) => s[key]);
    console.log(`${label.padEnd(34)} ${median(xs).toFixed(1).padStart(7)} ms   (min ${Math.min(...xs).toFixed(1)}, max ${Math.max(...xs).toFixed(1)})`);
  };
  console.log(`mathjs instance start-up, median of ${RUNS} fresh Node processes`);
  row('import mathjs entries', 'import');
  row('build the instance (math.ts)', 'build');
  row('first uses (parse, units)', 'first');
  const total = samples.map((s) => s.build + s.first);
  console.log(`${'build + first uses'.padEnd(34)} ${median(total).toFixed(1).padStart(7)} ms`);
  console.log(`load average (1 min) during the runs: ${Math.min(...load).toFixed(2)}–${Math.max(...load).toFixed(2)} on this machine`);
}

if (process.argv.includes('--child')) await child();
else parent();
