// Interior, edge and corner columns along the load path: KLL, tributary area, the direct
// design moments at the column line, the effective slab width for moment transfer and the
// punching stress with moments about both axes. Hand calculations (in, ft, psi) with the
// clause of each formula beside it.

import { describe, expect, it } from 'vitest';
import { call, num } from './support-call';
import { acrossProperties, vuPunchBiaxial } from '../../runtime/library/column-position';
import { ft, inch, kip, kipFt, mm, psi } from '../../runtime/units/si';

const i = inch;

describe('KLL and tributary area by position', () => {
  it('KLL: 4 for every column without a cantilever slab; 3 edge, 2 corner with one (ASCE 7-22 Table 4.7-1)', () => {
    // Table 4.7-1 (ASCE 7-22; as in IBC Table 1607.11.1)
    expect(num('kll_column', 'interior')).toBe(4);
    expect(num('kll_column', 'edge')).toBe(4);
    expect(num('kll_column', 'corner')).toBe(4);
    expect(num('kll_column', 'edge', true)).toBe(3);
    expect(num('kll_column', 'corner', true)).toBe(2);
    expect(num('kll_column', 'interior', true)).toBe(4);
  });

  it('tributary area with the slab edge at the outer column faces (half-bay rule, common practice)', () => {
    // 24 × 22 ft bays, 20 in column: interior 24·22 = 528 ft²; edge (12 + 10/12)·22 = 282.33 ft²;
    // corner (12 + 10/12)(11 + 10/12) = 12.8333·11.8333 = 151.86 ft²
    const a = (pos: string) => num('trib_area_col', 24 * ft, 22 * ft, 20 * i, 20 * i, pos) / (ft * ft);
    expect(a('interior')).toBeCloseTo(528, 9);
    expect(a('edge')).toBeCloseTo(282.333, 3);
    expect(a('corner')).toBeCloseTo(151.861, 3);
  });

  it('position from the grid lines: an edge line across direction 1 is an edge, both a corner', () => {
    // 4 × 3 spans, lines 0..4 east–west and 0..3 north–south
    expect(call('column_position', 4, 3, 2, 1)).toBe('interior');
    expect(call('column_position', 4, 3, 0, 1)).toBe('edge');
    expect(call('column_position', 4, 3, 4, 2)).toBe('edge');
    expect(call('column_position', 4, 3, 4, 3)).toBe('corner');
    expect(call('column_position', 4, 3, 2, 0)).toBe('edge along direction 1');
    expect(() => call('column_position', 4, 3, 5, 1)).toThrow(/line1 must be a whole number from 0/);
  });

  it('column strip of the direction-1 frame (ACI 318-19 §8.4.1.5)', () => {
    // 0.25·min(24, 22) = 5.5 ft each side → 11 ft; at a corner 5.5 ft + 10 in = 6.333 ft (common practice)
    expect(num('cs_width_col', 24 * ft, 22 * ft, 20 * i, 'interior') / ft).toBeCloseTo(11, 9);
    expect(num('cs_width_col', 24 * ft, 22 * ft, 20 * i, 'edge') / ft).toBeCloseTo(11, 9);
    expect(num('cs_width_col', 24 * ft, 22 * ft, 20 * i, 'corner') / ft).toBeCloseTo(6.3333, 4);
  });

  it('frame width and the design moments at the column line', () => {
    // Corner: edge frame ℓ2/2 + c2/2 = 11 + 0.8333 = 11.833 ft (common practice); interior and edge: ℓ2 = 22 ft
    expect(num('frame_width', 22 * ft, 20 * i, 'corner') / ft).toBeCloseTo(11.8333, 4);
    expect(num('frame_width', 22 * ft, 20 * i, 'edge') / ft).toBeCloseTo(22, 9);
    // Interior span 0.65 / 0.35 Mo (§8.10.4.1, CONFIRMED); end span of a flat plate without edge beam:
    // exterior negative 0.26, positive 0.52 (Table 8.10.4.2, from memory); with an edge beam 0.30 / 0.50 (CONFIRMED)
    expect(num('ddm_column_coef', 'interior')).toBe(0.65);
    expect(num('ddm_span_coef', 'interior')).toBe(0.35);
    expect(num('ddm_column_coef', 'edge')).toBe(0.26);
    expect(num('ddm_span_coef', 'corner')).toBe(0.52);
    expect(num('ddm_column_coef', 'edge', 'edge-beam')).toBe(0.3);
    expect(num('ddm_span_coef', 'edge', 'edge-beam')).toBe(0.5);
    // Column strip: 75 % of the interior negative (Table 8.10.5.1), 100 % of the exterior negative with βt = 0
    // (Table 8.10.5.2), both from memory (flat plate, ACI 318-19 §8.10.5)
    expect(num('cs_column_fraction', 'interior', 22 / 24)).toBeCloseTo(0.75, 12);
    expect(num('cs_column_fraction', 'edge', 22 / 24)).toBeCloseTo(1, 12);
    expect(() => call('ddm_column_coef', 'edge', 'cantilever')).toThrow(/unknown end_case/);
  });

  it('effective slab width c2 + 1.5h each side, one side at a corner (ACI 318-19 §8.4.2.2.3)', () => {
    // c2 = 20 in, h = 9 in: 20 + 27 = 47 in; corner 20 + 13.5 = 33.5 in
    expect(num('b_slab_transfer', 20 * i, 9 * i, 'interior') / i).toBeCloseTo(47, 9);
    expect(num('b_slab_transfer', 20 * i, 9 * i, 'edge') / i).toBeCloseTo(47, 9);
    expect(num('b_slab_transfer', 20 * i, 9 * i, 'corner') / i).toBeCloseTo(33.5, 9);
    expect(num('b_slab_transfer', 500 * mm, 250 * mm, 'corner') / mm).toBeCloseTo(875, 9); // SI: 500 + 375
  });
});

