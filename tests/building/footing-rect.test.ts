import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { footingChecks, type FootingCheck, type FootingSite } from '../../runtime/building/footing-checks';
import { groupFootings, type SizedMark } from '../../runtime/building/footing-group';
import { barsFor, chooseBars, DEFAULT_STEPS, planAt, sizeFooting, type FootingShape, type SizingRules } from '../../runtime/building/footing-size';
import { ft, inch, kip, kipFt, ksi, pcf, psf, psi } from '../../runtime/units/si';

const site: FootingSite = {
  qAllow: 4000 * psf, Df: 5 * ft, gammaSoil: 100 * pcf, surcharge: 100 * psf, wc: 150 * pcf,
  fcFooting: 4000 * psi, fcColumn: 5000 * psi, fy: 60 * ksi, cover: 3 * inch, edition: '318-19',
};
const rules: SizingRules = { ...DEFAULT_STEPS, bars: ['#5', '#6', '#7', '#8', '#9', '#10'] };
const byName = (checks: FootingCheck[], name: string) => {
  const c = checks.find((x) => x.name === name);
  if (!c) throw new Error(`no check "${name}" among ${checks.map((x) => x.name).join(', ')}`);
  return c;
};

describe('a rectangular column on a square footing: both directions at its own side (ACI 318-19 §13.2.7.1–2)', () => {
  // 12 in (c1, along x) × 30 in (c2, along y) column, Pu = 400 kip, footing 10 × 10 ft × 24 in, #6 bars
  // qu = 400/100 = 4 ksf; d = 24 − 3 − 0.75 = 20.25 in = 1.6875 ft
  const dem = { Pu: 400 * kip, Ps: 300 * kip, c1: 12 * inch, c2: 30 * inch };
  const checks = footingChecks(site, dem, { L: 10 * ft, B: 10 * ft, h: 24 * inch, bar: '#6', nx: 16, ny: 16 });

  it('moment at each face (§13.2.7.1): Mu = qu·B·((L − c)/2)²/2', () => {
    // x: (10 − 1)/2 = 4.5 ft → 4·10·4.5²/2 = 405 kip-ft; y: (10 − 2.5)/2 = 3.75 ft → 4·10·3.75²/2 = 281.25 kip-ft
    expect(byName(checks, 'flexure x').demand / kipFt).toBeCloseTo(405, 6);
    expect(byName(checks, 'flexure y').demand / kipFt).toBeCloseTo(281.25, 6);
  });

  it('one-way shear at d from each face (§13.2.7.2, §7.4.3.2): Vu = qu·B·((L − c)/2 − d)', () => {
    // x: 4·10·(4.5 − 1.6875) = 112.5 kip; y: 4·10·(3.75 − 1.6875) = 82.5 kip
    expect(byName(checks, 'one-way shear x').demand / kip).toBeCloseTo(112.5, 6);
    expect(byName(checks, 'one-way shear y').demand / kip).toBeCloseTo(82.5, 6);
  });

  it('two-way shear with β = 30/12 = 2.5 (ACI 318-19 Table 22.6.5.2(b)): vc = (2 + 4/β)λs√f′c governs', () => {
    // λs = √(2/(1 + 20.25/10)) = 0.81312 (§22.5.5.1.3); (2 + 1.6)·0.81312·63.246 = 185.13 psi < 4λs√f′c = 205.70 psi;
    // bo = 2(12 + 20.25) + 2(30 + 20.25) = 165 in; φVc = 0.75·185.13·165·20.25 = 463.93 kip
    // Vu = 400 − 4·(32.25·50.25/144) = 400 − 45.02 = 354.98 kip (§13.2.7.2: the load inside the section off)
    const c = byName(checks, 'two-way shear');
    expect(c.demand / kip).toBeCloseTo(354.98, 1);
    expect(c.capacity / kip).toBeCloseTo(463.93, 0);
  });
});

