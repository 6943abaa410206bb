// One-way slab strip with the self-weight check, run headless and checked against a
// hand calculation (US units, a 12 in strip). Each value names its source beside it.

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { calcJson, expectAllPass, expectWellFormed, floorTo, near, phiMnRect, runTemplate, whitneyAs, type Run } from './helpers';

const FILE = 'one-way-strip.lt';

const ls = 11, lBeam = 32, h = 6, b = 12; // ft, ft, in, in
const fc = 4000, fy = 60000;
const sqrtFc = Math.sqrt(fc); // 63.25 psi
// D = 6/12·150 + 15 = 90 psf. L = 125 psf: over 100 psf on a member carrying one floor it is
// not reduced (ASCE 7-22 §4.7.3, from memory), nor with KLL·AT = 1·181.5 < 400 ft² (§4.7.2, CONFIRMED).
const D = (h / 12) * 150 + 15;
const L = 125;
// AT of a one-way slab ≤ 1.5 ls² = 1.5·121 = 181.5 ft² < 11·32 = 352 ft² (§4.7.6, from memory).
const AT = Math.min(ls * lBeam, 1.5 * ls * ls);
// wu = max(1.4·90 = 126, 1.2·90 + 1.6·125 = 308) = 308 psf (ASCE 7-22 §2.3.1; the same factors in ASCE 7-10 §2.3.2).
const wu = Math.max(1.4 * D, 1.2 * D + 1.6 * L);
// d = 6 − 0.75 − 0.5/2 = 5.0 in (#4 = 0.500 in, ASTM A615, CONFIRMED).
const d = h - 0.75 - 0.25;
const ln = ls - 1; // clear span 11 − 12/12 = 10 ft
const asMin = 0.0018 * b * h; // 0.1296 in² (Table 7.6.1.1, from memory)
// Main bars: min(3h, 18 in) = 18 in (§7.7.2.3, from memory) and the crack-control spacing of
// Table 24.3.2 through §7.7.2.2 (from memory): fs = (2/3)fy = 40 ksi, cc = 0.75 in →
// min(15(40/40) − 2.5·0.75, 12(40/40)) = min(13.125, 12) = 12 in, which governs.
const sCrack = Math.min(15 * (40000 / ((2 / 3) * fy)) - 2.5 * 0.75, 12 * (40000 / ((2 / 3) * fy)));
const sMax = Math.min(3 * h, 18, sCrack); // 12 in

/** Steel, #4 spacing rounded down to 0.5 in (common practice), and Mu/φMn for a moment in lb·ft. */
function design(MuLbFt: number): { As: number; s: number; ratio: number; AsProv: number } {
  const As = Math.max(whitneyAs(MuLbFt * 12, b, d, fc, fy), asMin);
  const s = floorTo(Math.min(0.2 / (As / b), sMax), 0.5);
  const AsProv = (0.2 / s) * b;
  return { As, s, AsProv, ratio: (MuLbFt * 12) / phiMnRect(AsProv, b, d, fc, fy) };
}

// Self-weight flag: 1.4 × 75 psf on the strip, propped span (one end continuous) wℓ²/8
// (elastic beam coefficients, common practice), against φMn of As,min.
function selfWeightRatio(coef: number): number {
  const Mu = coef * 1.4 * ((h / 12) * 150) * ls * ls * 12; // lb·in on the 12 in strip
  return Mu / phiMnRect(asMin, b, d, fc, fy);
}

