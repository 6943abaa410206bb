// Two-way panel moments by the Direct Design Method with strip steel, run headless and
// checked against a hand calculation (US units). Each table value names its ACI 318-19
// table beside it, and says from memory where it was recalled.

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { calcJson, expectAllPass, expectWellFormed, floorTo, near, phiMnRect, runTemplate, whitneyAs, type Run } from './helpers';

const FILE = 'two-way-ddm.lt';

const l1 = 20, l2 = 18, c = 16; // ft, ft, in
const h = 8, fc = 4000, fy = 60000; // in, psi, psi
// D = 8/12·150 + 20 = 120 psf; L = 40 + 15 = 55 psf (ASCE 7-22 Table 4.3-1 classrooms and
// §4.3.2 partitions, from memory). qu = max(1.4·120 = 168, 1.2·120 + 1.6·55 = 232) = 232 psf
// (ASCE 7-22 §2.3.1; the same factors in ASCE 7-10 §2.3.2).
const D = (h / 12) * 150 + 20;
const L = 40 + 15;
const qu = Math.max(1.4 * D, 1.2 * D + 1.6 * L);
// ℓn = 20 − 16/12 = 18.667 ft (§8.10.3.2.2, CONFIRMED); the other way 16.667 ft.
const ln = l1 - c / 12;
// d of the outer layer = 8 − 0.75 − 0.625/2 = 6.9375 in (#5 = 0.625 in, ASTM A615, CONFIRMED).
const d = h - 0.75 - 0.3125;
// Mo = qu ℓ2 ℓn²/8 = 232·18·18.667²/8 = 181,889 lb·ft (Eq. 8.10.3.2, CONFIRMED).
const Mo = (qu * l2 * ln * ln) / 8;
// Column strip 2·min(0.25·20, 0.25·18) = 9 ft; middle strip 18 − 9 = 9 ft (§8.4.1.5, CONFIRMED).
const bcs = 2 * Math.min(0.25 * l1, 0.25 * l2), bms = l2 - bcs;
const sMax = Math.min(2 * h, 18); // 16 in (§8.7.2.2, from memory)

/** As = max(Whitney, 0.0018 b h) and the #5 spacing rounded down to 0.5 in (common practice). */
function strip(MuLbFt: number, bFt: number): { As: number; s: number; ratio: number } {
  const b = bFt * 12;
  const As = Math.max(whitneyAs(MuLbFt * 12, b, d, fc, fy), 0.0018 * b * h); // Table 8.6.1.1, from memory
  const s = floorTo(Math.min(0.31 / (As / b), sMax), 0.5);
  const ratio = (MuLbFt * 12) / phiMnRect((0.31 / s) * b, b, d, fc, fy);
  return { As, s, ratio };
}

