import { describe, expect, it } from 'vitest';
import { g, gn, expectLibError } from './gravity-call';
import { kN, kPa, kip, psf } from '../../runtime/units/si';

// Strength combinations: ASCE 7-22 §2.3.1 (the factors of ASCE 7-10 §2.3.2 / IBC §1605.2, read there);
// that 7-22 keeps the same factors is from memory.

describe('strength combinations on area loads (US input)', () => {
  it('1.4D alone', () => {
    // ASCE 7-22 §2.3.1 comb. 1: 1.4 × 100 psf = 140 psf
    expect(gn('combo_u1', 100 * psf) / psf).toBeCloseTo(140, 9);
  });

  it('1.2D + 1.6L governs an ordinary floor', () => {
    // comb. 2: 1.2·100 + 1.6·50 = 200 psf > comb. 1 140 psf > comb. 3 120 + 50 = 170 psf; ASCE 7-22 §2.3.1
    expect(gn('combo_u2', 100 * psf, 50 * psf) / psf).toBeCloseTo(200, 9);
    expect(gn('combo_u', 100 * psf, 50 * psf) / psf).toBeCloseTo(200, 9);
    expect(g('combo_u_governs', 100 * psf, 50 * psf)).toBe('1.2D + 1.6L + (0.5Lr or 0.3S or 0.5R)'); // ASCE 7-22 text
    expect(g('combo_u_governs', 100 * psf, 50 * psf, 0, 0, 0, '7-16')).toBe('1.2D + 1.6L + 0.5(Lr or S or R)');
  });

  it('1.4D governs when live load is small', () => {
    // comb. 1 140 psf > comb. 2 120 + 8 = 128 psf (L = 5 psf); ASCE 7-22 §2.3.1
    expect(gn('combo_u', 100 * psf, 5 * psf) / psf).toBeCloseTo(140, 9);
    expect(g('combo_u_governs', 100 * psf, 5 * psf)).toBe('1.4D');
  });

  it('ASCE 7-16: 1.6S governs a light roof, taking the largest of Lr, S, R', () => {
    // D = 15, Lr = 20, S = 30 psf: comb. 3 = 1.2·15 + 1.6·30 = 66 psf; comb. 2 = 18 + 0.5·30 = 33
    // (ASCE 7-16 §2.3.1 comb. 2 and 3, the ASCE 7-10 §2.3.2 factors; from memory)
    expect(gn('combo_u3', 15 * psf, 0, 20 * psf, 30 * psf, 0, '7-16') / psf).toBeCloseTo(66, 9);
    expect(gn('combo_u', 15 * psf, 0, 20 * psf, 30 * psf, 0, '7-16') / psf).toBeCloseTo(66, 9);
    expect(g('combo_u_governs', 15 * psf, 0, 20 * psf, 30 * psf, 0, '7-16')).toBe('1.2D + 1.6(Lr or S or R) + L');
    expect(gn('combo_u2', 15 * psf, 0, 20 * psf, 30 * psf, 0, '7-16') / psf).toBeCloseTo(33, 9);
  });

  it('ASCE 7-22 (the default): strength-level snow enters as 1.0S leading and 0.3S as a companion', () => {
    // ASCE 7-22 §2.3.1 (factors on S from memory): D = 15, Lr = 20, S = 30 psf:
    // comb. 3 = 1.2·15 + max(1.6·20, 1.0·30) = 18 + 32 = 50 psf (Lr now leads); comb. 2 = 18 + max(0.5·20, 0.3·30) = 28.
    expect(gn('combo_u3', 15 * psf, 0, 20 * psf, 30 * psf) / psf).toBeCloseTo(50, 9);
    expect(gn('combo_u2', 15 * psf, 0, 20 * psf, 30 * psf) / psf).toBeCloseTo(28, 9);
    expect(gn('combo_u', 15 * psf, 0, 20 * psf, 30 * psf, 0, '7-22') / psf).toBeCloseTo(50, 9);
    // S = 40 psf: comb. 3 = 18 + 40 = 58; a floor below, D = 100, L = 50: comb. 2 = 120 + 80 + max(10, 0.3·40 = 12) = 212 psf.
    expect(gn('combo_u', 15 * psf, 0, 20 * psf, 40 * psf) / psf).toBeCloseTo(58, 9);
    expect(g('combo_u_governs', 15 * psf, 0, 20 * psf, 40 * psf)).toBe('1.2D + (1.6Lr or 1.0S or 1.6R) + L');
    expect(gn('combo_u2', 100 * psf, 50 * psf, 20 * psf, 40 * psf) / psf).toBeCloseTo(212, 9);
    // The same loads under ASCE 7-16: 200 + 0.5·40 = 220 psf.
    expect(gn('combo_u2', 100 * psf, 50 * psf, 20 * psf, 40 * psf, 0, '7-16') / psf).toBeCloseTo(220, 9);
  });
});

