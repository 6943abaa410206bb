// `figure <id>  expression`: a drawing from a figure function (runtime/figures).

import type { FigureCell } from '../../document';
import { commonAttrs, valueHeader } from '../fields';
import type { KindFormat } from '../types';

export const figureFormat: KindFormat<FigureCell> = {
  kind: 'figure',
  header: valueHeader<FigureCell>('expr', 'expression', (id, expr) => ({ kind: 'figure', id, expr })),
  attrs: commonAttrs<FigureCell>(),
};
