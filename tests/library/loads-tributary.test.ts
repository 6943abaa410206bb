import { describe, expect, it } from 'vitest';
import { g, gn, expectLibError } from './gravity-call';
import { ft } from '../../runtime/units/si';

const ft2 = ft * ft;

describe('tributary area by the half-bay rule (common practice)', () => {
  it('interior, edge and corner columns on a 30 ft × 25 ft grid (US input)', () => {
    // common practice: interior 30·25 = 750 ft²; edge (15 + 0)·25 = 375 ft²; corner 15·12.5 = 187.5 ft²
    expect(gn('trib_area', 30 * ft, 25 * ft, 'interior') / ft2).toBeCloseTo(750, 9);
    expect(gn('trib_area', 30 * ft, 25 * ft, 'edge') / ft2).toBeCloseTo(375, 9);
    expect(gn('trib_area', 30 * ft, 25 * ft, 'corner') / ft2).toBeCloseTo(187.5, 9);
  });

  it('cantilever overhangs add to the edge side (US input)', () => {
    // common practice: edge with 5 ft overhang (15 + 5)·25 = 500 ft²; corner with 5 ft and 4 ft (20)(16.5) = 330 ft²
    expect(gn('trib_area', 30 * ft, 25 * ft, 'edge', 5 * ft) / ft2).toBeCloseTo(500, 9);
    expect(gn('trib_area', 30 * ft, 25 * ft, 'corner', 5 * ft, 4 * ft) / ft2).toBeCloseTo(330, 9);
  });

  it('SI grid and unequal spans', () => {
    // common practice: 8 m × 6 m interior = 48 m²; corner with 2 m overhangs (4 + 2)(3 + 2) = 30 m²
    expect(gn('trib_area', 8, 6, 'interior')).toBeCloseTo(48, 12);
    expect(gn('trib_area', 8, 6, 'corner', 2, 2)).toBeCloseTo(30, 12);
    // spans 7 and 9 m in x, 6 m and an edge in y with 1.5 m overhang: (3.5 + 4.5)(3 + 1.5) = 36 m²
    expect(gn('trib_area_spans', 7, 9, 6, 0, 0, 1.5)).toBeCloseTo(36, 12);
    expect(gn('trib_width', 7, 9)).toBeCloseTo(8, 12);
  });

  it('the four interior areas of a regular grid tile the bays around a column', () => {
    // common practice: an interior column's area equals the sum of four quarter-bays
    const quarter = gn('trib_area_spans', 0, 8, 0, 6); // a corner-type quarter: 4 × 3 m
    expect(4 * quarter).toBeCloseTo(gn('trib_area', 8, 6, 'interior'), 12);
  });
});

describe('bad arguments', () => {
  it('refuses negative spans, unknown positions and misplaced overhangs', () => {
    expectLibError(() => g('trib_area', -8, 6, 'interior'), /lx must be positive/);
    expectLibError(() => g('trib_area', 8, 6, 'middle'), /unknown position "middle"; expected one of "interior", "edge", "corner"/);
    expectLibError(() => g('trib_area', 8, 6, 'interior', 1), /interior column has no overhang/);
    expectLibError(() => g('trib_area', 8, 6, 'edge', 0, 1), /give its overhang as cant_x/);
    expectLibError(() => g('trib_width', 7, 9, 1), /overhang needs an edge/);
    expectLibError(() => g('trib_width', 0, 0), /at least one adjoining span/);
  });
});
