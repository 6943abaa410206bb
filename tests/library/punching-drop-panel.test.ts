import { describe, expect, it } from 'vitest';
import { call, num } from './support-call';
import { LibraryError } from '../../runtime/library/types';
import { inch, kip, mm, MPa, kN, kPa, psi, psf } from '../../runtime/units/si';

const fc = 5000 * psi; // √f'c = 70.711 psi

describe('punching at a drop panel or shear cap: both critical sections', () => {
  it('drop panel 96 x 96 in: the section inside the drop governs', () => {
    // Interior column 20 x 20 in, d_drop = 11.5 in, d_slab = 7.5 in, Vu = 300 kip, qu = 300 psf.
    // Worked by hand from ACI 318-19 §22.6.4.1 and Table 22.6.5.2:
    // inner: bo = 4(20 + 11.5) = 126 in; λs = √(2/(1 + 1.15)) = 0.96449; (a) 4·0.96449·70.711 = 272.80 psi
    //   (c) (2 + 40·11.5/126)·0.96449·70.711 = 385.38 > (a); Vc = 272.80·126·11.5 = 395.28 kip
    //   Vu = 300 − 0.300·(31.5/12)² = 297.93 kip; ratio = 297.93/(0.75·395.28) = 1.0050
    // outer: bo = 4(96 + 7.5) = 414 in; λs = 1; (c) (2 + 40·7.5/414)·70.711 = 192.66 psi < 4√f'c
    //   Vc = 192.66·414·7.5 = 598.21 kip; Vu = 300 − 0.300·(103.5/12)² = 277.68 kip; ratio = 0.6189
    const args = [300 * kip, 300 * psf, fc, 20 * inch, 20 * inch, 11.5 * inch, 96 * inch, 96 * inch, 7.5 * inch, 'interior'];
    expect(num('punch_drop_ratio', ...args)).toBeCloseTo(1.005, 3);
    expect(call('punch_drop_governs', ...args)).toMatch(/column face, within the drop/);
    expect(num('bo_drop_outer', 96 * inch, 96 * inch, 7.5 * inch, 'interior') / inch).toBeCloseTo(414, 9);
    // The outer section alone, through punch_ratio with the drop as the loaded area:
    expect(num('punch_ratio', 300 * kip, 300 * psf, fc, 96 * inch, 96 * inch, 7.5 * inch, 'interior')).toBeCloseTo(0.6189, 3);
  });

  it('small shear cap 40 x 40 in: the section outside the cap governs', () => {
    // d_cap = 14 in: inner bo = 4·34 = 136 in, λs = √(2/2.4) = 0.91287, (a) = 258.20 psi,
    //   Vc = 258.20·136·14 = 491.61 kip; Vu = 300 − 0.3·(34/12)² = 297.59 kip; ratio = 0.8071
    // outer: bo = 4·47.5 = 190 in; (c) (2 + 300/190)·70.711 = 253.07 psi; Vc = 253.07·190·7.5 = 360.62 kip
    //   Vu = 300 − 0.3·(47.5/12)² = 295.30 kip; ratio = 295.30/(0.75·360.62) = 1.0918
    const args = [300 * kip, 300 * psf, fc, 20 * inch, 20 * inch, 14 * inch, 40 * inch, 40 * inch, 7.5 * inch, 'interior'];
    expect(num('punch_drop_ratio', ...args)).toBeCloseTo(1.0918, 3);
    expect(call('punch_drop_governs', ...args)).toMatch(/outside the drop edge/);
  });

  it('SI input gives the same ratio as the inch/psi case', () => {
    // The 96-in drop of the first case in mm/MPa/kN/kPa: same section, same ratio 1.0050 (hand calc above)
    const r = num('punch_drop_ratio', 300 * 4.448222 * kN, 300 * 0.04788026 * kPa, 34.47379 * MPa,
      508 * mm, 508 * mm, 292.1 * mm, 2438.4 * mm, 2438.4 * mm, 190.5 * mm, 'interior');
    expect(r).toBeCloseTo(1.005, 3);
  });

  it('edge drop panel: x1 is measured from the slab edge, like c1', () => {
    // Edge column 20 x 20, drop 60 (from edge) x 96 in, d_drop 11.5, d_slab 7.5:
    // outer bo = 2(60 + 3.75) + (96 + 7.5) = 231 in (e.1 edge formula [MEMORY / geometry])
    expect(num('bo_drop_outer', 60 * inch, 96 * inch, 7.5 * inch, 'edge') / inch).toBeCloseTo(231, 9);
    // Vu = 150 kip, qu = 300 psf. Inner: b1 = 25.75, b2 = 31.5, bo = 83 in, (a) 272.80 psi governs
    //   ((c) = (2 + 30·11.5/83)·0.96449·70.711 = 419.88), Vc = 272.80·83·11.5 = 260.39 kip,
    //   Vu = 150 − 0.3·25.75·31.5/144 = 148.31 kip, ratio = 0.7594
    // Outer: bo = 231, β = 96/60 = 1.6, (c) (2 + 30·7.5/231)·70.711 = 210.30 psi governs,
    //   Vc = 210.30·231·7.5 = 364.34 kip, Vu = 150 − 0.3·63.75·103.5/144 = 136.25 kip, ratio = 0.4986
    const args = [150 * kip, 300 * psf, fc, 20 * inch, 20 * inch, 11.5 * inch, 60 * inch, 96 * inch, 7.5 * inch, 'edge'];
    expect(num('punch_drop_ratio', ...args)).toBeCloseTo(0.7594, 3);
    expect(num('punch_ratio', 150 * kip, 300 * psf, fc, 60 * inch, 96 * inch, 7.5 * inch, 'edge')).toBeCloseTo(0.4986, 3);
  });

  it('rejects a drop too small for the inner section, a drop d not above the slab d, and bad φ', () => {
    // inner section needs c + d_drop = 20 + 11.5 = 31.5 in ≤ the drop size
    expect(() => num('punch_drop_ratio', 300 * kip, 300 * psf, fc, 20 * inch, 20 * inch, 11.5 * inch, 30 * inch, 30 * inch, 7.5 * inch, 'interior'))
      .toThrow(/drop panel too small/);
    expect(() => num('punch_drop_ratio', 300 * kip, 300 * psf, fc, 20 * inch, 20 * inch, 7 * inch, 96 * inch, 96 * inch, 7.5 * inch, 'interior'))
      .toThrow(LibraryError);
    expect(() => num('punch_drop_ratio', 300 * kip, 300 * psf, fc, 20 * inch, 20 * inch, 11.5 * inch, 96 * inch, 96 * inch, 7.5 * inch, 'interior', 1.5))
      .toThrow(/φ must be in/);
    expect(() => num('punch_drop_ratio', 300 * kip, 300 * psf, fc, 20 * inch, 20 * inch, 11.5 * inch, 96 * inch, 96 * inch, 7.5 * inch, 'centre'))
      .toThrow(/unknown position/);
  });
});
