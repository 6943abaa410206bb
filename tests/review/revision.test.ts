// Issuing revisions: the baseline freezes inputs and results, the log lists what
// changed since the previous issue. Load values: ASCE 7-22 §2.3.1 combination 2
// (1.2D + 1.6L) on invented loads; the capacity is invented.

import { describe, expect, it } from 'vitest';
import { setInputValue } from '../../runtime/edit/index';
import { issueRevision, latestRevision, nextRevisionLabel, type ReviewState } from '../../runtime/review/index';
import { resultsOf, sheet } from './fixture';

describe('issueRevision', () => {
  it('freezes every input value and every result, with who and when', async () => {
    const doc = sheet();
    const out = issueRevision(doc, await resultsOf(doc), 'A. Preparer', '2026-12-01', 'For check');
    const rev = latestRevision(out)!;
    expect(rev).toMatchObject({ label: '0', date: '2026-12-01', by: 'A. Preparer', checkedBy: 'B. Checker', description: 'For check' });
    expect(rev.changedInputs).toEqual([]); // first issue: nothing to compare with
    expect(rev.baseline.inputs).toEqual([
      { id: 'i1', name: 'D', value: '100 psf' },
      { id: 'i2', name: 'L', value: '50 psf' },
      { id: 'i3', name: 'q_cap', value: '250 psf' },
      { id: 'i4', name: 'span', value: '20 ft' },
    ]);
    const qu = rev.baseline.results.find((r) => r.id === 'f1')!;
    // 1.2 × 100 + 1.6 × 50 = 200 psf (ASCE 7-22 §2.3.1, combination 2)
    expect(qu).toMatchObject({ kind: 'formula', name: 'qu', status: 'ok', unit: 'psf', text: '200 psf' });
    expect(qu.value).toBeCloseTo(200, 9);
    const k = rev.baseline.results.find((r) => r.id === 'k1')!;
    expect(k).toMatchObject({ kind: 'check', name: 'q_ok', status: 'ok', text: '0.8' });
    expect(k.ratio).toBeCloseTo(200 / 250, 12); // demand / capacity
    // The title block shows the issued revision.
    expect(out.meta.revision).toBe('0');
    expect(out.meta.date).toBe('2026-12-01');
    // The sheet itself is untouched.
    expect(out.cells).toBe(doc.cells);
  });

  it('the next issue logs each changed input with its old and new value', async () => {
    let doc = sheet();
    doc = issueRevision(doc, await resultsOf(doc), 'A. Preparer', '2026-12-01', 'For check');
    doc = setInputValue(doc, 'i2', '60 psf');
    doc = { ...doc, cells: doc.cells.filter((c) => c.id !== 'i4') };
    doc = { ...doc, cells: [...doc.cells, { id: 'i5', kind: 'input', name: 'h', value: '8 in' }] };
    doc = issueRevision(doc, await resultsOf(doc), 'A. Preparer', '2026-12-04', 'Checker comments answered', { checkedBy: 'B. Checker' });
    const rev = latestRevision(doc)!;
    expect(rev.label).toBe('1');
    expect(rev.changedInputs).toEqual([
      { id: 'i2', name: 'L', from: '50 psf', to: '60 psf' },
      { id: 'i5', name: 'h', to: '8 in' },
      { id: 'i4', name: 'span', from: '20 ft' },
    ]);
    // 1.2 × 100 + 1.6 × 60 = 216 psf (ASCE 7-22 §2.3.1, combination 2)
    expect(rev.baseline.results.find((r) => r.id === 'f1')!.text).toBe('216 psf');
    // The first issue's baseline is kept as it was.
    expect(doc.review!.revisions[0].baseline.inputs.find((i) => i.id === 'i2')!.value).toBe('50 psf');
  });

  it('refuses a label already issued or one that is not a plain word', async () => {
    const doc = sheet();
    const results = await resultsOf(doc);
    const once = issueRevision(doc, results, 'A', '2026-12-01', '', { label: 'P1' });
    expect(() => issueRevision(once, results, 'A', '2026-12-02', '', { label: 'P1' })).toThrow(/already issued/);
    expect(() => issueRevision(doc, results, 'A', '2026-12-02', '', { label: 'Rev 1' })).toThrow(/letters, digits/);
  });

  it('records an error result by its status, with no value', async () => {
    const doc = { ...sheet(), cells: [...sheet().cells, { id: 'f9', kind: 'formula' as const, name: 'bad', expr: 'D + span', unit: 'psf' }] };
    const rev = latestRevision(issueRevision(doc, await resultsOf(doc), 'A', 'd', ''))!;
    expect(rev.baseline.results.find((r) => r.id === 'f9')).toEqual({ id: 'f9', kind: 'formula', name: 'bad', status: 'error' });
  });
});

describe('nextRevisionLabel', () => {
  const withLabels = (...labels: string[]): ReviewState => ({
    revisions: labels.map((label) => ({ label, date: '', by: '', checkedBy: '', description: '', changedInputs: [], baseline: { inputs: [], results: [] } })),
    comments: [],
    signoffs: [],
  });
  it.each([
    [[], '0'],
    [['0'], '1'],
    [['0', '1', '9'], '10'],
    [['P1'], 'P2'],
    [['A'], 'B'],
    [['Z'], 'Z-1'],
    [['draft'], 'draft-1'],
    [['1', '0'], '1-1'], // counting on from "0" would repeat "1"
  ])('after %j comes %s', (labels, next) => {
    expect(nextRevisionLabel(withLabels(...(labels as string[])))).toBe(next); // our own scheme: runtime/review/types.ts
  });
});