describe('punching stress with moments about both axes', () => {
  it('with no second moment it is vu_punch_moment (ACI 318-19 R8.4.4.2.3)', () => {
    for (const pos of ['interior', 'edge', 'corner']) {
      const two = num('vu_punch_biaxial', 100 * kip, 50 * kipFt, 0, 16 * i, 16 * i, 7 * i, pos);
      expect(two).toBeCloseTo(num('vu_punch_moment', 100 * kip, 50 * kipFt, 16 * i, 16 * i, 7 * i, pos), 6);
    }
  });

  it('corner 16 × 16, d = 7: the second moment adds γv Msc2 c/Jc with the same section turned', () => {
    // b1 = b2 = 16 + 3.5 = 19.5 in: γv = 1 − 1/(1 + 2/3) = 0.4; c_AB = 19.5²/(2·39) = 4.875 in;
    // Jc = 7·19.5³/12 + 19.5·7³/12 + 2·136.5·4.875² = 4325.48 + 557.38 + 6487.88 = 11370.73 in⁴
    // (sum of sides, R8.4.4.2.3; product of inertia neglected, common practice)
    // Vu = 60 kip, Msc1 = Msc2 = 20 kip·ft: direct 60000/(39·7) = 219.78 psi; each moment
    // 0.4·240000·4.875/11370.73 = 41.16 psi; vu = 219.78 + 2·41.16 = 302.10 psi
    const r = vuPunchBiaxial(60 * kip, 20 * kipFt, 20 * kipFt, 16 * i, 16 * i, 7 * i, 'corner');
    expect(r.direct / psi).toBeCloseTo(219.78, 2);
    expect(r.fromM1 / psi).toBeCloseTo(41.16, 2);
    expect(r.fromM2 / psi).toBeCloseTo(41.16, 2);
    expect(num('vu_punch_biaxial', 60 * kip, 20 * kipFt, 20 * kipFt, 16 * i, 16 * i, 7 * i, 'corner') / psi).toBeCloseTo(302.10, 1);
  });

  it('edge 16 × 16, d = 7: the moment along the edge acts on a section symmetric about its axis', () => {
    // b1 = 19.5 (⟂ edge), b2 = 23 in. About the axis ⟂ edge: c = b2/2 = 11.5 in;
    // Jc = d b2³/12 + b2 d³/12 + 2·b1·d·(b2/2)² = 7097.42 + 657.42 + 2·19.5·7·132.25 = 7097.42 + 657.42 + 36104.25 = 43859.08 in⁴
    // γv = 1 − 1/(1 + (2/3)·1.086042) = 1 − 1/1.724028 = 0.419963 (Eq. 8.4.2.2.2 with the sides swapped)
    const p = acrossProperties(16 * i, 16 * i, 7 * i, 'edge');
    expect(p.c / i).toBeCloseTo(11.5, 9);
    expect(p.jc / i ** 4).toBeCloseTo(43859.08, 1);
    expect(p.gammaV).toBeCloseTo(0.419963, 5);
    // Msc2 = 30 kip·ft: 0.419963·360000·11.5/43859.08 = 39.64 psi
    const r = vuPunchBiaxial(100 * kip, 0, 30 * kipFt, 16 * i, 16 * i, 7 * i, 'edge');
    expect(r.fromM2 / psi).toBeCloseTo(39.64, 2);
  });

  it('interior: the moment about the other axis uses the section turned (c1 ↔ c2)', () => {
    // 24 × 12 in column, d = 8: about the second axis b1 = 20, b2 = 32 in; γv = 1 − 1/(1 + (2/3)·0.790569) = 1 − 1/1.527046 = 0.345141
    // c = 10 in; Jc = 8·20³/6 + 20·8³/6 + 8·32·20²/2 = 10666.7 + 1706.7 + 51200 = 63573.3 in⁴ (R8.4.4.2.3 interior form)
    const p = acrossProperties(24 * i, 12 * i, 8 * i, 'interior');
    expect(p.gammaV).toBeCloseTo(0.345141, 5);
    expect(p.c / i).toBeCloseTo(10, 9);
    expect(p.jc / i ** 4).toBeCloseTo(63573.3, 0);
  });
});
