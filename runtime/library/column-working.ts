// The working of the P–M interaction functions. The curve is found by walking the neutral
// axis depth and bisecting (hundreds of strain-compatibility points), too long to list: the
// working shows the section's inputs and axial limits as steps, the method with its
// reference, the point of the curve where the demand meets it (its c, εt and φ), the
// result, and the interaction figure.

import type { LibValue } from './types';
import { ksi } from '../units/si';
import { quietly, type Recorder } from '../working/recorder';
import { axialLimits, type AxialLimits, type ColumnSection, type DesignPoint } from './column-section';

export const PM_METHOD = 'Strain compatibility at each neutral-axis depth c (εcu = 0.003, Whitney block 0.85f′c over β1c, ' +
  'steel elastic to ±fy, concrete displaced by bars in the block taken out), φ from εt of the extreme tension row; c walked ' +
  'from pure tension to pure compression and bisected where the demand meets the design curve';
export const PM_REFERENCE = 'ACI 318-19 §22.2, Table 21.2.2, §22.4.2.1';

/** The section, its bars and its axial limits, as steps; the limits for the caller. */
export function sectionSteps(w: Recorder, s: ColumnSection): AxialLimits {
  const limits = quietly(() => axialLimits(s));
  const bars = s.rows.reduce((n, r) => n + r.count, 0);
  const fyPo = Math.min(s.fy, 80 * ksi);
  w.method(PM_METHOD, PM_REFERENCE);
  w.step('A_g', 'b * h', s.ag, 'in^2', { vars: { b: [s.b, 'in'], h: [s.h, 'in'] } });
  w.step('A_st', 'n_bars * A_b', s.ast, 'in^2', { vars: { n_bars: bars, A_b: [s.rows[0].area / s.rows[0].count, 'in^2'] } });
  w.step('P_o', '0.85 * fc * (A_g - A_st) + fy * A_st', limits.po, 'kip', {
    vars: { fc: [s.fc, 'psi'], fy: [fyPo, 'psi'] }, clause: 'ACI 318-19 Eq. 22.4.2.2',
    note: fyPo < s.fy ? 'fy taken not above 80 ksi (§22.4.2.1)' : undefined,
  });
  w.step('Pn_max', '0.8 * P_o', limits.pnMax, 'kip', { clause: 'ACI 318-19 Table 22.4.2.1 (ties)' });
  w.step('phi_Pn_max', '0.65 * Pn_max', limits.phiPnMax, 'kip', { clause: 'ACI 318-19 Table 21.2.2 (compression-controlled, tied)' });
  return limits;
}

/** The point of the design curve the walk found: c, εt and φ there. */
export function pointSteps(w: Recorder, p: DesignPoint, where: string): void {
  w.lookup('c', p.c, 'in', where, PM_REFERENCE);
  w.lookup('eps_t', p.epsT, '', 'net tensile strain of the extreme tension row there', 'ACI 318-19 §22.2.2.1');
  w.lookup('phi', p.phi, '', 'from εt', 'ACI 318-19 Table 21.2.2');
}

/** The interaction figure for the demand (Pu, Mu) on this section's arguments. */
export function pmFigure(w: Recorder, pu: number, mu: number, section: readonly (LibValue | undefined)[]): void {
  w.figure('interaction_diagram', [pu, mu, ...section.filter((v): v is LibValue => v !== undefined)]);
}
