// What changes along the load path when a column sits at a slab edge or corner rather than
// inside: the tributary area, KLL, the direct design moments at the column line, the
// effective slab width for moment transfer by flexure, and the punching stress with the
// unbalanced moments about both axes. The slab edge is taken flush with the outer column
// faces. Convention as in punching-perimeter.ts: c1 is the column side perpendicular to the
// edge (direction 1, the span whose moment is transferred), c2 the side along it. Plain
// functions on SI numbers with the position as an argument, so a building model can call
// them per column mark.

import { ended, quietly, working, type Recorder } from '../working/recorder';
import { LibraryError, defineFunction, type LibFunction, type LibParam } from './types';
import { finite, nonNegative, optional, positive } from './support-args';
import { POSITIONS, boPunch, criticalSection, position, type Position } from './punching-perimeter';
import { gammaV, sectionProperties } from './punching-moment-transfer';
import { kll } from './loads-reduction';
import { tribArea } from './loads-tributary';
import { END_CASES, ddmCsFraction, ddmCsWidth, ddmEndCoef, ddmInteriorCoef, type EndCase } from './slab-ddm';

/** Where a column stands on a grid of n1 × n2 spans, lines counted from 0 to n (this library's convention: an edge ⟂ direction 1). */
export function columnPosition(n1: number, n2: number, line1: number, line2: number): Position | 'edge along direction 1' {
  const line = (name: string, v: number, n: number) => {
    if (!Number.isInteger(n) || n < 1) throw new LibraryError(`${name === 'line1' ? 'n1' : 'n2'} must be a whole number of spans, at least 1`);
    if (!Number.isInteger(v) || v < 0 || v > n) throw new LibraryError(`${name} must be a whole number from 0 (edge line) to ${n} (got ${v})`);
    return v === 0 || v === n;
  };
  const onEdge1 = line('line1', line1, n1);
  const onEdge2 = line('line2', line2, n2);
  // On a north or south edge line only: the free edge runs along direction 1, which this
  // convention (c1 ⟂ the edge, the moment from the direction-1 span) does not describe.
  const pos = onEdge1 && onEdge2 ? 'corner' : onEdge1 ? 'edge' : onEdge2 ? 'edge along direction 1' : 'interior';
  const w = working();
  if (w) {
    const on = (v: number, n: number, name: string) => (v === 0 || v === n ? `${name} = ${v} is an edge line (0 or ${n})` : `${name} = ${v} lies between the edge lines 0 and ${n}`);
    w.step('edge_1', undefined, onEdge1, '', { note: on(line1, n1, 'line1') });
    w.step('edge_2', undefined, onEdge2, '', { note: on(line2, n2, 'line2') });
    w.step('position', undefined, pos, '', { note: 'both edge lines: corner; line1 only: edge; neither: interior', clause: 'common practice' });
  }
  return pos;
}

/** KLL of ASCE 7-22 Table 4.7-1: 4 interior and exterior columns without cantilever slabs; 3 edge, 2 corner with them. */
export function kllColumn(pos: Position, cantilever = false): number {
  if (pos === 'interior' || !cantilever) return kll(pos === 'interior' ? 'interior-column' : 'exterior-column');
  return kll(pos === 'edge' ? 'edge-column-cantilever' : 'corner-column-cantilever');
}

/** Tributary area with the slab edge flush with the outer column faces (half-bay rule, common practice). */
export function tribAreaColumn(l1: number, l2: number, c1: number, c2: number, pos: Position): number {
  positive('c1', c1);
  positive('c2', c2);
  if (pos === 'interior') return tribArea(l1, l2, 'interior');
  if (pos === 'edge') return tribArea(l1, l2, 'edge', c1 / 2);
  return tribArea(l1, l2, 'corner', c1 / 2, c2 / 2);
}

/** Width of the design frame in direction 1: ℓ2, or for a corner the edge frame ℓ2/2 + c2/2 (ACI 318-19 §8.4.1.2, common practice for the edge). */
export function frameWidth(l2: number, c2: number, pos: Position): number {
  positive('l2', l2);
  positive('c2', c2);
  const width = pos === 'corner' ? l2 / 2 + c2 / 2 : l2;
  working()?.step('b_frame', pos === 'corner' ? 'l2 / 2 + c2 / 2' : 'l2', width, 'ft', {
    vars: { l2: [l2, 'ft'], c2: [c2, 'in'] }, clause: 'ACI 318-19 §8.4.1.2; edge frame at a corner common practice',
    note: pos === 'corner' ? 'edge frame: half the span and half the column to the slab edge' : 'the full transverse span',
  });
  return width;
}

