// Terzaghi (1943) bearing capacity: Nq, Nc in closed form; Nγ has none, and printed tables of
// it differ. Two families, never mixed: 'das' (the default), Das, Principles of Foundation
// Engineering, Table 3.1 (Nγ after Kumbhojkar 1993), whose local-shear factors (Table 3.2) are the
// same table read at φ' = atan((2/3)tan φ); and 'bowles', the Terzaghi table reproduced in
// Bowles, Foundation Analysis and Design (attribution from memory), with a higher Nγ (9.7 against
// 8.34 at 25°), so a higher, less conservative capacity: offered only when asked for. Rows are
// interpolated log-linearly (linearly up from Nγ = 0). Das rows 45° and 50° are from memory.

import { LibraryError, defineFunction, type LibFunction, type LibParam } from './types';
import { choice, finite, nonNegative, positive } from './support-args';
import { deg } from '../units/si';
import { quietly, working } from '../working/recorder';

export const SHAPES = ['strip', 'square', 'circular', 'rectangular'] as const;
export const SHEAR_MODES = ['general', 'local'] as const;
type Shape = (typeof SHAPES)[number];
type ShearMode = (typeof SHEAR_MODES)[number];

export const NGAMMA_FAMILIES = ['das', 'bowles'] as const;
export type NgammaFamily = (typeof NGAMMA_FAMILIES)[number];

type Rows = readonly (readonly [number, number])[];
/** [φ in degrees, Nγ] by family. */
const NGAMMA_ROWS: Record<NgammaFamily, Rows> = {
  // Das Table 3.1, Nγ after Kumbhojkar (1993).
  das: [
    [0, 0], [5, 0.14], [10, 0.56], [15, 1.52], [20, 3.64], [25, 8.34],
    [30, 19.13], [35, 45.41], [40, 115.31],
    [45, 325.34], [50, 1072.8], // from memory
  ],
  // The Terzaghi table of Bowles (attribution from memory; values read in a public reproduction).
  bowles: [
    [0, 0], [5, 0.5], [10, 1.2], [15, 2.5], [20, 5.0], [25, 9.7],
    [30, 19.7], [34, 35.0], [35, 42.4], [40, 100.4], [45, 297.5],
  ],
};

/** Where each family's factors are printed, general and local shear, for the output. */
const TABLE_NAME: Record<NgammaFamily, Record<'general' | 'local', string>> = {
  das: {
    general: 'Das, Principles of Foundation Engineering, Table 3.1 (Terzaghi general shear; Nγ after Kumbhojkar 1993)',
    local: "Das, Principles of Foundation Engineering, Table 3.2 (Terzaghi local shear: Table 3.1 read at φ' = atan((2/3)tan φ))",
  },
  bowles: {
    general: 'Terzaghi Nγ table of Bowles, Foundation Analysis and Design [attribution from memory] (higher Nγ: less conservative)',
    local: "Terzaghi Nγ table of Bowles read at φ' = atan((2/3)tan φ) [attribution from memory] (printed charts of this family give N'γ 3.2 at 25°, this 3.42)",
  },
};

export function ngammaFamily(v: unknown): NgammaFamily {
  return v === undefined ? 'das' : choice('Nγ table', v, NGAMMA_FAMILIES);
}

/** A friction angle in radians, 0 ≤ φ ≤ 50°, the range of the table. */
export function frictionAngle(v: unknown): number {
  const phi = finite('phi', v);
  if (phi < 0 || phi > 50 * deg + 1e-12) {
    throw new LibraryError(`friction angle must be between 0 and 50 deg (given in rad: ${phi.toFixed(4)} = ${(phi / deg).toFixed(2)} deg)`);
  }
  return phi;
}

/** φ' = atan((2/3) tan φ) for Terzaghi local shear (Terzaghi 1943, as in Das §3.3) [from memory]. */
export function localPhi(phi: number): number {
  const p = Math.atan((2 / 3) * Math.tan(frictionAngle(phi)));
  working()?.step('phi_local', 'atan(2 / 3 * tan(phi))', p, 'deg', { vars: { phi: [phi, 'deg'] }, clause: 'Terzaghi (1943), local shear [from memory]' });
  return p;
}

/** Nq = e^{2(3π/4 − φ/2)tanφ} / (2cos²(45° + φ/2)) (Terzaghi 1943). */
export function nqTerzaghi(phi: number): number {
  const p = frictionAngle(phi);
  const n = Math.exp(2 * (0.75 * Math.PI - p / 2) * Math.tan(p)) / (2 * Math.cos(Math.PI / 4 + p / 2) ** 2);
  working()?.step('N_q', 'exp(2 * (3 * pi / 4 - phi / 2) * tan(phi)) / (2 * cos(pi / 4 + phi / 2)^2)', n, '', { vars: { phi: [p, 'deg'] }, clause: 'Terzaghi (1943)' });
  return n;
}

