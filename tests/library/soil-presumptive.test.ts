import { describe, expect, it } from 'vitest';
import { num } from './support-call';
import { LibraryError } from '../../runtime/library/types';
import { ft, kPa, psf } from '../../runtime/units/si';

// IBC Table 1806.2 (read in the 2012 edition; that 2018/2021 keep it is from memory)
const ROWS = [
  ['crystalline bedrock', 12000, 1200, 0.7, null],
  ['sedimentary rock', 4000, 400, 0.35, null],
  ['sandy gravel', 3000, 200, 0.35, null],
  ['sand', 2000, 150, 0.25, null],
  ['clay', 1500, 100, null, 130],
] as const;

describe('q_presumptive and friends, IBC Table 1806.2', () => {
  it.each(ROWS)('%s: %d psf, %d psf/ft, μ %s, c %s', (cls, q, lat, mu, c) => {
    expect(num('q_presumptive', cls) / psf).toBeCloseTo(q, 8);
    expect(num('lateral_presumptive', cls) / (psf / ft)).toBeCloseTo(lat, 8);
    if (mu === null) expect(() => num('mu_presumptive', cls)).toThrow(/no friction coefficient/);
    else expect(num('mu_presumptive', cls)).toBe(mu);
    if (c === null) expect(() => num('c_presumptive', cls)).toThrow(/no cohesion/);
    else expect(num('c_presumptive', cls) / psf).toBeCloseTo(c, 8);
  });

  it('SI values: 1 psf = 0.0479 kPa, 1 psf/ft = 0.157 kPa/m', () => {
    // IBC Table 1806.2 SI note: sand 2000 psf = 95.8 kPa; 150 psf/ft = 23.6 kPa/m
    expect(num('q_presumptive', 'sand') / kPa).toBeCloseTo(95.76, 1);
    expect(num('lateral_presumptive', 'sand') / kPa).toBeCloseTo(23.56, 1);
  });

  it('accepts the table wording, USCS symbols and class numbers', () => {
    // IBC Table 1806.2: class 4 includes SW, SP, SM, SC, GM, GC; class 5 CL, ML, MH, CH
    expect(num('q_presumptive', 'SM') / psf).toBeCloseTo(2000, 8);
    expect(num('q_presumptive', 'silty gravel') / psf).toBeCloseTo(2000, 8);
    expect(num('q_presumptive', 'GW') / psf).toBeCloseTo(3000, 8);
    expect(num('q_presumptive', 'CH') / psf).toBeCloseTo(1500, 8);
    expect(num('q_presumptive', 'Sedimentary and foliated rock') / psf).toBeCloseTo(4000, 8);
    expect(num('q_presumptive', '1') / psf).toBeCloseTo(12000, 8);
  });

  it('refuses materials with no presumptive value and unknown classes', () => {
    // IBC §1806.2: mud, organic silt/clay, peat, unprepared fill need data
    expect(() => num('q_presumptive', 'peat')).toThrow(LibraryError);
    expect(() => num('q_presumptive', 'peat')).toThrow(/no presumptive value/);
    expect(() => num('q_presumptive', 'loam')).toThrow(/unknown soil class 'loam'/);
  });
});
