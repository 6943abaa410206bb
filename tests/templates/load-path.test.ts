// The main template, slab-to-footing load path of an interior column, run headless and
// checked against a hand calculation done here from first principles (US units:
// lengths in ft or in, loads in lb, stresses in psi or psf). Code values carry their
// clause; a value recalled, not read, says from memory.

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse } from '../../runtime/format/index';
import { calcJson, expectAllPass, expectWellFormed, floorTo, near, runTemplate, templateText, type Run } from './helpers';

const FILE = 'load-path.lt';

// ---- the hand calculation -------------------------------------------------------
const l1 = 24, l2 = 22; // ft
const h = 9, wc = 150; // in, pcf
const SDL = 25, SDLroof = 20, Lo = 40, Lr = 20; // psf
const floors = 4, hStorey = 10; // ft
const c = 20; // in, square column
const fc = 5000, fy = 60000, fcF = 4000; // psi
const sqrtFc = Math.sqrt(fc); // 70.71 psi
const sqrtFcF = Math.sqrt(fcF); // 63.25 psi

// Floor loads. AT = 24 × 22 = 528 ft² (half-bay rule, common practice).
const AT = l1 * l2;
// D = 9/12·150 + 25 = 112.5 + 25 = 137.5 psf; roof 112.5 + 20 = 132.5 psf.
const D = (h / 12) * wc + SDL;
const Droof = (h / 12) * wc + SDLroof;
// qu = max(1.4·137.5, 1.2·137.5 + 1.6·40) = max(192.5, 229.0) = 229 psf
// (ASCE 7-22 §2.3.1 comb. 1 and 2; the same factors in ASCE 7-10 §2.3.2).
const qu = Math.max(1.4 * D, 1.2 * D + 1.6 * Lo);

// Live load reduction of an interior column (KLL = 4, ASCE 7-22 Table 4.7-1, CONFIRMED):
// L/Lo = 0.25 + 15/√(KLL·AT) with AT summed over n floors, ≥ 0.50 (one floor) or
// 0.40 (two or more), no reduction below KLL·AT = 400 ft² (Eq. 4.7-1, CONFIRMED).
function lldFactor(n: number): number {
  const influence = 4 * n * AT;
  if (n === 0 || influence < 400) return 1;
  return Math.min(1, Math.max(0.25 + 15 / Math.sqrt(influence), n >= 2 ? 0.4 : 0.5));
}

// Slab. ℓn = 24 − 20/12 = 22.333 ft, the longer clear span (22 − 20/12 = 20.333 ft the other way).
// Three spans north–south: the column's line bounds an end span, so the exterior-panel row of
// ACI 318-19 Table 8.3.1.1 (no edge beams, fy = 60 ksi, CONFIRMED) applies: h_min = ℓn/30 = 8.933 in.
const ln = l1 - c / 12;
const hMin = (ln * 12) / 30;
// d = 9 − 0.75 − 0.625 (#5, ASTM A615 Table, CONFIRMED) = 7.625 in.
const d = h - 0.75 - 0.625;
// Mo = qu ℓ2 ℓn²/8 = 229·22·22.333²/8 = 314,097 lb·ft (ACI 318-19 Eq. 8.10.3.2, CONFIRMED).
const Mo = (qu * l2 * ln * ln) / 8;
// Interior span: 0.65 Mo negative, 0.35 Mo positive (§8.10.4.1, CONFIRMED); flat plate
// column strip 75 % of negative, 60 % of positive (Tables 8.10.5.1/.5, from memory).
const Mneg = 0.65 * Mo, Mpos = 0.35 * Mo;
const bcs = 2 * Math.min(0.25 * l1, 0.25 * l2); // 11 ft (§8.4.1.5, CONFIRMED)
const bms = l2 - bcs; // 11 ft
const MuCsNeg = 0.75 * Mneg, MuMsNeg = Mneg - MuCsNeg;
const MuCsPos = 0.6 * Mpos, MuMsPos = Mpos - MuCsPos;