describe('a rectangular footing: the short-direction steel in a central band (ACI 318-19 §13.3.3.3)', () => {
  // 18 × 18 in column, Pu = 300 kip, footing L = 12 ft (x) × B = 8 ft (y) × 24 in, #6; d = 20.25 in.
  // β = 12/8 = 1.5, γs = 2/(β + 1) = 0.8 (Eq. 13.3.3.3). Short-direction bars: along y, across L = 144 in.
  // Mu,y = (300/96)·12·((8 − 1.5)/2)²/2 = 3.125·12·3.25²/2 = 198.05 kip-ft → As for Mu = 2.19 in²
  // (Whitney block) < As,min = 0.0018·144·24 = 6.2208 in² (§13.3.3.1 → §24.4.3.2, from memory): As = 6.2208 in²
  const dem = { Pu: 300 * kip, Ps: 220 * kip, c1: 18 * inch, c2: 18 * inch };

  it('band steel γs·As = 0.8·6.2208 = 4.977 in²; 12 of 15 #6 in the band = 5.28 in²; the outside bars too far apart', () => {
    const checks = footingChecks(site, dem, { L: 12 * ft, B: 8 * ft, h: 24 * inch, bar: '#6', nx: 14, ny: 15 });
    const band = byName(checks, 'central band y');
    expect(band.demand / inch ** 2).toBeCloseTo(0.8 * 6.2208, 3);
    expect(band.capacity / inch ** 2).toBeCloseTo(12 * 0.44, 9);
    // 3 bars outside: 2 on one side, 1 on the other; that side's strip (144 − 96)/2 − 3 − 0.375 = 20.625 in
    // against s_max = min(2·24, 18, 7.5) = 7.5 in (§8.7.2.2; Table 24.3.2 with fs = 40 ksi, cc = 3 in)
    expect(byName(checks, 'bar spacing y').demand / inch).toBeCloseTo(20.625, 9);
    expect(byName(checks, 'bar spacing y').ratio).toBeGreaterThan(1);
    // the long-direction bars (along x) are uniform across B and have no band check
    expect(checks.some((c) => c.name === 'central band x')).toBe(false);
  });

  it('bars chosen: band ⌈4.977/0.44⌉ = 12 but 96/7.5 → 13 for spacing; outside ⌈(1.244/0.44)⌉ = 3 → 2 a side, 20.625/7.5 → 3 a side: 13 + 6 = 19', () => {
    const f = barsFor(site, dem, 12 * ft, 8 * ft, 24 * inch, '#6')!;
    expect(f.ny).toBe(19);
    expect(f.nBand).toBe(13);
    const checks = footingChecks(site, dem, f);
    expect(byName(checks, 'central band y').ratio).toBeLessThanOrEqual(1);
    expect(byName(checks, 'bar spacing y').ratio).toBeLessThanOrEqual(1);
  });
});

describe('fy limits (ACI 318-19 Table 20.2.2.4(a), from memory: flexure 100 ksi in 318-19, 80 ksi in 318-14)', () => {
  const dem = { Pu: 480 * kip, Ps: 350 * kip, c1: 18 * inch, c2: 18 * inch };
  const f = { L: 10.5 * ft, B: 10.5 * ft, h: 30 * inch, bar: '#8', nx: 17, ny: 17 };
  const phiMn = (fy: number, edition: FootingSite['edition']) => byName(footingChecks({ ...site, fy: fy * ksi, edition }, dem, f), 'flexure x').capacity;

  it('120 ksi bars are taken as 100 ksi in 318-19 and as 80 ksi in 318-14', () => {
    expect(phiMn(120, '318-19')).toBeCloseTo(phiMn(100, '318-19'), 6);
    expect(phiMn(100, '318-19')).toBeGreaterThan(phiMn(80, '318-19') * 1.05);
    expect(phiMn(120, '318-14')).toBeCloseTo(phiMn(80, '318-14'), 6);
  });
});

describe('sizing a rectangular footing', () => {
  const dem = { Pu: 480 * kip, Ps: 350 * kip, c1: 18 * inch, c2: 18 * inch };

  it('L/B held to 1.5: B in 3 in steps, L = 1.5·B rounded up to the step, the least area that holds A_req', () => {
    // A_req = 350/3.3 ≈ 106.06 ft² at h = 24 in (q_net 3300 psf; a little more as h grows): 1.5·B² ≥ 106.06 → B ≥ 8.41 ft
    // → B = 8.5 ft (102 in), L = 12.75 ft (153 in): 108.4 ft²; B = 8.25 ft gives L = 12.375 ft, 102.1 ft² (too small)
    const out = sizeFooting(site, dem, { ...rules, shape: { kind: 'aspect', ratio: 1.5 } });
    expect(out.sized).toBe(true);
    if (!out.sized) return;
    expect(out.design.B / inch).toBeCloseTo(102, 9);
    expect(out.design.L / inch).toBeCloseTo(153, 9);
    expect(out.ok).toBe(true);
  });

  it('B held to 7 ft (a property line): L grows in the step until the area holds', () => {
    // 106.06/7 = 15.15 ft → L = 15.25 ft (183 in) at the thinnest footing; thicker ones need a little more area
    const out = sizeFooting(site, dem, { ...rules, shape: { kind: 'width', B: 7 * ft } });
    expect(out.sized).toBe(true);
    if (!out.sized) return;
    expect(out.design.B / ft).toBeCloseTo(7, 9);
    expect(out.design.L / inch).toBeGreaterThanOrEqual(183);
    expect(out.ok).toBe(true);
    expect(out.design.nBand).toBeDefined(); // the bars along x are the short-direction steel, in a band 7 ft wide
  });
});

