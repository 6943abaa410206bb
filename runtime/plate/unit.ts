// The dimensionless plate problem: side a = 1 along x, b/a along y, q = 1, D = 1.
// Every result of a real panel is this one scaled (w by q a⁴/D, moments by q a²,
// line reactions by q a), so the coefficients depend only on b/a, ν and the edges.

import { LibraryError } from '../library/types';
import { assemble, expand } from './assemble';
import { SingularMatrixError } from './banded';
import { numberDofs } from './boundary';
import { tableCoefficients, type PlateCoefficients } from './coefficients';
import type { EdgeCode } from './edges';
import { plateElement } from './element';
import { plateMesh, type PlateMesh } from './mesh';
import { edgeReactions, type Reactions } from './reactions';
import { recoverFields, type GridFields } from './recover';

/** Elements across the shorter side by default: under 0.001 % from the series on Table 8 values, ~5 ms (bench/plate.ts). */
export const DEFAULT_MESH = 16;
export const MAX_MESH = 128;
/** Longest panel the grid is built for, as long side / short side. */
export const MAX_RATIO = 10;

export interface UnitPlate {
  ratio: number;
  edges: EdgeCode;
  nu: number;
  n: number;
  mesh: PlateMesh;
  fields: GridFields;
  reactions: Reactions;
  coefficients: PlateCoefficients;
  /** Free DOFs and half-bandwidth of the system solved. */
  dofs: number;
  bandwidth: number;
}

export function checkPlateArgs(ratio: number, nu: number, n: number): void {
  if (!(ratio > 0) || !Number.isFinite(ratio)) throw new LibraryError(`b/a must be positive, got ${ratio}`);
  if (Math.max(ratio, 1 / ratio) > MAX_RATIO) throw new LibraryError(`panel ratio ${ratio} beyond 1:${MAX_RATIO}`);
  if (!(nu >= 0 && nu < 0.5)) throw new LibraryError(`Poisson's ratio must be in [0, 0.5), got ${nu}`);
  if (!Number.isInteger(n) || n < 2 || n > MAX_MESH) throw new LibraryError(`mesh must be an integer 2…${MAX_MESH}, got ${n}`);
}

export function solveUnitPlate(ratio: number, edges: EdgeCode, nu: number, n = DEFAULT_MESH): UnitPlate {
  checkPlateArgs(ratio, nu, n);
  const mesh = plateMesh(1, ratio, n);
  const dofs = numberDofs(mesh, edges);
  const el = plateElement(mesh.hx, mesh.hy, nu);
  const { K, f } = assemble(mesh, dofs, el);
  try {
    K.factor();
  } catch (e) {
    if (e instanceof SingularMatrixError) {
      throw new LibraryError(`edges ${edges.join('')} do not hold the panel (it can move as a rigid body)`);
    }
    throw e;
  }
  const u = expand(dofs, K.solve(f));
  const fields = recoverFields(mesh, u, nu);
  const reactions = edgeReactions(mesh, edges, dofs, el, u, fields.mxy);
  const coefficients = tableCoefficients(mesh, fields, reactions.edges);
  return { ratio, edges, nu, n, mesh, fields, reactions, coefficients, dofs: dofs.size, bandwidth: K.bw };
}
