// The moment a flat slab hands to its column, and that moment grown by slenderness in a
// braced (nonsway) frame. ACI 318-19: Eq. 8.10.7.2 at an interior support, 0.3Mo at an
// edge (§8.10.7.3), shared by the columns above and below in proportion to their
// stiffness (§8.10.7.2); the minimum moment Pu(0.6 + 0.03h) (§6.6.4.5.4) and the
// magnifier δ = Cm/(1 − Pu/(0.75Pc)) ≥ 1 with Pc from (EI)eff (§6.6.4.4, §6.6.4.5).
// The code states the minimum eccentricity in inches; it is converted here exactly.

import { LibraryError, defineFunction, type LibFunction, type LibParam } from './types';
import { finite, nonNegative, optional, positive } from './support-args';
import { POSITIONS, position, type Position } from './punching-perimeter';
import { ddmMo } from './slab-ddm';
import { ecConcrete } from './concrete';
import { inch } from '../units/si';
import { working } from '../working/recorder';

/** Msc = 0.07[(qDu + 0.5qLu)ℓ2ℓn² − q′Du ℓ′2 (ℓ′n)²] (ACI 318-19 Eq. 8.10.7.2) [from memory]; the shorter span's dead load only. */
export function mscInterior(qDu: number, qLu: number, l2: number, ln: number, qDu2 = qDu, l2b = l2, ln2 = ln): number {
  const longer = (nonNegative('qDu', qDu) + 0.5 * nonNegative('qLu', qLu)) * positive('l2', l2) * positive('ln', ln) ** 2;
  const shorter = nonNegative("q'Du", qDu2) * positive("l2'", l2b) * positive("ln'", ln2) ** 2;
  const msc = 0.07 * Math.max(0, longer - shorter);
  working()?.step('Msc', '0.07 * max(0, (qDu + 0.5 * qLu) * l2 * ln^2 - qDu2 * l2b * ln2^2)', msc, 'kip*ft', {
    vars: { qDu: [qDu, 'psf'], qLu: [qLu, 'psf'], l2: [l2, 'ft'], ln: [ln, 'ft'], qDu2: [qDu2, 'psf'], l2b: [l2b, 'ft'], ln2: [ln2, 'ft'] },
    clause: 'ACI 318-19 Eq. 8.10.7.2 [from memory]', note: 'dead load only on the shorter span side',
  });
  return msc;
}

/** Msc = 0.3Mo at an edge support (ACI 318-19 §8.10.7.3; 318-11 §13.6.3.6) [from memory]. */
export function mscEdge(mo: number): number {
  const msc = 0.3 * nonNegative('Mo', mo);
  working()?.step('Msc', '0.3 * Mo', msc, 'kip*ft', { vars: { Mo: [mo, 'kip*ft'] }, clause: 'ACI 318-19 §8.10.7.3 [from memory]' });
  return msc;
}

/**
 * The slab moment transferred at the column, by position: Eq. 8.10.7.2 with equal spans
 * each side at an interior column, 0.3Mo at an edge or corner column (for a corner, l2 is
 * the width of the edge frame, from the slab edge to the panel centreline).
 */
export function mscAtColumn(pos: Position, qDu: number, qLu: number, l1: number, l2: number, ln: number): number {
  if (pos === 'interior') return mscInterior(qDu, qLu, l2, ln, qDu, l2, ln);
  const mo = ddmMo(nonNegative('qDu', qDu) + nonNegative('qLu', qLu), l2, ln, l1);
  return mscEdge(mo);
}

/**
 * Share of the slab moment taken by the column below: stiffnesses 4EI/ℓ with the same E
 * (§8.10.7.2, "in direct proportion to their stiffness"; 4EI/ℓ common practice). No column
 * above (ℓ_above = 0): the column below takes it all.
 */
export function colMomentShare(lBelow: number, lAbove: number, iBelow = 1, iAbove = 1): number {
  const kb = positive('I_below', iBelow) / positive('l_below', lBelow);
  const w = working();
  if (nonNegative('l_above', lAbove) === 0) {
    w?.step('share', '1', 1, '', { note: 'no column above: the column below takes it all' });
    return 1;
  }
  const ka = positive('I_above', iAbove) / lAbove;
  w?.step('share', '(I_below / l_below) / (I_below / l_below + I_above / l_above)', kb / (kb + ka), '', {
    vars: { I_below: [iBelow, 'in^4'], l_below: [lBelow, 'ft'], I_above: [iAbove, 'in^4'], l_above: [lAbove, 'ft'] },
    clause: 'ACI 318-19 §8.10.7.2; 4EI/ℓ with the same E (common practice)',
  });
  return kb / (kb + ka);
}

