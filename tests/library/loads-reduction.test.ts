import { describe, expect, it } from 'vitest';
import { g, gn, expectLibError, expectRel } from './gravity-call';
import { ft, kPa, psf } from '../../runtime/units/si';

const ft2 = ft * ft;
const Lo = 50 * psf;

describe('KLL, ASCE 7-22 Table 4.7-1', () => {
  it('element factors', () => {
    // Table 4.7-1 via Brockenbrough & Merritt Table 4.4 and IBC Table 1607.11.1 (ASCE 7-22 §4.7 Table 4.7-1)
    expect(gn('kll', 'interior-column')).toBe(4);
    expect(gn('kll', 'exterior-column')).toBe(4);
    expect(gn('kll', 'edge-column-cantilever')).toBe(3);
    expect(gn('kll', 'corner-column-cantilever')).toBe(2);
    expect(gn('kll', 'edge-beam')).toBe(2);
    expect(gn('kll', 'interior-beam')).toBe(2);
    expect(gn('kll', 'edge-beam-cantilever')).toBe(1);
    expect(gn('kll', 'two-way-slab')).toBe(1);
    expect(gn('kll', 'one-way-slab')).toBe(1);
  });
});

describe('Eq. 4.7-1 with the 0.50 / 0.40 limits (US input)', () => {
  it('hand calculations with ASCE 7-22 §4.7 Eq. 4.7-1', () => {
    // computed from ASCE 7-22 §4.7 Eq. 4.7-1: Lo = 50 psf, KLL = 4
    // AT = 100 ft² → KLL·AT = 400 → 50.0 psf (threshold, no reduction)
    expect(gn('live_reduced', Lo, 100 * ft2, 4, 1) / psf).toBeCloseTo(50, 9);
    // AT = 400 ft² → 1600 → 50(0.25 + 0.375) = 31.25 psf
    expect(gn('live_reduced', Lo, 400 * ft2, 4, 1) / psf).toBeCloseTo(31.25, 9);
    // AT = 900 ft² → 3600 → 25.0 psf = 0.50 Lo exactly
    expect(gn('live_reduced', Lo, 900 * ft2, 4, 1) / psf).toBeCloseTo(25, 9);
    // AT = 2500 ft² → 10000 → 0.40 → 20.0 psf for two or more floors; 0.50 floor (25 psf) for one
    expect(gn('live_reduced', Lo, 2500 * ft2, 4, 2) / psf).toBeCloseTo(20, 9);
    expect(gn('live_reduced', Lo, 2500 * ft2, 4, 1) / psf).toBeCloseTo(25, 9);
  });

  it('no reduction below KLL·AT = 400 ft² and the factor never exceeds 1', () => {
    // ASCE 7-22 §4.7.2 threshold, IBC §1607.11.1
    expect(g('lld_applies', 99 * ft2, 4)).toBe(false);
    expect(g('lld_applies', 100 * ft2, 4)).toBe(true);
    expect(gn('lld_factor', 50 * ft2, 4, 1)).toBe(1);
    // 37.16 m² is the SI threshold of ASCE 7-22 §4.7 (400 ft² = 37.161 m²)
    expect(g('lld_applies', 37.17, 1)).toBe(true);
    expect(g('lld_applies', 37.15, 1)).toBe(false);
  });
});

describe('SI input: the 4.57 form gives the same answer', () => {
  it('Lo = 2.4 kPa, AT = 60 m², KLL = 4', () => {
    // SI form L = Lo(0.25 + 4.57/√(KLL·AT)), ASCE 7-22 §4.7 (4.57 from memory; = 15/√10.764):
    // 2.4(0.25 + 4.57/√240) = 2.4(0.25 + 0.29499) = 1.30798 kPa; agrees within the rounding of 4.57 (0.05 %)
    expectRel(gn('live_reduced', 2.4 * kPa, 60, 4, 1) / kPa, 1.30798, 5e-4);
  });
});

describe('heavy live loads, garages and assembly, ASCE 7-22 §4.7.3-4.7.5', () => {
  it('Lo > 100 psf: no reduction for one floor, at most 20 % for two or more floors', () => {
    // §4.7.3 from memory (the 20 % two-floor rule also in IBC §1607.11)
    expect(gn('live_reduced', 125 * psf, 2500 * ft2, 4, 1) / psf).toBeCloseTo(125, 9);
    // two floors, KLL·AT = 10000: Eq. gives 0.40 but the reduction is capped at 20 % → 100 psf
    expect(gn('live_reduced', 125 * psf, 2500 * ft2, 4, 2) / psf).toBeCloseTo(100, 9);
    // KLL·AT = 600 ft²: Eq. 4.7-1 gives 125(0.25 + 15/√600) = 107.80 psf > 0.8·125, so 107.80 psf
    expect(gn('live_reduced', 125 * psf, 150 * ft2, 4, 2) / psf).toBeCloseTo(107.797, 3);
  });

  it('passenger-vehicle garages and assembly occupancies', () => {
    // §4.7.4 garages from memory: one floor not reduced; two floors at most 20 %
    expect(gn('live_reduced', 40 * psf, 2500 * ft2, 4, 1, 'garage') / psf).toBeCloseTo(40, 9);
    expect(gn('live_reduced', 40 * psf, 2500 * ft2, 4, 3, 'garage') / psf).toBeCloseTo(32, 9);
    // §4.7.5 assembly from memory: not reduced
    expect(gn('live_reduced', 100 * psf, 2500 * ft2, 4, 3, 'assembly') / psf).toBeCloseTo(100, 9);
  });

  it('one-way slab tributary area is capped at 1.5 ls²', () => {
    // §4.7.6 from memory: ls = 12 ft → 1.5·144 = 216 ft²
    expect(gn('at_one_way_slab', 600 * ft2, 12 * ft) / ft2).toBeCloseTo(216, 9);
    expect(gn('at_one_way_slab', 100 * ft2, 12 * ft) / ft2).toBeCloseTo(100, 9);
  });
});

describe('bad arguments', () => {
  it('refuses unknown elements, bad floor counts and negative loads', () => {
    expectLibError(() => g('kll', 'column'), /unknown element "column"/);
    expectLibError(() => g('lld_factor', 60, 4, 0), /floors must be a whole number >= 1/);
    expectLibError(() => g('lld_factor', 60, 4, 1.5), /floors must be a whole number >= 1/);
    expectLibError(() => g('live_reduced', -1, 60, 4, 1), /Lo must not be negative/);
    expectLibError(() => g('live_reduced', 2400, 60, 4, 1, 'school'), /unknown occupancy "school"/);
    expectLibError(() => g('lld_factor', -60, 4, 1), /AT must not be negative/);
  });
});
