// The review part of the text format (runtime/format/FORMAT.md, "Review"): the spec's
// example, a real issued record, faults reported and contained, and the writer's refusals.
// The round trip on random documents with reviews is the format's own property test
// (tests/format/properties.test.ts, whose generator now carries review states).

import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { emptyMeta, type CalcDocument } from '../../runtime/document';
import { setInputValue } from '../../runtime/edit/index';
import { parse, serialize } from '../../runtime/format/index';
import { addComment, isStale, issueRevision, reply, resolve, signOff } from '../../runtime/review/index';
import { documents } from '../format/arbitraries';
import { resultsOf, sheet } from './fixture';

const spec = readFileSync(new URL('../../runtime/format/FORMAT.md', import.meta.url), 'utf8');
const example = [...spec.matchAll(/```loadtrace\n([\s\S]*?)```/g)].map((m) => m[1]).find((t) => t.includes('\nissue 0\n'))!;
const text = (...lines: string[]): string => lines.join('\n') + '\n';

describe('the review example in FORMAT.md', () => {
  it('reads without errors into the review it shows', () => {
    const { doc, errors } = parse(example);
    expect(errors).toEqual([]); // spec: FORMAT.md "Review" example is a valid file
    const r = doc.review!;
    expect(r.revisions.map((x) => [x.label, x.date, x.by, x.checkedBy])).toEqual([
      ['0', '2026-12-01', 'A. Preparer', ''],
      ['1', '2026-12-04', 'A. Preparer', 'B. Checker'],
    ]);
    expect(r.revisions[1].changedInputs).toEqual([{ id: 'i2', name: 'L', from: '50 psf', to: '60 psf' }]);
    expect(r.revisions[0].baseline.inputs).toEqual([{ id: 'i1', name: 'D', value: '100 psf' }, { id: 'i2', name: 'L', value: '50 psf' }]);
    expect(r.revisions[0].baseline.results).toEqual([
      { id: 'f1', kind: 'formula', name: 'qu', status: 'ok', value: 200, unit: 'psf', text: '200 psf' },
      { id: 'k1', kind: 'check', name: 'q_ok', status: 'ok', value: 0.8, text: '0.8', ratio: 0.8 },
    ]);
    expect(r.revisions[0].description).toBe('First issue, for check.');
    expect(r.comments).toEqual([{
      id: 'cm1', cellId: 'i2', author: 'B. Checker', time: '2026-12-02 10:15', status: 'resolved',
      text: 'Where does 50 psf come from? Name the occupancy.',
      replies: [{ author: 'A. Preparer', time: '2026-12-03 09:40', text: 'Office with movable partitions; 60 psf used throughout.' }],
    }]);
    expect(r.signoffs).toEqual([{ id: 'so1', scope: 's1', by: 'B. Checker', date: '2026-12-05', revision: '1', covered: '2b0d607332f01e88' }]);
    // The example's fingerprint is the real one: its sign-off is not stale.
    expect(isStale(r.signoffs[0], doc)).toBe(false);
  });

  it('is written back byte for byte', () => {
    expect(serialize(parse(example).doc)).toBe(example); // spec: the example is serializer output
  });
});

describe('a record issued and reviewed through the model', () => {
  it('survives the text format with everything in it', async () => {
    let doc: CalcDocument = sheet();
    doc = issueRevision(doc, await resultsOf(doc), 'A. Preparer', '2026-12-01', 'For check.\n\nTwo paragraphs.');
    doc = setInputValue(doc, 'i2', '60 psf');
    doc = addComment(doc, 'i2', { author: 'B. Checker', time: '2026-12-02 10:15', text: 'Why "60"?\n  - list item' }).doc;
    doc = reply(doc, 'cm1', { author: 'A. Preparer', time: '2026-12-03', text: 'Occupancy.' });
    doc = resolve(doc, 'cm1');
    doc = signOff(doc, { scope: 's2', by: 'B. Checker', date: '2026-12-05' }).doc;
    doc = signOff(doc, { scope: 'document', by: 'B. Checker', date: '2026-12-05' }).doc;
    doc = issueRevision(doc, await resultsOf(doc), 'A. Preparer', '2026-12-06', 'Answered');
    const r = parse(serialize(doc));
    expect(r.errors).toEqual([]);
    expect(r.doc).toStrictEqual(doc);
    for (const s of r.doc.review!.signoffs) expect(isStale(s, r.doc)).toBe(false);
  });

  it('a review with nothing in it is no review', () => {
    const doc = { ...sheet(), review: { revisions: [], comments: [], signoffs: [] } };
    expect('review' in parse(serialize(doc)).doc).toBe(false);
  });
});

