// The main template traced for an interior, an edge and a corner column, and its column
// under axial load and moment and its dowels, each result worked by hand here (lb, in, ft,
// psi, psf) with the clause of each formula beside it.

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { near, phiMnRect, runTemplate, whitneyAs, floorTo, type Run } from './helpers';

const FILE = 'load-path.lt';

// ---- common hand values (defaults of the template) ----------------------------------
const l1 = 24, l2 = 22, c = 20, h = 9, fc = 5000, fy = 60000; // ft, ft, in, in, psi, psi
const D = (h / 12) * 150 + 25; // 137.5 psf
const Droof = (h / 12) * 150 + 20; // 132.5 psf
const qu = 1.2 * D + 1.6 * 40; // 229 psf (governs 1.4D = 192.5; ASCE 7-22 §2.3.1)
const ln = l1 - c / 12; // 22.333 ft, clear span (ACI 318-19 §8.10.3.2.1)
const ln2 = l2 - c / 12; // 20.333 ft
const d = h - 0.75 - 0.625; // 7.625 in, #5 bars (ASTM A615 0.625 in)
const sqrtFc = Math.sqrt(fc);
const wCol = ((c * c) / 144) * 150; // 416.7 lb/ft

/** Pu and PD at the footing for a tributary area AT (ft²), 4 floors + roof, KLL = 4 (ASCE 7-22 Eq. 4.7-1, §2.3.1). */
function footingLoad(AT: number): { Pu: number; PD: number } {
  const PD = AT * (Droof + 4 * D) + 5 * wCol * 10;
  const F = Math.max(0.25 + 15 / Math.sqrt(4 * 4 * AT), 0.4);
  const PL = 4 * AT * 40 * Math.min(1, F);
  const PLr = AT * 20;
  return { PD, Pu: Math.max(1.4 * PD, 1.2 * PD + 1.6 * PL + 0.5 * PLr, 1.2 * PD + 1.6 * PLr + PL) };
}

// ---- an independent strain-compatibility calc of the 20 × 20 in column ---------------------
// 3 #8 on each face (0.79 in², ASTM A615), bars at 1.5 + 0.375 (#3 tie) + 0.5 = 2.375 in from each
// face; ACI 318-19 §22.2: εcu = 0.003, Es = 29,000 ksi, 0.85 f'c over a = β1 c, β1 = 0.80 at 5000 psi
// (Table 22.2.2.4.3, CONFIRMED); φ = 0.65 + 0.25(εt − εty)/0.003 between 0.65 and 0.90
// (Table 21.2.2, from memory). Kip and inch.
const ds = 2.375;
const rows = [{ y: ds, A: 3 * 0.79 }, { y: 10, A: 2 * 0.79 }, { y: 20 - ds, A: 3 * 0.79 }];
function point(cNa: number): { Pn: number; Mn: number; phi: number; epsT: number } {
  const a = Math.min(0.8 * cNa, 20);
  let Pn = 0.85 * 5 * a * 20, Mn = Pn * (10 - a / 2);
  for (const r of rows) {
    const fs = Math.max(-60, Math.min(60, 29000 * 0.003 * (cNa - r.y) / cNa));
    const F = r.A * (fs - (r.y < a ? 4.25 : 0));
    Pn += F;
    Mn += F * (10 - r.y);
  }
  const epsT = 0.003 * (20 - ds - cNa) / cNa, ety = 60 / 29000;
  const phi = Math.min(0.9, Math.max(0.65, 0.65 + (0.25 * (epsT - ety)) / 0.003));
  return { Pn, Mn, phi, epsT };
}
/** φMn (kip·ft) where φPn = Pu (kip), by bisection on c (φPn rises with c for this section). */
function phiMnAt(PuKip: number): number {
  let lo = 0.5, hi = 60;
  for (let k = 0; k < 100; k++) {
    const mid = (lo + hi) / 2;
    const p = point(mid);
    if (p.phi * p.Pn < PuKip) lo = mid;
    else hi = mid;
  }
  const p = point(hi);
  return (p.phi * p.Mn) / 12;
}

