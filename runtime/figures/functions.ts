// Figure functions: what a figure cell calls. Each checks its arguments like a library
// function (typed params, plain SI numbers) and returns a figure spec (spec.ts) that a
// renderer draws. They are offered to figure cells only, so no formula holds a drawing.

import { colPs, colPu } from '../library/loads-accumulation';
import { ASCE_EDITIONS, asceEdition } from '../library/loads-combinations';
import { OCCUPANCIES, type Occupancy } from '../library/loads-reduction';
import { solvePlate, TABLE_NU } from '../library/plate';
import { criticalSection, boPunch, POSITIONS, position } from '../library/punching-perimeter';
import { BARS, barDia } from '../library/rebar';
import { choice, finite, nonNegative, positive } from '../library/support-args';
import { SECTION_PARAMS, interactionCurve, momentStrengthAt, pmRatio, sectionOf } from '../library/column-interaction';
import { LibraryError, type ArgsOf, type LibFunction, type LibParam, type SameCount } from '../library/types';
import { EDGE_DOC } from '../plate/edges';
import type { FigureSpec, FootingSpec, InteractionSpec, LoadPathSpec, PlateField, PlateSpec, PunchingSpec } from './spec';

/** A figure function: typed like a library function, returning a spec (units filled in by the engine). */
export type FigureFunction = LibFunction<FigureSpec>;

/**
 * A figure function with its params and its builder kept in step, as defineFunction keeps
 * a library function's: one argument per param, of the param's type; its result is a figure.
 */
export function defineFigure<const Ps extends readonly LibParam[], F extends (...args: ArgsOf<Ps>) => FigureSpec>(
  def: Omit<FigureFunction, 'params' | 'fn' | 'returns'> & { params: Ps; build: F & SameCount<Ps, F> },
): FigureFunction {
  const { build, ...rest } = def;
  return { ...rest, params: [...def.params], returns: 'figure', fn: build };
}

const BLANK = { units: {}, system: 'US' as const };

export function punchingPlan(c1: number, c2: number, d: number, pos: string, x1?: number, x2?: number, dSlab?: number): PunchingSpec {
  const p = position(pos);
  const bo = boPunch(c1, c2, d, p);
  const spec: PunchingSpec = { ...BLANK, figure: 'punching', c1, c2, d, position: p, bo };
  const given = [x1, x2, dSlab].filter((v) => v !== undefined).length;
  if (given === 0) return spec;
  if (given !== 3) throw new LibraryError('a drop panel needs x1, x2 and d_slab together');
  positive('x1 (drop panel size)', x1);
  positive('x2 (drop panel size)', x2);
  positive('d_slab', dSlab);
  const s = criticalSection(c1, c2, d, p);
  if (s.b1 > x1! + 1e-12 || s.b2 > x2! + 1e-12) {
    throw new LibraryError('the drop panel must reach past the critical section at d/2 from the column');
  }
  return { ...spec, drop: { x1: x1!, x2: x2!, dSlab: dSlab!, boOuter: boPunch(x1!, x2!, dSlab!, p) } };
}

export function footingDrawing(B: number, L: number, h: number, c1: number, c2: number, d: number, bar: string, s: number, qu: number): FootingSpec {
  for (const [k, v] of [['B', B], ['L', L], ['h', h], ['c1', c1], ['c2', c2], ['d', d], ['s', s]] as const) positive(k, v);
  nonNegative('qu', qu);
  if (c1 >= L || c2 >= B) throw new LibraryError('the column must be smaller than the footing');
  if (d >= h) throw new LibraryError('d must be less than the footing thickness h');
  if (Math.max(B, L) / s > 400) throw new LibraryError('the bar spacing is too small to draw');
  return { ...BLANK, figure: 'footing', B, L, h, c1, c2, d, bar, db: barDia(bar), s, qu };
}

const FIELDS: readonly PlateField[] = ['w', 'mx', 'my', 'mxy'];

