import { describe, expect, it } from 'vitest';
import { call, num } from './support-call';
import { LibraryError } from '../../runtime/library/types';
import { deg, ft, kN, kPa, ksf, m, pcf, psf } from '../../runtime/units/si';

// computed from the closed forms Nq = e^(π tanφ)tan²(45° + φ/2), Nc = (Nq − 1)cotφ, Nγ of Vesic (1973), Meyerhof (1963), Hansen (1970); as printed in Das, Principles of Foundation Engineering, Table 3.3 (table number from memory), 2 decimals → ±0.02
const B2 = [
  [0, 5.14, 1.0, 0.0, 0.0, 0.0], [10, 8.35, 2.47, 1.22, 0.37, 0.39], [20, 14.83, 6.4, 5.39, 2.87, 2.95],
  [25, 20.72, 10.66, 10.88, 6.77, 6.76], [30, 30.14, 18.4, 22.4, 15.67, 15.07],
  [35, 46.12, 33.3, 48.03, 37.15, 33.92], [40, 75.31, 64.2, 109.41, 93.69, 79.54],
] as const;

describe('Reissner/Prandtl Nq, Nc and the three Nγ', () => {
  it.each(B2)('φ = %d°: Nc %f, Nq %f, Nγ V %f, M %f, H %f', (phi, nc, nq, ngv, ngm, ngh) => {
    const p = phi * deg;
    expect(Math.abs(num('nc_vesic', p) - nc)).toBeLessThanOrEqual(0.02);
    expect(Math.abs(num('nq_vesic', p) - nq)).toBeLessThanOrEqual(0.02);
    expect(Math.abs(num('ngamma_vesic', p) - ngv)).toBeLessThanOrEqual(0.02);
    expect(Math.abs(num('ngamma_meyerhof', p) - ngm)).toBeLessThanOrEqual(0.02);
    expect(Math.abs(num('ngamma_hansen', p) - ngh)).toBeLessThanOrEqual(0.02);
  });
  it('φ = 30° to three decimals: Nq 18.401, Nc 30.140, Nγ 22.402', () => {
    // computed from the closed forms above
    expect(num('nq_vesic', 30 * deg)).toBeCloseTo(18.401, 3);
    expect(num('nc_vesic', 30 * deg)).toBeCloseTo(30.14, 3);
    expect(num('ngamma_vesic', 30 * deg)).toBeCloseTo(22.402, 3);
  });
});

describe('shape and depth factors (forms from memory)', () => {
  it('De Beer shape factors at φ = 30°, B/L = 2/3', () => {
    // from memory (De Beer 1970 via Vesic 1973): sc = 1 + (2/3)(18.401/30.140) = 1.4070;
    // sq = 1 + (2/3)tan30° = 1.3849; sγ = 1 − 0.4·(2/3) = 0.7333
    expect(num('sc_debeer', 30 * deg, 2, 3)).toBeCloseTo(1.407, 4);
    expect(num('sq_debeer', 30 * deg, 2, 3)).toBeCloseTo(1.3849, 4);
    expect(num('sgamma_debeer', 30 * deg, 2, 3)).toBeCloseTo(0.7333, 4);
  });
  it('Hansen depth factors, Df/B ≤ 1 and > 1', () => {
    // from memory (Hansen 1970): Df/B = 0.75: dc = 1.3, dq = 1 + 2·0.57735·0.25·0.75 = 1.2165;
    // Df/B = 2: k = atan 2 = 1.10715: dc = 1.4429, dq = 1.3196
    expect(num('dc_hansen', 30 * deg, 1.5, 2)).toBeCloseTo(1.3, 10);
    expect(num('dq_hansen', 30 * deg, 1.5, 2)).toBeCloseTo(1.2165, 4);
    expect(num('dc_hansen', 30 * deg, 4, 2)).toBeCloseTo(1.4429, 4);
    expect(num('dq_hansen', 30 * deg, 4, 2)).toBeCloseTo(1.3196, 4);
  });
  it('Meyerhof depth factors: √Kp = tan 60° = 1.7321 at φ = 30°', () => {
    // from memory (Meyerhof 1963): dc = 1 + 0.2·1.7321·0.75 = 1.2598; dq = dγ = 1 + 0.1·1.7321·0.75 = 1.1299;
    // φ ≤ 10°: dq = 1
    expect(num('dc_meyerhof', 30 * deg, 1.5, 2)).toBeCloseTo(1.2598, 4);
    expect(num('dq_meyerhof', 30 * deg, 1.5, 2)).toBeCloseTo(1.1299, 4);
    expect(num('dq_meyerhof', 5 * deg, 1.5, 2)).toBe(1);
  });
});

