// General bearing capacity equation, qu = c Nc sc dc + q Nq sq dq + ½ γ B Nγ sγ dγ
// (Meyerhof 1963 / Hansen 1970 / Vesic 1973 form, vertical load, level ground and base).
// Nq and Nc are the Reissner/Prandtl closed forms the three share; Nγ by Vesic, Meyerhof or Hansen.
// Shape factors: De Beer (1970) as adopted by Vesic (1973). Depth factors: Hansen (1970) or
// Meyerhof (1963). The shape and depth factor forms are from memory (Das, Table 3.4 era).

import { LibraryError, defineFunction, type LibFunction, type LibParam } from './types';
import { choice, nonNegative, positive } from './support-args';
import { frictionAngle } from './soil-bearing-terzaghi';
import { deg } from '../units/si';
import { quietly, working } from '../working/recorder';

export const NGAMMA_METHODS = ['vesic', 'meyerhof', 'hansen'] as const;
export const DEPTH_METHODS = ['hansen', 'meyerhof', 'none'] as const;
type NgammaMethod = (typeof NGAMMA_METHODS)[number];
type DepthMethod = (typeof DEPTH_METHODS)[number];

/** Nq = e^{π tanφ} tan²(45° + φ/2) (Reissner 1924; Meyerhof, Hansen, Vesic). */
export function nqVesic(phi: number): number {
  const p = frictionAngle(phi);
  const n = Math.exp(Math.PI * Math.tan(p)) * Math.tan(Math.PI / 4 + p / 2) ** 2;
  working()?.step('N_q', 'exp(pi * tan(phi)) * tan(pi / 4 + phi / 2)^2', n, '', { vars: { phi: [p, 'deg'] }, clause: 'Reissner (1924)' });
  return n;
}

/** Nc = (Nq − 1) cot φ, π + 2 at φ = 0 (Prandtl 1921). */
export function ncVesic(phi: number): number {
  const p = frictionAngle(phi);
  const w = working();
  if (p < 1e-9) {
    w?.step('N_c', 'pi + 2', Math.PI + 2, '', { clause: 'Prandtl (1921)', note: 'φ = 0' });
    return Math.PI + 2;
  }
  const n = (nqVesic(p) - 1) / Math.tan(p);
  w?.step('N_c', '(N_q - 1) / tan(phi)', n, '', { vars: { phi: [p, 'deg'] }, clause: 'Prandtl (1921)' });
  return n;
}

/** One of the Nγ forms on Nq, recorded with its author. */
function ngamma(phi: number, expr: string, f: (nq: number, p: number) => number, clause: string): number {
  const n = f(nqVesic(phi), phi);
  working()?.step('N_gamma', expr, n, '', { vars: { phi: [phi, 'deg'] }, clause });
  return n;
}

/** Nγ = 2(Nq + 1) tan φ (Vesic 1973). */
export function ngammaVesic(phi: number): number {
  return ngamma(phi, '2 * (N_q + 1) * tan(phi)', (nq, p) => 2 * (nq + 1) * Math.tan(p), 'Vesic (1973)');
}

/** Nγ = (Nq − 1) tan(1.4φ) (Meyerhof 1963). */
export function ngammaMeyerhof(phi: number): number {
  return ngamma(phi, '(N_q - 1) * tan(1.4 * phi)', (nq, p) => (nq - 1) * Math.tan(1.4 * p), 'Meyerhof (1963)');
}

/** Nγ = 1.5 (Nq − 1) tan φ (Hansen 1970). */
export function ngammaHansen(phi: number): number {
  return ngamma(phi, '1.5 * (N_q - 1) * tan(phi)', (nq, p) => 1.5 * (nq - 1) * Math.tan(p), 'Hansen (1970)');
}

/** B/L of a rectangular footing, B ≤ L (B = L for square and circular). */
function ratio(b: number, l: number): number {
  positive('B', b);
  if (positive('L', l) < b) throw new LibraryError('B is the smaller side: L must not be less than B');
  return b / l;
}

export interface Shape { sc: number; sq: number; sg: number; }

