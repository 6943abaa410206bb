// Elastic plate analysis of a rectangular slab panel, for formulas: table-form
// coefficients and the two-way split of the load. Solver in runtime/plate/.
//
// Edge code: 4 letters S (simply supported), C (clamped), F (free) for the edges
// x = 0, y = 0, x = a, y = b, in that order (counter-clockwise from the left edge).
// Coefficients are referred to the side a along x: w = α q a⁴/D, M = β q a².

import { cachedUnitPlate } from '../plate/cache';
import { COEFFICIENT_NAMES, type CoefficientName } from '../plate/coefficients';
import { EDGE_DOC, EDGE_NAMES, edgeIndex, parseEdges } from '../plate/edges';
import { flexuralRigidity } from '../plate/solve';
import { DEFAULT_MESH } from '../plate/unit';
import { defineFunction, LibraryError, type LibFunction } from './types';

export { solvePlate, flexuralRigidity, type PlateInput, type PlateResult } from '../plate/solve';
export { COEFFICIENT_NAMES } from '../plate/coefficients';

const CLAUSE = 'Kirchhoff plate, conforming finite elements (Loadtrace), cf. Timoshenko & Woinowsky-Krieger Tables 8 and 35';

/** Poisson's ratio of the plate tables; pass the material's own (about 0.2 for concrete) to override. */
export const TABLE_NU = 0.3;

function spans(a: number, b: number): number {
  for (const [name, v] of [['a', a], ['b', b]] as const) {
    if (!(v > 0) || !Number.isFinite(v)) throw new LibraryError(`${name} must be a positive length, got ${v}`);
  }
  return b / a;
}

function unitPlate(a: number, b: number, edges: string, nu: number | undefined) {
  return cachedUnitPlate(spans(a, b), parseEdges(edges), nu ?? TABLE_NU, DEFAULT_MESH);
}

export function plateCoef(a: number, b: number, edges: string, what: string, nu?: number): number {
  if (!COEFFICIENT_NAMES.includes(what as CoefficientName)) {
    throw new LibraryError(`plate_coef: "${what}" must be one of ${COEFFICIENT_NAMES.join(', ')}`);
  }
  return unitPlate(a, b, edges, nu).coefficients[what as CoefficientName];
}

export function plateShare(a: number, b: number, edges: string, edge: string, nu?: number): number {
  return unitPlate(a, b, edges, nu).reactions.edges[edgeIndex(edge)].share;
}

export function plateWmax(q: number, a: number, b: number, h: number, E: number, nu: number, edges: string): number {
  if (!(h > 0) || !(E > 0)) throw new LibraryError('plate_wmax: h and E must be positive');
  const alpha = unitPlate(a, b, edges, nu).coefficients.w_max;
  return (alpha * q * a ** 4) / flexuralRigidity(E, h, nu);
}

const spanParams = [
  { name: 'a', type: 'm', doc: 'span along x (the tables take the shorter side)' },
  { name: 'b', type: 'm', doc: 'span along y' },
  { name: 'edges', type: 'text', doc: EDGE_DOC },
];
const nuParam = { name: 'nu', type: '1', doc: `Poisson's ratio (default ${TABLE_NU}, as in the tables)` };

export const functions: LibFunction[] = [
  defineFunction({
    name: 'plate_coef',
    params: [...spanParams, { name: 'what', type: 'text', choices: COEFFICIENT_NAMES, doc: 'w, w_max: α in w = α q a⁴/D; mx, my, mx_max, my_max, mx_edge, my_edge, mxy_max: β in M = β q a²; share_x, share_y: fraction of load to the edges x=0 and x=a / y=0 and y=b' }, nuParam],
    optional: 1,
    returns: '1',
    clause: CLAUSE,
    doc: 'Dimensionless plate coefficient of a rectangular panel under uniform load (centre values unless _max/_edge)',
    fn: plateCoef,
  }),
  defineFunction({
    name: 'plate_share',
    params: [...spanParams, { name: 'edge', type: 'text', choices: EDGE_NAMES, doc: 'x0, y0, xa or yb' }, nuParam],
    optional: 1,
    returns: '1',
    clause: CLAUSE,
    doc: 'Share of the total load q·a·b reaching one edge (corner forces included; free edges carry 0)',
    fn: plateShare,
  }),
  defineFunction({
    name: 'plate_wmax',
    params: [
      { name: 'q', type: 'Pa', doc: 'uniform load' },
      { name: 'a', type: 'm', doc: 'span along x' },
      { name: 'b', type: 'm', doc: 'span along y' },
      { name: 'h', type: 'm', doc: 'thickness' },
      { name: 'E', type: 'Pa', doc: "Young's modulus" },
      { name: 'nu', type: '1', doc: "Poisson's ratio" },
      { name: 'edges', type: 'text', doc: EDGE_DOC },
    ],
    returns: 'm',
    clause: CLAUSE,
    doc: 'Largest elastic deflection of the panel, D = E h³/12(1 − ν²)',
    fn: plateWmax,
  }),
];
