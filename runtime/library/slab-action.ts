// One-way or two-way action of a slab panel. A panel supported on all four sides (or on
// columns) with ℓlong/ℓshort > 2 carries nearly all its load across the short span and is
// designed one-way; at 2 or less it is two-way (textbook convention, the same 2.0 as the
// DDM limit of ACI 318-19 §8.10.2.3). A panel supported on two opposite sides only, or
// on one side (cantilever), is one-way whatever its proportions.

import { defineFunction, type LibFunction } from './types';
import { choice, positive } from './gravity-args';
import { working } from '../working/recorder';

export const SUPPORTS = ['four-sides', 'columns', 'two-opposite-sides', 'one-side'] as const;
export type Supports = (typeof SUPPORTS)[number];
export type SlabAction = 'one-way' | 'two-way';

interface Verdict { action: SlabAction; reason: string }

/** Classifies the panel and says why (convention above; ACI 318-19 §8.10.2.3 for the 2.0 ratio). */
function classify(la: number, lb: number, supports: Supports): Verdict {
  const a = positive('l_a', la);
  const b = positive('l_b', lb);
  const sup = choice('supports', supports, SUPPORTS);
  const w = working();
  if (w && (sup === 'four-sides' || sup === 'columns')) {
    w.step('ratio', 'max(l_a, l_b) / min(l_a, l_b)', Math.max(a, b) / Math.min(a, b), '', {
      vars: { l_a: [a, 'ft'], l_b: [b, 'ft'] }, clause: CLAUSE,
    });
  }
  if (sup === 'two-opposite-sides') {
    return { action: 'one-way', reason: 'supported on two opposite sides only: one-way, spanning between the supports' };
  }
  if (sup === 'one-side') {
    return { action: 'one-way', reason: 'supported on one side only: one-way cantilever' };
  }
  const ratio = Math.max(a, b) / Math.min(a, b);
  const where = sup === 'columns' ? 'supported on columns' : 'supported on four sides';
  const r = ratio.toFixed(2);
  if (ratio > 2 + 1e-9) {
    return { action: 'one-way', reason: `${where}, ℓlong/ℓshort = ${r} > 2: one-way, spanning the short direction` };
  }
  return { action: 'two-way', reason: `${where}, ℓlong/ℓshort = ${r} ≤ 2: two-way` };
}

/** 'one-way' or 'two-way' by panel proportions and supports (convention; ACI 318-19 §8.10.2.3 ratio). */
export function slabAction(la: number, lb: number, supports: Supports): SlabAction {
  const v = classify(la, lb, supports);
  working()?.step('action', undefined, v.action, '', { note: v.reason, clause: CLAUSE });
  return v.action;
}

/** The reason for slabAction, as a line for the hand calc. */
export function slabActionReason(la: number, lb: number, supports: Supports): string {
  const v = classify(la, lb, supports);
  working()?.step('reason', undefined, v.reason, '', { clause: CLAUSE });
  return v.reason;
}

const PARAMS = [
  { name: 'l_a', type: 'm', doc: 'panel span in one direction' },
  { name: 'l_b', type: 'm', doc: 'panel span in the other direction' },
  { name: 'supports', type: 'text', choices: SUPPORTS, doc: 'four-sides, columns, two-opposite-sides or one-side' },
];
const CLAUSE = 'ℓlong/ℓshort ≤ 2 (convention; ACI 318-19 §8.10.2.3)';

export const functions: LibFunction[] = [
  defineFunction({
    name: 'slab_action', params: PARAMS, returns: 'text', clause: CLAUSE,
    doc: "Slab action, 'one-way' or 'two-way'",
    fn: (a: number, b: number, s: Supports) => slabAction(a, b, s),
  }),
  defineFunction({
    name: 'slab_action_reason', params: PARAMS, returns: 'text', clause: CLAUSE,
    doc: 'Why the panel is one-way or two-way',
    fn: (a: number, b: number, s: Supports) => slabActionReason(a, b, s),
  }),
];