/** M2,min = Pu(0.6 + 0.03h), h and 0.6 in inches (ACI 318-19 Eq. 6.6.4.5.4). */
export function m2Min(pu: number, h: number): number {
  const m = nonNegative('Pu', pu) * (0.6 * inch + 0.03 * positive('h', h));
  working()?.step('M2_min', 'Pu * (0.6 + 0.03 * h)', m, 'kip*in', { vars: { Pu: [pu, 'kip'], h: [h, 'in'] }, code: true, clause: 'ACI 318-19 Eq. 6.6.4.5.4' });
  return m;
}

/** Cm = 0.6 − 0.4 M1/M2, M1/M2 negative in single curvature (ACI 318-19 Eq. 6.6.4.5.3a); no end moments: 1.0. */
export function cmFactor(m1: number, m2: number): number {
  const M1 = finite('M1', m1);
  const M2 = finite('M2', m2);
  if (M2 === 0) {
    if (M1 === 0) {
      working()?.step('Cm', '1', 1, '', { note: 'no end moments', clause: 'ACI 318-19 §6.6.4.5.3' });
      return 1;
    }
    throw new LibraryError('M2 must be the larger end moment: |M1| ≤ |M2|');
  }
  const r = M1 / M2;
  if (Math.abs(r) > 1 + 1e-12) throw new LibraryError(`M2 must be the larger end moment: |M1/M2| = ${Math.abs(r)} > 1`);
  working()?.step('Cm', '0.6 - 0.4 * M1 / M2', 0.6 - 0.4 * r, '', { vars: { M1: [M1, 'kip*ft'], M2: [M2, 'kip*ft'] }, clause: 'ACI 318-19 Eq. 6.6.4.5.3a' });
  return 0.6 - 0.4 * r;
}

export interface EffectiveStiffness {
  ec: number;
  /** Gross moment of inertia b h³/12 about the bending axis. */
  ig: number;
  betaDns: number;
  eiEff: number;
}

/** (EI)eff = 0.4 Ec Ig / (1 + βdns) (ACI 318-19 Eq. 6.6.4.4.4a). */
export function eiEffective(fc: number, b: number, h: number, betaDns: number): EffectiveStiffness {
  const beta = nonNegative('beta_dns', betaDns);
  if (beta > 1) throw new LibraryError(`βdns is a ratio of sustained to total factored axial load, at most 1 (got ${beta})`);
  const ec = ecConcrete(fc);
  const ig = (positive('b', b) * positive('h', h) ** 3) / 12;
  const eiEff = (0.4 * ec * ig) / (1 + beta);
  const w = working();
  if (w) {
    w.step('I_g', 'b * h^3 / 12', ig, 'in^4', { vars: { b: [b, 'in'], h: [h, 'in'] } });
    w.step('EI_eff', '0.4 * Ec * I_g / (1 + beta_dns)', eiEff, 'kip*in^2', { vars: { beta_dns: beta }, clause: 'ACI 318-19 Eq. 6.6.4.4.4a' });
  }
  return { ec, ig, betaDns: beta, eiEff };
}

/** Pc = π²(EI)eff/(kℓu)² (ACI 318-19 Eq. 6.6.4.4.2). */
export function pcColumn(eiEff: number, k: number, lu: number): number {
  const K = positive('k', k);
  if (K > 1) throw new LibraryError(`k for a braced (nonsway) column is at most 1.0 (§6.6.4.4.3), got ${K}`);
  const pc = (Math.PI ** 2 * positive('EI_eff', eiEff)) / (K * positive('lu', lu)) ** 2;
  working()?.step('P_c', 'pi^2 * EI_eff / (k * lu)^2', pc, 'kip', { vars: { EI_eff: [eiEff, 'kip*in^2'], k: K, lu: [lu, 'ft'] }, clause: 'ACI 318-19 Eq. 6.6.4.4.2' });
  return pc;
}

/** δ = Cm/(1 − Pu/(0.75Pc)) ≥ 1.0 (ACI 318-19 Eq. 6.6.4.5.2). */
export function deltaNonsway(pu: number, pc: number, cm: number): number {
  const P = nonNegative('Pu', pu);
  const Pc = positive('Pc', pc);
  const C = positive('Cm', cm);
  if (P >= 0.75 * Pc) {
    throw new LibraryError('Pu ≥ 0.75Pc: the column would buckle before carrying the moment (Eq. 6.6.4.5.2); enlarge it or shorten ℓu');
  }
  const delta = Math.max(1, C / (1 - P / (0.75 * Pc)));
  working()?.step('delta', 'max(1, Cm / (1 - Pu / (0.75 * P_c)))', delta, '', {
    vars: { Cm: C, Pu: [P, 'kip'], P_c: [Pc, 'kip'] }, clause: 'ACI 318-19 Eq. 6.6.4.5.2', governs: delta === 1, note: delta === 1 ? 'not less than 1.0' : undefined,
  });
  return delta;
}

