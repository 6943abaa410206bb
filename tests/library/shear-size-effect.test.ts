import { describe, expect, it } from 'vitest';
import { num } from './support-call';
import { LibraryError } from '../../runtime/library/types';
import { inch, mm } from '../../runtime/units/si';

describe('lambda_s, size-effect factor', () => {
  // reference-values.md e.1 [COMPUTED from §22.5.5.1.3, formula CONFIRMED]; printed to 4 decimals
  const rows: [number, number][] = [
    [6, 1.0], [10, 1.0], [12, 0.9535], [15, 0.8944], [20, 0.8165],
    [24, 0.767], [28, 0.7255], [30, 0.7071], [36, 0.6594],
  ];
  it.each(rows)('d = %d in gives %f (318-19)', (dIn, expected) => {
    expect(num('lambda_s', dIn * inch)).toBeCloseTo(expected, 4);
  });

  it('is 1.0 in ACI 318-14, which has no size effect', () => {
    // reference-values.md e.1 / brief: 318-14 two-way and one-way shear have no λs
    expect(num('lambda_s', 36 * inch, '318-14')).toBe(1);
  });

  it('SI input agrees with the SI form √(2/(1 + 0.004d)), d in mm, within its soft conversion', () => {
    // reference-values.md e.1 [CONFIRMED SI form]: d = 500 mm → √(2/3) = 0.8165.
    // Our inch form at 500 mm = 19.685 in gives √(2/2.9685) = 0.8208; 0.004/mm vs 1/254 mm is a 1.6 % rounding.
    expect(num('lambda_s', 500 * mm)).toBeCloseTo(0.8208, 4);
    expect(Math.abs(num('lambda_s', 500 * mm) / Math.sqrt(2 / (1 + 0.004 * 500)) - 1)).toBeLessThan(0.006);
  });

  it('rejects a negative depth and an unknown edition', () => {
    expect(() => num('lambda_s', -0.1)).toThrow(LibraryError);
    expect(() => num('lambda_s', -0.1)).toThrow(/d must be greater than 0/);
    expect(() => num('lambda_s', 0.3, '318-11')).toThrow(/unknown edition '318-11'/);
  });
});
