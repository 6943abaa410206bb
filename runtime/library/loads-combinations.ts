// Gravity load combinations, wind, earthquake and other lateral actions left out. Strength
// design: ASCE 7-22 §2.3.1; ASD: ASCE 7-22 §2.4.1, used for service loads on the soil. The
// edition matters for snow only: ASCE 7-22 gives strength-level snow loads, entering as 1.0S
// where it leads and 0.3S as a companion, 0.7S in ASD; ASCE 7-16 (service-level S) has 1.6S,
// 0.5S and 1.0S (7-22 factors from memory). D, L, Lr and R take the same factors in both.
//
// Each combination is written once on plain numbers; the formula functions come in two
// dimensions: pressures (N/m^2, area loads) and forces (N, column and footing loads).

import { defineFunction, type LibFunction, type LibParam } from './types';
import { choice, nonNegative } from './gravity-args';
import { working, type Recorder } from '../working/recorder';

export const ASCE_EDITIONS = ['7-22', '7-16'] as const;
export type AsceEdition = (typeof ASCE_EDITIONS)[number];

/** Factors on S: leading (comb. 3), companion (comb. 2), and in ASD (comb. 3 and 4). */
interface SnowFactors { leading: number; companion: number; asd: number }
const SNOW: Record<AsceEdition, SnowFactors> = {
  '7-16': { leading: 1.6, companion: 0.5, asd: 1.0 },
  '7-22': { leading: 1.0, companion: 0.3, asd: 0.7 },
};

/** The ASCE 7 edition; '7-22' when left out. */
export function asceEdition(v: unknown): AsceEdition {
  return choice('ASCE 7 edition', v, ASCE_EDITIONS, '7-22');
}

/**
 * The loads as the working shows them, in the unit the caller showed D in (psf for area
 * loads, kip for forces, guessed by size when nobody said).
 */
function loadVars(w: Recorder, D: number, L = 0, Lr = 0, S = 0, R = 0) {
  const u = w.unitOf('D') || w.unitOf('P_D') || (Math.abs(D) > 20000 ? 'kip' : 'psf');
  return { unit: u, vars: { D: [D, u] as const, L: [L, u] as const, Lr: [Lr, u] as const, S: [S, u] as const, R: [R, u] as const } };
}

/** §2.3.1 combination 1: 1.4D. */
export function comboU1(D: number): number {
  const U = 1.4 * D;
  const w = working();
  if (w) {
    const { unit, vars } = loadVars(w, D);
    w.step('U1', '1.4 * D', U, unit, { vars, clause: 'ASCE 7-22 §2.3.1 comb. 1' });
  }
  return U;
}

/** §2.3.1 combination 2: 1.2D + 1.6L + the companion roof load 0.5Lr, 0.5R or (0.5S | 0.3S by edition). */
export function comboU2(D: number, L: number, Lr = 0, S = 0, R = 0, ed: AsceEdition = '7-22'): number {
  const roofCompanion = Math.max(0.5 * Lr, SNOW[ed].companion * S, 0.5 * R);
  const U = 1.2 * D + 1.6 * L + roofCompanion;
  const w = working();
  if (w) {
    const { unit, vars } = loadVars(w, D, L, Lr, S, R);
    w.step('U2', `1.2 * D + 1.6 * L + max(0.5 * Lr, ${SNOW[ed].companion} * S, 0.5 * R)`, U, unit, {
      vars, clause: `ASCE ${ed} §2.3.1 comb. 2`,
    });
  }
  return U;
}

/** §2.3.1 combination 3 without wind: 1.2D + the leading roof load 1.6Lr, 1.6R or (1.6S | 1.0S) + 1.0L. */
export function comboU3(D: number, L: number, Lr = 0, S = 0, R = 0, ed: AsceEdition = '7-22'): number {
  const roofLeading = Math.max(1.6 * Lr, SNOW[ed].leading * S, 1.6 * R);
  const U = 1.2 * D + roofLeading + L;
  const w = working();
  if (w) {
    const { unit, vars } = loadVars(w, D, L, Lr, S, R);
    w.step('U3', `1.2 * D + max(1.6 * Lr, ${SNOW[ed].leading} * S, 1.6 * R) + L`, U, unit, {
      vars, clause: `ASCE ${ed} §2.3.1 comb. 3`,
    });
  }
  return U;
}

