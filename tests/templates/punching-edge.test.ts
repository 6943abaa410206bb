// Punching at an edge or corner column with moment transfer and the drop panel option,
// run headless and checked against a hand calculation (US units: in, lb, psi).
// Each value names its source beside it.

import { describe, expect, it } from 'vitest';
import { calcJson, expectAllPass, expectWellFormed, near, phiMnRect, runTemplate } from './helpers';

const FILE = 'punching-edge.lt';

const l1 = 22, l2 = 22, c = 20, h = 10; // ft, ft, in, in
const fc = 5000, fy = 60000;
const sqrtFc = Math.sqrt(fc); // 70.71 psi
// D = 10/12·150 + 20 = 145 psf; qu = max(1.4·145, 1.2·145 + 1.6(50 + 15)) = max(203, 278) = 278 psf
// (ASCE 7-22 §2.3.1, the same factors in ASCE 7-10 §2.3.2; 15 psf partitions ASCE 7-22 §4.3.2, from memory).
const qu = Math.max(1.4 * 145, 1.2 * 145 + 1.6 * 65);
const ln = l1 - c / 12; // 20.333 ft both ways (§8.10.3.2.2, CONFIRMED)
const dSlab = h - 0.75 - 0.625; // 8.625 in, #5 bars (ASTM A615, CONFIRMED)
const hDrop = 14.25, x1 = 60, x2 = 96; // in
const dDrop = hDrop - 0.75 - 0.625; // 12.875 in
const wallPlf = 300;

/**
 * Critical section of an edge (n2 = 1) or corner (n1 = n2 = 1) column, moment about the axis
 * along the b2 sides (ACI 318-19 §22.6.4.1 and R8.4.4.2.3, from memory): x̄ from face AB,
 * Jc = Σ b1 sides [d b1³/12 + b1 d³/12 + b1 d (b1/2 − x̄)²] + b2 d x̄².
 */
function section(c1: number, c2: number, d: number, corner: boolean) {
  const b1 = c1 + d / 2;
  const b2 = corner ? c2 + d / 2 : c2 + d;
  const n1 = corner ? 1 : 2;
  const bo = n1 * b1 + b2;
  const xBar = (n1 * b1 * (b1 / 2)) / bo;
  const Jc = n1 * ((d * b1 ** 3) / 12 + (b1 * d ** 3) / 12 + b1 * d * (b1 / 2 - xBar) ** 2) + b2 * d * xBar ** 2;
  // γv = 1 − 1/(1 + (2/3)√(b1/b2)) (Eq. 8.4.2.2.2, from memory)
  const gv = 1 - 1 / (1 + (2 / 3) * Math.sqrt(b1 / b2));
  return { b1, b2, bo, xBar, Jc, gv, inside: b1 * b2 };
}

/** Least of Table 22.6.5.2 (a), (b), (c) in psi (CONFIRMED), λs = √(2/(1 + d/10)) ≤ 1 in 318-19. */
function vcPunch(c1: number, c2: number, d: number, bo: number, alphaS: number, ed: '318-19' | '318-14'): number {
  const lam = ed === '318-19' ? Math.min(1, Math.sqrt(2 / (1 + d / 10))) : 1;
  const beta = Math.max(c1, c2) / Math.min(c1, c2);
  return lam * sqrtFc * Math.min(4, 2 + 4 / beta, 2 + (alphaS * d) / bo);
}