export function plateMap(a: number, b: number, edges: string, field: string, q?: number, h?: number, E?: number, nu?: number): PlateSpec {
  const f = choice('field', field, FIELDS);
  positive('a', a);
  positive('b', b);
  const v = nu ?? TABLE_NU;
  if (!(v >= 0 && v < 0.5)) throw new LibraryError(`nu must be at least 0 and below 0.5, got ${v}`);
  const scaled = q !== undefined;
  if (scaled && f === 'w' && (h === undefined || E === undefined)) {
    throw new LibraryError('a deflection map in real units needs q, h and E (leave out q for the coefficient map)');
  }
  // Unscaled: a unit panel (a = 1, q = 1, D = 1) whose values are the table coefficients.
  const r = scaled
    ? solvePlate({ a, b, edges, q: q!, E: E ?? 1, nu: v, h: h ?? 1 })
    : solvePlate({ a: 1, b: b / a, edges, q: 1, E: 12 * (1 - v * v), nu: v, h: 1 });
  const k = scaled ? 1 : a;
  const ext = r.extremes[f];
  const at = (e: { value: number; x: number; y: number }) => ({ value: e.value, x: e.x * k, y: e.y * k });
  return {
    ...BLANK, figure: 'plate', a, b, edges: r.input.edges, field: f,
    nx: r.x.length, ny: r.y.length, values: Array.from(r[f]), scaled,
    shares: r.edges.map((e) => e.share), max: at(ext.max), min: at(ext.min),
  };
}

export function loadPath(floors: number, AT: number, Dfloor: number, Lfloor: number, Droof: number, Lroof: number,
  wCol: number, hStorey: number, KLL: number, occupancy?: string, Sroof?: number, asce?: string): LoadPathSpec {
  if (!Number.isInteger(floors) || floors < 0 || floors > 60) throw new LibraryError('floors must be a whole number from 0 to 60');
  positive('h_storey', hStorey);
  const occ = occupancy === undefined ? undefined : choice('occupancy', occupancy, OCCUPANCIES);
  const levels = [];
  for (let k = 0; k <= floors; k++) {
    const c = { floors: k, AT, Dfloor, Lfloor, Droof, Lroof, wCol, hStorey, KLL, occupancy: occ as Occupancy | undefined, Sroof, asce: asceEdition(asce) };
    levels.push({ name: k === 0 ? 'Roof' : `Level ${floors - k + 2}`, Pu: colPu(c), Ps: colPs(c) });
  }
  return { ...BLANK, figure: 'load-path', hStorey, asce: asceEdition(asce), levels };
}

export function interactionDiagram(pu: number, mu: number, fc: number, fy: number, b: number, h: number,
  nB: number, nH: number, bar: string, dS: number, ed?: string): InteractionSpec {
  const s = sectionOf(fc, fy, b, h, nB, nH, bar, dS, ed);
  const P = nonNegative('Pu', pu);
  const M = Math.abs(finite('Mu', mu));
  const curve = interactionCurve(s, 140);
  const cap = curve.limits.phiPnMax;
  return {
    ...BLANK, figure: 'interaction', b, h, bar, db: barDia(bar), nB, nH, dS,
    nominal: curve.points.map((q) => ({ p: q.pn, m: q.mn })),
    // The design curve stops at φPn,max (ACI 318-19 §22.4.2.1): flat across the top.
    design: curve.points.map((q) => ({ p: Math.min(q.phiPn, cap), m: q.phiMn })),
    phiPnMax: cap,
    balanced: { p: curve.balanced.pn, m: curve.balanced.mn },
    demand: { p: P, m: M },
    phiMnAtPu: momentStrengthAt(s, P).phiMn,
    ratio: pmRatio(s, P, M),
  };
}

/** A param, its type kept as written ('m', 'text') so defineFigure can check the builder against it. */
const P = <const T extends string>(name: string, type: T, doc: string, choices?: readonly string[]): { name: string; type: T; doc: string; choices?: readonly string[] } =>
  choices ? { name, type, doc, choices } : { name, type, doc };

