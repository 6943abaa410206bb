// Axial load accumulated down a column: the roof plus `floors` floor levels above the
// section, each with the same tributary area, and one storey of column self-weight per
// level carried (the section is at the foot of its own storey). Floor live load is reduced
// once for the summed area of all floors supported (ASCE 7-22 §4.7.2, AT summed over the
// floors, commentary C4.7); roof live load and snow are taken unreduced (conservative). The
// combinations follow the ASCE 7 edition given (7-22 by default; it matters for snow only).

import { defineFunction, type LibFunction } from './types';
import { choice, count, nonNegative, positive } from './gravity-args';
import { liveReduced, OCCUPANCIES, type Occupancy } from './loads-reduction';
import { ASCE_EDITIONS, asceEdition, comboAsd, comboUGoverning, type AsceEdition } from './loads-combinations';
import { ended, working } from '../working/recorder';

export interface ColumnLoads {
  floors: number;
  AT: number; // tributary area of one level, m²
  Dfloor: number; // floor dead load incl. slab self-weight, Pa
  Lfloor: number; // unreduced floor live load Lo, Pa
  Droof: number; // roof dead load, Pa
  Lroof: number; // roof live load Lr, Pa
  wCol: number; // column self-weight per metre, N/m
  hStorey: number; // storey height, m
  KLL: number;
  occupancy?: Occupancy;
  Sroof?: number; // roof snow load, Pa (strength-level under ASCE 7-22)
  asce?: AsceEdition;
}

function checked(c: ColumnLoads): Required<ColumnLoads> {
  return {
    floors: count('floors', c.floors, 0),
    AT: positive('AT', c.AT),
    Dfloor: nonNegative('D_floor', c.Dfloor),
    Lfloor: nonNegative('L_floor', c.Lfloor),
    Droof: nonNegative('D_roof', c.Droof),
    Lroof: nonNegative('Lr', c.Lroof),
    wCol: nonNegative('w_col', c.wCol),
    hStorey: positive('h_storey', c.hStorey),
    KLL: positive('KLL', c.KLL),
    occupancy: choice('occupancy', c.occupancy, OCCUPANCIES, 'general'),
    Sroof: c.Sroof === undefined ? 0 : nonNegative('S_roof', c.Sroof),
    asce: asceEdition(c.asce),
  };
}

/** Dead load at the foot of the storey: roof + floors × floor dead load over AT, plus (floors + 1) storeys of column (statics). */
export function colDead(c: ColumnLoads): number {
  const k = checked(c);
  const D = k.AT * (k.Droof + k.floors * k.Dfloor) + (k.floors + 1) * k.wCol * k.hStorey;
  working()?.step('P_D', 'AT * (D_roof + floors * D_floor) + (floors + 1) * w_col * h_storey', D, 'kip', { vars: varsOf(k), clause: 'statics' });
  return D;
}

/** The loads as the working shows them. */
function varsOf(k: Required<ColumnLoads>) {
  return {
    floors: k.floors, AT: [k.AT, 'ft^2'], D_floor: [k.Dfloor, 'psf'], L_floor: [k.Lfloor, 'psf'], D_roof: [k.Droof, 'psf'],
    Lr: [k.Lroof, 'psf'], S_roof: [k.Sroof, 'psf'], w_col: [k.wCol, 'klf'], h_storey: [k.hStorey, 'ft'],
  } as const;
}

/** Reduced floor live load carried: ASCE 7-22 §4.7.2 with AT summed over the floors supported. */
export function colLive(c: ColumnLoads): number {
  const k = checked(c);
  const w = working();
  if (k.floors === 0) {
    w?.step('P_L', '0', 0, 'kip', { note: 'no floors above: roof loads only' });
    return 0;
  }
  const area = k.floors * k.AT;
  w?.step('AT_sum', 'floors * AT', area, 'ft^2', { vars: varsOf(k), clause: 'ASCE 7-22 §4.7.2, C4.7 (AT summed over the floors)' });
  const reduced = liveReduced(k.Lfloor, area, k.KLL, k.floors, k.occupancy);
  const L = area * reduced;
  w?.step('P_L', 'AT_sum * L_red', L, 'kip', { vars: { L_red: [reduced, 'psf'] }, clause: 'ASCE 7-22 §4.7.2' });
  return L;
}

