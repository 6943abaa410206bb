// Presumptive load-bearing values, IBC Table 1806.2 (values unchanged 2012 → 2021;
// the 2018/2021 identity is from memory). For use when no geotechnical report exists.

import { LibraryError, defineFunction, type LibFunction } from './types';
import { ft, psf } from '../units/si';
import { working } from '../working/recorder';

export const SOIL_CLASSES = ['crystalline bedrock', 'sedimentary rock', 'sandy gravel', 'sand', 'clay'] as const;
export type SoilClass = (typeof SOIL_CLASSES)[number];

interface Row {
  /** Allowable vertical foundation pressure, psf. */
  vertical: number;
  /** Lateral bearing pressure, psf per ft below natural grade. */
  lateral: number;
  /** Coefficient of friction (times dead load), or null where the table gives cohesion. */
  friction: number | null;
  /** Cohesion for sliding, psf (times contact area), or null. */
  cohesion: number | null;
}

/** IBC Table 1806.2, classes 1–5. */
const TABLE: Record<SoilClass, Row> = {
  'crystalline bedrock': { vertical: 12000, lateral: 1200, friction: 0.7, cohesion: null },
  'sedimentary rock': { vertical: 4000, lateral: 400, friction: 0.35, cohesion: null },
  'sandy gravel': { vertical: 3000, lateral: 200, friction: 0.35, cohesion: null },
  sand: { vertical: 2000, lateral: 150, friction: 0.25, cohesion: null },
  clay: { vertical: 1500, lateral: 100, friction: null, cohesion: 130 },
};

/** Other names for the same rows: the table's own wording, class numbers and USCS symbols. */
const ALIASES: Record<string, SoilClass> = {
  '1': 'crystalline bedrock', bedrock: 'crystalline bedrock',
  '2': 'sedimentary rock', 'sedimentary and foliated rock': 'sedimentary rock', 'foliated rock': 'sedimentary rock',
  '3': 'sandy gravel', gravel: 'sandy gravel', 'sandy gravel and/or gravel': 'sandy gravel', gw: 'sandy gravel', gp: 'sandy gravel',
  '4': 'sand', 'silty sand': 'sand', 'clayey sand': 'sand', 'silty gravel': 'sand', 'clayey gravel': 'sand',
  sw: 'sand', sp: 'sand', sm: 'sand', sc: 'sand', gm: 'sand', gc: 'sand',
  '5': 'clay', 'sandy clay': 'clay', 'silty clay': 'clay', 'clayey silt': 'clay', silt: 'clay', 'sandy silt': 'clay',
  cl: 'clay', ml: 'clay', mh: 'clay', ch: 'clay',
};

/** Materials the table gives no presumptive value for (IBC §1806.2 text). */
const NO_VALUE = ['mud', 'organic silt', 'organic clay', 'organic clays', 'peat', 'unprepared fill', 'fill', 'ol', 'oh', 'pt'];

export function soilClass(v: unknown): SoilClass {
  if (typeof v !== 'string') throw new LibraryError(`soil class must be text, one of ${SOIL_CLASSES.map((c) => `'${c}'`).join(', ')}`);
  const key = v.trim().toLowerCase().replace(/\s+/g, ' ');
  if ((SOIL_CLASSES as readonly string[]).includes(key)) return key as SoilClass;
  if (ALIASES[key]) return ALIASES[key];
  if (NO_VALUE.includes(key)) {
    throw new LibraryError(`IBC Table 1806.2 gives no presumptive value for '${v}': data from a soil investigation are required`);
  }
  throw new LibraryError(`unknown soil class '${v}': expected one of ${SOIL_CLASSES.map((c) => `'${c}'`).join(', ')}`);
}

/** Allowable vertical foundation pressure (IBC Table 1806.2). */
export function qPresumptive(cls: SoilClass): number {
  const q = TABLE[cls].vertical * psf;
  working()?.lookup('q_a', q, 'psf', `row: ${cls}, vertical foundation pressure`, 'IBC Table 1806.2');
  return q;
}

/** Lateral bearing pressure per depth below natural grade (IBC Table 1806.2). */
export function lateralPresumptive(cls: SoilClass): number {
  const v = (TABLE[cls].lateral * psf) / ft;
  working()?.lookup('p_lat', v, 'psf/ft', `row: ${cls}, lateral bearing pressure`, 'IBC Table 1806.2');
  return v;
}

/** Sliding friction coefficient, to multiply the dead load (IBC Table 1806.2, note a). */
export function muPresumptive(cls: SoilClass): number {
  const f = TABLE[cls].friction;
  if (f === null) throw new LibraryError(`IBC Table 1806.2 gives no friction coefficient for ${cls}: use c_presumptive (cohesion)`);
  working()?.lookup('mu', f, '', `row: ${cls}, coefficient of friction`, 'IBC Table 1806.2, note a');
  return f;
}

/** Sliding cohesion, to multiply the contact area (IBC Table 1806.2, note b; limited by §1806.3.2). */
export function cPresumptive(cls: SoilClass): number {
  const c = TABLE[cls].cohesion;
  if (c === null) throw new LibraryError(`IBC Table 1806.2 gives no cohesion for ${cls}: use mu_presumptive (friction)`);
  working()?.lookup('c', c * psf, 'psf', `row: ${cls}, cohesion`, 'IBC Table 1806.2, note b');
  return c * psf;
}

const clsParam = [{ name: 'class', type: 'text', choices: SOIL_CLASSES, doc: 'class of material (or USCS symbol, or class number 1–5)' }];
const wrap = (f: (c: SoilClass) => number) => (v: string) => f(soilClass(v));

export const functions: LibFunction[] = [
  defineFunction({
    name: 'q_presumptive', params: clsParam, returns: 'Pa',
    clause: 'IBC Table 1806.2, vertical foundation pressure',
    doc: 'Presumptive allowable vertical soil pressure', fn: wrap(qPresumptive),
  }),
  defineFunction({
    name: 'lateral_presumptive', params: clsParam, returns: 'N/m^3',
    clause: 'IBC Table 1806.2, lateral bearing pressure per depth below natural grade',
    doc: 'Presumptive lateral bearing pressure per unit depth', fn: wrap(lateralPresumptive),
  }),
  defineFunction({
    name: 'mu_presumptive', params: clsParam, returns: '1',
    clause: 'IBC Table 1806.2, lateral sliding: coefficient of friction (note a: times dead load)',
    doc: 'Presumptive sliding friction coefficient (not for clay)', fn: wrap(muPresumptive),
  }),
  defineFunction({
    name: 'c_presumptive', params: clsParam, returns: 'Pa',
    clause: 'IBC Table 1806.2, lateral sliding: cohesion (note b: times contact area, §1806.3.2)',
    doc: 'Presumptive sliding cohesion (clay and silt only)', fn: wrap(cPresumptive),
  }),
];