describe('two-way-ddm.lt at its defaults: end span, flat plate without edge beam', () => {
  let run: Run;
  beforeAll(async () => {
    run = await runTemplate(FILE);
  });
  afterAll(() => run.dispose());

  it('computes every cell and passes every check', () => {
    expectAllPass(run);
  });

  it('loads, action, thickness and Mo', () => {
    near(run.num('qu'), qu); // 232 psf
    expect(run.val('action')).toBe('two-way'); // 20/18 = 1.11 ≤ 2
    expect(run.val('panel')).toBe('exterior');
    // Exterior panel without edge beams, fy = 60 ksi: ℓn/30 = 18.667·12/30 = 7.467 in
    // (Table 8.3.1.1, CONFIRMED).
    near(run.num('h_min'), (ln * 12) / 30);
    near(run.num('h_min'), 7.467);
    near(run.num('d'), 6.9375);
    near(run.num('Mo'), Mo / 1000);
    near(run.num('Mo'), 181.9);
  });

  it('moment shares and strip moments', () => {
    // End span, no beams between interior supports, no edge beam: 0.26 / 0.52 / 0.70 Mo
    // (Table 8.10.4.2, from memory; the edge-beam row 0.30/0.50/0.70 is CONFIRMED).
    expect(run.num('k_neg_ext')).toBeCloseTo(0.26, 12);
    expect(run.num('k_pos')).toBeCloseTo(0.52, 12);
    expect(run.num('k_neg_int')).toBeCloseTo(0.7, 12);
    // Flat plate (αf1 = 0, βt = 0): column strip 100 % exterior, 60 % positive, 75 % interior
    // (Tables 8.10.5.1/.2/.5, from memory; corroborated by IS 456 cl. 31.5.5).
    expect(run.num('cs_ext')).toBeCloseTo(1, 12);
    expect(run.num('cs_pos')).toBeCloseTo(0.6, 12);
    expect(run.num('cs_int')).toBeCloseTo(0.75, 12);
    near(run.num('b_cs'), 9);
    near(run.num('Mu_cs_ext'), (1.0 * 0.26 * Mo) / 1000); // 47.29 kip·ft
    expect(run.num('Mu_ms_ext')).toBe(0);
    near(run.num('Mu_cs_pos'), (0.6 * 0.52 * Mo) / 1000); // 56.75
    near(run.num('Mu_ms_pos'), (0.4 * 0.52 * Mo) / 1000); // 37.83
    near(run.num('Mu_cs_int'), (0.75 * 0.7 * Mo) / 1000); // 95.49
    near(run.num('Mu_ms_int'), (0.25 * 0.7 * Mo) / 1000); // 31.83
  });

  it('steel, spacing and strength of each strip', () => {
    const cases: [string, number, number][] = [
      ['cs_ext', 0.26 * Mo, bcs], ['ms_ext', 0, bms],
      ['cs_pos', 0.6 * 0.52 * Mo, bcs], ['ms_pos', 0.4 * 0.52 * Mo, bms],
      ['cs_int', 0.75 * 0.7 * Mo, bcs], ['ms_int', 0.25 * 0.7 * Mo, bms],
    ];
    for (const [key, Mu, b] of cases) {
      const r = strip(Mu, b);
      near(run.num(`As_${key}`), r.As);
      expect(run.num(`s_${key}`)).toBeCloseTo(r.s, 9);
      near(run.ratio(`${key}_ok`), r.ratio);
    }
    // Column strip over the interior support: As = 3.178 in² over 108 in →
    // 0.31·108/3.178 = 10.53 → #5 at 10.5 in; the rest at As,min 0.0018·108·8 = 1.555 in²
    // or their moment, spacing capped at 16 in.
    near(run.num('As_cs_int'), 3.178, 1e-3);
    expect(run.num('s_cs_int')).toBeCloseTo(10.5, 9);
    near(run.num('As_ms_int'), 1.555, 1e-3);
    expect(run.num('s_ms_int')).toBeCloseTo(16, 9);
  });
});

describe('two-way-ddm.lt for an interior span', () => {
  it('uses 0.65 / 0.35 Mo and the interior-panel thickness', async () => {
    const run = await runTemplate(FILE, { span_type: 'interior' });
    expectAllPass(run);
    expect(run.val('panel')).toBe('interior');
    near(run.num('h_min'), (ln * 12) / 33); // 6.788 in (Table 8.3.1.1, CONFIRMED)
    // §8.10.4.1 (CONFIRMED): 0.65 Mo at both supports, 0.35 Mo at midspan.
    near(run.num('Mu_cs_int'), (0.75 * 0.65 * Mo) / 1000); // 88.67 kip·ft
    near(run.num('Mu_cs_ext'), (0.75 * 0.65 * Mo) / 1000);
    near(run.num('Mu_ms_pos'), (0.4 * 0.35 * Mo) / 1000); // 25.46
    const r = strip(0.75 * 0.65 * Mo, bcs);
    expect(run.num('s_cs_int')).toBeCloseTo(r.s, 9); // 11 in
    run.dispose();
  });
});

describe('two-way-ddm.lt with edition = 318-14', () => {
  it('gives the same steel: for Grade 60 both editions take 0.0018 Ag and φ = 0.90 here', async () => {
    const a = await runTemplate(FILE);
    const b = await runTemplate(FILE, { edition: '318-14' });
    expectAllPass(b);
    // 318-14 §7.6.1.1 / Table 8.6.1.1 (from memory): 0.0018·60,000/fy = 0.0018 at fy = 60 ksi.
    near(b.num('As_min'), 0.0018 * 12 * h);
    for (const key of ['cs_ext', 'cs_pos', 'ms_pos', 'cs_int', 'ms_int']) {
      expect(b.num(`As_${key}`)).toBeCloseTo(a.num(`As_${key}`), 9);
      expect(b.num(`s_${key}`)).toBeCloseTo(a.num(`s_${key}`), 9);
      expect(b.ratio(`${key}_ok`)).toBeCloseTo(a.ratio(`${key}_ok`), 9);
    }
    a.dispose();
    b.dispose();
  });
});

