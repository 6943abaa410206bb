// Limits a reviewer expects: εt ≥ 0.004 for slabs and footings with φ taken from εt (ACI 318-19
// §7.3.3.1, §8.3.3.1, from memory; footings through §13.3.3.1), and round columns taken as the
// square of equal area where the code permits (§13.2.7.3 footings, §8.10.3.2.1 DDM; from memory).
// Hand calculations in lb, in, psi, sources beside them.

import { describe, expect, it } from 'vitest';
import { near, runTemplate } from './helpers';

/** εt = 0.003(d − c)/c with c = As fy/(0.85 f'c β1 b) (ACI 318-19 §22.2.2, steel yielding). */
function epsT(As: number, b: number, d: number, fc: number, beta1: number): number {
  const c = (As * 60000) / (0.85 * fc * beta1 * b);
  return (0.003 * (d - c)) / c;
}

describe('εt ≥ 0.004 for slabs and footings', () => {
  it('load path at the defaults: column strip top steel and both footing layers', async () => {
    const run = await runTemplate('load-path.lt');
    try {
      // #5 at 8.5 in over 132 in: As = 4.814 in², d = 7.625 in, 5000 psi (β1 = 0.80, Table 22.2.2.4.3):
      // c = 4.814·60,000/(0.85·5000·0.80·132) = 0.6436 in → εt = 0.003·6.981/0.6436 = 0.03254.
      const slab = epsT((0.31 / 8.5) * 132, 132, 7.625, 5000, 0.8);
      near(slab, 0.03254, 1e-3);
      near(run.ratio('cs_neg_strain_ok'), 0.004 / slab);
      // Footing: 23 #6 = 10.12 in² over 168 in, d = 28.25 in, 4000 psi (β1 = 0.85): εt = 0.0648.
      near(run.ratio('strain_f_ok'), 0.004 / epsT(23 * 0.44, 168, 28.25, 4000, 0.85));
    } finally {
      run.dispose();
    }
  });

  it('spread footing at the defaults: the lesser εt of the two layers', async () => {
    const run = await runTemplate('spread-footing.lt');
    try {
      // Along L: 15 #6 = 6.6 in² over 108 in, d = 24.625 in → 0.0552; along B: 17 #6 = 7.48 in² over 120 in,
      // d = 23.875 in → c = 1.2941 in, εt = 0.003·22.581/1.2941 = 0.05235, the lesser.
      const along = Math.min(epsT(6.6, 108, 24.625, 4000, 0.85), epsT(7.48, 120, 23.875, 4000, 0.85));
      near(along, 0.05235, 1e-3);
      near(run.ratio('strain_ok'), 0.004 / along);
    } finally {
      run.dispose();
    }
  });

  it('a 5 in plate of 3000 psi concrete under 80 psf: εt = 0.0032 < 0.004 fails, and φ < 0.90 from εt', async () => {
    const run = await runTemplate('two-way-ddm.lt', { h: '5 in', fc: '3000 psi', Lo: '80 psf' });
    try {
      // #5 at 4.5 in over the 108 in column strip: As = 7.44 in², d = 5 − 0.75 − 0.3125 = 3.9375 in, β1 = 0.85:
      // c = 7.44·60,000/(0.85·3000·0.85·108) = 1.9070 in, εt = 0.003·(3.9375 − 1.9070)/1.9070 = 0.003194.
      expect(run.num('s_cs_int')).toBeCloseTo(4.5, 9);
      const e = epsT((0.31 / 4.5) * 108, 108, 3.9375, 3000, 0.85);
      near(e, 0.003194, 1e-3);
      near(run.ratio('cs_int_strain_ok'), 0.004 / e);
      expect(run.state('cs_int_strain_ok').status).toBe('fail');
    } finally {
      run.dispose();
    }
  });
});

describe('round columns as squares of equal area', () => {
  it('spread footing under a 20 in round column: side √(π/4)·20 = 17.72 in, bearing on its own area', async () => {
    const run = await runTemplate('spread-footing.lt', { col_shape: 'round', D_col: '20 in' });
    try {
      const side = Math.sqrt(Math.PI / 4) * 20; // 17.725 in
      near(run.num('c1_f'), side);
      near(run.num('A1'), (Math.PI * 20 * 20) / 4); // 314.16 in²
      // Mu at the face of the equivalent square (§13.2.7.1): qu·B·((120 − 17.725)/2)²/2, qu = 368,000/90 psf.
      const qu = 368000 / 90;
      near(run.num('Mu_L'), (qu * 9 * ((120 - side) / 2 / 12) ** 2) / 2 / 1000);
    } finally {
      run.dispose();
    }
  });

  it('two-way-ddm with 18 in round columns: ℓn = 20 ft − 15.95 in', async () => {
    const run = await runTemplate('two-way-ddm.lt', { col_shape: 'round', D_col: '18 in' });
    try {
      near(run.num('ln'), 20 - (Math.sqrt(Math.PI / 4) * 18) / 12); // 18.671 ft
    } finally {
      run.dispose();
    }
  });
});
