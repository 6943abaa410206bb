// The uniform grid of rectangular elements over the panel, and the node numbering.
// Nodes run fastest along the direction with fewer nodes, which keeps the band narrow.

export interface PlateMesh {
  a: number;
  b: number;
  nx: number;
  ny: number;
  hx: number;
  hy: number;
  /** Nodes per line of the fast direction. */
  nodeCount: number;
  /** Node number of grid point (ix, iy). */
  node(ix: number, iy: number): number;
}

/**
 * Grid with about `n` elements across the shorter side and square-ish elements;
 * both counts are even so the panel centre and the edge mid-points are nodes.
 */
export function plateMesh(a: number, b: number, n: number): PlateMesh {
  const even = (v: number) => Math.max(2, 2 * Math.round(v / 2));
  const short = Math.min(a, b);
  const nx = even((n * a) / short), ny = even((n * b) / short);
  const xFast = nx <= ny;
  const stride = xFast ? nx + 1 : ny + 1;
  return {
    a, b, nx, ny,
    hx: a / nx,
    hy: b / ny,
    nodeCount: (nx + 1) * (ny + 1),
    node: xFast ? (ix, iy) => ix + iy * stride : (ix, iy) => iy + ix * stride,
  };
}

/** Global DOF numbers (node * 4 + kind) of the 16 element DOFs, in element order. */
export function elementDofs(mesh: PlateMesh, ex: number, ey: number, out: Int32Array): Int32Array {
  for (let k = 0; k < 16; k++) {
    const i = k & 3, j = k >> 2;
    out[k] = mesh.node(ex + (i >> 1), ey + (j >> 1)) * 4 + (i & 1) + 2 * (j & 1);
  }
  return out;
}