/** Nc = (Nq − 1) cot φ, and 1.5π + 1 at φ = 0 (Terzaghi 1943). */
export function ncTerzaghi(phi: number): number {
  const p = frictionAngle(phi);
  const w = working();
  if (p < 1e-9) {
    w?.step('N_c', '1.5 * pi + 1', 1.5 * Math.PI + 1, '', { clause: 'Terzaghi (1943)', note: 'φ = 0' });
    return 1.5 * Math.PI + 1;
  }
  const n = (nqTerzaghi(p) - 1) / Math.tan(p);
  w?.step('N_c', '(N_q - 1) / tan(phi)', n, '', { vars: { phi: [p, 'deg'] }, clause: 'Terzaghi (1943)' });
  return n;
}

/** Nγ from the family's table (Das Table 3.1 by default), log-linear between its rows. */
export function ngammaTerzaghi(phi: number, family: NgammaFamily = 'das'): number {
  const rows = NGAMMA_ROWS[family];
  const d = frictionAngle(phi) / deg;
  const last = rows[rows.length - 1][0];
  if (d > last + 1e-9) throw new LibraryError(`the ${family} Nγ table stops at ${last} deg (given ${d.toFixed(2)} deg)`);
  let i = 0;
  while (i < rows.length - 2 && d > rows[i + 1][0]) i++;
  const [p0, n0] = rows[i];
  const [p1, n1] = rows[i + 1];
  const t = (d - p0) / (p1 - p0);
  const n = n0 === 0 ? n0 + t * (n1 - n0) : n0 * Math.pow(n1 / n0, t);
  working()?.step('N_gamma', n0 === 0 ? `${n0} + (phi - ${p0}) / (${p1} - ${p0}) * (${n1} - ${n0})` : `${n0} * (${n1} / ${n0})^((phi - ${p0}) / (${p1} - ${p0}))`, n, '', {
    vars: { phi: [phi, 'deg'] }, code: true, clause: TABLE_NAME[family].general,
    note: `rows ${p0}° and ${p1}°, ${n0 === 0 ? 'linear' : 'log-linear'} between them`,
  });
  return n;
}

/** Name of the printed table the factors come from, for the output. */
export function terzaghiTable(mode: ShearMode = 'general', family: NgammaFamily = 'das'): string {
  const t = TABLE_NAME[family][mode];
  working()?.lookup('table', t, '', `${mode} shear, ${family} Nγ family`);
  return t;
}

export interface TerzaghiFactors { nc: number; nq: number; ngamma: number; }

/** The three factors at φ (general shear) or at φ' (local shear), Nγ from one family. */
export function terzaghiFactors(phi: number, mode: ShearMode = 'general', family: NgammaFamily = 'das'): TerzaghiFactors {
  const p = mode === 'local' ? localPhi(phi) : frictionAngle(phi);
  const nc = ncTerzaghi(p); // its working shows Nq on the way
  return { nc, nq: quietly(() => nqTerzaghi(p)), ngamma: ngammaTerzaghi(p, family) };
}

/**
 * qu = s_c c Nc + q Nq + s_γ γ B Nγ: strip 1/0.5, square 1.3/0.4, circular 1.3/0.3 (Terzaghi 1943; Das §3.3).
 * Terzaghi gave no rectangle; 'rectangular' (e.g. the effective area B' × L of an eccentric load) takes the
 * lower of his strip and square factors for each term, 1.0 and 0.4, which bounds any rectangle from below.
 */
export function quTerzaghi(c: number, q: number, gamma: number, b: number, phi: number, shape: Shape, mode: ShearMode = 'general', family: NgammaFamily = 'das'): number {
  const f = terzaghiFactors(phi, mode, family);
  const cc = nonNegative('c', c) * (mode === 'local' ? 2 / 3 : 1);
  const sc = shape === 'strip' || shape === 'rectangular' ? 1 : 1.3;
  const sg = shape === 'strip' ? 0.5 : shape === 'circular' ? 0.3 : 0.4;
  const qu = sc * cc * f.nc + nonNegative('q', q) * f.nq + sg * nonNegative('gamma', gamma) * positive('B', b) * f.ngamma;
  const w = working();
  if (w) {
    const vars = { c: [cc, 'psf'], q: [q, 'psf'], gamma: [gamma, 'pcf'], B: [b, 'ft'], N_c: f.nc, N_q: f.nq, N_gamma: f.ngamma } as const;
    if (mode === 'local') w.step('c', '2 / 3 * c', cc, 'psf', { vars: { c: [c, 'psf'] }, clause: "Terzaghi (1943), local shear: c′ = 2c/3" });
    w.step('q_u', `${sc} * c * N_c + q * N_q + ${sg} * gamma * B * N_gamma`, qu, 'psf', {
      vars, clause: 'Terzaghi (1943); Das §3.3', note: `${shape} footing${shape === 'rectangular' ? ': the lower strip/square factors (a bound)' : ''}`,
    });
  }
  return qu;
}

