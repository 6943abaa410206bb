import { describe, expect, it } from 'vitest';
import { call, num } from './support-call';
import { LibraryError } from '../../runtime/library/types';
import { inch, kip, ksi, kN, mm, MPa, psi } from '../../runtime/units/si';

const in2 = inch * inch;
// ACI 318-19 §22.4.2 (Eq. 22.4.2.2, Table 22.4.2.1): 18 x 18 in, 8 #9 (Ast = 8.00 in²), f'c = 5000 psi, fy = 60 ksi
const e4 = [5000 * psi, 324 * in2, 8 * in2, 60 * ksi] as const;

describe('column axial strength, ACI 318-19 §22.4', () => {
  it('e.4 worked check: Po = 1823 kip, φPn,max = 948 kip (tied)', () => {
    // hand calculation from ACI 318-19 Eq. 22.4.2.2 and Table 22.4.2.1: printed to 1 kip
    expect(Math.abs(num('po_column', ...e4) / kip - 1823)).toBeLessThan(0.5);
    expect(Math.abs(num('phi_pn_max', ...e4, 'tied') / kip - 948)).toBeLessThan(0.5);
    // Pn,max = 0.80 Po = 1458.4 kip (Table 22.4.2.1 [CONFIRMED])
    expect(num('pn_max', ...e4, 'tied') / kip).toBeCloseTo(1458.4, 1);
  });

  it('spiral: Pn,max = 0.85 Po, φ = 0.75', () => {
    // ACI 318-19 Table 22.4.2.1 and Table 21.2.2 (spiral φ = 0.75): 0.75·0.85·1823 = 1162.2 kip
    expect(num('phi_pn_max', ...e4, 'spiral') / kip).toBeCloseTo(1162.16, 1);
  });

  it('caps fy at 80 ksi in Po (§22.4.2.1)', () => {
    // ACI 318-19 §22.4.2.1: fy = 100 ksi counts as 80: 1343 + 80·8 = 1983 kip
    expect(num('po_column', 5000 * psi, 324 * in2, 8 * in2, 100 * ksi) / kip).toBeCloseTo(1983, 6);
  });

  it('SI input: 450 x 450 mm, 8 bars of 645 mm², f\'c = 35 MPa, fy = 420 MPa', () => {
    // Eq. 22.4.2.2 by hand: 0.85·35·(202500 − 5160) + 420·5160 = 5870865 + 2167200 = 8038065 N
    const po = num('po_column', 35 * MPa, 202500 * mm * mm, 5160 * mm * mm, 420 * MPa);
    expect(po / kN).toBeCloseTo(8038.065, 3);
    // φPn,max tied = 0.52·8038.065 = 4179.79 kN
    expect(num('phi_pn_max', 35 * MPa, 202500 * mm * mm, 5160 * mm * mm, 420 * MPa, 'tied') / kN).toBeCloseTo(4179.79, 2);
  });

  it('ρg limits 0.01 to 0.08 (§10.6.1.1)', () => {
    // ACI 318-19 §10.6.1.1: 8/324 = 0.0247 inside; 3/324 = 0.0093 and 27/324 = 0.083 outside
    expect(num('rho_g', 8 * in2, 324 * in2)).toBeCloseTo(0.02469, 5);
    expect(call('rho_g_ok', 8 * in2, 324 * in2)).toBe(true);
    expect(call('rho_g_ok', 3 * in2, 324 * in2)).toBe(false);
    expect(call('rho_g_ok', 27 * in2, 324 * in2)).toBe(false);
    expect(call('rho_g_ok', 3.24 * in2, 324 * in2)).toBe(true);
  });

  it('rejects Ast ≥ Ag, negative Ast and unknown transverse reinforcement', () => {
    expect(() => num('po_column', 5000 * psi, 324 * in2, 400 * in2, 60 * ksi)).toThrow(/Ast must be less than Ag/);
    expect(() => num('po_column', 5000 * psi, 324 * in2, -1 * in2, 60 * ksi)).toThrow(/Ast must not be negative/);
    expect(() => num('phi_pn_max', ...e4, 'hoops')).toThrow(LibraryError);
    expect(() => num('phi_pn_max', ...e4, 'hoops')).toThrow(/unknown transverse reinforcement 'hoops'/);
  });
});
