// Each fault the reader reports, with its line and column (1-based), and what still
// loads around it. Rules from runtime/format/FORMAT.md §Errors; a broken block is
// skipped as a whole and every other cell still loads.

import { describe, expect, it } from 'vitest';
import type { Cell } from '../../runtime/document';
import { parse } from '../../runtime/format/index';

const text = (...lines: string[]): string => lines.join('\n') + '\n';
const good: Cell = { kind: 'input', id: 'ok', name: 'w', value: '12 in' };
const goodBlock = ['', 'input ok  w = 12 in'];

/** Parses a file made of `lines` then a valid block; expects one error and the valid cell. */
function oneError(lines: string[]): { line: number; column: number; message: string } {
  const r = parse(text(...lines, ...goodBlock));
  expect(r.doc.cells.filter((c) => c.id === 'ok')).toStrictEqual([good]); // spec: other cells still load
  expect(r.errors).toHaveLength(1);
  return r.errors[0];
}

describe('file header', () => {
  it('missing header: reported at the first line, the rest still read', () => {
    const r = parse(text('project   P', ...goodBlock));
    expect(r.errors).toEqual([{ line: 1, column: 1, message: expect.stringMatching(/first line must be "loadtrace 1"/) }]);
    expect(r.doc.meta.project).toBe('P');
    expect(r.doc.cells).toStrictEqual([good]);
  });

  it('empty text: missing header at 1:1', () => {
    expect(parse('')).toStrictEqual({
      doc: { meta: expect.anything(), cells: [] },
      errors: [{ line: 1, column: 1, message: expect.stringMatching(/missing "loadtrace 1" header/) }],
    });
  });

  it('header after blank and comment lines is still the header', () => {
    expect(parse('\n# c\nloadtrace 1\n').errors).toEqual([]);
  });

  it.each([
    ['loadtrace 2', 11, /unsupported format version 2/],
    ['loadtrace', 10, /missing format version/],
    ['loadtrace one', 11, /bad format version "one"/],
  ])('%s: version error at column %i', (header, column, message) => {
    expect(oneError([header])).toEqual({ line: 1, column, message: expect.stringMatching(message) });
  });

  it('a second header line is an error', () => {
    expect(oneError(['loadtrace 1', '', 'loadtrace 1', '  label x'])).toEqual({
      line: 3, column: 1, message: expect.stringMatching(/only once/),
    });
  });
});

describe('title block', () => {
  it('duplicate line: second one reported, first kept', () => {
    const r = parse(text('loadtrace 1', 'job  A', 'job  B'));
    expect(r.errors).toEqual([{ line: 3, column: 1, message: expect.stringMatching(/duplicate "job" line \(first on line 2\)/) }]);
    expect(r.doc.meta.job).toBe('A');
  });

  it('missing value', () => {
    expect(oneError(['loadtrace 1', 'date'])).toEqual({ line: 2, column: 5, message: expect.stringMatching(/missing date/) });
  });

  it('after the first cell', () => {
    const r = parse(text('loadtrace 1', ...goodBlock, 'project  Late', '  label stray'));
    expect(r.errors).toEqual([{ line: 4, column: 1, message: expect.stringMatching(/before the first cell/) }]);
    expect(r.doc.meta.project).toBe('');
    expect(r.doc.cells).toStrictEqual([good]);
  });

  it('attribute before any block', () => {
    expect(oneError(['loadtrace 1', 'job  J', '  label  Orphan', '  clause x'])).toEqual({
      line: 3, column: 1, message: expect.stringMatching(/indented line outside a cell/),
    }); // spec: one error for a run of stray lines
  });
});