const phiParam: LibParam = { name: 'phi', type: 'rad', doc: 'soil friction angle' };
const modeParam: LibParam = { name: 'shear', type: 'text', choices: SHEAR_MODES, doc: "'general' (default) or 'local' (φ' = atan(2/3 tan φ))" };
const familyParam: LibParam = { name: 'ngamma_table', type: 'text', choices: NGAMMA_FAMILIES, doc: "'das' (default, Das Tables 3.1/3.2) or 'bowles' (higher Nγ, less conservative; only when chosen)" };
const mode = (v: unknown): ShearMode => (v === undefined ? 'general' : choice('shear mode', v, SHEAR_MODES));
const SYMBOL: Record<keyof TerzaghiFactors, string> = { nc: 'N_c', nq: 'N_q', ngamma: 'N_gamma' };
const factor = (k: keyof TerzaghiFactors) => (phi: number, m?: string, fam?: string) => {
  const v = terzaghiFactors(phi, mode(m), ngammaFamily(fam))[k];
  working()?.result(SYMBOL[k], SYMBOL[k], v);
  return v;
};
const LOCAL = "; local shear at φ' = atan((2/3)tanφ) [from memory]";

export const functions: LibFunction[] = [
  defineFunction({
    name: 'nq_terzaghi', params: [phiParam, modeParam], optional: 1, returns: '1',
    clause: 'Terzaghi (1943): Nq = e^{2(3π/4 − φ/2)tanφ}/(2cos²(45° + φ/2))' + LOCAL,
    doc: 'Terzaghi bearing capacity factor Nq', fn: (phi: number, m?: string) => factor('nq')(phi, m),
  }),
  defineFunction({
    name: 'nc_terzaghi', params: [phiParam, modeParam], optional: 1, returns: '1',
    clause: 'Terzaghi (1943): Nc = (Nq − 1)cotφ, 1.5π + 1 at φ = 0' + LOCAL,
    doc: 'Terzaghi bearing capacity factor Nc', fn: (phi: number, m?: string) => factor('nc')(phi, m),
  }),
  defineFunction({
    name: 'ngamma_terzaghi', params: [phiParam, modeParam, familyParam], optional: 2, returns: '1',
    clause: "Das, Principles of Foundation Engineering, Table 3.1 (Nγ after Kumbhojkar 1993) and Table 3.2 (local shear, at φ'); or, when chosen, the Terzaghi table of Bowles [from memory]; log-linear between rows" + LOCAL,
    doc: 'Terzaghi bearing capacity factor Nγ (tabulated, interpolated)', fn: factor('ngamma'),
  }),
  defineFunction({
    name: 'terzaghi_table', params: [modeParam, familyParam], optional: 2, returns: 'text',
    clause: 'Das, Principles of Foundation Engineering, Tables 3.1 and 3.2; Bowles, Foundation Analysis and Design [from memory]',
    doc: 'The printed table the Terzaghi factors come from, as text for the output',
    fn: (m?: string, fam?: string) => terzaghiTable(mode(m), ngammaFamily(fam)),
  }),
  defineFunction({
    name: 'qu_terzaghi',
    params: [
      { name: 'c', type: 'Pa', doc: 'soil cohesion' },
      { name: 'q', type: 'Pa', doc: 'overburden pressure at the footing base (γ·Df)' },
      { name: 'gamma', type: 'N/m^3', doc: 'unit weight of the soil below the base' },
      { name: 'B', type: 'm', doc: 'footing width (diameter if circular)' },
      phiParam,
      { name: 'shape', type: 'text', choices: SHAPES, doc: "'strip', 'square', 'circular' or 'rectangular' (lower bound 1.0cNc, 0.4γBNγ)" },
      modeParam,
      familyParam,
    ],
    optional: 2,
    returns: 'Pa',
    clause: 'Terzaghi (1943): qu = cNc + qNq + 0.5γBNγ; square 1.3cNc + qNq + 0.4γBNγ; circular 1.3cNc + qNq + 0.3γBNγ (Das §3.3); rectangular: the lower strip/square factors, cNc + qNq + 0.4γBNγ (a bound, no Terzaghi form); Nγ from Das Table 3.1' + LOCAL + ", c' = 2c/3",
    doc: 'Ultimate bearing capacity by Terzaghi, general or local shear',
    fn: (c: number, q: number, g: number, b: number, phi: number, s: string, m?: string, fam?: string) =>
      quTerzaghi(c, q, g, b, phi, choice('shape', s, SHAPES), mode(m), ngammaFamily(fam)),
  }),
];