describe('qu_general, q_allow_fs, bearing_ok', () => {
  it('sand, 2 x 3 m footing at Df = 1.5 m, φ = 30°, γ = 18 kN/m³ (Vesic Nγ, Hansen depth)', () => {
    // by hand from b.2 factors and the forms above: q = 27 kPa
    // 27·18.401·1.3849·1.2165 = 837.03; ½·18·2·22.402·0.7333·1 = 295.71; qu = 1132.74 kPa; FS 3 → 377.58 kPa
    const qu = num('qu_general', 0, 27 * kPa, 18 * kN, 2 * m, 3 * m, 1.5 * m, 30 * deg);
    expect(qu / kPa).toBeCloseTo(1132.74, 1);
    expect(num('q_allow_fs', qu, 3) / kPa).toBeCloseTo(377.58, 1);
    expect(call('bearing_ok', 350 * kPa, qu, 3)).toBe(true);
    expect(call('bearing_ok', 400 * kPa, qu, 3)).toBe(false);
  });
  it('cohesion term and the choice of methods', () => {
    // c = 10 kPa adds 10·30.140·1.4070·1.3 = 551.29 kPa (by hand)
    const base = num('qu_general', 0, 27 * kPa, 18 * kN, 2, 3, 1.5, 30 * deg);
    expect(num('qu_general', 10 * kPa, 27 * kPa, 18 * kN, 2, 3, 1.5, 30 * deg) - base).toBeCloseTo(551.29 * kPa, -1);
    // Meyerhof Nγ 15.67 instead of 22.40 scales the γ term by 15.668/22.402
    const mey = num('qu_general', 0, 0, 18 * kN, 2, 3, 1.5, 30 * deg, 'meyerhof', 'none');
    expect(mey / kPa).toBeCloseTo(0.5 * 18 * 2 * 15.668 * 0.7333, 0);
  });
  it('US input: 6 ft square footing on sand, φ = 32°, γ = 120 pcf, Df = 4 ft, FS = 3', () => {
    // b.1 closed forms at 32°: Nq = e^{π·0.62487}·tan²(61°) = 7.1213·3.2546 = 23.177, Nc = 22.177/0.62487 = 35.490,
    // Nγ = 2·24.177·0.62487 = 30.215; sq = 1.6249, sγ = 0.6; Df/B = 0.667: dq = 1 + 2·0.62487·(1 − 0.52992)²·0.667 = 1.1841
    // qu = 480·23.177·1.6249·1.1841 + 0.5·120·6·30.215·0.6 = 21405 + 6526 = 27931 psf
    const qu = num('qu_general', 0, 480 * psf, 120 * pcf, 6 * ft, 6 * ft, 4 * ft, 32 * deg);
    expect(Math.abs(qu / psf / 27931 - 1)).toBeLessThan(0.001);
    expect(num('q_allow_fs', qu, 3) / ksf).toBeCloseTo(9.31, 1);
  });
  it('rejects FS below 1, L < B and unknown methods', () => {
    expect(() => num('q_allow_fs', 1000 * kPa, 0.8)).toThrow(LibraryError);
    expect(() => num('q_allow_fs', 1000 * kPa, 0.8)).toThrow(/factor of safety must be at least 1/);
    expect(() => num('sc_debeer', 30 * deg, 3, 2)).toThrow(/L must not be less than B/);
    expect(() => num('qu_general', 0, 27 * kPa, 18 * kN, 2, 3, 1.5, 30 * deg, 'terzaghi')).toThrow(/unknown Nγ method/);
  });
});
