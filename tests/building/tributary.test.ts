import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { buildPlan, planIssues, type PlanInput } from '../../runtime/building/plan';
import { slabArea } from '../../runtime/building/slab';
import { tributary } from '../../runtime/building/tributary';
import { ft } from '../../runtime/units/si';
import { lPlan } from './fixtures';

const ft2 = ft * ft;

function areasFt2(input: PlanInput): Record<string, number> {
  const t = tributary(buildPlan(input));
  return Object.fromEntries(t.marks.map((m) => [m.mark, m.area / ft2]));
}

describe('tributary areas by the mid-span rule on an L-shaped plan (hand calculation)', () => {
  // Mid-span rule (half-bay rule, common practice): each column carries the slab out to the
  // mid-span lines, here x = 10, 30, 53 ft and y = 10, 30 ft, plus the overhang at edges.
  const plan = buildPlan(lPlan());

  it('the slab area: two rows of bays pushed out by the overhangs, and the strip at the re-entrant edge', () => {
    // lower row  x −2 … 66, y 0 … 20:  68 × 20 = 1360 ft²
    // upper row  x −2 … 40, y 20 … 43: 42 × 23 =  966 ft²
    // re-entrant edge facing up at y = 20 stands off by the top overhang: x 40 … 66, y 20 … 23: 26 × 3 = 78 ft²
    // total 1360 + 966 + 78 = 2404 ft²
    expect(slabArea(plan) / ft2).toBeCloseTo(2404, 9);
    expect(plan.omitted).toEqual(['2/B']);
  });

  it('each mark, worked by hand', () => {
    const a = areasFt2(lPlan());
    // The omitted column 2/B at (20, 20) would carry x 10 … 30, y 10 … 20 … 30 = 20 × 20 = 400 ft².
    // Its four neighbours 2/A, 1/B, 3/B, 2/C are all 20 ft away, so the bisectors are the
    // diagonals of its square: each neighbour takes two triangles ½·10·10 = 50, i.e. 100 ft².
    expect(a.A1).toBeCloseTo(12 * 10, 9); // corner: x −2 … 10 (2 ft overhang), y 0 … 10
    expect(a.A2).toBeCloseTo(20 * 10 + 100, 9); // edge: x 10 … 30, y 0 … 10, + share of 2/B
    expect(a.A3).toBeCloseTo(23 * 10, 9); // edge: x 30 … 53, y 0 … 10
    expect(a.A4).toBeCloseTo(13 * 10, 9); // corner: x 53 … 66, y 0 … 10
    expect(a.B1).toBeCloseTo(12 * 20 + 100, 9); // edge: x −2 … 10, y 10 … 30, + share of 2/B
    // re-entrant 3/B: x 30 … 53, y 10 … 20 → 230; y 20 … 23 (slab and the strip) → 23 × 3 = 69;
    // y 23 … 30, only x 30 … 40 has slab → 70; + share of 2/B 100 → 469 ft²
    expect(a.B3).toBeCloseTo(230 + 69 + 70 + 100, 9);
    // corner at the end of the short wing: x 53 … 66, y 10 … 20 → 130, and the strip 13 × 3 = 39
    expect(a.B4).toBeCloseTo(130 + 39, 9);
    expect(a.C1).toBeCloseTo(12 * 13, 9); // corner: x −2 … 10, y 30 … 43
    expect(a.C2).toBeCloseTo(20 * 13 + 100, 9); // edge: x 10 … 30, y 30 … 43, + share of 2/B
    expect(a.C3).toBeCloseTo(10 * 13, 9); // corner: x 30 … 40 (no right overhang), y 30 … 43
    // conservation: 120 + 300 + 230 + 130 + 340 + 469 + 169 + 156 + 360 + 130 = 2404
    expect(Object.values(a).reduce((s, v) => s + v, 0)).toBeCloseTo(2404, 9);
  });

  it('an omitted column on unequal spans goes to its neighbours by the mid-span rule between the columns left', () => {
    // Two rows of columns (A, B, 12 ft apart) at x = 0, 10, 16, 30 ft, both at 16 omitted.
    // Mid-span rule with 16 gone: the columns at 10 and 30 meet at (10 + 30)/2 = 20 ft.
    // column at 10: x 5 … 20 = 15 ft × 12 ft = 180 ft²; at 30: x 20 … 30 = 10 × 12 = 120 ft²
    // (top and bottom rows alike: the bay is split at y = 6 ft, so half of each: 90 and 60 ft²)
    const input: PlanInput = {
      xLines: [{ name: '1', spacing: 0 }, { name: '2', spacing: 10 * ft }, { name: '3', spacing: 6 * ft }, { name: '4', spacing: 14 * ft }],
      yLines: [{ name: 'A', spacing: 0 }, { name: 'B', spacing: 12 * ft }],
      overhang: { left: 0, right: 0, bottom: 0, top: 0 },
      noSlab: [],
      marks: ['1', '2', '4'].flatMap((x) => ['A', 'B'].map((y) => ({ mark: `${y}${x}`, x, y }))),
    };
    const a = areasFt2(input);
    expect(a.A2).toBeCloseTo(15 * 6, 9);
    expect(a.A4).toBeCloseTo(10 * 6, 9);
    expect(a.A1).toBeCloseTo(5 * 6, 9);
  });
});

