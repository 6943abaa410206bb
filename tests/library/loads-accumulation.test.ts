import { describe, expect, it } from 'vitest';
import { g, gn, expectLibError } from './gravity-call';
import { ft, kN, kPa, lbf, plf, psf } from '../../runtime/units/si';

// Our own scenario: interior column of a flat-plate building on a 25 ft × 25 ft grid.
// Floor: 8 in slab at 150 pcf = 100 psf + 20 psf partitions/finishes = 120 psf dead, Lo = 50 psf.
// Roof: 100 psf dead, Lr = 20 psf. Column 18 × 18 in at 150 pcf = 337.5 plf; storeys 12 ft; KLL = 4.
const AT = 625 * ft * ft;
const us = (floors: number) =>
  [floors, AT, 120 * psf, 50 * psf, 100 * psf, 20 * psf, 337.5 * plf, 12 * ft, 4] as const;

describe('column load accumulated floor by floor (US input)', () => {
  it('three floors and the roof above the section', () => {
    // Statics: D = 625(100 + 3·120) + 4 storeys · 337.5 · 12 = 287,500 + 16,200 = 303,700 lb
    expect(gn('col_dead', ...us(3)) / lbf).toBeCloseTo(303700, 6);
    // ASCE 7-22 Eq. 4.7-1, AT summed = 1875 ft², KLL·AT = 7500:
    // 0.25 + 15/86.603 = 0.42321 ≥ 0.40 → 21.160 psf · 1875 = 39,675.5 lb
    expect(gn('col_live', ...us(3)) / lbf).toBeCloseTo(39675.48, 1);
    // ASCE 7-22 §2.3.1, Lr = 625·20 = 12,500 lb:
    // comb. 2 = 1.2·303,700 + 1.6·39,675.5 + 0.5·12,500 = 434,170.8 lb (comb. 1 425,180; comb. 3 424,115.5)
    expect(gn('col_pu', ...us(3)) / lbf).toBeCloseTo(434170.76, 1);
    // ASD: D + L = 343,375.5 lb > D + 0.75(L + Lr) = 342,831.6 > D + Lr = 316,200
    expect(gn('col_ps', ...us(3)) / lbf).toBeCloseTo(343375.48, 1);
  });

  it('top storey: roof only, roof live load governs', () => {
    // D = 625·100 + 337.5·12 = 66,550 lb; L = 0; comb. 3 = 1.2·66,550 + 1.6·12,500 = 99,860 lb
    // (comb. 1 = 93,170; comb. 2 = 86,110) — ASCE 7-22 §2.3.1
    expect(gn('col_live', ...us(0))).toBe(0);
    expect(gn('col_pu', ...us(0)) / lbf).toBeCloseTo(99860, 6);
  });

  it('roof snow by the ASCE 7 edition: top storey with S = 30 psf', () => {
    // D = 66,550 lb, Lr = 12,500 lb, S = 625·30 = 18,750 lb on AT.
    // ASCE 7-22 §2.3.1 (1.0S leading, factors from memory): comb. 3 = 1.2·66,550 + max(1.6·12,500, 18,750) = 79,860 + 20,000 = 99,860 lb.
    expect(gn('col_pu', ...us(0), 'general', 30 * psf) / lbf).toBeCloseTo(99860, 6);
    expect(gn('col_pu', ...us(0), 'general', 30 * psf, '7-22') / lbf).toBeCloseTo(99860, 6);
    // ASCE 7-22 §2.3.1: comb. 3 = 79,860 + 1.6·18,750 = 109,860 lb.
    expect(gn('col_pu', ...us(0), 'general', 30 * psf, '7-16') / lbf).toBeCloseTo(109860, 6);
    // ASD: 7-22 D + max(Lr, 0.7S) = 66,550 + 13,125 = 79,675 lb; 7-16 D + S = 85,300 lb.
    expect(gn('col_ps', ...us(0), 'general', 30 * psf) / lbf).toBeCloseTo(79675, 6);
    expect(gn('col_ps', ...us(0), 'general', 30 * psf, '7-16') / lbf).toBeCloseTo(85300, 6);
  });

  it('one floor: the 0.50 limit does not bind at KLL·AT = 2500 ft²', () => {
    // Eq. 4.7-1: 0.25 + 15/50 = 0.55 → 27.5 psf · 625 = 17,187.5 lb (ASCE 7-22 §4.7 Eq. 4.7-1)
    expect(gn('col_live', ...us(1)) / lbf).toBeCloseTo(17187.5, 6);
  });

  it('load grows with every floor added', () => {
    let last = 0;
    for (let n = 0; n <= 12; n++) {
      const pu = gn('col_pu', ...us(n));
      expect(pu).toBeGreaterThan(last); // common practice: a lower storey carries more
      last = pu;
    }
  });
});

describe('SI input', () => {
  it('two floors and roof on an 8 m × 8 m grid', () => {
    // D = 64(5 + 2·6) + 3 storeys · 3.84 kN/m · 3.5 m = 1088 + 40.32 = 1128.32 kN (statics)
    // L: AT summed = 128 m², KLL·AT = 512 m² = 5511.1 ft²; 0.25 + 15/74.237 = 0.45206 (SI form with
    // 4.57: 0.45197) → 2.4·0.45206·128 = 138.87 kN (ASCE 7-22 Eq. 4.7-1)
    // Pu = 1.2·1128.32 + 1.6·138.87 + 0.5·64 = 1608.18 kN (ASCE 7-22 §2.3.1 comb. 2)
    const si = [2, 64, 6 * kPa, 2.4 * kPa, 5 * kPa, 1 * kPa, 3.84 * kN, 3.5, 4] as const;
    expect(gn('col_dead', ...si) / kN).toBeCloseTo(1128.32, 6);
    expect(gn('col_live', ...si) / kN).toBeCloseTo(138.872, 2);
    expect(gn('col_pu', ...si) / kN).toBeCloseTo(1608.18, 1);
  });

  it('assembly occupancy is not reduced', () => {
    // ASCE 7-22 §4.7.5 from memory: 2 floors · 64 m² · 5 kPa = 640 kN
    expect(gn('col_live', 2, 64, 6 * kPa, 5 * kPa, 5 * kPa, 0, 3.84 * kN, 3.5, 4, 'assembly') / kN).toBeCloseTo(640, 6);
  });
});

describe('bad arguments', () => {
  it('refuses fractional floors, zero storey height and unknown occupancy', () => {
    expectLibError(() => g('col_dead', 1.5, 64, 6000, 2400, 5000, 1000, 3840, 3.5, 4), /floors must be a whole number >= 0/);
    expectLibError(() => g('col_pu', 2, 64, 6000, 2400, 5000, 1000, 3840, 0, 4), /h_storey must be positive/);
    expectLibError(() => g('col_live', 2, 64, 6000, 2400, 5000, 1000, 3840, 3.5, 4, 'hall'), /unknown occupancy "hall"/);
  });
});
