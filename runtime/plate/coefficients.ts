// Dimensionless results in the form of the plate tables (Timoshenko & Woinowsky-Krieger,
// Tables 8 and 35): w = α q a⁴/D, Mx = β q a², My = β1 q a², with a the side along x.

import type { EdgeReaction } from './reactions';
import type { GridFields } from './recover';
import type { PlateMesh } from './mesh';

export interface PlateCoefficients {
  /** Centre deflection α: w = α q a⁴ / D. */
  w: number;
  /** Largest deflection anywhere (differs from the centre when an edge is free). */
  w_max: number;
  /** Centre moments β, β1: M = β q a². */
  mx: number;
  my: number;
  /** Largest sagging moments anywhere. */
  mx_max: number;
  my_max: number;
  /** Mx at the mid-points of the edges x = 0 and x = a, the more hogging of the two (clamped edges). */
  mx_edge: number;
  /** My at the mid-points of the edges y = 0 and y = b, the more hogging of the two. */
  my_edge: number;
  /** Largest twisting moment magnitude. */
  mxy_max: number;
  /** Share of the load reaching the edges x = 0 and x = a together (carried along x). */
  share_x: number;
  /** Share reaching the edges y = 0 and y = b (carried along y). */
  share_y: number;
}

export type CoefficientName = keyof PlateCoefficients;

export const COEFFICIENT_NAMES: readonly CoefficientName[] = [
  'w', 'w_max', 'mx', 'my', 'mx_max', 'my_max', 'mx_edge', 'my_edge', 'mxy_max', 'share_x', 'share_y',
];

/** For a unit solution (a = 1, q = 1, D = 1) the grid values are the coefficients. */
export function tableCoefficients(mesh: PlateMesh, f: GridFields, edges: EdgeReaction[]): PlateCoefficients {
  const { nx, ny } = mesh;
  const at = (ix: number, iy: number) => iy * (nx + 1) + ix;
  const c = at(nx / 2, ny / 2);
  const max = (v: Float64Array) => v.reduce((m, x) => Math.max(m, x), -Infinity);
  const maxAbs = (v: Float64Array) => v.reduce((m, x) => Math.max(m, Math.abs(x)), 0);
  return {
    w: f.w[c],
    w_max: max(f.w),
    mx: f.mx[c],
    my: f.my[c],
    mx_max: max(f.mx),
    my_max: max(f.my),
    mx_edge: Math.min(f.mx[at(0, ny / 2)], f.mx[at(nx, ny / 2)]),
    my_edge: Math.min(f.my[at(nx / 2, 0)], f.my[at(nx / 2, ny)]),
    mxy_max: maxAbs(f.mxy),
    share_x: edges[0].share + edges[2].share,
    share_y: edges[1].share + edges[3].share,
  };
}
