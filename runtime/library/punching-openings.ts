// An opening in a slab near a column takes part of the critical section out of service: the part
// of bo enclosed by straight lines from the column centroid tangent to the opening is ineffective
// (ACI 318-19 §22.6.4.3), for an opening within a column strip or closer than 4h to the column
// (318-14: 10h; both distances from memory). Handled here: a rectangular opening of width w centred
// on a column line, its near edge at a clear distance x from the column face, in front of the face
// of width c2 (the line runs along c1). An opening on a column line lies in the column strip.

import { defineFunction, type LibFunction } from './types';
import { EDITIONS, edition, nonNegative, positive, type Edition } from './support-args';
import { working } from '../working/recorder';

export interface OpeningLoss {
  applies: boolean;
  spread: number; // the width projected onto the section face, m
  loss: number; // ineffective length of bo, m
}

/**
 * The tangent lines from the centroid through the near corners of the opening, (c1/2 + x, ±w/2),
 * cut the section face at c1/2 + d/2 over a width w·(c1 + d)/(c1 + 2x); the loss is that width, not
 * more than the face c2 + d (geometry of ACI 318-19 §22.6.4.3, Fig. R22.6.4.3 [from memory]).
 */
export function openingLoss(
  c1: number, c2: number, d: number, w: number, x: number, h: number,
  inColumnStrip = true, ed: Edition = '318-19',
): OpeningLoss {
  const a = positive('c1', c1);
  const b = positive('c2', c2);
  const dd = positive('d', d);
  const width = nonNegative('w (opening)', w);
  const clear = nonNegative('x (opening)', x);
  const reach = (ed === '318-19' ? 4 : 10) * positive('h', h);
  const applies = width > 0 && (inColumnStrip || clear < reach);
  const spread = (width * (a + dd)) / (a + 2 * clear);
  const loss = applies ? Math.min(spread, b + dd) : 0;
  const rec = working();
  if (rec) {
    const vars = { c1: [a, 'in'], c2: [b, 'in'], d: [dd, 'in'], w: [width, 'in'], x: [clear, 'in'], h: [h, 'in'] } as const;
    const clause = 'ACI 318-19 §22.6.4.3 [from memory]';
    rec.step('reach', `${ed === '318-19' ? 4 : 10} * h`, reach, 'in', { vars, clause: `ACI ${ed} §22.6.4.3 [from memory]` });
    rec.step('applies', undefined, applies, '', {
      clause, note: width === 0 ? 'no opening' : inColumnStrip ? 'the opening lies within a column strip' : clear < reach ? 'closer than the reach' : 'beyond the reach and outside the column strip',
    });
    rec.step('spread', 'w * (c1 + d) / (c1 + 2 * x)', spread, 'in', { vars, clause, note: 'tangents from the column centroid' });
    rec.step('bo_loss', applies ? 'min(spread, c2 + d)' : '0', loss, 'in', { vars, clause });
  }
  return { applies, spread, loss };
}

export const functions: LibFunction[] = [
  defineFunction({
    name: 'bo_opening_loss',
    params: [
      { name: 'c1', type: 'm', doc: 'column side along the line through the opening' },
      { name: 'c2', type: 'm', doc: 'column side facing the opening' },
      { name: 'd', type: 'm', doc: 'effective depth of the slab' },
      { name: 'w', type: 'm', doc: 'width of the opening across the column line (0: none)' },
      { name: 'x', type: 'm', doc: 'clear distance from the column face to the opening' },
      { name: 'h', type: 'm', doc: 'slab thickness' },
      { name: 'in_column_strip', type: 'bool', doc: 'opening within a column strip (default true)' },
      { name: 'edition', type: 'text', choices: EDITIONS, doc: "'318-19' (default; 4h) or '318-14' (10h)" },
    ],
    optional: 2,
    returns: 'm',
    clause: 'ACI 318-19 §22.6.4.3: the part of bo between tangents from the column centroid to an opening within a column strip or closer than 4h (318-14: 10h) is ineffective [distances from memory]',
    doc: 'Length of the punching perimeter lost to an opening centred on a column line',
    fn: (c1: number, c2: number, d: number, w: number, x: number, h: number, strip?: boolean, ed?: string) =>
      openingLoss(c1, c2, d, w, x, h, strip === undefined ? true : Boolean(strip), edition(ed)).loss,
  }),
];
