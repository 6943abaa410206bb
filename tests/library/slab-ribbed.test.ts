import { describe, expect, it } from 'vitest';
import { g, gn, expectLibError } from './gravity-call';
import { inch, mm } from '../../runtime/units/si';

// Geometry and the parallel-axis theorem (mechanics of materials, common practice); the figures below
// are worked by hand (COMPUTED), not published.
describe('joist slab, 3 in topping on 6 in ribs at 36 in, 16 in deep (US input)', () => {
  const rib = [16 * inch, 3 * inch, 6 * inch, 36 * inch] as const;

  it('equivalent thickness by weight and weight saved', () => {
    // h_eq = (36·3 + 6·13)/36 = 186/36 = 5.1667 in; saving = 1 − 5.1667/16 = 0.6771
    expect(gn('rib_h_eq', ...rib) / inch).toBeCloseTo(5.16667, 5);
    expect(gn('rib_saving', ...rib)).toBeCloseTo(0.67708, 5);
  });

  it('moment of inertia kept', () => {
    // ȳ = (108·1.5 + 78·9.5)/186 = 4.8548 in from the top
    // I = 36·3³/12 + 108·3.3548² + 6·13³/12 + 78·4.6452² = 81 + 1215.5 + 1098.5 + 1683.1 = 4078.1 in⁴
    expect(gn('rib_i', ...rib) / inch ** 4).toBeCloseTo(4078.08, 1);
    // solid 36·16³/12 = 12,288 in⁴ → 0.3319; same-stiffness solid (12·4078.1/36)^(1/3) = 11.078 in
    expect(gn('rib_i_ratio', ...rib)).toBeCloseTo(0.33188, 4);
    expect(gn('rib_h_stiff', ...rib) / inch).toBeCloseTo(11.078, 3);
  });
});

describe('SI input: 60 mm topping, 120 mm ribs at 600 mm, 300 mm deep', () => {
  const rib = [300 * mm, 60 * mm, 120 * mm, 600 * mm] as const;
  it('by hand', () => {
    // h_eq = (600·60 + 120·240)/600 = 108 mm; saving 0.64
    expect(gn('rib_h_eq', ...rib) / mm).toBeCloseTo(108, 9);
    expect(gn('rib_saving', ...rib)).toBeCloseTo(0.64, 12);
    // ȳ = (36,000·30 + 28,800·180)/64,800 = 96.667 mm
    // I = 10.8e6 + 36,000·66.667² + 138.24e6 + 28,800·83.333² = 10.8 + 160.0 + 138.24 + 200.0 = 509.04e6 mm⁴
    expect(gn('rib_i', ...rib) / mm ** 4 / 1e6).toBeCloseTo(509.04, 6);
    expect(gn('rib_i_ratio', ...rib)).toBeCloseTo(509.04e6 / (600 * 300 ** 3 / 12), 9);
  });
});

describe('limits', () => {
  it('ribs as wide as their spacing make a solid slab', () => {
    // COMPUTED: bw = s → h_eq = h, I = s h³/12
    const solid = [250 * mm, 50 * mm, 500 * mm, 500 * mm] as const;
    expect(gn('rib_h_eq', ...solid) / mm).toBeCloseTo(250, 9);
    expect(gn('rib_i_ratio', ...solid)).toBeCloseTo(1, 12);
    expect(gn('rib_h_stiff', ...solid) / mm).toBeCloseTo(250, 9);
  });

  it('a ribbed slab keeps a larger share of stiffness than of weight', () => {
    // common practice (the reason joist slabs exist): I ratio > h_eq/h
    const rib = [16 * inch, 3 * inch, 6 * inch, 36 * inch] as const;
    expect(gn('rib_i_ratio', ...rib)).toBeGreaterThan(gn('rib_h_eq', ...rib) / (16 * inch));
  });
});

describe('bad arguments', () => {
  it('refuses a topping as deep as the slab, ribs wider than their spacing, negative sizes', () => {
    expectLibError(() => g('rib_h_eq', 0.3, 0.3, 0.12, 0.6), /must be thinner than the depth/);
    expectLibError(() => g('rib_i', 0.3, 0.06, 0.7, 0.6), /exceeds the rib spacing/);
    expectLibError(() => g('rib_i_ratio', 0.3, -0.06, 0.12, 0.6), /hf must be positive/);
  });
});
