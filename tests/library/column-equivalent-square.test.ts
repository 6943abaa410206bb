import { describe, expect, it } from 'vitest';
import { num } from './support-call';
import { inch, mm } from '../../runtime/units/si';

describe('c_equiv_square: a round column as the square of equal area (ACI 318-19 §13.2.7.3, §8.10.3.2.1; from memory)', () => {
  it('side √(π/4)·D: 20 in → 17.725 in, 500 mm → 443.1 mm (geometry: π·20²/4 = 314.16 in² = 17.725²)', () => {
    expect(num('c_equiv_square', 20 * inch) / inch).toBeCloseTo(Math.sqrt(314.159265), 5);
    expect(num('c_equiv_square', 500 * mm) / mm).toBeCloseTo(443.1135, 3);
    expect(() => num('c_equiv_square', 0)).toThrow(/D must be greater than 0/);
  });
});