/** The combinations as printed for the hand calc, by edition. */
const COMBO_TEXT: Record<AsceEdition, readonly string[]> = {
  '7-16': ['1.4D', '1.2D + 1.6L + 0.5(Lr or S or R)', '1.2D + 1.6(Lr or S or R) + L'],
  '7-22': ['1.4D', '1.2D + 1.6L + (0.5Lr or 0.3S or 0.5R)', '1.2D + (1.6Lr or 1.0S or 1.6R) + L'],
};

/** ASCE 7-16 text of the strength combinations (kept for callers that name the 7-16 forms). */
export const STRENGTH_COMBOS = COMBO_TEXT['7-16'];

/** Text of the strength combinations of an edition, in the order of comboUGoverning's index. */
export function strengthCombos(ed: AsceEdition = '7-22'): readonly string[] {
  return COMBO_TEXT[ed];
}

/** Governing §2.3.1 gravity combination: its value and its index in strengthCombos(ed). */
export function comboUGoverning(D: number, L: number, Lr = 0, S = 0, R = 0, ed: AsceEdition = '7-22'): { value: number; index: number } {
  const values = [comboU1(D), comboU2(D, L, Lr, S, R, ed), comboU3(D, L, Lr, S, R, ed)];
  let index = 0;
  for (let i = 1; i < values.length; i++) if (values[i] > values[index]) index = i;
  const w = working();
  if (w) {
    w.step('U', 'max(U1, U2, U3)', values[index], w.unitOf('U1'), {
      clause: `ASCE ${ed} §2.3.1`, governs: true, note: `combination ${index + 1} governs: ${COMBO_TEXT[ed][index]}`,
    });
  }
  return { value: values[index], index };
}

/** §2.4.1 combination 2: D + L (service load on the soil). */
export function comboService(D: number, L: number): number {
  const P = D + L;
  const w = working();
  if (w) {
    const { unit, vars } = loadVars(w, D, L);
    w.step('Ps', 'D + L', P, unit, { vars, clause: 'ASCE 7-22 §2.4.1 comb. 2' });
  }
  return P;
}

/** Governing §2.4.1 gravity combination: D; D + L; D + (Lr or S' or R); D + 0.75L + 0.75(Lr or S' or R), S' = 1.0S (7-16) or 0.7S (7-22). */
export function comboAsd(D: number, L: number, Lr = 0, S = 0, R = 0, ed: AsceEdition = '7-22'): number {
  const roof = Math.max(Lr, SNOW[ed].asd * S, R);
  const all = [D, D + L, D + roof, D + 0.75 * L + 0.75 * roof];
  const P = Math.max(...all);
  const w = working();
  if (w) {
    const { unit, vars } = loadVars(w, D, L, Lr, S, R);
    const clause = `ASCE ${ed} §2.4.1`;
    w.step('roof', `max(Lr, ${SNOW[ed].asd} * S, R)`, roof, unit, { vars, clause, note: 'the roof load that leads' });
    const i = all.indexOf(P);
    w.step('Pa', 'max(D, D + L, D + roof, D + 0.75 * L + 0.75 * roof)', P, unit, {
      vars: { D: vars.D, L: vars.L }, clause, governs: true,
      note: `combination ${['1: D', '2: D + L', '3: D + roof', '4: D + 0.75L + 0.75 roof'][i]} governs`,
    });
  }
  return P;
}

// ---- formula functions ------------------------------------------------------------

type Dim = { suffix: string; type: string; what: string };
const DIMS: Dim[] = [
  { suffix: '', type: 'N/m^2', what: 'area load' },
  { suffix: '_force', type: 'N', what: 'force' },
];

