import { describe, expect, it } from 'vitest';
import { g, gn, expectLibError } from './gravity-call';
import { ft, inch, kip, kPa, psf } from '../../runtime/units/si';

const kipFt = kip * ft;

describe('applicability, ACI 318-19 §8.10.2', () => {
  // ACI 318-19 §8.10.2: ≥ 3 spans each way, ratio ≤ 2, successive spans ≤ 1/3, L ≤ 2D
  it('a regular 4 × 3 bay flat plate qualifies (US input)', () => {
    expect(g('ddm_applicable', 4, 3, 24 * ft, 20 * ft, 120 * psf, 50 * psf)).toBe(true);
    expect(g('ddm_applicable_reason', 4, 3, 24 * ft, 20 * ft, 120 * psf, 50 * psf)).toMatch(/^DDM applicable/);
  });

  it('each limit fails on its own', () => {
    expect(g('ddm_applicable_reason', 2, 3, 24 * ft, 20 * ft, 120 * psf, 50 * psf)).toMatch(/§8\.10\.2\.1.*\(2 × 3\)/);
    expect(g('ddm_applicable_reason', 3, 3, 30 * ft, 12 * ft, 120 * psf, 50 * psf)).toMatch(/§8\.10\.2\.3.*2\.50 > 2/);
    // 24 ft next to 15 ft: (24 − 15)/24 = 37.5 % > 1/3
    expect(g('ddm_applicable_reason', 3, 3, 24 * ft, 20 * ft, 120 * psf, 50 * psf, 15 * ft)).toMatch(/§8\.10\.2\.2.*direction 1.*38 %/);
    // 24 ft next to 17 ft: 29 % ≤ 1/3 → still applicable
    expect(g('ddm_applicable', 3, 3, 24 * ft, 20 * ft, 120 * psf, 50 * psf, 17 * ft)).toBe(true);
    expect(g('ddm_applicable_reason', 3, 3, 24 * ft, 20 * ft, 100 * psf, 250 * psf)).toMatch(/§8\.10\.2\.6 L\/D = 2\.50 > 2/);
    expect(g('ddm_applicable', 3, 3, 24 * ft, 20 * ft, 100 * psf, 200 * psf)).toBe(true);
  });

  it('SI input', () => {
    expect(g('ddm_applicable', 3, 3, 7.2, 6.0, 6 * kPa, 3 * kPa, 6.0, 7.2)).toBe(true);
    expect(g('ddm_applicable', 3, 3, 7.2, 6.0, 6 * kPa, 3 * kPa, 4.5)).toBe(false); // (7.2 − 4.5)/7.2 = 37.5 %
  });
});

describe('total static moment, Eq. 8.10.3.2', () => {
  it('Mo = qu ℓ2 ℓn²/8 (US input)', () => {
    // ACI 318-19 Eq. 8.10.3.2: qu = 300 psf, ℓ2 = 20 ft, ℓ1 = 24 ft, 18 in columns
    // ℓn = 24 − 1.5 = 22.5 ft; Mo = 300·20·22.5²/8 = 379,687.5 lb·ft = 379.69 kip·ft
    const ln = gn('ddm_ln', 24 * ft, 18 * inch);
    expect(ln / ft).toBeCloseTo(22.5, 9);
    expect(gn('ddm_mo', 300 * psf, 20 * ft, ln, 24 * ft) / kipFt).toBeCloseTo(379.6875, 6);
  });

  it('ℓn not less than 0.65 ℓ1', () => {
    // ACI 318-19 §8.10.3.2.1 (ℓn ≥ 0.65ℓ1): ℓ1 = 10 ft with 4 ft supports → clear 6 ft < 6.5 ft → 6.5 ft
    expect(gn('ddm_ln', 10 * ft, 4 * ft) / ft).toBeCloseTo(6.5, 9);
    // Mo with ln = 6 ft given directly still uses 6.5 ft: 100·10·6.5²/8 = 5281.25 lb·ft
    expect(gn('ddm_mo', 100 * psf, 10 * ft, 6 * ft, 10 * ft) / kipFt).toBeCloseTo(5.28125, 9);
  });

  it('SI input, unequal supports', () => {
    // ℓn = 7.2 − 0.25 − 0.2 = 6.75 m; Mo = 12·6·6.75²/8 = 410.06 kN·m (Eq. 8.10.3.2)
    const ln = gn('ddm_ln', 7.2, 0.5, 0.4);
    expect(ln).toBeCloseTo(6.75, 12);
    expect(gn('ddm_mo', 12 * kPa, 6, ln, 7.2) / 1000).toBeCloseTo(410.0625, 9);
  });
});