export const FIGURE_FUNCTIONS: readonly FigureFunction[] = [
  defineFigure({
    name: 'punching_plan',
    params: [
      P('c1', 'm', 'column side perpendicular to the slab edge'), P('c2', 'm', 'column side parallel to the slab edge'),
      P('d', 'm', 'effective depth at the column (the drop panel’s, with a drop)'),
      P('position', 'text', "'interior', 'edge' or 'corner'", POSITIONS),
      P('x1', 'm', 'drop panel size perpendicular to the edge'), P('x2', 'm', 'drop panel size parallel to the edge'),
      P('d_slab', 'm', 'effective depth of the slab outside the drop panel'),
    ],
    optional: 3,
    clause: 'ACI 318-19 §22.6.4.1 (critical sections at d/2)',
    doc: 'Plan of the column with the punching critical section at d/2 (and outside the drop panel)',
    build: punchingPlan,
  }),
  defineFigure({
    name: 'footing_drawing',
    params: [
      P('B', 'm', 'footing width (drawn vertical)'), P('L', 'm', 'footing length (drawn horizontal, the section cut)'),
      P('h', 'm', 'footing thickness'), P('c1', 'm', 'column side along L'), P('c2', 'm', 'column side along B'),
      P('d', 'm', 'effective depth'), P('bar', 'text', 'bottom bar size', BARS), P('s', 'm', 'bar spacing'),
      P('qu', 'Pa', 'factored net soil pressure'),
    ],
    clause: 'ACI 318-19 §13.2.7 (critical sections), §22.6.4.1',
    doc: 'Plan and section of a spread footing to scale: column, shear sections, bars, soil pressure',
    build: footingDrawing,
  }),
  defineFigure({
    name: 'plate_map',
    params: [
      P('a', 'm', 'span along x'), P('b', 'm', 'span along y'), P('edges', 'text', EDGE_DOC),
      P('field', 'text', 'w (deflection), mx, my or mxy (moments)', FIELDS),
      P('q', 'Pa', 'uniform load (leave out for the coefficient map)'), P('h', 'm', 'thickness (for w)'),
      P('E', 'Pa', "Young's modulus (for w)"), P('nu', '1', `Poisson's ratio (default ${TABLE_NU})`),
    ],
    optional: 4,
    clause: 'Kirchhoff plate, conforming finite elements (Loadtrace), cf. Timoshenko & Woinowsky-Krieger Tables 8 and 35',
    doc: 'Shaded map with contours of deflection or moment over a panel, with the load share of each edge',
    build: plateMap,
  }),
  defineFigure({
    name: 'load_path',
    params: [
      P('floors', '1', 'floor levels supported above the lowest storey’s foot (roof not counted)'),
      P('AT', 'm^2', 'tributary area of one level'), P('D_floor', 'N/m^2', 'floor dead load'),
      P('L_floor', 'N/m^2', 'unreduced floor live load'), P('D_roof', 'N/m^2', 'roof dead load'),
      P('Lr', 'N/m^2', 'roof live load'), P('w_col', 'N/m', 'column self-weight per length'),
      P('h_storey', 'm', 'storey height'), P('KLL', '1', 'live load element factor'),
      P('occupancy', 'text', 'general, assembly or garage', OCCUPANCIES),
      P('S_roof', 'N/m^2', 'roof snow load (strength-level under ASCE 7-22; default 0)'),
      P('asce', 'text', "ASCE 7 edition: '7-22' (default) or '7-16'", ASCE_EDITIONS),
    ],
    optional: 3,
    clause: "ASCE 7-22 §2.3.1, §2.4.1 (edition '7-16': ASCE 7-16) on loads accumulated per ASCE 7-22 §4.7",
    doc: 'Elevation of the column from roof to footing with the axial load accumulated at each level',
    build: loadPath,
  }),
  defineFigure({
    name: 'interaction_diagram',
    params: [P('Pu', 'N', 'factored axial load (compression positive)'), P('Mu', 'N*m', 'factored moment about the same axis'), ...SECTION_PARAMS],
    optional: 1,
    clause: 'ACI 318-19 §22.2 (strain compatibility), Table 21.2.2 (φ from εt), §22.4.2.1 (φPn,max)',
    doc: 'P–M interaction diagram of a tied rectangular column, nominal and design, with the factored demand',
    build: interactionDiagram,
  }),
];

/** The figure functions as the formula compiler takes them (result type 'figure'). */
export const figureLibrary: readonly FigureFunction[] = FIGURE_FUNCTIONS;
