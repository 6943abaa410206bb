// Small plans for the building tests, in feet (converted to SI here).

import { ft } from '../../runtime/units/si';
import type { MarkAt, PlanInput } from '../../runtime/building/plan';

/**
 * 4 x-lines (1..4 at 0, 20, 40, 66 ft) × 3 y-lines (A..C at 0, 20, 40 ft); overhang 2 ft
 * on the left and 3 ft at the top, none right or bottom; the bay 3–4/B–C has no slab (a
 * re-entrant corner at 3/B); the column at 2/B is omitted; 4/C touches no slab.
 */
export function lPlan(over: Partial<PlanInput['overhang']> = {}): PlanInput {
  const marks: MarkAt[] = [];
  for (const y of ['A', 'B', 'C']) {
    for (const x of ['1', '2', '3', '4']) {
      if ((x === '2' && y === 'B') || (x === '4' && y === 'C')) continue;
      marks.push({ mark: `${y}${x}`, x, y });
    }
  }
  return {
    xLines: [{ name: '1', spacing: 0 }, { name: '2', spacing: 20 * ft }, { name: '3', spacing: 20 * ft }, { name: '4', spacing: 26 * ft }],
    yLines: [{ name: 'A', spacing: 0 }, { name: 'B', spacing: 20 * ft }, { name: 'C', spacing: 20 * ft }],
    overhang: { left: 2 * ft, right: 0, bottom: 0, top: 3 * ft, ...over },
    noSlab: [{ xFrom: '3', xTo: '4', yFrom: 'B', yTo: 'C' }],
    marks,
  };
}
