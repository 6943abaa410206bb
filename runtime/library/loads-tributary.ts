// Tributary area of a column by the half-bay rule: a column carries the floor out to the
// mid-lines of the bays around it, plus any cantilever overhang beyond an edge column line.
// Overhangs are measured from the column centreline to the slab edge.

import { defineFunction, LibraryError, type LibFunction } from './types';
import { choice, nonNegative, optNonNegative, positive } from './gravity-args';
import { working } from '../working/recorder';

export const POSITIONS = ['interior', 'edge', 'corner'] as const;
const CLAUSE = 'Half-bay rule (common practice)';
export type ColumnPosition = (typeof POSITIONS)[number];

/** Tributary width along one grid line: half of each adjoining span plus an overhang past an edge (half-bay rule, common practice). */
export function tribWidth(spanA: number, spanB: number, overhang = 0): number {
  const a = nonNegative('span_a', spanA);
  const b = nonNegative('span_b', spanB);
  const o = nonNegative('overhang', overhang);
  if (a === 0 && b === 0) throw new LibraryError(`at least one adjoining span must be positive`);
  if (o > 0 && a > 0 && b > 0) {
    throw new LibraryError(`an overhang needs an edge (one adjoining span 0); both spans are given`);
  }
  const width = a / 2 + b / 2 + o;
  working()?.step('w_trib', 'span_a / 2 + span_b / 2 + overhang', width, 'ft', {
    vars: { span_a: [a, 'ft'], span_b: [b, 'ft'], overhang: [o, 'ft'] }, clause: CLAUSE,
  });
  return width;
}

/**
 * Tributary area on a regular grid of bays lx × ly (half-bay rule, common practice).
 * 'edge': the slab edge runs parallel to y, so half a bay in x is missing; cantX is the
 * overhang past that edge. 'corner': both; cantX and cantY the overhangs in x and y.
 */
export function tribArea(lx: number, ly: number, position: ColumnPosition, cantX = 0, cantY = 0): number {
  const x = positive('lx', lx);
  const y = positive('ly', ly);
  const cx = nonNegative('cant_x', cantX);
  const cy = nonNegative('cant_y', cantY);
  const pos = choice('position', position, POSITIONS);
  if (pos === 'interior' && (cx > 0 || cy > 0)) throw new LibraryError(`an interior column has no overhang`);
  if (pos === 'edge' && cy > 0) throw new LibraryError(`an edge column's edge runs along y; give its overhang as cant_x`);
  const [area, expr] = pos === 'interior' ? [x * y, 'lx * ly']
    : pos === 'edge' ? [(x / 2 + cx) * y, '(lx / 2 + cant_x) * ly']
      : [(x / 2 + cx) * (y / 2 + cy), '(lx / 2 + cant_x) * (ly / 2 + cant_y)'];
  working()?.step('AT', expr, area, 'ft^2', {
    vars: { lx: [x, 'ft'], ly: [y, 'ft'], cant_x: [cx, 'ft'], cant_y: [cy, 'ft'] }, clause: CLAUSE, note: `${pos} column`,
  });
  return area;
}

/** Tributary area from the four adjoining spans (0 where the column is on an edge), with optional overhangs (half-bay rule, common practice). */
export function tribAreaSpans(
  xLeft: number, xRight: number, yBelow: number, yAbove: number, cantX = 0, cantY = 0,
): number {
  const w = working();
  const wx = tribWidth(xLeft, xRight, cantX);
  w?.step('w_x', 'w_trib', wx, 'ft');
  const wy = tribWidth(yBelow, yAbove, cantY);
  w?.step('w_y', 'w_trib', wy, 'ft');
  const area = wx * wy;
  w?.step('AT', 'w_x * w_y', area, 'ft^2', { clause: CLAUSE });
  return area;
}


export const functions: LibFunction[] = [
  defineFunction({
    name: 'trib_width',
    params: [
      { name: 'span_a', type: 'm', doc: 'span on one side (0 at an edge)' },
      { name: 'span_b', type: 'm', doc: 'span on the other side (0 at an edge)' },
      { name: 'overhang', type: 'm', doc: 'cantilever past the edge column line' },
    ],
    optional: 1, returns: 'm', clause: CLAUSE,
    doc: 'Tributary width along one grid line: half of each adjoining span + overhang',
    fn: (a: number, b: number, o?: number) => tribWidth(a, b, optNonNegative('overhang', o, 0)),
  }),
  defineFunction({
    name: 'trib_area',
    params: [
      { name: 'lx', type: 'm', doc: 'bay span in x' },
      { name: 'ly', type: 'm', doc: 'bay span in y' },
      { name: 'position', type: 'text', choices: POSITIONS, doc: 'interior, edge (edge parallel to y) or corner' },
      { name: 'cant_x', type: 'm', doc: 'overhang past the edge, x' },
      { name: 'cant_y', type: 'm', doc: 'overhang past the edge, y (corner only)' },
    ],
    optional: 2, returns: 'm^2', clause: CLAUSE,
    doc: 'Tributary area of an interior, edge or corner column on a regular grid',
    fn: (lx: number, ly: number, pos: ColumnPosition, cx?: number, cy?: number) =>
      tribArea(lx, ly, pos, optNonNegative('cant_x', cx, 0), optNonNegative('cant_y', cy, 0)),
  }),
  defineFunction({
    name: 'trib_area_spans',
    params: [
      { name: 'x_left', type: 'm', doc: 'span to the left (0 at an edge)' },
      { name: 'x_right', type: 'm', doc: 'span to the right (0 at an edge)' },
      { name: 'y_below', type: 'm', doc: 'span below (0 at an edge)' },
      { name: 'y_above', type: 'm', doc: 'span above (0 at an edge)' },
      { name: 'cant_x', type: 'm', doc: 'overhang past an edge, x' },
      { name: 'cant_y', type: 'm', doc: 'overhang past an edge, y' },
    ],
    optional: 2, returns: 'm^2', clause: CLAUSE,
    doc: 'Tributary area from unequal adjoining spans and overhangs',
    fn: (xl: number, xr: number, yb: number, ya: number, cx?: number, cy?: number) =>
      tribAreaSpans(xl, xr, yb, ya, optNonNegative('cant_x', cx, 0),
        optNonNegative('cant_y', cy, 0)),
  }),
];
