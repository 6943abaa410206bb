import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { FootingSite } from '../../runtime/building/footing-checks';
import { groupFootings, type SizedMark } from '../../runtime/building/footing-group';
import { DEFAULT_STEPS, sizeFooting } from '../../runtime/building/footing-size';
import { ft, inch, kip, ksi, pcf, psf, psi } from '../../runtime/units/si';

const site: FootingSite = {
  qAllow: 4000 * psf, Df: 6 * ft, gammaSoil: 100 * pcf, surcharge: 100 * psf, wc: 150 * pcf,
  fcFooting: 4000 * psi, fcColumn: 5000 * psi, fy: 60 * ksi, cover: 3 * inch, edition: '318-19',
};
const rules = { ...DEFAULT_STEPS, bars: ['#5', '#6', '#7', '#8', '#9'], prefix: 'F', tolerance: 1 * ft };

function sized(mark: string, PsKip: number, c = 20): SizedMark {
  const demand = { Pu: 1.4 * PsKip * kip, Ps: PsKip * kip, c1: c * inch, c2: c * inch };
  const out = sizeFooting(site, demand, rules);
  if (!out.sized) throw new Error(`${mark} not sized: ${out.reason}`);
  return { mark, demand, footing: out.design };
}

describe('footing types', () => {
  it('marks within the tolerance share the larger type; the others open their own; named smallest first', () => {
    const marks = [sized('A1', 150), sized('A2', 160), sized('B2', 400), sized('B3', 420)];
    // sides by the area (q_net ≈ 3.2 ksf): 150 kip → about 6.9 ft, 160 → 7.1 ft, 400 → 11.2 ft, 420 → 11.5 ft
    const g = groupFootings(site, marks, rules);
    expect(g.types.map((t) => t.name)).toEqual(['F1', 'F2']);
    expect(g.typeOf.get('A1')).toBe('F1');
    expect(g.typeOf.get('A2')).toBe('F1');
    expect(g.typeOf.get('B2')).toBe('F2');
    expect(g.types[0].design.B).toBe(marks[1].footing.B); // the larger of the two
    expect(g.types.every((t) => t.ok)).toBe(true);
  });

  it('a tolerance of zero keeps every distinct size its own type', () => {
    const marks = [sized('A1', 150), sized('A2', 300), sized('A3', 450)];
    expect(groupFootings(site, marks, { ...rules, tolerance: 0 }).types).toHaveLength(3);
  });
});

describe('property: grouping never gives a mark a smaller footing', () => {
  it('random loads and tolerances: the type is at least the mark in plan and thickness, within the tolerance in plan, and passes for it', () => {
    const arb = fc.record({
      loads: fc.array(fc.integer({ min: 60, max: 500 }), { minLength: 1, maxLength: 8 }),
      tol: fc.integer({ min: 0, max: 36 }),
    });
    fc.assert(
      fc.property(arb, ({ loads, tol }) => {
        const marks = loads.map((p, k) => sized(`M${k}`, p));
        const g = groupFootings(site, marks, { ...rules, tolerance: tol * inch });
        expect(g.typeOf.size).toBe(marks.length);
        for (const m of marks) {
          const t = g.types.find((x) => x.name === g.typeOf.get(m.mark))!;
          expect(t.design.B).toBeGreaterThanOrEqual(m.footing.B - 1e-12);
          expect(t.design.L).toBeGreaterThanOrEqual(m.footing.L - 1e-12);
          expect(t.design.h).toBeGreaterThanOrEqual(m.footing.h - 1e-12);
          expect(t.design.B - m.footing.B).toBeLessThanOrEqual(tol * inch + 1e-9);
          expect(t.ok).toBe(true);
          for (const c of t.checks.get(m.mark)!) expect(c.ratio, `${m.mark} on ${t.name}: ${c.name}`).toBeLessThanOrEqual(1 + 1e-9);
        }
        // sizes grow with the type number
        for (let k = 1; k < g.types.length; k++) expect(g.types[k].design.B).toBeGreaterThan(g.types[k - 1].design.B);
      }),
      { numRuns: 30 },
    );
  });
});
