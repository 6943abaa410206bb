// `signoff <id>  record` or `signoff <id>  section <section id>`: a checker's sign-off.
//   by / date / rev (latest issue when signed) / covers (fingerprint of what it covers)

import type { SignOff } from '../../review/types';
import { isCellId } from '../quote';
import { textLine, type ReviewBlockFormat } from './block';

const by = textLine<SignOff>('by', (s) => s.by, (s, v) => (s.by = v));
const date = textLine<SignOff>('date', (s) => s.date, (s, v) => (s.date = v));
const rev = {
  key: 'rev',
  read: (s: SignOff, v: string) => {
    s.revision = v;
    return undefined;
  },
};
const covers = textLine<SignOff>('covers', (s) => s.covered, (s, v) => (s.covered = v));

export const signoffFormat: ReviewBlockFormat<SignOff> = {
  keyword: 'signoff',
  writeHeader: (s) => {
    if (s.scope === 'document') return 'record';
    if (!isCellId(s.scope)) throw new Error(`sign-off ${s.id}: section id ${JSON.stringify(s.scope)} is not [A-Za-z0-9_-]+`);
    return `section ${s.scope}`;
  },
  writeAttrs: (s) => [...by.write(s), ...date.write(s), ...(s.revision === undefined ? [] : [['rev', s.revision] as [string, string]]), ...covers.write(s)],
  attrs: [by, date, rev, covers],
};

/**
 * The scope from the header's tail: 'document' for `record`, the id for `section <id>`
 * (a section whose id is "document" is signed only with the whole record).
 */
export function readSignoffTail(tail: string): string | undefined {
  if (tail === 'record') return 'document';
  const m = /^section[ \t]+([A-Za-z0-9_-]+)$/.exec(tail);
  return m && m[1] !== 'document' ? m[1] : undefined;
}
