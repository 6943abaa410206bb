// What the site does to the bearing capacity: groundwater near the base (the submerged unit weight
// in the overburden and in the γ term) and a load off centre (Meyerhof's effective width
// B' = B − 2e). Both as in Das, Principles of Foundation Engineering (the water-table cases and the
// effective-area method; section numbers from memory). And a plain word on IBC's presumptive values.

import { LibraryError, defineFunction, type LibFunction } from './types';
import { nonNegative, positive } from './support-args';
import { psf } from '../units/si';
import { working } from '../working/recorder';

/** Unit weight of water, ρw·g = 1000 kg/m³ × 9.80665 m/s² (62.43 pcf). */
export const GAMMA_W = 9806.65;

export interface WaterTable {
  submerged: number; // γ' = γsat − γw, N/m³
  q: number; // effective overburden at the base, Pa
  gammaBelow: number; // γ for the 0.5γBNγ term, N/m³
  case: 'above base' | 'within B below base' | 'deeper than B';
}

/**
 * Das's three cases, Dw the depth of the water table below grade: Dw ≤ Df: q = γDw + γ'(Df − Dw) and
 * γ' in the γ term; Df < Dw < Df + B: q = γDf and γ' + (Dw − Df)/B·(γ − γ'); Dw ≥ Df + B: no change.
 */
export function waterTable(gamma: number, gammaSat: number, df: number, dw: number, b: number): WaterTable {
  const g = positive('gamma', gamma);
  const gs = positive('gamma_sat', gammaSat);
  if (gs <= GAMMA_W) throw new LibraryError('gamma_sat must exceed the unit weight of water (62.4 pcf, 9.81 kN/m³)');
  const depth = nonNegative('Df', df);
  const water = nonNegative('Dw', dw);
  const width = positive('B', b);
  const submerged = gs - GAMMA_W;
  const w = working();
  const vars = { gamma: [g, 'pcf'], gamma_sat: [gs, 'pcf'], gamma_w: [GAMMA_W, 'pcf'], Df: [depth, 'ft'], Dw: [water, 'ft'], B: [width, 'ft'] } as const;
  w?.step('gamma_sub', 'gamma_sat - gamma_w', submerged, 'pcf', { vars, clause: CASES });
  if (water <= depth) {
    const q = g * water + submerged * (depth - water);
    w?.step('q', 'gamma * Dw + gamma_sub * (Df - Dw)', q, 'psf', { vars, clause: CASES, note: 'water table at or above the base' });
    w?.step('gamma_b', 'gamma_sub', submerged, 'pcf', { note: 'submerged weight in the γ term' });
    return { submerged, q, gammaBelow: submerged, case: 'above base' };
  }
  w?.step('q', 'gamma * Df', g * depth, 'psf', { vars, clause: CASES, note: 'water table below the base: overburden unchanged' });
  if (water < depth + width) {
    const gammaBelow = submerged + ((water - depth) / width) * (g - submerged);
    w?.step('gamma_b', 'gamma_sub + (Dw - Df) / B * (gamma - gamma_sub)', gammaBelow, 'pcf', { vars, clause: CASES, note: 'water table within B below the base' });
    return { submerged, q: g * depth, gammaBelow, case: 'within B below base' };
  }
  w?.step('gamma_b', 'gamma', g, 'pcf', { vars, note: 'water table deeper than B below the base: no change' });
  return { submerged, q: g * depth, gammaBelow: g, case: 'deeper than B' };
}

/** Meyerhof's effective width B' = B − 2e for a load at eccentricity e along B (effective-area method). */
export function effectiveWidth(b: number, e: number): number {
  const width = positive('B', b);
  const ecc = nonNegative('e', e);
  const bEff = width - 2 * ecc;
  if (bEff <= 0) throw new LibraryError('the load is at or beyond the edge of the footing: e ≥ B/2');
  working()?.step('B_eff', 'B - 2 * e', bEff, 'ft', { vars: { B: [width, 'ft'], e: [ecc, 'in'] }, clause: 'Meyerhof (1953) effective area [from memory]' });
  return bEff;
}

