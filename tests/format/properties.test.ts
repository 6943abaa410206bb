// Property tests of the text format (runtime/format/FORMAT.md): the round trip is
// lossless on every valid document, the reader never throws, and a fault in one
// block never costs another cell.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Cell } from '../../runtime/document';
import { parse, serialize, type FormatError } from '../../runtime/format/index';
import { anyText, documents } from './arbitraries';

const RUNS = { numRuns: 1000 };

/** Errors must point inside the text and never come from the reader's last-resort catch. */
function expectWellFormed(errors: FormatError[], text: string): void {
  const lineCount = Math.max(1, text.replace(/\r\n/g, '\n').split('\n').length);
  for (const e of errors) {
    expect(Number.isInteger(e.line) && e.line >= 1 && e.line <= lineCount).toBe(true);
    expect(Number.isInteger(e.column) && e.column >= 1).toBe(true);
    expect(e.message).not.toMatch(/internal error/);
  }
}

/** Serialized text split into its blocks: [title block, cell 1, cell 2, ...]; blocks hold no blank line. */
const blocksOf = (text: string): string[] => text.slice(0, -1).split('\n\n');
const join = (blocks: string[]): string => blocks.join('\n\n') + '\n';
/** First line number (1-based) of block i. */
const firstLine = (blocks: string[], i: number): number =>
  blocks.slice(0, i).reduce((n, b) => n + b.split('\n').length + 1, 1);

describe('round trip', () => {
  it('parse(serialize(doc)) gives doc back, with no errors', () => {
    fc.assert(
      fc.property(documents, (doc) => {
        const r = parse(serialize(doc));
        expect(r.errors).toEqual([]); // spec: FORMAT.md, lossless
        expect(r.doc).toStrictEqual(doc);
      }),
      RUNS,
    );
  });

  it('serialize(parse(serialize(doc)).doc) is the same text', () => {
    fc.assert(
      fc.property(documents, (doc) => {
        const text = serialize(doc);
        expect(serialize(parse(text).doc)).toBe(text); // spec: output is deterministic
      }),
      RUNS,
    );
  });
});

/** Line-structured noise: keywords, attributes, quotes and comment marks in random order. */
const formatNoise = fc
  .array(
    fc.oneof(
      anyText,
      fc.constantFrom('loadtrace 1', 'loadtrace 9', 'project  P', 'section s1  T', 'note n1', 'input c1  x = 1',
        'formula f1  y = x', 'check k1  y > 0', '  label  L', '  choice a', '  precision 3', '  | text', '  |',
        '  | "\\u00', '# c', '', '  ', '"', 'input c1  "a', 'figure q'),
    ),
    { maxLength: 20 },
  )
  .chain((lines) => fc.constantFrom('\n', '\r\n').map((eol) => lines.join(eol)));

describe('the reader never throws', () => {
  it('on arbitrary text, and whatever it returns is a valid document', () => {
    fc.assert(
      fc.property(fc.oneof(fc.string({ unit: 'binary', maxLength: 200 }), formatNoise), (text) => {
        const r = parse(text);
        expectWellFormed(r.errors, text);
        // Whatever loads is valid: it survives its own round trip unchanged.
        const again = parse(serialize(r.doc));
        expect(again.errors).toEqual([]);
        expect(again.doc).toStrictEqual(r.doc);
      }),
      RUNS,
    );
  });

  it('on serialized documents with random edits', () => {
    const edit = fc.record({
      at: fc.nat(),
      cut: fc.nat({ max: 8 }),
      insert: fc.string({ unit: fc.constantFrom('\n', ' ', '"', '\\', '|', '=', '#', 'x', '\r', 'input ', '\t'), maxLength: 4 }),
    });
    fc.assert(
      fc.property(documents, fc.array(edit, { minLength: 1, maxLength: 4 }), (doc, edits) => {
        let text = serialize(doc);
        for (const e of edits) {
          const at = e.at % (text.length + 1);
          text = text.slice(0, at) + e.insert + text.slice(at + e.cut);
        }
        expectWellFormed(parse(text).errors, text);
      }),
      RUNS,
    );
  });
});

/** Ways to break one block so that it must be reported and skipped. */
const breakers: ((block: string) => string)[] = [
  (b) => b.replace(/^[a-z]+/, 'gizmo'), // unknown keyword
  (b) => b.replace(/^([a-z]+) [A-Za-z0-9_-]+/, '$1 bad#id'), // bad id
  (b) => b.replace(/^([a-z]+) .*/, '$1'), // missing id: the header is the kind word alone
  (b) => b + '\n  bogus 1', // attribute not of the kind
  (b) => b + '\n  label  "unterminated', // bad JSON quoting (or a duplicate label)
  (b) => b + '\n  clause x\n  clause y', // duplicate attribute
];

describe('a fault in one block costs only that block', () => {
  it('a broken block is reported within its lines and every other cell loads', () => {
    fc.assert(
      fc.property(
        documents.filter((d) => d.cells.length > 0),
        fc.nat(),
        fc.nat({ max: breakers.length - 1 }),
        (doc, pick, how) => {
          const k = pick % doc.cells.length;
          const blocks = blocksOf(serialize(doc));
          blocks[k + 1] = breakers[how](blocks[k + 1]);
          const text = join(blocks);
          const r = parse(text);
          expect(r.errors.length).toBeGreaterThan(0);
          const from = firstLine(blocks, k + 1);
          const to = from + blocks[k + 1].split('\n').length - 1;
          for (const e of r.errors) expect(e.line >= from && e.line <= to).toBe(true);
          expect(r.doc.cells).toStrictEqual(doc.cells.filter((_, i) => i !== k));
          expect(r.doc.meta).toStrictEqual(doc.meta);
        },
      ),
      RUNS,
    );
  });

  it('stray lines and duplicated blocks are reported, and all cells still load', () => {
    fc.assert(
      fc.property(documents.filter((d) => d.cells.length > 0), fc.nat(), fc.boolean(), (doc, pick, stray) => {
        const k = pick % doc.cells.length;
        const blocks = blocksOf(serialize(doc));
        // A stray indented block after cell k, or a copy of cell k at the end (same id).
        if (stray) blocks.splice(k + 2, 0, '  label  stray\n  | text');
        else blocks.push(blocks[k + 1]);
        const r = parse(join(blocks));
        expect(r.errors).toHaveLength(1);
        expect(r.errors[0].message).toMatch(stray ? /outside a cell/ : /duplicate id/);
        expect(r.doc).toStrictEqual(doc);
      }),
      RUNS,
    );
  });

  it('a random line inside one block never disturbs the other cells', () => {
    const noise = fc.string({ unit: 'binary', maxLength: 30 }).map((s) => s.replace(/[\r\n]/g, ''));
    fc.assert(
      fc.property(documents.filter((d) => d.cells.length > 0), fc.nat(), fc.nat(), noise, (doc, pick, where, junk) => {
        const k = pick % doc.cells.length;
        const blocks = blocksOf(serialize(doc));
        const lines = blocks[k + 1].split('\n');
        lines[where % lines.length] = '  ' + junk; // indented: it can never open a new block
        blocks[k + 1] = lines.join('\n');
        const text = join(blocks);
        const r = parse(text);
        expectWellFormed(r.errors, text);
        const others: Cell[] = doc.cells.filter((_, i) => i !== k);
        expect(r.doc.cells.filter((c) => c.id !== doc.cells[k].id)).toStrictEqual(others);
      }),
      RUNS,
    );
  });
});