// Whitney block (ACI 318-19 §22.2.2.4.1, CONFIRMED), φ = 0.9 (Table 21.2.2, from memory):
// Rn = Mu/(φ b d²), ρ = 0.85f'c/fy·(1 − √(1 − 2Rn/(0.85f'c))), As = ρ b d. Mu in lb·ft, b in ft.
function asWhitney(MuLbFt: number, bFt: number, dIn: number, fcPsi: number): number {
  const b = bFt * 12;
  const Rn = (MuLbFt * 12) / (0.9 * b * dIn * dIn);
  return ((0.85 * fcPsi) / fy) * (1 - Math.sqrt(1 - (2 * Rn) / (0.85 * fcPsi))) * b * dIn;
}
// As,min = 0.0018 b h (ACI 318-19 Table 8.6.1.1, from memory) = 0.0018·132·9 = 2.138 in².
const asMinSlab = (bFt: number) => 0.0018 * bFt * 12 * h;
const asStrip = (Mu: number, b: number) => Math.max(asWhitney(Mu, b, d, fc), asMinSlab(b));
// Spacing: one #5 (0.31 in²) per As/b of width, rounded down to 0.5 in, ≤ min(2h, 18 in)
// (ACI 318-19 §8.7.2.2, from memory).
const spacing = (As: number, bFt: number) => floorTo(Math.min(0.31 / (As / (bFt * 12)), Math.min(2 * h, 18)), 0.5);
// φMn of #5 at s over b: a = As fy/(0.85 f'c b), φMn = 0.9 As fy (d − a/2) when εt ≥ 0.00507.
function phiMnStrip(s: number, bFt: number): number {
  const As = (0.31 / s) * bFt * 12;
  const a = (As * fy) / (0.85 * fc * bFt * 12);
  const cNa = a / 0.8; // β1 = 0.80 at 5000 psi (Table 22.2.2.4.3, CONFIRMED)
  expect(0.003 * (d - cNa) / cNa).toBeGreaterThan(fy / 29e6 + 0.003); // tension-controlled
  return (0.9 * As * fy * (d - a / 2)) / 12; // lb·ft
}

// Punching at the interior column (ACI 318-19 §22.6). bo = 4(20 + 7.625) = 110.5 in.
const b1 = c + d;
const bo = 4 * b1;
// λs = √(2/(1 + d/10)) ≤ 1 → 1.0 at d = 7.625 in (§22.5.5.1.3, CONFIRMED).
// vc = least of 4√f'c = 282.8, (2 + 4/1)√f'c = 424.3, (2 + 40·7.625/110.5)√f'c = 336.6 psi
// (Table 22.6.5.2, CONFIRMED; compare reference e.8).
const vcA = 4 * sqrtFc, vcB = 6 * sqrtFc, vcC = (2 + (40 * d) / bo) * sqrtFc;
const vc = Math.min(vcA, vcB, vcC);
// Vu = qu AT − qu (c + d)² = 120,912 − 229·(27.625/12)² = 119,698 lb.
const VuSlab = qu * AT;
const Vu = VuSlab - qu * (b1 / 12) ** 2;
const phiVc = 0.75 * vc * bo * d; // φ = 0.75 (Table 21.2.1, CONFIRMED) → 178,740 lb
// Msc = 0.07·(0.5·1.6·Lo)·ℓ2·ℓn² = 0.07·32·22·22.333² = 24,580 lb·ft (ACI 318-19
// Eq. 8.10.7.2 with equal spans and dead loads, from memory).
const Msc = 0.07 * (0.5 * 1.6 * Lo) * l2 * ln * ln;
// γv = 1 − 1/(1 + (2/3)√(b1/b2)) = 0.4 for a square section (Eq. 8.4.2.2.2, from memory).
const gv = 1 - 1 / (1 + (2 / 3) * Math.sqrt(b1 / b1));
// Jc = d b1³/6 + b1 d³/6 + d b2 b1²/2, c = b1/2 (ACI 318-19 R8.4.4.2.3, from memory).
const Jc = (d * b1 ** 3) / 6 + (b1 * d ** 3) / 6 + (d * b1 * b1 ** 2) / 2;
const vuMoment = Vu / (bo * d) + (gv * Msc * 12 * (b1 / 2)) / Jc; // psi
// §8.6.1.2 (318-19 only, from memory): vuv = Vu/(bo d) = 142.1 psi > φ2λs√f'c = 106.1 psi →
// As,min = 5 vuv bslab bo/(φ αs fy), bslab = c2 + 3h = 47 in (§8.4.2.2.3, from memory).
const vuv = Vu / (bo * d);
const bslab = c + 3 * h;
const asTopMin = (5 * vuv * bslab * bo) / (0.75 * 40 * fy);