/** sc = 1 + (B/L)(Nq/Nc), sq = 1 + (B/L)tanφ, sγ = 1 − 0.4B/L (De Beer 1970, as used by Vesic 1973) [from memory]. */
export function shapeDeBeer(phi: number, b: number, l: number): Shape {
  const r = ratio(b, l);
  const w = working();
  const nc = ncVesic(phi); // its working shows Nq on the way
  const nq = quietly(() => nqVesic(phi));
  const s = { sc: 1 + r * (nq / nc), sq: 1 + r * Math.tan(frictionAngle(phi)), sg: 1 - 0.4 * r };
  if (w) {
    const vars = { B: [b, 'ft'], L: [l, 'ft'], phi: [phi, 'deg'] } as const;
    w.step('s_c', '1 + B / L * N_q / N_c', s.sc, '', { vars, clause: SHAPE });
    w.step('s_q', '1 + B / L * tan(phi)', s.sq, '', { vars, clause: SHAPE });
    w.step('s_gamma', '1 - 0.4 * B / L', s.sg, '', { vars, clause: SHAPE });
  }
  return s;
}

export interface Depth { dc: number; dq: number; dg: number; }

/** Hansen (1970): k = Df/B (Df ≤ B) or atan(Df/B); dc = 1 + 0.4k, dq = 1 + 2tanφ(1 − sinφ)²k, dγ = 1 [from memory]. */
export function depthHansen(phi: number, df: number, b: number): Depth {
  const p = frictionAngle(phi);
  const x = nonNegative('Df', df) / positive('B', b);
  const k = x <= 1 ? x : Math.atan(x);
  const d = { dc: 1 + 0.4 * k, dq: 1 + 2 * Math.tan(p) * (1 - Math.sin(p)) ** 2 * k, dg: 1 };
  const w = working();
  if (w) {
    const vars = { Df: [df, 'ft'], B: [b, 'ft'], phi: [p, 'deg'] } as const;
    w.step('k', x <= 1 ? 'Df / B' : 'atan(Df / B)', k, '', { vars, clause: HANSEN, note: x <= 1 ? 'Df ≤ B' : 'Df > B' });
    w.step('d_c', '1 + 0.4 * k', d.dc, '', { clause: HANSEN });
    w.step('d_q', '1 + 2 * tan(phi) * (1 - sin(phi))^2 * k', d.dq, '', { vars, clause: HANSEN });
  }
  return d;
}

/** Meyerhof (1963): dc = 1 + 0.2√Kp Df/B; dq = dγ = 1 + 0.1√Kp Df/B for φ > 10°, else 1 [from memory]. */
export function depthMeyerhof(phi: number, df: number, b: number): Depth {
  const p = frictionAngle(phi);
  const x = nonNegative('Df', df) / positive('B', b);
  const rootKp = Math.tan(Math.PI / 4 + p / 2);
  const dq = p > 10 * deg ? 1 + 0.1 * rootKp * x : 1;
  const w = working();
  if (w) {
    const vars = { Df: [df, 'ft'], B: [b, 'ft'], phi: [p, 'deg'] } as const;
    w.step('sqrt_Kp', 'tan(pi / 4 + phi / 2)', rootKp, '', { vars, clause: MEYERHOF });
    w.step('d_c', '1 + 0.2 * sqrt_Kp * Df / B', 1 + 0.2 * rootKp * x, '', { vars, clause: MEYERHOF });
    w.step('d_q', p > 10 * deg ? '1 + 0.1 * sqrt_Kp * Df / B' : '1', dq, '', { vars, clause: MEYERHOF, note: p > 10 * deg ? 'φ > 10°' : 'φ ≤ 10°: 1' });
  }
  return { dc: 1 + 0.2 * rootKp * x, dq, dg: dq };
}

/** qu = c Nc sc dc + q Nq sq dq + ½γB Nγ sγ dγ (Meyerhof 1963 / Vesic 1973 general form). */
export function quGeneral(
  c: number, q: number, gamma: number, b: number, l: number, df: number, phi: number,
  ng: NgammaMethod = 'vesic', dm: DepthMethod = 'hansen', bDepth = b,
): number {
  const nq = nqVesic(phi);
  const nc = ncVesic(phi);
  const ngammaV = ng === 'vesic' ? ngammaVesic(phi) : ng === 'meyerhof' ? ngammaMeyerhof(phi) : ngammaHansen(phi);
  const s = shapeDeBeer(phi, b, l);
  nonNegative('Df', df);
  // Depth factors on the full width even when B is an effective width B' (Das, effective-area method [from memory]).
  const d = dm === 'hansen' ? depthHansen(phi, df, bDepth) : dm === 'meyerhof' ? depthMeyerhof(phi, df, bDepth) : { dc: 1, dq: 1, dg: 1 };
  const qu = nonNegative('c', c) * nc * s.sc * d.dc + nonNegative('q', q) * nq * s.sq * d.dq +
    0.5 * nonNegative('gamma', gamma) * b * ngammaV * s.sg * d.dg;
  working()?.step('q_u', 'c * N_c * s_c * d_c + q * N_q * s_q * d_q + 0.5 * gamma * B * N_gamma * s_gamma * d_gamma', qu, 'psf', {
    vars: { c: [c, 'psf'], q: [q, 'psf'], gamma: [gamma, 'pcf'], B: [b, 'ft'], N_c: nc, N_q: nq, N_gamma: ngammaV, d_c: d.dc, d_q: d.dq, d_gamma: d.dg },
    clause: 'Meyerhof (1963) / Vesic (1973) general form', note: dm === 'none' ? 'no depth factors' : `${dm} depth factors`,
  });
  return qu;
}

