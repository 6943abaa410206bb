// Each intermediate the working displays, against a value worked by hand here, with the
// arithmetic written out and the source of the formula named beside it.
import { describe, expect, it } from 'vitest';
import { libraryFunctions } from '../../runtime/library/index';
import type { LibValue } from '../../runtime/library/types';
import { workingOf, type Working } from '../../runtime/working/run';
import type { Entry, Group, Step } from '../../runtime/working/recorder';
import { unitInfo } from '../../runtime/units/dimension';
import { ft, inch, kip, kipFt, ksi, psf, psi } from '../../runtime/units/si';

const fn = (name: string) => libraryFunctions.find((f) => f.name === name)!;

function run(name: string, ...args: LibValue[]): Working {
  const w = workingOf(fn(name), args);
  expect(w.error).toBeUndefined();
  return w;
}

function steps(g: Group, out: Step[] = []): Step[] {
  for (const e of g.entries as Entry[]) {
    if (e.kind === 'step') out.push(e);
    else if (e.kind === 'group') steps(e, out);
  }
  return out;
}

/** Every value shown for `symbol`, in the unit the working shows it in (US customary). */
function shown(w: Working, symbol: string): LibValue[] {
  return steps(w.root).filter((s) => s.symbol === symbol).map((s) =>
    typeof s.value === 'number' && s.unit ? s.value / unitInfo(s.unit).factor : s.value);
}

/** The one value shown for `symbol`, to 4 significant figures of the hand calc. */
function one(w: Working, symbol: string): number {
  const v = shown(w, symbol);
  expect(v.length, symbol).toBeGreaterThan(0);
  return v[v.length - 1] as number;
}

const close = (actual: number, expected: number, rel = 5e-4) =>
  expect(Math.abs(actual / expected - 1), `${actual} vs ${expected}`).toBeLessThan(rel);

const governing = (w: Working) => steps(w.root).filter((s) => s.governs).map((s) => s.symbol);

describe('two-way shear, ACI 318-19 §22.6.4.1 and Table 22.6.5.2', () => {
  it('20 × 20 in interior column, d = 7.5 in, 5000 psi: the three expressions, (a) governs', () => {
    const w = run('vc_punch', 5000 * psi, 20 * inch, 20 * inch, 7.5 * inch, 'interior');
    close(one(w, 'b1'), 27.5); // c1 + d = 20 + 7.5 (§22.6.4.1: d/2 each side)
    close(one(w, 'bo'), 110); // 2(27.5) + 2(27.5)
    expect(one(w, 'lambda_s')).toBe(1); // √(2/(1 + 7.5/10)) = 1.069 → ≤ 1.0 (§22.5.5.1.3)
    close(one(w, 'sqrt_fc'), 70.71); // √5000
    expect(one(w, 'beta')).toBe(1); // 20/20
    expect(one(w, 'alpha_s')).toBe(40); // interior (Table 22.6.5.2)
    close(one(w, 'vc_a'), 282.8); // 4 · 1 · 1 · 70.71
    close(one(w, 'vc_b'), 424.3); // (2 + 4/1) · 70.71
    close(one(w, 'vc_c'), 334.3); // (2 + 40 · 7.5/110) · 70.71 = 4.727 · 70.71
    close(one(w, 'vc'), 282.8); // least of the three
    expect(governing(w)).toEqual(['vc_a']);
  });

  it("f'c = 12,000 psi: √f'c capped at 100 psi (§22.6.3.1), λs below 1 at d = 12 in, (b) governs for a 30 × 12 in column", () => {
    const w = run('vc_punch', 12000 * psi, 30 * inch, 12 * inch, 12 * inch, 'interior');
    close(one(w, 'sqrt_fc'), 100); // √12000 = 109.5 > 100
    expect(governing(w)).toContain('sqrt_fc');
    close(one(w, 'lambda_s'), 0.9535); // √(2/(1 + 12/10)) = √0.9091 (§22.5.5.1.3)
    close(one(w, 'beta'), 2.5); // 30/12
    close(one(w, 'bo'), 132); // 2(30 + 12) + 2(12 + 12)
    close(one(w, 'vc_a'), 381.4); // 4 · 0.9535 · 100
    close(one(w, 'vc_b'), 343.3); // (2 + 4/2.5) · 0.9535 · 100 = 3.6 · 95.35
    close(one(w, 'vc_c'), 537.4); // (2 + 40 · 12/132) · 95.35 = 5.636 · 95.35
    expect(governing(w)).toContain('vc_b');
    close(one(w, 'vc'), 343.3);
  });

  it('slab: the load inside the critical section is subtracted (§22.6.4.1)', () => {
    const w = run('vu_punch', 120 * kip, 250 * psf, 20 * inch, 20 * inch, 7.5 * inch, 'interior');
    close(one(w, 'A_inside'), 5.2517); // 27.5² = 756.25 in² = 5.2517 ft²
    close(one(w, 'Vu'), 118.687); // 120 − 0.250 ksf · 5.2517 ft²
  });

  it('footing: Vu = Pu − qu(c1 + d)(c2 + d) (§22.6.4.1)', () => {
    const w = run('vu_punch_footing', 600 * kip, 10 * ft, 10 * ft, 18 * inch, 18 * inch, 20 * inch);
    close(one(w, 'q_u'), 6000); // 600 kip / (10 ft · 10 ft) = 6 ksf (§13.2.6.1)
    close(one(w, 'A_inside'), 10.028); // (18 + 20)² = 1444 in² = 10.028 ft²
    close(one(w, 'Vu'), 539.83); // 600 − 6 · 10.028
  });
});

