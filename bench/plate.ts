// Plate solver benchmark: solve time (median of repeated uncached solves) and errors
// against Timoshenko & Woinowsky-Krieger Table 8 (SSSS) and Table 35 (CCCC, square),
// for the default mesh and a few others. Run: npm run bench:plate

import { parseEdges } from '../runtime/plate/edges';
import { levyPoint } from '../runtime/plate/series';
import { DEFAULT_MESH, solveUnitPlate } from '../runtime/plate/unit';

interface Row { code: string; r: number; what: 'w' | 'mx' | 'my' | 'mx_edge'; printed: number; source: string }

// Printed values, /work/shared/reference-values.md (a.1), (a.2).
const rows: Row[] = [
  { code: 'SSSS', r: 1.0, what: 'w', printed: 0.00406, source: 'T8' },
  { code: 'SSSS', r: 1.0, what: 'mx', printed: 0.0479, source: 'T8' },
  { code: 'SSSS', r: 1.0, what: 'my', printed: 0.0479, source: 'T8' },
  { code: 'SSSS', r: 1.5, what: 'w', printed: 0.00772, source: 'T8' },
  { code: 'SSSS', r: 1.5, what: 'mx', printed: 0.0812, source: 'T8' },
  { code: 'SSSS', r: 1.5, what: 'my', printed: 0.0498, source: 'T8' },
  { code: 'SSSS', r: 2.0, what: 'w', printed: 0.01013, source: 'T8' },
  { code: 'SSSS', r: 2.0, what: 'mx', printed: 0.1017, source: 'T8' },
  { code: 'SSSS', r: 2.0, what: 'my', printed: 0.0464, source: 'T8' },
  { code: 'CCCC', r: 1.0, what: 'w', printed: 0.00126, source: 'T35' },
  { code: 'CCCC', r: 1.0, what: 'mx', printed: 0.0231, source: 'T35 (accurate 0.0229)' },
  { code: 'CCCC', r: 1.0, what: 'mx_edge', printed: -0.0513, source: 'T35' },
];

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

function time(r: number, code: string, n: number, reps: number): number {
  const edges = parseEdges(code);
  const t: number[] = [];
  for (let i = 0; i < reps; i++) {
    const t0 = performance.now();
    solveUnitPlate(r, edges, 0.3, n);
    t.push(performance.now() - t0);
  }
  return median(t);
}

const pct = (x: number, ref: number) => (100 * (x - ref)) / Math.abs(ref);

function errors(n: number): { table: number[]; exact: number[] } {
  const table: number[] = [], exact: number[] = [];
  for (const row of rows) {
    const c = solveUnitPlate(row.r, parseEdges(row.code), 0.3, n).coefficients;
    table.push(pct(c[row.what], row.printed));
    if (row.code === 'SSSS') {
      const L = levyPoint(row.r, 0.3, 0.5, row.r / 2);
      exact.push(pct(c[row.what], row.what === 'w' ? L.w : row.what === 'mx' ? L.mx : L.my));
    }
  }
  return { table, exact };
}

// Warm the JIT, then measure.
time(1, 'SSSS', DEFAULT_MESH, 10);
console.log(`Default mesh n = ${DEFAULT_MESH} elements across the short side`);
for (const [code, r] of [['SSSS', 1], ['SSSS', 1.5], ['SSSS', 2], ['CCCC', 1], ['SSSF', 1]] as const) {
  const s = solveUnitPlate(r, parseEdges(code), 0.3, DEFAULT_MESH);
  console.log(`  solve ${code} b/a=${r} (${s.mesh.nx}x${s.mesh.ny} elements, ${s.dofs} dofs, half-band ${s.bandwidth}): median ${time(r, code, DEFAULT_MESH, 21).toFixed(2)} ms of 21`);
}
const d = errors(DEFAULT_MESH);
console.log('  value                 printed    computed   err vs printed');
rows.forEach((row, i) => {
  const c = solveUnitPlate(row.r, parseEdges(row.code), 0.3, DEFAULT_MESH).coefficients[row.what];
  console.log(`  ${row.source.padEnd(4).slice(0, 4)} ${row.code} b/a=${row.r.toFixed(1)} ${row.what.padEnd(8)} ${String(row.printed).padStart(9)} ${c.toFixed(6).padStart(10)} ${d.table[i].toFixed(3).padStart(8)} %  ${row.source.length > 4 ? row.source.slice(4) : ''}`);
});
console.log('\nMesh study (SSSS b/a=1.5 timing; errors: max |%| over the 12 table values, and SSSS vs exact Lévy series)');
console.log('   n  median ms   max err vs tables   max err vs series');
for (const n of [4, 8, 12, 16, 24, 32]) {
  const e = errors(n);
  const mx = (v: number[]) => Math.max(...v.map(Math.abs));
  console.log(`  ${String(n).padStart(2)}  ${time(1.5, 'SSSS', n, n > 24 ? 5 : 11).toFixed(2).padStart(9)}   ${mx(e.table).toFixed(4).padStart(12)} %    ${mx(e.exact).toExponential(2).padStart(12)} %`);
}