describe('longitudinal distribution, §8.10.4', () => {
  it('interior span 0.65 / 0.35', () => {
    // ACI 318-19 §8.10.4.1 (as in Chen, Civil Engineering Handbook, ch. 7)
    expect(gn('ddm_interior_coef', 'negative')).toBe(0.65);
    expect(gn('ddm_interior_coef', 'positive')).toBe(0.35);
  });

  it('end span, Table 8.10.4.2', () => {
    // flat plate with edge beam: ACI 318-19 Table 8.10.4.2
    expect(gn('ddm_end_coef', 'edge-beam', 'negative-interior')).toBe(0.7);
    expect(gn('ddm_end_coef', 'edge-beam', 'positive')).toBe(0.5);
    expect(gn('ddm_end_coef', 'edge-beam', 'negative-exterior')).toBe(0.3);
    // other rows: ACI 318-19 Table 8.10.4.2, from memory
    expect([0, 1, 2].map((i) => gn('ddm_end_coef', 'unrestrained', ['negative-interior', 'positive', 'negative-exterior'][i]))).toEqual([0.75, 0.63, 0]);
    expect(gn('ddm_end_coef', 'beams-all', 'negative-exterior')).toBe(0.16);
    expect(gn('ddm_end_coef', 'no-beams', 'positive')).toBe(0.52);
    expect(gn('ddm_end_coef', 'no-beams', 'negative-exterior')).toBe(0.26);
    expect(gn('ddm_end_coef', 'restrained', 'negative-exterior')).toBe(0.65);
  });

  it('statics: positive + mean of the negatives ≈ Mo in every row', () => {
    // common practice (the table distributes Mo): M+ + (M−int + M−ext)/2 = 1.00 Mo, printed rounding ±0.01
    for (const c of ['unrestrained', 'beams-all', 'no-beams', 'edge-beam', 'restrained']) {
      const sum = gn('ddm_end_coef', c, 'positive') +
        (gn('ddm_end_coef', c, 'negative-interior') + gn('ddm_end_coef', c, 'negative-exterior')) / 2;
      expect(Math.abs(sum - 1)).toBeLessThanOrEqual(0.0051);
    }
    expect(gn('ddm_interior_coef', 'positive') + gn('ddm_interior_coef', 'negative')).toBeCloseTo(1, 12);
  });
});