describe('live load reduction, ASCE 7-22 §4.7.2 and Eq. 4.7-1', () => {
  it('4 floors of 528 ft², KLL = 4, Lo = 40 psf: the factor 0.4132 stands above the 0.40 limit', () => {
    const w = run('live_reduced', 40 * psf, 4 * 528 * ft * ft, 4, 4);
    close(one(w, 'KLL_AT'), 8448); // 4 · 2112 ft²
    const [eq, limited] = shown(w, 'L_Lo') as number[];
    close(eq, 0.41320); // 0.25 + 15/√8448 = 0.25 + 15/91.91
    close(limited, 0.41320); // not below 0.40 (two or more floors)
    close(one(w, 'L'), 16.528); // 40 · 0.4132
    expect(governing(w)).toEqual([]);
  });

  it('one floor: the 0.50 limit governs (KLL·AT = 8000 ft², Eq. 4.7-1 gives 0.4177)', () => {
    const w = run('live_reduced', 50 * psf, 2000 * ft * ft, 4, 1);
    const [eq, limited] = shown(w, 'L_Lo') as number[];
    close(eq, 0.41771); // 0.25 + 15/√8000 = 0.25 + 15/89.44
    expect(limited).toBe(0.5);
    expect(governing(w)).toEqual(['L_Lo']);
    close(one(w, 'L'), 25); // 50 · 0.50
  });

  it('two or more floors: the 0.40 limit governs (KLL·AT = 40,000 ft², Eq. 4.7-1 gives 0.325)', () => {
    const w = run('live_reduced', 50 * psf, 10000 * ft * ft, 4, 3);
    close((shown(w, 'L_Lo') as number[])[0], 0.325); // 0.25 + 15/200
    close(one(w, 'L_Lo'), 0.4);
    close(one(w, 'L'), 20); // 50 · 0.40
  });
});

describe('steel from moment, ACI 318-19 §22.2.2.4 (Whitney block, φ = 0.90)', () => {
  it('Mu = 30 kip·ft on a 12 in strip, d = 6 in, h = 7.5 in, 4000/60,000 psi: the steel for Mu governs', () => {
    const w = run('as_slab', 30 * kipFt, 12 * inch, 6 * inch, 7.5 * inch, 4000 * psi, 60 * ksi);
    close(one(w, 'R_n'), 925.93); // 30 · 12,000 lb·in / (0.9 · 12 · 6²) = 360,000/388.8
    close(one(w, 'rho'), 0.018429); // 0.85 · 4000/60,000 · (1 − √(1 − 2 · 925.93/3400)) = 0.05667 · 0.32521
    close(one(w, 'As_req'), 1.3269); // 0.018429 · 12 · 6
    close(one(w, 'As_min'), 0.162); // 0.0018 · 12 · 7.5 (Table 8.6.1.1)
    close(one(w, 'As'), 1.3269);
    const last = steps(w.root).at(-1)!;
    expect(last.note).toMatch(/steel for Mu governs/);
  });

  it('Mu = 2 kip·ft: the minimum steel governs', () => {
    const w = run('as_slab', 2 * kipFt, 12 * inch, 6 * inch, 7.5 * inch, 4000 * psi, 60 * ksi);
    close(one(w, 'R_n'), 61.728); // 24,000/388.8
    close(one(w, 'As'), 0.162);
    expect(steps(w.root).at(-1)!.note).toMatch(/minimum steel governs/);
  });
});

