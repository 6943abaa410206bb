import { describe, expect, it } from 'vitest';
import { create, all } from 'mathjs';
import { hasFeetInches, normalizeFeetInches } from '../../runtime/units/feet-inches';

// A plain mathjs instance, only to read back the quantity text this module produces.
const math = create(all);

/** Value of the normalised text in inches. */
function inches(text: string): number {
  return (math.evaluate(normalizeFeetInches(text)) as { toNumber(u: string): number }).toNumber('in');
}

describe('normalizeFeetInches', () => {
  it('writes the usual drawing forms as quantity text', () => {
    expect(normalizeFeetInches(`1'-6"`)).toBe('1 ft + 6 in');
    expect(normalizeFeetInches(`1' 6"`)).toBe('1 ft + 6 in');
    expect(normalizeFeetInches(`1'6"`)).toBe('1 ft + 6 in');
    expect(normalizeFeetInches(`6"`)).toBe('6 in');
    expect(normalizeFeetInches(`2'`)).toBe('2 ft');
    expect(normalizeFeetInches(`  24'-0"  `)).toBe('  24 ft + 0 in  ');
  });

  it('reads fractions of an inch and decimal feet', () => {
    expect(normalizeFeetInches(`6 1/2"`)).toBe('6.5 in');
    expect(normalizeFeetInches(`3/4"`)).toBe('0.75 in');
    expect(normalizeFeetInches(`1'-6 1/2"`)).toBe('1 ft + 6.5 in');
    expect(normalizeFeetInches(`10.5'`)).toBe('10.5 ft');
    expect(normalizeFeetInches(`8''`)).toBe('8 in');
    expect(normalizeFeetInches('1′-6″')).toBe('1 ft + 6 in');
  });

  it('keeps the meaning inside a longer expression', () => {
    expect(normalizeFeetInches(`2 * 1'-6"`)).toBe('2 * (1 ft + 6 in)');
    expect(normalizeFeetInches(`-1'-6"`)).toBe('-(1 ft + 6 in)');
    // 1 ft = 12 in exactly (NIST SP 811, Appendix B): 2 × 18 in = 36 in
    expect(inches(`2 * 1'-6"`)).toBeCloseTo(36, 9);
    expect(inches(`-1'-6"`)).toBeCloseTo(-18, 9);
    expect(inches(`30'-0" - 1'-6"`)).toBeCloseTo(342, 9);
  });

  it('gives the right length', () => {
    // 1 ft = 12 in exactly (NIST SP 811, Appendix B)
    expect(inches(`1'-6"`)).toBeCloseTo(18, 9);
    expect(inches(`24'-7 3/4"`)).toBeCloseTo(295.75, 9);
  });

  it('leaves other text alone', () => {
    for (const t of ['18 in', '450 mm', '5000 psi', "f'c", 'interior', '', '1.5 ft + 2 in']) {
      expect(normalizeFeetInches(t)).toBe(t);
      expect(hasFeetInches(t)).toBe(false);
    }
    expect(hasFeetInches(`1'-6"`)).toBe(true);
    expect(hasFeetInches(`6"`)).toBe(true);
  });
});
