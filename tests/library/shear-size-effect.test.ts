import { describe, expect, it } from 'vitest';
import { call, num } from './support-call';
import { LibraryError } from '../../runtime/library/types';
import { inch, lbf, mm, psi } from '../../runtime/units/si';

describe('lambda_s, size-effect factor', () => {
  // computed from ACI 318-19 §22.5.5.1.3, λs = √(2/(1 + d/10)) ≤ 1; printed to 4 decimals
  const rows: [number, number][] = [
    [6, 1.0], [10, 1.0], [12, 0.9535], [15, 0.8944], [20, 0.8165],
    [24, 0.767], [28, 0.7255], [30, 0.7071], [36, 0.6594],
  ];
  it.each(rows)('d = %d in gives %f (318-19)', (dIn, expected) => {
    expect(num('lambda_s', dIn * inch)).toBeCloseTo(expected, 4);
  });

  it('is 1.0 in ACI 318-14, which has no size effect', () => {
    // ACI 318-14 §22.5.5.1 and §22.6.5.2 have no λs (from memory)
    expect(num('lambda_s', 36 * inch, '318-14')).toBe(1);
  });

  it('SI input agrees with the SI form √(2/(1 + 0.004d)), d in mm, within its soft conversion', () => {
    // ACI 318-19 §22.5.5.1.3, SI form √(2/(1 + 0.004d)): d = 500 mm → √(2/3) = 0.8165.
    // Our inch form at 500 mm = 19.685 in gives √(2/2.9685) = 0.8208; 0.004/mm vs 1/254 mm is a 1.6 % rounding.
    expect(num('lambda_s', 500 * mm)).toBeCloseTo(0.8208, 4);
    expect(Math.abs(num('lambda_s', 500 * mm) / Math.sqrt(2 / (1 + 0.004 * 500)) - 1)).toBeLessThan(0.006);
  });

  it('may be neglected for isolated footings when asked (ACI 318-19 §13.2.6.2, from memory); applied by default', () => {
    // d = 24 in: λs = √(2/(1 + 2.4)) = 0.7670 unless neglected, then 1.0.
    expect(num('lambda_s', 24 * inch)).toBeCloseTo(0.767, 4);
    expect(num('lambda_s', 24 * inch, '318-19', false)).toBeCloseTo(0.767, 4);
    expect(num('lambda_s', 24 * inch, '318-19', true)).toBe(1);
    // Two-way shear of a footing, d = 24 in, f'c = 4000 psi, 18 in column: vc = 4λs√f'c = 4·0.7670·63.246 = 194.0 psi
    // (Table 22.6.5.2(a)), or 4·63.246 = 253.0 psi with λs neglected.
    expect(num('vc_punch', 4000 * psi, 18 * inch, 18 * inch, 24 * inch, 'interior', 1, '318-19') / psi).toBeCloseTo(4 * 0.76696 * Math.sqrt(4000), 2);
    expect(num('vc_punch', 4000 * psi, 18 * inch, 18 * inch, 24 * inch, 'interior', 1, '318-19', true) / psi).toBeCloseTo(4 * Math.sqrt(4000), 6);
    // One-way, bw = 108 in, ρw = 0.0025: Vc = 8λs(ρw)^(1/3)√f'c bw d (Table 22.5.5.1(c)) with λs = 1 when neglected:
    // 8·0.13572·63.246·108·24 = 177,998 lb.
    const vcN = num('vc_oneway', 4000 * psi, 108 * inch, 24 * inch, 0.0025, 1, '318-19', true) / lbf;
    expect(vcN).toBeCloseTo(8 * Math.cbrt(0.0025) * Math.sqrt(4000) * 108 * 24, 3);
    expect(num('vc_oneway', 4000 * psi, 108 * inch, 24 * inch, 0.0025, 1, '318-19') / lbf).toBeCloseTo(vcN * Math.sqrt(2 / 3.4), 3);
    expect(call('vc_oneway_rule', 4000 * psi, 108 * inch, 24 * inch, 0.0025, 1, '318-19', true)).toMatch(/λs neglected \(§13\.2\.6\.2\)/);
    expect(() => num('lambda_s', 0.3, '318-19', 'yes')).toThrow(/neglect_lambda_s must be true or false/);
  });

  it('rejects a negative depth and an unknown edition', () => {
    expect(() => num('lambda_s', -0.1)).toThrow(LibraryError);
    expect(() => num('lambda_s', -0.1)).toThrow(/d must be greater than 0/);
    expect(() => num('lambda_s', 0.3, '318-11')).toThrow(/unknown edition '318-11'/);
  });
});
