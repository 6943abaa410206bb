// Ribbed (joist) slabs: a topping hf over ribs of width bw at spacing s, overall depth h.
// Compared with a solid slab of the same depth: the weight saved (equivalent solid
// thickness by volume) and the bending stiffness kept (gross moment of inertia of one
// T-shaped rib of flange width s, parallel-axis theorem — mechanics, common practice).
// Tapered ribs: give the average rib width.

import { defineFunction, LibraryError, type LibFunction } from './types';
import { positive, show } from './gravity-args';
import { working } from '../working/recorder';

interface Rib { h: number; hf: number; bw: number; s: number }

function rib(h: number, hf: number, bw: number, s: number): Rib {
  const r = { h: positive('h', h), hf: positive('hf', hf), bw: positive('bw', bw), s: positive('s', s) };
  if (r.hf >= r.h) throw new LibraryError(`topping hf = ${show(r.hf)} m must be thinner than the depth h = ${show(r.h)} m`);
  if (r.bw > r.s) throw new LibraryError(`rib width bw = ${show(r.bw)} m exceeds the rib spacing s = ${show(r.s)} m`);
  return r;
}

/** Equivalent solid thickness by volume: (s·hf + bw·(h − hf))/s (geometry). */
export function ribHEq(h: number, hf: number, bw: number, s: number): number {
  const r = rib(h, hf, bw, s);
  const heq = (r.s * r.hf + r.bw * (r.h - r.hf)) / r.s;
  working()?.step('h_eq', '(s * hf + bw * (h - hf)) / s', heq, 'in', { vars: ribVars(r), clause: 'geometry (common practice)' });
  return heq;
}

/** The rib's sizes as the working shows them. */
function ribVars(r: Rib) {
  return { h: [r.h, 'in'], hf: [r.hf, 'in'], bw: [r.bw, 'in'], s: [r.s, 'in'] } as const;
}

/** Fraction of the self-weight saved against a solid slab of the same depth: 1 − h_eq/h. */
export function ribSaving(h: number, hf: number, bw: number, s: number): number {
  const saving = 1 - ribHEq(h, hf, bw, s) / positive('h', h);
  working()?.step('saving', '1 - h_eq / h', saving, '', { vars: { h: [h, 'in'] } });
  return saving;
}

/** Gross moment of inertia of one T-section rib (flange width s) about its centroid (parallel-axis theorem). */
export function ribI(h: number, hf: number, bw: number, s: number): number {
  const r = rib(h, hf, bw, s);
  const web = r.h - r.hf;
  const aF = r.s * r.hf;
  const aW = r.bw * web;
  const yF = r.hf / 2; // from the top
  const yW = r.hf + web / 2;
  const y = (aF * yF + aW * yW) / (aF + aW);
  const I = (r.s * r.hf ** 3) / 12 + aF * (y - yF) ** 2 + (r.bw * web ** 3) / 12 + aW * (y - yW) ** 2;
  const w = working();
  if (w) {
    const clause = 'parallel-axis theorem (common practice)';
    w.step('y_bar', '(s * hf * hf / 2 + bw * (h - hf) * (hf + (h - hf) / 2)) / (s * hf + bw * (h - hf))', y, 'in', { vars: ribVars(r), clause, note: 'centroid from the top' });
    w.step('I_rib', 's * hf^3 / 12 + s * hf * (y_bar - hf / 2)^2 + bw * (h - hf)^3 / 12 + bw * (h - hf) * (y_bar - (hf + (h - hf) / 2))^2', I, 'in^4', { vars: ribVars(r), clause });
  }
  return I;
}

/** Share of the solid slab's moment of inertia kept by the ribbed slab: I_rib / (s h³/12). */
export function ribIRatio(h: number, hf: number, bw: number, s: number): number {
  const ratio = ribI(h, hf, bw, s) / ((s * h ** 3) / 12);
  working()?.step('I_ratio', 'I_rib / (s * h^3 / 12)', ratio, '', { vars: { s: [s, 'in'], h: [h, 'in'] } });
  return ratio;
}

/** Solid thickness with the same moment of inertia per unit width: (12 I_rib / s)^(1/3). */
export function ribHStiff(h: number, hf: number, bw: number, s: number): number {
  const hs = Math.cbrt((12 * ribI(h, hf, bw, s)) / s);
  working()?.step('h_stiff', 'cbrt(12 * I_rib / s)', hs, 'in', { vars: { s: [s, 'in'] } });
  return hs;
}

const PARAMS = [
  { name: 'h', type: 'm', doc: 'overall depth (topping + rib)' },
  { name: 'hf', type: 'm', doc: 'topping thickness' },
  { name: 'bw', type: 'm', doc: 'rib width (average if tapered)' },
  { name: 's', type: 'm', doc: 'rib spacing centre to centre' },
];
const CLAUSE = 'Gross T-section, parallel-axis theorem (common practice)';
type F = (h: number, hf: number, bw: number, s: number) => number;
const wrap = (f: F) => (h: number, hf: number, bw: number, s: number) => f(h, hf, bw, s);

export const functions: LibFunction[] = [
  defineFunction({
    name: 'rib_h_eq', params: PARAMS, returns: 'm', clause: 'Geometry: volume per unit area (common practice)',
    doc: 'Equivalent solid thickness by weight of a ribbed slab', fn: wrap(ribHEq),
  }),
  defineFunction({
    name: 'rib_saving', params: PARAMS, returns: '1', clause: 'Geometry: volume per unit area (common practice)',
    doc: 'Self-weight saved against a solid slab of the same depth', fn: wrap(ribSaving),
  }),
  defineFunction({
    name: 'rib_i', params: PARAMS, returns: 'm^4', clause: CLAUSE,
    doc: 'Gross moment of inertia of one rib (T-section of flange width s)', fn: wrap(ribI),
  }),
  defineFunction({
    name: 'rib_i_ratio', params: PARAMS, returns: '1', clause: CLAUSE,
    doc: 'Moment of inertia kept against a solid slab of the same depth', fn: wrap(ribIRatio),
  }),
  defineFunction({
    name: 'rib_h_stiff', params: PARAMS, returns: 'm', clause: CLAUSE,
    doc: 'Solid slab thickness of the same bending stiffness', fn: wrap(ribHStiff),
  }),
];