export interface MagnifiedMoment {
  m2: number;
  m2Min: number;
  /** The larger of M2 and M2,min, the moment magnified. */
  m2Used: number;
  cm: number;
  stiffness: EffectiveStiffness;
  pc: number;
  delta: number;
  mc: number;
}

/**
 * Mc = δ·max(M2, M2,min) for a braced column (ACI 318-19 §6.6.4.5); where M2,min governs,
 * Cm = 1.0 (§6.6.4.5.4, the conservative choice it offers).
 */
export function magnifiedMoment(
  pu: number, m1: number, m2: number, fc: number, b: number, h: number, k: number, lu: number, betaDns: number,
): MagnifiedMoment {
  const M2 = Math.abs(finite('M2', m2));
  const w = working()?.open('mc_nonsway', { Pu: [pu, 'kip'], M1: [m1, 'kip*ft'], M2: [m2, 'kip*ft'], fc: [fc, 'psi'], b: [b, 'in'], h: [h, 'in'], k, lu: [lu, 'ft'], beta_dns: betaDns }, 'ACI 318-19 §6.6.4.5');
  const mMin = m2Min(pu, h);
  const m2Used = Math.max(M2, mMin);
  w?.step('M2_used', 'max(abs(M2), M2_min)', m2Used, 'kip*ft', { vars: { M2: [M2, 'kip*ft'] }, governs: mMin > M2, note: mMin > M2 ? 'the minimum moment governs' : undefined });
  let cm = 1;
  if (M2 >= mMin) cm = cmFactor(m1, m2);
  else w?.step('Cm', '1', 1, '', { note: 'M2,min governs: Cm = 1.0', clause: 'ACI 318-19 §6.6.4.5.4' });
  const stiffness = eiEffective(fc, b, h, betaDns);
  const pc = pcColumn(stiffness.eiEff, k, lu);
  const delta = deltaNonsway(pu, pc, cm);
  w?.step('M_c', 'delta * M2_used', delta * m2Used, 'kip*ft', { clause: 'ACI 318-19 Eq. 6.6.4.5.1' });
  w?.end(delta * m2Used, 'kip*ft');
  return { m2: M2, m2Min: mMin, m2Used, cm, stiffness, pc, delta, mc: delta * m2Used };
}

// ---- formula functions ----------------------------------------------------------------

const P = (name: string, type: string, doc: string): LibParam => ({ name, type, doc });
const MAG_PARAMS: LibParam[] = [
  P('Pu', 'N', 'factored axial load'),
  P('M1', 'N*m', 'smaller end moment (negative with M2 in single curvature)'),
  P('M2', 'N*m', 'larger end moment'),
  P('fc', 'Pa', "concrete strength f'c"),
  P('b', 'm', 'column side parallel to the bending axis'),
  P('h', 'm', 'column side in the direction of bending'),
  P('k', '1', 'effective length factor, ≤ 1.0 (braced)'),
  P('lu', 'm', 'unsupported length'),
  P('beta_dns', '1', 'sustained (factored dead) over total factored axial load'),
];

