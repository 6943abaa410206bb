// The review state rides along the saved undo history (runtime/edit/delta.ts), so an
// autosaved sheet keeps its revisions, comments and sign-offs.

import { describe, expect, it } from 'vitest';
import { packSheets, setInputValue, unpackSheets } from '../../runtime/edit/index';
import { addComment, issueRevision, resolve, signOff } from '../../runtime/review/index';
import { resultsOf, sheet } from './fixture';

describe('history deltas carry the review', () => {
  it('every step of a review session comes back from base + deltas', async () => {
    const s0 = sheet();
    const s1 = issueRevision(s0, await resultsOf(s0), 'A. Preparer', '2026-12-01', 'For check');
    const s2 = setInputValue(s1, 'i1', '120 psf');
    const s3 = addComment(s2, 'i1', { author: 'B. Checker', time: '2026-12-02 10:00', text: 'Tried 120 psf' }).doc;
    const s4 = resolve(s3, 'cm1');
    const s5 = signOff(s4, { scope: 's2', by: 'B. Checker', date: '2026-12-02' }).doc;
    const s6 = { meta: s5.meta, cells: s5.cells }; // review dropped altogether
    const sheets = [s0, s1, s2, s3, s4, s5, s6];
    const { base, steps } = packSheets(sheets);
    expect(steps[1].review).toBeUndefined(); // an input edit does not copy the review
    expect(steps[5].review).toBeNull();
    const back = unpackSheets(base, steps);
    back.forEach((d, i) => expect(d).toStrictEqual(sheets[i]));
  });
});
