// A flat slab at its column: one-way shear over the panel width, top bar development and
// extension, the structural-integrity bars through the column core, the column concrete through
// the floor, and openings near the column. Hand calculations written out, sources beside them.

import { describe, expect, it } from 'vitest';
import { g, gn, expectLibError } from './gravity-call';
import { num } from './support-call';
import { LibraryError } from '../../runtime/library/types';
import { ft, inch, kN, kPa, lbf, mm, MPa, psf, psi } from '../../runtime/units/si';

describe('vu_oneway_slab: wide-beam shear at d from the column face', () => {
  it('interior span: Vu = qu·ℓ2·(ℓn/2 − d)', () => {
    // ACI 318-19 §8.4.3.2 / §8.5.3.1.1 (section at d, from memory) with statics of an interior span:
    // qu = 229 psf, ℓ2 = 22 ft, ℓn = 22.333 ft, d = 7.625 in: arm = 11.1667 − 0.6354 = 10.5313 ft;
    // Vu = 229·22·10.5313 = 53,056 lb.
    const vu = gn('vu_oneway_slab', 229 * psf, 22 * ft, (22 + 1 / 3) * ft, 7.625 * inch) / lbf;
    expect(vu).toBeCloseTo(229 * 22 * ((22 + 1 / 3) / 2 - 7.625 / 12), 6);
    expect(Math.abs(vu / 53056 - 1)).toBeLessThan(1e-4);
  });
  it('SI: 10 kPa, ℓ2 = 6 m, ℓn = 7 m, d = 200 mm → 10·6·(3.5 − 0.2) = 198 kN', () => {
    expect(gn('vu_oneway_slab', 10 * kPa, 6, 7, 200 * mm) / kN).toBeCloseTo(198, 9);
  });
  it('refuses a section past midspan', () => {
    expectLibError(() => g('vu_oneway_slab', 10 * kPa, 6, 0.3, 0.2), /beyond midspan/);
  });
});

describe('top bars at the column: development and extension', () => {
  it('ℓd of a #5 top bar, Table 25.4.2.3 (from memory): ψt = 1.0 in a 9 in slab, 1.3 below more than 12 in', () => {
    // No. 6 and smaller, spacing and cover met: ℓd = fy ψt ψe /(25 λ √f'c)·db = 60,000/(25·70.71)·0.625 = 21.21 in.
    const base = (60000 / (25 * Math.sqrt(5000))) * 0.625;
    expect(gn('ld_top', 0.625 * inch, 60000 * psi, 5000 * psi, 7.94 * inch) / inch).toBeCloseTo(base, 6);
    // More than 12 in of concrete below (Table 25.4.2.5, from memory): ψt = 1.3 → 27.58 in.
    expect(gn('ld_top', 0.625 * inch, 60000 * psi, 5000 * psi, 14 * inch) / inch).toBeCloseTo(1.3 * base, 6);
    // Epoxy-coated ψe = 1.5 with ψt = 1.3: the product is capped at 1.7 → 36.06 in.
    expect(gn('ld_top', 0.625 * inch, 60000 * psi, 5000 * psi, 14 * inch, true, 1, 1.5) / inch).toBeCloseTo(1.7 * base, 6);
  });
  it('Fig. 8.7.4.1.3 extensions beyond the face (from memory): 0.20ℓn, 0.30ℓn (0.33ℓn with drops), 0.22ℓn', () => {
    const ln = 268 * inch; // 22.333 ft
    expect(gn('top_bar_extension', ln, 'column-strip-short') / inch).toBeCloseTo(53.6, 9);
    expect(gn('top_bar_extension', ln, 'column-strip-long') / inch).toBeCloseTo(80.4, 9);
    expect(gn('top_bar_extension', ln, 'column-strip-long', true) / inch).toBeCloseTo(88.44, 9);
    expect(gn('top_bar_extension', ln, 'middle-strip') / inch).toBeCloseTo(58.96, 9);
  });
});

