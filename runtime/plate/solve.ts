// Full-field solution of a real panel: the unit solution (unit.ts) scaled to SI.
// w = ŵ q a⁴/D, moments = M̂ q a², line reactions = r̂ q a, forces = F̂ q a².

import { LibraryError } from '../library/types';
import { cachedUnitPlate } from './cache';
import type { PlateCoefficients } from './coefficients';
import { parseEdges } from './edges';
import type { CornerForces, EdgeReaction } from './reactions';
import { extremes, type Extreme } from './recover';
import { DEFAULT_MESH } from './unit';

export interface PlateInput {
  /** Span along x, m. The table coefficients are referred to this side. */
  a: number;
  /** Span along y, m. */
  b: number;
  /** Edge conditions, 4 letters S/C/F for the edges x=0, y=0, x=a, y=b. */
  edges: string;
  /** Uniform load, Pa (positive along w). */
  q: number;
  /** Young's modulus, Pa. */
  E: number;
  /** Poisson's ratio. */
  nu: number;
  /** Thickness, m. */
  h: number;
  /** Elements across the shorter side (default DEFAULT_MESH). */
  n?: number;
}

export interface FieldExtremes {
  max: Extreme;
  min: Extreme;
}

export interface PlateResult {
  input: Required<PlateInput>;
  /** Flexural rigidity E h³ / 12(1 − ν²), N·m. */
  D: number;
  mesh: { nx: number; ny: number; dofs: number; bandwidth: number };
  /** Grid coordinates, m; field value (ix, iy) sits at index iy·(nx+1) + ix. */
  x: Float64Array;
  y: Float64Array;
  /** Deflection, m, positive along the load. */
  w: Float64Array;
  /** Bending moments per unit width, N·m/m, positive sagging; twisting moment Mxy (Timoshenko sign). */
  mx: Float64Array;
  my: Float64Array;
  mxy: Float64Array;
  /** Largest and smallest values, with where they occur (m). */
  extremes: { w: FieldExtremes; mx: FieldExtremes; my: FieldExtremes; mxy: FieldExtremes };
  /** Dimensionless coefficients in the tables' form (w = α q a⁴/D, M = β q a²). */
  coefficients: PlateCoefficients;
  /** Edge reactions in code order x=0, y=0, x=a, y=b: total in N, line in N/m, s in m. */
  edges: EdgeReaction[];
  /** Kirchhoff corner forces, N, upward (negative: hold-down). */
  corners: CornerForces;
  /** q a b, N. */
  totalLoad: number;
}

export function flexuralRigidity(E: number, h: number, nu: number): number {
  return (E * h ** 3) / (12 * (1 - nu * nu));
}

function positive(name: string, v: number): void {
  if (!(v > 0) || !Number.isFinite(v)) throw new LibraryError(`${name} must be a positive number, got ${v}`);
}

export function solvePlate(input: PlateInput): PlateResult {
  const { a, b, q, E, nu, h } = input;
  const n = input.n ?? DEFAULT_MESH;
  positive('a', a);
  positive('b', b);
  positive('E', E);
  positive('h', h);
  if (!Number.isFinite(q)) throw new LibraryError(`q must be a finite number, got ${q}`);
  const code = parseEdges(input.edges);
  const unit = cachedUnitPlate(b / a, code, nu, n);
  const D = flexuralRigidity(E, h, nu);
  const { mesh, fields, reactions } = unit;
  const scale = (v: Float64Array, k: number) => Float64Array.from(v, (t) => t * k);
  const sw = (q * a ** 4) / D, sm = q * a * a;
  const w = scale(fields.w, sw), mx = scale(fields.mx, sm), my = scale(fields.my, sm), mxy = scale(fields.mxy, sm);
  // Extremes located on the unit grid, then scaled (a negative q swaps max and min).
  const ext = (unitField: Float64Array, k: number): FieldExtremes => {
    const e = extremes(mesh, unitField);
    const s = (t: Extreme): Extreme => ({ value: t.value * k, x: t.x * a, y: t.y * a });
    return k >= 0 ? { max: s(e.max), min: s(e.min) } : { max: s(e.min), min: s(e.max) };
  };
  const c = reactions.corners;
  return {
    input: { a, b, edges: code.join(''), q, E, nu, h, n },
    D,
    mesh: { nx: mesh.nx, ny: mesh.ny, dofs: unit.dofs, bandwidth: unit.bandwidth },
    x: Float64Array.from({ length: mesh.nx + 1 }, (_, i) => i * mesh.hx * a),
    y: Float64Array.from({ length: mesh.ny + 1 }, (_, i) => i * mesh.hy * a),
    w, mx, my, mxy,
    extremes: { w: ext(fields.w, sw), mx: ext(fields.mx, sm), my: ext(fields.my, sm), mxy: ext(fields.mxy, sm) },
    coefficients: { ...unit.coefficients },
    edges: reactions.edges.map((e) => ({
      ...e,
      total: e.total * sm,
      s: scale(e.s, a),
      line: scale(e.line, q * a),
    })),
    corners: { x0y0: c.x0y0 * sm, xay0: c.xay0 * sm, x0yb: c.x0yb * sm, xayb: c.xayb * sm },
    totalLoad: q * a * b,
  };
}
