// Symmetric positive definite band matrix: lower band stored by rows, Cholesky L Lᵀ
// factor and solve. Cost N·bw²/2 for the factor, which for the plate grid
// (bw ≈ 4 × nodes across) is far below a general sparse solver's overhead.

export class BandedSpd {
  readonly n: number;
  readonly bw: number;
  /** Row i holds columns i − bw … i at i·(bw+1) + (j − i + bw). */
  readonly data: Float64Array;
  private factored = false;

  constructor(n: number, bw: number) {
    this.n = n;
    this.bw = bw;
    this.data = new Float64Array(n * (bw + 1));
  }

  /** Adds v to A[i][j] (and so to A[j][i]); only the lower triangle is kept. */
  add(i: number, j: number, v: number): void {
    if (j > i) { const t = i; i = j; j = t; }
    this.data[i * (this.bw + 1) + j - i + this.bw] += v;
  }

  get(i: number, j: number): number {
    if (j > i) { const t = i; i = j; j = t; }
    if (i - j > this.bw) return 0;
    return this.data[i * (this.bw + 1) + j - i + this.bw];
  }

  /**
   * In-place Cholesky. Throws `SingularMatrixError` when a pivot collapses relative to its
   * diagonal, which for a plate means it is not held against a rigid-body motion.
   */
  factor(relTol = 1e-10): void {
    const { n, bw, data: L } = this;
    const w = bw + 1;
    for (let i = 0; i < n; i++) {
      const j0 = Math.max(0, i - bw);
      const ri = i * w - i + bw;
      for (let j = j0; j <= i; j++) {
        const rj = j * w - j + bw;
        let s = L[ri + j];
        for (let k = j0; k < j; k++) s -= L[ri + k] * L[rj + k];
        if (j < i) {
          L[ri + j] = s / L[rj + j];
        } else {
          const d = L[ri + i];
          if (!(s > relTol * Math.abs(d))) throw new SingularMatrixError(i);
          L[ri + i] = Math.sqrt(s);
        }
      }
    }
    this.factored = true;
  }

  /** Solves A x = rhs after `factor()`; returns a new vector. */
  solve(rhs: Float64Array): Float64Array {
    if (!this.factored) throw new Error('BandedSpd.solve before factor');
    const { n, bw, data: L } = this;
    const w = bw + 1;
    const x = Float64Array.from(rhs);
    for (let i = 0; i < n; i++) {
      const ri = i * w - i + bw;
      let s = x[i];
      for (let k = Math.max(0, i - bw); k < i; k++) s -= L[ri + k] * x[k];
      x[i] = s / L[ri + i];
    }
    for (let i = n - 1; i >= 0; i--) {
      const ri = i * w - i + bw;
      x[i] /= L[ri + i];
      const xi = x[i];
      for (let k = Math.max(0, i - bw); k < i; k++) x[k] -= L[ri + k] * xi;
    }
    return x;
  }
}

export class SingularMatrixError extends Error {
  override name = 'SingularMatrixError';
  constructor(readonly row: number) {
    super(`matrix is singular at equation ${row}`);
  }
}
