// Biaxial bending of a tied rectangular column: Bresler's reciprocal load method (B. Bresler,
// "Design criteria for reinforced concrete columns under axial load and biaxial bending",
// ACI Journal 57, 1960) with design values, and the straight-line contour at low axial load
// (common practice), on the column whose interaction was worked by hand in
// column-interaction.test.ts (its points are restated here with their arithmetic).

import { describe, expect, it } from 'vitest';
import { call, num } from './support-call';
import { inch, kip, psi } from '../../runtime/units/si';

const kipIn = kip * inch;

describe('biaxial bending of a corner column (Bresler 1960)', () => {
  // The 20 × 20 in column of column-interaction.test.ts: 3 #8 on each face, d_s = 2.5 in, 5000 psi, 60 ksi.
  const sec = [5000 * psi, 60 * 1000 * psi, 20 * inch, 20 * inch, 3, 3, '#8', 2.5 * inch] as const;
  // Worked there by hand: Pb = 698.96 kip, Mb = 6182.56 kip·in, so on e = Mb/Pb = 8.8454 in the
  // design strength is φPb = 0.65·698.95 = 454.32 kip; Po = 2052.34 kip, φPo = 0.65·2052.34 = 1334.02 kip.
  const Pb = 698.9532, Mb = 6182.558, phiPo = 0.65 * 2052.34;

  it('reciprocal load: 1/φPni = 1/φP1 + 1/φP2 − 1/φPo, the balanced eccentricity both ways', () => {
    // Pu = 300 kip ≥ 0.1·5·400 = 200 kip; Mu1 = Mu2 = 300·8.8454 = 2653.6 kip·in
    // 1/φPni = 2/454.32 − 1/1334.02 = 0.0044022 − 0.0007496 = 0.0036526 → φPni = 273.78 kip; ratio = 300/273.78 = 1.0958
    const e = Mb / Pb;
    const phiPni = 1 / (2 / (0.65 * Pb) - 1 / phiPo);
    expect(phiPni).toBeCloseTo(273.78, 1);
    const ratio = num('col_biaxial_ratio', 300 * kip, 300 * e * kipIn, 300 * e * kipIn, ...sec);
    expect(ratio).toBeCloseTo(300 / phiPni, 3);
    expect(call('col_biaxial_method', 300 * kip, 300 * e * kipIn, 300 * e * kipIn, ...sec)).toMatch(/Bresler/);
  });

  it('with one moment it is the uniaxial strength along the same line', () => {
    // Mu2 = 0: 1/φPni = 1/φP1 + 1/φPo − 1/φPo = 1/φP1 (Bresler 1960): Pu = 300 kip on e = 8.8454 in → 300/454.32
    const e = Mb / Pb;
    expect(num('col_biaxial_ratio', 300 * kip, 300 * e * kipIn, 0, ...sec)).toBeCloseTo(300 / (0.65 * Pb), 3);
    expect(num('col_pm_ratio', 300 * kip, 300 * e * kipIn, ...sec))
      .toBeCloseTo(300 / (0.65 * Pb), 3);
  });

  it('below 0.1 f\'c Ag the straight-line contour Mu1/φMn1 + Mu2/φMn2 is used (common practice)', () => {
    // Pu = 0 (< 200 kip): φMn = 0.9·3109.12 = 2798.2 kip·in each way (pure bending, worked by hand)
    // Mu1 = Mu2 = 1000 kip·in: 1000/2798.2 · 2 = 0.7147
    expect(num('col_biaxial_ratio', 0, 1000 * kipIn, 1000 * kipIn, ...sec)).toBeCloseTo(2000 / (0.9 * 3109.12), 3);
    expect(call('col_biaxial_method', 0, 1000 * kipIn, 1000 * kipIn, ...sec)).toMatch(/contour/);
  });
});
