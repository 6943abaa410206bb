import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { footingChecks, type FootingCheck, type FootingSite } from '../../runtime/building/footing-checks';
import { chooseBars, checkFooting, DEFAULT_STEPS, sizeFooting, type SizingRules } from '../../runtime/building/footing-size';
import { ft, inch, kip, kipFt, ksi, pcf, psf, psi } from '../../runtime/units/si';

// The scenario of the library's worked footing (our own): 18 × 18 in column, f'c,col = 5000 psi,
// D = 200 kip, L = 150 kip; footing f'c = 4000 psi, fy = 60 ksi, base 5 ft below grade, fill
// 100 pcf, 100 psf surcharge, gross allowable pressure 4000 psf, 3 in cover.
const site: FootingSite = {
  qAllow: 4000 * psf, Df: 5 * ft, gammaSoil: 100 * pcf, surcharge: 100 * psf, wc: 150 * pcf,
  fcFooting: 4000 * psi, fcColumn: 5000 * psi, fy: 60 * ksi, cover: 3 * inch, edition: '318-19',
};
const dem = { Pu: 1.2 * 200 * kip + 1.6 * 150 * kip, Ps: 350 * kip, c1: 18 * inch, c2: 18 * inch };
const rules: SizingRules = { ...DEFAULT_STEPS, bars: ['#5', '#6', '#7', '#8', '#9', '#10'] };
const byName = (checks: FootingCheck[], name: string) => checks.find((c) => c.name === name)!;

describe('footing checks of a fixed footing, worked by hand (10.5 ft square, 24 in, 7 #8 each way)', () => {
  const checks = footingChecks(site, dem, { L: 10.5 * ft, B: 10.5 * ft, h: 24 * inch, bar: '#8', nx: 7, ny: 7 });

  it('area: q_net = 4000 − 2·150 − 3·100 − 100 = 3300 psf; A_req = 350/3.3 = 106.06 ft² ≤ 110.25 ft² (ACI 318-19 §13.3.1.1)', () => {
    expect(byName(checks, 'area').demand / (ft * ft)).toBeCloseTo(106.06, 2);
    expect(byName(checks, 'area').ratio).toBeCloseTo(106.06 / 110.25, 3);
  });

  it('two-way shear: Vu = 480 − 4.3537·(38/12)² = 436.34 kip; φVc = 0.75·4·0.8165·63.246·152·20 = 470.95 kip (§22.6, λs)', () => {
    expect(byName(checks, 'two-way shear').demand / kip).toBeCloseTo(436.34, 2);
    expect(byName(checks, 'two-way shear').ratio).toBeCloseTo(0.9265, 3);
  });

  it('flexure both ways: Mu = 4.3537·10.5·4.5²/2 = 462.86 kip-ft; one-way shear fails under 318-19 (§22.5.5.1(c))', () => {
    expect(byName(checks, 'flexure x').demand / kipFt).toBeCloseTo(462.86, 2);
    expect(byName(checks, 'flexure y').demand / kipFt).toBeCloseTo(462.86, 2);
    // Vu = 4.3537·10.5·(54 − 20)/12 = 129.52 kip; ρw = 5.53/(126·20) = 0.0021944, ∛ = 0.12995;
    // vc = 8·0.8165·0.12995·63.246 = 53.68 psi; φVc = 0.75·53.68·126·20 = 101.46 kip → ratio 1.2766
    expect(byName(checks, 'one-way shear x').demand / kip).toBeCloseTo(129.52, 2);
    expect(byName(checks, 'one-way shear x').ratio).toBeCloseTo(129.52 / 101.46, 2);
  });

  it('spacing, development and bearing', () => {
    // 7 bars across 126 in: s = (126 − 2·3 − 1)/6 = 19.83 in > min(2h, 18 in) = 18 in (§8.7.2.2)
    expect(byName(checks, 'bar spacing x').demand / inch).toBeCloseTo(19.833, 3);
    expect(byName(checks, 'bar spacing x').ratio).toBeGreaterThan(1);
    // ℓd = 60000/(20·63.246)·1.0 in = 47.43 in ≤ (126 − 18)/2 − 3 = 51 in (Table 25.4.2.3, from memory)
    expect(byName(checks, 'development x').demand / inch).toBeCloseTo(47.43, 2);
    expect(byName(checks, 'development x').capacity / inch).toBeCloseTo(51, 9);
    // φBn,col = 0.65·0.85·5·324 = 895.05 kip; footing: √(A2/A1) capped at 2 → 1432.08 kip (§22.8.3.2)
    expect(byName(checks, 'bearing on the column').capacity / kip).toBeCloseTo(895.05, 2);
    expect(byName(checks, 'bearing on the footing').capacity / kip).toBeCloseTo(1432.08, 2);
  });
});

