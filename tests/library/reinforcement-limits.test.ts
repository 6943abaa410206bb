import { describe, expect, it } from 'vitest';
import { g, gn, expectLibError } from './gravity-call';
import { inch, ksi, mm, MPa, psi } from '../../runtime/units/si';

const in2 = inch * inch;

describe('minimum slab and footing steel', () => {
  it('318-19: 0.0018 Ag for any grade (US input)', () => {
    // Tables 7.6.1.1 / 8.6.1.1, §24.4.3.2 of ACI 318-19, from memory: 0.0018·12·8 = 0.1728 in²/ft
    expect(gn('as_min_slab', 12 * inch, 8 * inch, 60 * ksi) / in2).toBeCloseTo(0.1728, 9);
    expect(gn('rho_min_slab', 40 * ksi)).toBe(0.0018);
  });

  it('318-14: 0.0020 below Grade 60, 0.0018·60,000/fy ≥ 0.0014 above', () => {
    // ACI 318-19 Table 7.6.1.1, from memory (318-14 had 0.0020 for Grade 40/50)
    expect(gn('as_min_slab', 12 * inch, 8 * inch, 40 * ksi, '318-14') / in2).toBeCloseTo(0.192, 9);
    expect(gn('rho_min_slab', 60 * ksi, '318-14')).toBeCloseTo(0.0018, 12);
    // from memory: 0.0018·60/75 = 0.00144 ≥ 0.0014
    expect(gn('rho_min_slab', 75 * ksi, '318-14')).toBeCloseTo(0.00144, 12);
    expect(gn('rho_min_slab', 100 * ksi, '318-14')).toBeCloseTo(0.0014, 12);
  });

  it('SI input: 1 m strip of a 200 mm slab', () => {
    // 0.0018·1000·200 = 360 mm²/m (ACI 318-19 Table 7.6.1.1, from memory)
    expect(gn('as_min_slab', 1, 200 * mm, 420 * MPa) / (mm * mm)).toBeCloseTo(360, 9);
  });
});

describe('minimum beam steel, ACI 318-19 §9.6.1.2', () => {
  it('max(3√f\'c, 200)/fy·bw·d', () => {
    // from memory; COMPUTED: f'c = 4000: 3·63.25 = 189.7 < 200 → 200/60,000·12·20 = 0.800 in²
    expect(gn('as_min_beam', 12 * inch, 20 * inch, 4000 * psi, 60 * ksi) / in2).toBeCloseTo(0.8, 9);
    // f'c = 5000: 3·70.71 = 212.1 > 200 → 212.13/60,000·240 = 0.8485 in²
    expect(gn('as_min_beam', 12 * inch, 20 * inch, 5000 * psi, 60 * ksi) / in2).toBeCloseTo(0.8485, 4);
  });
});

describe('maximum steel for a tension-controlled section', () => {
  it('318-14 (εt = 0.005) and 318-19 (εty + 0.003)', () => {
    // COMPUTED from §22.2.2 and Table 21.2.2, b = 12 in, d = 20 in, f'c = 4000 psi, fy = 60 ksi:
    // 318-14: c = 0.003/0.008·20 = 7.5 in, a = 0.85·7.5 = 6.375 in, As = 0.85·4·6.375·12/60 = 4.335 in²
    expect(gn('as_max_tc', 12 * inch, 20 * inch, 4000 * psi, 60 * ksi, '318-14') / in2).toBeCloseTo(4.335, 6);
    // 318-19: c = 0.003/0.0080690·20 = 7.4359 in → As = 4.2979 in²
    expect(gn('as_max_tc', 12 * inch, 20 * inch, 4000 * psi, 60 * ksi) / in2).toBeCloseTo(4.2979, 4);
  });

  it('is exactly the tension-controlled boundary of the flexure functions', () => {
    const args = [12 * inch, 20 * inch, 5000 * psi, 60 * ksi] as const;
    const amax = gn('as_max_tc', ...args);
    // COMPUTED: consistency of §22.2.2 with Table 21.2.2
    expect(g('tension_controlled', amax * 0.999, ...args)).toBe(true);
    expect(g('tension_controlled', amax * 1.001, ...args)).toBe(false);
  });
});

describe('maximum bar spacing', () => {
  it('two-way min(2h, 18 in), one-way min(3h, 18 in), shrinkage min(5h, 18 in)', () => {
    // §8.7.2.2 and §24.4.3.3 of ACI 318-19, from memory; §7.7.2.3 one-way from memory
    expect(gn('s_max_slab', 8 * inch, 'two-way') / inch).toBeCloseTo(16, 9);
    expect(gn('s_max_slab', 10 * inch, 'two-way') / inch).toBeCloseTo(18, 9);
    expect(gn('s_max_slab', 5 * inch, 'one-way') / inch).toBeCloseTo(15, 9);
    expect(gn('s_max_slab', 5 * inch, 'shrinkage') / inch).toBeCloseTo(18, 9);
    // SI: 200 mm two-way → 400 mm (< 18 in = 457.2 mm)
    expect(gn('s_max_slab', 200 * mm, 'two-way') / mm).toBeCloseTo(400, 9);
  });

  it('crack control, Table 24.3.2', () => {
    // from memory: fs = 40 ksi, cc = 2 in → min(15 − 5, 12) = 10 in
    expect(gn('s_max_crack', 40 * ksi, 2 * inch) / inch).toBeCloseTo(10, 9);
    // cc = 0.75 in → min(15 − 1.875, 12) = 12 in
    expect(gn('s_max_crack', 40 * ksi, 0.75 * inch) / inch).toBeCloseTo(12, 9);
  });
});

describe('bad arguments', () => {
  it('refuses negative thickness, unknown kind and edition', () => {
    expectLibError(() => g('as_min_slab', 1, -0.2, 420 * MPa), /h must be positive/);
    expectLibError(() => g('s_max_slab', 0.2, 'flat'), /unknown kind "flat"/);
    expectLibError(() => g('as_max_tc', 1, 0.2, 30 * MPa, 420 * MPa, '2019'), /unknown edition "2019"/);
  });
});