/** q_allow = qu / FS (common practice; FS usually 2.5 to 3). */
export function qAllowFs(qu: number, fs: number): number {
  if (positive('FS', fs) < 1) throw new LibraryError(`factor of safety must be at least 1, got ${fs}`);
  const q = positive('qu', qu) / fs;
  working()?.step('q_allow', 'qu / FS', q, 'psf', { vars: { qu: [qu, 'psf'], FS: fs }, clause: 'common practice' });
  return q;
}

/** True when the pressure used does not exceed qu / FS. */
export function bearingOk(qUsed: number, qu: number, fs: number): boolean {
  const ok = nonNegative('q (used)', qUsed) <= qAllowFs(qu, fs);
  working()?.step('ok', 'q_used <= q_allow', ok, '', { vars: { q_used: [qUsed, 'psf'] }, clause: 'common practice' });
  return ok;
}

/** A factor picked from a set, named again as the function's result. */
function named(symbol: string, v: number): number {
  working()?.result(symbol, symbol, v);
  return v;
}

const phiP: LibParam = { name: 'phi', type: 'rad', doc: 'soil friction angle' };
const geo: LibParam[] = [phiP, { name: 'B', type: 'm', doc: 'footing width (short side)' }, { name: 'L', type: 'm', doc: 'footing length (B for square/circular)' }];
const dep: LibParam[] = [phiP, { name: 'Df', type: 'm', doc: 'depth of the footing base below grade' }, { name: 'B', type: 'm', doc: 'footing width' }];
const SHAPE = 'De Beer (1970) shape factors as adopted by Vesic (1973) [form from memory]';
const HANSEN = "Hansen (1970) depth factors, k = Df/B or atan(Df/B) for Df > B [form from memory]";
const MEYERHOF = 'Meyerhof (1963) depth factors, √Kp = tan(45° + φ/2) [form from memory]';

