// The conforming rectangular plate element (Bogner–Fox–Schmit): bicubic Hermite
// interpolation with w, ∂w/∂x, ∂w/∂y, ∂²w/∂x∂y at each corner. Slopes are continuous
// across element sides, so the Kirchhoff energy converges from below without tricks
// and free edges need no special treatment (their conditions are natural).
//
// Local DOF k = j*4 + i, with i the 1D Hermite index along x and j along y (see hermite.ts).
// Node of DOF k: corner (i >> 1, j >> 1); kind: (i & 1) + 2 (j & 1) → 0 w, 1 w_x, 2 w_y, 3 w_xy.

import { hermiteIntegrals } from './hermite';

export interface PlateElement {
  hx: number;
  hy: number;
  /** 16×16 row-major stiffness for D = 1. */
  K: Float64Array;
  /** Consistent load vector for q = 1. */
  f: Float64Array;
}

/**
 * Stiffness from the bending energy (1/2) D ∫ [w_xx² + w_yy² + 2ν w_xx w_yy + 2(1−ν) w_xy²]
 * (Timoshenko & Woinowsky-Krieger §10), integrated exactly as products of 1D integrals.
 */
export function plateElement(hx: number, hy: number, nu: number): PlateElement {
  const X = hermiteIntegrals(hx), Y = hermiteIntegrals(hy);
  const K = new Float64Array(256), f = new Float64Array(16);
  for (let j = 0; j < 4; j++) for (let i = 0; i < 4; i++) {
    const a = j * 4 + i;
    f[a] = X.I[i] * Y.I[j];
    for (let l = 0; l < 4; l++) for (let k = 0; k < 4; k++) {
      const b = l * 4 + k;
      K[a * 16 + b] =
        X.M22[i * 4 + k] * Y.M00[j * 4 + l] +
        X.M00[i * 4 + k] * Y.M22[j * 4 + l] +
        nu * (X.M20[i * 4 + k] * Y.M20[l * 4 + j] + X.M20[k * 4 + i] * Y.M20[j * 4 + l]) +
        2 * (1 - nu) * X.M11[i * 4 + k] * Y.M11[j * 4 + l];
    }
  }
  return { hx, hy, K, f };
}

/** Corner (px, py ∈ {0,1}) and DOF kind (0..3) of local DOF k. */
export function localDof(k: number): { px: number; py: number; kind: number } {
  const i = k & 3, j = k >> 2;
  return { px: i >> 1, py: j >> 1, kind: (i & 1) + 2 * (j & 1) };
}
