// Lévy single series for a panel simply supported on x = 0 and x = a, with each of the
// edges y = 0 and y = b simply supported, clamped or free (Timoshenko & Woinowsky-Krieger
// §§ 30, 45–47 treat these cases one by one; here the four constants of each term come from
// a 4×4 solve, so one routine covers them all). Used to check free and clamped edges of the
// grid solver. Unit problem: a = 1, b = r, q = 1, D = 1.
//
// w = w_strip(x) + Σ_m C_m sin(mπx) Σ_i c_i φ_i(η),  m odd, C_m = 4/(π⁵ m⁵), η = mπy,
// where w_strip = Σ C_m sin(mπx) = (x⁴ − 2x³ + x)/24 is the strip under unit load and the
// φ_i are e^(−η), η e^(−η), e^(η−β), (η−β) e^(η−β), β = mπr: bounded, so no overflow.

import { LibraryError } from '../library/types';
import type { EdgeCondition } from './edges';

/** φ_i and derivatives 0…3 at η, as phi[i][d]. */
function basis(eta: number, beta: number): number[][] {
  const e1 = Math.exp(-eta), e2 = Math.exp(eta - beta), t = eta - beta;
  return [
    [e1, -e1, e1, -e1],
    [eta * e1, (1 - eta) * e1, (eta - 2) * e1, (3 - eta) * e1],
    [e2, e2, e2, e2],
    [t * e2, (1 + t) * e2, (2 + t) * e2, (3 + t) * e2],
  ];
}

/** Two rows [coefficients of c, right-hand side] for the edge condition, g = 1 + Σ c φ. */
function edgeRows(cond: EdgeCondition, phi: number[][], nu: number): [number[], number][] {
  const row = (f: (p: number[]) => number) => phi.map(f);
  switch (cond) {
    case 'S': // g = 0, g'' = 0
      return [[row((p) => p[0]), -1], [row((p) => p[2]), 0]];
    case 'C': // g = 0, g' = 0
      return [[row((p) => p[0]), -1], [row((p) => p[1]), 0]];
    case 'F': // My = 0: g'' − ν g = 0; Vy = 0: g''' − (2 − ν) g' = 0
      return [[row((p) => p[2] - nu * p[0]), nu], [row((p) => p[3] - (2 - nu) * p[1]), 0]];
  }
}

function solve4(A: number[][], b: number[]): number[] {
  const M = A.map((r, i) => [...r, b[i]]);
  for (let c = 0; c < 4; c++) {
    let p = c;
    for (let r = c + 1; r < 4; r++) if (Math.abs(M[r][c]) > Math.abs(M[p][c])) p = r;
    [M[c], M[p]] = [M[p], M[c]];
    for (let r = c + 1; r < 4; r++) {
      const f = M[r][c] / M[c][c];
      for (let k = c; k < 5; k++) M[r][k] -= f * M[c][k];
    }
  }
  const x = [0, 0, 0, 0];
  for (let r = 3; r >= 0; r--) {
    let s = M[r][4];
    for (let k = r + 1; k < 4; k++) s -= M[r][k] * x[k];
    x[r] = s / M[r][r];
  }
  return x;
}

export interface LevyValues {
  w: number;
  mx: number;
  my: number;
  mxy: number;
  /** Kirchhoff effective shears −(w_xxx + (2−ν) w_xyy), −(w_yyy + (2−ν) w_xxy). */
  vx: number;
  vy: number;
}

const TERMS = 20001;

/**
 * Values at (x, y) of the unit panel with edges y = 0 and y = b of the given kinds
 * (x = 0 and x = a simply supported), b/a = r.
 */
export function levyPanel(r: number, y0: EdgeCondition, yb: EdgeCondition, nu: number, x: number, y: number): LevyValues {
  if (!(r > 0)) throw new LibraryError(`b/a must be positive, got ${r}`);
  let w = (x ** 4 - 2 * x ** 3 + x) / 24;
  let wxx = (x * x - x) / 2, wyy = 0, wxy = 0;
  let wxxx = (2 * x - 1) / 2, wxyy = 0, wyyy = 0, wxxy = 0;
  for (let m = 1; m <= TERMS; m += 2) {
    const k = m * Math.PI, beta = k * r;
    const rows = [...edgeRows(y0, basis(0, beta), nu), ...edgeRows(yb, basis(beta, beta), nu)];
    const c = solve4(rows.map((q) => q[0]), rows.map((q) => q[1]));
    const phi = basis(k * y, beta);
    const g = [0, 0, 0, 0];
    for (let i = 0; i < 4; i++) for (let d = 0; d < 4; d++) g[d] += c[i] * phi[i][d];
    const C = 4 / (Math.PI ** 5 * m ** 5), s = Math.sin(k * x), co = Math.cos(k * x);
    const k2 = C * k * k, k3 = k2 * k;
    w += C * g[0] * s;
    wxx -= k2 * g[0] * s;
    wyy += k2 * g[2] * s;
    wxy += k2 * g[1] * co;
    wxxx -= k3 * g[0] * co;
    wxyy += k3 * g[2] * co;
    wyyy += k3 * g[3] * s;
    wxxy -= k3 * g[1] * s;
    if (k3 * (Math.abs(g[0]) + Math.abs(g[1]) + Math.abs(g[2]) + Math.abs(g[3])) < 1e-18) break;
  }
  return {
    w,
    mx: -(wxx + nu * wyy),
    my: -(wyy + nu * wxx),
    mxy: (1 - nu) * wxy,
    vx: -(wxxx + (2 - nu) * wxyy),
    vy: -(wyyy + (2 - nu) * wxxy),
  };
}