// Column, accumulated floor by floor: n floors + roof on AT, n + 1 storeys of a 20 × 20 in
// column at 150 pcf = 416.7 lb/ft (statics); Lr unreduced.
const wCol = ((c * c) / 144) * wc;
const deadAt = (n: number) => AT * (Droof + n * D) + (n + 1) * wCol * hStorey;
const liveAt = (n: number) => n * AT * Lo * lldFactor(n);
const PLr = AT * Lr; // 10,560 lb
// Pu = max(1.4D, 1.2D + 1.6L + 0.5Lr, 1.2D + 1.6Lr + L) (ASCE 7-22 §2.3.1; the same factors in ASCE 7-10 §2.3.2).
const puAt = (n: number) => {
  const Dn = deadAt(n), Ln = liveAt(n);
  return Math.max(1.4 * Dn, 1.2 * Dn + 1.6 * Ln + 0.5 * PLr, 1.2 * Dn + 1.6 * PLr + Ln);
};
// Service: max(D, D + L, D + Lr, D + 0.75L + 0.75Lr) (ASCE 7-22 §2.4.1; the same combination in ASCE 7-10 §2.4.1).
const PD = deadAt(floors), PL = liveAt(floors), Pu = puAt(floors);
const Ps = Math.max(PD, PD + PL, PD + PLr, PD + 0.75 * PL + 0.75 * PLr);
// Tied column: φPn,max = 0.65·0.80·[0.85 f'c (Ag − Ast) + fy Ast], 8 #8 = 8·0.79 in²
// (ACI 318-19 Eq. 22.4.2.2, Table 22.4.2.1, CONFIRMED).
const Ag = c * c, Ast = 8 * 0.79;
const phiPn = 0.65 * 0.8 * (0.85 * fc * (Ag - Ast) + fy * Ast);