describe('structural-integrity bottom bars through the column core (ACI 318-19 §8.7.4.2.2, from memory)', () => {
  it('core width c − 2(cover + tie) − db', () => {
    // 20 in column, #8 bars (1.0 in), #3 ties (§25.7.2.2, from memory), 1.5 in cover: 20 − 2(1.875) − 1.0 = 15.25 in.
    expect(gn('col_core_width', 20 * inch, '#8') / inch).toBeCloseTo(15.25, 9);
    // #11 bars take #4 ties: 20 − 2(2.0) − 1.41 = 14.59 in.
    expect(gn('col_core_width', 20 * inch, '#11') / inch).toBeCloseTo(14.59, 9);
    expectLibError(() => g('col_core_width', 4 * inch, '#8'), /too small/);
  });
  it('bars of a layer at spacing s within that width: ⌊w/s⌋ wherever the layer falls (geometry)', () => {
    expect(gn('bars_within', 15.25 * inch, 18 * inch)).toBe(0);
    expect(gn('bars_within', 15.25 * inch, 7.5 * inch)).toBe(2);
    expect(gn('bars_within', 15 * inch, 7.5 * inch)).toBe(2);
    expect(gn('bars_within', 400 * mm, 150 * mm)).toBe(2);
  });
});

describe('column concrete through the floor (ACI 318-19 §15.5.1, 318-14 §15.3.1; from memory)', () => {
  it('above 1.4 times the floor: the lower strength unless the column concrete is puddled into the floor', () => {
    // 8000/5000 = 1.6 > 1.4 → option (b), 5000 psi; option (a) keeps 8000 psi.
    expect(num('fc_col_floor', 8000 * psi, 5000 * psi) / psi).toBeCloseTo(5000, 9);
    expect(num('fc_col_floor', 8000 * psi, 5000 * psi, true) / psi).toBeCloseTo(8000, 9);
    // 7000/5000 = 1.4 exactly: no action needed.
    expect(num('fc_col_floor', 7000 * psi, 5000 * psi) / psi).toBeCloseTo(7000, 9);
    // SI: 50 MPa column on a 32 MPa floor (1.56) → 32 MPa.
    expect(num('fc_col_floor', 50 * MPa, 32 * MPa) / MPa).toBeCloseTo(32, 9);
  });
});

describe('bo_opening_loss: an opening near the column (ACI 318-19 §22.6.4.3, from memory)', () => {
  it('the part of the face between the tangents from the centroid', () => {
    // 20 × 20 in column, d = 7.625 in, a 12 in opening centred on the column line 10 in from the face:
    // tangents through (10 + 10, ±6) meet the face at 13.8125 in from the centre: 12·27.625/40 = 8.2875 in.
    expect(num('bo_opening_loss', 20 * inch, 20 * inch, 7.625 * inch, 12 * inch, 10 * inch, 9 * inch) / inch).toBeCloseTo(8.2875, 9);
    // A 60 in opening at the face would take more than the face: capped at c2 + d = 27.625 in.
    expect(num('bo_opening_loss', 20 * inch, 20 * inch, 7.625 * inch, 60 * inch, 0, 9 * inch) / inch).toBeCloseTo(27.625, 9);
    expect(num('bo_opening_loss', 20 * inch, 20 * inch, 7.625 * inch, 0, 10 * inch, 9 * inch)).toBe(0);
  });
  it('outside a column strip only within 4h (318-19) or 10h (318-14)', () => {
    // x = 40 in > 4·9 = 36 in: no loss in 318-19; < 10·9 = 90 in: 12·27.625/(20 + 80) = 3.315 in in 318-14.
    expect(num('bo_opening_loss', 20 * inch, 20 * inch, 7.625 * inch, 12 * inch, 40 * inch, 9 * inch, false)).toBe(0);
    expect(num('bo_opening_loss', 20 * inch, 20 * inch, 7.625 * inch, 12 * inch, 40 * inch, 9 * inch, false, '318-14') / inch).toBeCloseTo(3.315, 9);
    expect(() => num('bo_opening_loss', 20 * inch, 20 * inch, 7.625 * inch, -1, 40 * inch, 9 * inch)).toThrow(LibraryError);
  });
});
