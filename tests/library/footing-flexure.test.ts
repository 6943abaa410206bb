import { describe, expect, it } from 'vitest';
import { num } from './support-call';
import { LibraryError } from '../../runtime/library/types';
import { ft, inch, kip, kipFt, kN, kNm, ksi, mm, MPa, psi } from '../../runtime/units/si';

const in2 = inch * inch;

describe('footing flexure', () => {
  it('Mu at the column face: qu B ℓ²/2 (US)', () => {
    // Pu = 800 kip on 10 x 10 ft, c = 18 in: qu = 8 ksf, ℓ = (120 − 18)/2 = 51 in = 4.25 ft
    // Mu = 8·10·4.25²/2 = 722.5 kip-ft (cantilever statics, common practice)
    expect(num('mu_footing', 800 * kip, 10 * ft, 10 * ft, 18 * inch) / kipFt).toBeCloseTo(722.5, 6);
  });

  it('As by the Whitney block and the 0.0018Ag minimum (US)', () => {
    // §22.2.2.4.1 stress block [CONFIRMED e.3]: Mu = 8670 kip-in, b = 120, d = 20, f'c = 4, fy = 60, φ = 0.90:
    // k = 2·8670/(0.9·0.85·4·120·400) = 0.11806; As = (0.85·4·120·20/60)(1 − √(1 − k)) = 136·(1 − 0.939119) = 8.2798 in²
    const mu = 722.5 * kipFt;
    expect(num('as_req_footing', mu, 120 * inch, 20 * inch, 4000 * psi, 60 * ksi) / in2).toBeCloseTo(8.2798, 3);
    // 0.0018·120·24 = 5.184 in² (ACI 318-19 Table 7.6.1.1, from memory) — the required steel governs here
    expect(num('as_min_footing', 120 * inch, 24 * inch) / in2).toBeCloseTo(5.184, 9);
    expect(num('as_footing', mu, 120 * inch, 20 * inch, 24 * inch, 4000 * psi, 60 * ksi) / in2).toBeCloseTo(8.2798, 3);
    // a small moment: the minimum governs
    expect(num('as_footing', 100 * kipFt, 120 * inch, 20 * inch, 24 * inch, 4000 * psi, 60 * ksi) / in2).toBeCloseTo(5.184, 9);
  });

  it('SI: Mu = 500 kN·m on b = 2.5 m, d = 0.5 m, f\'c = 28 MPa, fy = 420 MPa', () => {
    // k = 2·500e6/(0.9·0.85·28·2500·500²) = 1e9/1.33875e10 = 0.074697;
    // As = (0.85·28·2500·500/420)(1 − √(1 − 0.074697)) = 70833.3·(1 − 0.961927) = 2696.8 mm² (by hand)
    expect(num('as_req_footing', 500 * kNm, 2500 * mm, 500 * mm, 28 * MPa, 420 * MPa) / (mm * mm)).toBeCloseTo(2696.8, 0);
  });

  describe('minimum steel by code edition', () => {
    // ρmin values: 318-19 from memory (ACI 318-19 Table 7.6.1.1: 0.0018Ag, all deformed-bar grades);
    // 318-14 from memory (ACI 318-14 Table 7.6.1.1, 0.0020 below Grade 60,
    // 0.0018 at Grade 60, max(0.0018·60000/fy, 0.0014) above).
    const B = 120 * inch;
    const h = 24 * inch; // Ag = 2880 in²

    it('318-19: 0.0018Ag for Grades 40, 60 and 80, with or without fy (from memory, ACI 318-19 Table 7.6.1.1)', () => {
      for (const fy of [40, 60, 80]) {
        expect(num('as_min_footing', B, h, fy * ksi) / in2).toBeCloseTo(0.0018 * 2880, 9);
        expect(num('as_min_footing', B, h, fy * ksi, '318-19') / in2).toBeCloseTo(0.0018 * 2880, 9);
      }
      expect(num('as_min_footing', B, h) / in2).toBeCloseTo(5.184, 9);
    });

    it('318-14: Grade 40 → 0.0020, Grade 60 → 0.0018, Grade 80 → 0.0014 (from memory, ACI 318-14 Table 7.6.1.1)', () => {
      expect(num('as_min_footing', B, h, 40 * ksi, '318-14') / in2).toBeCloseTo(0.0020 * 2880, 9); // 5.76 in²
      expect(num('as_min_footing', B, h, 60 * ksi, '318-14') / in2).toBeCloseTo(0.0018 * 2880, 9); // 5.184 in²
      // Grade 80: max(0.0018·60/80 = 0.00135, 0.0014) = 0.0014 → 4.032 in²
      expect(num('as_min_footing', B, h, 80 * ksi, '318-14') / in2).toBeCloseTo(0.0014 * 2880, 9);
    });

    it('SI grades give the same ratios: Grade 280 / 420 / 550 (from memory, ACI 318-14 Table 7.6.1.1)', () => {
      const b = 3000 * mm;
      const t = 600 * mm; // Ag = 1.8e6 mm²
      const mm2 = mm * mm;
      for (const fy of [280, 420, 550]) {
        expect(num('as_min_footing', b, t, fy * MPa) / mm2).toBeCloseTo(0.0018 * 1.8e6, 6); // 318-19: 3240 mm²
      }
      expect(num('as_min_footing', b, t, 280 * MPa, '318-14') / mm2).toBeCloseTo(0.0020 * 1.8e6, 6); // 3600 mm²
      expect(num('as_min_footing', b, t, 420 * MPa, '318-14') / mm2).toBeCloseTo(0.0018 * 1.8e6, 6); // 3240 mm², Grade 420 = Grade 60
      expect(num('as_min_footing', b, t, 550 * MPa, '318-14') / mm2).toBeCloseTo(0.0014 * 1.8e6, 6); // 2520 mm²
    });

    it('as_footing takes the edition after φ; the minimum of that edition governs a small moment', () => {
      // Mu = 100 kip-ft is far below the 0.0020Ag of Grade 40 (as_req ≈ 1.7 in² at Grade 40 by the Whitney block)
      const mu = 100 * kipFt;
      expect(num('as_footing', mu, B, 20 * inch, h, 4000 * psi, 40 * ksi) / in2).toBeCloseTo(5.184, 9);
      expect(num('as_footing', mu, B, 20 * inch, h, 4000 * psi, 40 * ksi, 0.9, '318-14') / in2).toBeCloseTo(5.76, 9);
      expect(num('as_footing', mu, B, 20 * inch, h, 4000 * psi, 80 * ksi, 0.9, '318-14') / in2).toBeCloseTo(4.032, 9);
      // a large moment: the required steel governs in both editions (8.2798 in², see above)
      expect(num('as_footing', 722.5 * kipFt, B, 20 * inch, h, 4000 * psi, 60 * ksi, 0.9, '318-14') / in2).toBeCloseTo(8.2798, 3);
    });

    it('318-14 without fy, or an unknown edition, is refused', () => {
      expect(() => num('as_min_footing', B, h, undefined, '318-14')).toThrow(/give fy/);
      expect(() => num('as_min_footing', B, h, 60 * ksi, '318-11')).toThrow(/unknown edition/);
      expect(() => num('as_footing', 100 * kipFt, B, 20 * inch, h, 4000 * psi, 60 * ksi, 0.9, '2019')).toThrow(LibraryError);
    });
  });

  it('band rule: γs = 2/(β + 1) of the short-direction steel in the central band (§13.3.3.3)', () => {
    // 8 x 12 ft: β = 1.5 → γs = 0.8; 10 in² short steel → 8 in² in the 8-ft band (common practice formula, ACI Eq. 13.3.3.3)
    expect(num('gamma_s_band', 8 * ft, 12 * ft)).toBeCloseTo(0.8, 12);
    expect(num('as_band', 10 * in2, 8 * ft, 12 * ft) / in2).toBeCloseTo(8, 10);
    // square: all of it (γs = 1); 2 x 6 m: β = 3 → 0.5
    expect(num('gamma_s_band', 3, 3)).toBe(1);
    expect(num('gamma_s_band', 2, 6)).toBeCloseTo(0.5, 12);
  });

  it('rejects φ out of range, a too-shallow footing and h ≤ d', () => {
    expect(() => num('as_req_footing', 722.5 * kipFt, 120 * inch, 20 * inch, 4000 * psi, 60 * ksi, 1.1)).toThrow(LibraryError);
    expect(() => num('as_req_footing', 722.5 * kipFt, 120 * inch, 20 * inch, 4000 * psi, 60 * ksi, 1.1)).toThrow(/φ must be in \(0, 1\]/);
    expect(() => num('as_req_footing', 5000 * kipFt, 120 * inch, 10 * inch, 4000 * psi, 60 * ksi)).toThrow(/footing too shallow/);
    expect(() => num('as_footing', 100 * kipFt, 120 * inch, 20 * inch, 18 * inch, 4000 * psi, 60 * ksi)).toThrow(/h must exceed d/);
    expect(() => num('mu_footing', 800 * kN, 0.4, 0.4, 0.5)).toThrow(/not smaller than the footing/);
  });
});
