import { describe, expect, it } from 'vitest';
import { call, num } from './support-call';
import { LibraryError } from '../../runtime/library/types';
import { inch, kip, mm, MPa, psi, psf, kN } from '../../runtime/units/si';

const fc5000 = 5000 * psi;

// hand calculation from ACI 318-19 Table 22.6.5.2; stresses printed to 0.1 psi, forces to 0.1 kip
const E8 = [
  { pos: 'interior', c1: 16, c2: 16, d: 7, fc: 5000, a: 282.8, b: 424.3, c: 356.6, vc: 282.8, Vc: 182.2, phiVc: 136.6 },
  { pos: 'edge', c1: 16, c2: 16, d: 7, fc: 5000, a: 282.8, b: 424.3, c: 380.9, vc: 282.8, Vc: 122.8, phiVc: 92.1 },
  { pos: 'corner', c1: 16, c2: 16, d: 7, fc: 5000, a: 282.8, b: 424.3, c: 395.3, vc: 282.8, Vc: 77.2, phiVc: 57.9 },
  { pos: 'interior', c1: 24, c2: 24, d: 12, fc: 5000, a: 269.7, b: 404.5, c: 359.6, vc: 269.7, Vc: 466.0, phiVc: 349.5 },
  { pos: 'interior', c1: 12, c2: 36, d: 8, fc: 4000, a: 253.0, b: 210.8, c: 284.6, vc: 210.8, Vc: 215.9, phiVc: 161.9 },
] as const;

