import { describe, expect, it } from 'vitest';
import { call, num } from './support-call';
import { LibraryError } from '../../runtime/library/types';
import { inch, kip, kipFt, mm, psi, ksi, kN, kNm } from '../../runtime/units/si';

const i = inch;

/**
 * Independent check of Jc by brute-force integration over the faces of the critical section,
 * as ACI R8.4.4.2.3 defines it: faces ⟂ the moment axis count their full polar moment
 * (plan x² + vertical z²), faces ∥ the axis count only x²; x from the centroid of the faces.
 */
function jcByIntegration(b1: number, b2: number, d: number, faces: { perp: number; parAt: number[] }): { jc: number; cAB: number } {
  const n = 400;
  const pts: { x: number; z: number; w: number; perp: boolean }[] = [];
  for (let f = 0; f < faces.perp; f++) {
    for (let a = 0; a < n; a++) for (let b = 0; b < 40; b++) {
      pts.push({ x: ((a + 0.5) / n) * b1, z: ((b + 0.5) / 40 - 0.5) * d, w: (b1 / n) * (d / 40), perp: true });
    }
  }
  for (const x of faces.parAt) for (let b = 0; b < 40; b++) pts.push({ x, z: 0, w: b2 * d / 40, perp: false });
  const area = pts.reduce((s, p) => s + p.w, 0);
  const xBar = pts.reduce((s, p) => s + p.w * p.x, 0) / area;
  const jc = pts.reduce((s, p) => s + p.w * ((p.x - xBar) ** 2 + (p.perp ? p.z ** 2 : 0)), 0);
  return { jc, cAB: xBar };
}

describe('gamma_f, gamma_v (ACI 318-19 §8.4.2.2.2, §8.4.4.2.2)', () => {
  it('square interior column: γf = 0.60, γv = 0.40', () => {
    // γf = 1/(1 + 2/3) = 0.6 for b1 = b2: common practice (the textbook 60/40 split)
    expect(num('gamma_f', 23 * i, 23 * i)).toBeCloseTo(0.6, 12);
    expect(num('gamma_v', 23 * i, 23 * i)).toBeCloseTo(0.4, 12);
  });
  it('edge column 16 x 16, d = 7: b1 = 19.5, b2 = 23 in', () => {
    // γf = 1/(1 + (2/3)√(19.5/23)) = 1/(1 + 0.61385) = 0.61964 (arithmetic by hand)
    expect(num('gamma_f', 19.5 * i, 23 * i)).toBeCloseTo(0.61964, 5);
    expect(num('gamma_v', 19.5 * i, 23 * i)).toBeCloseTo(0.38036, 5);
  });
});

describe('Jc and c_AB of the critical section', () => {
  it('interior 16 x 16, d = 7: Jc = d b1³/6 + b1 d³/6 + d b2 b1²/2', () => {
    // ACI 318-19 R8.4.4.2.3 interior formula (from memory): 7·23³/6 + 23·7³/6 + 7·23·23²/2
    //   = 14194.83 + 1314.83 + 42584.50 = 58094.17 in⁴; c_AB = b1/2 = 11.5 in
    expect(num('jc_punch', 16 * i, 16 * i, 7 * i, 'interior') / i ** 4).toBeCloseTo(58094.17, 1);
    expect(num('c_ab_punch', 16 * i, 16 * i, 7 * i, 'interior') / i).toBeCloseTo(11.5, 9);
    const ref = jcByIntegration(23, 23, 7, { perp: 2, parAt: [0, 23] });
    expect(num('jc_punch', 16 * i, 16 * i, 7 * i, 'interior') / i ** 4 / ref.jc).toBeCloseTo(1, 4);
  });

  it('edge 16 x 16, d = 7 (3 sides): c_AB = b1²/(2b1 + b2), Jc by the sum of sides', () => {
    // c_AB = 19.5²/(39 + 23) = 6.1331 in; c_CD = 19.5 − 6.1331 = 13.3669 in
    // Jc = 2[7·19.5³/12 + 19.5·7³/12 + 19.5·7·(9.75 − 6.1331)²] + 23·7·6.1331² = 19392.8 in⁴
    // (edge form as in textbook practice, from memory; checked by integration below)
    expect(num('c_ab_punch', 16 * i, 16 * i, 7 * i, 'edge') / i).toBeCloseTo(6.1331, 4);
    expect(num('c_cd_punch', 16 * i, 16 * i, 7 * i, 'edge') / i).toBeCloseTo(13.3669, 4);
    expect(num('jc_punch', 16 * i, 16 * i, 7 * i, 'edge') / i ** 4).toBeCloseTo(19392.8, 0);
    const ref = jcByIntegration(19.5, 23, 7, { perp: 2, parAt: [0] });
    expect(ref.cAB).toBeCloseTo(6.1331, 3);
    expect(num('jc_punch', 16 * i, 16 * i, 7 * i, 'edge') / i ** 4 / ref.jc).toBeCloseTo(1, 4);
  });

  it('corner 16 x 16, d = 7 (2 sides): c_AB = b1²/(2(b1 + b2)), product of inertia neglected', () => {
    // c_AB = 19.5²/78 = 4.875 in; Jc = 7·19.5³/12 + 19.5·7³/12 + 136.5·4.875² + 136.5·4.875² = 11370.73 in⁴
    expect(num('c_ab_punch', 16 * i, 16 * i, 7 * i, 'corner') / i).toBeCloseTo(4.875, 9);
    expect(num('jc_punch', 16 * i, 16 * i, 7 * i, 'corner') / i ** 4).toBeCloseTo(11370.73, 1);
    const ref = jcByIntegration(19.5, 19.5, 7, { perp: 1, parAt: [0] });
    expect(num('jc_punch', 16 * i, 16 * i, 7 * i, 'corner') / i ** 4 / ref.jc).toBeCloseTo(1, 4);
  });
});

