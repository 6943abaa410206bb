// Moments from the displacement solution, at the grid points.
// The element's own curvatures are only O(h²) accurate and jump across element sides,
// but its nodal values and slopes are far more accurate (nodal superconvergence on a
// uniform grid). So each curvature is read from the quintic that matches w and its slope
// at three neighbouring nodes along the line: centred inside, one-sided at an edge.
// Measured: centre and clamped-edge moments converge like h⁴ (tests/plate/convergence).
// Signs (Timoshenko & Woinowsky-Krieger §10, w positive along the load):
//   Mx = −D (w_xx + ν w_yy), My = −D (w_yy + ν w_xx), Mxy = D (1 − ν) w_xy.

import type { PlateMesh } from './mesh';

/** Nodal fields on the grid, index iy·(nx+1) + ix, for D = 1. */
export interface GridFields {
  w: Float64Array;
  mx: Float64Array;
  my: Float64Array;
  mxy: Float64Array;
}

/**
 * Second derivative at node i of a line of n + 1 nodes with spacing h, from values v and
 * slopes s at nodes i−1, i, i+1 (or the three nearest an end). Weights from the quintic
 * Hermite fit through those six data.
 */
function secondDerivative(v: (i: number) => number, s: (i: number) => number, i: number, n: number, h: number): number {
  if (i === 0) return (-11.5 * v(0) + 8 * v(1) + 3.5 * v(2)) / (h * h) - (6 * s(0) + 8 * s(1) + s(2)) / h;
  if (i === n) return (-11.5 * v(n) + 8 * v(n - 1) + 3.5 * v(n - 2)) / (h * h) + (6 * s(n) + 8 * s(n - 1) + s(n - 2)) / h;
  return (2 * v(i - 1) - 4 * v(i) + 2 * v(i + 1)) / (h * h) + (s(i - 1) - s(i + 1)) / (2 * h);
}

export function recoverFields(mesh: PlateMesh, u: Float64Array, nu: number): GridFields {
  const { nx, ny, hx, hy } = mesh;
  const size = (nx + 1) * (ny + 1);
  const w = new Float64Array(size), mx = new Float64Array(size), my = new Float64Array(size), mxy = new Float64Array(size);
  const dof = (ix: number, iy: number, kind: number) => u[mesh.node(ix, iy) * 4 + kind];
  for (let iy = 0; iy <= ny; iy++) for (let ix = 0; ix <= nx; ix++) {
    const wxx = secondDerivative((i) => dof(i, iy, 0), (i) => dof(i, iy, 1), ix, nx, hx);
    const wyy = secondDerivative((j) => dof(ix, j, 0), (j) => dof(ix, j, 2), iy, ny, hy);
    const p = iy * (nx + 1) + ix;
    w[p] = dof(ix, iy, 0);
    mx[p] = -(wxx + nu * wyy);
    my[p] = -(wyy + nu * wxx);
    mxy[p] = (1 - nu) * dof(ix, iy, 3);
  }
  return { w, mx, my, mxy };
}

export interface Extreme {
  value: number;
  x: number;
  y: number;
}

/** Largest and smallest value of a grid field, with where they occur (first hit wins). */
export function extremes(mesh: PlateMesh, field: Float64Array): { max: Extreme; min: Extreme } {
  let iMax = 0, iMin = 0;
  for (let p = 1; p < field.length; p++) {
    if (field[p] > field[iMax] + 1e-12 * Math.abs(field[iMax])) iMax = p;
    if (field[p] < field[iMin] - 1e-12 * Math.abs(field[iMin])) iMin = p;
  }
  const at = (p: number): Extreme => ({
    value: field[p],
    x: (p % (mesh.nx + 1)) * mesh.hx,
    y: Math.floor(p / (mesh.nx + 1)) * mesh.hy,
  });
  return { max: at(iMax), min: at(iMin) };
}
