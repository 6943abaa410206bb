// The slab moment handed to a column and its magnification in a braced frame, checked by
// hand (lb, in, ft) against the ACI 318-19 equations named beside each assertion.

import { describe, expect, it } from 'vitest';
import { num } from './support-call';
import { magnifiedMoment } from '../../runtime/library/column-moment';
import { ft, inch, kip, kN, kNm, lbf, mm, MPa, psf, psi } from '../../runtime/units/si';

const lbFt = lbf * ft, kipFt = kip * ft, kipIn = kip * inch;

describe('slab moment at the column (ACI 318-19 §8.10.7)', () => {
  it('interior, equal spans: Msc = 0.07·0.5 qLu ℓ2 ℓn² (Eq. 8.10.7.2, from memory)', () => {
    // qDu = 1.2·137.5 = 165 psf, qLu = 1.6·40 = 64 psf, ℓ2 = 22 ft, ℓn = 24 − 20/12 = 22.333 ft
    // Msc = 0.07[(165 + 32)·22·22.333² − 165·22·22.333²] = 0.07·32·22·498.78 = 24,580 lb·ft
    const ln = 24 - 20 / 12;
    const hand = 0.07 * 32 * 22 * ln * ln;
    expect(hand).toBeCloseTo(24580, -1);
    expect(num('msc_interior', 165 * psf, 64 * psf, 22 * ft, ln * ft) / lbFt).toBeCloseTo(hand, 6);
    expect(num('msc_column', 'interior', 165 * psf, 64 * psf, 24 * ft, 22 * ft, ln * ft) / lbFt).toBeCloseTo(hand, 6);
  });

  it('interior, unequal spans: the shorter span carries its dead load only (Eq. 8.10.7.2)', () => {
    // Longer: (165 + 32)·22·22.333² = 197·22·498.778 = 2,161,703; shorter ℓn' = 18.333 ft: 165·22·336.111 = 1,220,083
    // Msc = 0.07·(2,161,703 − 1,220,083) = 65,913 lb·ft
    const ln = 24 - 20 / 12, ln2 = 20 - 20 / 12;
    const hand = 0.07 * (197 * 22 * ln * ln - 165 * 22 * ln2 * ln2);
    expect(hand).toBeCloseTo(65913, -1);
    expect(num('msc_interior', 165 * psf, 64 * psf, 22 * ft, ln * ft, 165 * psf, 22 * ft, ln2 * ft) / lbFt).toBeCloseTo(hand, 5);
  });

  it('edge and corner: Msc = 0.3 Mo (§8.10.7.3, from memory), Mo = qu ℓ2 ℓn²/8 (Eq. 8.10.3.2)', () => {
    // qu = 229 psf, ℓ2 = 22 ft, ℓn = 22.333 ft: Mo = 229·22·498.778/8 = 314,105 lb·ft; 0.3 Mo = 94,232 lb·ft
    const ln = 24 - 20 / 12;
    const mo = (229 * 22 * ln * ln) / 8;
    expect(mo).toBeCloseTo(314105, -1);
    expect(num('msc_column', 'edge', 165 * psf, 64 * psf, 24 * ft, 22 * ft, ln * ft) / lbFt).toBeCloseTo(0.3 * mo, 5);
    // Corner: the edge frame is ℓ2/2 + c2/2 = 11 + 0.8333 = 11.833 ft wide
    const w = 11 + 10 / 12;
    expect(num('msc_column', 'corner', 165 * psf, 64 * psf, 24 * ft, w * ft, ln * ft) / lbFt).toBeCloseTo((0.3 * 229 * w * ln * ln) / 8, 4);
  });

  it('shared by the columns above and below in proportion to 4EI/ℓ (§8.10.7.2; common practice)', () => {
    expect(num('col_moment_share', 10 * ft, 10 * ft)).toBeCloseTo(0.5, 12);
    // 12 ft below, 10 ft above: (1/12)/(1/12 + 1/10) = 0.08333/0.18333 = 0.4545
    expect(num('col_moment_share', 12 * ft, 10 * ft)).toBeCloseTo(0.45455, 5);
    // Roof level: no column above, the column below takes it all
    expect(num('col_moment_share', 10 * ft, 0)).toBe(1);
    // A stiffer column above (I twice): (1/10)/(1/10 + 2/10) = 1/3
    expect(num('col_moment_share', 10 * ft, 10 * ft, 1, 2)).toBeCloseTo(1 / 3, 12);
  });
});

