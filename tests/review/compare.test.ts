// Review mode's data: inputs old → new, results and checks issued vs current with
// the change in ratio; return to baseline; two records side by side.
// Loads: ASCE 7-22 §2.3.1 combination 2 (1.2D + 1.6L) on invented values.

import { describe, expect, it } from 'vitest';
import { setInputValue } from '../../runtime/edit/index';
import {
  addComment, compare, diffRecords, diffText, issueRevision, onlyChanged, returnToBaseline, signOff,
} from '../../runtime/review/index';
import { deltaText } from '../../runtime/review/diff-text';
import { resultsOf, sheet } from './fixture';

async function issued() {
  const doc = sheet();
  return issueRevision(doc, await resultsOf(doc), 'A. Preparer', '2026-12-01', 'For check');
}

describe('compare against the issued baseline', () => {
  it('is undefined before the first issue', async () => {
    expect(compare(sheet(), await resultsOf(sheet()))).toBeUndefined();
  });

  it('shows the two inputs the checker changed, old → new, and the ratio change', async () => {
    let doc = await issued();
    doc = setInputValue(doc, 'i1', '120 psf');
    doc = setInputValue(doc, 'i2', '60 psf');
    const c = compare(doc, await resultsOf(doc))!;
    expect(c.inputs.filter((r) => r.changed)).toEqual([
      { id: 'i1', name: 'D', before: '100 psf', after: '120 psf', changed: true },
      { id: 'i2', name: 'L', before: '50 psf', after: '60 psf', changed: true },
    ]);
    expect(c.inputs.find((r) => r.id === 'i3')).toEqual({ id: 'i3', name: 'q_cap', before: '250 psf', after: '250 psf', changed: false });
    const qu = c.results.find((r) => r.id === 'f1')!;
    // 1.2 × 100 + 1.6 × 50 = 200 psf → 1.2 × 120 + 1.6 × 60 = 240 psf (ASCE 7-22 §2.3.1)
    expect([qu.before!.text, qu.after!.text, qu.changed]).toEqual(['200 psf', '240 psf', true]);
    const k = c.checks.find((r) => r.id === 'k1')!;
    expect([k.before!.text, k.after!.text]).toEqual(['0.8', '0.96']); // 200/250 → 240/250
    expect(k.deltaRatio).toBeCloseTo(0.16, 12);
    expect(deltaText(k.deltaRatio)).toBe('+0.160');
    expect(onlyChanged(c)).toEqual({ inputs: c.inputs.slice(0, 2), results: [qu], checks: [k] });
  });

  it('marks a check whose verdict flips, and cells added or removed since the issue', async () => {
    let doc = await issued();
    doc = setInputValue(doc, 'i3', '180 psf');
    let c = compare(doc, await resultsOf(doc))!;
    let k = c.checks.find((r) => r.id === 'k1')!;
    expect([k.before!.status, k.after!.status, k.after!.text]).toEqual(['ok', 'fail', '1.11']); // 200/180 > 1
    expect(k.deltaRatio).toBeCloseTo(200 / 180 - 0.8, 12);
    doc = { ...doc, cells: [...doc.cells.filter((x) => x.id !== 'f1'), { id: 'f2', kind: 'formula', name: 'w', expr: 'q_cap * 2 ft', unit: 'plf' }] };
    c = compare(doc, await resultsOf(doc))!;
    k = c.checks.find((r) => r.id === 'k1')!;
    expect([k.before!.status, k.after!.status]).toEqual(['ok', 'error']); // qu is gone: k1 cannot compute
    expect(k.deltaRatio).toBeUndefined();
    expect(c.results.map((r) => [r.id, !!r.before, !!r.after, r.changed])).toEqual([['f2', false, true, true], ['f1', true, false, true]]);
  });
});

describe('returnToBaseline', () => {
  it('puts the issued input values back and loses nothing else', async () => {
    let doc = await issued();
    doc = setInputValue(doc, 'i1', '120 psf');
    doc = setInputValue(doc, 'i2', '60 psf');
    doc = addComment(doc, 'i1', { author: 'B. Checker', time: 't', text: 'Tried 120 psf' }).doc;
    doc = signOff(doc, { scope: 's3', by: 'B. Checker', date: 'd' }).doc;
    const added = { id: 'i9', kind: 'input' as const, name: 'extra', value: '3 ft' };
    doc = { ...doc, cells: [...doc.cells, added] };
    const back = returnToBaseline(doc);
    expect(back.cells.filter((c) => c.kind === 'input').map((c) => [c.id, (c as { value: string }).value])).toEqual([
      ['i1', '100 psf'], ['i2', '50 psf'], ['i3', '250 psf'], ['i4', '20 ft'], ['i9', '3 ft'],
    ]);
    expect(back.review).toBe(doc.review); // comments, sign-offs, revisions untouched
    expect(back.meta).toBe(doc.meta);
    expect(back.cells.find((c) => c.id === 'k1')).toBe(doc.cells.find((c) => c.id === 'k1'));
    const c = compare(back, await resultsOf(back))!;
    expect(onlyChanged(c).inputs.map((r) => r.id)).toEqual(['i9']); // only the new input differs
    expect(onlyChanged(c).checks).toEqual([]);
  });

  it('gives the same document back when nothing differs, or when nothing was issued', async () => {
    const doc = await issued();
    expect(returnToBaseline(doc)).toBe(doc);
    const plain = sheet();
    expect(returnToBaseline(plain)).toBe(plain);
  });
});

describe('two records side by side', () => {
  it('pairs cells by id, else by name, and prints only what differs', async () => {
    const a = sheet();
    // The second record was written apart: other ids, one input changed, a check renamed.
    const b = {
      ...a,
      cells: a.cells.map((c) => {
        const renamed = { ...c, id: `x${c.id}` };
        if (c.id === 'i2') return { ...renamed, value: '80 psf' };
        return renamed;
      }),
    };
    const cmp = diffRecords({ doc: a, results: await resultsOf(a) }, { doc: b, results: await resultsOf(b) });
    expect(onlyChanged(cmp).inputs).toEqual([{ id: 'xi2', name: 'L', before: '50 psf', after: '80 psf', changed: true }]);
    // 1.2 × 100 + 1.6 × 80 = 248 psf (ASCE 7-22 §2.3.1); 248/250 = 0.992
    const text = diffText(cmp, 'A.lt', 'B.lt');
    expect(text.split('\n')).toEqual([
      'Inputs (1 differs)',
      '  name  A.lt    B.lt',
      '  L     50 psf  80 psf',
      'Results (1 differs)',
      '  name  A.lt     B.lt',
      '  qu    200 psf  248 psf',
      'Checks (1 differs)',
      '  name  A.lt      B.lt        Δ ratio',
      '  q_ok  0.8 pass  0.992 pass  +0.192',
    ]);
    expect(diffText(diffRecords({ doc: a, results: await resultsOf(a) }, { doc: a, results: await resultsOf(a) }), 'A', 'B'))
      .toBe('no differences in inputs, results or checks between A and B');
  });

  it('deltaText rounds to three decimals with a true minus', () => {
    expect(deltaText(-0.0123)).toBe('−0.012');
    expect(deltaText(0.0001)).toBe('±0.000');
    expect(deltaText(undefined)).toBe('');
  });
});
