// Column dowels in compression: development into the footing (ACI 318-19 §25.4.9) against
// the depth available, and the lap with the column bars (§25.5.5). Bar diameters from ASTM
// A615/A615M. The clauses' formulas are from memory, as marked.

import { describe, expect, it } from 'vitest';
import { num } from './support-call';
import { inch, ksi, mm, MPa, psi } from '../../runtime/units/si';

const i = inch;

describe('ℓdc, compression development (ACI 318-19 §25.4.9.2, from memory)', () => {
  it('No. 8, Grade 60: 18.97 in at 4000 psi, 18.0 in at 5000 psi (computed from ACI 318-19 §25.4.9.2, from memory)', () => {
    // 4000 psi: 0.02·60000/63.246·1.0 = 18.97 in > 0.0003·60000·1.0 = 18.0 in
    expect(num('ldc', 1.0 * i, 60 * ksi, 4000 * psi) / i).toBeCloseTo(18.974, 3);
    // 5000 psi: 0.02·60000/70.711 = 16.97 in < 18.0 in → 18.0 in
    expect(num('ldc', 1.0 * i, 60 * ksi, 5000 * psi) / i).toBeCloseTo(18.0, 9);
  });

  it('No. 7 into 4000 psi: 0.02·60000/63.246·0.875 = 16.60 in', () => {
    expect(num('ldc', 0.875 * i, 60 * ksi, 4000 * psi) / i).toBeCloseTo(16.602, 3);
  });

  it('ψr = 0.75 with confining ties, never below 8 in (§25.4.9.1)', () => {
    // No. 4: 0.02·60000·0.75/63.246·0.5 = 7.12 in → 8 in
    expect(num('ldc', 0.5 * i, 60 * ksi, 4000 * psi, 0.75) / i).toBeCloseTo(8, 9);
    // No. 8: 18.97·0.75 = 14.23 in
    expect(num('ldc', 1.0 * i, 60 * ksi, 4000 * psi, 0.75) / i).toBeCloseTo(14.230, 3);
    expect(() => num('ldc', 1.0 * i, 60 * ksi, 4000 * psi, 0.8)).toThrow(/psi_r is 1\.0, or 0\.75/);
  });

  it('√f\'c is capped at 100 psi (§25.4.1.4) and lightweight concrete lengthens it', () => {
    // 12000 psi: 0.02·60000/100 = 12 in·db < 18 → 18.0 in for No. 8 (cap matters only for the first term)
    expect(num('ldc', 1.0 * i, 60 * ksi, 12000 * psi) / i).toBeCloseTo(18.0, 9);
    // λ = 0.75, 4000 psi: 18.97/0.75 = 25.30 in
    expect(num('ldc', 1.0 * i, 60 * ksi, 4000 * psi, 1, 0.75) / i).toBeCloseTo(25.298, 3);
  });

  it('SI input: 25 mm bar, 420 MPa, 28 MPa', () => {
    // fy = 60,916 psi, √f'c = √4061.0 = 63.73 psi: 0.02·60916/63.73·25 = 478.0 mm; 0.0003·60916·25 = 456.9 mm
    const fyPsi = 420e6 / 6894.757293168361, root = Math.sqrt(28e6 / 6894.757293168361);
    expect(num('ldc', 25 * mm, 420 * MPa, 28 * MPa) / mm).toBeCloseTo(Math.max(0.02 * fyPsi / root, 0.0003 * fyPsi) * 25, 6);
    expect(num('ldc', 25 * mm, 420 * MPa, 28 * MPa) / mm).toBeCloseTo(478.0, 0);
  });
});

describe('ℓsc, compression lap (ACI 318-19 §25.5.5.1, from memory)', () => {
  it('Grade 60: 0.0005 fy db; Grade 80: (0.0009 fy − 24) db; at least 12 in', () => {
    // No. 7: 0.0005·60000·0.875 = 26.25 in
    expect(num('lsc', 0.875 * i, 60 * ksi, 5000 * psi) / i).toBeCloseTo(26.25, 9);
    // Grade 80 No. 7: (72 − 24)·0.875 = 42.0 in
    expect(num('lsc', 0.875 * i, 80 * ksi, 5000 * psi) / i).toBeCloseTo(42.0, 9);
    // No. 3: 0.0005·60000·0.375 = 11.25 → 12 in
    expect(num('lsc', 0.375 * i, 60 * ksi, 5000 * psi) / i).toBeCloseTo(12, 9);
  });

  it('one third more where f\'c < 3000 psi', () => {
    // 26.25·4/3 = 35.0 in
    expect(num('lsc', 0.875 * i, 60 * ksi, 2500 * psi) / i).toBeCloseTo(35.0, 9);
  });

  it('not for bars larger than No. 11 (§25.5.5.2)', () => {
    expect(() => num('lsc', 1.693 * i, 60 * ksi, 5000 * psi)).toThrow(/No\. 11 bars and smaller/);
  });
});

describe('dowels between footing and column', () => {
  it('lap of different sizes: the larger of ℓdc of the larger bar and ℓsc of the smaller (§25.5.5.4, from memory)', () => {
    // No. 7 dowels, No. 8 column bars, 5000 psi column: ℓdc(No. 8) = max(16.97, 18.0) = 18.0 in;
    // ℓsc(No. 7) = 26.25 in → 26.25 in
    expect(num('lap_dowel_col', 0.875 * i, 1.0 * i, 60 * ksi, 5000 * psi) / i).toBeCloseTo(26.25, 9);
    // No. 11 column bars on No. 6 dowels: ℓdc(No. 11) = 0.0003·60000·1.41 = 25.38 in (> 0.02·60000/70.71·1.41 = 23.93);
    // ℓsc(No. 6) = 0.0005·60000·0.75 = 22.5 in → 25.38 in
    expect(num('lap_dowel_col', 0.75 * i, 1.41 * i, 60 * ksi, 5000 * psi) / i).toBeCloseTo(25.38, 9);
  });

  it('depth available: h − cover − 2 db(mat) − db(dowel), hooks on the mat not counted (§25.4.1.2; common practice)', () => {
    // 32 − 3 − 2·1.0 − 0.875 = 26.125 in
    expect(num('ldc_avail_footing', 32 * i, 3 * i, 1.0 * i, 0.875 * i) / i).toBeCloseTo(26.125, 9);
    // A 14 in footing with No. 9 mat and No. 8 dowels: 14 − 3 − 2.256 − 1.0 = 7.744 in, short of ℓdc = 18.97 in
    expect(num('ldc_avail_footing', 14 * i, 3 * i, 1.128 * i, 1.0 * i) / i).toBeCloseTo(7.744, 9);
    expect(() => num('ldc_avail_footing', 5 * i, 3 * i, 1.0 * i, 1.0 * i)).toThrow(/no depth is left/);
  });
});
