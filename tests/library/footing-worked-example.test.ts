// A spread footing worked fully by hand in US units, then reproduced by the chain of library calls.
// Scenario (our own): interior column 18 x 18 in, f'c,col = 5000 psi, D = 200 kip, L = 150 kip;
// footing f'c = 4000 psi, fy = 60 ksi, h = 24 in, base 5 ft below grade (3 ft of fill at 100 pcf),
// 100 psf slab surcharge, gross allowable soil pressure 4000 psf (from a soil report), 3 in cover.
import { describe, expect, it } from 'vitest';
import { call, num } from './support-call';
import { ft, inch, kip, kipFt, ksf, ksi, pcf, psf, psi } from '../../runtime/units/si';

const in2 = inch * inch;
const fcF = 4000 * psi; // √f'c = 63.246 psi
const fy = 60 * ksi;
const c = 18 * inch;
const B = 10.5 * ft; // = 126 in, chosen below
const h = 24 * inch;
const d = 20 * inch; // 24 − 3 cover − 1.0 (one #8 bar: average depth of the two layers)
const Pu = 1.2 * 200 * kip + 1.6 * 150 * kip; // ASCE 7 §2.3.2 combination 2 [CONFIRMED d]: 240 + 240 = 480 kip

describe('worked example: 10.5 ft square footing under an 18 in column (US units)', () => {
  it('1. area: q_net = 4000 − 2·150 − 3·100 − 100 = 3300 psf; A = 350/3.3 = 106.06 ft² → 10.5 x 10.5 = 110.25 ft²', () => {
    const qNet = num('q_net_allow', 4000 * psf, h, 150 * pcf, 3 * ft, 100 * pcf, 100 * psf);
    expect(qNet / psf).toBeCloseTo(3300, 6);
    const aReq = num('a_req_footing', 350 * kip, qNet);
    expect(aReq / (ft * ft)).toBeCloseTo(106.06, 2);
    expect(B * B).toBeGreaterThanOrEqual(aReq);
  });

  it('2. factored net pressure: qu = 480/110.25 = 4.3537 ksf (30.234 psi)', () => {
    expect(num('qu_footing', Pu, B, B) / ksf).toBeCloseTo(4.3537, 4);
  });

  it('3. two-way shear at d/2: bo = 4(18 + 20) = 152 in; Vu = 480 − 4.3537·(38/12)² = 436.34 kip', () => {
    expect(num('bo_punch', c, c, d, 'interior') / inch).toBeCloseTo(152, 9);
    const vu = num('vu_punch_footing', Pu, B, B, c, c, d);
    expect(vu / kip).toBeCloseTo(436.34, 2);
    // 318-19: λs = √(2/(1 + 2.0)) = 0.81650; (a) 4·0.8165·63.246 = 206.56 psi governs
    //   ((b) β = 1 → 6λs√f'c; (c) (2 + 40·20/152)·0.8165·63.246 = 375.07 psi)
    //   Vc = 206.56·152·20 = 627.94 kip; φVc = 0.75·627.94 = 470.95 kip ≥ 436.34 → OK (ratio 0.9265)
    expect(call('vc_punch_governs', fcF, c, c, d, 'interior')).toMatch(/\(a\)/);
    const vn19 = num('vn_punch', fcF, c, c, d, 'interior');
    expect(vn19 / kip).toBeCloseTo(627.94, 1);
    expect(vu / (0.75 * vn19)).toBeCloseTo(0.9265, 3);
    // 318-14: no λs: 4·63.246·152·20 = 769.07 kip; φVc = 576.80 kip
    expect(num('vn_punch', fcF, c, c, d, 'interior', 1, '318-14') / kip).toBeCloseTo(769.07, 1);
  });

  it('4. flexure at the column face: ℓ = (126 − 18)/2 = 54 in; Mu = 4.3537·10.5·4.5²/2 = 462.86 kip-ft', () => {
    const mu = num('mu_footing', Pu, B, B, c);
    expect(mu / kipFt).toBeCloseTo(462.86, 2);
    // Whitney: k = 2·5554.3/(0.9·0.85·4·126·400) = 0.072029; As = 142.8·(1 − 0.963313) = 5.239 in²
    expect(num('as_req_footing', mu, B, d, fcF, fy) / in2).toBeCloseTo(5.239, 3);
    // minimum 0.0018·126·24 = 5.443 in² governs → 7 #8 = 5.53 in² (ASTM A615: #8 = 0.79 in²)
    expect(num('as_footing', mu, B, d, h, fcF, fy) / in2).toBeCloseTo(5.4432, 4);
    // square footing: the band rule puts all of it in the band (γs = 1)
    expect(num('gamma_s_band', B, B)).toBe(1);
  });

  it('5. one-way shear at d: Vu = 4.3537·10.5·(54 − 20)/12 = 129.52 kip — the editions disagree', () => {
    const vu = num('vu_oneway_footing', Pu, B, B, c, d);
    expect(vu / kip).toBeCloseTo(129.52, 2);
    const rho = (7 * 0.79 * in2) / (B * d); // 5.53/(126·20) = 0.0021944
    // 318-14 §22.5.5.1: Vc = 2·63.246·126·20 = 318.76 kip; φVc = 239.07 ≥ 129.52 → OK
    const vc14 = num('vc_oneway', fcF, B, d, rho, 1, '318-14');
    expect(vc14 / kip).toBeCloseTo(318.76, 1);
    expect(vu <= 0.75 * vc14).toBe(true);
    // 318-19 Table 22.5.5.1(c): ∛0.0021944 = 0.12995; 8·0.8165·0.12995·63.246 = 53.68 psi;
    //   Vc = 53.68·2520 = 135.29 kip; φVc = 101.46 < 129.52 → NOT OK at h = 24 in
    const vc19 = num('vc_oneway', fcF, B, d, rho);
    expect(vc19 / kip).toBeCloseTo(135.29, 1);
    expect(vu <= 0.75 * vc19).toBe(false);
  });

  it('5b. under 318-19 the footing needs h = 30 in (d = 26 in) for one-way shear', () => {
    // Vu = 4.3537·10.5·(54 − 26)/12 = 106.67 kip; As,min = 0.0018·126·30 = 6.804 in² → 9 #8 = 7.11 in²
    // ρw = 7.11/(126·26) = 0.0021703, ∛ = 0.12947; λs = √(2/3.6) = 0.74536
    // vc = 8·0.74536·0.12947·63.246 = 48.83 psi; Vc = 48.83·126·26 = 159.96 kip; φVc = 119.97 ≥ 106.67 → OK
    const d2 = 26 * inch;
    const vu = num('vu_oneway_footing', Pu, B, B, c, d2);
    expect(vu / kip).toBeCloseTo(106.67, 2);
    expect(num('as_min_footing', B, 30 * inch) / in2).toBeCloseTo(6.804, 6);
    const vc = num('vc_oneway', fcF, B, d2, (9 * 0.79 * in2) / (B * d2));
    expect(vc / kip).toBeCloseTo(159.96, 1);
    expect(vu <= 0.75 * vc).toBe(true);
  });

  it('6. development of #8 bottom bars: ℓd = 60000/(20·63.246)·1.0 = 47.43 in ≤ 54 − 3 = 51 in', () => {
    // Table 25.4.2.3 (from memory), clear spacing (126 − 6 − 7)/6 ≈ 18.8 in ≥ 2db and cover 3 in ≥ db
    const ld = num('ld_bottom', 1.0 * inch, fy, fcF, true);
    const avail = num('ld_avail_footing', B, c, 3 * inch);
    expect(ld / inch).toBeCloseTo(47.43, 2);
    expect(avail / inch).toBeCloseTo(51, 9);
    expect(ld <= avail).toBe(true);
  });

  it('7. bearing and dowels: φBn,col = 0.65·0.85·5·324 = 895.05 kip ≥ 480; footing side capped at 2', () => {
    const a1 = 324 * in2;
    expect(num('phi_bn_bearing', 5000 * psi, a1) / kip).toBeCloseTo(895.05, 2);
    // A2: spread min(2·24, 54) = 48 in → (18 + 96)² = 12996 in²; √(12996/324) = 6.33 → 2
    // φBn,ftg = 0.65·0.85·4·324·2 = 1432.08 kip
    const a2 = num('a2_frustum', c, c, B, B, h);
    expect(a2 / in2).toBeCloseTo(12996, 6);
    expect(num('phi_bn_bearing', fcF, a1, a2) / kip).toBeCloseTo(1432.08, 2);
    expect(Pu <= num('phi_bn_bearing', 5000 * psi, a1)).toBe(true);
    // dowels: 0.005·324 = 1.62 in² → 4 #6 = 1.76 in²
    expect(num('as_dowel_min', a1) / in2).toBeCloseTo(1.62, 10);
  });
});
