// Crack-control spacing of ACI 318-19 Table 24.3.2 where one-way slab or footing bars are
// spaced: s ≤ 15(40,000/fs) − 2.5cc and ≤ 12(40,000/fs) (in, psi), with fs = (2/3)fy permitted
// (§24.3.2.1). The table and its fs rule are from memory. It reaches one-way slabs through
// §7.7.2.2 and isolated footings through §13.3.3.1 → Chapter 7 (clause chain from memory).

import { describe, expect, it } from 'vitest';
import { runTemplate } from './helpers';

/** Table 24.3.2 for deformed bars, in inches: fs in psi, cc the clear cover to the tension face. */
function sCrack(fs: number, cc: number): number {
  return Math.min(15 * (40000 / fs) - 2.5 * cc, 12 * (40000 / fs));
}

describe('one-way-strip.lt: #4 bars at 18 in no longer pass', () => {
  it('every flexural bar spacing is within the crack-control spacing, 12 in', async () => {
    const run = await runTemplate('one-way-strip.lt');
    try {
      // fs = (2/3)·60,000 = 40,000 psi, cc = 0.75 in: min(15 − 1.875, 12) = min(13.125, 12) = 12 in.
      const s = sCrack((2 / 3) * 60000, 0.75);
      expect(s).toBeCloseTo(12, 12);
      for (const name of ['s_neg', 's_pos', 's_ext']) expect(run.num(name)).toBeLessThanOrEqual(s + 1e-9);
    } finally {
      run.dispose();
    }
  });
});

describe('footings: bottom bars at 3 in cover', () => {
  // fs = 40,000 psi, cc = 3 in: min(15 − 7.5, 12) = 7.5 in.
  const s = sCrack(40000, 3);

  it('load-path.lt footing bars', async () => {
    expect(s).toBeCloseTo(7.5, 12);
    const run = await runTemplate('load-path.lt');
    try {
      const spacings = run.doc.cells.flatMap((c) => (c.kind === 'formula' && /^s_f/.test(c.name) ? [run.num(c.name)] : []));
      expect(spacings.length).toBeGreaterThan(0);
      for (const v of spacings) expect(v).toBeLessThanOrEqual(s + 1e-9);
    } finally {
      run.dispose();
    }
  });

  it('spread-footing.lt, 9 × 12 ft: bars along L, in the band and outside it', async () => {
    const run = await runTemplate('spread-footing.lt', { L: '12 ft' });
    try {
      expect(run.num('s_L')).toBeLessThanOrEqual(s + 1e-9);
      expect(run.num('s_band')).toBeLessThanOrEqual(s + 1e-9);
      // Outside the central band (ACI 318-19 §13.3.3.3(b), from memory): n_side bars over (L − B)/2 = 18 in each side.
      expect(18 / run.num('n_side')).toBeLessThanOrEqual(s + 1e-9);
    } finally {
      run.dispose();
    }
  });
});
