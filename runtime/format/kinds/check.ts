// `check <id>  <condition>`, optionally named so other cells can refer to it.

import type { CheckCell } from '../../document';
import { commonAttrs, textAttr, valueHeader } from '../fields';
import type { KindFormat } from '../types';

export const checkFormat: KindFormat<CheckCell> = {
  kind: 'check',
  header: valueHeader<CheckCell>('expr', 'condition', (id, expr) => ({ kind: 'check', id, expr })),
  attrs: [textAttr<CheckCell>('name', 'name'), ...commonAttrs<CheckCell>()],
};
