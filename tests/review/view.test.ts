// The review view's HTML (cells/review/render.ts, tables.ts): what a checker reads,
// every document text escaped. Loads: ASCE 7-22 §2.3.1 combination 2 (1.2D + 1.6L)
// on invented values.

import { describe, expect, it } from 'vitest';
import { logHtml, panelHtml, signoffLine, threadHtml, titleExtrasHtml } from '../../cells/review/render';
import { cellMarks, changeCount, comparisonHtml, resultText } from '../../cells/review/tables';
import type { CalcDocument } from '../../runtime/document';
import { setInputValue } from '../../runtime/edit/index';
import { addComment, compare, issueRevision, reply, resolve, signOff } from '../../runtime/review/index';
import { resultsOf, sheet } from './fixture';

/** Visible text of an HTML string: tags dropped, entities for the five escaped characters read back. */
const plain = (html: string): string => html
  .replace(/<br>|<\/(?:p|header|li)>/g, '\n').replace(/<[^>]+>/g, '')
  .replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&#39;/g, "'").replace(/&amp;/g, '&')
  .replace(/[ \t]+/g, ' ').replace(/ *\n[\s]*/g, '\n').trim();

async function reviewed(): Promise<CalcDocument> {
  let doc = sheet();
  doc = issueRevision(doc, await resultsOf(doc), 'A. Preparer', '2026-12-01', 'For check');
  doc = setInputValue(doc, 'i1', '120 psf');
  return setInputValue(doc, 'i2', '60 psf');
}

describe('comparison tables and cell marks', () => {
  it('marks each changed cell with issued → now, a check with its change in ratio', async () => {
    const doc = await reviewed();
    const marks = cellMarks(compare(doc, await resultsOf(doc))!, '0');
    expect([...marks.keys()]).toEqual(['i1', 'i2', 'f1', 'k1']); // i3, i4 unchanged: no mark
    expect(plain(marks.get('i1')!)).toBe('Rev 0: 100 psf → now 120 psf');
    // 1.2 × 120 + 1.6 × 60 = 240 psf (ASCE 7-22 §2.3.1); 240/250 = 0.96 against 0.8
    expect(plain(marks.get('f1')!)).toBe('Rev 0: 200 psf → now 240 psf');
    expect(plain(marks.get('k1')!)).toBe('Rev 0: 0.8 OK → now 0.96 OK (Δ ratio +0.160)');
  });

  it('only what changed leaves the unchanged rows out; counts read as words', async () => {
    const doc = await reviewed();
    const c = compare(doc, await resultsOf(doc))!;
    const all = comparisonHtml(c, 'Issued', 'Now', false);
    const some = comparisonHtml(c, 'Issued', 'Now', true);
    expect((all.match(/<tr class="rv-same">/g) ?? []).length).toBe(2); // q_cap and span
    expect(some).not.toContain('rv-same');
    expect((some.match(/<tr class="rv-changed">/g) ?? []).length).toBe(4);
    expect(changeCount(c)).toBe('2 inputs, 1 result and 1 check changed');
    expect(comparisonHtml({ inputs: [], results: [], checks: [] }, 'a', 'b', true)).toContain('No input, result or check differs.');
  });

  it('an unnamed check is called by its label in the tables, as calc --diff calls it (changeName)', async () => {
    // The fixture's check without its name: 1.2 × 120 + 1.6 × 60 = 240 psf against 250 psf (ASCE 7-22 §2.3.1).
    const unnamed = (d: CalcDocument): CalcDocument => ({ ...d, cells: d.cells.map((c) => (c.kind === 'check' && c.id === 'k1' ? { ...c, name: undefined } : c)) });
    const doc = unnamed(await reviewed());
    const html = comparisonHtml(compare(doc, await resultsOf(doc))!, 'Issued', 'Now', true);
    const checks = plain(html.slice(html.indexOf('<caption>Checks')));
    expect(checks).toContain('Factored load within capacity');
    expect(checks).not.toContain('(k1)');
  });

  it('a verdict is always a word, never colour alone', () => {
    expect(resultText({ id: 'k', kind: 'check', status: 'fail', text: '1.11', ratio: 1.11, value: 1.11 }, true)).toBe('1.11 NOT OK');
    expect(resultText({ id: 'k', kind: 'check', status: 'error' }, true)).toBe('error');
    expect(resultText(undefined, false)).toBe('—');
  });

  it('escapes what the document holds', () => {
    const c = {
      inputs: [{ id: 'i"1', name: '<b>x</b>', before: '<img src=x onerror=alert(1)>', after: '&amp;', changed: true }],
      results: [], checks: [],
    };
    const html = comparisonHtml(c, '<i>', 'Now', true) + [...cellMarks(c, '<0>').values()].join('');
    expect(html).not.toMatch(/<img|<b>x|<i>|<0>/);
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
    expect(html).toContain('data-goto="i&quot;1"');
  });
});

