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
import { PM_REFERENCE, sectionSteps } from './column-working';
import { quietly, working } from '../working/recorder';

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
  const w = working();
  const limits = w ? sectionSteps(w, s1) : axialLimits(s1);
  const vars = { Pu: [P, 'kip'], Mu1: [M1, 'kip*ft'], Mu2: [M2, 'kip*ft'], fc: [s1.fc, 'psi'] } as const;
  const reciprocalMethod = P >= 0.1 * s1.fc * s1.ag;
  w?.step('reciprocal', 'Pu >= 0.1 * fc * A_g', reciprocalMethod, '', {
    vars, note: reciprocalMethod ? "Bresler's reciprocal load method" : 'low axial load: the straight-line contour', clause: 'Bresler (1960), common practice',
  });
  if (reciprocalMethod) {
    const phiP1 = quietly(() => uncapped(s1, M1 / P));
    const phiP2 = quietly(() => uncapped(s2, M2 / P));
    const phiPo = 0.65 * limits.po;
    const reciprocal = 1 / phiP1 + 1 / phiP2 - 1 / phiPo;
    const phiPni = Math.min(1 / reciprocal, limits.phiPnMax);
    if (w) {
      w.lookup('phi_P1', phiP1, 'kip', 'design curve in direction 1 at e1 = Mu1/Pu (not capped)', PM_REFERENCE);
      w.lookup('phi_P2', phiP2, 'kip', 'design curve in direction 2 at e2 = Mu2/Pu (not capped)', PM_REFERENCE);
      w.step('phi_P_o', '0.65 * P_o', phiPo, 'kip');
      w.step('phi_Pni', 'min(1 / (1 / phi_P1 + 1 / phi_P2 - 1 / phi_P_o), phi_Pn_max)', phiPni, 'kip', { clause: 'Bresler (1960)', governs: phiPni === limits.phiPnMax });
      w.step('ratio', 'Pu / phi_Pni', P / phiPni, '', { vars });
    }
    return { method: 'reciprocal', phiP1, phiP2, phiPo, phiPni, ratio: P / phiPni };
  }
  const phiMn1 = quietly(() => momentStrengthAt(s1, P).phiMn);
  const phiMn2 = quietly(() => momentStrengthAt(s2, P).phiMn);
  const part = (m: number, cap: number) => (m === 0 ? 0 : cap > 0 ? m / cap : Infinity);
  const ratio = part(M1, phiMn1) + part(M2, phiMn2);
  if (w) {
    w.lookup('phi_Mn1', phiMn1, 'kip*ft', 'design curve in direction 1 at Pu', PM_REFERENCE);
    w.lookup('phi_Mn2', phiMn2, 'kip*ft', 'design curve in direction 2 at Pu', PM_REFERENCE);
    const term = (i: 1 | 2, m: number) => (m === 0 ? '0' : `Mu${i} / phi_Mn${i}`);
    w.step('ratio', `${term(1, M1)} + ${term(2, M2)}`, ratio, '', { vars, clause: 'straight-line load contour (common practice)' });
  }
  return { method: 'contour', phiMn1, phiMn2, ratio };
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
    fn: (...a: Args) => {
      const text = run(a).method === 'reciprocal'
        ? "reciprocal load (Bresler 1960), Pu ≥ 0.1f'cAg"
        : "straight-line contour Mu1/φMn1 + Mu2/φMn2, Pu < 0.1f'cAg";
      working()?.step('method', undefined, text, '', { clause: 'Bresler (1960), common practice' });
      return text;
    },
  }),
];
