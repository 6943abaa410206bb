import { describe, expect, it } from 'vitest';
import { g, gn, expectLibError, expectRel } from './gravity-call';
import { ft, inch, ksi, MPa, pcf } from '../../runtime/units/si';

describe('one-way slabs, ACI 318-19 Table 7.3.1.1 (US input)', () => {
  // ACI 318-19 Tables 7.3.1.1 / 8.3.1.1 [MEMORY; ℓ/28 corroborated]: ℓ/20, ℓ/24, ℓ/28, ℓ/10 at fy = 60 ksi
  it('support conditions, ℓ = 12 ft', () => {
    expect(gn('h_min_one_way', 12 * ft, 'simple') / inch).toBeCloseTo(144 / 20, 9);
    expect(gn('h_min_one_way', 12 * ft, 'one-end') / inch).toBeCloseTo(144 / 24, 9);
    expect(gn('h_min_one_way', 12 * ft, 'both-ends') / inch).toBeCloseTo(144 / 28, 9);
    expect(gn('h_min_one_way', 12 * ft, 'cantilever') / inch).toBeCloseTo(144 / 10, 9);
  });

  it('fy and lightweight modifiers', () => {
    // ACI 318-19 Tables 7.3.1.1 / 8.3.1.1 from memory: × (0.4 + fy/100,000): 40 ksi → 0.8
    expect(gn('h_min_one_way', 12 * ft, 'simple', 40 * ksi) / inch).toBeCloseTo(7.2 * 0.8, 9);
    // × (1.65 − 0.005wc) ≥ 1.09: 100 pcf → 1.15; 115 pcf → 1.075 → 1.09
    expect(gn('h_min_one_way', 12 * ft, 'simple', 60 * ksi, 100 * pcf) / inch).toBeCloseTo(7.2 * 1.15, 9);
    expect(gn('h_min_one_way', 12 * ft, 'simple', 60 * ksi, 115 * pcf) / inch).toBeCloseTo(7.2 * 1.09, 9);
    expect(gn('h_min_one_way', 12 * ft, 'simple', 60 * ksi, 145 * pcf) / inch).toBeCloseTo(7.2, 9);
  });

  it('SI input: 4.2 m both ends continuous → 150 mm', () => {
    // Table 7.3.1.1 from memory: 4200/28 = 150 mm (fy = 413.7 MPa = 60 ksi)
    expectRel(gn('h_min_one_way', 4.2, 'both-ends', 413.685 * MPa), 0.15, 1e-5);
  });
});

