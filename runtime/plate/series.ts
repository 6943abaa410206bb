// Series solutions of the simply supported rectangular plate under uniform load, used to
// check the grid solver. Unit problem: 0 ≤ x ≤ 1 (= a), 0 ≤ y ≤ r (= b/a), q = 1, D = 1.
//
// Lévy (Timoshenko & Woinowsky-Krieger §30): w = w_strip(x) + Σ_m C_m h_m(η) sin(mπx), m odd,
// with the strip (beam) part in closed form, C_m = 4/(π⁵ m⁵), η = mπ(y − r/2),
// α_m = mπ r/2 and h(η) = −A cosh η + B η sinh η, A = (α tanh α + 2)/(2 cosh α),
// B = 1/(2 cosh α). Keeping the strip part exact makes the sums converge exponentially
// inside the panel. Navier double-sine series for w as an independent cross-check.

/** cosh η / cosh α and sinh η / cosh α without overflow (|η| ≤ α). */
function ratios(eta: number, alpha: number): [number, number] {
  const ae = Math.abs(eta), e = Math.exp(ae - alpha), den = 1 + Math.exp(-2 * alpha);
  const ch = (e * (1 + Math.exp(-2 * ae))) / den;
  const sh = (Math.sign(eta) * e * (1 - Math.exp(-2 * ae))) / den;
  return [ch, sh];
}

/** h and its first three η-derivatives for term with half-angle α at η. */
function levyTerm(eta: number, alpha: number): [number, number, number, number] {
  const Ac = (alpha * Math.tanh(alpha) + 2) / 2; // A cosh α
  const [ch, sh] = ratios(eta, alpha);
  return [
    -Ac * ch + (eta * sh) / 2,
    -Ac * sh + (sh + eta * ch) / 2,
    -Ac * ch + (2 * ch + eta * sh) / 2,
    -Ac * sh + (3 * sh + eta * ch) / 2,
  ];
}

const TERMS = 20001; // highest odd m; interior points stop far earlier

export interface LevyPoint {
  w: number;
  mx: number;
  my: number;
  mxy: number;
  /** Kirchhoff effective shears −(w_xxx + (2−ν) w_xyy) and −(w_yyy + (2−ν) w_xxy): the upward edge reaction at x = 0, y = 0. */
  vx: number;
  vy: number;
}

/** Deflection, moments and Kirchhoff shears at (x, y) of the unit SSSS panel b/a = r. */
export function levyPoint(r: number, nu: number, x: number, y: number): LevyPoint {
  // Strip of span 1 under unit load: w = (x⁴ − 2x³ + x)/24.
  let w = (x ** 4 - 2 * x ** 3 + x) / 24;
  let wxx = (x * x - x) / 2, wyy = 0, wxy = 0;
  let wxxx = (2 * x - 1) / 2, wxyy = 0, wyyy = 0, wxxy = 0;
  for (let m = 1; m <= TERMS; m += 2) {
    const k = m * Math.PI, alpha = (k * r) / 2, eta = k * (y - r / 2);
    const C = 4 / (Math.PI ** 5 * m ** 5);
    const [h, h1, h2, h3] = levyTerm(eta, alpha);
    const s = Math.sin(k * x), c = Math.cos(k * x);
    const k2 = C * k * k, k3 = k2 * k;
    w += C * h * s;
    wxx -= k2 * h * s;
    wyy += k2 * h2 * s;
    wxy += k2 * h1 * c;
    wxxx -= k3 * h * c;
    wxyy += k3 * h2 * c;
    wyyy += k3 * h3 * s;
    wxxy -= k3 * h1 * s;
    if (k3 * (Math.abs(h) + Math.abs(h1) + Math.abs(h2) + Math.abs(h3)) < 1e-18) break;
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

export interface LevyShares {
  /** Shares of the load reaching the edges x = 0 (= x = a) and y = 0 (= y = b), corner forces split equally. */
  x0: number;
  y0: number;
  /** Upward corner force (negative: the corners must be held down), per q a². */
  corner: number;
}

/** Two-way split of the SSSS panel by integrating the Kirchhoff edge reactions term by term. */
export function levyShares(r: number, nu: number): LevyShares {
  let distX = r / 2, distY = 0, S = 0;
  for (let m = 1; m <= TERMS; m += 2) {
    const k = m * Math.PI, a = (k * r) / 2, t = Math.tanh(a);
    const C = 4 / (Math.PI ** 5 * m ** 5), k2 = C * k * k;
    const Ac = (a * t + 2) / 2;
    const intH = -2 * Ac * t + a - t; // ∫ h dη over −α … α
    const intH2 = -2 * Ac * t + t + a; // ∫ h'' dη = 2 h'(α)
    const [, h1, , h3] = levyTerm(a, a);
    distX += k2 * (intH - (2 - nu) * intH2);
    distY += 2 * k2 * (h3 - (2 - nu) * h1);
    S += k2 * h1;
  }
  const corner = 2 * (1 - nu) * S;
  return { x0: (distX + corner) / r, y0: (distY + corner) / r, corner };
}

/** Navier double-sine series for the deflection at (x, y), m, n odd up to `terms`. */
export function navierDeflection(r: number, x: number, y: number, terms = 401): number {
  let w = 0;
  for (let m = 1; m <= terms; m += 2) {
    const sx = Math.sin(m * Math.PI * x);
    for (let n = 1; n <= terms; n += 2) {
      const d = m * m + (n * n) / (r * r);
      w += (sx * Math.sin((n * Math.PI * y) / r)) / (m * n * d * d);
    }
  }
  return (16 / Math.PI ** 6) * w;
}