describe('faults in review blocks', () => {
  const head = ['loadtrace 1', '', 'input i1  x = 1'];
  const cases: [string, string[], number, number, RegExp][] = [
    ['duplicate label', ['issue 0', '', 'issue 0'], 7, 7, /duplicate revision "0" \(first on line 5\)/],
    ['text after an issue label', ['issue 0  extra'], 5, 10, /nothing may follow the id of an issue/],
    ['reply before its remark', ['reply cm1', '  by X', '', 'remark cm1  i1'], 5, 7, /reply to remark "cm1", which is not written before it/],
    ['bad remark status', ['remark cm1  i1', '  status maybe'], 6, 10, /status must be open or resolved/],
    ['remark without its cell', ['remark cm1'], 5, 11, /id of the cell commented on/],
    ['sign-off scope', ['signoff so1  part s1'], 5, 14, /"record" or "section <section id>"/],
    ['section named document', ['signoff so1  section document'], 5, 14, /"record" or "section/],
    ['input line with no =', ['issue 0', '  input i1 x 1'], 6, 9, /expected = after the name/],
    ['bad status in a result', ['issue 0', '  formula f1 y good'], 6, 11, /status must be ok, fail, error, pending/],
    ['unknown part of a result', ['issue 0', '  check k1 - ok size=3'], 6, 9, /"size=" is not a part of a check line/],
    ['a text value must be quoted', ['issue 0', '  formula f1 y ok value=abc'], 6, 11, /value must be a number, true, false or a quoted text/],
    ['bad id in a baseline line', ['issue 0', '  input i#1 x = 1'], 6, 9, /bad input id "i#1"/],
    ['a sign-off has no text', ['signoff so1  record', '  | words'], 6, 3, /a signoff has no text lines/],
    ['unknown attribute', ['remark cm1  i1', '  size 3'], 6, 3, /"size" is not an attribute of a remark \(expected status, by, time\)/],
  ];
  it.each(cases)('%s: reported where it is, the block skipped, the cells kept', (_, lines, line, column, message) => {
    const r = parse(text(...head, '', ...lines));
    expect(r.errors).toEqual([{ line, column, message: expect.stringMatching(message) }]); // spec: FORMAT.md "Review", faults
    expect(r.doc.cells).toEqual([{ kind: 'input', id: 'i1', name: 'x', value: '1' }]);
  });

  it('a reply to a broken remark is reported and skipped; the other blocks load', () => {
    const r = parse(text(...head, '', 'remark cm1  i1', '  status maybe', '', 'reply cm1', '  by X', '', 'remark cm2  i1', '  by Y'));
    expect(r.errors.map((e) => e.line)).toEqual([6, 8]); // the bad status, then the orphaned reply
    expect(r.doc.review!.comments.map((c) => c.id)).toEqual(['cm2']);
  });
});

describe('the writer refuses what it could not read back', () => {
  const base = { meta: emptyMeta(), cells: [] };
  it.each([
    ['a revision label with a blank', { revisions: [{ label: 'Rev 1', date: '', by: '', checkedBy: '', description: '', changedInputs: [], baseline: { inputs: [], results: [] } }], comments: [], signoffs: [] }],
    ['a comment on a cell id with a blank', { revisions: [], comments: [{ id: 'cm1', cellId: 'a b', author: '', time: '', text: '', status: 'open' as const, replies: [] }], signoffs: [] }],
    ['a sign-off of a section id with a blank', { revisions: [], comments: [], signoffs: [{ id: 'so1', scope: 's 1', by: '', date: '', covered: '' }] }],
  ])('%s', (_, review) => {
    expect(() => serialize({ ...base, review })).toThrow(/is not \[A-Za-z0-9_-\]\+/);
  });
});

/** Serialized text split into its blocks; blocks hold no blank line. */
const blocksOf = (t: string): string[] => t.slice(0, -1).split('\n\n');

describe('a fault in one review block costs only that block', () => {
  it('an unknown attribute in any review block: reported there, every other block loads (a remark takes its replies along)', () => {
    fc.assert(
      fc.property(documents.filter((d) => !!d.review), fc.nat(), (doc, pick) => {
        const blocks = blocksOf(serialize(doc));
        const first = 1 + doc.cells.length; // blocks before: title block, then one per cell
        const k = first + (pick % (blocks.length - first));
        blocks[k] += '\n  bogus 1';
        const r = parse(blocks.join('\n\n') + '\n');
        // A broken remark takes its replies with it (each reported); any other block goes alone.
        const [word, id] = blocks[k].split('\n')[0].split(/ +/);
        const gone = (b: string, i: number) => i === k || (word === 'remark' && b.split('\n')[0] === `reply ${id}`);
        expect(r.errors).toHaveLength(blocks.filter(gone).length);
        expect(r.errors[0].message).toMatch(/"bogus" is not an attribute/);
        for (const e of r.errors.slice(1)) expect(e.message).toMatch(/reply to remark/);
        expect(r.doc.cells).toStrictEqual(doc.cells);
        expect(r.doc.meta).toStrictEqual(doc.meta);
        // Everything else reads back block for block.
        expect(blocksOf(serialize(r.doc)).slice(1)).toStrictEqual(blocks.filter((b, i) => !gone(b, i)).slice(1));
      }),
      { numRuns: 300 },
    );
  });
});