describe('other functions, each intermediate by hand', () => {
  it('β1 at 5000 psi = 0.85 − 0.05(5000 − 4000)/1000 = 0.80 (ACI 318-19 Table 22.2.2.4.3)', () => {
    close(one(run('beta1', 5000 * psi), 'beta1'), 0.8);
  });

  it('λs at d = 20 in = √(2/(1 + 2)) = 0.8165 (ACI 318-19 §22.5.5.1.3)', () => {
    close(one(run('lambda_s', 20 * inch), 'lambda_s'), 0.8165);
  });

  it('strength combinations for D = 100, L = 50 psf: 140, 200, 170 psf, combination 2 governs (ASCE 7-22 §2.3.1)', () => {
    const w = run('combo_u', 100 * psf, 50 * psf);
    close(one(w, 'U1'), 140); // 1.4 · 100
    close(one(w, 'U2'), 200); // 1.2 · 100 + 1.6 · 50
    close(one(w, 'U3'), 170); // 1.2 · 100 + 0 + 50
    close(one(w, 'U'), 200);
    expect(steps(w.root).at(-1)!.note).toMatch(/combination 2/);
  });

  it('bearing, A1 = 18 × 18 in, A2 = 6400 in², 4000 psi: √(A2/A1) = 4.44 capped at 2, Bn = 2203 kip (ACI 318-19 Table 22.8.3.2, from memory)', () => {
    const w = run('bn_bearing', 4000 * psi, 324 * inch * inch, 6400 * inch * inch);
    close(one(w, 'k_A'), 2);
    close(one(w, 'Bn'), 2203.2); // 0.85 · 4 ksi · 324 in² · 2
  });

  it('ℓd of a #6 bottom bar, 60,000/4000 psi: 60,000/(25 · √4000) · 0.75 in = 28.46 in (ACI 318-19 Table 25.4.2.3, from memory)', () => {
    const w = run('ld_bottom', 0.75 * inch, 60 * ksi, 4000 * psi);
    expect(one(w, 'K')).toBe(25); // No. 6 and smaller, spacing and cover met
    close(one(w, 'sqrt_fc'), 63.246);
    close(one(w, 'l_d'), 28.46); // 60,000/1581.1 · 0.75
  });

  it('two-way minimum thickness, ℓn = 20 ft, exterior panel, Grade 60: ℓn/30 = 8 in (ACI 318-19 Table 8.3.1.1)', () => {
    const w = run('h_min_two_way', 20 * ft, 'exterior', false, 60 * ksi);
    close(one(w, 'h_table'), 8); // 240 in / 30
    close(one(w, 'h_min'), 8); // above the 5 in absolute minimum
  });

  it('factored footing moment at the face, Pu = 600 kip on 10 × 10 ft, c = 18 in: 6 ksf · 10 · 4.25²/2 = 541.9 kip·ft (ACI 318-19 §13.2.7.1)', () => {
    const w = run('mu_footing', 600 * kip, 10 * ft, 10 * ft, 18 * inch);
    close(one(w, 'l_cant'), 4.25); // (10 − 1.5)/2
    close(one(w, 'Mu'), 541.875);
  });
});

describe('punching with moments about both axes, ACI 318-19 §22.6.4.1, R8.4.4.2.3 and Eq. 8.4.2.2.2 (from memory)', () => {
  it('corner column 20 × 20 in, d = 8 in, Vu = 40 kip, Msc1 = 30 and Msc2 = 20 kip·ft: vu = 104.2 + 35.9 + 23.9 = 164.0 psi', () => {
    const w = run('vu_punch_biaxial', 40 * kip, 30 * kipFt, 20 * kipFt, 20 * inch, 20 * inch, 8 * inch, 'corner');
    close(one(w, 'bo'), 48); // b1 + b2 = (20 + 4) + (20 + 4)
    close(one(w, 'v_direct'), 104.17); // 40,000/(48 · 8)
    close(one(w, 'c_AB'), 6); // b1·d·(b1/2)/A_c = 24 · 8 · 12/384
    close(one(w, 'J_c'), 24064); // 8·24³/12 + 24·8³/12 + 24·8·(12 − 6)² + 24·8·6² = 9216 + 1024 + 6912 + 6912
    close(one(w, 'gamma_v'), 0.4); // 1 − 1/(1 + (2/3)√(24/24))
    close(one(w, 'v_M1'), 35.904); // 0.4 · 360,000 lb·in · 6/24,064
    close(one(w, 'J_c2'), 24064); // square: the same section with c1 and c2 exchanged
    close(one(w, 'v_M2'), 23.936); // 0.4 · 240,000 · 6/24,064
    close(one(w, 'v_u'), 164.007); // the three added at the section's inner corner (common practice)
  });

  it('edge column 20 × 20 in, d = 8 in: about the axis along direction 1 the three sides give Jc2 = 91,093 in⁴, c = 14 in, γv2 = 0.4186', () => {
    const w = run('vu_punch_biaxial', 40 * kip, 30 * kipFt, 20 * kipFt, 20 * inch, 20 * inch, 8 * inch, 'edge');
    close(one(w, 'bo'), 76); // 2 · 24 + 28
    // d·b2³/12 + b2·d³/12 + 2·b1·d·(b2/2)² = 8·28³/12 + 28·8³/12 + 2·24·8·14² = 14,634.7 + 1,194.7 + 75,264
    close(one(w, 'J_c2'), 91093.33);
    close(one(w, 'c_2'), 14); // b2/2
    close(one(w, 'gamma_v2'), 0.41863); // 1 − 1/(1 + (2/3)√(28/24))
  });

  it('effective slab width and frame width (ACI 318-19 §8.4.2.2.3 and §8.4.1.2; edge frame common practice)', () => {
    close(one(run('b_slab_transfer', 20 * inch, 10 * inch, 'edge'), 'b_slab'), 50); // 20 + 2 · 1.5 · 10
    close(one(run('b_slab_transfer', 20 * inch, 10 * inch, 'corner'), 'b_slab'), 35); // 20 + 1.5 · 10
    close(one(run('frame_width', 22 * ft, 20 * inch, 'corner'), 'b_frame'), 11.8333); // 22/2 + 20/24 ft
  });
});