describe('minimum moment and magnification, braced column (ACI 318-19 §6.6.4)', () => {
  it('M2,min = Pu(0.6 + 0.03h), inches (Eq. 6.6.4.5.4)', () => {
    // Pu = 500 kip, h = 20 in: e = 0.6 + 0.6 = 1.2 in → 600 kip·in = 50 kip·ft
    expect(num('m2_min', 500 * kip, 20 * inch) / kipFt).toBeCloseTo(50, 9);
    // SI: Pu = 2000 kN, h = 500 mm: e = 15.24 + 15 = 30.24 mm → 60.48 kN·m (the SI edition rounds 0.6 in to 15 mm: 60.0)
    expect(num('m2_min', 2000 * kN, 500 * mm) / kNm).toBeCloseTo(60.48, 9);
  });

  it('Cm = 0.6 − 0.4 M1/M2, M1/M2 < 0 in single curvature (Eq. 6.6.4.5.3a)', () => {
    expect(num('cm_factor', -100 * kipFt, 100 * kipFt)).toBeCloseTo(1.0, 12); // single curvature, equal ends
    expect(num('cm_factor', 50 * kipFt, 100 * kipFt)).toBeCloseTo(0.4, 12); // double curvature: 0.6 − 0.2
    expect(num('cm_factor', 0, 100 * kipFt)).toBeCloseTo(0.6, 12); // far end pinned
    expect(() => num('cm_factor', 120 * kipFt, 100 * kipFt)).toThrow(/larger end moment/);
  });

  it('(EI)eff, Pc and δ for a 20 × 20 in column, f\'c = 5000 psi, ℓu = 111 in, βdns = 0.6', () => {
    // Ec = 57,000√5000 = 4,030,509 psi (§19.2.2.1(b)); Ig = 20⁴/12 = 13,333.3 in⁴
    // (EI)eff = 0.4·4,030,509·13,333.3/1.6 = 1.34350e10 lb·in² (Eq. 6.6.4.4.4a)
    const ei = (0.4 * 57000 * Math.sqrt(5000) * (20 ** 4 / 12)) / 1.6;
    expect(ei / 1e10).toBeCloseTo(1.3435, 4);
    const eiLib = num('ei_eff', 5000 * psi, 20 * inch, 20 * inch, 0.6);
    expect(eiLib / (lbf * inch * inch)).toBeCloseTo(ei, -3);
    // Pc = π²·1.3435e10/(1.0·111)² = 1.0762e7 lb = 10,762 kip (Eq. 6.6.4.4.2)
    const pc = (Math.PI ** 2 * ei) / 111 ** 2;
    expect(pc / 1000).toBeCloseTo(10762, -1);
    expect(num('pc_column', eiLib, 1, 111 * inch) / kip).toBeCloseTo(pc / 1000, 3);
    // δ = 1.0/(1 − 500/(0.75·10,762)) = 1/(1 − 0.061948) = 1.06604 (Eq. 6.6.4.5.2)
    expect(num('delta_ns', 500 * kip, pc * lbf, 1) ).toBeCloseTo(1 / (1 - 500000 / (0.75 * pc)), 9);
    // With Cm = 0.6 the formula gives 0.64: δ is not less than 1.0
    expect(num('delta_ns', 500 * kip, pc * lbf, 0.6)).toBe(1);
    expect(() => num('delta_ns', 9000 * kip, pc * lbf, 1)).toThrow(/0\.75Pc/);
    expect(() => num('pc_column', eiLib, 1.2, 111 * inch)).toThrow(/at most 1\.0/);
  });

  it('Mc = δ·max(M2, M2,min): the minimum governs a lightly loaded moment with Cm = 1.0 (§6.6.4.5.4)', () => {
    // Pu = 500 kip, M2 = 20 kip·ft < M2,min = 50 kip·ft → Mc = 1.06604·50 = 53.30 kip·ft
    const m = magnifiedMoment(500 * kip, -20 * kipFt, 20 * kipFt, 5000 * psi, 20 * inch, 20 * inch, 1, 111 * inch, 0.6);
    expect(m.m2Used / kipFt).toBeCloseTo(50, 9);
    expect(m.cm).toBe(1);
    expect(m.mc / kipFt).toBeCloseTo(53.302, 2);
    // M2 = 150 kip·ft in double curvature M1 = +75: Cm = 0.6 − 0.2 = 0.4 → δ = max(1, 0.4/0.938) = 1.0 → Mc = 150
    expect(num('mc_nonsway', 500 * kip, 75 * kipFt, 150 * kipFt, 5000 * psi, 20 * inch, 20 * inch, 1, 111 * inch, 0.6) / kipIn)
      .toBeCloseTo(1800, 6);
  });

  it('SI input agrees: 500 × 500 mm, 35 MPa, ℓu = 3 m', () => {
    // Ec = 57,000√5076.3 psi = 4,061,174 psi = 28,001 MPa; Ig = 500⁴/12 = 5.2083e9 mm⁴
    // (EI)eff = 0.4·28,001·5.2083e9/1.5 = 3.8890e13 N·mm²; Pc = π²·3.8890e13/3000² = 42,648 kN
    const ei = num('ei_eff', 35 * MPa, 500 * mm, 500 * mm, 0.5);
    const ecMPa = (57000 * Math.sqrt(35e6 / 6894.757293168361) * 6894.757293168361) / 1e6;
    expect(ecMPa).toBeCloseTo(28001, -1);
    expect(ei / 1e6).toBeCloseTo((0.4 * ecMPa * 1e6 * (0.5 ** 4 / 12)) / 1.5 / 1e6, 3);
    expect(num('pc_column', ei, 1, 3) / kN).toBeCloseTo((Math.PI ** 2 * ei) / 9 / 1000, 6);
  });
});