describe('sizing the same column', () => {
  const out = sizeFooting(site, dem, rules);

  it('plan from the area in 3 in steps, thickness in 1 in steps, bars chosen; every check passes', () => {
    expect(out.sized).toBe(true);
    if (!out.sized) return;
    // At any h from 24 to 30 in q_net is 3300 … 3275 psf: A_req 106.06 … 106.87 ft², side 123.6 … 124.1 in → 126 in (10.5 ft)
    expect(out.design.B / inch).toBeCloseTo(126, 9);
    expect(out.design.L).toBe(out.design.B);
    // the worked example finds h = 30 in enough for one-way shear under 318-19 with 9 #8; 24 in is not
    expect(out.design.h / inch).toBeGreaterThan(24);
    expect(out.design.h / inch).toBeLessThanOrEqual(30);
    expect(Number.isInteger(Math.round(out.design.h / inch * 1e6) / 1e6)).toBe(true);
    expect(out.ok).toBe(true);
    for (const c of out.checks) expect(c.ratio).toBeLessThanOrEqual(1 + 1e-9);
  });

  it('one step thinner and one step smaller in plan each fail a named check', () => {
    if (!out.sized) throw new Error('not sized');
    const { B, h } = out.design;
    const thinner = chooseBars(site, dem, B, B, h - rules.thicknessStep, rules.bars);
    expect(thinner.ok).toBe(false);
    expect(thinner.governing.name).toMatch(/shear|flexure|depth/);
    const smaller = chooseBars(site, dem, B - rules.planStep, B - rules.planStep, h, rules.bars);
    expect(smaller.ok).toBe(false);
    expect(smaller.governing.name).toBe('area');
  });

  it('a fixed footing is only checked (bars chosen when not given)', () => {
    const r = checkFooting(site, dem, { L: 12 * ft, B: 12 * ft, h: 36 * inch }, rules.bars);
    expect(r.ok).toBe(true);
    expect(r.design.L / ft).toBeCloseTo(12, 9);
    const given = checkFooting(site, dem, { L: 10.5 * ft, B: 10.5 * ft, h: 24 * inch, bar: '#8', nx: 7, ny: 7 }, rules.bars);
    expect(given.ok).toBe(false);
    expect(given.governing.name).toBe('one-way shear x');
  });
});

describe('property: every sized footing is the least in plan, then in thickness', () => {
  it('one step smaller in plan, or in thickness, fails a named check (random loads and soils)', () => {
    const arb = fc.record({
      Ps: fc.integer({ min: 40, max: 600 }),
      uf: fc.double({ min: 1.2, max: 1.6, noNaN: true }),
      c1: fc.integer({ min: 16, max: 30 }),
      c2: fc.integer({ min: 16, max: 30 }),
      q: fc.integer({ min: 1500, max: 8000 }),
      Df: fc.integer({ min: 4, max: 10 }),
      fcf: fc.constantFrom(3000, 4000, 5000),
      ed: fc.constantFrom('318-19' as const, '318-14' as const),
    });
    let refused = 0;
    fc.assert(
      fc.property(arb, (r) => {
        const s: FootingSite = { ...site, qAllow: r.q * psf, Df: r.Df * ft, fcFooting: r.fcf * psi, edition: r.ed };
        const d = { Pu: r.Ps * r.uf * kip, Ps: r.Ps * kip, c1: r.c1 * inch, c2: r.c2 * inch };
        const out = sizeFooting(s, d, rules);
        if (!out.sized) {
          // the only honest refusals: a named check no footing within the base depth passes
          expect(out.reason).toMatch(/passes|shallow|pressure|bearing on the column/);
          refused++;
          return;
        }
        expect(out.ok).toBe(true);
        const { B, h } = out.design;
        const thinner = chooseBars(s, d, B, B, h - rules.thicknessStep, rules.bars);
        expect(thinner.ok, `h − 1 in passes at B = ${B / inch} in, h = ${h / inch} in`).toBe(false);
        expect(thinner.governing.ratio).toBeGreaterThan(1);
        // one step smaller in plan fails at this thickness (and at every other: the search went through them)
        const smaller = chooseBars(s, d, B - rules.planStep, B - rules.planStep, h, rules.bars);
        expect(smaller.ok).toBe(false);
        expect(smaller.governing.name.length).toBeGreaterThan(0);
      }),
      { numRuns: 80 },
    );
    expect(refused).toBeLessThan(10); // most random cases do get a footing
  });
});