const FROM_MEMORY = '7-22 snow factors from memory';
const CLAUSE_U = `ASCE 7-22 §2.3.1 (1.0S leading, 0.3S companion; edition '7-16': ASCE 7-16 §2.3.1, 1.6S, 0.5S) [${FROM_MEMORY}]`;
const CLAUSE_ASD = `ASCE 7-22 §2.4.1 (0.7S; edition '7-16': ASCE 7-16 §2.4.1, 1.0S) [${FROM_MEMORY}]`;

const ASCE: LibParam = { name: 'asce', type: 'text', choices: ASCE_EDITIONS, doc: "ASCE 7 edition: '7-22' (default, strength-level S) or '7-16'" };

function loadParams(type: string, names: string[]): LibParam[] {
  const docs: Record<string, string> = {
    D: 'dead load', L: 'floor live load', Lr: 'roof live load', S: 'snow load (strength-level under 7-22)', R: 'rain load',
  };
  return names.map((name) => ({ name, type, doc: docs[name] }));
}

/** Reads and checks the load arguments (all >= 0; roof loads default to 0) and the edition. */
function loads(args: unknown[]): [number, number, number, number, number, AsceEdition] {
  const names = ['D', 'L', 'Lr', 'S', 'R'];
  const v = names.map((n, i) => (i >= 2 && args[i] === undefined ? 0 : nonNegative(n, args[i])));
  return [v[0], v[1], v[2], v[3], v[4], asceEdition(args[5])];
}

function forDim(d: Dim): LibFunction[] {
  const n = (base: string) => base + d.suffix;
  const all = [...loadParams(d.type, ['D', 'L', 'Lr', 'S', 'R']), ASCE];
  const fn = (f: (...a: ReturnType<typeof loads>) => number | string) =>
    (D?: unknown, L?: unknown, Lr?: unknown, S?: unknown, R?: unknown, ed?: unknown) => f(...loads([D, L, Lr, S, R, ed]));
  return [
    defineFunction({
      name: n('combo_u1'), params: loadParams(d.type, ['D']), returns: d.type, clause: `${CLAUSE_U} comb. 1`,
      doc: `Factored ${d.what} 1.4D`,
      fn: (D: unknown) => comboU1(nonNegative('D', D)),
    }),
    defineFunction({
      name: n('combo_u2'), params: all, optional: 4, returns: d.type, clause: `${CLAUSE_U} comb. 2`,
      doc: `Factored ${d.what} 1.2D + 1.6L + companion roof load`,
      fn: fn(comboU2),
    }),
    defineFunction({
      name: n('combo_u3'), params: all, optional: 4, returns: d.type, clause: `${CLAUSE_U} comb. 3`,
      doc: `Factored ${d.what} 1.2D + leading roof load + L (no wind)`,
      fn: fn(comboU3),
    }),
    defineFunction({
      name: n('combo_u'), params: all, optional: 4, returns: d.type, clause: `${CLAUSE_U} comb. 1-3`,
      doc: `Governing factored gravity ${d.what} (largest of combinations 1-3)`,
      fn: fn((...a) => comboUGoverning(...a).value),
    }),
    defineFunction({
      name: n('combo_u_governs'), params: all, optional: 4, returns: 'text', clause: `${CLAUSE_U} comb. 1-3`,
      doc: 'Which strength combination governs, as text for the hand calc',
      fn: fn((...a) => {
        const text = strengthCombos(a[5])[comboUGoverning(...a).index];
        working()?.step('governs', undefined, text, '', { note: 'the largest of combinations 1-3' });
        return text;
      }),
    }),
    defineFunction({
      name: n('combo_service'), params: loadParams(d.type, ['D', 'L']), returns: d.type, clause: `${CLAUSE_ASD} comb. 2`,
      doc: `Service ${d.what} D + L (for soil pressure)`,
      fn: (D: unknown, L: unknown) =>
        comboService(nonNegative('D', D), nonNegative('L', L)),
    }),
    defineFunction({
      name: n('combo_asd'), params: all, optional: 4, returns: d.type, clause: `${CLAUSE_ASD} comb. 1-4`,
      doc: `Governing service (ASD) gravity ${d.what}`,
      fn: fn(comboAsd),
    }),
  ];
}

export const functions: LibFunction[] = DIMS.flatMap(forDim);
