// A column whose concrete is much stronger than the floor's: the axial force passes through a
// layer of weaker slab concrete. ACI 318-19 §15.5.1 (318-14 §15.3.1; numbering from memory): where
// f'c of the column exceeds 1.4 f'c of the floor, either (a) column concrete is placed in the floor
// around the column, 2 ft beyond its faces, full depth, or (b) the column strength through the floor
// is computed with the lower concrete strength (with dowels or spirals as needed). The third
// option for joints confined on four sides is not offered here.

import { defineFunction, type LibFunction } from './types';
import { positive } from './support-args';
import { working } from '../working/recorder';

export interface ColumnThroughFloor {
  ratio: number; // f'c,col / f'c,floor
  needsAction: boolean; // ratio > 1.4
  fcUsed: number; // Pa
}

/** f'c to use for the column where it passes through the floor (ACI 318-19 §15.5.1 (a)/(b)) [from memory]. */
export function columnThroughFloor(fcCol: number, fcFloor: number, puddled = false): ColumnThroughFloor {
  const col = positive("f'c (column)", fcCol);
  const floor = positive("f'c (floor)", fcFloor);
  const ratio = col / floor;
  const needsAction = ratio > 1.4 + 1e-12;
  const fcUsed = needsAction && !puddled ? floor : col;
  const w = working();
  if (w) {
    const vars = { fc_col: [col, 'psi'], fc_floor: [floor, 'psi'] } as const;
    const clause = 'ACI 318-19 §15.5.1 [from memory]';
    w.step('ratio', 'fc_col / fc_floor', ratio, '', { vars, clause });
    w.step('fc', needsAction && !puddled ? 'fc_floor' : 'fc_col', fcUsed, 'psi', {
      vars, clause, governs: needsAction,
      note: !needsAction ? 'ratio ≤ 1.4: the column strength passes' : puddled ? 'column concrete puddled into the floor (a)' : 'ratio > 1.4: the floor strength through the floor (b)',
    });
  }
  return { ratio, needsAction, fcUsed };
}

export const functions: LibFunction[] = [
  defineFunction({
    name: 'fc_col_floor',
    params: [
      { name: 'fc_col', type: 'Pa', doc: 'column concrete strength' },
      { name: 'fc_floor', type: 'Pa', doc: 'floor (slab) concrete strength' },
      { name: 'puddled', type: 'bool', doc: 'column concrete placed in the floor 2 ft around the column, full depth (§15.5.1(a)); default false' },
    ],
    optional: 1,
    returns: 'Pa',
    clause: "ACI 318-19 §15.5.1 (318-14 §15.3.1) [from memory]: f'c,col > 1.4 f'c,floor → (a) column concrete puddled into the floor, or (b) the lower strength through the floor",
    doc: "Concrete strength of the column where it passes through the floor",
    fn: (a: number, b: number, p?: boolean) => columnThroughFloor(a, b, p === undefined ? false : Boolean(p)).fcUsed,
  }),
];