/** The least vertical value of IBC Table 1806.2 (class 5, clay and silt), 1500 psf. */
export const LEAST_PRESUMPTIVE = 1500 * psf;

/** A plain word on the pressure used against IBC §1806.2's least presumptive value. */
export function presumptiveNote(q: number): string {
  const used = positive('q', q);
  working()?.step('below_least', 'q < 1500', used < LEAST_PRESUMPTIVE * (1 - 1e-9), '', { vars: { q: [used, 'psf'] }, code: true, clause: 'IBC Table 1806.2' });
  const text = presumptiveText(used);
  working()?.step('note', undefined, text, '', { clause: 'IBC §1806.2, §1803 [from memory]' });
  return text;
}

function presumptiveText(used: number): string {
  if (used < LEAST_PRESUMPTIVE * (1 - 1e-9)) {
    return 'Below 1500 psf, the least presumptive value of IBC Table 1806.2: weaker than any class the table covers, so a geotechnical investigation may be required (IBC §1803).';
  }
  return 'At or above 1500 psf, the least presumptive value of IBC Table 1806.2.';
}

const CASES = 'Das, Principles of Foundation Engineering: water table above the base, within B below it, or deeper [section from memory]';

export const functions: LibFunction[] = [
  defineFunction({
    name: 'q_overburden_gw',
    params: [
      { name: 'gamma', type: 'N/m^3', doc: 'moist unit weight of the soil above the water table' },
      { name: 'gamma_sat', type: 'N/m^3', doc: 'saturated unit weight below the water table' },
      { name: 'Df', type: 'm', doc: 'depth of the base below grade' },
      { name: 'Dw', type: 'm', doc: 'depth of the water table below grade' },
    ],
    returns: 'Pa',
    clause: `${CASES}: q = γDw + (γsat − γw)(Df − Dw) when Dw < Df, else γDf`,
    doc: 'Effective overburden pressure at the footing base with groundwater',
    fn: (g: number, gs: number, df: number, dw: number) => {
      const q = waterTable(g, gs, df, dw, 1).q;
      working()?.result('q', 'q', q, 'psf');
      return q;
    },
  }),
  defineFunction({
    name: 'gamma_bearing_gw',
    params: [
      { name: 'gamma', type: 'N/m^3', doc: 'moist unit weight of the soil' },
      { name: 'gamma_sat', type: 'N/m^3', doc: 'saturated unit weight below the water table' },
      { name: 'Df', type: 'm', doc: 'depth of the base below grade' },
      { name: 'Dw', type: 'm', doc: 'depth of the water table below grade' },
      { name: 'B', type: 'm', doc: 'footing width' },
    ],
    returns: 'N/m^3',
    clause: `${CASES}: γ' = γsat − γw at or above the base, γ' + (Dw − Df)/B·(γ − γ') within B below, γ deeper`,
    doc: 'Unit weight for the 0.5γBNγ term with groundwater',
    fn: (g: number, gs: number, df: number, dw: number, b: number) => waterTable(g, gs, df, dw, b).gammaBelow,
  }),
  defineFunction({
    name: 'b_eff',
    params: [
      { name: 'B', type: 'm', doc: 'footing side along the eccentricity' },
      { name: 'e', type: 'm', doc: 'eccentricity of the load, M/P' },
    ],
    returns: 'm',
    clause: "Meyerhof (1953) effective area, as in Das, Principles of Foundation Engineering: B' = B − 2e [from memory]",
    doc: 'Effective width of a footing under an eccentric load',
    fn: effectiveWidth,
  }),
  defineFunction({
    name: 'presumptive_note',
    params: [{ name: 'q', type: 'Pa', doc: 'allowable soil pressure used' }],
    returns: 'text',
    clause: 'IBC 2021 §1806.2 and Table 1806.2 (least value 1500 psf); §1803 geotechnical investigations [from memory]',
    doc: 'Whether the pressure used is below the least presumptive value of IBC Table 1806.2',
    fn: presumptiveNote,
  }),
];
