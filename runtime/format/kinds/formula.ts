// `formula <id>  name = expression`, with display unit and significant figures.

import type { FormulaCell } from '../../document';
import { assignHeader, commonAttrs, integerAttr, textAttr } from '../fields';
import type { KindFormat } from '../types';

export const formulaFormat: KindFormat<FormulaCell> = {
  kind: 'formula',
  header: assignHeader<FormulaCell>('expr', 'expression', (id, name, expr) => ({ kind: 'formula', id, name, expr })),
  attrs: [
    textAttr<FormulaCell>('unit', 'unit'),
    integerAttr<FormulaCell>('precision', 'precision'),
    ...commonAttrs<FormulaCell>(),
  ],
};