describe('two-way slabs without interior beams, ACI 318-19 Table 8.3.1.1', () => {
  const ln = 20 * ft; // 240 in
  it('table values at 40, 60 ksi (both editions) and 75 ksi (318-14), US input', () => {
    // ACI 318-19 Tables 7.3.1.1 / 8.3.1.1 [CONFIRMED]
    expect(gn('h_min_two_way', ln, 'exterior', false, 60 * ksi) / inch).toBeCloseTo(240 / 30, 9);
    expect(gn('h_min_two_way', ln, 'exterior-edge-beam', false, 60 * ksi) / inch).toBeCloseTo(240 / 33, 9);
    expect(gn('h_min_two_way', ln, 'interior') / inch).toBeCloseTo(240 / 33, 9); // fy defaults to 60 ksi
    expect(gn('h_min_two_way', ln, 'exterior', true, 60 * ksi) / inch).toBeCloseTo(240 / 33, 9);
    expect(gn('h_min_two_way', ln, 'interior', true, 60 * ksi) / inch).toBeCloseTo(240 / 36, 9);
    expect(gn('h_min_two_way', ln, 'exterior', false, 40 * ksi) / inch).toBeCloseTo(240 / 33, 9);
    expect(gn('h_min_two_way', ln, 'interior', true, 40 * ksi) / inch).toBeCloseTo(240 / 40, 9);
    // The 75 ksi row is ACI 318-14's (318-19 replaced it by 80 ksi):
    expect(gn('h_min_two_way', ln, 'exterior', false, 75 * ksi, '318-14') / inch).toBeCloseTo(240 / 28, 9);
    expect(gn('h_min_two_way', ln, 'exterior-edge-beam', true, 75 * ksi, '318-14') / inch).toBeCloseTo(240 / 34, 9);
  });

  it('linear interpolation in fy', () => {
    // ACI 318-19 Tables 7.3.1.1 / 8.3.1.1 [CONFIRMED] "interpolate for fy between values"; COMPUTED at 50 ksi, interior,
    // no drop panels: 240/36 + 0.5(240/33 − 240/36) = 6.9697 in
    expect(gn('h_min_two_way', ln, 'interior', false, 50 * ksi) / inch).toBeCloseTo(6.9697, 4);
  });

  it('absolute minimums 5 in / 4 in', () => {
    // ACI 318-19 Tables 7.3.1.1 / 8.3.1.1 [CONFIRMED]: ln = 10 ft → 120/33 = 3.64 in < 5 in; with drop panels 120/36 = 3.33 < 4 in
    expect(gn('h_min_two_way', 10 * ft, 'interior') / inch).toBeCloseTo(5, 9);
    expect(gn('h_min_two_way', 10 * ft, 'interior', true) / inch).toBeCloseTo(4, 9);
  });

  it('SI input: fy = 420 MPa gives ℓn/33 of the SI table within 0.5 %', () => {
    // ACI 318-19 Tables 7.3.1.1 / 8.3.1.1 [CONFIRMED] SI table fy 420 MPa → ℓn/33 for interior panels; 420 MPa = 60.9 ksi
    expectRel(gn('h_min_two_way', 6, 'interior', false, 420 * MPa), 6 / 33, 0.005);
  });
});

describe('Table 8.3.1.1 by edition: 318-19 rows 40 / 60 / 80 ksi, 318-14 rows 40 / 60 / 75 ksi', () => {
  const ln = 20 * ft; // 240 in
  it('318-19, Grade 80: ℓn/27, ℓn/30, ℓn/30 without drop panels; ℓn/30, ℓn/33, ℓn/33 with (row from memory)', () => {
    // ACI 318-19 Table 8.3.1.1, fy = 80,000 psi row (from memory): exterior no edge beams ℓn/27,
    // exterior with edge beams ℓn/30, interior ℓn/30; with drop panels ℓn/30, ℓn/33, ℓn/33.
    expect(gn('h_min_two_way', ln, 'exterior', false, 80 * ksi, '318-19') / inch).toBeCloseTo(240 / 27, 9);
    expect(gn('h_min_two_way', ln, 'exterior-edge-beam', false, 80 * ksi, '318-19') / inch).toBeCloseTo(240 / 30, 9);
    expect(gn('h_min_two_way', ln, 'interior', false, 80 * ksi, '318-19') / inch).toBeCloseTo(240 / 30, 9);
    expect(gn('h_min_two_way', ln, 'exterior', true, 80 * ksi, '318-19') / inch).toBeCloseTo(240 / 30, 9);
    expect(gn('h_min_two_way', ln, 'interior', true, 80 * ksi, '318-19') / inch).toBeCloseTo(240 / 33, 9);
    // The edition defaults to 318-19.
    expect(gn('h_min_two_way', ln, 'interior', false, 80 * ksi) / inch).toBeCloseTo(240 / 30, 9);
  });

  it('318-19 interpolates between 60 and 80 ksi: 75 ksi is not the 318-14 row', () => {
    // Table 8.3.1.1 note: linear interpolation for fy between the values given (from memory).
    // Interior, no drop panels, 75 ksi: 240/33 + (15/20)(240/30 − 240/33) = 7.2727 + 0.75·0.7273 = 7.8182 in.
    expect(gn('h_min_two_way', ln, 'interior', false, 75 * ksi, '318-19') / inch).toBeCloseTo(240 / 33 + 0.75 * (240 / 30 - 240 / 33), 9);
    // Under 318-14 the 75 ksi row is in the table: ℓn/31 = 7.7419 in.
    expect(gn('h_min_two_way', ln, 'interior', false, 75 * ksi, '318-14') / inch).toBeCloseTo(240 / 31, 9);
    // 70 ksi, exterior without edge beams: 318-19 halfway 30 → 27: 8 + 0.5(8.8889 − 8) = 8.4444 in;
    // 318-14 two thirds of the way 30 → 28: 8 + (10/15)(8.5714 − 8) = 8.3810 in.
    expect(gn('h_min_two_way', ln, 'exterior', false, 70 * ksi, '318-19') / inch).toBeCloseTo(8 + 0.5 * (240 / 27 - 8), 9);
    expect(gn('h_min_two_way', ln, 'exterior', false, 70 * ksi, '318-14') / inch).toBeCloseTo(8 + (10 / 15) * (240 / 28 - 8), 9);
  });

  it('each edition refuses fy beyond its own table', () => {
    expectLibError(() => g('h_min_two_way', 6, 'interior', false, 80 * ksi, '318-14'), /outside the 40-75 ksi range of ACI 318-14 Table 8\.3\.1\.1/);
    expectLibError(() => g('h_min_two_way', 6, 'interior', false, 85 * ksi, '318-19'), /outside the 40-80 ksi range of ACI 318-19 Table 8\.3\.1\.1/);
  });

  it('SI input: Grade 550 (79.8 ksi) under 318-19 is within 0.5 % of ℓn/30', () => {
    // 550 MPa = 79.77 ksi: 318-19 Table 8.3.1.1 SI row for 550 MPa is ℓn/30 interior (from memory).
    expectRel(gn('h_min_two_way', 6, 'interior', false, 550 * MPa, '318-19'), 6 / 30, 0.005);
  });
});

