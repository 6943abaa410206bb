// The review travels in the exported HTML record (issue 7 §6): export → import gives
// it back whole, its sign-offs still match the sheet, and the record's SHA-256 covers it
// (a changed comment breaks the seal). The round trip on random documents with reviews
// also runs in tests/record/roundtrip.test.ts, whose generator carries review states.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parse } from '../../runtime/format/index';
import { DOC_ID, unpack } from '../../runtime/record/index';
import { exportComputed } from '../../runtime/record/node';
import { setInputValue } from '../../runtime/edit/index';
import { addComment, compare, isStale, issueRevision, onlyChanged, reply, signOff } from '../../runtime/review/index';
import { anyText } from '../format/arbitraries';
import { computingDocuments } from '../record/arbitraries';
import { STUB_SHELL } from '../record/fixtures';
import { reviewStates } from './arbitraries';
import { resultsOf, sheet } from './fixture';

describe('review in the exported record', () => {
  it('a reviewed sheet exported and opened again keeps its review, and the sign-offs still hold', async () => {
    let doc = sheet();
    doc = issueRevision(doc, await resultsOf(doc), 'A. Preparer', '2026-12-01', 'For check');
    doc = setInputValue(doc, 'i2', '60 psf');
    doc = addComment(doc, 'i2', { author: 'B. Checker', time: '2026-12-02 10:15', text: 'Why 60 psf?' }).doc;
    doc = reply(doc, 'cm1', { author: 'A. Preparer', time: '2026-12-03 09:00', text: 'Occupancy: office.' });
    doc = signOff(doc, { scope: 's2', by: 'B. Checker', date: '2026-12-03' }).doc;
    doc = issueRevision(doc, await resultsOf(doc), 'A. Preparer', '2026-12-04', 'Answered');
    const record = await exportComputed(doc, STUB_SHELL, '2026-12-04T12:00:00Z');
    const back = await unpack(record.html);
    expect(back.ok).toBe(true);
    const reread = parse(back.docText!);
    expect(reread.errors).toEqual([]);
    expect(reread.doc.review).toStrictEqual(doc.review);
    expect(isStale(reread.doc.review!.signoffs[0], reread.doc)).toBe(false);
    // Against its own last issue, the re-opened record has nothing changed.
    const c = compare(reread.doc, await resultsOf(reread.doc))!;
    expect(onlyChanged(c)).toEqual({ inputs: [], results: [], checks: [] });
  });

  it('the seal covers the review: changing one character of it is caught on opening', async () => {
    await fc.assert(
      fc.asyncProperty(computingDocuments, reviewStates(anyText), fc.nat(), async (d, review, pick) => {
        const doc = { ...d, review };
        const record = await exportComputed(doc, STUB_SHELL, '2026-12-01T00:00:00Z');
        // The review blocks follow the cells in the embedded text: change a letter or digit there.
        const open = record.html.indexOf(`id="${DOC_ID}"`);
        const body = record.html.indexOf('>', open) + 1;
        const end = record.html.indexOf('</script', body);
        const from = record.html.slice(body, end).search(/\n(issue|remark|signoff) /);
        expect(from).toBeGreaterThan(0);
        const m = [...record.html.slice(body + from, end).matchAll(/[A-Za-z0-9]/g)];
        const i = body + from + m[pick % m.length].index!;
        const flipped = record.html.slice(0, i) + (record.html[i] === 'x' ? 'y' : 'x') + record.html.slice(i + 1);
        const back = await unpack(flipped);
        expect(back.sealOk).toBe(false); // FIPS 180-4 SHA-256 of the embedded text no longer matches
      }),
      { numRuns: 200 },
    );
  }, 120_000);
});
