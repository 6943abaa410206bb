import { describe, expect, it } from 'vitest';
import { BuildingInputError } from '../../runtime/building/issues';
import { buildPlan, planIssues, type PlanInput } from '../../runtime/building/plan';
import { ft } from '../../runtime/units/si';
import { lPlan } from './fixtures';

function issues(change: (p: PlanInput) => void) {
  const p = lPlan();
  change(p);
  return planIssues(p);
}

describe('plan input: every problem named at its table, row and column', () => {
  it('the fixture plan has none', () => {
    expect(planIssues(lPlan())).toEqual([]);
  });

  it('grid lines', () => {
    expect(issues((p) => (p.xLines[2].name = '2'))).toContainEqual({ table: 'x-lines', row: 3, column: 'name', message: 'line "2" is already row 2' });
    expect(issues((p) => (p.yLines[1].spacing = 0))).toContainEqual(expect.objectContaining({ table: 'y-lines', row: 2, column: 'spacing', message: 'spacing from line "A" must be greater than 0' }));
    expect(issues((p) => (p.xLines[0].spacing = 3 * ft))).toContainEqual(expect.objectContaining({ table: 'x-lines', row: 1, column: 'spacing' }));
    expect(issues((p) => (p.yLines = [p.yLines[0]]))).toContainEqual({ table: 'y-lines', message: 'give at least two grid lines (there is one)' });
    expect(issues((p) => (p.xLines[1].spacing = Number.NaN))).toContainEqual(expect.objectContaining({ table: 'x-lines', row: 2, column: 'spacing' }));
  });

  it('overhang and bays without slab', () => {
    expect(issues((p) => (p.overhang.top = -1))).toContainEqual(expect.objectContaining({ table: 'overhang', column: 'top' }));
    expect(issues((p) => (p.noSlab[0].yTo = 'Q'))).toContainEqual({ table: 'no-slab', row: 1, column: 'yTo', message: '"Q" is not a y line (y lines: A, B, C)' });
    expect(issues((p) => (p.noSlab[0].xTo = '3'))).toContainEqual(expect.objectContaining({ table: 'no-slab', row: 1, column: 'xTo' }));
    // bays 1–2/A–B and 2–3/B–C left, the others removed: the two meet only at the point 2/B
    const bowTie = issues((p) => {
      p.noSlab = [{ xFrom: '2', xTo: '4', yFrom: 'A', yTo: 'B' }, { xFrom: '1', xTo: '2', yFrom: 'B', yTo: 'C' }, { xFrom: '3', xTo: '4', yFrom: 'B', yTo: 'C' }];
      p.marks = [{ mark: 'A1', x: '1', y: 'A' }];
    });
    expect(bowTie.map((i) => i.message)).toContain('the slab meets itself only at the corner point 2/B; add or remove a bay there');
  });

  it('marks', () => {
    expect(issues((p) => (p.marks[1].mark = 'A1'))).toContainEqual({ table: 'marks', row: 2, column: 'mark', message: 'mark "A1" is already row 1' });
    expect(issues((p) => (p.marks[0].x = '9'))).toContainEqual({ table: 'marks', row: 1, column: 'x', message: '"9" is not a x line (x lines: 1, 2, 3, 4)' });
    expect(issues((p) => p.marks.push({ mark: 'C4', x: '4', y: 'C' }))).toContainEqual(expect.objectContaining({ table: 'marks', row: 11, message: 'no slab bay touches 4/C: the column would carry nothing' }));
    expect(issues((p) => p.marks.push({ mark: 'Z', x: '1', y: 'A' }))).toContainEqual(expect.objectContaining({ table: 'marks', row: 11, message: 'row 1 already has a column at 1/A' }));
    expect(issues((p) => (p.marks = []))).toContainEqual({ table: 'marks', message: 'give at least one column mark' });
  });

  it('buildPlan throws one error carrying all of them, each with its place', () => {
    const p = lPlan();
    p.marks[0].mark = '';
    p.overhang.left = -2;
    let err: unknown;
    try {
      buildPlan(p);
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(BuildingInputError);
    expect((err as BuildingInputError).issues).toHaveLength(2);
    expect((err as Error).message).toContain('marks row 1, column mark: the column has no mark');
    expect((err as Error).message).toContain('overhang column left: overhang must be a length of 0 or more (got -2)');
  });
});
