// Plan area of a spread footing from service loads on the net allowable soil pressure,
// and the factored net pressure used for its strength design (ACI 318-19 §13.3.1.1).
// Chapter 13 clause numbers here are from memory (not read in a printed copy).

import { LibraryError, defineFunction, type LibFunction } from './types';
import { nonNegative, optional, positive } from './support-args';
import { working } from '../working/recorder';

/** q_net = q_allow − footing weight − fill weight − surcharge: what is left for the column load (common practice). */
export function qNetAllow(qAllow: number, hf: number, gammaC: number, hFill: number, gammaSoil: number, surcharge = 0): number {
  const q = positive('q_allow', qAllow) - positive('h_footing', hf) * positive('gamma_c', gammaC)
    - nonNegative('h_fill', hFill) * nonNegative('gamma_soil', gammaSoil) - nonNegative('surcharge', surcharge);
  if (q <= 0) throw new LibraryError('nothing left of q_allow for the column load: footing, fill and surcharge weigh as much or more');
  working()?.step('q_net', 'q_allow - h_footing * gamma_c - h_fill * gamma_soil - surcharge', q, 'psf', {
    vars: { q_allow: [qAllow, 'psf'], h_footing: [hf, 'in'], gamma_c: [gammaC, 'pcf'], h_fill: [hFill, 'ft'], gamma_soil: [gammaSoil, 'pcf'], surcharge: [surcharge, 'psf'] },
    clause: 'common practice; ACI 318-19 §13.3.1.1 service loads',
  });
  return q;
}

/** A_req = P_service / q_net (ACI 318-19 §13.3.1.1: area from unfactored loads). */
export function aReqFooting(ps: number, qNet: number): number {
  const A = positive('P (service)', ps) / positive('q_net', qNet);
  working()?.step('A_req', 'P / q_net', A, 'ft^2', { vars: { P: [ps, 'kip'], q_net: [qNet, 'psf'] }, clause: 'ACI 318-19 §13.3.1.1' });
  return A;
}

/** qu = Pu / (B L), the factored net soil pressure under a concentric load (ACI 318-19 §13.2.6.1). */
export function quFooting(pu: number, b: number, l: number): number {
  const q = positive('Pu', pu) / (positive('B', b) * positive('L', l));
  working()?.step('q_u', 'Pu / (B * L)', q, 'psf', { vars: { Pu: [pu, 'kip'], B: [b, 'ft'], L: [l, 'ft'] }, clause: 'ACI 318-19 §13.2.6.1' });
  return q;
}

export const functions: LibFunction[] = [
  defineFunction({
    name: 'q_net_allow',
    params: [
      { name: 'q_allow', type: 'Pa', doc: 'allowable gross soil pressure' },
      { name: 'h_footing', type: 'm', doc: 'footing thickness' },
      { name: 'gamma_c', type: 'N/m^3', doc: 'unit weight of concrete' },
      { name: 'h_fill', type: 'm', doc: 'depth of soil fill over the footing' },
      { name: 'gamma_soil', type: 'N/m^3', doc: 'unit weight of the fill' },
      { name: 'surcharge', type: 'Pa', doc: 'slab on grade and surcharge (default 0)' },
    ],
    optional: 1,
    returns: 'Pa',
    clause: 'q_net = q_allow − h_f·γc − h_s·γs − surcharge (common practice; ACI 318-19 §13.3.1.1 service loads)',
    doc: 'Net allowable soil pressure available for the column service load',
    fn: (qa: number, hf: number, gc: number, hs: number, gs: number, sc?: number) =>
      qNetAllow(qa, hf, gc, hs, gs, optional(sc, 0, (v) => nonNegative('surcharge', v))),
  }),
  defineFunction({
    name: 'a_req_footing',
    params: [
      { name: 'P', type: 'N', doc: 'service column load (D + L)' },
      { name: 'q_net', type: 'Pa', doc: 'net allowable soil pressure' },
    ],
    returns: 'm^2',
    clause: 'ACI 318-19 §13.3.1.1: base area from unfactored forces and the permissible soil pressure',
    doc: 'Required plan area of a spread footing',
    fn: aReqFooting,
  }),
  defineFunction({
    name: 'qu_footing',
    params: [
      { name: 'Pu', type: 'N', doc: 'factored column load' },
      { name: 'B', type: 'm', doc: 'footing width' },
      { name: 'L', type: 'm', doc: 'footing length' },
    ],
    returns: 'Pa',
    clause: 'qu = Pu/(B·L), factored net soil pressure (ACI 318-19 §13.2.6.1)',
    doc: 'Factored net soil pressure under a concentrically loaded footing',
    fn: quFooting,
  }),
];
