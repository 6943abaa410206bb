// Formulas for property tests of the tokenizer and of rename: names (some written
// against a number, `2L`), numbers, calls, and quoted texts (both quotes, with escapes)
// and comments that spell cell names. Every one parses; with the cells of `NAMES` as
// plain numbers and `pick` below, nearly every one computes (a division may meet zero).

import fc from 'fast-check';
import type { LibFunction } from '../../runtime/library/types';

/** Cell names the formulas read. */
export const NAMES = ['a', 'b', 'edge', 'L'] as const;

/** A test function whose value depends on its quoted text: a text changed by a rename shows in the result. */
export const pick: LibFunction = {
  name: 'pick', params: [{ name: 'x', type: '1' }, { name: 'where', type: 'text' }], returns: '1',
  clause: 'test function', doc: 'x times one more than the length of the text',
  fn: (x: number, where: string) => x * (where.length + 1),
};

const name = fc.constantFrom(...NAMES);
const number = fc.constantFrom('2', '0.5', '1e2', '3.25', '.5');
const textBody = fc.array(fc.constantFrom(...NAMES, ' ', 'x', '(', '#', '\\"', "\\'"), { maxLength: 5 }).map((p) => p.join(''));
const text = fc.tuple(fc.constantFrom('"', "'"), textBody).map(([q, body]) => q + body + q);

const { expr } = fc.letrec((tie) => ({
  term: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    name,
    number,
    fc.tuple(number, name).map(([n, x]) => `${n}${x}`),
    fc.tuple(number, name).map(([n, x]) => `${n} ${x}`),
    tie('expr').map((e) => `(${e as string})`),
    fc.tuple(tie('expr'), tie('expr')).map(([p, q]) => `max(${p as string}, ${q as string})`),
    fc.tuple(tie('expr'), text).map(([e, t]) => `pick(${e as string}, ${t})`),
  ),
  expr: fc.oneof(
    { depthSize: 'small' },
    tie('term'),
    fc.tuple(tie('expr'), fc.constantFrom(' + ', ' * ', '-', ' / '), tie('term')).map(([p, op, q]) => `${p as string}${op}${q as string}`),
  ),
}));

/** A formula, sometimes with a trailing comment that names cells. */
export const formulas = fc.tuple(expr as fc.Arbitrary<string>, fc.option(fc.constantFrom(' # a edge', ' # "L"'), { nil: '' }))
  .map(([e, comment]) => e + comment);
