// `sweep <id>  input-name` with the range and the plotted results as attributes:
//   from 8 in / to 14 in / steps 24 / output punch_ok (one line each, in order).
// from, to and the output list are always present in the model; an absent line
// reads as '' (or no outputs), which the engine reports.

import type { SweepCell } from '../../document';
import { commonAttrs, integerAttr, listAttr, textAttr } from '../fields';
import { decodeValue, encodeValue } from '../quote';
import type { HeaderSpec, KindFormat } from '../types';

const header: HeaderSpec<SweepCell> = {
  write: (cell) => encodeValue(cell.input),
  read: (id, tail, column) => {
    const d = decodeValue(tail, column, 'input name');
    if (!d.ok) return d;
    return { ok: true, cell: { kind: 'sweep', id, input: d.value, from: '', to: '', outputs: [] } };
  },
};

export const sweepFormat: KindFormat<SweepCell> = {
  kind: 'sweep',
  header,
  attrs: [
    textAttr<SweepCell>('from', 'from'),
    textAttr<SweepCell>('to', 'to'),
    integerAttr<SweepCell>('steps', 'steps'),
    listAttr<SweepCell>('output', 'outputs'),
    ...commonAttrs<SweepCell>(),
  ],
};
