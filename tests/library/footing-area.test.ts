import { describe, expect, it } from 'vitest';
import { num } from './support-call';
import { LibraryError } from '../../runtime/library/types';
import { ft, kip, kN, kPa, m, pcf, psf, ksf } from '../../runtime/units/si';

describe('footing area from service loads on the net allowable pressure', () => {
  it('US: q_net = 4000 − 2·150 − 3·100 − 100 = 3300 psf; A = 600 kip / 3.3 ksf = 181.82 ft²', () => {
    // q_net = q_allow − footing − fill − surcharge (common practice; ASCE 7-22 §2.4.1: D + L service)
    const qNet = num('q_net_allow', 4000 * psf, 2 * ft, 150 * pcf, 3 * ft, 100 * pcf, 100 * psf);
    expect(qNet / psf).toBeCloseTo(3300, 6);
    expect(num('a_req_footing', 600 * kip, qNet) / (ft * ft)).toBeCloseTo(181.818, 3);
  });

  it('SI: 200 − 0.6·24 − 1.0·18 = 167.6 kPa; A = 1500 kN / 167.6 kPa = 8.950 m²', () => {
    // common practice, arithmetic by hand; surcharge left out (optional, 0)
    const qNet = num('q_net_allow', 200 * kPa, 0.6 * m, 24 * kN, 1.0 * m, 18 * kN);
    expect(qNet / kPa).toBeCloseTo(167.6, 9);
    expect(num('a_req_footing', 1500 * kN, qNet)).toBeCloseTo(8.94988, 5);
  });

  it('qu = Pu / (B L)', () => {
    // 800 kip on 10 x 10 ft = 8.0 ksf (by hand)
    expect(num('qu_footing', 800 * kip, 10 * ft, 10 * ft) / ksf).toBeCloseTo(8, 10);
  });

  it('rejects a net pressure that leaves nothing, and negative inputs', () => {
    // 1000 − 4·150 − 4·120 = −80 psf
    expect(() => num('q_net_allow', 1000 * psf, 4 * ft, 150 * pcf, 4 * ft, 120 * pcf)).toThrow(LibraryError);
    expect(() => num('q_net_allow', 1000 * psf, 4 * ft, 150 * pcf, 4 * ft, 120 * pcf)).toThrow(/nothing left of q_allow/);
    expect(() => num('q_net_allow', 4000 * psf, 2 * ft, 150 * pcf, -1, 100 * pcf)).toThrow(/h_fill must not be negative/);
    expect(() => num('a_req_footing', -600 * kip, 3300 * psf)).toThrow(/must be greater than 0/);
  });
});