export const functions: LibFunction[] = [
  defineFunction({ name: 'nq_vesic', params: [phiP], returns: '1', clause: 'Reissner (1924): Nq = e^{π tanφ}tan²(45° + φ/2), shared by Meyerhof, Hansen, Vesic', doc: 'Bearing capacity factor Nq', fn: nqVesic }),
  defineFunction({ name: 'nc_vesic', params: [phiP], returns: '1', clause: 'Prandtl (1921): Nc = (Nq − 1)cotφ, π + 2 at φ = 0', doc: 'Bearing capacity factor Nc', fn: ncVesic }),
  defineFunction({ name: 'ngamma_vesic', params: [phiP], returns: '1', clause: 'Vesic (1973): Nγ = 2(Nq + 1)tanφ', doc: 'Bearing capacity factor Nγ after Vesic', fn: ngammaVesic }),
  defineFunction({ name: 'ngamma_meyerhof', params: [phiP], returns: '1', clause: 'Meyerhof (1963): Nγ = (Nq − 1)tan(1.4φ)', doc: 'Bearing capacity factor Nγ after Meyerhof', fn: ngammaMeyerhof }),
  defineFunction({ name: 'ngamma_hansen', params: [phiP], returns: '1', clause: 'Hansen (1970): Nγ = 1.5(Nq − 1)tanφ', doc: 'Bearing capacity factor Nγ after Hansen', fn: ngammaHansen }),
  defineFunction({ name: 'sc_debeer', params: geo, returns: '1', clause: SHAPE + ': sc = 1 + (B/L)(Nq/Nc)', doc: 'Shape factor for cohesion', fn: (p: number, b: number, l: number) => named('s_c', shapeDeBeer(p, b, l).sc) }),
  defineFunction({ name: 'sq_debeer', params: geo, returns: '1', clause: SHAPE + ': sq = 1 + (B/L)tanφ', doc: 'Shape factor for surcharge', fn: (p: number, b: number, l: number) => named('s_q', shapeDeBeer(p, b, l).sq) }),
  defineFunction({ name: 'sgamma_debeer', params: geo, returns: '1', clause: SHAPE + ': sγ = 1 − 0.4B/L', doc: 'Shape factor for soil weight', fn: (p: number, b: number, l: number) => named('s_gamma', shapeDeBeer(p, b, l).sg) }),
  defineFunction({ name: 'dc_hansen', params: dep, returns: '1', clause: HANSEN + ': dc = 1 + 0.4k', doc: 'Depth factor for cohesion (Hansen)', fn: (p: number, d: number, b: number) => named('d_c', depthHansen(p, d, b).dc) }),
  defineFunction({ name: 'dq_hansen', params: dep, returns: '1', clause: HANSEN + ': dq = 1 + 2tanφ(1 − sinφ)²k', doc: 'Depth factor for surcharge (Hansen); dγ = 1', fn: (p: number, d: number, b: number) => named('d_q', depthHansen(p, d, b).dq) }),
  defineFunction({ name: 'dc_meyerhof', params: dep, returns: '1', clause: MEYERHOF + ': dc = 1 + 0.2√Kp·Df/B', doc: 'Depth factor for cohesion (Meyerhof)', fn: (p: number, d: number, b: number) => named('d_c', depthMeyerhof(p, d, b).dc) }),
  defineFunction({ name: 'dq_meyerhof', params: dep, returns: '1', clause: MEYERHOF + ': dq = dγ = 1 + 0.1√Kp·Df/B (φ > 10°), else 1', doc: 'Depth factor for surcharge and weight (Meyerhof)', fn: (p: number, d: number, b: number) => named('d_q', depthMeyerhof(p, d, b).dq) }),
  defineFunction({
    name: 'qu_general',
    params: [
      { name: 'c', type: 'Pa', doc: 'soil cohesion' },
      { name: 'q', type: 'Pa', doc: 'overburden pressure at the base (γ·Df)' },
      { name: 'gamma', type: 'N/m^3', doc: 'unit weight of the soil below the base' },
      { name: 'B', type: 'm', doc: 'footing width (short side; diameter if circular)' },
      { name: 'L', type: 'm', doc: 'footing length (B for square/circular)' },
      { name: 'Df', type: 'm', doc: 'depth of the base below grade' },
      phiP,
      { name: 'ngamma', type: 'text', choices: NGAMMA_METHODS, doc: "Nγ: 'vesic' (default), 'meyerhof' or 'hansen'" },
      { name: 'depth', type: 'text', choices: DEPTH_METHODS, doc: "depth factors: 'hansen' (default), 'meyerhof' or 'none'" },
      { name: 'B_depth', type: 'm', doc: "width for the depth factors (default B; the full width when B is an eccentric load's B')" },
    ],
    optional: 3,
    returns: 'Pa',
    clause: `qu = cNc·sc·dc + qNq·sq·dq + ½γBNγ·sγ·dγ (Meyerhof 1963 / Vesic 1973); ${SHAPE}; ${HANSEN} or ${MEYERHOF}`,
    doc: 'Ultimate bearing capacity, general equation with shape and depth factors',
    fn: (c: number, q: number, g: number, b: number, l: number, df: number, p: number, ng?: string, dm?: string, bd?: number) =>
      quGeneral(c, q, g, b, l, df, p,
        ng === undefined ? 'vesic' : choice('Nγ method', ng, NGAMMA_METHODS),
        dm === undefined ? 'hansen' : choice('depth factor method', dm, DEPTH_METHODS),
        bd === undefined ? b : positive('B_depth', bd)),
  }),
  defineFunction({
    name: 'q_allow_fs',
    params: [{ name: 'qu', type: 'Pa', doc: 'ultimate bearing capacity' }, { name: 'FS', type: '1', doc: 'factor of safety (≥ 1, usually 2.5–3)' }],
    returns: 'Pa',
    clause: 'q_allow = qu/FS (common practice)',
    doc: 'Allowable bearing pressure from the ultimate capacity and a factor of safety',
    fn: qAllowFs,
  }),
  defineFunction({
    name: 'bearing_ok',
    params: [
      { name: 'q_used', type: 'Pa', doc: 'allowable pressure used in the design' },
      { name: 'qu', type: 'Pa', doc: 'ultimate bearing capacity' },
      { name: 'FS', type: '1', doc: 'factor of safety' },
    ],
    returns: 'bool',
    clause: 'q_used ≤ qu/FS (common practice)',
    doc: 'Whether the allowable pressure used is within capacity / FS',
    fn: bearingOk,
  }),
];
