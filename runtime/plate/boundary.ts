// Which nodal DOFs the edge conditions fix, and the numbering of the free ones.
// Along x = const a support fixes w and its tangential slope w_y; a clamp also fixes
// the normal slope w_x and its tangential derivative w_xy. Likewise for y = const.
// Free edges fix nothing: their conditions (M_n = 0, V_n = 0) are natural in the energy.

import type { EdgeCode } from './edges';
import type { PlateMesh } from './mesh';

const W = 1, WX = 2, WY = 4, WXY = 8;

function edgeMask(c: string, normalIsX: boolean): number {
  if (c === 'C') return W | WX | WY | WXY;
  if (c === 'S') return normalIsX ? W | WY : W | WX;
  return 0;
}

/** Bit mask (bit k = DOF kind k) of the DOFs fixed at grid point (ix, iy). */
export function fixedMask(mesh: PlateMesh, edges: EdgeCode, ix: number, iy: number): number {
  let m = 0;
  if (ix === 0) m |= edgeMask(edges[0], true);
  if (iy === 0) m |= edgeMask(edges[1], false);
  if (ix === mesh.nx) m |= edgeMask(edges[2], true);
  if (iy === mesh.ny) m |= edgeMask(edges[3], false);
  return m;
}

export interface DofMap {
  /** Equation number of global DOF (node * 4 + kind), or −1 where fixed. */
  eq: Int32Array;
  /** Number of free DOFs. */
  size: number;
}

export function numberDofs(mesh: PlateMesh, edges: EdgeCode): DofMap {
  const fixed = new Uint8Array(mesh.nodeCount);
  for (let iy = 0; iy <= mesh.ny; iy++) for (let ix = 0; ix <= mesh.nx; ix++) {
    fixed[mesh.node(ix, iy)] = fixedMask(mesh, edges, ix, iy);
  }
  const eq = new Int32Array(mesh.nodeCount * 4);
  let size = 0;
  for (let nd = 0; nd < mesh.nodeCount; nd++) {
    for (let k = 0; k < 4; k++) eq[nd * 4 + k] = fixed[nd] & (1 << k) ? -1 : size++;
  }
  return { eq, size };
}