describe('vc_punch, ACI 318-19 Table 22.6.5.2', () => {
  it.each(E8)('e.8 $pos $c1 x $c2, d = $d: expressions, vc, Vc', (r) => {
    const args = [r.fc * psi, r.c1 * inch, r.c2 * inch, r.d * inch, r.pos];
    // hand calculation from ACI 318-19 Table 22.6.5.2
    expect(Math.abs(num('vc_punch_a', ...args) / psi - r.a)).toBeLessThan(0.06);
    expect(Math.abs(num('vc_punch_b', ...args) / psi - r.b)).toBeLessThan(0.06);
    expect(Math.abs(num('vc_punch_c', ...args) / psi - r.c)).toBeLessThan(0.06);
    expect(Math.abs(num('vc_punch', ...args) / psi - r.vc)).toBeLessThan(0.06);
    expect(Math.abs(num('vn_punch', ...args) / kip - r.Vc)).toBeLessThan(0.06);
    // φ = 0.75 for shear: ACI 318-19 Table 21.2.1
    expect(Math.abs((0.75 * num('vn_punch', ...args)) / kip - r.phiVc)).toBeLessThan(0.06);
  });

  it('names the governing expression for the hand calc', () => {
    // e.8: square columns → (a) governs; 12 x 36 (β = 3) → (b) governs
    expect(call('vc_punch_governs', fc5000, 16 * inch, 16 * inch, 7 * inch, 'interior')).toMatch(/\(a\) 4λs/);
    expect(call('vc_punch_governs', 4000 * psi, 12 * inch, 36 * inch, 8 * inch, 'interior')).toMatch(/\(b\).*β = 3\.00/);
    // (c) governs for a large square column with small d/bo: 48 x 48, d = 8: bo = 224,
    // 2 + 40·8/224 = 3.43 < 4 [COMPUTED from Table 22.6.5.2]
    expect(call('vc_punch_governs', fc5000, 48 * inch, 48 * inch, 8 * inch, 'interior')).toMatch(/\(c\).*αs = 40/);
    expect(num('vc_punch', fc5000, 48 * inch, 48 * inch, 8 * inch, 'interior') / psi).toBeCloseTo((2 + 320 / 224) * 70.7107, 2);
  });

  it('SI input (mm, MPa) gives the same capacity as the inch/psi geometry', () => {
    // e.8 interior row in SI: 406.4 mm column, d = 177.8 mm, f'c = 34.474 MPa → Vc = 182.2 kip = 810.5 kN
    const vcSi = num('vn_punch', 34.4738 * MPa, 406.4 * mm, 406.4 * mm, 177.8 * mm, 'interior');
    expect(Math.abs(vcSi / kN - 182.2 * 4.44822)).toBeLessThan(0.6);
    // The SI form 0.33λs√f'c (MPa) is a rounded conversion of 4λs√f'c (psi):
    // ACI 318-19 Table 22.6.5.2, SI form: 0.33·√34.474 = 1.9376 MPa vs 282.8 psi = 1.9499 MPa, 0.6 % apart
    const vcStress = num('vc_punch', 34.4738 * MPa, 406.4 * mm, 406.4 * mm, 177.8 * mm, 'interior');
    expect(Math.abs(vcStress / (0.33 * Math.sqrt(34.4738) * MPa) - 1)).toBeLessThan(0.01);
  });

  it('ACI 318-14 has no λs: the deep-slab e.8 row rises from 269.7 to 282.8 psi', () => {
    // e.8 row 4 with λs = 1 (318-14 Table 22.6.5.2): 4·70.71 = 282.8 psi [COMPUTED]
    const v14 = num('vc_punch', fc5000, 24 * inch, 24 * inch, 12 * inch, 'interior', 1, '318-14');
    expect(Math.abs(v14 / psi - 282.8)).toBeLessThan(0.06);
    expect(call('vc_punch_governs', fc5000, 24 * inch, 24 * inch, 12 * inch, 'interior', 1, '318-14')).toMatch(/318-14.*λ·√f'c/);
  });

  it("caps √f'c at 100 psi and applies λ", () => {
    // §22.6.3.1 √f'c ≤ 100 psi (from memory): f'c = 12000 psi → (a) = 4·100 = 400 psi
    expect(num('vc_punch', 12000 * psi, 16 * inch, 16 * inch, 7 * inch, 'interior') / psi).toBeCloseTo(400, 6);
    // λ = 0.75 scales all three expressions: 0.75·282.84 = 212.13 psi (common practice)
    expect(num('vc_punch', fc5000, 16 * inch, 16 * inch, 7 * inch, 'interior', 0.75) / psi).toBeCloseTo(212.13, 1);
  });

  it('vu_punch: reaction less the factored load inside the section, and the ratio', () => {
    // Interior 16 x 16, d = 7: area inside 23² = 529 in² = 3.6736 ft²; qu = 300 psf
    // Vu = 150 − 0.300·3.6736 = 148.898 kip; vu = 148898/(92·7) = 231.21 psi (arithmetic by hand)
    const args = [150 * kip, 300 * psf, 16 * inch, 16 * inch, 7 * inch, 'interior'];
    expect(num('vu_punch', ...args) / kip).toBeCloseTo(148.898, 2);
    expect(num('vu_punch_stress', ...args) / psi).toBeCloseTo(231.21, 1);
    // ratio = 231.21/(0.75·282.84) = 1.0900
    expect(num('punch_ratio', 150 * kip, 300 * psf, fc5000, 16 * inch, 16 * inch, 7 * inch, 'interior')).toBeCloseTo(1.09, 3);
  });

  it('rejects φ out of range, λ out of range, unknown position and negative d', () => {
    const base = [150 * kip, 300 * psf, fc5000, 16 * inch, 16 * inch, 7 * inch, 'interior'];
    expect(() => num('punch_ratio', ...base, 1.2)).toThrow(LibraryError);
    expect(() => num('punch_ratio', ...base, 1.2)).toThrow(/φ must be in \(0, 1\]/);
    expect(() => num('punch_ratio', ...base, 0)).toThrow(/φ must be in/);
    expect(() => num('vc_punch', fc5000, 0.4, 0.4, 0.18, 'interior', 1.3)).toThrow(/λ must be between 0.75 and 1.0/);
    expect(() => num('vc_punch', fc5000, 0.4, 0.4, 0.18, 'inner')).toThrow(/unknown position 'inner'/);
    expect(() => num('vc_punch', fc5000, 0.4, 0.4, -0.18, 'interior')).toThrow(/d must be greater than 0/);
    expect(() => num('vc_punch', -fc5000, 0.4, 0.4, 0.18, 'interior')).toThrow(/f'c must be greater than 0/);
  });
});
