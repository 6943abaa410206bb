// Slab checks at the edge column of punching-edge.lt beyond punching itself: an opening near the
// column that takes part of the critical section out of service, and one-way (wide-beam) shear
// in the slab at d from the column faces, each way. Hand calculations in lb, in, ft, psi, with
// their sources beside them.

import { describe, expect, it } from 'vitest';
import { near, runTemplate } from './helpers';

const FILE = 'punching-edge.lt';
// Defaults: qu = 1.2·145 + 1.6·65 = 278 psf (ASCE 7-22 §2.3.1); ℓ1 = ℓ2 = 22 ft, 20 in square
// column flush with the edge, h = 10 in, d = 10 − 0.75 − 0.625 = 8.625 in (#5), f'c = 5000 psi,
// fy = 60 ksi, curtain wall 300 plf (1.2 D).
const qu = 278, l1 = 22, l2 = 22, c = 20, d = 8.625, sqrtFc = Math.sqrt(5000), wall = 300;
const ln = l1 - c / 12; // 20.333 ft each way (ACI 318-19 §8.10.3.2.2)

/**
 * Edge column, moment about the axis along the edge (ACI 318-19 §22.6.4.1, R8.4.4.2.3, from memory):
 * b1 = c1 + d/2, b2 = c2 + d, x̄ from the face on the edge, Jc of the three sides; γv of Eq. 8.4.2.2.2.
 */
const b1 = c + d / 2, b2 = c + d, bo = 2 * b1 + b2; // 24.3125, 28.625, 77.25 in
const xBar = (2 * b1 * (b1 / 2)) / bo;
const Jc = 2 * ((d * b1 ** 3) / 12 + (b1 * d ** 3) / 12 + b1 * d * (b1 / 2 - xBar) ** 2) + b2 * d * xBar ** 2;
const gv = 1 - 1 / (1 + (2 / 3) * Math.sqrt(b1 / b2));
// Vu = qu·AT + 1.2·wall·ℓ2 − qu·b1·b2 (AT = (ℓ1/2 + c1/2)·ℓ2, half-bay rule, common practice).
const Vu = qu * (l1 / 2 + c / 24) * l2 + 1.2 * wall * l2 - (qu * b1 * b2) / 144; // 78,950 lb
const Msc = 0.3 * ((qu * l2 * ln * ln) / 8) * 12; // 0.3 Mo (ACI 318-19 §8.10.7.3, from memory), lb·in

describe('punching-edge.lt: an opening near the edge column (ACI 318-19 §22.6.4.3, from memory)', () => {
  it('a 12 in opening 10 in from the inner face takes 8.59 in of bo, and the section carries the shear on the rest', async () => {
    const run = await runTemplate(FILE, { w_open: '12 in', x_open: '10 in' });
    try {
      // Tangents from the column centroid through the opening's near corners (20/2 + 10, ±6) in cut the
      // section face at c1/2 + d/2 over 12·(20 + 8.625)/(20 + 2·10) = 8.5875 in ≤ c2 + d = 28.625 in.
      const loss = (12 * (c + d)) / (c + 2 * 10);
      near(run.num('bo_loss'), loss);
      near(run.num('bo_eff'), bo - loss); // 68.66 in
      // Direct shear on the effective perimeter, the moment part on the whole section's Jc (as the main template):
      // vu = 78,950/(68.66·8.625) + 0.381·Msc·x̄/Jc = 133.3 + 71.7 = 205.0 psi against φ·4√f'c = 212.1 psi.
      const vu = Vu / ((bo - loss) * d) + (gv * Msc * xBar) / Jc;
      near(run.num('vu'), vu);
      near(run.ratio('punch_col_ok'), vu / (0.75 * 4 * sqrtFc));
      near(run.num('phiVc'), (0.75 * 4 * sqrtFc * (bo - loss) * d) / 1000);
    } finally {
      run.dispose();
    }
  });

  it('a 30 in opening there fails the punching check it passed without one', async () => {
    const run = await runTemplate(FILE, { w_open: '30 in', x_open: '10 in' });
    try {
      const loss = (30 * (c + d)) / (c + 2 * 10); // 21.47 in
      const vu = Vu / ((bo - loss) * d) + (gv * Msc * xBar) / Jc; // 164.1 + 71.7 = 235.8 psi > 212.1
      near(run.ratio('punch_col_ok'), vu / (0.75 * 4 * sqrtFc));
      expect(run.state('punch_col_ok').status).toBe('fail');
    } finally {
      run.dispose();
    }
  });
});

describe('punching-edge.lt: one-way shear in the slab at d from the column faces', () => {
  // Wide-beam section across the frame at d from the face (ACI 318-19 §8.5.3.1.1, §8.4.3.2, from
  // memory); half the clear span's load, the end-span moments' relief at an exterior support neglected
  // (conservative, common practice). ρw of the minimum steel, 0.0018 h/d (Table 8.6.1.1, from memory);
  // φVc = 0.75·8λs(ρw)^(1/3)√f'c·bw·d, λs = 1 for d ≤ 10 in (Table 22.5.5.1(c), from memory).
  const phiVc = (bwIn: number) => 0.75 * 8 * Math.cbrt((0.0018 * 10) / d) * sqrtFc * bwIn * d;
  const arm = ln / 2 - d / 12; // 9.4479 ft

  it('edge column: across ℓ2 perpendicular to the edge, and along the edge with the wall', async () => {
    const run = await runTemplate(FILE);
    try {
      // Direction 1: Vu1 = 278·22·9.4479 = 57,783 lb; φVc on 264 in = 0.75·8·0.12780·70.711·264·8.625 = 123,450 lb.
      const vu1 = qu * l2 * arm;
      near(run.num('Vu_beam1'), vu1 / 1000);
      near(run.ratio('beam_shear_1_ok'), vu1 / phiVc(l2 * 12));
      // Direction 2, the edge strip ℓ1/2 + c1/2 = 11.833 ft with the wall on it:
      // Vu2 = 278·11.833·9.4479 + 1.2·300·9.4479 = 31,080 + 3,401 = 34,481 lb; φVc on 142 in = 66,400 lb.
      const bw2 = l1 / 2 + c / 24;
      const vu2 = qu * bw2 * arm + 1.2 * wall * arm;
      near(run.num('Vu_beam2'), vu2 / 1000);
      near(run.ratio('beam_shear_2_ok'), vu2 / phiVc(bw2 * 12));
    } finally {
      run.dispose();
    }
  });

  it('corner column: each direction on its edge strip, each with its wall', async () => {
    const run = await runTemplate(FILE, { position: 'corner' });
    try {
      const bw = l2 / 2 + c / 24; // 11.833 ft each way
      const vu = qu * bw * arm + 1.2 * wall * arm; // 34,481 lb
      near(run.num('Vu_beam1'), vu / 1000);
      near(run.num('Vu_beam2'), vu / 1000);
      near(run.ratio('beam_shear_1_ok'), vu / phiVc(bw * 12));
    } finally {
      run.dispose();
    }
  });
});
