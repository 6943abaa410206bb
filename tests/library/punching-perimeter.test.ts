import { describe, expect, it } from 'vitest';
import { num } from './support-call';
import { LibraryError } from '../../runtime/library/types';
import { inch, mm } from '../../runtime/units/si';

describe('bo_punch, critical perimeter at d/2', () => {
  // bo by hand from the critical section of ACI 318-19 §22.6.4.1 (geometry; the edge and corner forms from memory)
  it.each([
    ['interior', 16, 16, 7, 92],
    ['edge', 16, 16, 7, 62],
    ['corner', 16, 16, 7, 39],
    ['interior', 24, 24, 12, 144],
    ['interior', 12, 36, 8, 128],
  ] as const)('%s %d x %d, d = %d in: bo = %d in', (pos, c1, c2, d, bo) => {
    expect(num('bo_punch', c1 * inch, c2 * inch, d * inch, pos) / inch).toBeCloseTo(bo, 9);
  });

  it('edge column with c1 perpendicular to the edge: 2(c1 + d/2) + (c2 + d)', () => {
    // ACI 318-19 §22.6.4.1 (geometry, from memory): 12 x 20 in, d = 8: 2(16) + 28 = 60 in;
    // swapping the sides gives 2(24) + 20 = 68 in, so the convention matters.
    expect(num('bo_punch', 12 * inch, 20 * inch, 8 * inch, 'edge') / inch).toBeCloseTo(60, 9);
    expect(num('bo_punch', 20 * inch, 12 * inch, 8 * inch, 'edge') / inch).toBeCloseTo(68, 9);
  });

  it('SI input: 400 x 400 mm interior column, d = 180 mm gives bo = 4 x 580 = 2320 mm', () => {
    // ACI 318-19 §22.6.4.1 interior section (geometry), arithmetic by hand
    expect(num('bo_punch', 400 * mm, 400 * mm, 180 * mm, 'interior') / mm).toBeCloseTo(2320, 6);
  });

  it('side lengths and enclosed area follow the same section', () => {
    // e.1 geometry: edge 16 x 16, d = 7: b1 = 16 + 3.5 = 19.5, b2 = 16 + 7 = 23, area = 448.5 in²
    expect(num('b1_punch', 16 * inch, 16 * inch, 7 * inch, 'edge') / inch).toBeCloseTo(19.5, 9);
    expect(num('b2_punch', 16 * inch, 16 * inch, 7 * inch, 'edge') / inch).toBeCloseTo(23, 9);
    expect(num('a_inside_punch', 16 * inch, 16 * inch, 7 * inch, 'edge') / inch ** 2).toBeCloseTo(448.5, 6);
    // corner: (16 + 3.5)² = 380.25 in²; interior: 23² = 529 in²
    expect(num('a_inside_punch', 16 * inch, 16 * inch, 7 * inch, 'corner') / inch ** 2).toBeCloseTo(380.25, 6);
    expect(num('a_inside_punch', 16 * inch, 16 * inch, 7 * inch, 'interior') / inch ** 2).toBeCloseTo(529, 6);
  });

  it('rejects an unknown position and a negative depth', () => {
    expect(() => num('bo_punch', 0.4, 0.4, 0.18, 'middle')).toThrow(LibraryError);
    expect(() => num('bo_punch', 0.4, 0.4, 0.18, 'middle')).toThrow(/unknown position 'middle'.*'interior', 'edge', 'corner'/);
    expect(() => num('bo_punch', 0.4, 0.4, -0.18, 'interior')).toThrow(/d must be greater than 0/);
    expect(() => num('bo_punch', 0, 0.4, 0.18, 'interior')).toThrow(/c1 must be greater than 0/);
  });
});
