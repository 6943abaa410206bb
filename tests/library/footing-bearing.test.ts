import { describe, expect, it } from 'vitest';
import { num } from './support-call';
import { LibraryError } from '../../runtime/library/types';
import { ft, inch, kip, kN, mm, MPa, psi } from '../../runtime/units/si';

const in2 = inch * inch;

describe('bearing at the column–footing interface, ACI 318-19 §22.8', () => {
  it('A2 from the 1:2 frustum inside the footing', () => {
    // ACI 318-19 §22.8.3.2, the frustum rule from memory: 18 x 18 column, 10 x 10 ft footing, h = 24 in:
    // spread 2h = 48 in each side, edge distance 51 in → A2 = (18 + 96)² = 12996 in²
    expect(num('a2_frustum', 18 * inch, 18 * inch, 10 * ft, 10 * ft, 24 * inch) / in2).toBeCloseTo(12996, 6);
    // 30 x 30 in footing: edge at 6 in stops the spread → A2 = 30² = 900 in²
    expect(num('a2_frustum', 18 * inch, 18 * inch, 30 * inch, 30 * inch, 24 * inch) / in2).toBeCloseTo(900, 6);
  });

  it('Bn = 0.85 f\'c A1 √(A2/A1) with √(A2/A1) ≤ 2, φ = 0.65', () => {
    // ACI 318-19 Table 22.8.3.2 (table number from memory): f'c = 3000, A1 = 324 in², A2 = 12996 → √ = 6.33 → 2:
    // Bn = 0.85·3·324·2 = 1652.4 kip; φBn = 0.65·1652.4 = 1074.06 kip
    expect(num('bn_bearing', 3000 * psi, 324 * in2, 12996 * in2) / kip).toBeCloseTo(1652.4, 6);
    expect(num('phi_bn_bearing', 3000 * psi, 324 * in2, 12996 * in2) / kip).toBeCloseTo(1074.06, 6);
    // A2 = 900 in²: √(900/324) = 1.6667 → Bn = 0.85·3·324·1.6667 = 1377.0 kip
    expect(num('bn_bearing', 3000 * psi, 324 * in2, 900 * in2) / kip).toBeCloseTo(1377, 6);
    // column side (no A2): 0.85·5·324 = 1377 kip
    expect(num('bn_bearing', 5000 * psi, 324 * in2) / kip).toBeCloseTo(1377, 6);
  });

  it('SI: 450 x 450 mm column on a 2.5 x 2.5 m, 600 mm footing, f\'c = 25 MPa', () => {
    // frustum: spread 1200 mm, edge 1025 mm → A2 = 2.5² = 6.25 m²; √(6.25/0.2025) = 5.56 → 2
    // Bn = 0.85·25·202500·2 = 8606.25 kN; φBn = 5594.06 kN (by hand)
    const a2 = num('a2_frustum', 450 * mm, 450 * mm, 2.5, 2.5, 600 * mm);
    expect(a2).toBeCloseTo(6.25, 9);
    expect(num('phi_bn_bearing', 25 * MPa, 0.2025, a2) / kN).toBeCloseTo(5594.0625, 4);
  });

  it('dowels carry the bearing excess: As ≥ max((Pu − φBn)/(φ fy), 0.005 Ag)', () => {
    // ACI 318-19 §16.3.1.2(a) and §16.3.4.1 (from memory), φ = 0.65 (textbook use, from memory):
    // Pu = 600 kip on φBn = 447.5 kip, Grade 60: (600 − 447.5)/(0.65·60) = 3.910 in² > 0.005·324 = 1.62 in².
    expect(num('as_dowel_req', 600 * kip, 447.5 * kip, 60000 * psi, 324 * in2) / in2).toBeCloseTo(152.5 / 39, 9);
    // No excess: the minimum governs.
    expect(num('as_dowel_req', 400 * kip, 447.5 * kip, 60000 * psi, 324 * in2) / in2).toBeCloseTo(1.62, 9);
    // fy is not taken above 80 ksi for bars in compression (§22.4.2.1, from memory): 152.5/(0.65·80) = 2.933 in².
    expect(num('as_dowel_req', 600 * kip, 447.5 * kip, 100000 * psi, 324 * in2) / in2).toBeCloseTo(152.5 / 52, 9);
    // SI: Pu = 3000 kN, φBn = 2500 kN, fy = 420 MPa, Ag = 0.16 m²: 500e3/(0.65·420e6) = 1831.5 mm² > 800 mm².
    expect(num('as_dowel_req', 3000 * kN, 2500 * kN, 420 * MPa, 0.16) / (mm * mm)).toBeCloseTo(500e3 / (0.65 * 420), 6);
  });

  it('dowels: 0.005 Ag', () => {
    // ACI 318-19 §16.3.4.1 (clause number from memory): 0.005·324 = 1.62 in²
    expect(num('as_dowel_min', 324 * in2) / in2).toBeCloseTo(1.62, 10);
  });

  it('rejects A2 < A1, a column larger than the footing, and negative areas', () => {
    expect(() => num('bn_bearing', 3000 * psi, 324 * in2, 100 * in2)).toThrow(LibraryError);
    expect(() => num('bn_bearing', 3000 * psi, 324 * in2, 100 * in2)).toThrow(/A2 must not be smaller than A1/);
    expect(() => num('a2_frustum', 0.5, 0.5, 0.4, 0.4, 0.6)).toThrow(/column is larger than the footing/);
    expect(() => num('as_dowel_min', -1)).toThrow(/Ag must be greater than 0/);
  });
});
