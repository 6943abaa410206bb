// Bearing at the column–footing interface: where Pu exceeds the design bearing strength, the
// excess goes to the dowels (ACI 318-19 §16.3.1.2(a), from memory) and their area is also at
// least 0.005 Ag (§16.3.4.1, from memory): As ≥ max((Pu − φBn)/(φ fy), 0.005 Ag), φ = 0.65 for
// bars in compression across the interface (textbook practice, e.g. Wight & MacGregor, from memory).

import { describe, expect, it } from 'vitest';
import { near, runTemplate, type Run } from './helpers';

function checks(run: Run, clause: RegExp): { name: string; ratio: number; status: string }[] {
  return run.doc.cells
    .filter((c) => c.kind === 'check' && clause.test(c.clause ?? ''))
    .map((c) => {
      const st = run.engine.state(c.id)!;
      return { name: ('name' in c && c.name) || c.id, ratio: st.ratio ?? NaN, status: st.status };
    });
}

// spread-footing.lt with a 14 in square column of 2500 psi concrete: Pu = 1.2·180 + 1.6·95 = 368 kip
// (ASCE 7-22 §2.3.1, comb. 2). A1 = 196 in²; the column governs the bearing:
// φBn = 0.65·0.85·2500·196 = 270,725 lb (ACI 318-19 §22.8.3.2, φ Table 21.2.1);
// the footing gives 0.65·0.85·4000·196·2 = 866,320 lb (√(A2/A1) capped at 2).
const Pu = 1.2 * 180_000 + 1.6 * 95_000;
const phiBn = 0.65 * 0.85 * 2500 * 196;
// Dowels: (368,000 − 270,725)/(0.65·60,000) = 2.494 in² > 0.005·196 = 0.98 in².
const asReq = Math.max((Pu - phiBn) / (0.65 * 60000), 0.005 * 196);
const sets = { c1: '14 in', c2: '14 in', fc_col: '2500 psi' };

describe('spread-footing.lt: the bearing excess is carried by the dowels', () => {
  it('4 #8 dowels (3.16 in²) carry the 97.3 kip excess: no bearing failure', async () => {
    near(asReq, 2.494, 1e-3);
    const run = await runTemplate('spread-footing.lt', { ...sets, bar_dowel: '#8' });
    try {
      const interface_ = checks(run, /§22\.8|§16\.3/);
      expect(interface_.length).toBeGreaterThan(0);
      for (const c of interface_) expect(c.status, c.name).toBe('ok');
      const dowel = interface_.find((c) => /dowel/.test(c.name))!;
      near(dowel.ratio, asReq / (4 * 0.79)); // #8 = 0.79 in² (ASTM A615)
    } finally {
      run.dispose();
    }
  });

  it('4 #6 dowels (1.76 in²) meet 0.005 Ag but not the excess: the dowel check fails at 1.417', async () => {
    const run = await runTemplate('spread-footing.lt', { ...sets, bar_dowel: '#6' });
    try {
      const dowel = checks(run, /§16\.3/).find((c) => /dowel/.test(c.name))!;
      near(dowel.ratio, asReq / (4 * 0.44)); // #6 = 0.44 in²
      expect(dowel.status).toBe('fail');
    } finally {
      run.dispose();
    }
  });
});

describe('load-path.lt: the same rule at the foot of the traced column', () => {
  it('16 in column of 2500 psi concrete: 8 #7 dowels carry the 169.6 kip excess', async () => {
    // Pu: w_col = 256/144·150 = 266.7 lb/ft; PD = 528·(132.5 + 4·137.5) + 5·266.7·10 = 373,693 lb;
    // 1.4D = 523,170 lb governs over 1.2D + 1.6L + 0.5Lr = 509,563 lb (ASCE 7-22 §2.3.1).
    const PL = 4 * 528 * 40 * (0.25 + 15 / Math.sqrt(4 * 4 * 528)); // ASCE 7-22 Eq. 4.7-1, from memory
    const PD = 528 * (132.5 + 4 * 137.5) + 5 * ((256 / 144) * 150) * 10;
    const PuLp = Math.max(1.4 * PD, 1.2 * PD + 1.6 * PL + 0.5 * 528 * 20, 1.2 * PD + 1.6 * 528 * 20 + PL);
    near(PuLp, 523_170, 1e-5);
    // φBn,col = 0.65·0.85·2500·256 = 353,600 lb < φBn,footing = 0.65·0.85·4000·256·2 = 1,131,520 lb.
    const bearing = 0.65 * 0.85 * 2500 * 256;
    // As = (523,170 − 353,600)/(0.65·60,000) = 4.348 in² > 0.005·256 = 1.28 in²; 8 #7 = 4.80 in².
    const need = Math.max((PuLp - bearing) / (0.65 * 60000), 0.005 * 256);
    near(need, 4.348, 1e-3);
    const run = await runTemplate('load-path.lt', { c1: '16 in', c2: '16 in', fc_col: '2500 psi', n_dowel: '8' });
    try {
      near(run.num('P_excess'), (PuLp - bearing) / 1000);
      near(run.ratio('dowel_ok'), need / (8 * 0.6)); // #7 = 0.60 in² (ASTM A615)
      expect(run.state('dowel_ok').status).toBe('ok');
      const interface_ = checks(run, /§22\.8|§16\.3/);
      for (const c of interface_) expect(c.status, c.name).toBe('ok');
    } finally {
      run.dispose();
    }
  });
});
