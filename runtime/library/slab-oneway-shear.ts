// One-way (beam) shear in a two-way slab: the whole panel width ℓ2 acting as a wide beam, with the
// critical section at d from the column face (ACI 318-19 §8.5.3.1.1 and §8.4.3.2, clause numbers
// from memory). The strength is vc_oneway (§22.5) on the width ℓ2 with the top steel's ρw.

import { LibraryError, defineFunction, type LibFunction } from './types';
import { nonNegative, positive } from './support-args';
import { working } from '../working/recorder';

export interface SlabBeamShear {
  arm: number; // ℓn/2 − d, m
  vu: number; // N
}

/**
 * Vu = qu·ℓ2·(ℓn/2 − d): the load on half the clear span less the strip within d of the face, for an
 * interior span between supports that share the load equally (statics, common practice).
 */
export function slabBeamShear(qu: number, l2: number, ln: number, d: number): SlabBeamShear {
  const q = nonNegative('qu', qu);
  const width = positive('l2', l2);
  const half = positive('ln', ln) / 2;
  const arm = half - positive('d', d);
  if (arm <= 0) throw new LibraryError('the section at d from the face lies beyond midspan: ℓn/2 ≤ d');
  const vu = q * width * arm;
  working()?.step('Vu', 'qu * l2 * (ln / 2 - d)', vu, 'kip', {
    vars: { qu: [q, 'psf'], l2: [width, 'ft'], ln: [half * 2, 'ft'], d: [d, 'in'] },
    clause: 'ACI 318-19 §8.5.3.1.1, §8.4.3.2 [from memory]', note: 'the load on half the clear span less the strip within d of the face',
  });
  return { arm, vu };
}

export const functions: LibFunction[] = [
  defineFunction({
    name: 'vu_oneway_slab',
    params: [
      { name: 'qu', type: 'Pa', doc: 'factored load on the slab' },
      { name: 'l2', type: 'm', doc: 'panel width across the section (span centre to centre)' },
      { name: 'ln', type: 'm', doc: 'clear span in the direction of the shear' },
      { name: 'd', type: 'm', doc: 'effective depth' },
    ],
    returns: 'N',
    clause: 'ACI 318-19 §8.5.3.1.1, §8.4.3.2: one-way shear at d from the column face over the panel width, Vu = qu·ℓ2·(ℓn/2 − d) [clause numbers from memory]',
    doc: 'Factored one-way (wide-beam) shear in a two-way slab at d from the column face',
    fn: (qu: number, l2: number, ln: number, d: number) => slabBeamShear(qu, l2, ln, d).vu,
  }),
];
