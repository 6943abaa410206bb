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
import { working } from '../working/recorder';

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

/**
 * The plate solver's working is too long to list: the method with its reference, the panel's
 * proportion, and a map of the field the result belongs to.
 */
function method(a: number, b: number, edges: string, nu: number | undefined, field: string): void {
  const w = working();
  if (!w) return;
  w.method(`Kirchhoff plate on a unit panel b/a, conforming rectangular elements on a ${DEFAULT_MESH} × ${DEFAULT_MESH} mesh, ` +
    `banded Cholesky; coefficients read off the solution; edges ${parseEdges(edges).join('')} (x = 0, y = 0, x = a, y = b), ν = ${nu ?? TABLE_NU}`,
  'Timoshenko & Woinowsky-Krieger, Theory of Plates and Shells, Tables 8 and 35 (checked in tests/plate)');
  w.step('b_a', 'b / a', b / a, '', { vars: { a: [a, 'ft'], b: [b, 'ft'] } });
  w.figure('plate_map', [a, b, edges, field]);
}

const FIELD_OF: Record<string, string> = { w: 'w', w_max: 'w', mx: 'mx', my: 'my', mx_max: 'mx', my_max: 'my', mx_edge: 'mx', my_edge: 'my', mxy_max: 'mxy' };

export function plateCoef(a: number, b: number, edges: string, what: string, nu?: number): number {
  if (!COEFFICIENT_NAMES.includes(what as CoefficientName)) {
    throw new LibraryError(`plate_coef: "${what}" must be one of ${COEFFICIENT_NAMES.join(', ')}`);
  }
  const v = unitPlate(a, b, edges, nu).coefficients[what as CoefficientName];
  method(a, b, edges, nu, FIELD_OF[what] ?? 'w');
  working()?.lookup(`coef_${what}`, v, '', what.startsWith('w') ? 'α in w = α q a⁴/D' : what.startsWith('share') ? 'share of q·a·b' : 'β in M = β q a²', CLAUSE);
  return v;
}

export function plateShare(a: number, b: number, edges: string, edge: string, nu?: number): number {
  const v = unitPlate(a, b, edges, nu).reactions.edges[edgeIndex(edge)].share;
  method(a, b, edges, nu, 'w');
  working()?.lookup(`share_${edge}`, v, '', `share of q·a·b to edge ${edge} (corner forces included)`, CLAUSE);
  return v;
}

export function plateWmax(q: number, a: number, b: number, h: number, E: number, nu: number, edges: string): number {
  if (!(h > 0) || !(E > 0)) throw new LibraryError('plate_wmax: h and E must be positive');
  const alpha = unitPlate(a, b, edges, nu).coefficients.w_max;
  const D = flexuralRigidity(E, h, nu);
  const wmax = (alpha * q * a ** 4) / D;
  const w = working();
  if (w) {
    method(a, b, edges, nu, 'w');
    w.lookup('alpha', alpha, '', 'α in w = α q a⁴/D, largest over the panel', CLAUSE);
    const vars = { q: [q, 'psf'], a: [a, 'ft'], E: [E, 'ksi'], h: [h, 'in'], nu } as const;
    w.step('D', 'E * h^3 / (12 * (1 - nu^2))', D, 'kip*in', { vars, note: 'flexural rigidity per unit width' });
    w.step('w_max', 'alpha * q * a^4 / D', wmax, 'in', { vars });
  }
  return wmax;
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
