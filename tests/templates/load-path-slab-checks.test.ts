// The slab checks a reviewer expects at the column, in the main template: one-way shear across the
// panel at d from the column faces, top bar development within their extension, the
// structural-integrity bars through the column core, the column concrete through the floor, and an
// opening near the column. Hand calculations in lb, in, ft, psi, psf, sources beside them.

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { near, runTemplate, type Run } from './helpers';

const FILE = 'load-path.lt';
// Defaults: qu = 1.2·137.5 + 1.6·40 = 229 psf (ASCE 7-22 §2.3.1); ℓ1 = 24 ft, ℓ2 = 22 ft, 20 in columns,
// h = 9 in, d = 9 − 0.75 − 0.625 = 7.625 in (#5), f'c = 5000 psi, fy = 60 ksi.
const qu = 229, l1 = 24, l2 = 22, d = 7.625, sqrtFc = Math.sqrt(5000);
const ln1 = l1 - 20 / 12, ln2 = l2 - 20 / 12; // 22.333 and 20.333 ft

describe('load-path.lt slab checks at the defaults', () => {
  let run: Run;
  beforeAll(async () => {
    run = await runTemplate(FILE);
  });
  afterAll(() => run.dispose());

  it('one-way shear across the panel width at d from the column faces, each direction', () => {
    // Section at d from the face (ACI 318-19 §8.4.3.2, from memory), interior span by statics:
    // Vu1 = 229·22·(22.333/2 − 7.625/12) = 229·22·10.531 = 53,056 lb.
    const vu1 = qu * l2 * (ln1 / 2 - d / 12);
    near(run.num('Vu_beam1'), vu1 / 1000);
    // Top steel across ℓ2: #5 at 8.5 in over 11 ft and at 18 in over 11 ft = 4.814 + 2.273 = 7.087 in²;
    // ρw = 7.087/(264·7.625) = 0.003521. Table 22.5.5.1(c), λs = 1 (d ≤ 10 in):
    // φVc = 0.75·8·(0.003521)^(1/3)·70.71·264·7.625 = 129,940 lb.
    const As = (0.31 / 8.5) * 132 + (0.31 / 18) * 132;
    const rho = As / (264 * d);
    near(run.num('rho_w_slab'), rho);
    const phiVc1 = 0.75 * 8 * Math.cbrt(rho) * sqrtFc * 264 * d;
    near(run.ratio('beam_shear_1_ok'), vu1 / phiVc1);
    // Direction 2: Vu2 = 229·24·(20.333/2 − 0.6354) = 52,385 lb on ℓ1 = 288 in, ρw of the minimum steel
    // 0.0018·9/7.625 = 0.002125 (Table 8.6.1.1, from memory): φVc = 0.75·8·0.12858·70.71·288·7.625 = 119,800 lb.
    const vu2 = qu * l1 * (ln2 / 2 - d / 12);
    const phiVc2 = 0.75 * 8 * Math.cbrt((0.0018 * 9) / d) * sqrtFc * 288 * d;
    near(run.ratio('beam_shear_2_ok'), vu2 / phiVc2);
  });

  it('top bars developed within their shortest extension, 0.20ℓn', () => {
    // ℓd = 60,000/(25·70.71)·0.625 = 21.21 in, ψt = 1.0: 9 − 0.75 − 0.625 = 7.6 in of concrete below < 12 in
    // (Tables 25.4.2.3 and 25.4.2.5, from memory); extension 0.20·20.333·12 = 48.8 in (Fig. 8.7.4.1.3, from memory).
    near(run.num('ld_top_s'), (60000 / (25 * sqrtFc)) * 0.625);
    near(run.num('ext_top'), 0.2 * ln2 * 12);
  });

  it('structural integrity: the strip bars miss the core at 18 in, the two added bars pass', () => {
    // Core 20 − 2(1.5 + 0.375) − 1.0 = 15.25 in (#8 column bars, #3 ties); ⌊15.25/18⌋ = 0 strip bars, + 2 added.
    near(run.num('w_core'), 15.25);
    expect(run.num('n_through')).toBe(2);
    expect(run.state('integrity_ok').status).toBe('ok');
  });
});

describe('load-path.lt slab checks that fail or change', () => {
  it('no bottom bars added through the column: the integrity check fails (ACI 318-19 §8.7.4.2.2, from memory)', async () => {
    const run = await runTemplate(FILE, { n_int: '0' });
    try {
      expect(run.num('n_through')).toBe(0);
      expect(run.state('integrity_ok').status).toBe('fail');
    } finally {
      run.dispose();
    }
  });

  it('an 8000 psi column in a 5000 psi slab: the floor strength governs the column (8000 > 1.4·5000)', async () => {
    const a = await runTemplate(FILE, { fc_col: '8000 psi' });
    const b = await runTemplate(FILE, { fc_col: '8000 psi', puddled: 'yes' });
    try {
      // ACI 318-19 §15.5.1(b) (from memory): φPn,max = 0.65·0.80·(0.85·5000·(400 − 6.32) + 60,000·6.32)
      // = 0.52·(1,673,140 + 379,200) = 1,067,217 lb with the slab's 5000 psi.
      near(a.num('fc_floor'), 5000);
      near(a.ratio('axial_floor_ok'), a.num('Pu') / (0.52 * (0.85 * 5000 * (400 - 6.32) + 60000 * 6.32) / 1000));
      // §15.5.1(a), column concrete puddled into the floor: 8000 psi.
      near(b.num('fc_floor'), 8000);
    } finally {
      a.dispose();
      b.dispose();
    }
  });

  it('a 12 in opening 10 in from the column face takes 8.29 in of bo (ACI 318-19 §22.6.4.3, from memory)', async () => {
    const run = await runTemplate(FILE, { w_open: '12 in', x_open: '10 in' });
    try {
      // Tangents from the centroid through (20, ±6) in: 12·(20 + 7.625)/(20 + 2·10) = 8.2875 in lost.
      near(run.num('bo_loss'), 8.2875);
      near(run.num('bo_eff'), 110.5 - 8.2875);
      // φVc = 0.75·4√f'c·bo_eff·d = 0.75·282.84·102.21·7.625 = 165,330 lb; Vu = 119,698 lb (load-path.test.ts).
      const phiVc = 0.75 * 4 * sqrtFc * (110.5 - 8.2875) * d;
      near(run.num('phiVc'), phiVc / 1000);
    } finally {
      run.dispose();
    }
  });
});