// Footing, 14 ft square, h = 32 in, base 4.5 ft below grade.
const Bft = 14, hf = 32, Df = 4.5, gs = 120;
// q_net = 3000 − (32/12)·150 − (4.5 − 32/12)·120 − 100 = 3000 − 400 − 220 − 100 = 2280 psf (common practice).
const qNet = 3000 - (hf / 12) * wc - (Df - hf / 12) * gs - 100;
const Areq = Ps / qNet; // ACI 318-19 §13.3.1.1: service loads on the net pressure
const df = hf - 3 - 0.75; // 3 in cover (Table 20.5.1.3.1, from memory), #6 bar 0.75 in → 28.25 in
const Bin = Bft * 12;
const quF = Pu / (Bft * Bft); // psf
// Two-way: Vu = Pu − qu (c + d)², bo = 4(c + d) = 193 in, λs = √(2/3.825) = 0.7231 (318-19),
// vc = 4λs√f'c = 182.9 psi ((b) 6 and (c) 2 + 40·28.25/193 = 7.85 are larger).
const VuF2 = Pu - quF * ((c + df) / 12) ** 2;
const boF = 4 * (c + df);
const lamSF = Math.sqrt(2 / (1 + df / 10));
const phiVcF2 = (lam: number) => 0.75 * 4 * lam * sqrtFcF * boF * df;
// Flexure at the column face: Mu = qu B ((B − c)/2)²/2 = 2723·14·6.167²/2 (ACI 318-19 §13.2.7.1, from memory).
const arm = (Bin - c) / 2 / 12; // ft
const MuF = (quF * Bft * arm * arm) / 2;
// As = max(Whitney, 0.0018 B h) = max(≈5.6, 0.0018·168·32 = 9.677) in² → 22 #6 (0.44 in², ASTM A615);
// but the bars may be no more than min(2h, 18 in, crack control) apart: Table 24.3.2 (from memory) at
// fs = 40 ksi, cc = 3 in gives min(15 − 7.5, 12) = 7.5 in, so (168 − 6 − 0.75)/7.5 = 21.5 → 22 spaces,
// 23 bars (10.12 in²) at 161.25/22 = 7.33 in.
const AsF = Math.max(asWhitney(MuF, Bft, df, fcF), 0.0018 * Bin * hf);
const nF = Math.max(Math.ceil(AsF / 0.44), Math.ceil((Bin - 6 - 0.75) / 7.5) + 1);
const sF = (Bin - 6 - 0.75) / (nF - 1);
const AsProvF = nF * 0.44;
const aF = (AsProvF * fy) / (0.85 * fcF * Bin);
const phiMnF = (0.9 * AsProvF * fy * (df - aF / 2)) / 12; // lb·ft
// One-way at d from the face: Vu = qu B ((B − c)/2 − d) = 2723·14·46/12 lb.
const VuF1 = quF * Bft * ((Bin - c) / 2 - df) / 12;
const rhoW = AsProvF / (Bin * df);
// 318-19 Table 22.5.5.1(c): Vc = 8 λs (ρw)^(1/3) √f'c bw d (e.2, CONFIRMED structure);
// 318-14 §22.5.5.1: Vc = 2√f'c bw d.
const phiVcF1_19 = 0.75 * 8 * lamSF * Math.cbrt(rhoW) * sqrtFcF * Bin * df;
const phiVcF1_14 = 0.75 * 2 * sqrtFcF * Bin * df;
// ℓd = fy ψt ψe ψg/(25 λ √f'c) db for #6 and smaller (Table 25.4.2.3, from memory)
// = 60,000/(25·63.25)·0.75 = 28.46 in; available (168 − 20)/2 − 3 = 71 in.
const ld = (fy / (25 * sqrtFcF)) * 0.75;
// Bearing: φBn = 0.65·0.85 f'c A1 (column) and ·min(√(A2/A1), 2) (footing), A2 from a 1:2 frustum:
// side 20 + 2·min(2·32, 74) = 148 in (ACI 318-19 §22.8.3.2, CONFIRMED-indirect).
const A2 = (c + 2 * Math.min(2 * hf, (Bin - c) / 2)) ** 2;
const phiBnCol = 0.65 * 0.85 * fc * Ag;
const phiBnF = 0.65 * 0.85 * fcF * Ag * Math.min(Math.sqrt(A2 / Ag), 2);

// Soil: IBC Table 1806.2 sandy gravel 3000 psf (CONFIRMED). Terzaghi square footing,
// c = 0: qu = q Nq + 0.4 γ B Nγ, φ = 30°: Nq = e^{2(3π/4 − φ/2)tanφ}/(2cos²(45° + φ/2)) = 22.46
// (closed form, CONFIRMED) and Nγ = 19.13 (Das Table 3.1, Kumbhojkar, CONFIRMED-indirect).
const phiS = Math.PI / 6;
const NqT = Math.exp(2 * (0.75 * Math.PI - phiS / 2) * Math.tan(phiS)) / (2 * Math.cos(Math.PI / 4 + phiS / 2) ** 2);
const quSoil = gs * Df * NqT + 0.4 * gs * Bft * 19.13;

// ---- the tests ----------------------------------------------------------------

