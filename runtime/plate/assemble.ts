// Assembly of the global bending operator and load over the free DOFs (D = 1, q = 1).

import { BandedSpd } from './banded';
import type { DofMap } from './boundary';
import type { PlateElement } from './element';
import { elementDofs, type PlateMesh } from './mesh';

export interface Assembled {
  K: BandedSpd;
  f: Float64Array;
}

/** Half-bandwidth of the operator for this numbering. */
export function bandwidth(mesh: PlateMesh, dofs: DofMap): number {
  const g = new Int32Array(16);
  let bw = 0;
  for (let ey = 0; ey < mesh.ny; ey++) for (let ex = 0; ex < mesh.nx; ex++) {
    elementDofs(mesh, ex, ey, g);
    let lo = Infinity, hi = -Infinity;
    for (let k = 0; k < 16; k++) {
      const e = dofs.eq[g[k]];
      if (e < 0) continue;
      if (e < lo) lo = e;
      if (e > hi) hi = e;
    }
    if (hi - lo > bw) bw = hi - lo;
  }
  return bw;
}

export function assemble(mesh: PlateMesh, dofs: DofMap, el: PlateElement): Assembled {
  const K = new BandedSpd(dofs.size, bandwidth(mesh, dofs));
  const f = new Float64Array(dofs.size);
  const g = new Int32Array(16), e = new Int32Array(16);
  const data = K.data, bw = K.bw, w = bw + 1, Ke = el.K;
  for (let ey = 0; ey < mesh.ny; ey++) for (let ex = 0; ex < mesh.nx; ex++) {
    elementDofs(mesh, ex, ey, g);
    for (let k = 0; k < 16; k++) e[k] = dofs.eq[g[k]];
    for (let r = 0; r < 16; r++) {
      const er = e[r];
      if (er < 0) continue;
      f[er] += el.f[r];
      const row = er * w - er + bw; // band layout of BandedSpd
      for (let c = 0; c < 16; c++) {
        const ec = e[c];
        if (ec < 0 || ec > er) continue; // lower triangle only
        data[row + ec] += Ke[r * 16 + c];
      }
    }
  }
  return { K, f };
}

/** Free-DOF solution spread back over all nodal DOFs (fixed ones are zero). */
export function expand(dofs: DofMap, x: Float64Array): Float64Array {
  const u = new Float64Array(dofs.eq.length);
  for (let g = 0; g < u.length; g++) {
    const e = dofs.eq[g];
    if (e >= 0) u[g] = x[e];
  }
  return u;
}
