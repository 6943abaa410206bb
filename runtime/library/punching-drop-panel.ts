// Two-way shear at a drop panel or shear cap (ACI 318-19 §22.6.4.1 and §22.6.4.3 [from memory]):
// one critical section at d/2 from the column face inside the thickening (thickened d),
// and one at d/2 outside the edge of the drop (slab d), around the drop as if it were the column.
// Edge/corner convention as for bo_punch: x1 is the drop size measured from the free edge.

import { LibraryError, defineFunction, type LibFunction, type LibParam } from './types';
import { EDITIONS, edition, lambdaFactor, optional, phiFactor, positive, type Edition } from './support-args';
import { POSITIONS, boPunch, criticalSection, position, type Position } from './punching-perimeter';
import { punchRatio } from './punching-stress';
import { working } from '../working/recorder';

export interface DropPanelCheck {
  inner: number;
  outer: number;
  ratio: number;
  governs: string;
}

/** Both critical sections of a drop panel or shear cap, as demand/capacity vu/(φ vc) (ACI 318-19 §22.6.4.1). */
export function dropPanelCheck(
  reaction: number, qu: number, fc: number,
  c1: number, c2: number, dDrop: number,
  x1: number, x2: number, dSlab: number, pos: Position,
  phi = 0.75, lambda = 1, ed: Edition = '318-19',
): DropPanelCheck {
  positive('x1 (drop panel size)', x1);
  positive('x2 (drop panel size)', x2);
  positive('d (slab)', dSlab);
  if (positive('d (drop)', dDrop) <= dSlab) {
    throw new LibraryError('d at the drop panel must exceed the slab d');
  }
  const s = criticalSection(c1, c2, dDrop, pos);
  // The inner section must lie inside the thickening, or the thickened d does not apply there.
  if (s.b1 > x1 + 1e-12 || s.b2 > x2 + 1e-12) {
    throw new LibraryError(
      'drop panel too small: the section at d/2 from the column face falls outside it; check the slab with vc_punch instead',
    );
  }
  const w = working()?.open('punch_drop', {
    Vu: [reaction, 'kip'], qu: [qu, 'psf'], fc: [fc, 'psi'], c1: [c1, 'in'], c2: [c2, 'in'], d_drop: [dDrop, 'in'],
    x1: [x1, 'in'], x2: [x2, 'in'], d_slab: [dSlab, 'in'], position: pos, phi, lambda, edition: ed,
  }, CLAUSE);
  const inner = punchRatio(reaction, qu, fc, c1, c2, dDrop, pos, phi, lambda, ed);
  w?.result('ratio_inner', 'ratio', inner, '', { note: 'at d/2 from the column face, drop d' });
  const outer = punchRatio(reaction, qu, fc, x1, x2, dSlab, pos, phi, lambda, ed);
  w?.result('ratio_outer', 'ratio', outer, '', { note: 'at d/2 outside the drop, slab d' });
  const governs = inner >= outer
    ? 'section at d/2 from the column face, within the drop (drop d)'
    : 'section at d/2 outside the drop edge (slab d)';
  w?.step('ratio', 'max(ratio_inner, ratio_outer)', Math.max(inner, outer), '', { governs: true, note: `the ${governs} governs`, clause: CLAUSE });
  w?.end(Math.max(inner, outer));
  return { inner, outer, ratio: Math.max(inner, outer), governs };
}

const params: LibParam[] = [
  { name: 'Vu', type: 'N', doc: 'factored column reaction' },
  { name: 'qu', type: 'Pa', doc: 'factored uniform load on the slab' },
  { name: 'fc', type: 'Pa', doc: 'concrete strength' },
  { name: 'c1', type: 'm', doc: 'column side perpendicular to the edge' },
  { name: 'c2', type: 'm', doc: 'column side parallel to the edge' },
  { name: 'd_drop', type: 'm', doc: 'effective depth through the drop panel / shear cap' },
  { name: 'x1', type: 'm', doc: 'drop panel size perpendicular to the edge (from the edge for edge/corner columns)' },
  { name: 'x2', type: 'm', doc: 'drop panel size parallel to the edge' },
  { name: 'd_slab', type: 'm', doc: 'effective depth of the slab outside the drop' },
  { name: 'position', type: 'text', choices: POSITIONS, doc: "'interior', 'edge' or 'corner'" },
  { name: 'phi', type: '1', doc: 'shear strength reduction factor (default 0.75)' },
  { name: 'lambda', type: '1', doc: 'lightweight concrete factor (default 1.0)' },
  { name: 'edition', type: 'text', choices: EDITIONS, doc: "'318-19' (default) or '318-14'" },
];

const run = (pick: (r: DropPanelCheck) => number | string) =>
  (r: number, q: number, fc: number, c1: number, c2: number, dd: number, x1: number, x2: number,
    ds: number, p: string, phi?: number, lambda?: number, ed?: string) =>
    pick(dropPanelCheck(r, q, fc, c1, c2, dd, x1, x2, ds, position(p),
      optional(phi, 0.75, phiFactor), optional(lambda, 1, lambdaFactor), edition(ed)));

const CLAUSE = 'ACI 318-19 §22.6.4.1, Table 22.6.5.2: sections at d/2 from the column face (drop d) and d/2 outside the drop (slab d)';

export const functions: LibFunction[] = [
  defineFunction({
    name: 'bo_drop_outer',
    params: [params[6], params[7], params[8], params[9]],
    returns: 'm',
    clause: 'ACI 318-19 §22.6.4.1: critical section at d/2 outside the drop panel or shear cap',
    doc: 'Perimeter of the critical section outside a drop panel, with the slab d',
    fn: (x1: number, x2: number, d: number, p: string) => boPunch(x1, x2, d, position(p)),
  }),
  defineFunction({
    name: 'punch_drop_ratio',
    params,
    optional: 3,
    returns: '1',
    clause: CLAUSE,
    doc: 'Larger of the two punching demand/capacity ratios at a drop panel or shear cap',
    fn: run((r) => r.ratio),
  }),
  defineFunction({
    name: 'punch_drop_governs',
    params,
    optional: 3,
    returns: 'text',
    clause: CLAUSE,
    doc: 'Which critical section governs at a drop panel, as text for the hand calc',
    fn: run((r) => {
      working()?.step('governs', undefined, r.governs, '', { clause: CLAUSE });
      return r.governs;
    }),
  }),
];