describe('interior column at the defaults: the column under Pu and Mu, and the dowels', () => {
  let run: Run;
  beforeAll(async () => {
    run = await runTemplate(FILE);
  });
  afterAll(() => run.dispose());

  it('slab moment shared with the column above; M2,min governs and is checked on the interaction', () => {
    // Msc = 0.07·(0.5·1.6·40)·22·22.333² = 24,580 lb·ft (ACI 318-19 Eq. 8.10.7.2, equal spans, from memory);
    // the column below takes half (§8.10.7.2, equal 4EI/ℓ; common practice): 12,290 lb·ft.
    const Msc = 0.07 * 32 * l2 * ln * ln;
    near(run.num('share'), 0.5);
    near(run.num('M_col1'), (0.5 * Msc) / 1000);
    // Pu = 1.4 PD = 1.4·381,193 = 533,671 lb; M2,min = Pu(0.6 + 0.03·20)/12 = 53,367 lb·ft (Eq. 6.6.4.5.4)
    const { Pu, PD } = footingLoad(l1 * l2);
    near(Pu, 533_671, 1e-5);
    near(run.num('beta_dns'), Math.min(1, (1.4 * PD) / Pu)); // 1.0: all of 1.4D is sustained (§6.6.4.4.4)
    expect(run.num('delta_1')).toBe(1); // kℓu/r = 18.5 ≤ 22: slenderness neglected (§6.2.5.1)
    near(run.num('Mu_c1'), (Pu * 1.2) / 12 / 1000);
    near(run.num('Mu_c2'), (Pu * 1.2) / 12 / 1000);
    near(run.num('d_col'), 2.375);
    // φMn at Pu = 533.67 kip: compression-controlled (Pu > φPb), φ = 0.65
    const m = phiMnAt(Pu / 1000);
    near(run.num('phiMn_c1'), m, 1e-4);
    near(run.num('phi_c1'), 0.65);
    near(run.ratio('pm_1_ok'), (Pu * 0.1) / 1000 / m, 1e-4);
    near(run.ratio('pm_2_ok'), (Pu * 0.1) / 1000 / m, 1e-4);
    expect(run.num('biaxial')).toBe(0); // a corner check only
  });

  it('γf Msc within bslab = 47 in is carried by the top bars over the column', () => {
    // γf = 0.6 for the square section (Eq. 8.4.2.2.2): Mf = 0.6·24,580 = 14,748 lb·ft; #5 at s_top = 7 in (§8.6.1.2 governs)
    const Mf = 0.6 * 0.07 * 32 * l2 * ln * ln;
    near(run.num('Mf'), Mf / 1000);
    expect(run.num('s_top')).toBeCloseTo(7, 9);
    near(run.ratio('transfer_ok'), Mf / (phiMnRect((0.31 * 47) / 7, 47, d, fc, fy) / 12), 1e-4);
  });

  it('dowels: ℓdc into the footing within its depth, and the lap into the column', () => {
    // ℓdc = max(0.02·60,000/√4000, 0.0003·60,000)·0.875 = max(18.97, 18.0)·0.875 = 16.60 in (§25.4.9.2, from memory)
    near(run.num('ldc_f'), (0.02 * 60000 / Math.sqrt(4000)) * 0.875);
    // 32 − 3 − 2·0.75 (#6 mat) − 0.875 (#7 hooked leg) = 26.625 in (common practice)
    near(run.num('ldc_avail'), 26.625);
    near(run.ratio('dowel_dev_ok'), 16.602 / 26.625, 1e-4);
    // Lap (§25.5.5.4, from memory): max(ℓdc of #8 in 5000 psi = max(16.97, 18.0) = 18.0, ℓsc of #7 = 0.0005·60,000·0.875 = 26.25) in
    near(run.num('l_lap'), 26.25);
  });
});

