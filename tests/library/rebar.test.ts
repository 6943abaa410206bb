import { describe, expect, it } from 'vitest';
import { g, gn, expectLibError, expectRel } from './gravity-call';
import { ft, inch, lbf, mm } from '../../runtime/units/si';

const lbPerFt = lbf / 9.80665 / ft; // kg/m in 1 lb/ft

// ASTM A615/A615M bar dimensions (as in the PCI Design Handbook, 7th ed., Design Aid 15.4.1)
const TABLE: [string, string, number, number, number, number, number, number][] = [
  // in.-lb, soft metric, dia in, dia mm, area in², area mm², lb/ft, kg/m
  ['#3', '#10M', 0.375, 9.5, 0.11, 71, 0.376, 0.56],
  ['#4', '#13M', 0.5, 12.7, 0.2, 129, 0.668, 0.994],
  ['#5', '#16M', 0.625, 15.9, 0.31, 199, 1.043, 1.552],
  ['#6', '#19M', 0.75, 19.1, 0.44, 284, 1.502, 2.235],
  ['#7', '#22M', 0.875, 22.2, 0.6, 387, 2.044, 3.042],
  ['#8', '#25M', 1.0, 25.4, 0.79, 510, 2.67, 3.973],
  ['#9', '#29M', 1.128, 28.7, 1.0, 645, 3.4, 5.06],
  ['#10', '#32M', 1.27, 32.3, 1.27, 819, 4.303, 6.404],
  ['#11', '#36M', 1.41, 35.8, 1.56, 1006, 5.313, 7.907],
  ['#14', '#43M', 1.693, 43.0, 2.25, 1452, 7.65, 11.38],
  ['#18', '#57M', 2.257, 57.3, 4.0, 2581, 13.6, 20.24],
];

describe('ASTM A615 inch-pound bars (US units back out)', () => {
  it.each(TABLE)('%s', (us, _m, dIn, _dMm, aIn2, _aMm2, lbFt) => {
    // ASTM A615/A615M; printed to 3 decimals (in, lb/ft) and 2 decimals (in²)
    expect(gn('bar_dia', us) / inch).toBeCloseTo(dIn, 3);
    expect(gn('bar_area', us) / (inch * inch)).toBeCloseTo(aIn2, 2);
    expect(gn('bar_mass', us) / lbPerFt).toBeCloseTo(lbFt, 3);
  });
});

describe('ASTM A615M soft-metric bars (SI)', () => {
  it.each(TABLE)('%s = %s', (us, m, _dIn, dMm, _aIn2, aMm2, _lbFt, kgM) => {
    // ASTM A615/A615M; printed to 0.1 mm, 1 mm², 0.001 kg/m
    expect(gn('bar_dia', m) / mm).toBeCloseTo(dMm, 1);
    expect(Math.abs(gn('bar_area', m) / (mm * mm) - aMm2)).toBeLessThanOrEqual(0.5);
    expect(gn('bar_mass', m)).toBeCloseTo(kgM, 3);
    // the soft-metric bar is the same bar: areas agree within the rounding of the two tables
    expectRel(gn('bar_area', m), gn('bar_area', us), 0.02);
  });
});

describe('ISO 6935-2 metric bars', () => {
  // computed πd²/4: Ø8 50.3 ... Ø40 1256.6 mm²
  const iso: [number, number][] = [[8, 50.3], [10, 78.5], [12, 113.1], [14, 153.9], [16, 201.1],
    [20, 314.2], [25, 490.9], [28, 615.8], [32, 804.2], [40, 1256.6]];
  it.each(iso)('D%i', (d, area) => {
    expect(gn('bar_dia', `D${d}`) / mm).toBeCloseTo(d, 9);
    expect(Math.abs(gn('bar_area', `D${d}`) / (mm * mm) - area)).toBeLessThanOrEqual(0.05);
    // unit mass 0.00617 d² kg/m, ASTM A615/A615M from memory; printed to 3 figures
    expectRel(gn('bar_mass', `D${d}`), 0.00617 * d * d, 0.002);
  });
});

describe('inch-pound weights follow steel at 490 pcf', () => {
  it('weight per foot = πd²/4 × 490 pcf of the nominal diameter', () => {
    // common practice: steel 490 pcf, so 3.403 lb/ft per in² of nominal section; printed weights within 0.2 %
    for (const [us] of TABLE) {
      const dIn = gn('bar_dia', us) / inch;
      expectRel(gn('bar_mass', us) / lbPerFt, ((Math.PI * dIn * dIn) / 4) * (490 / 144), 0.002);
    }
  });
});

describe('bad designations', () => {
  it('unknown bars throw with the list of designations', () => {
    expectLibError(() => g('bar_area', '#12'), /unknown bar "#12"; use "#3".."#18"/);
    expectLibError(() => g('bar_area', '#2'), /unknown bar "#2"/);
    expectLibError(() => g('bar_dia', 'D18'), /unknown bar "D18"/);
    expectLibError(() => g('bar_mass', '16M'), /unknown bar "16M"/);
    expectLibError(() => g('bar_area', 5), /bar must be a designation/);
  });
});