/** Column strip width of the direction-1 frame: 0.25·min(ℓ1, ℓ2) each side (§8.4.1.5); at a corner one side plus c2/2 to the edge. */
export function csWidthColumn(l1: number, l2: number, c2: number, pos: Position): number {
  const full = ddmCsWidth(l1, l2);
  if (pos !== 'corner') return full;
  const width = full / 2 + positive('c2', c2) / 2;
  working()?.step('b_cs_corner', 'b_cs / 2 + c2 / 2', width, 'ft', {
    vars: { c2: [c2, 'in'] }, note: 'one side of the column line, and c2/2 to the slab edge', clause: 'ACI 318-19 §8.4.1.5; edge side common practice',
  });
  return width;
}

/** Negative moment at the column line as a fraction of Mo: 0.65 interior span (§8.10.4.1), the exterior negative of Table 8.10.4.2 at an edge. */
export function ddmColumnCoef(pos: Position, endCase: EndCase = 'no-beams'): number {
  return pos === 'interior' ? ddmInteriorCoef('negative') : ddmEndCoef(endCase, 'negative-exterior');
}

/** Positive moment of the span next to the column: 0.35 interior (§8.10.4.1), the end span of Table 8.10.4.2 at an edge. */
export function ddmSpanCoef(pos: Position, endCase: EndCase = 'no-beams'): number {
  return pos === 'interior' ? ddmInteriorCoef('positive') : ddmEndCoef(endCase, 'positive');
}

/** Column-strip share of that negative moment: Table 8.10.5.1 interior, Table 8.10.5.2 exterior (βt of the edge beam). */
export function csColumnFraction(pos: Position, l2OverL1: number, alphaRatio = 0, betaT = 0): number {
  return ddmCsFraction(pos === 'interior' ? 'negative-interior' : 'negative-exterior', l2OverL1, alphaRatio, betaT);
}

/** bslab = c2 + 1.5h each side of the column; at a corner one side only (ACI 318-19 §8.4.2.2.3). */
export function bSlabTransfer(c2: number, h: number, pos: Position): number {
  positive('c2', c2);
  positive('h', h);
  const width = pos === 'corner' ? c2 + 1.5 * h : c2 + 3 * h;
  working()?.step('b_slab', pos === 'corner' ? 'c2 + 1.5 * h' : 'c2 + 2 * 1.5 * h', width, 'in', {
    vars: { c2: [c2, 'in'], h: [h, 'in'] }, clause: 'ACI 318-19 §8.4.2.2.3',
    note: pos === 'corner' ? '1.5h beyond the one face that is not on an edge' : '1.5h beyond each side face',
  });
  return width;
}

export interface AcrossProperties {
  /** γv for the moment about the axis perpendicular to the edge (roles of b1 and b2 swapped). */
  gammaV: number;
  c: number;
  jc: number;
}

/**
 * The critical section's properties for the moment about the second axis (the axis along
 * direction 1): interior and corner by swapping c1 and c2; edge by the sum over its three
 * sides, symmetric about that axis (ACI 318-19 R8.4.4.2.3, same sum of sides).
 */
export function acrossProperties(c1: number, c2: number, d: number, pos: Position): AcrossProperties {
  if (pos !== 'edge') {
    const s = criticalSection(c2, c1, d, pos);
    const p = sectionProperties(c2, c1, d, pos);
    return { gammaV: gammaV(s.b1, s.b2), c: p.cAB, jc: p.jc };
  }
  const { b1, b2 } = criticalSection(c1, c2, d, pos);
  // The b2 face (across the axis) counts its polar moment; the two b1 faces lie at ±b2/2.
  const jc = (d * b2 ** 3) / 12 + (b2 * d ** 3) / 12 + 2 * b1 * d * (b2 / 2) ** 2;
  return { gammaV: gammaV(b2, b1), c: b2 / 2, jc };
}

