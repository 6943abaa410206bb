// Cubic Hermite shape functions on one element side of length L, and their integrals.
// The conforming rectangle (Bogner–Fox–Schmit) is the tensor product of these in x and y,
// so every element integral factors into the 1D matrices built here.
//
// Local order of the four 1D functions: 0 value at start, 1 slope at start,
// 2 value at end, 3 slope at end.

/** Values (d = 0) or derivatives (d = 1, 2, 3) of the four functions at ξ = s/L ∈ [0, 1]. */
export function hermite(xi: number, L: number, d: 0 | 1 | 2 | 3): [number, number, number, number] {
  const x = xi;
  switch (d) {
    case 0:
      return [1 - 3 * x * x + 2 * x * x * x, L * (x - 2 * x * x + x * x * x), 3 * x * x - 2 * x * x * x, L * (-x * x + x * x * x)];
    case 1:
      return [(-6 * x + 6 * x * x) / L, 1 - 4 * x + 3 * x * x, (6 * x - 6 * x * x) / L, -2 * x + 3 * x * x];
    case 2:
      return [(-6 + 12 * x) / (L * L), (-4 + 6 * x) / L, (6 - 12 * x) / (L * L), (-2 + 6 * x) / L];
    case 3:
      return [12 / (L * L * L), 6 / (L * L), -12 / (L * L * L), 6 / (L * L)];
  }
}

// 4-point Gauss–Legendre on [0, 1]: exact to degree 7, enough for products of two cubics.
const G = [
  [0.5 - 0.5 * 0.8611363115940526, 0.5 * 0.3478548451374538],
  [0.5 - 0.5 * 0.3399810435848563, 0.5 * 0.6521451548625461],
  [0.5 + 0.5 * 0.3399810435848563, 0.5 * 0.6521451548625461],
  [0.5 + 0.5 * 0.8611363115940526, 0.5 * 0.3478548451374538],
];

/** The 1D integrals an element needs, all 4×4 row-major except `I` (length 4). */
export interface HermiteIntegrals {
  /** ∫ H_i H_j */
  M00: Float64Array;
  /** ∫ H_i' H_j' */
  M11: Float64Array;
  /** ∫ H_i'' H_j'' */
  M22: Float64Array;
  /** ∫ H_i'' H_j (not symmetric) */
  M20: Float64Array;
  /** ∫ H_i */
  I: Float64Array;
}

export function hermiteIntegrals(L: number): HermiteIntegrals {
  const M00 = new Float64Array(16), M11 = new Float64Array(16), M22 = new Float64Array(16), M20 = new Float64Array(16);
  const I = new Float64Array(4);
  for (const [xi, wt] of G) {
    const w = wt * L;
    const h0 = hermite(xi, L, 0), h1 = hermite(xi, L, 1), h2 = hermite(xi, L, 2);
    for (let i = 0; i < 4; i++) {
      I[i] += w * h0[i];
      for (let j = 0; j < 4; j++) {
        M00[i * 4 + j] += w * h0[i] * h0[j];
        M11[i * 4 + j] += w * h1[i] * h1[j];
        M22[i * 4 + j] += w * h2[i] * h2[j];
        M20[i * 4 + j] += w * h2[i] * h0[j];
      }
    }
  }
  return { M00, M11, M22, M20, I };
}
