// Groundwater and eccentric loads in the bearing capacity, and the note on IBC's least presumptive
// value. Das, Principles of Foundation Engineering (water-table cases; Meyerhof's effective area,
// both from memory as to section numbers); hand calculations written out.

import { describe, expect, it } from 'vitest';
import { call, num } from './support-call';
import { LibraryError } from '../../runtime/library/types';
import { deg, ft, kN, kPa, m, pcf, psf } from '../../runtime/units/si';

const gw = 9806.65 / pcf; // 62.43 pcf: ρw g = 1000 kg/m³ × 9.80665 m/s² (common practice)

describe('groundwater: effective overburden and the γ of the 0.5γBNγ term', () => {
  // γ = 120 pcf, γsat = 130 pcf, Df = 4.5 ft, B = 14 ft; γ' = 130 − 62.43 = 67.57 pcf.
  const sub = 130 - gw;
  it('water above the base (Dw = 2 ft): q = γDw + γ′(Df − Dw), γ′ below', () => {
    // q = 120·2 + 67.57·2.5 = 408.9 psf
    expect(num('q_overburden_gw', 120 * pcf, 130 * pcf, 4.5 * ft, 2 * ft) / psf).toBeCloseTo(240 + sub * 2.5, 6);
    expect(num('q_overburden_gw', 120 * pcf, 130 * pcf, 4.5 * ft, 2 * ft) / psf).toBeCloseTo(408.9, 1);
    expect(num('gamma_bearing_gw', 120 * pcf, 130 * pcf, 4.5 * ft, 2 * ft, 14 * ft) / pcf).toBeCloseTo(sub, 6);
  });
  it('water within B below the base (Dw = 10 ft): q = γDf, γ′ + (Dw − Df)/B·(γ − γ′)', () => {
    // (10 − 4.5)/14 = 0.3929 → 67.57 + 0.3929·52.43 = 88.17 pcf
    expect(num('q_overburden_gw', 120 * pcf, 130 * pcf, 4.5 * ft, 10 * ft) / psf).toBeCloseTo(540, 6);
    expect(num('gamma_bearing_gw', 120 * pcf, 130 * pcf, 4.5 * ft, 10 * ft, 14 * ft) / pcf).toBeCloseTo(sub + (5.5 / 14) * (120 - sub), 6);
    expect(num('gamma_bearing_gw', 120 * pcf, 130 * pcf, 4.5 * ft, 10 * ft, 14 * ft) / pcf).toBeCloseTo(88.17, 2);
  });
  it('water deeper than B below the base: no change', () => {
    expect(num('gamma_bearing_gw', 120 * pcf, 130 * pcf, 4.5 * ft, 20 * ft, 14 * ft) / pcf).toBeCloseTo(120, 9);
  });
  it('SI: γ = 18, γsat = 20 kN/m³, Df = 1.5 m, Dw = 1.0 m → q = 18 + 10.193·0.5 = 23.10 kPa', () => {
    expect(num('q_overburden_gw', 18 * kN, 20 * kN, 1.5 * m, 1 * m) / kPa).toBeCloseTo(18 + (20 - 9.80665) * 0.5, 6);
    expect(() => num('q_overburden_gw', 18 * kN, 9 * kN, 1.5, 1)).toThrow(/must exceed the unit weight of water/);
  });
});

describe("eccentric load: B' = B − 2e", () => {
  it('8 ft footing, e = 1 ft → 6 ft; e ≥ B/2 refused', () => {
    expect(num('b_eff', 8 * ft, 1 * ft) / ft).toBeCloseTo(6, 9);
    expect(() => num('b_eff', 8 * ft, 4 * ft)).toThrow(LibraryError);
  });
  it("Terzaghi on the effective rectangle: the lower of the strip and square factors, 1.0cNc + qNq + 0.4γB'Nγ", () => {
    // φ = 30°: Nc = 37.16, Nq = 22.46, Nγ = 19.13 (Das Table 3.1); c = 10 kPa, q = 20 kPa, γ = 18 kN/m³, B' = 1.5 m:
    // 10·37.16 + 20·22.46 + 0.4·18·1.5·19.13 = 371.6 + 449.2 + 206.6 = 1027.5 kPa (square would add 0.3·371.6 = 111.5).
    const rect = num('qu_terzaghi', 10 * kPa, 20 * kPa, 18 * kN, 1.5, 30 * deg, 'rectangular') / kPa;
    const nc = num('nc_terzaghi', 30 * deg), nq = num('nq_terzaghi', 30 * deg);
    expect(rect).toBeCloseTo(10 * nc + 20 * nq + 0.4 * 18 * 1.5 * 19.13, 6);
    expect(Math.abs(rect - 1027.5)).toBeLessThan(0.3);
  });
  it("general equation: shape factors on B'/L, depth factors on the full width B", () => {
    // φ = 30°, c = 0, q = 20 kPa, γ = 0, B' = 1.5 m, L = 2 m, Df = 1 m, depth on B = 2 m (Hansen):
    // dq = 1 + 2·tan30·(1 − sin30)²·(1/2) = 1.14434; sq = 1 + 0.75·tan30 = 1.43301; qu = 20·18.401·1.43301·1.14434 = 603.5 kPa.
    const nq = Math.exp(Math.PI * Math.tan(30 * deg)) * Math.tan(60 * deg) ** 2; // Reissner, 18.401
    const dq = 1 + 2 * Math.tan(30 * deg) * (1 - Math.sin(30 * deg)) ** 2 * 0.5;
    const sq = 1 + 0.75 * Math.tan(30 * deg);
    expect(num('qu_general', 0, 20 * kPa, 0, 1.5, 2, 1, 30 * deg, 'vesic', 'hansen', 2) / kPa).toBeCloseTo(20 * nq * sq * dq, 6);
    // Without B_depth the depth factor would use B' = 1.5 m (k = 0.667): a higher, unconservative dq.
    expect(num('qu_general', 0, 20 * kPa, 0, 1.5, 2, 1, 30 * deg)).toBeGreaterThan(num('qu_general', 0, 20 * kPa, 0, 1.5, 2, 1, 30 * deg, 'vesic', 'hansen', 2));
  });
});

describe('IBC 2021 Table 1806.2: below its least value, 1500 psf (class 5), a soils investigation may be required', () => {
  it('says so below 1500 psf, and not at or above it', () => {
    expect(call('presumptive_note', 1000 * psf)).toMatch(/^Below 1500 psf.*geotechnical investigation may be required/);
    expect(call('presumptive_note', 1500 * psf)).toMatch(/^At or above 1500 psf/);
    expect(call('presumptive_note', 3000 * psf)).toMatch(/^At or above/);
  });
});