describe('comments', () => {
  it('the toggle counts comments and open ones; the thread shows replies and the forms', () => {
    let doc = addComment(sheet(), 'i2', { author: 'B. Checker', time: '2026-12-02 10:15', text: 'Why 50?\nName the occupancy.' }).doc;
    doc = addComment(doc, 'i2', { author: 'B. Checker', time: '2026-12-02 10:16', text: '<script>x</script>' }).doc;
    doc = reply(doc, 'cm1', { author: 'A. Preparer', time: '2026-12-03 09:00', text: 'Office.' });
    doc = resolve(doc, 'cm1');
    const list = doc.review!.comments;
    expect(plain(threadHtml('i2', list, false, false, 'B'))).toBe('2 comments, 1 open');
    const open = threadHtml('i2', list, true, false, 'B. Checker');
    expect(plain(open)).toContain('RESOLVED B. Checker 2026-12-02 10:15\nWhy 50?\nName the occupancy.');
    expect(plain(open)).toContain('A. Preparer 2026-12-03 09:00\nOffice.');
    expect(open).not.toContain('<script>');
    expect(open).toContain('data-rv="reopen" data-comment="cm1"');
    expect(open).toContain('data-rv="resolve" data-comment="cm2"');
    expect(open).toContain('value="B. Checker"');
    expect(threadHtml('i1', [], false, false, '')).toBe(''); // nothing to show outside review mode
    expect(plain(threadHtml('i1', [], false, true, ''))).toBe('Comment');
  });

  it('the title block counts open comments and shows the whole-record sign-off', () => {
    let doc = addComment(sheet(), 'i2', { author: 'B', time: 't', text: 'a' }).doc;
    doc = addComment(doc, 'k1', { author: 'B', time: 't', text: 'b' }).doc;
    doc = resolve(doc, 'cm2');
    doc = signOff(doc, { scope: 'document', by: 'B. Checker', date: '2026-12-05' }).doc;
    expect(plain(titleExtrasHtml(doc))).toBe('Open comments: 1 of 2 ✓ Signed off the whole record: B. Checker, 2026-12-05');
    const edited = setInputValue(doc, 'i4', '30 ft');
    expect(plain(titleExtrasHtml(edited))).toBe('Open comments: 1 of 2 ⚠ Sign-off of the whole record STALE: B. Checker, 2026-12-05 — changed since signed');
  });
});

describe('sign-offs and the revision log', () => {
  it('a section sign-off reads current, then stale after an edit in its section', async () => {
    const doc = signOff(sheet(), { scope: 's2', by: 'B. Checker', date: '2026-12-03' }).doc;
    const s = doc.review!.signoffs[0];
    expect(plain(signoffLine(doc, s, true))).toBe('✓ Signed off section “Capacity”: B. Checker, 2026-12-03');
    expect(plain(signoffLine(setInputValue(doc, 'i3', '260 psf'), s, false))).toBe('⚠ Sign-off STALE: B. Checker, 2026-12-03 — changed since signed');
    const gone = { ...doc, cells: doc.cells.filter((c) => c.id !== 's2') };
    expect(plain(signoffLine(gone, s, true))).toContain('section “(section s2, deleted)” STALE');
  });

  it('the log lists each issue with the inputs changed from the previous one', async () => {
    let doc = await reviewed();
    doc = { ...doc, cells: [...doc.cells.filter((c) => c.id !== 'i4'), { id: 'i5', kind: 'input', name: 'h', value: '8 in' }] };
    doc = issueRevision(doc, await resultsOf(doc), 'A. Preparer', '2026-12-04', 'Loads <revised>\nsecond line', { checkedBy: 'B. Checker' });
    const rows = [...logHtml(doc).matchAll(/<tr>(.*?)<\/tr>/g)].map((m) => plain(m[1].replace(/<\/td><td>/g, ' | ')));
    expect(rows).toEqual([
      'Rev. | Date | By | Checked by | Description | Inputs changed from the previous revision'.replace(/ \| /g, ''),
      '0 | 2026-12-01 | A. Preparer | B. Checker | For check | First issue',
      '1 | 2026-12-04 | A. Preparer | B. Checker | Loads <revised>\nsecond line | D: 100 psf → 120 psf; L: 50 psf → 60 psf; h: new, 8 in; span: removed (was 20 ft)',
    ]);
    expect(logHtml(sheet())).toBe('');
  });

  it('the panel names the baseline and offers return to baseline only when an input differs', async () => {
    const doc = await reviewed();
    const results = await resultsOf(doc);
    const m = { doc, latest: doc.review!.revisions[0], comparison: compare(doc, results), onlyChanged: false, userName: 'B. Checker', today: '2026-12-02' };
    const html = panelHtml(m);
    expect(plain(html)).toContain('Review against Rev 0, issued 2026-12-01 by A. Preparer');
    expect(html).toMatch(/data-rv="baseline">/);
    const back = issueRevision(sheet(), await resultsOf(sheet()), 'A', '2026-12-01', '');
    const none = panelHtml({ ...m, doc: back, latest: back.review!.revisions[0], comparison: compare(back, await resultsOf(back)) });
    expect(none).toMatch(/data-rv="baseline" disabled>/);
    expect(plain(panelHtml({ ...m, latest: undefined, comparison: undefined }))).toContain('Issue a revision');
  });
});