describe('load-path.lt at its defaults (ACI 318-19)', () => {
  let run: Run;
  beforeAll(async () => {
    run = await runTemplate(FILE);
  });
  afterAll(() => run.dispose());

  it('computes every cell and passes every check', () => {
    expectAllPass(run);
  });

  it('floor loads and live load reduction', () => {
    near(run.num('AT'), 528); // ft²
    near(run.num('D'), 137.5); // psf
    near(run.num('qu'), 229); // psf, 1.2D + 1.6L governs over 1.4D
    expect(run.val('qu_combo')).toBe('1.2D + 1.6L + (0.5Lr or 0.3S or 0.5R)'); // ASCE 7-22 §2.3.1 comb. 2
    // 0.25 + 15/√8448 = 0.4132 ≥ 0.40 (two or more floors)
    near(run.num('F_LL'), 0.25 + 15 / Math.sqrt(8448));
    near(run.num('F_LL'), 0.4132);
    near(run.num('L_red'), 40 * 0.41320, 1e-3); // 16.53 psf
  });

  it('slab: action, thickness and DDM moments', () => {
    expect(run.val('action')).toBe('two-way'); // 24/22 = 1.09 ≤ 2 (e.6, CONFIRMED limit)
    near(run.num('ln'), ln); // 22.33 ft
    expect(run.val('panel')).toBe('exterior');
    near(run.num('h_min'), hMin); // 8.933 in
    near(run.num('h_min'), 8.933);
    near(run.num('d'), 7.625);
    near(run.num('Mo'), Mo / 1000); // 314.1 kip·ft
    near(run.num('Mo'), 314.1);
    near(run.num('M_neg'), Mneg / 1000);
    near(run.num('M_pos'), Mpos / 1000);
    near(run.num('b_cs'), 11);
    near(run.num('Mu_cs_neg'), MuCsNeg / 1000); // 153.1 kip·ft
    near(run.num('Mu_ms_neg'), MuMsNeg / 1000); // 51.04
    near(run.num('Mu_cs_pos'), MuCsPos / 1000); // 65.96
    near(run.num('Mu_ms_pos'), MuMsPos / 1000); // 43.97
  });

  it('slab: strip steel, bar spacing and flexural strength', () => {
    const strips: [string, number, number][] = [
      ['cs_neg', MuCsNeg, bcs], ['ms_neg', MuMsNeg, bms], ['cs_pos', MuCsPos, bcs], ['ms_pos', MuMsPos, bms],
    ];
    for (const [key, Mu, b] of strips) {
      const As = asStrip(Mu, b);
      near(run.num(`As_${key}`), As);
      const s = spacing(As, b);
      expect(run.num(`s_${key}`)).toBeCloseTo(s, 6);
      near(run.ratio(`${key}_ok`), Mu / phiMnStrip(s, b));
    }
    // Column strip top: As = 4.612 in² → #5 at 0.31·132/4.612 = 8.87 → 8.5 in.
    near(run.num('As_cs_neg'), 4.612, 1e-3);
    expect(run.num('s_cs_neg')).toBeCloseTo(8.5, 9);
    // The others are at As,min = 2.138 in², spacing capped at 2h = 18 in.
    near(run.num('As_ms_pos'), 2.138, 1e-3);
    expect(run.num('s_ms_pos')).toBeCloseTo(18, 9);
  });

  it('punching at the column, with moment transfer and the §8.6.1.2 top steel', () => {
    near(run.num('bo'), 110.5);
    expect(run.num('lam_s')).toBe(1);
    near(run.num('vc_a'), vcA); // 282.8 psi
    near(run.num('vc_b'), vcB); // 424.3 psi
    near(run.num('vc_c'), vcC); // 336.6 psi
    near(run.num('vc'), 282.8);
    near(run.num('Vu'), Vu / 1000); // 119.7 kip
    near(run.num('phiVc'), phiVc / 1000); // 178.7 kip
    near(run.ratio('punch_ok'), Vu / phiVc);
    near(run.num('Msc'), Msc / 1000); // 24.58 kip·ft
    near(run.num('gam_v'), 0.4);
    near(run.num('vu'), vuMoment); // ≈ 157 psi
    near(run.ratio('punch_m_ok'), vuMoment / (0.75 * vc));
    near(run.num('vuv'), vuv); // 142.1 psi
    expect(vuv).toBeGreaterThan(0.75 * 2 * sqrtFc);
    expect(run.val('top_min')).toBe(true);
    near(run.num('As_top_min'), asTopMin); // 2.049 in²
    // #5 at floor(0.31·47/2.049 = 7.11) = 7.0 in < 8.5 in of the column strip.
    expect(run.num('s_top')).toBeCloseTo(floorTo((0.31 * bslab) / asTopMin, 0.5), 9);
  });

  it('column loads floor by floor, capacity and slenderness', () => {
    for (const n of [0, 1, 2, 3]) near(run.num(`Pu_${n}`), puAt(n) / 1000);
    // Below the roof: 1.2D + 1.6Lr governs: 1.2·74,127 + 1.6·10,560 = 105,848 lb.
    near(run.num('Pu_0'), 105.8);
    near(run.num('PD'), PD / 1000); // 528·682.5 + 5·4167 = 381,193 lb
    near(run.num('PD'), 381.2);
    near(run.num('PL'), PL / 1000); // 84,480·0.4132 = 34,907 lb
    near(run.num('Pu'), Pu / 1000); // 1.4D = 533.7 kip governs
    expect(run.val('Pu_combo')).toBe('1.4D');
    near(run.num('Ps'), Ps / 1000); // D + L = 416.1 kip
    near(run.num('rho_col'), Ast / Ag); // 0.0158
    near(run.num('phiPn'), phiPn / 1000); // 1067 kip
    near(run.ratio('axial_ok'), Pu / phiPn);
    // kℓu/r = 1.0·(120 − 9)/(0.3·20) = 18.5 ≤ 34 − 12 = 22 about each axis of the square column
    // (ACI 318-19 §6.2.5.1(b), r = 0.3h §6.2.5.2(b), from memory)
    near(run.num('slender_1'), 18.5);
    near(run.num('slender_2'), 18.5);
    near(run.num('slender_max'), 22);
  });

  it('footing: area, shears, flexure, development, bearing, dowels', () => {
    near(run.num('q_net'), qNet); // 2280 psf
    near(run.num('A_req'), Areq); // 182.5 ft²
    near(run.ratio('area_ok'), Areq / 196);
    near(run.num('d_f'), 28.25);
    near(run.num('Vu_f2'), VuF2 / 1000); // 489.7 kip
    near(run.num('vc_f'), 4 * lamSF * sqrtFcF); // 182.9 psi
    near(run.num('phiVc_f2'), phiVcF2(lamSF) / 1000); // 748.0 kip
    near(run.num('s_max_f'), 7.5);
    // Square column: the same in both directions (§13.2.7.1, §13.2.7.2 in each direction).
    for (const k of ['1', '2']) {
      near(run.num(`Mu_f${k}`), MuF / 1000); // 724.8 kip·ft
      near(run.num(`As_f${k}`), AsF); // 9.677 in² (minimum governs)
      expect(run.num(`n_f${k}`)).toBe(23);
      near(run.num(`s_f${k}`), sF); // 7.33 in
      near(run.ratio(`flexure_f${k}_ok`), MuF / phiMnF);
      near(run.num(`Vu_ow${k}`), VuF1 / 1000); // 145.3 kip
      near(run.num(`phiVc_ow${k}`), phiVcF1_19 / 1000); // 167.6 kip
    }
    near(run.num('ld'), ld); // 28.46 in
    near(run.num('ld_avail'), 71);
    near(run.num('A2'), A2 / 144); // 152.1 ft²
    near(run.num('phiBn_col'), phiBnCol / 1000); // 1105 kip
    near(run.num('phiBn_f'), phiBnF / 1000); // 1768 kip (√(A2/A1) capped at 2)
    near(run.ratio('dowel_ok'), (0.005 * Ag) / (4 * 0.6)); // 2.0 / 2.4 in² (§16.3.4.1, CONFIRMED-indirect)
  });

  it('soil: presumptive value and Terzaghi capacity', () => {
    near(run.num('q_pres'), 3000);
    near(run.num('qu_soil'), quSoil / 1000); // 540·22.46 + 0.4·120·14·19.13 = 24.98 ksf
    near(run.num('q_cap'), quSoil / 3);
  });
});

