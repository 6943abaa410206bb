// `figure <id>  expression`: a drawing from a figure function (runtime/figures).

import type { FigureCell } from '../../document';
import { commonAttrs, valueHeader } from '../fields';
import type { KindFormat } from '../types';

export const figureFormat: KindFormat<FigureCell> = {
  kind: 'figure',
  header: valueHeader<FigureCell>('figure', 'expr', 'expression'),
  attrs: commonAttrs<FigureCell>(),
};
