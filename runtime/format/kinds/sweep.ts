// `sweep <id>  input-name` with the range and the plotted results as attributes:
//   from 8 in / to 14 in / steps 24 / range fixed / output punch_ok (one line each, in order).
// from, to and the output list are always present in the model; an absent line
// reads as '' (or no outputs), which the engine reports.

import type { SweepCell } from '../../document';
import { commonAttrs, integerAttr, listAttr, textAttr } from '../fields';
import { decodeValue, encodeValue } from '../quote';
import type { AttrSpec, HeaderSpec, KindFormat } from '../types';

const header: HeaderSpec<SweepCell> = {
  write: (cell) => encodeValue(cell.input),
  read: (id, tail, column) => {
    const d = decodeValue(tail, column, 'input name');
    if (!d.ok) return d;
    return { ok: true, cell: { kind: 'sweep', id, input: d.value, from: '', to: '', outputs: [] } };
  },
};

/** `range fixed`: the author's from/to are kept as written (else centred on the input's value). */
const fixedRange: AttrSpec<SweepCell> = {
  key: 'range',
  write: (cell) => (cell.fixed ? ['fixed'] : []),
  read: (cell, value) => {
    if (value !== 'fixed') return `range may only be "fixed" (keep from and to as written), not ${JSON.stringify(value)}`;
    cell.fixed = true;
    return undefined;
  },
};

export const sweepFormat: KindFormat<SweepCell> = {
  kind: 'sweep',
  header,
  attrs: [
    textAttr<SweepCell>('from', 'from'),
    textAttr<SweepCell>('to', 'to'),
    integerAttr<SweepCell>('steps', 'steps'),
    fixedRange,
    listAttr<SweepCell>('output', 'outputs'),
    ...commonAttrs<SweepCell>(),
  ],
};
