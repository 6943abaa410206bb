// Biaxial bending of a rectangular tied column (a corner column takes the slab moment in
// both directions). Bresler's reciprocal load method (B. Bresler, "Design criteria for
// reinforced concrete columns under axial load and biaxial bending", ACI Journal 57(5),
// 1960): 1/Pni = 1/Pn1 + 1/Pn2 − 1/Po, written with design values (common practice),
// used where Pu ≥ 0.1 f'c Ag, for which Bresler found it close to tests (common practice).
// Below that the straight-line load contour Mu1/φMn1 + Mu2/φMn2 ≤ 1 is used, which is
// conservative (common practice).
//
// Geometry: c1 is the side in direction 1, c2 in direction 2; n_c1 bars along each face of
// length c1 and n_c2 along each face of length c2, corners counted on both.

import { defineFunction, type LibFunction, type LibParam } from './types';
import { EDITIONS, edition, finite, nonNegative } from './support-args';
import { BARS, barArea } from './rebar';
import { axialLimits, columnSection, type ColumnSection } from './column-section';
import { axialStrengthAt, momentStrengthAt } from './column-interaction';

export interface BiaxialSections {
  /** Bending in direction 1: depth c1, width c2. */
  s1: ColumnSection;
  /** Bending in direction 2: depth c2, width c1. */
  s2: ColumnSection;
}

export function biaxialSections(
  fc: number, fy: number, c1: number, c2: number, nC1: number, nC2: number, bar: string, dS: number, ed?: string,
): BiaxialSections {
  const area = barArea(bar);
  const e = edition(ed);
  return {
    s1: columnSection(fc, fy, c2, c1, nC2, nC1, area, dS, e),
    s2: columnSection(fc, fy, c1, c2, nC1, nC2, area, dS, e),
  };
}

export interface BiaxialCheck {
  method: 'reciprocal' | 'contour';
  /** Reciprocal method: design axial strengths at e1 = Mu1/Pu alone, e2 = Mu2/Pu alone, concentric (uncapped). */
  phiP1?: number;
  phiP2?: number;
  phiPo?: number;
  /** φPni = 1/(1/φP1 + 1/φP2 − 1/φPo), not more than φPn,max. */
  phiPni?: number;
  /** Contour: the moment strengths at Pu. */
  phiMn1?: number;
  phiMn2?: number;
  /** Demand/capacity: Pu/φPni, or Mu1/φMn1 + Mu2/φMn2. */
  ratio: number;
}

/** Design axial strength at eccentricity e without the Pn,max cap (the reciprocal method needs the plain curve). */
function uncapped(s: ColumnSection, e: number): number {
  return e === 0 ? 0.65 * axialLimits(s).po : axialStrengthAt(s, e).point.phiPn;
}

/** Pu with Mu1 and Mu2 acting together (Bresler 1960; contour below 0.1 f'c Ag; common practice). */
export function biaxialCheck(sec: BiaxialSections, pu: number, mu1: number, mu2: number): BiaxialCheck {
  const P = nonNegative('Pu', pu);
  const M1 = Math.abs(finite('Mu1', mu1));
  const M2 = Math.abs(finite('Mu2', mu2));
  const { s1, s2 } = sec;
  const limits = axialLimits(s1);
  if (P >= 0.1 * s1.fc * s1.ag) {
    const phiP1 = uncapped(s1, M1 / P);
    const phiP2 = uncapped(s2, M2 / P);
    const phiPo = 0.65 * limits.po;
    const reciprocal = 1 / phiP1 + 1 / phiP2 - 1 / phiPo;
    const phiPni = Math.min(1 / reciprocal, limits.phiPnMax);
    return { method: 'reciprocal', phiP1, phiP2, phiPo, phiPni, ratio: P / phiPni };
  }
  const phiMn1 = momentStrengthAt(s1, P).phiMn;
  const phiMn2 = momentStrengthAt(s2, P).phiMn;
  const part = (m: number, cap: number) => (m === 0 ? 0 : cap > 0 ? m / cap : Infinity);
  return { method: 'contour', phiMn1, phiMn2, ratio: part(M1, phiMn1) + part(M2, phiMn2) };
}

const PARAMS: LibParam[] = [
  { name: 'Pu', type: 'N', doc: 'factored axial load' },
  { name: 'Mu1', type: 'N*m', doc: 'factored moment bending the column in direction 1' },
  { name: 'Mu2', type: 'N*m', doc: 'factored moment bending the column in direction 2' },
  { name: 'fc', type: 'Pa', doc: "concrete strength f'c" },
  { name: 'fy', type: 'Pa', doc: 'yield strength of the column bars' },
  { name: 'c1', type: 'm', doc: 'column side in direction 1' },
  { name: 'c2', type: 'm', doc: 'column side in direction 2' },
  { name: 'n_c1', type: '1', doc: 'bars along each face of length c1, corners counted' },
  { name: 'n_c2', type: '1', doc: 'bars along each face of length c2, corners counted' },
  { name: 'bar', type: 'text', choices: BARS, doc: 'bar size' },
  { name: 'd_s', type: 'm', doc: 'distance from the face to the bar centres' },
  { name: 'edition', type: 'text', choices: EDITIONS, doc: "'318-19' (default) or '318-14'" },
];

type SectionArgs = [number, number, number, number, number, number, string, number, string?];
type Args = [number, number, number, ...SectionArgs];
const run = ([pu, m1, m2, ...section]: Args) => biaxialCheck(biaxialSections(...section), pu, m1, m2);

export const functions: LibFunction[] = [
  defineFunction({
    name: 'col_biaxial_ratio',
    params: PARAMS,
    optional: 1,
    returns: '1',
    clause: "Bresler (1960) reciprocal load method for Pu ≥ 0.1f'cAg, else Mu1/φMn1 + Mu2/φMn2 ≤ 1 (common practice); ACI 318-19 §22.2, §22.4",
    doc: 'Demand/capacity of a tied rectangular column bent about both axes',
    fn: (...a: Args) => run(a).ratio,
  }),
  defineFunction({
    name: 'col_biaxial_method',
    params: PARAMS,
    optional: 1,
    returns: 'text',
    clause: "Bresler (1960) for Pu ≥ 0.1f'cAg (common practice)",
    doc: 'Which biaxial method applies: reciprocal load, or the straight-line contour at low axial load',
    fn: (...a: Args) => (run(a).method === 'reciprocal'
      ? "reciprocal load (Bresler 1960), Pu ≥ 0.1f'cAg"
      : "straight-line contour Mu1/φMn1 + Mu2/φMn2, Pu < 0.1f'cAg"),
  }),
];