describe('the Table 8.3.1.1 panel around a column: panel_at_column', () => {
  // A panel with a discontinuous edge is an exterior panel (ACI 318-19 Table 8.3.1.1). With n spans the
  // column lines are 0..n; lines 0 and n are edges, lines 1 and n − 1 bound the end spans (geometry).
  it('3 spans: every interior line bounds an end span', () => {
    expect(g('panel_at_column', 3, 5, 1, 2)).toBe('exterior');
    expect(g('panel_at_column', 3, 5, 2, 2)).toBe('exterior');
    expect(g('panel_at_column', 5, 3, 2, 1)).toBe('exterior');
  });
  it('5 spans: lines 2 and 3 touch interior spans only', () => {
    expect(g('panel_at_column', 5, 5, 2, 3)).toBe('interior');
    expect(g('panel_at_column', 5, 5, 1, 3)).toBe('exterior');
    expect(g('panel_at_column', 4, 4, 2, 2)).toBe('interior');
    expect(g('panel_at_column', 5, 5, 0, 3)).toBe('exterior'); // edge column
  });
  it('edge beams give the edge-beam row', () => {
    expect(g('panel_at_column', 3, 5, 1, 2, true)).toBe('exterior-edge-beam');
    expect(g('panel_at_column', 5, 5, 2, 2, true)).toBe('interior');
  });
  it('refuses a line outside the grid', () => {
    expectLibError(() => g('panel_at_column', 3, 3, 4, 1), /line1 must be a whole number from 0 \(edge line\) to 3/);
    expectLibError(() => g('panel_at_column', 3, 3, 1, 1.5), /line2 must be a whole number/);
    expectLibError(() => g('panel_at_column', 0, 3, 0, 1), /n1 must be/);
  });
});

describe('bad arguments', () => {
  it('refuses unknown supports and panels, fy outside the table, very light concrete', () => {
    expectLibError(() => g('h_min_one_way', 4, 'fixed'), /unknown support "fixed"/);
    expectLibError(() => g('h_min_one_way', -4, 'simple'), /l must be positive/);
    expectLibError(() => g('h_min_one_way', 4, 'simple', 60 * ksi, 80 * pcf), /below the 90 pcf/);
    expectLibError(() => g('h_min_two_way', 6, 'corner'), /unknown panel "corner"/);
    expectLibError(() => g('h_min_two_way', 6, 'interior', false, 100 * ksi), /outside the 40-80 ksi range/);
    expectLibError(() => g('h_min_two_way', 6, 'interior', 'yes'), /drop_panels must be true or false/);
  });
});
