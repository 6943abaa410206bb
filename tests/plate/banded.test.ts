// The band Cholesky solver against a dense elimination on random SPD band matrices.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { BandedSpd, SingularMatrixError } from '../../runtime/plate/banded';

function denseSolve(A: number[][], b: number[]): number[] {
  const n = b.length, M = A.map((r, i) => [...r, b[i]]);
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(M[r][c]) > Math.abs(M[p][c])) p = r;
    [M[c], M[p]] = [M[p], M[c]];
    for (let r = c + 1; r < n; r++) {
      const f = M[r][c] / M[c][c];
      for (let k = c; k <= n; k++) M[r][k] -= f * M[c][k];
    }
  }
  const x = new Array(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let s = M[r][n];
    for (let k = r + 1; k < n; k++) s -= M[r][k] * x[k];
    x[r] = s / M[r][r];
  }
  return x;
}

describe('BandedSpd', () => {
  it('solves random SPD band systems like dense elimination', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 30 }), fc.integer({ min: 0, max: 6 }), fc.integer({ min: 1, max: 1e9 }), (n, bw, seed) => {
        let s = seed;
        const rnd = () => ((s = (s * 1103515245 + 12345) % 2147483648) / 2147483648) * 2 - 1;
        // Symmetric band with diagonal > n and fewer than n off-diagonals per row, each below 1:
        // strictly diagonally dominant, hence SPD (Gershgorin; common practice).
        const A = Array.from({ length: n }, () => new Array(n).fill(0));
        for (let i = 0; i < n; i++) for (let j = Math.max(0, i - bw); j <= i; j++) {
          const v = i === j ? n + 1 + rnd() : rnd();
          A[i][j] = v;
          A[j][i] = v;
        }
        const K = new BandedSpd(n, bw);
        for (let i = 0; i < n; i++) for (let j = Math.max(0, i - bw); j <= i; j++) K.add(i, j, A[i][j]);
        const b = Array.from({ length: n }, rnd);
        K.factor();
        const x = K.solve(Float64Array.from(b)), ref = denseSolve(A, b);
        for (let i = 0; i < n; i++) expect(x[i]).toBeCloseTo(ref[i], 10);
      }),
      { numRuns: 50 },
    );
  });

  it('reports a singular matrix instead of returning garbage', () => {
    // [[1, 1], [1, 1]] is positive semi-definite, singular.
    const K = new BandedSpd(2, 1);
    K.add(0, 0, 1); K.add(1, 0, 1); K.add(1, 1, 1);
    expect(() => K.factor()).toThrow(SingularMatrixError);
  });
});