export interface BiaxialPunching {
  direct: number;
  fromM1: number;
  fromM2: number;
  vu: number;
}

/**
 * vu = Vu/(bo d) + γv1 Msc1 c1/Jc1 + γv2 Msc2 c2/Jc2, the three added at the corner of the
 * section where they meet (ACI 318-19 R8.4.4.2.3; adding both is conservative, common practice).
 */
export function vuPunchBiaxial(vu: number, msc1: number, msc2: number, c1: number, c2: number, d: number, pos: Position): BiaxialPunching {
  const V = nonNegative('Vu', vu);
  const M1 = Math.abs(finite('Msc1', msc1));
  const M2 = Math.abs(finite('Msc2', msc2));
  const w = working()?.open('vu_punch_biaxial', {
    Vu: [V, 'kip'], Msc1: [msc1, 'kip*ft'], Msc2: [msc2, 'kip*ft'], c1: [c1, 'in'], c2: [c2, 'in'], d: [d, 'in'], position: pos,
  }, 'ACI 318-19 §8.4.4.2.3, R8.4.4.2.3');
  const bo = boPunch(c1, c2, d, pos);
  const p1 = sectionProperties(c1, c2, d, pos);
  const s = quietly(() => criticalSection(c1, c2, d, pos));
  const direct = V / (bo * d);
  const fromM1 = (gammaV(s.b1, s.b2) * M1 * p1.cAB) / p1.jc;
  const across = quietly(() => acrossProperties(c1, c2, d, pos));
  const fromM2 = (across.gammaV * M2 * across.c) / across.jc;
  const out = { direct, fromM1, fromM2, vu: direct + fromM1 + fromM2 };
  if (w) {
    const vars = { Vu: [V, 'kip'], d: [d, 'in'] } as const;
    w.step('v_direct', 'Vu / (bo * d)', direct, 'psi', { vars, clause: 'ACI 318-19 R8.4.4.2.3' });
    w.step('v_M1', 'gamma_v * abs(Msc1) * c_AB / J_c', fromM1, 'psi', { vars: { Msc1: [msc1, 'kip*ft'] }, clause: 'ACI 318-19 R8.4.4.2.3', note: 'the moment from the direction-1 span' });
    acrossSteps(w, c1, c2, d, pos, across);
    w.step('v_M2', 'gamma_v2 * abs(Msc2) * c_2 / J_c2', fromM2, 'psi', { vars: { Msc2: [msc2, 'kip*ft'] }, clause: 'ACI 318-19 R8.4.4.2.3', note: 'the moment about the other axis' });
    w.step('v_u', 'v_direct + v_M1 + v_M2', out.vu, 'psi', { clause: 'common practice', note: 'the three added at the corner of the section where they meet (conservative)' });
  }
  ended(w, out.vu, 'psi');
  return out;
}

/** The section about the second axis, as the working shows it: c1 and c2 exchanged, or the edge's sum over its three sides. */
function acrossSteps(w: Recorder, c1: number, c2: number, d: number, pos: Position, a: AcrossProperties): void {
  const clause = 'ACI 318-19 R8.4.4.2.3';
  const vars = { c1: [c1, 'in'], c2: [c2, 'in'], d: [d, 'in'] } as const;
  if (pos === 'edge') {
    const note = 'the three sides, symmetric about the axis along direction 1';
    w.step('J_c2', 'd * b2^3 / 12 + b2 * d^3 / 12 + 2 * b1 * d * (b2 / 2)^2', a.jc, 'in^4', { vars, clause, note });
    w.step('c_2', 'b2 / 2', a.c, 'in', { clause });
    w.step('gamma_v2', '1 - 1 / (1 + 2 / 3 * sqrt(b2 / b1))', a.gammaV, '', { clause: 'ACI 318-19 Eq. 8.4.2.2.2, 8.4.4.2.2', note: 'b1 and b2 exchanged' });
    return;
  }
  const inside = pos === 'interior';
  const note = 'the section with c1 and c2 exchanged';
  const { b1, b2 } = quietly(() => criticalSection(c2, c1, d, pos));
  w.step('b1_2', inside ? 'c2 + d' : 'c2 + d / 2', b1, 'in', { vars, clause: 'ACI 318-19 §22.6.4.1', note });
  w.step('b2_2', inside ? 'c1 + d' : 'c1 + d / 2', b2, 'in', { vars, clause: 'ACI 318-19 §22.6.4.1' });
  if (inside) w.step('c_2', 'b1_2 / 2', a.c, 'in', { clause });
  else {
    w.step('A_c2', '(b1_2 + b2_2) * d', (b1 + b2) * d, 'in^2', { vars, clause });
    w.step('c_2', 'b1_2 * d * (b1_2 / 2) / A_c2', a.c, 'in', { vars, clause });
  }
  const n = inside ? 2 : 1;
  w.step('J_c2', 'n * (d * b1_2^3 / 12 + b1_2 * d^3 / 12 + b1_2 * d * (b1_2 / 2 - c_2)^2) + b2_2 * d * c_2^2 + (n - 1) * b2_2 * d * (b1_2 - c_2)^2',
    a.jc, 'in^4', { vars: { ...vars, n }, clause });
  w.step('gamma_v2', '1 - 1 / (1 + 2 / 3 * sqrt(b1_2 / b2_2))', a.gammaV, '', { clause: 'ACI 318-19 Eq. 8.4.2.2.2, 8.4.4.2.2' });
}

