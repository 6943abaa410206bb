import { describe, expect, it } from 'vitest';
import { num } from './support-call';
import { LibraryError } from '../../runtime/library/types';
import { ft, inch, ksi, mm, MPa, psi } from '../../runtime/units/si';

const fc = 4000 * psi; // √f'c = 63.246 psi
const fy = 60 * ksi;

describe('ld_bottom, ACI 318-19 Table 25.4.2.3 (simplified)', () => {
  it('#6 and #8 bars, spacing and cover condition met', () => {
    // Table 25.4.2.3 coefficients 25 (No. 6 and smaller) and 20 (No. 7 and larger), from memory:
    // #6: 60000/(25·63.246)·0.75 = 28.46 in; #8: 60000/(20·63.246)·1.0 = 47.43 in
    expect(num('ld_bottom', 0.75 * inch, fy, fc) / inch).toBeCloseTo(28.46, 2);
    expect(num('ld_bottom', 1.0 * inch, fy, fc, true) / inch).toBeCloseTo(47.43, 2);
  });
  it('other cases use 3/40 instead of 1/20: #8 → 71.15 in', () => {
    // from memory: 3·60000/(40·63.246) = 71.15 in
    expect(num('ld_bottom', 1.0 * inch, fy, fc, false) / inch).toBeCloseTo(71.15, 2);
  });
  it('ψg by edition: Grade 80 is 1.15 in 318-19, absent in 318-14', () => {
    // Table 25.4.2.5 ψg (from memory): 80000·1.15/(20·63.246) = 72.73 in; 318-14: 63.25 in
    expect(num('ld_bottom', 1.0 * inch, 80 * ksi, fc) / inch).toBeCloseTo(72.73, 2);
    expect(num('ld_bottom', 1.0 * inch, 80 * ksi, fc, true, 1, 1, '318-14') / inch).toBeCloseTo(63.25, 2);
  });
  it('is never less than 12 in', () => {
    // §25.4.2.1 (from memory): #3 at f'c = 10000 psi gives 60000/(25·100)·0.375 = 9.0 in → 12 in
    expect(num('ld_bottom', 0.375 * inch, fy, 10000 * psi) / inch).toBeCloseTo(12, 10);
  });
  it('SI input agrees with the SI table form fy/(2.1λ√f\'c)·db within its rounding', () => {
    // ACI 318M SI form (from memory): 20 mm bar, fy = 420 MPa, f'c = 28 MPa → 420/(2.1·5.2915)·20 = 755.9 mm;
    // the exact psi conversion gives 764.7 mm (25 psi^0.5 ≈ 2.076 MPa^0.5), 1.2 % longer
    const ld = num('ld_bottom', 20 * mm, 420 * MPa, 28 * MPa) / mm;
    expect(Math.abs(ld / 755.9 - 1)).toBeLessThan(0.02);
  });
});

describe('ld_bottom_general, Eq. 25.4.2.4(a)', () => {
  it('confinement term capped at 2.5', () => {
    // from memory: #8, cb = 3.5 in, Ktr = 0 → (cb + Ktr)/db = 3.5 → 2.5; ψs = 1.0
    // ℓd = (3/40)(60000/63.246)(1/2.5)·1.0 = 28.46 in
    expect(num('ld_bottom_general', 1.0 * inch, fy, fc, 3.5 * inch) / inch).toBeCloseTo(28.46, 2);
    // #6: ψs = 0.8: (3/40)(948.68)(0.8/2.5)·0.75 = 17.08 in
    expect(num('ld_bottom_general', 0.75 * inch, fy, fc, 3.375 * inch, 0) / inch).toBeCloseTo(17.08, 2);
  });
  it('rejects negative Ktr and an out-of-range ψe', () => {
    expect(() => num('ld_bottom_general', 0.025, 420 * MPa, 28 * MPa, 0.08, -0.01)).toThrow(/Ktr must not be negative/);
    expect(() => num('ld_bottom', 0.025, 420 * MPa, 28 * MPa, true, 1, 2)).toThrow(LibraryError);
  });
});

describe('ld_avail_footing', () => {
  it('(L − c)/2 − cover', () => {
    // 10 ft footing, 18 in column, 3 in cover: 51 − 3 = 48 in (geometry)
    expect(num('ld_avail_footing', 10 * ft, 18 * inch, 3 * inch) / inch).toBeCloseTo(48, 9);
    // SI: (3000 − 450)/2 − 75 = 1200 mm
    expect(num('ld_avail_footing', 3000 * mm, 450 * mm, 75 * mm) / mm).toBeCloseTo(1200, 9);
  });
  it('rejects a footing with no room for the bars', () => {
    expect(() => num('ld_avail_footing', 500 * mm, 450 * mm, 75 * mm)).toThrow(/no length left/);
  });
});

describe('ψg picks the grade, also for SI grades', () => {
  it('Grade 420 counts as Grade 60 and Grade 550 as Grade 80', () => {
    // Table 25.4.2.5 (from memory): Grade 60 (420) 1.0, Grade 80 (550) 1.15, Grade 100 (690) 1.3.
    // Ratios of ℓd at equal db and f'c: 550·1.15/(420·1.0) and 690·1.3/(420·1.0)
    const l420 = num('ld_bottom', 25 * mm, 420 * MPa, 35 * MPa);
    expect(num('ld_bottom', 25 * mm, 550 * MPa, 35 * MPa) / l420).toBeCloseTo((550 * 1.15) / 420, 10);
    expect(num('ld_bottom', 25 * mm, 690 * MPa, 35 * MPa) / l420).toBeCloseTo((690 * 1.3) / 420, 10);
  });
});
