import { describe, expect, it } from 'vitest';
import { g, gn, expectLibError } from './gravity-call';
import { ft, inch, ksi, kN, mm, MPa, pcf, psi } from '../../runtime/units/si';

// Our own scenarios; a 12 in strip, f'c = 4000 psi, fy = 60 ksi, 150 pcf concrete.
// Demand: 1.4 × self-weight (ASCE 7-22 §2.3.1 comb. 1),
// moment wℓ²/8 simple span (common practice). Capacity: As,min = 0.0018·b·h (ACI 318-19 Table 7.6.1.1, from memory
// ) with the stress block of ACI 318-19 §22.2.2.4.1, φ = 0.90.
describe('self-weight of a one-way strip with minimum steel (US input)', () => {
  it('8 in slab spanning 12 ft carries itself', () => {
    // w = 100 psf, qu = 140 psf, Mu = 140·144/8 = 2520 lb·ft = 30,240 lb·in per ft
    // As = 0.1728 in², a = 0.25412 in, φMn = 0.9·10,368·(6.5 − 0.12706) = 59,467 lb·in; ratio = 0.5085
    const args = [8 * inch, 6.5 * inch, 12 * ft, 'simple', 4000 * psi, 60 * ksi, 150 * pcf];
    expect(gn('self_weight_ratio', ...args)).toBeCloseTo(0.5085, 4);
    expect(g('self_weight_ok', ...args)).toBe(true);
  });

  it('5 in slab spanning 30 ft is flagged', () => {
    // w = 62.5 psf, qu = 87.5 psf, Mu = 87.5·900/8·12 = 118,125 lb·in; As = 0.108 in², a = 0.15882 in
    // φMn = 0.9·6480·(4 − 0.07941) = 22,865 lb·in; ratio = 5.166
    const args = [5 * inch, 4 * inch, 30 * ft, 'simple', 4000 * psi, 60 * ksi, 150 * pcf];
    expect(gn('self_weight_ratio', ...args)).toBeCloseTo(5.166, 3);
    expect(g('self_weight_ok', ...args)).toBe(false);
  });

  it('support conditions scale the demand by the beam moment coefficients', () => {
    // common practice: wℓ²/8 simple, wℓ²/12 fixed both ends, wℓ²/2 cantilever
    const base = [8 * inch, 6.5 * inch, 12 * ft] as const;
    const tail = [4000 * psi, 60 * ksi, 150 * pcf] as const;
    const simple = gn('self_weight_ratio', ...base, 'simple', ...tail);
    expect(gn('self_weight_ratio', ...base, 'both-ends', ...tail) / simple).toBeCloseTo(8 / 12, 12);
    expect(gn('self_weight_ratio', ...base, 'cantilever', ...tail) / simple).toBeCloseTo(4, 12);
  });
});

describe('SI input', () => {
  it('200 mm slab spanning 5 m, 24 kN/m³', () => {
    // by hand: w = 4.8 kPa, qu = 6.72 kPa, Mu = 6.72·25/8 = 21.0 kN·m/m
    // As = 0.0018·1000·200 = 360 mm², β1(30 MPa) = 0.8324 (psi form), a = 360·420/(0.85·30·1000) = 5.929 mm
    // εt large → φ = 0.9; φMn = 0.9·360·420·(170 − 2.965) = 22.730 kN·m; ratio = 0.9239
    const args = [200 * mm, 170 * mm, 5, 'simple', 30 * MPa, 420 * MPa, 24 * kN];
    expect(gn('self_weight_ratio', ...args)).toBeCloseTo(0.9239, 3);
    expect(g('self_weight_ok', ...args)).toBe(true);
  });
});

describe('bad arguments', () => {
  it('refuses d ≥ h and unknown supports', () => {
    expectLibError(() => g('self_weight_ratio', 0.2, 0.2, 5, 'simple', 30 * MPa, 420 * MPa, 24 * kN), /d must be less than h/);
    expectLibError(() => g('self_weight_ok', 0.2, 0.17, 5, 'pinned', 30 * MPa, 420 * MPa, 24 * kN), /unknown support "pinned"/);
  });
});