// ---- formula functions ----------------------------------------------------------------

const POS: LibParam = { name: 'position', type: 'text', choices: POSITIONS, doc: "'interior', 'edge' or 'corner'" };
const END: LibParam = { name: 'end_case', type: 'text', choices: END_CASES, doc: "Table 8.10.4.2 row (default 'no-beams': flat plate without edge beam)" };
const endCase = (v: unknown): EndCase => optional(v, 'no-beams' as EndCase, (x) => {
  if (typeof x === 'string' && (END_CASES as string[]).includes(x)) return x as EndCase;
  throw new LibraryError(`unknown end_case ${String(x)}; expected one of ${END_CASES.join(', ')}`);
});

export const functions: LibFunction[] = [
  defineFunction({
    name: 'column_position',
    params: [{ name: 'n1', type: '1', doc: 'spans in direction 1' }, { name: 'n2', type: '1', doc: 'spans in direction 2' },
      { name: 'line1', type: '1', doc: 'column line in direction 1, 0 at the edge to n1' },
      { name: 'line2', type: '1', doc: 'column line in direction 2, 0 at the edge to n2' }],
    returns: 'text',
    clause: 'Column on an edge line of the grid: edge (lines across direction 1), corner (both), else interior',
    doc: "Position of a column from its grid lines: 'interior', 'edge', 'corner' (or 'edge along direction 1')",
    fn: columnPosition,
  }),
  defineFunction({
    name: 'cs_width_col',
    params: [{ name: 'l1', type: 'm', doc: 'span in direction 1' }, { name: 'l2', type: 'm', doc: 'span in direction 2' },
      { name: 'c2', type: 'm', doc: 'column side along the edge' }, POS],
    returns: 'm',
    clause: 'ACI 318-19 §8.4.1.5: 0.25ℓ1 or 0.25ℓ2 (the smaller) each side of the column line; the edge side of a corner column c2/2 (common practice)',
    doc: 'Column strip width of the direction-1 frame at the column',
    fn: (l1: number, l2: number, c2: number, p: string) => csWidthColumn(l1, l2, c2, position(p)),
  }),
  defineFunction({
    name: 'kll_column',
    params: [POS, { name: 'cantilever', type: 'bool', doc: 'cantilever slab beyond the edge (default false)' }],
    optional: 1,
    returns: '1',
    clause: 'ASCE 7-22 Table 4.7-1 (columns: 4; edge with cantilever slabs 3, corner with cantilever slabs 2)',
    doc: 'Live load element factor KLL of a column by its position',
    fn: (p: string, cant?: boolean) => kllColumn(position(p), cant === undefined ? false : Boolean(cant)),
  }),
  defineFunction({
    name: 'trib_area_col',
    params: [{ name: 'l1', type: 'm', doc: 'span in direction 1 (perpendicular to the edge)' },
      { name: 'l2', type: 'm', doc: 'span in direction 2 (along the edge)' },
      { name: 'c1', type: 'm', doc: 'column side in direction 1' }, { name: 'c2', type: 'm', doc: 'column side in direction 2' }, POS],
    returns: 'm^2',
    clause: 'Half-bay rule, slab edge flush with the outer column faces (common practice)',
    doc: 'Tributary area of an interior, edge or corner column',
    fn: (l1: number, l2: number, c1: number, c2: number, p: string) => tribAreaColumn(l1, l2, c1, c2, position(p)),
  }),
  defineFunction({
    name: 'frame_width',
    params: [{ name: 'l2', type: 'm', doc: 'transverse span' }, { name: 'c2', type: 'm', doc: 'column side along the edge' }, POS],
    returns: 'm',
    clause: 'ACI 318-19 §8.4.1.2 design strip; edge frame ℓ2/2 + c2/2 at a corner (common practice)',
    doc: 'Width of the frame whose moment the column takes in direction 1',
    fn: (l2: number, c2: number, p: string) => frameWidth(l2, c2, position(p)),
  }),
  defineFunction({
    name: 'ddm_column_coef',
    params: [POS, END],
    optional: 1,
    returns: '1',
    clause: 'ACI 318-19 §8.10.4.1 (interior 0.65), Table 8.10.4.2 exterior negative (edge, corner)',
    doc: 'Negative moment at the column line as a fraction of Mo',
    fn: (p: string, e?: string) => ddmColumnCoef(position(p), endCase(e)),
  }),
  defineFunction({
    name: 'ddm_span_coef',
    params: [POS, END],
    optional: 1,
    returns: '1',
    clause: 'ACI 318-19 §8.10.4.1 (interior 0.35), Table 8.10.4.2 positive (end span)',
    doc: 'Positive moment of the span next to the column as a fraction of Mo',
    fn: (p: string, e?: string) => ddmSpanCoef(position(p), endCase(e)),
  }),
  defineFunction({
    name: 'cs_column_fraction',
    params: [POS, { name: 'l2_l1', type: '1', doc: 'ℓ2/ℓ1' }, { name: 'alpha_l2_l1', type: '1', doc: 'αf1ℓ2/ℓ1 (0 for a flat plate)' },
      { name: 'beta_t', type: '1', doc: 'torsional stiffness ratio βt of an edge beam (0 without one)' }],
    optional: 2,
    returns: '1',
    clause: 'ACI 318-19 Table 8.10.5.1 (interior), Table 8.10.5.2 (exterior) [from memory]',
    doc: 'Column-strip share of the negative moment at the column line',
    fn: (p: string, r: number, a?: number, b?: number) =>
      csColumnFraction(position(p), r, optional(a, 0, (v) => nonNegative('alpha_l2_l1', v)), optional(b, 0, (v) => nonNegative('beta_t', v))),
  }),
  defineFunction({
    name: 'b_slab_transfer',
    params: [{ name: 'c2', type: 'm', doc: 'column side along the edge (across the moment)' }, { name: 'h', type: 'm', doc: 'slab (or drop) thickness' }, POS],
    returns: 'm',
    clause: 'ACI 318-19 §8.4.2.2.3: bslab = c2 + 1.5h each side (one side at a corner)',
    doc: 'Effective slab width that takes γf Msc by flexure',
    fn: (c2: number, h: number, p: string) => bSlabTransfer(c2, h, position(p)),
  }),
  defineFunction({
    name: 'vu_punch_biaxial',
    params: [{ name: 'Vu', type: 'N', doc: 'factored shear on the critical section' },
      { name: 'Msc1', type: 'N*m', doc: 'unbalanced moment from the direction-1 span' },
      { name: 'Msc2', type: 'N*m', doc: 'unbalanced moment from the direction-2 span' },
      { name: 'c1', type: 'm', doc: 'column side in direction 1 (perpendicular to the edge)' },
      { name: 'c2', type: 'm', doc: 'column side in direction 2' }, { name: 'd', type: 'm', doc: 'effective depth' }, POS],
    returns: 'Pa',
    clause: 'ACI 318-19 §8.4.4.2.3, R8.4.4.2.3: vu = Vu/(bo d) + Σ γv Msc c/Jc about both axes (added: common practice)',
    doc: 'Largest punching shear stress with unbalanced moments about both axes',
    fn: (v: number, m1: number, m2: number, c1: number, c2: number, d: number, p: string) =>
      vuPunchBiaxial(v, m1, m2, c1, c2, d, position(p)).vu,
  }),
];
