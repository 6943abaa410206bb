import { describe, expect, it } from 'vitest';
import { buildPlan, type Plan } from '../../runtime/building/plan';
import { kllClass, planPosition, punchingPosition } from '../../runtime/building/position';
import { ft, inch } from '../../runtime/units/si';
import { lPlan } from './fixtures';

function at(plan: Plan, mark: string) {
  const m = plan.marks.find((k) => k.mark === mark)!;
  return { m, pos: planPosition(plan, m) };
}

describe('position in plan and KLL, ASCE 7-22 Table 4.7-1', () => {
  // Table 4.7-1 (ASCE 7-22; the same rows in IBC Table 1607.11.1 and in Brockenbrough &
  // Merritt, Structural Steel Designer's Handbook, Table 4.4, reproducing ASCE 7-02):
  // interior columns 4; exterior columns without cantilever slabs 4; edge columns with
  // cantilever slabs 3; corner columns with cantilever slabs 2.
  // The plan (fixtures.ts): overhang 2 ft left, 3 ft top, none right or bottom.
  const plan = buildPlan(lPlan());
  const kll = (mark: string) => kllClass(plan, at(plan, mark).pos).KLL;

  it('classes from the four bays around each column', () => {
    expect(at(plan, 'A2').pos).toEqual({ kind: 'edge', free: ['bottom'], open: [] });
    expect(at(plan, 'A1').pos).toEqual({ kind: 'corner', free: ['left', 'bottom'], open: [] });
    expect(at(plan, 'B3').pos).toEqual({ kind: 're-entrant', free: [], open: ['right', 'top'] });
    expect(at(plan, 'B4').pos).toEqual({ kind: 'corner', free: ['right', 'top'], open: [] });
    expect(at(plan, 'C3').pos).toEqual({ kind: 'corner', free: ['right', 'top'], open: [] });
  });

  it('KLL per Table 4.7-1 row', () => {
    expect(kll('A2')).toBe(4); // bottom edge, no overhang: exterior column without cantilever slabs
    expect(kll('A4')).toBe(4); // corner, no overhang right or bottom: exterior without cantilever slabs
    expect(kll('B1')).toBe(3); // left edge, 2 ft overhang: edge column with cantilever slab
    expect(kll('C2')).toBe(3); // top edge, 3 ft overhang: edge column with cantilever slab
    expect(kll('C1')).toBe(2); // corner with overhangs left and top: corner column with cantilever slabs
    // corner with a cantilever on one side only (left 2 ft, bottom 0): taken as corner with
    // cantilever slabs, 2 (common practice: less reduction than 4)
    expect(kll('A1')).toBe(2);
  });

  it('the re-entrant corner column (stated rule, common practice)', () => {
    // Open bay faces right (overhang 0) and top (3 ft): a cantilever into the open bay → 3.
    expect(kll('B3')).toBe(3);
    // No overhang into the open bay: its influence area is its three bays, 20×20 + 26×20 + 20×20
    // = 1320 ft², its tributary area a quarter of each, 100 + 130 + 100 = 330 ft² (before the share
    // of the omitted column): KLL = influence/tributary = 1320 / 330 = 4, the exterior-column row.
    const flat = buildPlan(lPlan({ top: 0 }));
    expect(kllClass(flat, at(flat, 'B3').pos)).toMatchObject({ KLL: 4, element: 'exterior-column' });
  });
});

describe('punching class, ACI 318-19 §22.6.4.1 (section at d/2, bo a minimum; from memory)', () => {
  const plan = buildPlan(lPlan());
  const c = 20 * inch;
  const d = 7 * inch;
  const punch = (p: Plan, mark: string) => punchingPosition(p, at(p, mark).pos, c, c, d);

  it('an overhang too short to close the section: edge', () => {
    // B1, left overhang 24 in from the column centre → edge distance from the face e = 24 − 10 = 14 in.
    // closed: bo = 4(c + d) = 4 × 27 = 108 in; run out to the edge: 2(c + d/2 + e) + (c + d)
    // = 2(20 + 3.5 + 14) + 27 = 102 in < 108 → edge, αs = 30 (Table 22.6.5.2)
    expect(punch(plan, 'B1')).toMatchObject({ position: 'edge', alphaS: 30, openSides: ['left'] });
  });

  it('an overhang that closes the section: interior', () => {
    // C2, top overhang 36 in → e = 36 − 10 = 26 in ≥ c/2 + d = 17 in: the closed section is the shorter
    // (open: 2(20 + 3.5 + 26) + 27 = 126 in > 108 in) → interior, αs = 40
    expect(punch(plan, 'C2')).toMatchObject({ position: 'interior', alphaS: 40, openSides: [] });
  });

  it('a flush edge and a corner', () => {
    // A2: bottom overhang 0, e = 0 < d/2: the section must run out to the edge → edge
    expect(punch(plan, 'A2')).toMatchObject({ position: 'edge', openSides: ['bottom'] });
    // A1: bottom e = 0 must open; left e = 14 in. Open bottom only: sides 23.5 + 23.5 + 27 = 74 in;
    // open both: legs 23.5 (right) + 37.5 (top) = 61 in → corner, αs = 20
    expect(punch(plan, 'A1')).toMatchObject({ position: 'corner', alphaS: 20, openSides: ['left', 'bottom'] });
  });

  it('the re-entrant corner column (stated rule)', () => {
    // B3: the section's corner in the open bay is c/2 + d/2 = 13.5 in right of and above the column
    // centre. The top overhang 36 in ≥ 13.5 in puts slab there → interior.
    expect(punch(plan, 'B3')).toMatchObject({ position: 'interior', alphaS: 40 });
    // With no overhang at the re-entrant edges the corner falls in the open bay → taken as edge
    // (common practice; conservative: three sides 3c + 2d = 74 in < the cut interior section ≥ 3c + 3d = 81 in)
    const flat = buildPlan(lPlan({ top: 0 }));
    expect(punch(flat, 'B3')).toMatchObject({ position: 'edge', alphaS: 30 });
  });

  it('refuses a size that is not positive', () => {
    expect(() => punchingPosition(plan, at(plan, 'A2').pos, 0, c, d)).toThrow(/greater than 0/);
  });
});

it('units: the plan is in metres whatever the engineer typed (20 ft = 6.096 m, exact)', () => {
  expect(buildPlan(lPlan()).xs[1]).toBeCloseTo(20 * ft, 12);
  expect(20 * ft).toBeCloseTo(6.096, 12);
});
