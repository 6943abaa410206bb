// When values are written raw and when quoted, comments, CRLF and other line
// conventions. Rules from runtime/format/FORMAT.md §Quoting and §Layout; the quoted
// form is a JSON string literal, RFC 8259 §7.

import { describe, expect, it } from 'vitest';
import { emptyMeta, type CalcDocument, type Cell } from '../../runtime/document';
import { parse, serialize } from '../../runtime/format/index';
import { encodeNoteLine, encodeValue, isPlain } from '../../runtime/format/quote';

const doc = (cells: Cell[]): CalcDocument => ({ meta: emptyMeta(), cells });
const text = (...lines: string[]): string => lines.join('\n') + '\n';

describe('raw or quoted values', () => {
  it.each([
    ['5000 psi', '5000 psi'], // plain text stays raw
    ['1\'-6"', '1\'-6"'], // a quote mark inside is fine (only a leading one is special)
    ['a | b = c # d', 'a | b = c # d'], // | = # have no meaning inside a value
    ['#1 bar', '#1 bar'], // a # start is only a comment in column 1
    ['', '""'], // empty is quoted
    [' lead', '" lead"'], // leading blank
    ['trail ', '"trail "'], // trailing blank
    ['\u00a0nbsp', '"\u00a0nbsp"'], // any white space at an edge, not only ASCII space
    ['"quoted"', '"\\"quoted\\""'], // leading quote mark
    ['two\nlines', '"two\\nlines"'], // RFC 8259 §7: \n escape
    ['cr\rhere', '"cr\\rhere"'], // RFC 8259 §7: \r escape
    ['tab\there', '"tab\\there"'], // RFC 8259 §7: \t escape
    ['back\\slash', 'back\\slash'], // a backslash is fine raw
    ['nul\u0000', '"nul\\u0000"'], // RFC 8259 §7: other controls as \u00XX
    ['ls\u2028x', '"ls\\u2028x"'], // line separator escaped so the line shows it
    ['rtl\u202ex', '"rtl\\u202ex"'], // bidirectional override escaped
    ['zw\u200bx', '"zw\\u200bx"'], // zero-width space escaped
    ['lone\ud800', '"lone\\ud800"'], // unpaired surrogate: cannot be UTF-8, so escaped
    ['pair😀', 'pair😀'], // a whole surrogate pair is ordinary text
  ])('%j is written as %s', (value, written) => {
    expect(encodeValue(value)).toBe(written); // spec: FORMAT.md §Quoting
    const c: Cell = { kind: 'section', id: 's', title: 't', label: value };
    const r = parse(serialize(doc([c])));
    expect(r.errors).toEqual([]);
    expect(r.doc.cells).toStrictEqual([c]); // round trip of the single value
  });

  it('isPlain rejects exactly the values that need quotes', () => {
    expect([isPlain('x'), isPlain(''), isPlain(' x'), isPlain('"x'), isPlain('x"')]).toEqual([true, false, false, false, true]);
  });

  it('note lines: empty and indented lines are raw, others quoted by the same rule', () => {
    expect(encodeNoteLine('')).toBe('  |'); // spec: empty line is `  |`
    expect(encodeNoteLine('   code')).toBe('  |    code'); // spec: indentation kept raw
    expect(encodeNoteLine('"Hi"')).toBe('  | "\\"Hi\\""'); // spec: a leading quote mark is quoted
    expect(encodeNoteLine('end ')).toBe('  | "end "'); // spec: trailing blank quoted
    expect(encodeNoteLine('| pipe')).toBe('  | | pipe'); // a | in the text needs nothing
  });

  it('quotes a name that is not an identifier, and reads it back', () => {
    const cells: Cell[] = [
      { kind: 'input', id: 'a', name: "f'c", value: '4000 psi' },
      { kind: 'input', id: 'b', name: 'x = y', value: '= 2' },
      { kind: 'formula', id: 'c', name: '', expr: '' },
    ];
    const t = serialize(doc(cells));
    expect(t).toBe(text('loadtrace 1', '', 'input a  "f\'c" = 4000 psi', '', 'input b  "x = y" = = 2', '', 'formula c  "" = ""'));
    // spec: FORMAT.md §Quoting, name raw only when [A-Za-z_][A-Za-z0-9_]*; split at the first = after the name
    expect(parse(t)).toStrictEqual({ doc: doc(cells), errors: [] });
  });

  it('reads a raw name that is not an identifier as written (the engine judges names)', () => {
    expect(parse(text('loadtrace 1', '', "input a  f'c = 4 ksi")).doc.cells).toStrictEqual([
      { kind: 'input', id: 'a', name: "f'c", value: '4 ksi' },
    ]); // spec: split at the first =
  });
});

describe('line conventions', () => {
  const cells: Cell[] = [
    { kind: 'note', id: 'n1', text: 'line one\r\nline two\r' },
    { kind: 'input', id: 'c1', name: 'w', value: '12 in', label: 'Column width' },
  ];

  it('reads CRLF files like LF files, and keeps CR inside a note exact through quoting', () => {
    const lf = serialize(doc(cells));
    expect(lf).not.toContain('\r'); // spec: CR inside a value is always escaped
    const crlf = lf.replace(/\n/g, '\r\n');
    expect(parse(crlf)).toStrictEqual({ doc: doc(cells), errors: [] }); // common practice: CRLF read as LF
  });

  it('ignores # comments in column 1, before the header, between blocks and between note lines', () => {
    const t = text(
      '# template for an interior column', 'loadtrace 1', '# title block', 'project   Mill Street Annex', '',
      '# loads', 'note n1', '  | first', '# not part of the note', '  | second', '', 'input c1  w = 12 in',
      '#  trailing comment', '  label  Column width',
    );
    const r = parse(t);
    expect(r.errors).toEqual([]); // spec: FORMAT.md §Layout, comments
    expect(r.doc.meta.project).toBe('Mill Street Annex');
    expect(r.doc.cells).toStrictEqual([{ kind: 'note', id: 'n1', text: 'first\nsecond' }, cells[1]]);
    expect(serialize(r.doc)).not.toContain('#'); // spec: comments are not kept
  });

  it('a # inside note text is text, not a comment', () => {
    const c: Cell = { kind: 'note', id: 'n', text: '# Heading\n#2' };
    expect(serialize(doc([c]))).toBe(text('loadtrace 1', '', 'note n', '  | # Heading', '  | #2'));
    expect(parse(serialize(doc([c]))).doc.cells).toStrictEqual([c]);
  });

  it('drops a byte-order mark and trailing blanks, and accepts wider padding', () => {
    const t = '\ufeffloadtrace 1  \njob    J-7\t\n\ninput   c1    w   =   12 in  \n    label      Column width \n';
    expect(parse(t)).toStrictEqual({
      doc: { meta: { ...emptyMeta(), job: 'J-7' }, cells: [cells[1]] },
      errors: [],
    }); // spec: FORMAT.md §Layout, trailing blanks ignored; padding is not part of a raw value
  });
});
