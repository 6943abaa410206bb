// Critical section for two-way shear at d/2 from the column face (ACI 318-19 §22.6.4.1),
// taken with straight sides around a rectangular column, as the code permits.
// Convention: c1 is the column side perpendicular to the free edge (edge and corner
// columns) and the side in the direction of the moment for moment transfer; c2 the other.
// Edge and corner columns sit flush with the slab edge(s).

import { LibraryError, defineFunction, type LibFunction, type LibParam } from './types';
import { choice, positive } from './support-args';
import { ended, working } from '../working/recorder';

export const POSITIONS = ['interior', 'edge', 'corner'] as const;
export type Position = (typeof POSITIONS)[number];

export function position(v: unknown): Position {
  return choice('position', v, POSITIONS);
}

/** The sides of the critical section: b1 ⟂ edge (or along the moment), b2 the other way. */
export interface CriticalSection {
  b1: number;
  b2: number;
  /** Number of sides of length b1 and of length b2 (interior 2/2, edge 2/1, corner 1/1). */
  n1: number;
  n2: number;
}

/** Critical section dimensions at d/2 from the faces that are not on a free edge (ACI 318-19 §22.6.4.1). */
export function criticalSection(c1: number, c2: number, d: number, pos: Position): CriticalSection {
  positive('c1', c1);
  positive('c2', c2);
  positive('d', d);
  const s = sectionOf(c1, c2, d, pos);
  const w = working();
  if (w) {
    const [e1, e2] = SIDE_TEX[pos];
    const clause = 'ACI 318-19 §22.6.4.1';
    w.step('b1', e1, s.b1, 'in', { vars: { c1: [c1, 'in'], d: [d, 'in'] }, clause, note: `${pos} column` });
    w.step('b2', e2, s.b2, 'in', { vars: { c2: [c2, 'in'], d: [d, 'in'] }, clause });
  }
  return s;
}

/** The sides as the hand calc writes them, by position. */
const SIDE_TEX: Record<Position, [string, string]> = {
  interior: ['c1 + d', 'c2 + d'],
  edge: ['c1 + d / 2', 'c2 + d'],
  corner: ['c1 + d / 2', 'c2 + d / 2'],
};

function sectionOf(c1: number, c2: number, d: number, pos: Position): CriticalSection {
  switch (pos) {
    case 'interior':
      return { b1: c1 + d, b2: c2 + d, n1: 2, n2: 2 };
    case 'edge':
      return { b1: c1 + d / 2, b2: c2 + d, n1: 2, n2: 1 };
    case 'corner':
      return { b1: c1 + d / 2, b2: c2 + d / 2, n1: 1, n2: 1 };
    default:
      throw new LibraryError(`unknown position '${String(pos)}'`);
  }
}

/** Perimeter bo of the critical section (ACI 318-19 §22.6.4.1). */
export function boPunch(c1: number, c2: number, d: number, pos: Position): number {
  const w = working()?.open('bo_punch', { c1: [c1, 'in'], c2: [c2, 'in'], d: [d, 'in'], position: pos }, 'ACI 318-19 §22.6.4.1');
  const s = criticalSection(c1, c2, d, pos);
  const bo = s.n1 * s.b1 + s.n2 * s.b2;
  w?.step('bo', `${s.n1 === 1 ? '' : s.n1 + ' * '}b1 + ${s.n2 === 1 ? '' : s.n2 + ' * '}b2`, bo, 'in', { clause: 'ACI 318-19 §22.6.4.1' });
  return ended(w, bo, 'in');
}

/** Plan area enclosed by the critical section, whose load does not load the section (ACI 318-19 §22.6.4.1). */
export function areaInsidePunch(c1: number, c2: number, d: number, pos: Position): number {
  const w = working()?.open('a_inside_punch', { c1: [c1, 'in'], c2: [c2, 'in'], d: [d, 'in'], position: pos }, 'ACI 318-19 §22.6.4.1');
  const s = criticalSection(c1, c2, d, pos);
  const a = s.b1 * s.b2;
  w?.step('A_inside', 'b1 * b2', a, 'ft^2', { clause: 'ACI 318-19 §22.6.4.1' });
  return ended(w, a, 'ft^2');
}

/** Geometry params shared by every punching function. */
export const geometryParams: LibParam[] = [
  { name: 'c1', type: 'm', doc: 'column side perpendicular to the slab edge (or in the direction of the moment)' },
  { name: 'c2', type: 'm', doc: 'column side parallel to the slab edge' },
  { name: 'd', type: 'm', doc: 'effective depth of the slab' },
  { name: 'position', type: 'text', choices: POSITIONS, doc: "'interior', 'edge' or 'corner'" },
];

/** The side asked for, named again as the function's result. */
function side(v: number, name: 'b1' | 'b2'): number {
  working()?.result(name, name, v, 'in');
  return v;
}

const geo = (f: (c1: number, c2: number, d: number, p: Position) => number) =>
  (c1: number, c2: number, d: number, p: string) => f(c1, c2, d, position(p));

export const functions: LibFunction[] = [
  defineFunction({
    name: 'bo_punch',
    params: geometryParams,
    returns: 'm',
    clause: 'ACI 318-19 §22.6.4.1 (critical section at d/2 from the column face)',
    doc: 'Perimeter of the two-way shear critical section for an interior, edge or corner column',
    fn: geo(boPunch),
  }),
  defineFunction({
    name: 'b1_punch',
    params: geometryParams,
    returns: 'm',
    clause: 'ACI 318-19 §8.4.2.2.2 (b1: critical section side in the direction of the span)',
    doc: 'Critical section side perpendicular to the edge: c1 + d (interior) or c1 + d/2 (edge, corner)',
    fn: geo((c1, c2, d, p) => side(criticalSection(c1, c2, d, p).b1, 'b1')),
  }),
  defineFunction({
    name: 'b2_punch',
    params: geometryParams,
    returns: 'm',
    clause: 'ACI 318-19 §8.4.2.2.2 (b2: critical section side perpendicular to b1)',
    doc: 'Critical section side parallel to the edge: c2 + d (interior, edge) or c2 + d/2 (corner)',
    fn: geo((c1, c2, d, p) => side(criticalSection(c1, c2, d, p).b2, 'b2')),
  }),
  defineFunction({
    name: 'a_inside_punch',
    params: geometryParams,
    returns: 'm^2',
    clause: 'ACI 318-19 §22.6.4.1 (area enclosed by the critical section)',
    doc: 'Plan area inside the critical section; the load on it does not load the section',
    fn: geo(areaInsidePunch),
  }),
];
