// Spread footing from service loads PD, PL, run headless and checked against a hand
// calculation (US units: lb, in, psi, psf). Each value names its source beside it.

import { describe, expect, it } from 'vitest';
import { calcJson, expectAllPass, expectWellFormed, near, phiMnRect, runTemplate, whitneyAs } from './helpers';

const FILE = 'spread-footing.lt';

const PD = 180_000, PL = 95_000; // lb
const B = 108, L = 120, h = 28, c = 18; // in
const fc = 4000, fy = 60000, fcCol = 5000;
const sqrtFc = Math.sqrt(fc); // 63.25 psi
// Service D + L = 275,000 lb (ASCE 7-22 §2.4.1; the same combination in ASCE 7-10 §2.4.1).
const Ps = PD + PL;
// q_net = 4000 − (28/12)·150 − (4 − 28/12)·120 − 100 = 4000 − 350 − 200 − 100 = 3350 psf (common practice).
const qNet = 4000 - (h / 12) * 150 - (4 - h / 12) * 120 - 100;
// Pu = max(1.4·180, 1.2·180 + 1.6·95) = max(252, 368) = 368 kip (ASCE 7-22 §2.3.1; the same factors in ASCE 7-10 §2.3.2).
const Pu = Math.max(1.4 * PD, 1.2 * PD + 1.6 * PL);
const qu = Pu / ((B * L) / 144); // 4088.9 psf
// Depths: #6 bars both ways (0.75 in), long bars at the bottom, 3 in cover
// (Table 20.5.1.3.1, from memory): d_L = 28 − 3 − 0.375 = 24.625, d_B = 23.875, average 24.25 in.
const dL = h - 3 - 0.375;
const dB = dL - 0.375 - 0.375;
const d = (dL + dB) / 2;
const lamS = (dd: number) => Math.min(1, Math.sqrt(2 / (1 + dd / 10))); // §22.5.5.1.3, CONFIRMED

// Two-way: bo = 4(18 + 24.156) = 168.6 in; Vu = Pu − qu (c + d)²; vc = 4λs√f'c (Table 22.6.5.2(a), CONFIRMED).
const bo = 4 * (c + d);
const Vu2 = Pu - (qu * (c + d) ** 2) / 144;
// Flexure at the column face, qu × width × cantilever²/2 (ACI 318-19 §13.2.7.1, from memory).
const MuL = (qu * (B / 12) * ((L - c) / 2 / 12) ** 2) / 2; // 332,356 lb·ft
const MuB = (qu * (L / 12) * ((B - c) / 2 / 12) ** 2) / 2; // 287,500 lb·ft
// As = max(Whitney, 0.0018 × width × h) (§13.3.3.1 → Table 8.6.1.1, from memory).
const AsL = Math.max(whitneyAs(MuL * 12, B, dL, fc, fy), 0.0018 * B * h); // 5.443 in²
const AsB = Math.max(whitneyAs(MuB * 12, L, dB, fc, fy), 0.0018 * L * h); // 6.048 in²
// Bars no more than s_max apart: min(2h, 18 in) = 18 in (§8.7.2.2, from memory) and the
// crack-control spacing of Table 24.3.2 (from memory): fs = (2/3)fy = 40 ksi, cc = 3 in →
// min(15 − 7.5, 12) = 7.5 in, which governs.
const sMax = Math.min(2 * h, 18, 15 * (40000 / 40000) - 2.5 * 3);
// #6 = 0.44 in² (ASTM A615, CONFIRMED): ceil(5.443/0.44) = 13 for the steel, but
// ceil((108 − 6 − 0.75)/7.5) + 1 = 15 for the spacing.
const nL = Math.max(Math.ceil(AsL / 0.44), Math.ceil((B - 6 - 0.75) / sMax) + 1);
// Band: γs = 2/(β + 1), β = 10/9 (ACI 318-19 Eq. 13.3.3.3, from memory) = 0.9474.
const gs = 2 / (L / B + 1);
// Band: ceil(5.730/0.44) = 14 for the steel, ceil(108/7.5) = 15 for the spacing; outside the band
// (§13.3.3.3(b), from memory) one bar in each 6 in strip.
const nBand = Math.max(Math.ceil((gs * AsB) / 0.44), Math.ceil(B / sMax));
const nSide = Math.max(Math.ceil(((1 - gs) * AsB) / 2 / 0.44), Math.ceil((L - B) / 2 / sMax));
const AsBProv = (nBand + 2 * nSide) * 0.44;
// One-way at d from the face: Vu = qu × width × ((side − c)/2 − d).
const VuL = (qu * (B / 12) * ((L - c) / 2 - dL)) / 12; // 81,074 lb
const VuB = (qu * (L / 12) * ((B - c) / 2 - dB)) / 12; // 72,407 lb
const rhoL = (nL * 0.44) / (B * dL);
const rhoB = AsBProv / (L * dB);
// 318-19 Table 22.5.5.1(c): φVc = 0.75·8λs(ρw)^(1/3)√f'c·bw·d (e.2, CONFIRMED structure); 318-14: 0.75·2√f'c·bw·d.
const phiVc1 = (bw: number, dd: number, rho: number, ed: string) =>
  ed === '318-19' ? 0.75 * 8 * lamS(dd) * Math.cbrt(rho) * sqrtFc * bw * dd : 0.75 * 2 * sqrtFc * bw * dd;