describe('load-path.lt with edition = 318-14', () => {
  let run: Run;
  beforeAll(async () => {
    run = await runTemplate(FILE, { edition: '318-14' });
  });
  afterAll(() => run.dispose());

  it('still passes, and the shears and the column top steel follow 318-14', () => {
    expectAllPass(run);
    // No λs in 318-14: footing vc = 4√f'c = 253.0 psi, φVc = 0.75·253.0·192·28 = 1020 kip.
    near(run.num('vc_f'), 4 * sqrtFcF);
    near(run.num('phiVc_f2'), phiVcF2(1) / 1000);
    // One-way: φVc = 0.75·2√f'c·bw·d = 0.75·2·63.25·168·28.25 = 450.2 kip.
    near(run.num('phiVc_ow1'), phiVcF1_14 / 1000);
    near(run.num('phiVc_ow2'), 450.2);
    // §8.6.1.2 is new in 318-19: no minimum top steel over the column.
    expect(run.val('top_min')).toBe(false);
    expect(run.num('As_top_min')).toBe(0);
    expect(run.num('s_top')).toBeCloseTo(8.5, 9);
    // Unchanged: the slab punching (d < 10 in, λs = 1 in 318-19 too) and the flexure.
    near(run.num('phiVc'), phiVc / 1000);
    near(run.num('As_cs_neg'), asStrip(MuCsNeg, bcs));
  });
});