describe('two-way-ddm.lt minimum thickness by edition and by panel', () => {
  it('Grade 80 under 318-19 is not refused: ℓn/27 for the exterior panel (318-19 Table 8.3.1.1, from memory)', async () => {
    const run = await runTemplate(FILE, { fy: '80 ksi' });
    try {
      // 80,000 psi row, exterior panel without edge beams: 18.667·12/27 = 8.296 in > h = 8 in, so h_ok fails.
      near(run.num('h_min'), (ln * 12) / 27);
      expect(run.state('h_ok').status).toBe('fail');
      // Nothing else is refused for Grade 80 (every cell computes).
      const errors = run.doc.cells.filter((c) => run.engine.state(c.id)?.status === 'error').map((c) => c.id);
      expect(errors).toEqual([]);
    } finally {
      run.dispose();
    }
  });

  it('Grade 80 under 318-14 is outside its 40–75 ksi table: the thickness cell says so', async () => {
    const run = await runTemplate(FILE, { fy: '80 ksi', edition: '318-14' });
    try {
      expect(run.state('h_min').status).toBe('error');
      expect(run.state('h_min').error?.message).toMatch(/40-75 ksi range of ACI 318-14 Table 8\.3\.1\.1/);
    } finally {
      run.dispose();
    }
  });

  it('an interior span in direction 1 that is an end span in direction 2 is an exterior panel', async () => {
    const run = await runTemplate(FILE, { span_type: 'interior', span_type_2: 'end' });
    try {
      // Table 8.3.1.1: a panel with a discontinuous edge in either direction is exterior: ℓn/30 (no edge beam).
      expect(run.val('panel')).toBe('exterior');
      near(run.num('h_min'), (ln * 12) / 30);
    } finally {
      run.dispose();
    }
  });
});

describe('two-way-ddm.lt one-way shear in the slab at d from the interior column', () => {
  // Wide-beam shear across the panel width ℓ2 at d from the face of the interior support
  // (ACI 318-19 §8.5.3.1.1 and §8.4.3.2, clause numbers from memory). The end span carries
  // more than half its load to the interior support: statics of a span with end moments
  // M_ext and M_int gives V_face = qu ℓ2 ℓn/2 + (M_int − M_ext)/ℓn (common practice), with
  // the Table 8.10.4.2 moments (0.26 and 0.70 Mo, from memory).
  /** ρw of the top steel over the interior support: the #5 strips as spaced by the template. */
  function rhoTop(sCs: number, sMs: number): number {
    return ((0.31 / sCs) * bcs * 12 + (0.31 / sMs) * bms * 12) / (l2 * 12 * d);
  }
  /** φVc = 0.75·8λs(ρw)^(1/3)√f'c·bw·d, λs = 1 for d ≤ 10 in (Table 22.5.5.1(c), §22.5.5.1.3, from memory). */
  const phiVc = (rho: number) => 0.75 * 8 * Math.cbrt(rho) * Math.sqrt(fc) * l2 * 12 * d;

  it("end span: the end moments' difference adds to the interior support's shear", async () => {
    const run = await runTemplate(FILE);
    try {
      // Vu = 232·18·(18.667/2 − 6.9375/12) + (0.70 − 0.26)·181,889/18.667
      //    = 4176·8.7552 + 0.44·9744.1 = 36,562 + 4,287 = 40,849 lb.
      const vu = qu * l2 * (ln / 2 - d / 12) + ((0.7 - 0.26) * Mo) / ln;
      near(run.num('Vu_beam'), vu / 1000);
      near(run.num('Vu_beam'), 40.85, 1e-3);
      // Top steel #5 at 10.5 in (column strip) and 16 in (middle strip) over 9 ft each:
      // (0.31/10.5 + 0.31/16)·108 = 5.281 in² on 216·6.9375 in²: ρw = 0.003524.
      const rho = rhoTop(10.5, 16);
      near(run.num('rho_w_top'), rho);
      // φVc = 0.75·8·0.15219·63.246·216·6.9375 = 86,540 lb; ratio 0.472.
      near(run.ratio('beam_shear_ok'), vu / phiVc(rho));
      expect(run.state('beam_shear_ok').status).toBe('ok');
    } finally {
      run.dispose();
    }
  });

  it("interior span: equal end moments (0.65 Mo each side, §8.10.4.1), so half the span's load", async () => {
    const run = await runTemplate(FILE, { span_type: 'interior' });
    try {
      const vu = qu * l2 * (ln / 2 - d / 12); // 36,562 lb
      near(run.num('Vu_beam'), vu / 1000);
      const r = strip(0.75 * 0.65 * Mo, bcs), m = strip(0.25 * 0.65 * Mo, bms);
      near(run.ratio('beam_shear_ok'), vu / phiVc(rhoTop(r.s, m.s)));
    } finally {
      run.dispose();
    }
  });
});

describe('two-way-ddm.lt as a document', () => {
  it('is well formed, round-trips and runs headless with exit code 0', async () => {
    expectWellFormed(FILE);
    const { code, err } = await calcJson(FILE);
    expect(err).toBe('');
    expect(code).toBe(0);
  });
});
