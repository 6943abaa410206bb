// Honest record states and sign-offs that name the state they cover (issue 14, item 1
// and 2): a sheet is a draft until issued, issued while it matches its latest revision,
// and a draft (or a checker's working copy) once changed; a sign-off records the
// revision, whether the sheet differed from it, a fingerprint of the inputs and results
// seen, and the NOT OK checks, errors and open comments it was given with.
// Loads: ASCE 7-22 §2.3.1 combination 2 (1.2D + 1.6L) on the fixture's invented values.

import { describe, expect, it } from 'vitest';
import { setCellFields, setInputValue, setInputValueKeepUnit } from '../../runtime/edit/index';
import { parse, serialize } from '../../runtime/format/index';
import { findingsCount, signedStateText, stateFileTag, stateTitle } from '../../runtime/present/record-state';
import {
  addComment, isStale, issueRevision, recordState, returnToBaseline, signOff, signoffFindings,
} from '../../runtime/review/index';
import { resultsOf, sheet } from './fixture';

async function issued() {
  const doc = sheet();
  return issueRevision(doc, await resultsOf(doc), 'A. Preparer', '2026-12-01', 'For check.');
}

describe('record state', () => {
  it('a sheet never issued is a draft', async () => {
    const s = recordState(sheet(), { results: await resultsOf(sheet()) });
    expect(s).toEqual({ kind: 'draft' });
    expect(stateTitle(s)).toBe('Draft: never issued');
    expect(stateFileTag(s)).toBe('draft');
  });

  it('an issued sheet is its revision until anything in it changes, then a draft or a working copy', async () => {
    const doc = await issued();
    const s = recordState(doc);
    expect(s).toEqual({ kind: 'issued', revision: { label: '0', date: '2026-12-01' } });
    expect(stateTitle(s)).toBe('Issued: Rev 0, 2026-12-01');
    expect(stateFileTag(s)).toBe('rev0');
    // Comments do not change what was issued.
    expect(recordState(addComment(doc, 'i1', { author: 'B', time: 't', text: 'why?' }).doc).kind).toBe('issued');
    const edited = setInputValue(doc, 'i2', '60 psf');
    expect(recordState(edited).kind).toBe('changed');
    expect(stateFileTag(recordState(edited))).toBe('draft-after-rev0');
    expect(recordState(edited, { reviewing: true }).kind).toBe('review-copy');
    expect(stateFileTag(recordState(edited, { reviewing: true }))).toBe('review-copy-of-rev0');
    expect(recordState(setCellFields(doc, 'k1', { label: 'Other words' })).kind).toBe('changed'); // any field
    // Back to the issued values: the revision again.
    expect(recordState(returnToBaseline(edited)).kind).toBe('issued');
    // Also when the editor pinned the display unit on the way (10 psf typed where 50 psf stood is the same unit;
    // 0.5 ksf is not: the unit shown before, psf, is pinned).
    const pinned = returnToBaseline(setInputValueKeepUnit(doc, 'i2', '0.5 ksf'));
    expect(pinned.cells.find((c) => c.id === 'i2')).toMatchObject({ value: '50 psf', unit: 'psf' });
    expect(recordState(pinned).kind).toBe('issued');
    // A display unit that changes what is shown is a change.
    expect(recordState(setCellFields(doc, 'i2', { unit: 'ksf' })).kind).toBe('changed');
  });

  it('the sheet fingerprint travels with the revision through the text format', async () => {
    const doc = await issued();
    const back = parse(serialize(doc));
    expect(back.errors).toEqual([]);
    expect(back.doc.review!.revisions[0].sheet).toMatch(/^[0-9a-f]{16}$/);
    expect(recordState(back.doc).kind).toBe('issued');
    expect(recordState(setInputValue(back.doc, 'i1', '90 psf')).kind).toBe('changed');
  });

  it('a revision written before the fingerprint is compared by its inputs', async () => {
    const doc = await issued();
    const old = { ...doc, review: { ...doc.review!, revisions: doc.review!.revisions.map(({ sheet: _, ...r }) => r) } };
    expect(recordState(old).kind).toBe('issued');
    expect(recordState(setInputValue(old, 'i1', '90 psf')).kind).toBe('changed');
  });
});

