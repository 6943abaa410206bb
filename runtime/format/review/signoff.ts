// `signoff <id>  record` or `signoff <id>  section <section id>`: a checker's sign-off.
//   by / date / rev (latest issue when signed) / state unissued (the sheet differed
//   from it: the working state was signed) / covers (fingerprint of the cells covered)
//   / seen (fingerprint of the inputs and results seen) / except <kind> <id> <text>
//   (one per NOT OK check, cell in error or open comment signed with)

import type { SignOff, SignOffException } from '../../review/types';
import { isCellId } from '../quote';
import { textLine, type ReviewAttr, type ReviewBlockFormat } from './block';
import { encodeToken, Tokens } from './tokens';

const by = textLine<SignOff>('by', (s) => s.by, (s, v) => (s.by = v));
const date = textLine<SignOff>('date', (s) => s.date, (s, v) => (s.date = v));
const rev = {
  key: 'rev',
  read: (s: SignOff, v: string) => {
    s.revision = v;
    return undefined;
  },
};
const state: ReviewAttr<SignOff> = {
  key: 'state',
  read: (s, v) => {
    if (v !== 'unissued') return `state must be "unissued", not ${JSON.stringify(v)}`;
    s.unissued = true;
    return undefined;
  },
};
const covers = textLine<SignOff>('covers', (s) => s.covered, (s, v) => (s.covered = v));
const seen = textLine<SignOff>('seen', (s) => s.seen ?? '', (s, v) => (s.seen = v));

const KINDS: readonly SignOffException['kind'][] = ['not-ok', 'error', 'open-comment'];

const except: ReviewAttr<SignOff> = {
  key: 'except',
  repeatable: true,
  read: (s, line) => {
    try {
      const t = new Tokens(line);
      const kind = t.next('kind').text as SignOffException['kind'];
      if (!KINDS.includes(kind)) throw `kind must be ${KINDS.join(', ')}, not ${JSON.stringify(kind)}`;
      const id = t.next('id');
      if (id.quoted || !isCellId(id.text)) throw `bad id ${JSON.stringify(id.text)}`;
      const text = t.done ? '' : t.next('text').text;
      if (!t.done) throw 'unexpected text after the quoted text';
      (s.exceptions ??= []).push({ kind, id: id.text, text });
      return undefined;
    } catch (e) {
      if (typeof e === 'string') return e;
      throw e;
    }
  },
};

function writeException(x: SignOffException): string {
  if (!isCellId(x.id)) throw new Error(`sign-off exception id ${JSON.stringify(x.id)} is not [A-Za-z0-9_-]+`);
  return `${x.kind} ${x.id} ${encodeToken(x.text)}`;
}

export const signoffFormat: ReviewBlockFormat<SignOff> = {
  keyword: 'signoff',
  writeHeader: (s) => {
    if (s.scope === 'document') return 'record';
    if (!isCellId(s.scope)) throw new Error(`sign-off ${s.id}: section id ${JSON.stringify(s.scope)} is not [A-Za-z0-9_-]+`);
    return `section ${s.scope}`;
  },
  writeAttrs: (s) => [
    ...by.write(s), ...date.write(s),
    ...(s.revision === undefined ? [] : [['rev', s.revision] as [string, string]]),
    ...(s.unissued ? [['state', 'unissued'] as [string, string]] : []),
    ...covers.write(s), ...seen.write(s),
    ...(s.exceptions ?? []).map((x): [string, string] => ['except', writeException(x)]),
  ],
  attrs: [by, date, rev, state, covers, seen, except],
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
