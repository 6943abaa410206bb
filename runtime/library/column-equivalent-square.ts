// A round column taken as the square of equal area where the code permits it: for the critical
// sections of a footing for moment, shear and development (ACI 318-19 §13.2.7.3) and for the clear
// span of the direct design method (§8.10.3.2.1); clause numbers from memory. Not for the punching
// perimeter of a slab, where a circle at d/2 is shorter than the equal square's.

import { defineFunction, type LibFunction } from './types';
import { positive } from './support-args';
import { working } from '../working/recorder';

/** Side of the square with the area of a circle of diameter D: √(π/4)·D = 0.8862 D. */
export function equivalentSquare(dia: number): number {
  const area = (Math.PI * positive('D', dia) ** 2) / 4;
  const c = Math.sqrt(area);
  working()?.step('c', 'sqrt(pi * D^2 / 4)', c, 'in', { vars: { D: [dia, 'in'] }, clause: 'ACI 318-19 §13.2.7.3, §8.10.3.2.1 [from memory]', note: 'the square of equal area' });
  return c;
}

export const functions: LibFunction[] = [
  defineFunction({
    name: 'c_equiv_square',
    params: [{ name: 'D', type: 'm', doc: 'diameter of the round column' }],
    returns: 'm',
    clause: 'ACI 318-19 §13.2.7.3 (footings: moment, shear, development) and §8.10.3.2.1 (DDM clear span): a round column as the square of equal area, side √(π/4)·D [from memory]',
    doc: 'Side of the square column of the same area as a round one',
    fn: equivalentSquare,
  }),
];