describe('column strip, §8.4.1.5 and §8.10.5', () => {
  it('width: 0.25 ℓ1 or 0.25 ℓ2, the smaller, each side', () => {
    // ACI 318-19 §8.4.1.5: ℓ1 = 24 ft, ℓ2 = 20 ft → 2·5 = 10 ft; SI 6 m × 8 m → 3 m
    expect(gn('ddm_cs_width', 24 * ft, 20 * ft) / ft).toBeCloseTo(10, 9);
    expect(gn('ddm_cs_width', 6, 8)).toBeCloseTo(3, 12);
  });

  it('flat plate fractions 1.00 / 0.75 / 0.60 at any ℓ2/ℓ1', () => {
    // ACI 318-19 Tables 8.10.5.1, 8.10.5.2, 8.10.5.5, from memory (the same fractions in IS 456 cl. 31.5.5)
    for (const r of [0.5, 1, 1.4, 2]) {
      expect(gn('ddm_cs_fraction', 'negative-exterior', r)).toBeCloseTo(1, 12);
      expect(gn('ddm_cs_fraction', 'negative-interior', r)).toBeCloseTo(0.75, 12);
      expect(gn('ddm_cs_fraction', 'positive', r)).toBeCloseTo(0.6, 12);
    }
  });

  it('with beams, αf1ℓ2/ℓ1 ≥ 1: 0.90 / 0.75 / 0.45 and linear between', () => {
    // Tables 8.10.5.1 / 8.10.5.5 of ACI 318-19, from memory
    expect(gn('ddm_cs_fraction', 'negative-interior', 0.5, 1)).toBeCloseTo(0.9, 12);
    expect(gn('ddm_cs_fraction', 'negative-interior', 1, 2)).toBeCloseTo(0.75, 12);
    expect(gn('ddm_cs_fraction', 'positive', 2, 1.5)).toBeCloseTo(0.45, 12);
    // COMPUTED by linear interpolation: ℓ2/ℓ1 = 1.5 → (0.75 + 0.45)/2 = 0.60; α = 0.5 at ℓ2/ℓ1 = 2 → 0.75 + 0.5(0.45 − 0.75) = 0.60
    expect(gn('ddm_cs_fraction', 'positive', 1.5, 1)).toBeCloseTo(0.6, 12);
    expect(gn('ddm_cs_fraction', 'negative-interior', 2, 0.5)).toBeCloseTo(0.6, 12);
    // positive, α = 0.5, ℓ2/ℓ1 = 0.5: 0.60 + 0.5(0.90 − 0.60) = 0.75
    expect(gn('ddm_cs_fraction', 'positive', 0.5, 0.5)).toBeCloseTo(0.75, 12);
  });

  it('exterior negative with an edge beam (βt)', () => {
    // Table 8.10.5.2 of ACI 318-19, from memory: α = 0, βt ≥ 2.5 → 0.75; α ≥ 1, βt ≥ 2.5 → 0.90 / 0.75 / 0.45
    expect(gn('ddm_cs_fraction', 'negative-exterior', 1, 0, 2.5)).toBeCloseTo(0.75, 12);
    expect(gn('ddm_cs_fraction', 'negative-exterior', 1, 0, 4)).toBeCloseTo(0.75, 12);
    expect(gn('ddm_cs_fraction', 'negative-exterior', 0.5, 1, 2.5)).toBeCloseTo(0.9, 12);
    expect(gn('ddm_cs_fraction', 'negative-exterior', 2, 1, 2.5)).toBeCloseTo(0.45, 12);
    // βt = 0 → 1.00 whatever α
    expect(gn('ddm_cs_fraction', 'negative-exterior', 2, 1, 0)).toBeCloseTo(1, 12);
    // COMPUTED: βt = 1.76 (βt = C/(2Is), ACI 318-19 Eq. 8.10.5.2b), α = 0 → 1 − (1.76/2.5)·0.25 = 0.824
    expect(gn('ddm_cs_fraction', 'negative-exterior', 1, 0, 1.76)).toBeCloseTo(0.824, 12);
  });

  it('beam share of the column strip, §8.10.5.7', () => {
    // ACI 318-19 §8.10.5.7: 85 % at αf1ℓ2/ℓ1 ≥ 1.0; linear to zero (from memory)
    expect(gn('ddm_beam_share', 1)).toBeCloseTo(0.85, 12);
    expect(gn('ddm_beam_share', 3)).toBeCloseTo(0.85, 12);
    expect(gn('ddm_beam_share', 0.5)).toBeCloseTo(0.425, 12);
    expect(gn('ddm_beam_share', 0)).toBe(0);
  });
});

describe('bad arguments', () => {
  it('refuses unknown cases and locations, ratios out of range, impossible spans', () => {
    expectLibError(() => g('ddm_end_coef', 'cantilever', 'positive'), /unknown case "cantilever"/);
    expectLibError(() => g('ddm_end_coef', 'edge-beam', 'middle'), /unknown location "middle"/);
    expectLibError(() => g('ddm_interior_coef', 'negative-exterior'), /unknown location "negative-exterior"/);
    expectLibError(() => g('ddm_cs_fraction', 'positive', 2.5), /outside 0\.5-2/);
    expectLibError(() => g('ddm_ln', 5, 6), /no clear span/);
    expectLibError(() => g('ddm_mo', 10 * kPa, 6, 8, 7), /exceeds the centre-to-centre span/);
    expectLibError(() => g('ddm_mo', 10 * kPa, -6, 6, 7), /l2 must be positive/);
    expectLibError(() => g('ddm_applicable', 3.5, 3, 7, 6, 6000, 3000), /n1 must be a whole number/);
  });
});