describe('load-path.lt with asce = 7-16', () => {
  it('takes the 25 psf roof snow at 1.6S and 0.5S: the load below the roof rises', async () => {
    const a = await runTemplate(FILE);
    const b = await runTemplate(FILE, { asce: '7-16' });
    try {
      // Below the roof: D = 528·132.5 + 4167 = 74,127 lb, Lr = 10,560 lb, S = 528·25 = 13,200 lb.
      // ASCE 7-22 §2.3.1 (1.0S, from memory): 1.2D + max(1.6Lr, 1.0S) = 88,952 + 16,896 = 105,848 lb (Lr leads).
      // ASCE 7-16 §2.3.1: 1.2D + 1.6S = 88,952 + 21,120 = 110,072 lb.
      const D0 = deadAt(0);
      near(a.num('Pu_0'), (1.2 * D0 + Math.max(1.6 * PLr, 13200)) / 1000);
      near(b.num('Pu_0'), (1.2 * D0 + 1.6 * 13200) / 1000);
      near(b.num('Pu_0'), 110.07);
      // At the footing 1.4D governs under both editions (snow is small beside four floors of dead load).
      near(b.num('Pu'), a.num('Pu'));
      expect(b.val('qu_combo')).toBe('1.2D + 1.6L + 0.5(Lr or S or R)');
    } finally {
      a.dispose();
      b.dispose();
    }
  });
});

describe('load-path.lt with neglect_ls_f = yes', () => {
  it('drops λs from the footing shears only (ACI 318-19 §13.2.6.2, from memory): the slab keeps it', async () => {
    const run = await runTemplate(FILE, { neglect_ls_f: 'yes' });
    try {
      near(run.num('vc_f'), 4 * sqrtFcF); // 4√f'c = 253.0 psi (Table 22.6.5.2(a), λs = 1)
      near(run.num('phiVc_ow1'), (0.75 * 8 * Math.cbrt(rhoW) * sqrtFcF * Bin * df) / 1000); // Table 22.5.5.1(c), λs = 1
      expect(run.num('lam_s')).toBe(1); // the slab's own λs: d = 7.625 in ≤ 10 in gives 1.0 anyway
    } finally {
      run.dispose();
    }
  });
});

describe('load-path.lt as a document', () => {
  it('is well formed and round-trips through the format', () => {
    const doc = expectWellFormed(FILE);
    // Load-path order: loads, slab, punching, column, footing, soil (figures may follow).
    const titles = doc.cells.filter((c) => c.kind === 'section').map((c) => (c.kind === 'section' ? c.title : ''));
    expect(titles.slice(0, 6).map((t) => t.split(/[ :,]/)[0])).toEqual(['Floor', 'Slab', 'Punching', 'Column', 'Spread', 'Soil']);
  });

  it('runs through the headless runner with exit code 0', async () => {
    const { code, rows, err } = await calcJson(FILE);
    expect(err).toBe('');
    expect(code).toBe(0);
    expect(rows.filter((r) => r.kind === 'check').length).toBeGreaterThanOrEqual(20);
  });

  it('demo.lt is the same sheet with the project marked (demo)', () => {
    const main = parse(templateText(FILE)).doc;
    const demo = parse(templateText('demo.lt')).doc;
    expect(demo.cells).toEqual(main.cells);
    expect(demo.meta).toEqual({ ...main.meta, project: `${main.meta.project} (demo)` });
  });
});