const shapes: fc.Arbitrary<FootingShape> = fc.oneof(
  fc.constant<FootingShape>({ kind: 'square' }),
  fc.double({ min: 1, max: 2, noNaN: true }).map((ratio): FootingShape => ({ kind: 'aspect', ratio })),
  fc.integer({ min: 5, max: 9 }).map((B): FootingShape => ({ kind: 'width', B: B * ft })),
);

describe('property: every sized footing, square or rectangular, is the least in plan, then in thickness', () => {
  it('one step smaller in plan, or one step thinner, fails a named check (random loads, soils, columns, shapes)', () => {
    const arb = fc.record({
      Ps: fc.integer({ min: 40, max: 500 }), uf: fc.double({ min: 1.2, max: 1.6, noNaN: true }),
      c1: fc.integer({ min: 12, max: 30 }), c2: fc.integer({ min: 12, max: 30 }),
      q: fc.integer({ min: 2000, max: 8000 }), Df: fc.integer({ min: 4, max: 9 }),
      fcf: fc.constantFrom(3000, 4000, 5000), shape: shapes,
    });
    fc.assert(
      fc.property(arb, (r) => {
        const s: FootingSite = { ...site, qAllow: r.q * psf, Df: r.Df * ft, fcFooting: r.fcf * psi };
        const d = { Pu: r.Ps * r.uf * kip, Ps: r.Ps * kip, c1: r.c1 * inch, c2: r.c2 * inch };
        const sr = { ...rules, shape: r.shape };
        const out = sizeFooting(s, d, sr);
        if (!out.sized) {
          expect(out.reason).toMatch(/passes|shallow|pressure|no wider/);
          return;
        }
        expect(out.ok).toBe(true);
        const { L, B, h } = out.design;
        const thinner = chooseBars(s, d, L, B, h - sr.thicknessStep, sr.bars);
        expect(thinner.ok, `h − 1 in passes at ${L / inch} × ${B / inch} in, h = ${h / inch} in`).toBe(false);
        expect(thinner.governing.name.length).toBeGreaterThan(0);
        // the plan one step back along the shape's sequence fails at this thickness (and every other: the search saw them)
        const k = Math.round((r.shape.kind === 'width' ? L : B) / sr.planStep);
        const prev = planAt(r.shape, k - 1, sr.planStep);
        if (prev.L > 0 && prev.B > 0) {
          const smaller = chooseBars(s, d, prev.L, prev.B, h, sr.bars);
          expect(smaller.ok, `${prev.L / inch} × ${prev.B / inch} in passes`).toBe(false);
          expect(smaller.governing.ratio).toBeGreaterThan(1);
        }
      }),
      { numRuns: 40 },
    );
  });
});

describe('property: grouping rectangular footings never gives a mark a smaller type', () => {
  it('the type is at least the mark along x, along y and in thickness, within the tolerance both ways, named with the prefix', () => {
    const arb = fc.record({
      loads: fc.array(fc.record({ P: fc.integer({ min: 60, max: 400 }), shape: shapes }), { minLength: 1, maxLength: 6 }),
      tol: fc.integer({ min: 0, max: 30 }), prefix: fc.constantFrom('F', 'SF-', 'P'),
    });
    const deep = { ...site, Df: 6 * ft };
    fc.assert(
      fc.property(arb, ({ loads, tol, prefix }) => {
        const marks: SizedMark[] = [];
        loads.forEach(({ P, shape }, k) => {
          const demand = { Pu: 1.4 * P * kip, Ps: P * kip, c1: 20 * inch, c2: 20 * inch };
          const out = sizeFooting(deep, demand, { ...rules, shape });
          if (out.sized) marks.push({ mark: `M${k}`, demand, footing: out.design });
        });
        if (marks.length === 0) return;
        const g = groupFootings(deep, marks, { ...rules, prefix, tolerance: tol * inch });
        for (const m of marks) {
          const t = g.types.find((x) => x.name === g.typeOf.get(m.mark))!;
          expect(t.name.startsWith(prefix)).toBe(true);
          expect(t.design.L).toBeGreaterThanOrEqual(m.footing.L - 1e-12);
          expect(t.design.B).toBeGreaterThanOrEqual(m.footing.B - 1e-12);
          expect(t.design.h).toBeGreaterThanOrEqual(m.footing.h - 1e-12);
          expect(t.design.L - m.footing.L).toBeLessThanOrEqual(tol * inch + 1e-9);
          expect(t.design.B - m.footing.B).toBeLessThanOrEqual(tol * inch + 1e-9);
          if (t.ok) for (const c of t.checks.get(m.mark)!) expect(c.ratio, `${m.mark} on ${t.name}: ${c.name}`).toBeLessThanOrEqual(1 + 1e-9);
        }
      }),
      { numRuns: 12 },
    );
  });
});