/** A random rectangular grid with random bays without slab, random overhangs and random omitted columns. */
const randomPlan = fc
  .record({
    sx: fc.array(fc.integer({ min: 4, max: 30 }), { minLength: 1, maxLength: 5 }),
    sy: fc.array(fc.integer({ min: 4, max: 30 }), { minLength: 1, maxLength: 5 }),
    over: fc.array(fc.integer({ min: 0, max: 12 }), { minLength: 4, maxLength: 4 }),
    holes: fc.array(fc.boolean(), { minLength: 25, maxLength: 25 }),
    drop: fc.array(fc.boolean(), { minLength: 36, maxLength: 36 }),
  })
  .map(({ sx, sy, over, holes, drop }): PlanInput => {
    const xLines = [{ name: 'x0', spacing: 0 }, ...sx.map((s, k) => ({ name: `x${k + 1}`, spacing: s * ft }))];
    const yLines = [{ name: 'y0', spacing: 0 }, ...sy.map((s, k) => ({ name: `y${k + 1}`, spacing: s * ft }))];
    const noSlab = [];
    for (let i = 0; i < sx.length; i++) {
      for (let j = 0; j < sy.length; j++) {
        // keep bay 0/0 so there is always slab
        if ((i > 0 || j > 0) && holes[i * 5 + j]) noSlab.push({ xFrom: `x${i}`, xTo: `x${i + 1}`, yFrom: `y${j}`, yTo: `y${j + 1}` });
      }
    }
    const marks = [];
    for (let i = 0; i <= sx.length; i++) {
      for (let j = 0; j <= sy.length; j++) if (!(i === 0 && j === 0) && drop[i * 6 + j] === false) marks.push({ mark: `m${i}-${j}`, x: `x${i}`, y: `y${j}` });
    }
    marks.push({ mark: 'm0-0', x: 'x0', y: 'y0' }); // at least one column, beside bay 0/0
    return { xLines, yLines, overhang: { left: over[0] * ft, right: over[1] * ft, bottom: over[2] * ft, top: over[3] * ft }, noSlab, marks };
  });

/** Drop the marks the plan check refuses (no slab beside them); undefined when the slab meets itself at a point. */
function usable(input: PlanInput): PlanInput | undefined {
  const refused = new Set(planIssues(input).filter((i) => i.table === 'marks' && i.row !== undefined).map((i) => i.row! - 1));
  const kept = { ...input, marks: input.marks.filter((_, k) => !refused.has(k)) };
  return planIssues(kept).length === 0 ? kept : undefined;
}

/** Slab area counted on a 1 ft raster (every coordinate here is a whole number of feet). */
function rasterArea(input: PlanInput): number {
  const plan = buildPlan(input);
  const o = plan.overhang;
  const boxes: number[][] = [];
  for (let i = 0; i + 1 < plan.xs.length; i++) {
    for (let j = 0; j + 1 < plan.ys.length; j++) {
      if (plan.slab[i][j]) boxes.push([plan.xs[i] - o.left, plan.xs[i + 1] + o.right, plan.ys[j] - o.bottom, plan.ys[j + 1] + o.top].map((v) => Math.round(v / ft)));
    }
  }
  let n = 0;
  const [x0, x1] = [Math.min(...boxes.map((b) => b[0])), Math.max(...boxes.map((b) => b[1]))];
  const [y0, y1] = [Math.min(...boxes.map((b) => b[2])), Math.max(...boxes.map((b) => b[3]))];
  for (let x = x0; x < x1; x++) {
    for (let y = y0; y < y1; y++) if (boxes.some((b) => x >= b[0] && x + 1 <= b[1] && y >= b[2] && y + 1 <= b[3])) n++;
  }
  return n * ft2;
}

describe('conservation (property): the tributary areas of all marks add up to the slab area', () => {
  it('on random grids with random bays without slab, overhangs and omitted columns', () => {
    fc.assert(
      fc.property(randomPlan, (input) => {
        const ok = usable(input);
        fc.pre(ok !== undefined);
        const plan = buildPlan(ok!);
        const t = tributary(plan);
        const sum = t.marks.reduce((s, m) => s + m.area, 0);
        // the slab area counted independently, on a 1 ft raster of the pushed-out bays
        expect(Math.abs(sum - rasterArea(ok!))).toBeLessThan(1e-9 * sum);
        for (const m of t.marks) expect(m.area).toBeGreaterThanOrEqual(0);
      }),
      { numRuns: 200 },
    );
  });
});
