// Comments with replies, and sign-offs that go stale when what they cover changes.

import { describe, expect, it } from 'vitest';
import { setExpr, setInputValue, setCellFields } from '../../runtime/edit/index';
import {
  addComment, coverFingerprint, fingerprint, isStale, issueRevision, openComments, reply, resolve, signOff, withdrawSignOff,
} from '../../runtime/review/index';
import { resultsOf, sheet } from './fixture';

describe('comments', () => {
  it('a comment on a cell is open, takes replies, resolves and opens again', () => {
    const a = addComment(sheet(), 'i1', { author: 'B. Checker', time: '2026-12-02 10:15', text: 'Why 100 psf?' });
    expect(a.id).toBe('cm1');
    const b = addComment(a.doc, 'k1', { author: 'B. Checker', time: '2026-12-02 10:20', text: 'Capacity source?' });
    expect(b.id).toBe('cm2');
    expect(openComments(b.doc).map((c) => c.id)).toEqual(['cm1', 'cm2']);
    expect(openComments(b.doc, 'k1').map((c) => c.id)).toEqual(['cm2']);
    let doc = reply(b.doc, 'cm1', { author: 'A. Preparer', time: '2026-12-03 09:00', text: '8 in slab + finishes.' });
    expect(doc.review!.comments[0].replies).toEqual([{ author: 'A. Preparer', time: '2026-12-03 09:00', text: '8 in slab + finishes.' }]);
    doc = resolve(doc, 'cm1');
    expect(doc.review!.comments[0].status).toBe('resolved');
    expect(openComments(doc).map((c) => c.id)).toEqual(['cm2']);
    expect(resolve(doc, 'cm1')).toBe(doc); // already resolved: nothing to do
    doc = resolve(doc, 'cm1', false);
    expect(openComments(doc)).toHaveLength(2);
    // The sheet's cells are never touched by the review.
    expect(doc.cells).toStrictEqual(sheet().cells);
  });

  it('refuses an unknown cell, an unknown comment and empty text', () => {
    const note = { author: 'B', time: 't', text: 'x' };
    expect(() => addComment(sheet(), 'nope', note)).toThrow(/no cell/);
    expect(() => addComment(sheet(), 'i1', { ...note, text: '  ' })).toThrow(/needs some text/);
    expect(() => reply(sheet(), 'cm9', note)).toThrow(/no comment/);
    expect(() => resolve(sheet(), 'cm9')).toThrow(/no comment/);
  });

  it('gives each comment its own id', () => {
    let doc = sheet();
    for (let i = 0; i < 5; i++) doc = addComment(doc, 'i1', { author: 'B', time: 't', text: `c${i}` }).doc;
    const ids = doc.review!.comments.map((c) => c.id);
    expect(new Set(ids).size).toBe(5);
  });
});

describe('fingerprint', () => {
  // FNV-1a 32-bit test vectors (Fowler–Noll–Vo reference test suite), from memory: the
  // first 8 hex digits are plain FNV-1a 32 over the text's code units (ASCII here).
  it.each([
    ['', '811c9dc5'],
    ['a', 'e40c292c'],
    ['foobar', 'bf9cf968'],
  ])('FNV-1a 32 of %j is %s', (text, hex) => {
    expect(fingerprint(text).slice(0, 8)).toBe(hex);
  });
  it('is 16 hex digits and tells near texts apart', () => {
    expect(fingerprint('fc = 4000 psi')).toMatch(/^[0-9a-f]{16}$/);
    expect(fingerprint('fc = 4000 psi')).not.toBe(fingerprint('fc = 5000 psi'));
    expect(fingerprint('ab')).not.toBe(fingerprint('ba'));
  });
});

describe('sign-off', () => {
  const by = { by: 'B. Checker', date: '2026-12-03' };

  it('is fresh when signed and goes stale when a cell of its section changes', () => {
    const { doc, id } = signOff(sheet(), { scope: 's2', ...by });
    const s = doc.review!.signoffs.find((x) => x.id === id)!;
    expect(s).toMatchObject({ id: 'so1', scope: 's2', by: 'B. Checker', date: '2026-12-03' });
    expect(isStale(s, doc)).toBe(false);
    expect(isStale(s, setInputValue(doc, 'i3', '260 psf'))).toBe(true); // an input of the section
    expect(isStale(s, setExpr(doc, 'k1', 'qu <= 0.9 q_cap'))).toBe(true); // the check itself
    expect(isStale(s, setCellFields(doc, 'k1', { label: 'Other words' }))).toBe(true); // anything it covers
  });

  it('goes stale when an input upstream of the section changes, not when an unrelated one does', () => {
    const { doc } = signOff(sheet(), { scope: 's2', ...by });
    const s = doc.review!.signoffs[0];
    expect(isStale(s, setInputValue(doc, 'i1', '110 psf'))).toBe(true); // D feeds qu, which k1 reads
    expect(isStale(s, setInputValue(doc, 'i4', '30 ft'))).toBe(false); // span: read by nothing in s2
    expect(isStale(s, setCellFields(doc, 'i1', { label: 'Dead load, new words' }))).toBe(false); // upstream label only
  });

  it('the whole record goes stale with any cell; review notes never make it stale', async () => {
    const { doc } = signOff(sheet(), { scope: 'document', ...by });
    const s = doc.review!.signoffs[0];
    expect(isStale(s, setInputValue(doc, 'i4', '30 ft'))).toBe(true);
    const noted = addComment(doc, 'i1', { author: 'B', time: 't', text: 'ok' }).doc;
    expect(isStale(s, noted)).toBe(false);
    expect(isStale(s, issueRevision(noted, await resultsOf(noted), 'A', 'd', ''))).toBe(false);
  });

  it('a deleted section leaves its sign-off stale; an unknown section cannot be signed', () => {
    const { doc } = signOff(sheet(), { scope: 's3', ...by });
    const gone = { ...doc, cells: doc.cells.filter((c) => c.id !== 's3') };
    expect(coverFingerprint(gone, 's3')).toBeUndefined();
    expect(isStale(doc.review!.signoffs[0], gone)).toBe(true);
    expect(() => signOff(sheet(), { scope: 'i1', ...by })).toThrow(/no section/); // i1 is an input
    expect(() => signOff(sheet(), { scope: 's1', by: ' ', date: 'd' })).toThrow(/needs a name/);
  });

  it('notes the latest issued revision and can be withdrawn', async () => {
    const issued = issueRevision(sheet(), await resultsOf(sheet()), 'A', '2026-12-01', '');
    const { doc, id } = signOff(issued, { scope: 's1', ...by });
    expect(doc.review!.signoffs[0].revision).toBe('0');
    expect(withdrawSignOff(doc, id).review!.signoffs).toEqual([]);
    expect(() => withdrawSignOff(doc, 'so9')).toThrow(/no sign-off/);
  });
});
