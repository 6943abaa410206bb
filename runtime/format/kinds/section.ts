// `section <id>  <title>`: a heading that groups the cells after it.

import type { SectionCell } from '../../document';
import { commonAttrs, valueHeader } from '../fields';
import type { KindFormat } from '../types';

export const sectionFormat: KindFormat<SectionCell> = {
  kind: 'section',
  header: valueHeader<SectionCell>('title', 'title', (id, title) => ({ kind: 'section', id, title })),
  attrs: commonAttrs<SectionCell>(),
};
