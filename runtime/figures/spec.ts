// Figure specs: plain JSON data a figure function returns and a renderer draws.
// Every length, force and pressure is in SI base units (m, N, Pa); `units` says in
// which display unit to label each quantity (taken from the cells the figure reads).

export type UnitSystem = 'US' | 'SI';

export interface FigureBase {
  /** Display unit per parameter name (e.g. { c1: 'in', qu: 'ksf' }), where one is known. */
  units: Record<string, string>;
  /** The sheet's unit system, for quantities no argument fixes. */
  system: UnitSystem;
}

export interface PunchingSpec extends FigureBase {
  figure: 'punching';
  c1: number;
  c2: number;
  /** Effective depth at the column (the drop panel's, when there is one). */
  d: number;
  position: 'interior' | 'edge' | 'corner';
  /** Perimeter of the section at d/2 from the column face (ACI 318-19 §22.6.4.1). */
  bo: number;
  /** Drop panel x1 (perpendicular to the edge) × x2, with the slab's d outside it. */
  drop?: { x1: number; x2: number; dSlab: number; boOuter: number };
}

export interface FootingSpec extends FigureBase {
  figure: 'footing';
  /** Width (drawn vertical in plan) and length (horizontal), m. */
  B: number;
  L: number;
  h: number;
  /** Column side along L and along B. */
  c1: number;
  c2: number;
  d: number;
  bar: string;
  /** Bar diameter, m, and spacing, m. */
  db: number;
  s: number;
  /** Factored net soil pressure, Pa. */
  qu: number;
}

export type PlateField = 'w' | 'mx' | 'my' | 'mxy';

export interface PlateSpec extends FigureBase {
  figure: 'plate';
  a: number;
  b: number;
  edges: string;
  field: PlateField;
  /** Grid nodes along x and y; value (ix, iy) at iy·nx + ix. */
  nx: number;
  ny: number;
  values: number[];
  /** True: values in SI (m or N·m/m); false: table coefficients (α or β). */
  scaled: boolean;
  /** Share of the load reaching each edge, in code order x=0, y=0, x=a, y=b. */
  shares: number[];
  max: { value: number; x: number; y: number };
  min: { value: number; x: number; y: number };
}

export interface LoadLevel {
  /** 'Roof', 'Floor 5', ... */
  name: string;
  /** Factored and service axial load at the foot of the storey below this level, N. */
  Pu: number;
  Ps: number;
}

export interface LoadPathSpec extends FigureBase {
  figure: 'load-path';
  hStorey: number;
  /** ASCE 7 edition of the load combinations, e.g. '7-22'. */
  asce: string;
  /** From the roof down; the last one bears on the footing. */
  levels: LoadLevel[];
}

/** A point of an interaction diagram: axial force (compression positive), N, and moment, N·m. */
export interface PMPoint {
  p: number;
  m: number;
}

export interface InteractionSpec extends FigureBase {
  figure: 'interaction';
  /** Section: b across the bending axis, h in the direction of bending, m; bars on each face. */
  b: number;
  h: number;
  bar: string;
  db: number;
  nB: number;
  nH: number;
  dS: number;
  /** Nominal (Pn, Mn) and design (φPn, φMn) curves from pure compression to pure tension. */
  nominal: PMPoint[];
  design: PMPoint[];
  /** The cap φPn,max (ACI 318-19 §22.4.2.1) and the balanced point (nominal). */
  phiPnMax: number;
  balanced: PMPoint;
  /** The factored demand (Pu, Mu), φMn at Pu and the ratio along the load line. */
  demand: PMPoint;
  phiMnAtPu: number;
  ratio: number;
}

export type FigureSpec = PunchingSpec | FootingSpec | PlateSpec | LoadPathSpec | InteractionSpec;

/** One plotted result of a sweep. */
export interface SweepSeries {
  name: string;
  /** 'value': a formula result; 'ratio': a demand/capacity check; 'condition': a yes/no check. */
  kind: 'value' | 'ratio' | 'condition';
  /** Display unit of the value ('' for ratios and pure numbers). */
  unit: string;
  /** One per point: SI value (ratio for checks), or null where the calc broke. */
  values: (number | null)[];
  /** Checks: passed at each point (null where it broke). */
  pass?: (boolean | null)[];
  /** Messages where the calc broke, by point index. */
  errors?: Record<number, string>;
  /** Checks: index of the first point that fails. */
  firstFail?: number;
  /** Ratio checks: input values (SI) where the ratio crosses 1 between a passing and a failing point. */
  crossings?: number[];
}

/** What a sweep cell computes: the points swept and each output along them. */
export interface SweepResult {
  input: string;
  /** Display unit of the input ('' for a pure number). */
  unit: string;
  /** Input values, SI. */
  xs: number[];
  /** The input's value in the document now, SI. */
  current: number;
  series: SweepSeries[];
  /** The input's least/greatest values as the sheet shows them ("≥ 5 in, ≤ 16 in"), when it has any. */
  limits?: string;
  /** Indices of the points outside those limits: not computed (null in every series, with the reason). */
  outside?: number[];
}