describe('punching-edge.lt at its defaults: edge column, no drop panel', () => {
  it('matches the hand calculation and passes every check', async () => {
    const run = await runTemplate(FILE);
    expectAllPass(run);
    // AT = (22/2 + 10/12)·22 = 260.33 ft² (half-bay rule, common practice); wall 300 plf × 22 ft.
    const AT = (l1 / 2 + c / 24) * l2;
    near(run.num('AT'), AT);
    const VuCol = qu * AT + 1.2 * wallPlf * l2; // 72,373 + 7,920 = 80,293 lb
    near(run.num('Vu_col'), VuCol / 1000);
    // h_min = ℓn/30 = 20.333·12/30 = 8.133 in (Table 8.3.1.1, exterior, no edge beam, CONFIRMED)
    near(run.num('h_min'), (ln * 12) / 30);
    const s = section(c, c, dSlab, false); // b1 = 24.31, b2 = 28.63, bo = 77.25 in
    near(run.num('bo'), s.bo);
    near(run.num('bo'), 77.25);
    const Vu = VuCol - (qu * s.inside) / 144; // less the load inside the section
    near(run.num('Vu'), Vu / 1000); // 78.95 kip
    // Mo = qu ℓ2 ℓn²/8 (Eq. 8.10.3.2, CONFIRMED); Msc = 0.3 Mo at an edge column (§8.10.7.3, from memory).
    const Msc = 0.3 * ((qu * l2 * ln * ln) / 8); // 94,819 lb·ft
    near(run.num('Msc1'), Msc / 1000);
    near(run.num('gam_v'), s.gv); // 0.381
    const vu = Vu / (s.bo * dSlab) + (s.gv * Msc * 12 * s.xBar) / s.Jc; // 118.5 + 71.7 ≈ 190 psi
    near(run.num('vu'), vu);
    // Edge αs = 30: least of 4√f'c = 282.8, 6√f'c, (2 + 30·8.625/77.25)√f'c = 378.2 psi.
    near(run.num('vc'), 4 * sqrtFc);
    near(run.ratio('punch_col_ok'), vu / (0.75 * 4 * sqrtFc));
    // No drop: the outer section does not exist, its stress is zero.
    expect(run.num('vu_out')).toBe(0);
    // Top steel within b_slab = 20 + 3·10 = 50 in: #5 at 6 in = 0.31·50/6 = 2.583 in², carrying γf Msc.
    near(run.num('b_slab'), 50);
    near(run.num('As_top'), (0.31 * 50) / 6);
    near(run.num('Mf'), ((1 - s.gv) * Msc) / 1000); // 58.74 kip·ft
    near(run.num('phiMn_top'), phiMnRect((0.31 * 50) / 6, 50, dSlab, fc, fy) / 12000);
    // §8.6.1.2 (318-19, from memory): vuv = 118.5 psi > φ2λs√f'c = 106.1 psi →
    // As,min = 5 vuv bslab bo/(φ αs fy) = 5·118.5·50·77.25/(0.75·30·60,000) = 1.695 in².
    const vuv = Vu / (s.bo * dSlab);
    expect(vuv).toBeGreaterThan(0.75 * 2 * sqrtFc);
    expect(run.val('top_min')).toBe(true);
    near(run.num('As_top_min'), (5 * vuv * 50 * s.bo) / (0.75 * 30 * fy));
    run.dispose();
  });

  it('318-14 has no §8.6.1.2 minimum; the punching stress is unchanged at d < 10 in', async () => {
    const a = await runTemplate(FILE);
    const b = await runTemplate(FILE, { edition: '318-14' });
    expectAllPass(b);
    expect(b.val('top_min')).toBe(false);
    expect(b.num('As_top_min')).toBe(0);
    expect(b.num('vc')).toBeCloseTo(a.num('vc'), 9);
    a.dispose();
    b.dispose();
  });
});