describe('spread-footing.lt at its defaults (ACI 318-19)', () => {
  it('matches the hand calculation and passes every check', async () => {
    const run = await runTemplate(FILE);
    expectAllPass(run);
    near(run.num('Ps'), 275);
    near(run.num('q_net'), qNet); // 3350 psf
    near(run.num('A_req'), Ps / qNet); // 82.09 ft²
    near(run.num('Pu'), Pu / 1000); // 368 kip
    expect(run.val('Pu_combo')).toBe('1.2D + 1.6L + (0.5Lr or 0.3S or 0.5R)'); // ASCE 7-22 §2.3.1 comb. 2
    near(run.num('qu'), qu / 1000); // 4.089 ksf
    near(run.num('d_L'), dL);
    near(run.num('d_B'), 23.875);
    near(run.num('bo'), bo); // 169.0 in
    near(run.num('Vu'), Vu2 / 1000); // 317.3 kip
    // λs = √(2/(1 + 2.425)) = 0.7642 → vc = 4·0.7642·63.25 = 193.3 psi
    near(run.num('vc'), 4 * lamS(d) * sqrtFc);
    near(run.num('vc'), 193.3);
    near(run.num('phiVc'), (0.75 * 4 * lamS(d) * sqrtFc * bo * d) / 1000); // 594.2 kip
    near(run.num('Mu_L'), MuL / 1000); // 332.4 kip·ft
    near(run.num('As_L'), AsL);
    near(run.num('As_L'), 5.443); // 0.0018·108·28
    near(run.num('s_max'), 7.5);
    expect(run.num('n_L')).toBe(nL);
    expect(nL).toBe(15);
    near(run.num('s_L'), (B - 6 - 0.75) / (nL - 1)); // 7.23 in
    near(run.num('phiMn_L'), phiMnRect(nL * 0.44, B, dL, fc, fy) / 12000);
    near(run.num('Mu_B'), MuB / 1000); // 287.5 kip·ft
    near(run.num('As_B'), AsB); // 6.048 in²
    near(run.num('gam_s'), gs); // 0.947
    near(run.num('As_band'), gs * AsB); // 5.730 in²
    expect(run.num('n_band')).toBe(nBand);
    expect(run.num('n_side')).toBe(nSide);
    expect([nBand, nSide]).toEqual([15, 1]);
    near(run.num('s_band'), B / nBand); // 7.2 in
    near(run.num('s_side'), (L - B) / 2 / nSide); // 6 in
    near(run.num('phiMn_B'), phiMnRect(AsBProv, L, dB, fc, fy) / 12000);
    near(run.num('Vu_L'), VuL / 1000); // 80.88 kip
    near(run.num('phiVc_L'), phiVc1(B, dL, rhoL, '318-19') / 1000); // 103.8 kip
    near(run.num('Vu_B'), VuB / 1000); // 71.98 kip
    near(run.num('phiVc_B'), phiVc1(L, dB, rhoB, '318-19') / 1000); // 115.0 kip
    // ℓd = fy ψ/(25λ√f'c) db for #6 and smaller (Table 25.4.2.3, from memory):
    // 60,000/(25·63.25)·0.75 = 28.46 in ≤ (120 − 18)/2 − 3 = 48 in along L, ≤ 42 in along B.
    near(run.num('ld_L'), (fy / (25 * sqrtFc)) * 0.75);
    near(run.ratio('dev_L_ok'), ((fy / (25 * sqrtFc)) * 0.75) / 48);
    near(run.num('ld_B'), (fy / (25 * sqrtFc)) * 0.75);
    near(run.ratio('dev_B_ok'), ((fy / (25 * sqrtFc)) * 0.75) / 42);
    // A2: the 1:2 frustum stops at the near edge, (108 − 18)/2 = 45 in each way: (18 + 90)² in²;
    // √(A2/A1) = 6 → 2. φBn = min(0.65·0.85·5000·324, 0.65·0.85·4000·324·2) = 894.9 kip
    // (ACI 318-19 §22.8.3.2, CONFIRMED-indirect).
    near(run.num('A2'), (c + 90) ** 2 / 144);
    near(run.num('phiBn'), Math.min(0.65 * 0.85 * fcCol * c * c, 0.65 * 0.85 * fc * c * c * 2) / 1000);
    near(run.ratio('dowel_ok'), (0.005 * c * c) / (4 * 0.44)); // 1.62/1.76 (§16.3.4.1, CONFIRMED-indirect)
    run.dispose();
  });
});

