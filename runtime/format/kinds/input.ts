// `input <id>  name = value`, with its unit, range, pick-list and descriptions.

import type { InputCell } from '../../document';
import { assignHeader, listAttr, textAttr } from '../fields';
import type { KindFormat } from '../types';

export const inputFormat: KindFormat<InputCell> = {
  kind: 'input',
  header: assignHeader<InputCell>('value', 'value', (id, name, value) => ({ kind: 'input', id, name, value })),
  attrs: [
    textAttr<InputCell>('unit', 'unit'),
    textAttr<InputCell>('min', 'min'),
    textAttr<InputCell>('max', 'max'),
    listAttr<InputCell>('choice', 'choices'),
    textAttr<InputCell>('label', 'label'),
    textAttr<InputCell>('about', 'description'),
    textAttr<InputCell>('clause', 'clause'),
  ],
};