describe('edge column (line1 = 0): end span, three-sided perimeter, 0.3 Mo', () => {
  let run: Run;
  beforeAll(async () => {
    run = await runTemplate(FILE, { position: 'edge', line1: '0' });
  });
  afterAll(() => run.dispose());

  const AT = (l1 / 2 + c / 24) * l2; // (12 + 0.833)·22 = 282.33 ft² (slab edge at the outer column face)
  const Mo = (qu * l2 * ln * ln) / 8; // 314,105 lb·ft (Eq. 8.10.3.2)
  const Msc = 0.3 * Mo; // 94,232 lb·ft (§8.10.7.3, from memory)

  it('passes every check but the ones that do not apply', () => {
    const failing = run.doc.cells.filter((x) => x.kind === 'check' && run.engine.state(x.id)?.status !== 'ok');
    expect(failing.map((x) => ('name' in x ? x.name : x.id))).toEqual([]);
  });

  it('tributary area, KLL and the end-span moments', () => {
    near(run.num('AT'), AT);
    expect(run.num('KLL')).toBe(4); // exterior column without cantilever slab (ASCE 7-22 Table 4.7-1, CONFIRMED)
    near(run.num('Mo'), Mo / 1000);
    // Table 8.10.4.2, flat plate without edge beam: exterior negative 0.26, positive 0.52 (from memory)
    near(run.num('M_neg'), (0.26 * Mo) / 1000);
    near(run.num('M_pos'), (0.52 * Mo) / 1000);
    // All of the exterior negative moment in the column strip with βt = 0 (Table 8.10.5.2, from memory)
    near(run.num('Mu_cs_neg'), (0.26 * Mo) / 1000);
    expect(run.num('Mu_ms_neg')).toBeCloseTo(0, 9);
  });

  it('punching on three sides with γv Msc (ACI 318-19 R8.4.4.2.3 by the sum of the sides)', () => {
    const b1 = c + d / 2, b2 = c + d; // 23.8125, 27.625 in
    const bo = 2 * b1 + b2; // 75.25 in
    const Vu = qu * (AT - (b1 * b2) / 144); // 63,608 lb
    const cAB = (b1 * b1) / (2 * b1 + b2); // 7.535 in
    const Jc = 2 * ((d * b1 ** 3) / 12 + (b1 * d ** 3) / 12 + b1 * d * (b1 / 2 - cAB) ** 2) + b2 * d * cAB ** 2;
    const gf = 1 / (1 + (2 / 3) * Math.sqrt(b1 / b2)); // 0.6177 (Eq. 8.4.2.2.2)
    const vu = Vu / (bo * d) + ((1 - gf) * Msc * 12 * cAB) / Jc;
    near(run.num('bo'), bo);
    near(run.num('Vu'), Vu / 1000);
    near(run.num('Msc'), Msc / 1000);
    near(run.num('gam_v'), 1 - gf);
    near(run.num('vu'), vu);
    near(run.ratio('punch_m_ok'), vu / (0.75 * 4 * sqrtFc)); // vc = 4√f'c governs; αs = 30 in (c): 2 + 30·7.625/75.25 = 5.04
    // γf Msc in bslab = 20 + 27 = 47 in: As = 1.757 in² (Whitney) → #5 at floor(0.31·47/1.757) = 8.0 in
    const Mf = gf * Msc;
    const As = whitneyAs(Mf * 12, 47, d, fc, fy);
    const s = floorTo((0.31 * 47) / As, 0.5);
    expect(run.num('s_top')).toBeCloseTo(s, 9);
    near(run.ratio('transfer_ok'), Mf / (phiMnRect((0.31 * 47) / s, 47, d, fc, fy) / 12), 1e-4);
  });

  it('the column takes half of 0.3 Mo, more than M2,min, on its interaction', () => {
    const { Pu } = footingLoad(AT); // 298,936 lb (1.4D)
    near(run.num('Pu'), Pu / 1000);
    near(run.num('Mu_c1'), (0.5 * Msc) / 1000); // 47,116 > M2,min = 29,894 lb·ft
    near(run.num('Mu_c2'), (Pu * 1.2) / 12 / 1000);
    near(run.num('phiMn_c1'), phiMnAt(Pu / 1000), 1e-4);
  });
});