describe('punching-edge.lt with a drop panel', () => {
  it('moves the first section into the drop and checks a second one outside it', async () => {
    const run = await runTemplate(FILE, { drop: 'yes' });
    expectAllPass(run);
    // Drop weight (14.25 − 10)/12·150·5·8 = 2125 lb, factored 1.2 with the wall.
    const AT = (l1 / 2 + c / 24) * l2;
    const VuCol = qu * AT + 1.2 * (wallPlf * l2 + 2125);
    near(run.num('W_drop'), 2.125);
    near(run.num('Vu_col'), VuCol / 1000); // 82.84 kip
    // With drop panels the exterior panel takes ℓn/33 (Table 8.3.1.1, CONFIRMED) = 7.394 in.
    near(run.num('h_min'), (ln * 12) / 33);
    near(run.num('d_col'), dDrop);
    const s = section(c, c, dDrop, false);
    const Vu = VuCol - (qu * s.inside) / 144;
    const Msc = 0.3 * ((qu * l2 * ln * ln) / 8);
    near(run.num('vu'), Vu / (s.bo * dDrop) + (s.gv * Msc * 12 * s.xBar) / s.Jc); // ≈ 110 psi
    // λs = √(2/(1 + 1.2875)) = 0.9351 (318-19): vc = 4·0.9351·70.71 = 264.5 psi.
    const vc19 = vcPunch(c, c, dDrop, s.bo, 30, '318-19');
    near(run.num('vc'), vc19);
    near(run.num('vc'), 264.5);
    // Outer section around the 60 × 96 in drop with the slab d: b1 = 64.31, b2 = 104.6, bo = 233.3 in.
    const o = section(x1, x2, dSlab, false);
    near(run.num('bo_out'), o.bo);
    const VuOut = VuCol - (qu * o.inside) / 144;
    near(run.num('vu_out'), VuOut / (o.bo * dSlab) + (o.gv * Msc * 12 * o.xBar) / o.Jc); // ≈ 42 psi
    // β = 96/60 = 1.6; (c) 2 + 30·8.625/233.3 = 3.109 governs: φvc = 0.75·3.109·70.71 = 164.9 psi.
    near(run.num('phi_vc_out'), 0.75 * vcPunch(x1, x2, dSlab, o.bo, 30, '318-19'));
    near(run.num('phi_vc_out'), 164.9);
    run.dispose();
  });

  it('318-14 drops λs at the thickened section', async () => {
    const run = await runTemplate(FILE, { drop: 'yes', edition: '318-14' });
    expectAllPass(run);
    near(run.num('vc'), 4 * sqrtFc); // 282.8 psi, no λs
    run.dispose();
  });

  it('corner column with a drop: moments about both axes added at the inner corner', async () => {
    const run = await runTemplate(FILE, { position: 'corner', drop: 'yes' });
    expectAllPass(run);
    const AT = (l1 / 2 + c / 24) * (l2 / 2 + c / 24); // 140.0 ft²
    near(run.num('AT'), AT);
    const VuCol = qu * AT + 1.2 * (wallPlf * (l1 / 2 + c / 24 + l2 / 2 + c / 24) + 2125);
    near(run.num('Vu_col'), VuCol / 1000); // 50.0 kip
    // Edge frame of width ℓ2/2 + c2/2 = 11.83 ft: Msc = 0.3 qu (11.83) ℓn²/8 = 51.0 kip·ft each way.
    const Msc = 0.3 * ((qu * (l2 / 2 + c / 24) * ln * ln) / 8);
    near(run.num('Msc1'), Msc / 1000);
    near(run.num('Msc2'), Msc / 1000);
    const s = section(c, c, dDrop, true); // b1 = b2 = 26.44 in, bo = 52.88 in, x̄ = b1/4
    near(run.num('bo'), s.bo);
    const Vu = VuCol - (qu * s.inside) / 144;
    const vu = Vu / (s.bo * dDrop) + 2 * ((s.gv * Msc * 12 * s.xBar) / s.Jc);
    near(run.num('vu'), vu); // ≈ 131 psi
    // Corner αs = 20; with d = 12.875 in, λs = 0.9351 (318-19).
    near(run.num('vc'), vcPunch(c, c, dDrop, s.bo, 20, '318-19'));
    // b_slab = c2 + 1.5 h at a corner: 20 + 1.5·14.25 = 41.38 in.
    near(run.num('b_slab'), 20 + 1.5 * hDrop);
    run.dispose();
  });
});

describe('punching-edge.lt as a document', () => {
  it('is well formed, round-trips and runs headless with exit code 0', async () => {
    expectWellFormed(FILE);
    const { code, err } = await calcJson(FILE);
    expect(err).toBe('');
    expect(code).toBe(0);
  });
});
