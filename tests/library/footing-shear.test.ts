import { describe, expect, it } from 'vitest';
import { call, num } from './support-call';
import { LibraryError } from '../../runtime/library/types';
import { ft, inch, kip, kN, mm, MPa, psi } from '../../runtime/units/si';

const fc = 4000 * psi; // √f'c = 63.246 psi

describe('one-way shear capacity vc_oneway, Table 22.5.5.1 by edition', () => {
  it('318-19 expression (c) with λs and ρw; 318-14 2λ√f\'c bw d', () => {
    // ACI 318-19 Table 22.5.5.1(c) (its use for footings without stirrups is our reading)
    // bw = 120 in, d = 20 in (λs = 0.8165, e.1), ρw = 0.002 (∛ = 0.12599):
    // 8·0.8165·0.12599·63.246 = 52.05 psi → Vc = 52.05·2400 = 124.92 kip (by hand)
    expect(num('vc_oneway', fc, 120 * inch, 20 * inch, 0.002) / kip).toBeCloseTo(124.92, 1);
    expect(call('vc_oneway_rule', fc, 120 * inch, 20 * inch, 0.002)).toMatch(/318-19 Table 22.5.5.1\(c\)/);
    // 318-14 §22.5.5.1 (the pre-2019 form): 2·63.246·2400 = 303.58 kip
    expect(num('vc_oneway', fc, 120 * inch, 20 * inch, 0.002, 1, '318-14') / kip).toBeCloseTo(303.58, 1);
    expect(call('vc_oneway_rule', fc, 120 * inch, 20 * inch, 0.002, 1, '318-14')).toMatch(/318-14/);
  });

  it('caps (c) at 5λ√f\'c bw d (§22.5.5.1.1)', () => {
    // ACI 318-19 §22.5.5.1.1 cap, from memory: d = 8 in (λs = 1), ρw = 0.3: 8·0.3^(1/3) = 5.355 > 5
    // → Vc = 5·63.246·12·8 = 30.36 kip
    expect(num('vc_oneway', fc, 12 * inch, 8 * inch, 0.3) / kip).toBeCloseTo(30.36, 2);
    expect(call('vc_oneway_rule', fc, 12 * inch, 8 * inch, 0.3)).toMatch(/capped at 5λ/);
  });

  it('SI input agrees with the SI form 0.66λsλ(ρw)^(1/3)√f\'c within its rounding', () => {
    // ACI 318-19 Table 22.5.5.1(c), SI coefficient 0.66: f'c = 28 MPa, bw = 1000 mm, d = 500 mm,
    // ρw = 0.002, λs(SI) = √(2/3): 0.66·0.8165·0.12599·5.2915 MPa·500000 mm² = 179.63 kN.
    // Our psi form converts exactly (0.6643 and the inch λs) so it lands 1.2 % higher.
    const v = num('vc_oneway', 28 * MPa, 1000 * mm, 500 * mm, 0.002) / kN;
    expect(Math.abs(v / 179.63 - 1)).toBeLessThan(0.02);
  });

  it('rejects negative ρw, bad λ and unknown edition', () => {
    expect(() => num('vc_oneway', fc, 1, 0.5, -0.001)).toThrow(/rho_w must not be negative/);
    expect(() => num('vc_oneway', fc, 1, 0.5, 0.002, 0.5)).toThrow(/λ must be between/);
    expect(() => num('vc_oneway', fc, 1, 0.5, 0.002, 1, 'ACI-99')).toThrow(LibraryError);
  });
});

describe('footing shear demands', () => {
  // Pu = 800 kip on 10 x 10 ft (qu = 8 ksf), 18 x 18 in column, d = 20 in (arithmetic by hand)
  it('one-way at d from the face: 8·10·((120 − 18)/2 − 20)/12 = 206.67 kip', () => {
    // ACI 318-19 §13.2.7.2 / §7.4.3.2 section at d (clause numbers from memory)
    expect(num('vu_oneway_footing', 800 * kip, 10 * ft, 10 * ft, 18 * inch, 20 * inch) / kip).toBeCloseTo(206.667, 2);
    // a section beyond the footing edge carries nothing
    expect(num('vu_oneway_footing', 800 * kip, 10 * ft, 10 * ft, 18 * inch, 60 * inch)).toBe(0);
  });
  it('two-way at d/2: 800 − 8·(38/12)² = 719.78 kip', () => {
    // ACI 318-19 §22.6.4.1: critical section at d/2
    expect(num('vu_punch_footing', 800 * kip, 10 * ft, 10 * ft, 18 * inch, 18 * inch, 20 * inch) / kip).toBeCloseTo(719.778, 2);
  });
  it('SI: 3000 kN on 3 x 3 m, 450 mm column, d = 500 mm', () => {
    // qu = 333.33 kPa; one-way: 333.33·3·(1.275 − 0.5) = 775.0 kN; two-way: 3000 − 333.33·0.95² = 2699.17 kN
    expect(num('vu_oneway_footing', 3000 * kN, 3, 3, 450 * mm, 500 * mm) / kN).toBeCloseTo(775, 6);
    expect(num('vu_punch_footing', 3000 * kN, 3, 3, 450 * mm, 450 * mm, 500 * mm) / kN).toBeCloseTo(2699.1667, 3);
  });
  it('rejects negative d and negative load', () => {
    expect(() => num('vu_oneway_footing', 800 * kip, 3, 3, 0.45, -0.5)).toThrow(/d must be greater than 0/);
    expect(() => num('vu_punch_footing', -1, 3, 3, 0.45, 0.45, 0.5)).toThrow(/Pu must be greater than 0/);
  });
});