describe('block headers', () => {
  it('unknown keyword: reported, its indented lines skipped silently', () => {
    expect(oneError(['loadtrace 1', '', 'diagram f1  plan.svg', '  label Plan', '  | text'])).toEqual({
      line: 3, column: 1, message: expect.stringMatching(/unknown keyword "diagram"/),
    });
  });

  it('missing id', () => {
    expect(oneError(['loadtrace 1', '', 'section'])).toEqual({ line: 3, column: 9, message: expect.stringMatching(/missing id after "section"/) });
  });

  it('bad id', () => {
    expect(oneError(['loadtrace 1', '', 'input c#3  fc = 1'])).toEqual({ line: 3, column: 7, message: expect.stringMatching(/bad id "c#3"/) });
  });

  it('duplicate id: the later block is skipped, the first kept', () => {
    const r = parse(text('loadtrace 1', ...goodBlock, '', 'check ok  w > 0', '  name w_ok'));
    // goodBlock is a blank line then the header: "ok" first on line 3, again on line 5
    expect(r.errors).toEqual([{ line: 5, column: 7, message: expect.stringMatching(/duplicate id "ok" \(first on line 3\)/) }]);
    expect(r.doc.cells).toStrictEqual([good]);
  });

  it.each([
    ['section s1', 11, /missing title/],
    ['check k1', 9, /missing condition/],
    ['input c1  fc 4000 psi', 11, /expected "name = value"/],
    ['input c1  = 4000 psi', 11, /missing name before =/],
    ['input c1  fc =', 15, /missing value/],
    ['formula f1  "a b" 1', 19, /expected = after the quoted name/],
    ['note n1  text here', 10, /nothing may follow the id of a note/],
  ])('%s: error at column %i', (header, column, message) => {
    expect(oneError(['loadtrace 1', '', header])).toEqual({ line: 3, column, message: expect.stringMatching(message) });
  });
});

describe('attributes and text lines', () => {
  const under = (header: string, ...body: string[]) => oneError(['loadtrace 1', '', header, ...body]);

  it('attribute not known to the kind', () => {
    expect(under('input c1  h = 8 in', '  unit in', '  precision 3')).toEqual({
      line: 5, column: 3, message: expect.stringMatching(/"precision" is not an attribute of a input/),
    });
  });

  it('unknown attribute', () => {
    expect(under('section s1  Loads', '  colour red')).toEqual({
      line: 4, column: 3, message: expect.stringMatching(/"colour" is not an attribute of a section/),
    });
  });

  it('duplicate attribute', () => {
    expect(under('check k1  a < b', '  label one', '  label two')).toEqual({
      line: 5, column: 3, message: expect.stringMatching(/duplicate "label" \(first on line 4\)/),
    });
  });

  it('missing value', () => {
    expect(under('formula f1  x = 2', '  unit')).toEqual({ line: 4, column: 7, message: expect.stringMatching(/missing unit/) });
  });

  it.each([['2.5'], ['three'], ['1e3'], ['99999999999999999999']])('precision %s is not a whole number', (p) => {
    expect(under('formula f1  x = 2', `  precision ${p}`)).toEqual({
      line: 4, column: 13, message: expect.stringMatching(/precision must be a whole number/),
    });
  });

  it.each([
    ['  label  "abc', 10, /no closing "/], // quote opens at column 10
    ['  label  "a\\qb"', 12, /bad escape \\q/], // backslash at column 12
    ['  label  "a\\u12G4"', 12, /bad \\u escape/],
    ['  label  "a\tb"', 12, /control character inside quoted text/], // RFC 8259 §7: raw controls not allowed
    ['  label  "a" b', 14, /unexpected text after the quoted label/],
  ])('bad JSON quoting %j at column %i', (line, column, message) => {
    expect(under('section s1  Loads', line)).toEqual({ line: 4, column, message: expect.stringMatching(message) });
  });

  it('bad quoting in a note line', () => {
    expect(under('note n1', '  | fine', '  | "open')).toEqual({ line: 5, column: 5, message: expect.stringMatching(/no closing "/) });
  });

  it('text line outside a note', () => {
    expect(under('input c1  h = 8 in', '  | text')).toEqual({
      line: 4, column: 3, message: expect.stringMatching(/a input has no text lines/),
    });
  });

  it('no space after |', () => {
    expect(under('note n1', '  |text')).toEqual({ line: 4, column: 4, message: expect.stringMatching(/expected a space after \|/) });
  });

  it('indented line after a blank line that ends a block', () => {
    const r = parse(text('loadtrace 1', '', 'note n1', '  | a', '', '  | b', ...goodBlock));
    expect(r.errors).toEqual([{ line: 6, column: 1, message: expect.stringMatching(/indented line outside a cell/) }]);
    expect(r.doc.cells).toStrictEqual([{ kind: 'note', id: 'n1', text: 'a' }, good]);
  });

  it('reports every fault of a broken block and skips only that block', () => {
    const r = parse(text('loadtrace 1', '', 'input c1  h = 8 in', '  size 3', '  unit "x', ...goodBlock));
    expect(r.errors.map((e) => [e.line, e.column])).toEqual([[4, 3], [5, 8]]); // the quote of `  unit "x` is column 8
    expect(r.doc.cells).toStrictEqual([good]);
  });
});

describe('never throws', () => {
  it('on input that is not a string', () => {
    expect(parse(undefined as unknown as string).errors).toHaveLength(1);
  });
});