/** Roof live load carried (unreduced). */
export function colRoofLive(c: ColumnLoads): number {
  const k = checked(c);
  const Lr = k.AT * k.Lroof;
  working()?.step('P_Lr', 'AT * Lr', Lr, 'kip', { vars: varsOf(k), note: 'roof live load, not reduced (conservative)' });
  return Lr;
}

/** Roof snow carried (unreduced). */
export function colRoofSnow(c: ColumnLoads): number {
  const k = checked(c);
  const S = k.AT * k.Sroof;
  working()?.step('P_S', 'AT * S_roof', S, 'kip', { vars: varsOf(k), note: 'roof snow, not reduced' });
  return S;
}

/** Factored axial load: governing ASCE 7-22 §2.3.1 (or 7-16) gravity combination of the accumulated D, L, Lr, S. */
export function colPu(c: ColumnLoads): number {
  const ed = checked(c).asce;
  return comboUGoverning(colDead(c), colLive(c), colRoofLive(c), colRoofSnow(c), 0, ed).value;
}

/** Service axial load: governing ASCE 7-22 §2.4.1 (or 7-16) gravity combination of the accumulated D, L, Lr, S. */
export function colPs(c: ColumnLoads): number {
  const ed = checked(c).asce;
  return comboAsd(colDead(c), colLive(c), colRoofLive(c), colRoofSnow(c), 0, ed);
}

// ---- formula functions ------------------------------------------------------------

const PARAMS = [
  { name: 'floors', type: '1', doc: 'floor levels supported above the section (roof not counted)' },
  { name: 'AT', type: 'm^2', doc: 'tributary area of one level' },
  { name: 'D_floor', type: 'N/m^2', doc: 'floor dead load incl. slab self-weight' },
  { name: 'L_floor', type: 'N/m^2', doc: 'unreduced floor live load Lo' },
  { name: 'D_roof', type: 'N/m^2', doc: 'roof dead load' },
  { name: 'Lr', type: 'N/m^2', doc: 'roof live load' },
  { name: 'w_col', type: 'N/m', doc: 'column self-weight per length' },
  { name: 'h_storey', type: 'm', doc: 'storey height' },
  { name: 'KLL', type: '1', doc: 'live load element factor' },
  { name: 'occupancy', type: 'text', choices: OCCUPANCIES, doc: 'general, assembly or garage' },
  { name: 'S_roof', type: 'N/m^2', doc: 'roof snow load (strength-level under ASCE 7-22; default 0)' },
  { name: 'asce', type: 'text', choices: ASCE_EDITIONS, doc: "ASCE 7 edition: '7-22' (default) or '7-16'" },
];

type Args = [number, number, number, number, number, number, number, number, number, Occupancy?, number?, AsceEdition?];
const pack = ([floors, AT, Dfloor, Lfloor, Droof, Lroof, wCol, hStorey, KLL, occupancy, Sroof, asce]: Args): ColumnLoads =>
  ({ floors, AT, Dfloor, Lfloor, Droof, Lroof, wCol, hStorey, KLL, occupancy, Sroof, asce });

function entry(name: string, clause: string, doc: string, f: (c: ColumnLoads) => number): LibFunction {
  return defineFunction({
    name, params: PARAMS, optional: 3, returns: 'N', clause, doc,
    fn: (a: number, b: number, c: number, d: number, e: number, g: number, h: number, i: number, j: number, k?: Occupancy, sr?: number, ed?: AsceEdition) => {
      // The column's own working, so the live load reduction inside it is a call of its own.
      const w = working()?.open(name, {}, clause);
      return ended(w, f(pack([a, b, c, d, e, g, h, i, j, k, sr, ed])), 'kip');
    },
  });
}

export const functions: LibFunction[] = [
  entry('col_dead', 'Statics (tributary area × load per level + column weight)',
    'Accumulated dead load at the foot of the storey', colDead),
  entry('col_live', 'ASCE 7-22 §4.7.2-4.7.5 (AT summed over floors)',
    'Accumulated reduced floor live load', colLive),
  entry('col_pu', "ASCE 7-22 §2.3.1 on accumulated D, L (§4.7), Lr, S (edition '7-16': ASCE 7-16 §2.3.1) [7-22 snow factors from memory]",
    'Factored column axial load, governing gravity combination', colPu),
  entry('col_ps', "ASCE 7-22 §2.4.1 on accumulated D, L (§4.7), Lr, S (edition '7-16': ASCE 7-16 §2.4.1) [7-22 snow factors from memory]",
    'Service column axial load, governing ASD gravity combination', colPs),
];