describe('one-way-strip.lt at its defaults: end span', () => {
  let run: Run;
  beforeAll(async () => {
    run = await runTemplate(FILE);
  });
  afterAll(() => run.dispose());

  it('computes every cell and passes every check', () => {
    expectAllPass(run);
  });

  it('action, loads and the limits of the coefficient method', () => {
    expect(run.val('action')).toBe('one-way'); // 32/11 = 2.91 > 2 (convention, e.6)
    near(run.num('D'), 90);
    near(run.num('AT_slab'), AT); // 181.5 ft²
    near(run.num('L'), 125);
    near(run.num('wu'), wu); // 308 psf
    near(run.ratio('coef_ok'), L / (3 * D)); // 125/270 (ACI 318-19 §6.5.1, from memory)
  });

  it('thickness and the self-weight check', () => {
    // One end continuous: ℓ/24 = 11·12/24 = 5.5 in (Table 7.3.1.1, from memory).
    near(run.num('h_min'), 5.5);
    near(run.num('d'), 5);
    // Mu = 1.4·75·11²/8 = 1588 lb·ft against φMn = 0.9·0.1296·60,000·(5 − 0.0953) = 2861 lb·ft.
    near(run.ratio('sw_ok'), selfWeightRatio(1 / 8));
    near(run.ratio('sw_ok'), 0.5551);
  });

  it('moments and shear by the coefficients of ACI 318-19 §6.5 (from memory)', () => {
    // Spandrel support wℓn²/24, end span positive /14, first interior support /10, shear 1.15wℓn/2.
    near(run.num('Mu_neg_ext'), (wu * ln * ln) / 24 / 1000); // 1.283 kip·ft
    near(run.num('Mu_pos'), (wu * ln * ln) / 14 / 1000); // 2.200
    near(run.num('Mu_neg'), (wu * ln * ln) / 10 / 1000); // 3.080
    near(run.num('Vu'), (1.15 * wu * ln) / 2 / 1000); // 1.771 kip
  });

  it('bars, strengths and one-way shear', () => {
    const neg = design((wu * ln * ln) / 10);
    near(run.num('As_neg'), neg.As); // 0.1398 in² (Whitney governs over 0.1296)
    near(run.num('s_crack'), 12);
    expect(run.num('s_neg')).toBeCloseTo(neg.s, 9); // 0.2·12/0.1398 = 17.2 → capped at 12 in
    expect(neg.s).toBe(12);
    near(run.ratio('neg_ok'), neg.ratio);
    const pos = design((wu * ln * ln) / 14);
    near(run.num('As_pos'), asMin);
    expect(run.num('s_pos')).toBeCloseTo(pos.s, 9); // 18.5 → 12 in
    near(run.ratio('pos_ok'), pos.ratio);
    const ext = design((wu * ln * ln) / 24);
    near(run.ratio('ext_ok'), ext.ratio);
    // Shrinkage and temperature: 0.1296 in² per foot, #4 at ≤ min(5h, 18 in) → 18 in (§24.4.3.3, from memory).
    expect(run.num('s_st')).toBeCloseTo(18, 9);
    // 318-19 Table 22.5.5.1(c) (e.2, CONFIRMED structure): Vc = 8λs(ρw)^(1/3)√f'c b d, λs = 1 at d = 5 in.
    const rhoW = neg.AsProv / (b * d); // 0.2/60 = 0.00333
    near(run.num('rho_w'), rhoW);
    const phiVc19 = 0.75 * 8 * Math.cbrt(rhoW) * sqrtFc * b * d; // ≈ 3401 lb
    near(run.num('phiVc'), phiVc19 / 1000);
    near(run.ratio('shear_ok'), (1.15 * wu * ln) / 2 / phiVc19);
  });
});

describe('one-way-strip.lt for an interior span', () => {
  it('uses both ends continuous and the interior coefficients', async () => {
    const run = await runTemplate(FILE, { span_pos: 'interior' });
    expectAllPass(run);
    near(run.num('h_min'), (ls * 12) / 28); // ℓ/28 = 4.714 in (Table 7.3.1.1, from memory)
    near(run.ratio('sw_ok'), selfWeightRatio(1 / 12)); // fixed-end wℓ²/12 (common practice)
    near(run.num('Mu_pos'), (wu * ln * ln) / 16 / 1000); // 1.925 kip·ft
    near(run.num('Mu_neg'), (wu * ln * ln) / 11 / 1000); // 2.800 kip·ft
    near(run.num('Vu'), (wu * ln) / 2 / 1000); // 1.540 kip
    run.dispose();
  });
});

describe('one-way-strip.lt with edition = 318-14', () => {
  it('takes Vc = 2λ√f\'c b d for the shear; the flexure is unchanged', async () => {
    const run = await runTemplate(FILE, { edition: '318-14' });
    expectAllPass(run);
    // 318-14 §22.5.5.1: φVc = 0.75·2·63.25·12·5 = 5692 lb.
    near(run.num('phiVc'), (0.75 * 2 * sqrtFc * b * d) / 1000);
    near(run.num('phiVc'), 5.692);
    expect(run.val('vc_rule')).toMatch(/318-14/);
    // Grade 60: 318-14 ρmin = 0.0018·60,000/fy = 0.0018 too (from memory).
    near(run.num('As_neg'), design((wu * ln * ln) / 10).As);
    near(run.num('As_st'), asMin);
    run.dispose();
  });
});

describe('one-way-strip.lt as a document', () => {
  it('is well formed, round-trips and runs headless with exit code 0', async () => {
    expectWellFormed(FILE);
    const { code, err } = await calcJson(FILE);
    expect(err).toBe('');
    expect(code).toBe(0);
  });
});