describe('vu_punch_moment = Vu/(bo d) + γv Msc c_AB / Jc', () => {
  it('interior: Vu = 150 kip, Msc = 40 kip-ft', () => {
    // 150000/(92·7) = 232.92 psi; 0.4·480000·11.5/58094.17 = 38.01 psi; vu = 270.93 psi (by hand)
    expect(num('vu_punch_moment', 150 * kip, 40 * kipFt, 16 * i, 16 * i, 7 * i, 'interior') / psi).toBeCloseTo(270.93, 1);
  });
  it('edge: Vu = 100 kip, Msc = 50 kip-ft', () => {
    // 100000/(62·7) = 230.41 psi; 0.38036·600000·6.1331/19392.8 = 72.18 psi; vu = 302.59 psi (by hand)
    expect(num('vu_punch_moment', 100 * kip, 50 * kipFt, 16 * i, 16 * i, 7 * i, 'edge') / psi).toBeCloseTo(302.59, 1);
  });
  it('SI input gives the same stress as inch/psi input', () => {
    // the interior case in kN, kN·m, mm: 667.233 kN, 54.2331 kN·m, 406.4 mm, 177.8 mm → 270.93 psi
    const v = num('vu_punch_moment', 667.2333 * kN, 54.23310 * kNm, 406.4 * mm, 406.4 * mm, 177.8 * mm, 'interior');
    expect(v / psi).toBeCloseTo(270.93, 1);
  });
  it('rejects negative Vu and unknown position', () => {
    expect(() => num('vu_punch_moment', -1, 0, 0.4, 0.4, 0.18, 'interior')).toThrow(/Vu must not be negative/);
    expect(() => num('vu_punch_moment', 1, 0, 0.4, 0.4, 0.18, 'side')).toThrow(LibraryError);
  });
});

describe('§8.6.1.2 minimum steel at heavily stressed columns (ACI 318-19)', () => {
  it('applies when vuv > φ 2 λs λ √f\'c, and not in 318-14', () => {
    // ACI 318-19 §8.6.1.2, from memory: f'c = 5000, d = 7 (λs = 1): φ2√f'c = 0.75·2·70.711 = 106.07 psi
    expect(call('punch_min_steel_needed', 150 * psi, 5000 * psi, 7 * i)).toBe(true);
    expect(call('punch_min_steel_needed', 100 * psi, 5000 * psi, 7 * i)).toBe(false);
    // d = 20 in: λs = 0.8165 → 86.60 psi, so 100 psi now needs the steel
    expect(call('punch_min_steel_needed', 100 * psi, 5000 * psi, 20 * i)).toBe(true);
    expect(call('punch_min_steel_needed', 150 * psi, 5000 * psi, 7 * i, 0.75, 1, '318-14')).toBe(false);
  });
  it('As,min = 5 vuv bslab bo / (φ αs fy)', () => {
    // ACI 318-19 §8.6.1.2 As,min = 5vuv·bslab·bo/(φαs fy), from memory: 5·150·40·92/(0.75·40·60000) = 1.5333 in² (by hand)
    expect(num('as_min_punch', 150 * psi, 40 * i, 92 * i, 60 * ksi, 'interior') / i ** 2).toBeCloseTo(1.5333, 4);
    // edge αs = 30: ×40/30 → 2.0444 in²
    expect(num('as_min_punch', 150 * psi, 40 * i, 92 * i, 60 * ksi, 'edge') / i ** 2).toBeCloseTo(2.0444, 4);
    expect(() => num('as_min_punch', 150 * psi, 40 * i, 92 * i, 60 * ksi, 'edge', 2)).toThrow(/φ must be in/);
  });
});
