import { describe, expect, it } from 'vitest';
import { g, gn, expectLibError } from './gravity-call';
import { MPa, ksi } from '../../runtime/units/si';

describe('φ by action, ACI 318-19 Table 21.2.1', () => {
  it('values', () => {
    expect(gn('phi_action', 'shear')).toBe(0.75); // ACI 318-19 Table 21.2.1(b)
    expect(gn('phi_action', 'compression-tied')).toBe(0.65); // ACI 318-19 Table 21.2.2
    expect(gn('phi_action', 'compression-spiral')).toBe(0.75); // ACI 318-19 Table 21.2.2
    expect(gn('phi_action', 'tension-controlled')).toBe(0.9); // ACI 318-19 Table 21.2.2, from memory
    expect(gn('phi_action', 'bearing')).toBe(0.65); // ACI 318-19 Table 21.2.1(d), from memory
    expect(gn('phi_action', 'torsion')).toBe(0.75); // from memory
  });
});

describe('φ from the net tensile strain, ACI 318-19 Table 21.2.2', () => {
  const fy = 60 * ksi;

  it('yield strain and tension-controlled limit per edition', () => {
    // §21.2.2.1 εty = fy/Es, Es = 29,000 ksi (§20.2.2.2) [from memory]: 60/29000 = 0.0020690
    expect(gn('eps_ty', fy)).toBeCloseTo(0.002069, 6);
    // 318-19: εty + 0.003 = 0.0050690 [from memory]; 318-14: 0.005 [from memory]
    expect(gn('eps_tc', fy)).toBeCloseTo(0.005069, 6);
    expect(gn('eps_tc', fy, '318-14')).toBe(0.005);
    // SI: fy = 420 MPa → 0.0021 with Es = 200,000 MPa (SI edition, from memory)
    expect(gn('eps_ty', 420 * MPa)).toBeCloseTo(0.0021, 5);
  });

  it('end points and the transition', () => {
    // Table 21.2.2 [from memory]: compression-controlled 0.65 (tied) / 0.75 (spiral), tension-controlled 0.90
    expect(gn('phi_eps_t', 0.001, fy)).toBe(0.65);
    expect(gn('phi_eps_t', 0.001, fy, 'spiral')).toBe(0.75);
    expect(gn('phi_eps_t', 0.006, fy)).toBe(0.9);
    // COMPUTED from Table 21.2.2, εt = 0.004:
    // 318-19 other: 0.65 + 0.25(0.004 − 0.0020690)/0.003 = 0.81092
    expect(gn('phi_eps_t', 0.004, fy)).toBeCloseTo(0.81092, 5);
    // 318-19 spiral: 0.75 + 0.15(0.0019310)/0.003 = 0.84655
    expect(gn('phi_eps_t', 0.004, fy, 'spiral')).toBeCloseTo(0.84655, 5);
    // 318-14 other: 0.65 + 0.25(0.0019310)/(0.005 − 0.0020690) = 0.81471
    expect(gn('phi_eps_t', 0.004, fy, 'other', '318-14')).toBeCloseTo(0.81471, 5);
    // continuity at both ends of the transition (COMPUTED)
    expect(gn('phi_eps_t', 0.0050689, fy)).toBeCloseTo(0.9, 4);
    expect(gn('phi_eps_t', 0.0020691, fy)).toBeCloseTo(0.65, 4);
  });
});

describe('bad arguments', () => {
  it('unknown action, transverse type, edition', () => {
    expectLibError(() => g('phi_action', 'flexure'), /unknown action "flexure"/);
    expectLibError(() => g('phi_eps_t', 0.004, 60 * ksi, 'hoops'), /unknown transverse "hoops"/);
    expectLibError(() => g('eps_tc', 60 * ksi, '318-11'), /unknown edition "318-11"; expected one of "318-19", "318-14"/);
    expectLibError(() => g('eps_ty', 0), /fy must be positive/);
  });
});