describe('corner column (line1 = 0, line2 = 0): moments about both axes', () => {
  let run: Run;
  beforeAll(async () => {
    run = await runTemplate(FILE, { position: 'corner', line1: '0', line2: '0' });
  });
  afterAll(() => run.dispose());

  const AT = (l1 / 2 + c / 24) * (l2 / 2 + c / 24); // 12.833·11.833 = 151.86 ft²
  // Edge frames ℓ/2 + c/2 wide (common practice): Mo1 = 229·11.833·22.333²/8, Mo2 = 229·12.833·20.333²/8
  const Mo1 = (qu * (l2 / 2 + c / 24) * ln * ln) / 8; // 168,951 lb·ft
  const Mo2 = (qu * (l1 / 2 + c / 24) * ln2 * ln2) / 8; // 151,881 lb·ft

  it('0.3 Mo about each axis, added at the inner corner of a two-sided section: the 9 in plate fails here', () => {
    const b = c + d / 2; // 23.8125 in both ways
    const bo = 2 * b; // 47.625 in
    const Vu = qu * (AT - (b * b) / 144); // 33,874 lb
    const cAB = (b * b) / (2 * (b + b)); // 5.953 in
    const Jc = (d * b ** 3) / 12 + (b * d ** 3) / 12 + b * d * (b / 2 - cAB) ** 2 + b * d * cAB ** 2; // product of inertia neglected
    const vu = Vu / (bo * d) + (0.4 * 0.3 * (Mo1 + Mo2) * 12 * cAB) / Jc; // γv = 0.4 (b1 = b2)
    near(run.num('Msc'), (0.3 * Mo1) / 1000);
    near(run.num('Msc_2'), (0.3 * Mo2) / 1000);
    near(run.num('b_slab'), 20 + 13.5); // one side only (§8.4.2.2.3)
    near(run.num('vu'), vu); // 216.5 psi
    near(run.ratio('punch_m_ok'), vu / (0.75 * 4 * sqrtFc)); // 1.02: a corner column wants a thicker slab or a drop
    expect(run.state('punch_m_ok').status).toBe('fail');
  });

  it('the column under both moments: the contour below 0.1 f\'c Ag (Bresler 1960 otherwise; common practice)', () => {
    const { Pu } = footingLoad(AT); // 174,270 lb < 0.1·5000·400 = 200,000 lb
    expect(Pu).toBeLessThan(200_000);
    const m = phiMnAt(Pu / 1000);
    near(run.num('phiMn_c1'), m, 1e-4);
    // Mu1/φMn1 + Mu2/φMn2 with half of each slab moment (equal storeys)
    near(run.num('biaxial'), (0.5 * 0.3 * Mo1) / 1000 / m + (0.5 * 0.3 * Mo2) / 1000 / m, 1e-4);
  });
});

describe('what the new checks catch', () => {
  it('a position that the column lines contradict', async () => {
    const run = await runTemplate(FILE, { position: 'edge' }); // line1 = 2: an interior line
    try {
      expect(run.state('position_ok').status).toBe('fail');
    } finally {
      run.dispose();
    }
  });

  it('a slender 14 in column: δ = 1.50 > 1.4 (§6.6.4.5.2, §6.2.5.3)', async () => {
    const run = await runTemplate(FILE, { c1: '14 in', c2: '14 in' });
    try {
      // PD = 528·682.5 + 5·204.2·10 = 370,569 lb; 1.4D = 518,797 lb governs; βdns = 1.0
      // (EI)eff = 0.4·57,000√5000·(14⁴/12)/(1 + 1) = 0.2·4,030,509·3201.33 = 2.5806e9 lb·in² (Eq. 6.6.4.4.4a)
      // Pc = π²·2.5806e9/111² = 2,067,100 lb (Eq. 6.6.4.4.2); δ = 1/(1 − 518,797/(0.75·2,067,100)) = 1.503
      const PD = 528 * 682.5 + 5 * ((196 / 144) * 150) * 10;
      const Pu = 1.4 * PD;
      const Pc = (Math.PI ** 2 * 0.2 * 57000 * sqrtFc * (14 ** 4 / 12)) / 111 ** 2;
      const delta = 1 / (1 - Pu / (0.75 * Pc));
      near(delta, 1.503, 1e-3);
      near(run.num('delta_1'), delta);
      near(run.ratio('second_order_ok'), delta / 1.4);
      expect(run.state('second_order_ok').status).toBe('fail');
    } finally {
      run.dispose();
    }
  });

  it('a 16 in footing leaves too little depth for #7 dowels in compression', async () => {
    const run = await runTemplate(FILE, { h_f: '16 in' });
    try {
      // 16 − 3 − 1.5 − 0.875 = 10.625 in < ℓdc = 16.60 in
      near(run.num('ldc_avail'), 10.625);
      near(run.ratio('dowel_dev_ok'), 16.602 / 10.625, 1e-4);
      expect(run.state('dowel_dev_ok').status).toBe('fail');
    } finally {
      run.dispose();
    }
  });
});