describe('spread-footing.lt with edition = 318-14', () => {
  it('takes no λs in two-way shear and 2λ√f\'c bw d in one-way shear', async () => {
    const run = await runTemplate(FILE, { edition: '318-14' });
    expectAllPass(run);
    near(run.num('vc'), 4 * sqrtFc); // 253.0 psi
    near(run.num('phiVc'), (0.75 * 4 * sqrtFc * bo * d) / 1000); // 777.6 kip
    near(run.num('phiVc_L'), phiVc1(B, dL, rhoL, '318-14') / 1000); // 252.3 kip
    near(run.num('phiVc_L'), 252.3);
    near(run.num('phiVc_B'), phiVc1(L, dB, rhoB, '318-14') / 1000); // 271.8 kip
    // Flexure and development do not change for Grade 60 bars (ψg = 1.0 in 318-19, none in 318-14).
    near(run.num('As_L'), AsL);
    near(run.num('ld_L'), (fy / (25 * sqrtFc)) * 0.75);
    run.dispose();
  });
});

describe('spread-footing.lt with λs neglected (neglect_ls = yes)', () => {
  it('takes λs = 1 in both shears, as ACI 318-19 §13.2.6.2 permits for isolated footings (from memory)', async () => {
    const run = await runTemplate(FILE, { neglect_ls: 'yes' });
    try {
      expectAllPass(run);
      // Two-way: vc = 4λ√f'c = 4·63.25 = 253.0 psi (Table 22.6.5.2(a), λs = 1).
      near(run.num('vc'), 4 * sqrtFc);
      expect(run.val('vc_rule')).toMatch(/λs neglected/);
      // One-way: φVc = 0.75·8·1·(ρw)^(1/3)√f'c·bw·d (Table 22.5.5.1(c), λs = 1).
      near(run.num('phiVc_L'), (0.75 * 8 * Math.cbrt(rhoL) * sqrtFc * B * dL) / 1000);
      near(run.num('phiVc_B'), (0.75 * 8 * Math.cbrt(rhoB) * sqrtFc * L * dB) / 1000);
    } finally {
      run.dispose();
    }
  });
});

describe('spread-footing.lt as a document', () => {
  it('is well formed, round-trips and runs headless with exit code 0', async () => {
    expectWellFormed(FILE);
    const { code, err } = await calcJson(FILE);
    expect(err).toBe('');
    expect(code).toBe(0);
  });

  it('a footing too small for the service load fails the area check', async () => {
    // 8 × 10 ft = 80 ft² < A_req = 82.09 ft²
    const run = await runTemplate(FILE, { B: '8 ft' });
    expect(run.state('area_ok').status).toBe('fail');
    near(run.ratio('area_ok'), Ps / qNet / 80);
    run.dispose();
  });
});
