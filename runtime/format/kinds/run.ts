// `run <id>  name`: the trace (the cells of the sections named by id) run for every row
// of a table, publishing a table of results under `name`.
//   over    marks        the table whose rows are run
//   trace   s5           a section of the trace (repeatable, in order)
//   result  Pu_base      a formula or check of the trace shown per row (repeatable, in order)

import type { RunCell } from '../../document';
import { commonAttrs, listAttr, textAttr } from '../fields';
import { decodeValue, encodeValue } from '../quote';
import type { HeaderSpec, KindFormat } from '../types';

const header: HeaderSpec<RunCell> = {
  write: (cell) => encodeValue(cell.name),
  read: (id, tail, column) => {
    const d = decodeValue(tail, column, 'result table name');
    if (!d.ok) return d;
    return { ok: true, cell: { kind: 'run', id, name: d.value, table: '', trace: [], results: [] } };
  },
};

export const runFormat: KindFormat<RunCell> = {
  kind: 'run',
  header,
  attrs: [
    textAttr<RunCell>('over', 'table'),
    listAttr<RunCell>('trace', 'trace'),
    listAttr<RunCell>('result', 'results'),
    ...commonAttrs<RunCell>(),
  ],
};
