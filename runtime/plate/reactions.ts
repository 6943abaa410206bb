// Support reactions and the two-way split of the load between the edges.
//
// The upward force a support exerts at a node is f − K u at that node's w DOF. Summed over
// an edge these nodal forces are exactly the integral of the Kirchhoff edge reaction
// V = Q_n + ∂M_nt/∂s over the edge, because the Hermite value functions sum to one along
// it. A corner node also carries the concentrated corner force 2 M_xy (Timoshenko &
// Woinowsky-Krieger §31): half of it comes from the twisting moment ending on each of the
// two edges, so it is split equally when both edges support, and goes wholly to the
// supporting edge when the other is free. Over all edges the shares sum to 1.

import type { DofMap } from './boundary';
import { EDGE_NAMES, supports, type EdgeCode, type EdgeName } from './edges';
import type { PlateElement } from './element';
import { elementDofs, type PlateMesh } from './mesh';

export interface EdgeReaction {
  edge: EdgeName;
  condition: string;
  /** Fraction of the total load reaching this edge (corner forces included). */
  share: number;
  /** Total force on the edge, for q = 1 (divide by the panel area for `share`). */
  total: number;
  /** Distance along the edge of the interior nodes. */
  s: Float64Array;
  /** Line reaction (force per length, upward) at those nodes, for q = 1. */
  line: Float64Array;
}

/** A value at each corner of the panel. */
export interface CornerForces {
  x0y0: number;
  xay0: number;
  x0yb: number;
  xayb: number;
}

export interface Reactions {
  edges: EdgeReaction[];
  /**
   * Kirchhoff corner forces, upward, −2 M_xy·sx·sy with sx, sy the signs of the outward
   * normals (negative: the corner must be held down); zero where the corner is not held.
   */
  corners: CornerForces;
  /** Support force at each corner node: the corner force plus the line reaction of the half
   *  elements beside it, so it tends to `corners` as the mesh refines. Used for the shares. */
  cornerNodes: CornerForces;
}

/** Upward support force at every nodal DOF (zero where the DOF is free, up to round-off). */
function supportForces(mesh: PlateMesh, el: PlateElement, u: Float64Array): Float64Array {
  const r = new Float64Array(u.length);
  const g = new Int32Array(16);
  for (let ey = 0; ey < mesh.ny; ey++) for (let ex = 0; ex < mesh.nx; ex++) {
    elementDofs(mesh, ex, ey, g);
    for (let a = 0; a < 16; a++) {
      let ku = 0;
      for (let b = 0; b < 16; b++) ku += el.K[a * 16 + b] * u[g[b]];
      r[g[a]] += el.f[a] - ku;
    }
  }
  return r;
}

export function edgeReactions(
  mesh: PlateMesh, edges: EdgeCode, dofs: DofMap, el: PlateElement, u: Float64Array, mxy: Float64Array,
): Reactions {
  const r = supportForces(mesh, el, u);
  const { nx, ny, hx, hy } = mesh;
  const held = (ix: number, iy: number) => dofs.eq[mesh.node(ix, iy) * 4] < 0;
  const wAt = (ix: number, iy: number) => (held(ix, iy) ? r[mesh.node(ix, iy) * 4] : 0);
  const kirchhoff = (ix: number, iy: number) => {
    const sx = ix === 0 ? -1 : 1, sy = iy === 0 ? -1 : 1;
    return held(ix, iy) ? -2 * sx * sy * mxy[iy * (nx + 1) + ix] : 0;
  };
  const corners: CornerForces = { x0y0: kirchhoff(0, 0), xay0: kirchhoff(nx, 0), x0yb: kirchhoff(0, ny), xayb: kirchhoff(nx, ny) };
  const nodes: CornerForces = { x0y0: wAt(0, 0), xay0: wAt(nx, 0), x0yb: wAt(0, ny), xayb: wAt(nx, ny) };
  // Each edge: its grid points in order, its spacing, and its two corner forces with the
  // neighbouring edge at each end (code index).
  const lines: [number, number][][] = [
    Array.from({ length: ny + 1 }, (_, i) => [0, i]),
    Array.from({ length: nx + 1 }, (_, i) => [i, 0]),
    Array.from({ length: ny + 1 }, (_, i) => [nx, i]),
    Array.from({ length: nx + 1 }, (_, i) => [i, ny]),
  ];
  const spacing = [hy, hx, hy, hx];
  const ends: [number, number, number, number][] = [
    [nodes.x0y0, 1, nodes.x0yb, 3],
    [nodes.x0y0, 0, nodes.xay0, 2],
    [nodes.xay0, 1, nodes.xayb, 3],
    [nodes.x0yb, 0, nodes.xayb, 2],
  ];
  const area = mesh.a * mesh.b;
  const out: EdgeReaction[] = EDGE_NAMES.map((edge, e) => {
    const pts = lines[e], h = spacing[e];
    const inner = pts.slice(1, -1);
    const s = Float64Array.from(inner, (_, k) => (k + 1) * h);
    const line = Float64Array.from(inner, ([ix, iy]) => wAt(ix, iy) / h);
    let total = 0;
    if (supports(edges[e])) {
      for (const [ix, iy] of inner) total += wAt(ix, iy);
      const [c0, n0, c1, n1] = ends[e];
      total += supports(edges[n0]) ? c0 / 2 : c0;
      total += supports(edges[n1]) ? c1 / 2 : c1;
    }
    return { edge, condition: edges[e], share: total / area, total, s, line };
  });
  return { edges: out, corners, cornerNodes: nodes };
}