describe('sign-off names the state it covers', () => {
  it('signed at the issued values: Rev 0; signed after a change: Rev 0 + unissued changes, stale once returned', async () => {
    const doc = await issued();
    const atRev = signOff(doc, { scope: 'document', by: 'B. Checker', date: '2026-12-03', results: await resultsOf(doc) });
    const s0 = atRev.doc.review!.signoffs[0];
    expect(s0.unissued).toBeUndefined();
    expect(signedStateText(s0)).toBe('Rev 0');
    expect(s0.seen).toMatch(/^[0-9a-f]{16}$/);

    const tweaked = setInputValue(doc, 'i2', '60 psf');
    const r = await resultsOf(tweaked);
    const signed = signOff(tweaked, { scope: 'document', by: 'B. Checker', date: '2026-12-03', results: r }).doc;
    const s1 = signed.review!.signoffs[0];
    expect(s1.revision).toBe('0');
    expect(s1.unissued).toBe(true);
    expect(signedStateText(s1)).toBe('Rev 0 + unissued changes');
    expect(isStale(s1, signed, r)).toBe(false);
    // Return to baseline: what it signed (L = 60 psf) is no longer the sheet.
    const back = returnToBaseline(signed);
    expect(isStale(s1, back, await resultsOf(back))).toBe(true);
    // Through the text format, the state it names is kept.
    const reread = parse(serialize(signed)).doc.review!.signoffs[0];
    expect(reread).toEqual(s1);
  });

  it('records the NOT OK checks, errors and open comments it was given with, within its scope', async () => {
    // 1.2 × 100 + 1.6 × 150 = 360 psf > 250 psf: q_ok is NOT OK (ASCE 7-22 §2.3.1, combination 2)
    let doc = setInputValue(sheet(), 'i2', '150 psf');
    doc = addComment(doc, 'i3', { author: 'B. Checker', time: 't', text: 'Source of the capacity?' }).doc;
    doc = addComment(doc, 'i1', { author: 'B. Checker', time: 't', text: 'Finishes included?' }).doc;
    doc = { ...doc, cells: [...doc.cells, { id: 'f9', kind: 'formula', name: 'bad', expr: 'qu + 1 ft', unit: 'psf' }] };
    const r = await resultsOf(doc);
    expect(r('k1')?.status).toBe('fail');
    expect(r('f9')?.status).toBe('error'); // a pressure plus a length
    const whole = signoffFindings(doc, r, 'document');
    expect(whole.map((x) => `${x.kind} ${x.id}`)).toEqual(['not-ok k1', 'error f9', 'open-comment cm1', 'open-comment cm2']);
    expect(findingsCount(whole)).toBe('1 check NOT OK, 1 cell in error and 2 open comments');
    // Section s2 (capacity) holds k1 and i3, not i1 nor f9 (f9 was added after s3).
    const s2 = signoffFindings(doc, r, 's2');
    expect(s2.map((x) => `${x.kind} ${x.id}`)).toEqual(['not-ok k1', 'open-comment cm1']);
    expect(s2[0].text).toBe('q_ok: Factored load within capacity');
    const signed = signOff(doc, { scope: 's2', by: 'B. Checker', date: 'd', results: r }).doc.review!.signoffs[0];
    expect(signed.exceptions).toEqual(s2);
    expect(signed.revision).toBeUndefined();
    expect(signedStateText(signed)).toBe('a draft never issued');
  });

  it('goes stale when the results it saw change even if no cell it covers did (results given)', async () => {
    const doc = sheet();
    const r = await resultsOf(doc);
    const s = signOff(doc, { scope: 's2', by: 'B', date: 'd', results: r }).doc.review!.signoffs[0];
    // A different result for k1 with the same cells: as after a library change.
    const other = (id: string) => (id === 'k1' ? { ...r('k1')!, ratio: 0.5 } : r(id));
    expect(isStale(s, doc, r)).toBe(false);
    expect(isStale(s, doc, other)).toBe(true);
  });
});
