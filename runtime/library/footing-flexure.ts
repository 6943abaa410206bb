// Flexure of a spread footing: cantilever moment of the net factored pressure at the
// column face (ACI 318-19 §13.2.7.1 [from memory]), steel by the Whitney stress block
// (§22.2.2.4.1), the minimum steel (0.0018Ag in 318-19; by grade in 318-14, the slab rule
// of reinforcement-limits.ts), and the band rule for rectangular footings.

import { LibraryError, defineFunction, type LibFunction, type LibParam } from './types';
import { EDITIONS, edition, optional, phiFactor, positive, type Edition } from './support-args';
import { quFooting } from './footing-area';
import { fyDesign, rhoMinSlab } from './reinforcement-limits';
import { ended, working } from '../working/recorder';

/** Mu at the column face = qu · B · ℓ² / 2 with ℓ = (L − c)/2 (ACI 318-19 §13.2.7.1). */
export function muFooting(pu: number, b: number, l: number, c: number): number {
  const qu = quFooting(pu, b, l);
  const arm = (l - positive('c', c)) / 2;
  if (arm <= 0) throw new LibraryError('the column is not smaller than the footing');
  const mu = (qu * b * arm * arm) / 2;
  const w = working();
  if (w) {
    const vars = { B: [b, 'ft'], L: [l, 'ft'], c: [c, 'in'] } as const;
    w.step('l_cant', '(L - c) / 2', arm, 'ft', { vars, clause: 'ACI 318-19 §13.2.7.1', note: 'cantilever from the column face' });
    w.step('Mu', 'q_u * B * l_cant^2 / 2', mu, 'kip*ft', { vars, clause: 'ACI 318-19 §13.2.7.1' });
  }
  return mu;
}

/** As from Mu ≤ φ As fy (d − a/2), a = As fy / (0.85 f'c b): the Whitney block (ACI 318-19 §22.2.2.4.1). */
export function asReqFooting(mu: number, b: number, d: number, fc: number, fySpecified: number, phi = 0.9, ed: Edition = '318-19'): number {
  positive('Mu', mu);
  positive('B', b);
  positive('d', d);
  positive('fc', fc);
  const w = working()?.open('as_req_footing', { Mu: [mu, 'kip*ft'], B: [b, 'ft'], d: [d, 'in'], fc: [fc, 'psi'], fy: [fySpecified, 'psi'], phi }, 'ACI 318-19 §22.2.2.4.1');
  const fy = fyDesign(fySpecified, 'flexure', ed); // Table 20.2.2.4(a) cap [from memory]
  phiFactor(phi);
  const k = (2 * mu) / (phi * 0.85 * fc * b * d * d);
  const vars = { Mu: [mu, 'kip*ft'], B: [b, 'ft'], d: [d, 'in'], fc: [fc, 'psi'], fy: [fy, 'psi'], phi } as const;
  w?.step('k', '2 * Mu / (phi * 0.85 * fc * B * d^2)', k, '', { vars, clause: 'ACI 318-19 §22.2.2.4.1' });
  if (k >= 1) throw new LibraryError('footing too shallow: Mu exceeds the capacity of the concrete stress block; increase h');
  const As = ((0.85 * fc * b * d) / fy) * (1 - Math.sqrt(1 - k));
  w?.step('As_req', '0.85 * fc * B * d / fy * (1 - sqrt(1 - k))', As, 'in^2', { vars, clause: 'ACI 318-19 §22.2.2.4.1 (Whitney block)' });
  return ended(w, As, 'in^2');
}

/**
 * As,min = ρmin B h (ACI 318-19 §13.3.3.1 → §7.6.1.1 / Table 8.6.1.1, deformed bars):
 * 0.0018 for every grade in 318-19; 318-14 sets it by fy, so fy is needed there only.
 */
export function asMinFooting(b: number, h: number, fy?: number, ed: Edition = '318-19'): number {
  const area = positive('B', b) * positive('h', h);
  if (fy === undefined && ed === '318-14') throw new LibraryError("edition '318-14' sets the minimum by the bar grade: give fy");
  const w = working()?.open('as_min_footing', { B: [b, 'ft'], h: [h, 'in'], fy: fy === undefined ? 'not given' : [fy, 'psi'], edition: ed }, MIN_CLAUSE);
  let rho = 0.0018;
  if (fy === undefined) w?.lookup('rho_min', rho, '', 'deformed bars, any grade', 'ACI 318-19 Table 8.6.1.1 [from memory]');
  else rho = rhoMinSlab(fy, ed);
  const As = rho * area;
  w?.step('As_min', 'rho_min * B * h', As, 'in^2', { vars: { B: [b, 'ft'], h: [h, 'in'] }, clause: 'ACI 318-19 §13.3.3.1 [from memory]' });
  return ended(w, As, 'in^2');
}

/** The larger of the Whitney steel and the minimum of the edition. */
export function asFooting(mu: number, b: number, d: number, h: number, fc: number, fy: number, phi = 0.9, ed: Edition = '318-19'): number {
  if (positive('h', h) <= positive('d', d)) throw new LibraryError('h must exceed d');
  const w = working()?.open('as_footing', { Mu: [mu, 'kip*ft'], B: [b, 'ft'], d: [d, 'in'], h: [h, 'in'], fc: [fc, 'psi'], fy: [fy, 'psi'], phi, edition: ed }, MIN_CLAUSE);
  const req = asReqFooting(mu, b, d, fc, fy, phi, ed);
  const min = asMinFooting(b, h, fy, ed);
  const As = Math.max(req, min);
  w?.step('As', 'max(As_req, As_min)', As, 'in^2', { governs: true, note: req >= min ? 'the steel for Mu governs' : 'the minimum steel governs' });
  return ended(w, As, 'in^2');
}

