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

  it('spacing, development, dowels', () => {
    // 7 bars across 126 in: s = (126 − 2·3 − 1)/6 = 19.83 in > s_max = min(2h, 18 in, crack control) (§8.7.2.2)
    // crack control, ACI 318-19 Table 24.3.2 (from memory), fs = 2/3·60 = 40 ksi, cc = 3 in:
    // min(15·40000/40000 − 2.5·3, 12·40000/40000) = min(7.5, 12) = 7.5 in
    expect(byName(checks, 'bar spacing x').demand / inch).toBeCloseTo(19.833, 3);
    expect(byName(checks, 'bar spacing x').capacity / inch).toBeCloseTo(7.5, 9);
    // ℓd = 60000/(20·63.246)·1.0 in = 47.43 in ≤ (126 − 18)/2 − 3 = 51 in (Table 25.4.2.3, from memory)
    expect(byName(checks, 'development x').demand / inch).toBeCloseTo(47.43, 2);
    expect(byName(checks, 'development x').capacity / inch).toBeCloseTo(51, 9);
    // dowels not given: their checks wait until they are chosen
    expect(checks.find((c) => c.name === 'dowels')).toBeUndefined();
  });

  it('dowels: bearing φBn = min(column, footing) carries Pu, so 0.005 Ag governs; ℓdc fits in the footing', () => {
    const withDowels = footingChecks(site, dem, { L: 10.5 * ft, B: 10.5 * ft, h: 24 * inch, bar: '#8', nx: 7, ny: 7, dowelBar: '#7', nDowel: 4 });
    // φBn,col = 0.65·0.85·5·324 = 895.05 kip; footing √(A2/A1) capped at 2 → 1432.08 kip (ACI 318-19 Table 22.8.3.2)
    // Pu = 480 kip < 895.05 kip → no excess (§16.3.1.2(a)); As,min = 0.005·324 = 1.62 in² (§16.3.4.1); 4 #7 = 2.40 in²
    expect(byName(withDowels, 'dowels').demand / inch ** 2).toBeCloseTo(1.62, 9);
    expect(byName(withDowels, 'dowels').capacity / inch ** 2).toBeCloseTo(2.4, 9);
    // ℓdc = max(0.02·60000/63.246, 0.0003·60000)·0.875 = max(18.974, 18)·0.875 = 16.60 in (§25.4.9.2, from memory);
    // available 24 − 3 − 2·1.0 − 0.875 = 18.125 in (common practice)
    expect(byName(withDowels, 'dowel embedment').demand / inch).toBeCloseTo(16.602, 2);
    expect(byName(withDowels, 'dowel embedment').capacity / inch).toBeCloseTo(18.125, 9);
    // a heavier column: Pu = 1100 kip → excess 1100 − 895.05 = 204.95 kip → As = 204.95/(0.65·60) = 5.255 in² (§16.3.1.2(a))
    const heavy = footingChecks(site, { ...dem, Pu: 1100 * kip }, { L: 14 * ft, B: 14 * ft, h: 40 * inch, bar: '#8', nx: 7, ny: 7, dowelBar: '#7', nDowel: 4 });
    expect(byName(heavy, 'dowels').demand / inch ** 2).toBeCloseTo(204.95 / 39, 3);
    expect(byName(heavy, 'dowels').ratio).toBeGreaterThan(1);
  });

  it('the steel is tension-controlled, εt ≥ 0.004 (ACI 318-19 §7.3.3.1 as the template applies it)', () => {
    // As = 7·0.79 = 5.53 in², a = 5.53·60/(0.85·4·126) = 0.7745 in, c = a/0.85 = 0.9112 in,
    // εt = 0.003(d − c)/c = 0.003·(20 − 0.9112)/0.9112 = 0.06285 (ACI 318-19 §22.2.2.4.1, β1 = 0.85 Table 22.2.2.4.3)
    expect(byName(checks, 'tension-controlled x').capacity).toBeCloseTo(0.06285, 4);
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
    // Two-way shear sets h (ACI 318-19 §22.6.5.2, λs by §22.5.5.1.3, hand-worked):
    //  h = 23 in: d = 23 − 3 − 1 = 19 in, bo = 4(18 + 19) = 148 in, λs = √(2/(1 + 19/10)) = 0.83045,
    //    vc = 4·0.83045·63.246 = 210.09 psi, φVc = 0.75·210.09·148·19 = 443.07 kip;
    //    Vu = 480 − (480/110.25)·(37/12)² = 480 − 41.39 = 438.61 kip → 0.990, passes
    //  h = 22 in: d = 18, bo = 144, λs = 0.84515, vc = 213.81 psi, φVc = 415.64 kip; Vu = 480 − 4.3537·9 = 440.82 kip → 1.061, fails
    expect(out.design.h / inch).toBeCloseTo(23, 9);
    expect(byName(out.checks, 'two-way shear').ratio).toBeCloseTo(438.61 / 443.07, 3);
    const thinner = chooseBars(site, dem, out.design.L, out.design.B, 22 * inch, rules.bars);
    expect(byName(thinner.checks, 'two-way shear').ratio).toBeCloseTo(440.82 / 415.64, 3);
    // crack control (7.5 in) sets the bars: (126 − 6 − 1)/7.5 = 15.9 → 16 spaces, 17 bars each way
    expect(out.design.nx).toBe(17);
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
    // 7 bars at 19.83 in against 7.5 in (Table 24.3.2): spacing governs, 2.644; one-way shear fails too
    expect(given.governing.name).toBe('bar spacing x');
    expect(given.checks.find((c) => c.name === 'one-way shear x')!.ratio).toBeGreaterThan(1);
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
