// Generators of valid documents for the format's property tests. Strings reach
// every corner the quoting rule must handle: newlines, CR, quotes, backslashes,
// leading/trailing blanks, `|`, `=`, `#` starts, hidden characters, lone surrogates.

import { WORKING_CHOICES } from '../../runtime/format/settings';
import fc from 'fast-check';
import type { CalcDocument, Cell, CellKind, DocMeta } from '../../runtime/document';
import type { CellOf } from '../../runtime/kinds/types';
import { reviewStates } from '../review/arbitraries';

const tricky = fc.constantFrom(
  ' ', '  ', '"', '\\', '|', '=', ' = ', '#', '# ', '\n', '\r', '\r\n', '\t', '\u0000', '\u007f',
  '\u0085', '\u00a0', '\u2028', '\u2029', '\u200b', '\u202e', '\ufeff', '\u3000', '\ud800', '\udc00',
  'é', '€', '😀', 'a', 'Z', '0', '_', '-', '$', "'", 'psi', '  | ', '|"', '""', 'null', 'loadtrace 1',
  'input c1  x = 1', 'label', '\\u0041',
);

/** Any string, empty ones included. */
export const anyText: fc.Arbitrary<string> = fc.oneof(
  { weight: 3, arbitrary: fc.string({ unit: tricky, maxLength: 10 }) },
  { weight: 2, arbitrary: fc.string({ unit: 'binary', maxLength: 16 }) },
  { weight: 2, arbitrary: fc.string({ maxLength: 16 }) },
  { weight: 1, arbitrary: fc.constant('') },
);

/** Multi-line text such as a note holds (empty lines and an empty text included). */
const noteText = fc.oneof(anyText, fc.array(anyText, { maxLength: 5 }).map((lines) => lines.join('\n')));

const identifier = fc.stringMatching(/^[A-Za-z_][A-Za-z0-9_]{0,7}$/);
/** Names are mostly identifiers (written raw), sometimes anything (written quoted). */
const cellName = fc.oneof({ weight: 3, arbitrary: identifier }, { weight: 1, arbitrary: anyText });

const cellId = fc.string({
  unit: fc.constantFrom(...'abcxyzABCXYZ0129_-'.split('')),
  minLength: 1,
  maxLength: 5,
});

const opts = { noNullPrototype: true } as const;

const section = fc.record(
  { kind: fc.constant('section' as const), title: anyText, label: anyText, clause: anyText },
  { ...opts, requiredKeys: ['kind', 'title'] },
);
const note = fc.record(
  { kind: fc.constant('note' as const), text: noteText, label: anyText, clause: anyText },
  { ...opts, requiredKeys: ['kind', 'text'] },
);
const input = fc.record(
  {
    kind: fc.constant('input' as const),
    name: cellName,
    value: anyText,
    unit: anyText,
    min: anyText,
    max: anyText,
    // An empty list is normalised away by the format, so a present list has items.
    choices: fc.array(anyText, { minLength: 1, maxLength: 4 }),
    description: noteText,
    label: anyText,
    clause: anyText,
  },
  { ...opts, requiredKeys: ['kind', 'name', 'value'] },
);
const formula = fc.record(
  {
    kind: fc.constant('formula' as const),
    name: cellName,
    expr: anyText,
    unit: anyText,
    precision: fc.integer(),
    label: anyText,
    clause: anyText,
  },
  { ...opts, requiredKeys: ['kind', 'name', 'expr'] },
);
const check = fc.record(
  { kind: fc.constant('check' as const), expr: anyText, name: cellName, label: anyText, clause: anyText },
  { ...opts, requiredKeys: ['kind', 'expr'] },
);

const figure = fc.record(
  { kind: fc.constant('figure' as const), expr: anyText, label: anyText, clause: anyText },
  { ...opts, requiredKeys: ['kind', 'expr'] },
);
const sweep = fc.record(
  {
    kind: fc.constant('sweep' as const),
    input: cellName,
    from: anyText,
    to: anyText,
    steps: fc.integer(),
    fixed: fc.constant(true as const),
    // Always present; an empty list is written as no lines and reads back as [].
    outputs: fc.array(cellName, { maxLength: 3 }),
    label: anyText,
    clause: anyText,
  },
  { ...opts, requiredKeys: ['kind', 'input', 'from', 'to', 'outputs'] },
);

/** Values are kept trimmed (a row line is read back value by value, trimmed). */
const tableValue = anyText.filter((v) => v.trim() === v);
const table = fc
  .record({
    name: cellName,
    columns: fc.array(fc.record({ name: identifier, type: anyText.filter((t) => t !== '' && t.trim() === t) }, opts), { minLength: 1, maxLength: 4 }),
    label: anyText,
    clause: anyText,
  }, { ...opts, requiredKeys: ['name', 'columns'] })
  .chain((t) => fc.array(fc.array(tableValue, { minLength: t.columns.length, maxLength: t.columns.length }), { maxLength: 4 })
    .map((rows) => ({ kind: 'table' as const, ...t, rows })));

const run = fc.record(
  {
    kind: fc.constant('run' as const),
    name: cellName,
    table: anyText,
    // Always present; an empty list is written as no lines and reads back as [].
    trace: fc.array(anyText, { maxLength: 3 }),
    results: fc.array(cellName, { maxLength: 3 }),
    label: anyText,
    clause: anyText,
  },
  { ...opts, requiredKeys: ['kind', 'name', 'table', 'trace', 'results'] },
);

/** One generator per kind: a kind added to the Cell union does not compile here until it has one. */
const KIND_CELLS: { [K in CellKind]: fc.Arbitrary<Omit<CellOf<K>, 'id'>> } = { section, note, input, formula, check, figure, sweep, table, run };

const cellWithoutId = fc.oneof(...Object.values(KIND_CELLS));

export const cells: fc.Arbitrary<Cell[]> = fc
  .array(cellWithoutId, { maxLength: 8 })
  .chain((list) =>
    fc
      .uniqueArray(cellId, { minLength: list.length, maxLength: list.length })
      .map((ids) => list.map((c, i) => ({ id: ids[i], ...c }) as Cell)),
  );

export const meta: fc.Arbitrary<DocMeta> = fc.record(
  {
    project: anyText,
    job: anyText,
    subject: anyText,
    preparedBy: anyText,
    checkedBy: anyText,
    revision: anyText,
    date: anyText,
  },
  opts,
);

/** About half the documents carry a review (revisions, remarks, sign-offs: FORMAT.md "Review"). */
export const documents: fc.Arbitrary<CalcDocument> = fc.record(
  { meta, cells, review: reviewStates(anyText), working: fc.constantFrom(...WORKING_CHOICES) },
  { ...opts, requiredKeys: ['meta', 'cells'] },
);