/** γs = 2/(β + 1), β = long side / short side (ACI 318-19 Eq. 13.3.3.3). */
export function gammaSBand(b: number, l: number): number {
  const beta = Math.max(positive('B', b), positive('L', l)) / Math.min(b, l);
  const g = 2 / (beta + 1);
  const w = working();
  if (w) {
    w.step('beta', 'max(B, L) / min(B, L)', beta, '', { vars: { B: [b, 'ft'], L: [l, 'ft'] } });
    w.step('gamma_s', '2 / (beta + 1)', g, '', { clause: 'ACI 318-19 Eq. 13.3.3.3' });
  }
  return g;
}

/** Short-direction steel placed in the central band of width equal to the short side (ACI 318-19 §13.3.3.3). */
export function asBand(asShort: number, b: number, l: number): number {
  const as = positive('As (short direction)', asShort) * gammaSBand(b, l);
  working()?.step('As_band', 'gamma_s * As_short', as, 'in^2', { vars: { As_short: [asShort, 'in^2'] }, clause: 'ACI 318-19 §13.3.3.3' });
  return as;
}

const flexParams: LibParam[] = [
  { name: 'Mu', type: 'N*m', doc: 'factored moment at the column face over the width B' },
  { name: 'B', type: 'm', doc: 'width of the footing section' },
  { name: 'd', type: 'm', doc: 'effective depth' },
  { name: 'fc', type: 'Pa', doc: 'concrete strength' },
  { name: 'fy', type: 'Pa', doc: 'steel yield strength' },
  { name: 'phi', type: '1', doc: 'flexure φ (default 0.90, tension-controlled)' },
];
const ED: LibParam = { name: 'edition', type: 'text', choices: EDITIONS, doc: "ACI 318 edition, '318-19' (default) or '318-14'" };
const MIN_CLAUSE = "As,min = 0.0018·Ag, deformed bars, any grade (ACI 318-19 §13.3.3.1 → Table 8.6.1.1 / §24.4.3.2) [from memory]; "
  + "318-14 Table 7.6.1.1: 0.0020·Ag for fy < 60 ksi, else max(0.0018·60000/fy, 0.0014)·Ag, Grade 420 counted as Grade 60 [from memory]";
const bl: LibParam[] = [
  { name: 'B', type: 'm', doc: 'short side of the footing' },
  { name: 'L', type: 'm', doc: 'long side of the footing' },
];

export const functions: LibFunction[] = [
  defineFunction({
    name: 'mu_footing',
    params: [
      { name: 'Pu', type: 'N', doc: 'factored column load' },
      { name: 'B', type: 'm', doc: 'footing width (width of the section)' },
      { name: 'L', type: 'm', doc: 'footing length in the direction of the cantilever' },
      { name: 'c', type: 'm', doc: 'column side along L' },
    ],
    returns: 'N*m',
    clause: 'ACI 318-19 §13.2.7.1: Mu at the column face = qu·B·((L − c)/2)²/2',
    doc: 'Factored cantilever moment of a spread footing at the column face',
    fn: muFooting,
  }),
  defineFunction({
    name: 'as_req_footing',
    params: flexParams,
    optional: 1,
    returns: 'm^2',
    clause: "ACI 318-19 §22.2.2.4.1 (0.85f'c block, a = As·fy/(0.85f'c·B)); φ = 0.90 tension-controlled (Table 21.2.2)",
    doc: 'Flexural steel required by the Whitney stress block, before the minimum',
    fn: (mu: number, b: number, d: number, fc: number, fy: number, phi?: number) =>
      asReqFooting(mu, b, d, fc, fy, optional(phi, 0.9, phiFactor)),
  }),
  defineFunction({
    name: 'as_min_footing',
    params: [
      { name: 'B', type: 'm', doc: 'width of the section' },
      { name: 'h', type: 'm', doc: 'footing thickness' },
      { name: 'fy', type: 'Pa', doc: "steel yield strength (needed for '318-14' only)" },
      ED,
    ],
    optional: 2,
    returns: 'm^2',
    clause: MIN_CLAUSE,
    doc: "Minimum flexural steel of a footing, 0.0018 B h (318-14: by grade)",
    fn: (b: number, h: number, fy?: number, ed?: Edition) => asMinFooting(b, h, fy, edition(ed)),
  }),
  defineFunction({
    name: 'as_footing',
    params: [flexParams[0], flexParams[1], flexParams[2], { name: 'h', type: 'm', doc: 'footing thickness' }, flexParams[3], flexParams[4], flexParams[5], ED],
    optional: 2,
    returns: 'm^2',
    clause: `ACI 318-19 §22.2.2.4.1 and the minimum, the larger. ${MIN_CLAUSE}`,
    doc: 'Flexural steel of a footing: the larger of the required and the minimum',
    fn: (mu: number, b: number, d: number, h: number, fc: number, fy: number, phi?: number, ed?: Edition) =>
      asFooting(mu, b, d, h, fc, fy, optional(phi, 0.9, phiFactor), edition(ed)),
  }),
  defineFunction({
    name: 'gamma_s_band',
    params: bl,
    returns: '1',
    clause: 'ACI 318-19 Eq. 13.3.3.3: γs = 2/(β + 1), β = long/short side',
    doc: 'Fraction of the short-direction steel placed in the central band of a rectangular footing',
    fn: gammaSBand,
  }),
  defineFunction({
    name: 'as_band',
    params: [{ name: 'As_short', type: 'm^2', doc: 'total steel in the short direction' }, ...bl],
    returns: 'm^2',
    clause: 'ACI 318-19 §13.3.3.3: γs·As in a band of width equal to the short side, centred on the column',
    doc: 'Short-direction steel in the central band of a rectangular footing',
    fn: asBand,
  }),
];