export const functions: LibFunction[] = [
  defineFunction({
    name: 'msc_interior',
    params: [P('qDu', 'Pa', 'factored dead load'), P('qLu', 'Pa', 'factored live load'), P('l2', 'm', 'transverse span, longer span side'),
      P('ln', 'm', 'clear span, longer span side'), P('qDu2', 'Pa', 'factored dead load, shorter span side'),
      P('l2b', 'm', 'transverse span, shorter span side'), P('ln2', 'm', 'clear span, shorter span side')],
    optional: 3,
    returns: 'N*m',
    clause: "ACI 318-19 Eq. 8.10.7.2: Msc = 0.07[(qDu + 0.5qLu)ℓ2ℓn² − q'Du ℓ'2(ℓ'n)²] [from memory]",
    doc: 'Unbalanced slab moment at an interior column, to the columns above and below (equal spans when the last three are left out)',
    fn: (d: number, l: number, l2: number, ln: number, d2?: number, l2b?: number, ln2?: number) =>
      mscInterior(d, l, l2, ln, optional(d2, d, (v) => nonNegative("q'Du", v)), optional(l2b, l2, (v) => positive("l2'", v)),
        optional(ln2, ln, (v) => positive("ln'", v))),
  }),
  defineFunction({
    name: 'msc_column',
    params: [{ name: 'position', type: 'text', choices: POSITIONS, doc: "'interior', 'edge' or 'corner'" }, P('qDu', 'Pa', 'factored dead load'),
      P('qLu', 'Pa', 'factored live load'), P('l1', 'm', 'span in the direction of the moment'),
      P('l2', 'm', 'width of the frame (edge frame for a corner: slab edge to panel centreline)'), P('ln', 'm', 'clear span')],
    returns: 'N*m',
    clause: 'ACI 318-19 Eq. 8.10.7.2 (interior, equal spans), §8.10.7.3: 0.3Mo (edge) [from memory]',
    doc: 'Slab moment transferred at the column, by its position',
    fn: (p: string, d: number, l: number, l1: number, l2: number, ln: number) => mscAtColumn(position(p), d, l, l1, l2, ln),
  }),
  defineFunction({
    name: 'col_moment_share',
    params: [P('l_below', 'm', 'length of the column below the slab'), P('l_above', 'm', 'length of the column above (0: none)'),
      P('I_below', 'm^4', 'moment of inertia below (default equal)'), P('I_above', 'm^4', 'moment of inertia above (default equal)')],
    optional: 2,
    returns: '1',
    clause: 'ACI 318-19 §8.10.7.2: in proportion to the column stiffnesses, 4EI/ℓ (common practice)',
    doc: 'Fraction of the slab moment taken by the column below',
    fn: (lb: number, la: number, ib?: number, ia?: number) =>
      colMomentShare(lb, la, optional(ib, 1, (v) => positive('I_below', v)), optional(ia, 1, (v) => positive('I_above', v))),
  }),
  defineFunction({
    name: 'm2_min',
    params: [P('Pu', 'N', 'factored axial load'), P('h', 'm', 'column side in the direction of bending')],
    returns: 'N*m',
    clause: 'ACI 318-19 Eq. 6.6.4.5.4: M2,min = Pu(0.6 + 0.03h), in.',
    doc: 'Minimum moment about one axis of a column, for each axis separately',
    fn: m2Min,
  }),
  defineFunction({
    name: 'cm_factor',
    params: [MAG_PARAMS[1], MAG_PARAMS[2]],
    returns: '1',
    clause: 'ACI 318-19 Eq. 6.6.4.5.3a: Cm = 0.6 − 0.4M1/M2 (no transverse load between supports)',
    doc: 'Equivalent uniform moment factor of a braced column',
    fn: cmFactor,
  }),
  defineFunction({
    name: 'ei_eff',
    params: [MAG_PARAMS[3], MAG_PARAMS[4], MAG_PARAMS[5], MAG_PARAMS[8]],
    returns: 'N*m^2',
    clause: 'ACI 318-19 Eq. 6.6.4.4.4a: (EI)eff = 0.4EcIg/(1 + βdns), Ec = 57,000√f\'c psi',
    doc: 'Effective flexural stiffness of a column for moment magnification',
    fn: (fc: number, b: number, h: number, beta: number) => eiEffective(fc, b, h, beta).eiEff,
  }),
  defineFunction({
    name: 'pc_column',
    params: [P('EI_eff', 'N*m^2', 'effective flexural stiffness'), MAG_PARAMS[6], MAG_PARAMS[7]],
    returns: 'N',
    clause: 'ACI 318-19 Eq. 6.6.4.4.2: Pc = π²(EI)eff/(kℓu)²',
    doc: 'Critical buckling load of a braced column',
    fn: pcColumn,
  }),
  defineFunction({
    name: 'delta_ns',
    params: [MAG_PARAMS[0], P('Pc', 'N', 'critical buckling load'), P('Cm', '1', 'equivalent uniform moment factor')],
    returns: '1',
    clause: 'ACI 318-19 Eq. 6.6.4.5.2: δ = Cm/(1 − Pu/(0.75Pc)) ≥ 1.0',
    doc: 'Moment magnifier of a braced (nonsway) column',
    fn: deltaNonsway,
  }),
  defineFunction({
    name: 'mc_nonsway',
    params: MAG_PARAMS,
    returns: 'N*m',
    clause: 'ACI 318-19 §6.6.4.5: Mc = δ·max(M2, M2,min), Cm = 1.0 where M2,min governs (§6.6.4.5.4)',
    doc: 'Magnified design moment of a braced column',
    fn: (...a: [number, number, number, number, number, number, number, number, number]) => magnifiedMoment(...a).mc,
  }),
];
