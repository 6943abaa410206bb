import { describe, expect, it } from 'vitest';
import { computeBuilding, computeMark, prepareBuilding, type BuildingInput } from '../../runtime/building/building';
import { DEFAULT_STEPS } from '../../runtime/building/footing-size';
import { colPu, colPs } from '../../runtime/library/loads-accumulation';
import { ft, inch, kip, ksi, pcf, psf, psi } from '../../runtime/units/si';
import { lPlan } from './fixtures';

const ft2 = ft * ft;

function input(): BuildingInput {
  const p = lPlan();
  const storey = (level: string, live: number) => ({ level, height: 10 * ft, slab: 9 * inch, sdl: 25 * psf, live, occupancy: 'general' as const, reducible: true, snow: 0 });
  return {
    xLines: p.xLines, yLines: p.yLines, overhang: p.overhang, noSlab: p.noSlab,
    columns: p.marks.map((m) => ({ ...m, c1: 20 * inch, c2: 20 * inch, loads: {} })),
    storeys: [{ ...storey('Roof', 20 * psf), sdl: 20 * psf }, storey('L3', 40 * psf), storey('L2', 40 * psf)],
    slabCover: 0.75 * inch, slabBar: '#5',
    site: { qAllow: 3000 * psf, Df: 4.5 * ft, gammaSoil: 120 * pcf, surcharge: 100 * psf, wc: 150 * pcf, fcFooting: 4000 * psi, fcColumn: 5000 * psi, fy: 60 * ksi, cover: 3 * inch, edition: '318-19' },
    rules: { ...DEFAULT_STEPS, bars: ['#5', '#6', '#7', '#8'], prefix: 'F', tolerance: 6 * inch },
  };
}

describe('the whole building, mark by mark', () => {
  const out = computeBuilding(input());
  const byMark = new Map(out.marks.map((m) => [m.mark, m]));

  it('tributary areas (hand-worked in tributary.test.ts) feed the takedown; their sum is the slab', () => {
    expect(byMark.get('B1')!.AT / ft2).toBeCloseTo(340, 9);
    expect(out.marks.reduce((s, m) => s + m.AT, 0) / ft2).toBeCloseTo(2404, 9);
  });

  it('each mark is the single-column chain with its own AT and KLL (col_pu / col_ps of the template)', () => {
    for (const m of out.marks) {
      const c = { floors: 2, AT: m.AT, Dfloor: 0.75 * 150 * psf + 25 * psf, Lfloor: 40 * psf, Droof: 0.75 * 150 * psf + 20 * psf, Lroof: 20 * psf, wCol: (20 * inch) ** 2 * 150 * pcf, hStorey: 10 * ft, KLL: m.kll.KLL };
      expect(m.base.Pu).toBeCloseTo(colPu(c), 6);
      expect(m.base.Ps).toBeCloseTo(colPs(c), 6);
    }
  });

  it('every footing sized, passing, and in a type no smaller than itself', () => {
    for (const m of out.marks) {
      expect(m.footing.sized).toBe(true);
      if (!m.footing.sized) continue;
      const t = out.grouping.types.find((x) => x.marks.includes(m.mark))!;
      expect(t.design.B).toBeGreaterThanOrEqual(m.footing.design.B);
      expect(t.ok).toBe(true);
    }
  });

  it('loads given in the schedule replace the computed ones at the base; an edit to one mark leaves the others as they were', () => {
    const i = input();
    i.columns[0] = { ...i.columns[0], loads: { D: 150 * kip, L: 40 * kip } };
    const b = prepareBuilding(i);
    const a1 = computeMark(b, i.columns[0].mark);
    // 1.2 × 150 + 1.6 × 40 + 0.5 × Lr(20 psf × 120 ft² = 2.4 kip) = 180 + 64 + 1.2 = 245.2 kip (ASCE 7-22 §2.3.1 comb. 2)
    expect(a1.base.Pu / kip).toBeCloseTo(245.2, 6);
    expect(computeMark(b, 'C3').base.Pu).toBeCloseTo(byMark.get('C3')!.base.Pu, 9);
  });
});