describe('service combinations (for soil pressure)', () => {
  it('D + L and the governing ASD gravity combination', () => {
    // ASCE 7-22 §2.4.1 (as ASCE 7-10 §2.4.1): D + L = 120 + 50 = 170 psf
    expect(gn('combo_service', 120 * psf, 50 * psf) / psf).toBeCloseTo(170, 9);
    // D = 20, L = 50, Lr = 20: D + L = 70; D + Lr = 40; D + 0.75(50 + 20) = 72.5 psf governs
    expect(gn('combo_asd', 20 * psf, 50 * psf, 20 * psf) / psf).toBeCloseTo(72.5, 9);
  });

  it('snow in ASD: 0.7S under ASCE 7-22, 1.0S under ASCE 7-16', () => {
    // ASCE 7-22 §2.4.1 (0.7S from memory): D = 100, L = 50, Lr = 20, S = 40 psf: roof term max(20, 0.7·40 = 28) = 28;
    // D + 0.75L + 0.75·28 = 100 + 37.5 + 21 = 158.5 psf > D + L = 150. ASCE 7-16 §2.4.1: 100 + 37.5 + 30 = 167.5 psf.
    expect(gn('combo_asd', 100 * psf, 50 * psf, 20 * psf, 40 * psf) / psf).toBeCloseTo(158.5, 9);
    expect(gn('combo_asd', 100 * psf, 50 * psf, 20 * psf, 40 * psf, 0, '7-16') / psf).toBeCloseTo(167.5, 9);
  });
});

describe('SI input and force versions', () => {
  it('area loads in kPa', () => {
    // comb. 2: 1.2·6 + 1.6·2.4 = 7.2 + 3.84 = 11.04 kPa; ASCE 7-22 §2.3.1
    expect(gn('combo_u', 6 * kPa, 2.4 * kPa) / kPa).toBeCloseTo(11.04, 9);
  });

  it('forces in kN and kip', () => {
    // comb. 2: 1.2·500 + 1.6·200 = 920 kN; service 700 kN; ASCE 7-22 §2.3.1
    expect(gn('combo_u_force', 500 * kN, 200 * kN) / kN).toBeCloseTo(920, 9);
    expect(gn('combo_service_force', 500 * kN, 200 * kN) / kN).toBeCloseTo(700, 9);
    // comb. 1 1.4·300 = 420 kip > comb. 2 360 + 16 = 376 kip
    expect(g('combo_u_governs_force', 300 * kip, 10 * kip)).toBe('1.4D');
    expect(gn('combo_u1_force', 300 * kip) / kip).toBeCloseTo(420, 9);
  });
});

describe('bad arguments', () => {
  it('negative or non-numeric loads are refused', () => {
    expectLibError(() => g('combo_u', -1 * kPa, 2 * kPa), /D must not be negative/);
    expectLibError(() => g('combo_u2', 1 * kPa, 2 * kPa, -3), /Lr must not be negative/);
    expectLibError(() => g('combo_service', 1 * kPa, 'x'), /L must be a finite number/);
    expectLibError(() => g('combo_u', 1 * kPa, 2 * kPa, 0, 0, 0, '7-10'), /unknown ASCE 7 edition "7-10"/);
  });
});
