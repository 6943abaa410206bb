// Gravity load combinations. Strength design: ASCE 7-16 §2.3.1 (same factors as ASCE 7-10
// §2.3.2 and IBC §1605.2) with wind, earthquake and other lateral actions left out. ASD:
// ASCE 7-16 §2.4.1, used for service loads on the soil. The snow factors are those of
// 7-16: ASCE 7-22 moved to strength-level snow loads and changed how S enters the
// combinations (from memory), so S is not labelled 7-22 here.
//
// Each combination is written once on plain numbers; the formula functions come in two
// dimensions: pressures (N/m^2, area loads) and forces (N, column and footing loads).

import { defineFunction, type LibFunction, type LibParam } from './types';
import { nonNegative } from './gravity-args';

/** The variable roof load of the combinations: the larger of Lr, S and R. */
function roofLoad(Lr: number, S: number, R: number): number {
  return Math.max(Lr, S, R);
}

/** ASCE 7-16 §2.3.1 combination 1: 1.4D. */
export function comboU1(D: number): number {
  return 1.4 * D;
}

/** ASCE 7-16 §2.3.1 combination 2: 1.2D + 1.6L + 0.5(Lr or S or R). */
export function comboU2(D: number, L: number, Lr = 0, S = 0, R = 0): number {
  return 1.2 * D + 1.6 * L + 0.5 * roofLoad(Lr, S, R);
}

/** ASCE 7-16 §2.3.1 combination 3 without wind: 1.2D + 1.6(Lr or S or R) + 1.0L (L factor not relaxed to 0.5). */
export function comboU3(D: number, L: number, Lr = 0, S = 0, R = 0): number {
  return 1.2 * D + 1.6 * roofLoad(Lr, S, R) + L;
}

export const STRENGTH_COMBOS = [
  '1.4D',
  '1.2D + 1.6L + 0.5(Lr or S or R)',
  '1.2D + 1.6(Lr or S or R) + L',
] as const;

/** Governing ASCE 7-16 §2.3.1 gravity combination: its value and its index in STRENGTH_COMBOS. */
export function comboUGoverning(D: number, L: number, Lr = 0, S = 0, R = 0): { value: number; index: number } {
  const values = [comboU1(D), comboU2(D, L, Lr, S, R), comboU3(D, L, Lr, S, R)];
  let index = 0;
  for (let i = 1; i < values.length; i++) if (values[i] > values[index]) index = i;
  return { value: values[index], index };
}

/** ASCE 7-16 §2.4.1 combination 2: D + L (service load on the soil). */
export function comboService(D: number, L: number): number {
  return D + L;
}

/** Governing ASCE 7-16 §2.4.1 gravity combination: D; D + L; D + (Lr or S or R); D + 0.75L + 0.75(Lr or S or R). */
export function comboAsd(D: number, L: number, Lr = 0, S = 0, R = 0): number {
  const roof = roofLoad(Lr, S, R);
  return Math.max(D, D + L, D + roof, D + 0.75 * L + 0.75 * roof);
}

// ---- formula functions ------------------------------------------------------------

type Dim = { suffix: string; type: string; what: string };
const DIMS: Dim[] = [
  { suffix: '', type: 'N/m^2', what: 'area load' },
  { suffix: '_force', type: 'N', what: 'force' },
];

const CLAUSE_U = 'ASCE 7-16 §2.3.1 (= ASCE 7-10 §2.3.2)';
const CLAUSE_ASD = 'ASCE 7-16 §2.4.1';

function loadParams(type: string, names: string[]): LibParam[] {
  const docs: Record<string, string> = {
    D: 'dead load', L: 'floor live load', Lr: 'roof live load', S: 'snow load', R: 'rain load',
  };
  return names.map((name) => ({ name, type, doc: docs[name] }));
}

/** Reads and checks the load arguments (all >= 0; roof loads default to 0). */
function loads(args: unknown[]): [number, number, number, number, number] {
  const names = ['D', 'L', 'Lr', 'S', 'R'];
  const v = names.map((n, i) => (i >= 2 && args[i] === undefined ? 0 : nonNegative(n, args[i])));
  return [v[0], v[1], v[2], v[3], v[4]];
}

function forDim(d: Dim): LibFunction[] {
  const n = (base: string) => base + d.suffix;
  const all = loadParams(d.type, ['D', 'L', 'Lr', 'S', 'R']);
  return [
    defineFunction({
      name: n('combo_u1'), params: loadParams(d.type, ['D']), returns: d.type, clause: `${CLAUSE_U} comb. 1`,
      doc: `Factored ${d.what} 1.4D`,
      fn: (D: unknown) => comboU1(nonNegative('D', D)),
    }),
    defineFunction({
      name: n('combo_u2'), params: all, optional: 3, returns: d.type, clause: `${CLAUSE_U} comb. 2`,
      doc: `Factored ${d.what} 1.2D + 1.6L + 0.5(Lr or S or R)`,
      fn: (D?: unknown, L?: unknown, Lr?: unknown, S?: unknown, R?: unknown) =>
        comboU2(...loads([D, L, Lr, S, R])),
    }),
    defineFunction({
      name: n('combo_u3'), params: all, optional: 3, returns: d.type, clause: `${CLAUSE_U} comb. 3`,
      doc: `Factored ${d.what} 1.2D + 1.6(Lr or S or R) + L (no wind)`,
      fn: (D?: unknown, L?: unknown, Lr?: unknown, S?: unknown, R?: unknown) =>
        comboU3(...loads([D, L, Lr, S, R])),
    }),
    defineFunction({
      name: n('combo_u'), params: all, optional: 3, returns: d.type, clause: `${CLAUSE_U} comb. 1-3`,
      doc: `Governing factored gravity ${d.what} (largest of combinations 1-3)`,
      fn: (D?: unknown, L?: unknown, Lr?: unknown, S?: unknown, R?: unknown) =>
        comboUGoverning(...loads([D, L, Lr, S, R])).value,
    }),
    defineFunction({
      name: n('combo_u_governs'), params: all, optional: 3, returns: 'text', clause: `${CLAUSE_U} comb. 1-3`,
      doc: 'Which strength combination governs, as text for the hand calc',
      fn: (D?: unknown, L?: unknown, Lr?: unknown, S?: unknown, R?: unknown) =>
        STRENGTH_COMBOS[comboUGoverning(...loads([D, L, Lr, S, R])).index],
    }),
    defineFunction({
      name: n('combo_service'), params: loadParams(d.type, ['D', 'L']), returns: d.type, clause: `${CLAUSE_ASD} comb. 2`,
      doc: `Service ${d.what} D + L (for soil pressure)`,
      fn: (D: unknown, L: unknown) =>
        comboService(nonNegative('D', D), nonNegative('L', L)),
    }),
    defineFunction({
      name: n('combo_asd'), params: all, optional: 3, returns: d.type, clause: `${CLAUSE_ASD} comb. 1-4`,
      doc: `Governing service (ASD) gravity ${d.what}`,
      fn: (D?: unknown, L?: unknown, Lr?: unknown, S?: unknown, R?: unknown) =>
        comboAsd(...loads([D, L, Lr, S, R])),
    }),
  ];
}

export const functions: LibFunction[] = DIMS.flatMap(forDim);
