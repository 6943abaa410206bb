// `npm run calc -- A --diff B` (issue 19): a check with no name is called by its label,
// not its id (the same naming function serves Review); the title block, comments and
// sign-offs that differ are reported too. Loads: ASCE 7-22 §2.3.1 combination 2
// (1.2D + 1.6L) on the invented review fixture.

import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { CalcDocument } from '../../runtime/document';
import { setInputValue } from '../../runtime/edit/index';
import { serialize } from '../../runtime/format/index';
import { addComment, changeName, compare, issueRevision, reply, resolve, signOff } from '../../runtime/review/index';
import { resultsOf, sheet } from '../review/fixture';
import { calc, scratchWithStubShell } from './helpers';

const scratch = scratchWithStubShell('cli-diff');

/** The fixture with its check unnamed (a label only), as a file. */
function unnamed(doc: CalcDocument): CalcDocument {
  return { ...doc, cells: doc.cells.map((c) => (c.kind === 'check' ? { id: c.id, kind: 'check', expr: c.expr, label: c.label } : c)) };
}

function write(name: string, doc: CalcDocument): string {
  const file = join(scratch(), name);
  writeFileSync(file, serialize(doc));
  return file;
}

describe('calc --diff naming', () => {
  it('calls a check with no name by its label, in the text and in Review\'s comparison', async () => {
    const a = unnamed(sheet());
    const b = setInputValue(a, 'i2', '60 psf');
    const r = await calc(write('a.lt', a), '--diff', write('b.lt', b));
    expect(r.code).toBe(0);
    // 1.2 × 100 + 1.6 × 50 = 200 psf → 1.2 × 100 + 1.6 × 60 = 216 psf; capacity 250 psf: 0.8 → 0.864
    expect(r.out).toMatch(/\n {2}Factored load within capacity\s+0\.8 pass\s+0\.864 pass\s+\+0\.064$/m);
    expect(r.out).not.toContain('(k1)');
    // Review: the sheet now against its issued revision, named by the same function.
    const issued = issueRevision(a, await resultsOf(a), 'A. Preparer', '2026-12-01', 'For check');
    const now = setInputValue(issued, 'i2', '60 psf');
    const cmp = compare(now, await resultsOf(now))!;
    expect(cmp.checks.map(changeName)).toEqual(['Factored load within capacity']);
    // With neither name nor label, the condition itself.
    const bare = { ...now, cells: now.cells.map((c) => (c.kind === 'check' ? { ...c, label: undefined } : c)) };
    expect(compare(bare, await resultsOf(bare))!.checks.map(changeName)).toEqual(['qu <= q_cap']);
  });
});

describe('calc --diff beyond the cells', () => {
  async function pair(): Promise<[CalcDocument, CalcDocument]> {
    let a = sheet();
    a = addComment(a, 'f1', { author: 'B. Checker', time: '2026-12-02', text: 'Which combination governs?' }).doc;
    a = addComment(a, 'i3', { author: 'B. Checker', time: '2026-12-02', text: 'Source of the capacity?' }).doc;
    a = signOff(a, { scope: 's1', by: 'B. Checker', date: '2026-12-02' }).doc;
    a = signOff(a, { scope: 's2', by: 'B. Checker', date: '2026-12-02' }).doc;
    let b = reply(a, 'cm1', { author: 'A. Preparer', time: '2026-12-03', text: '1.2D + 1.6L, §2.3.1 comb. 2' });
    b = resolve(b, 'cm1');
    b = addComment(b, 'k1', { author: 'B. Checker', time: '2026-12-03', text: 'Ratio close to 0.9 now' }).doc;
    b = { ...b, review: { ...b.review!, comments: b.review!.comments.filter((c) => c.id !== 'cm2') } };
    b = setInputValue(b, 'i2', '60 psf'); // changes what s1 covers: its sign-off goes stale
    b = { ...b, review: { ...b.review!, signoffs: b.review!.signoffs.filter((s) => s.scope !== 's2') } };
    b = signOff(b, { scope: 'document', by: 'C. Principal', date: '2026-12-04' }).doc;
    b = { ...b, meta: { ...b.meta, revision: '1', checkedBy: 'C. Principal' } };
    return [a, b];
  }

  it('lists title-block fields, comments and sign-offs that differ', async () => {
    const [a, b] = await pair();
    const fa = write('ra.lt', a);
    const fb = write('rb.lt', b);
    const r = await calc(fa, '--diff', fb);
    expect(r.code).toBe(0);
    const from = r.out.indexOf('Title block');
    expect(r.out.slice(from).split('\n')).toEqual([
      'Title block (2 differ)',
      `  checked   ${fa}: B. Checker  →  ${fb}: C. Principal`,
      `  revision  ${fa}: (empty)  →  ${fb}: 1`,
      'Comments (3 differ)',
      '  resolved, 1 reply added: on qu, B. Checker: "Which combination governs?"',
      '  added: on q_ok, B. Checker: "Ratio close to 0.9 now"',
      '  removed: on q_cap, B. Checker: "Source of the capacity?"',
      'Sign-offs (3 differ)',
      '  now stale: Loads, by B. Checker on 2026-12-02',
      '  given: the whole record, by C. Principal on 2026-12-04 (current)',
      '  withdrawn: Capacity, by B. Checker on 2026-12-02',
    ]);
    expect(r.out.startsWith('Inputs (1 differs)')).toBe(true); // the cells first, as before
  });

  it('--json carries the same as data', async () => {
    const [a, b] = await pair();
    const j = JSON.parse((await calc(write('ja.lt', a), '--diff', write('jb.lt', b), '--json')).out);
    expect(j.titleBlock).toEqual([
      { key: 'checked', field: 'checkedBy', before: 'B. Checker', after: 'C. Principal' },
      { key: 'revision', field: 'revision', before: '', after: '1' },
    ]);
    expect(j.comments.map((c: { id: string; changes: string[] }) => [c.id, c.changes])).toEqual([
      ['cm1', ['resolved', '1 reply added']], ['cm3', ['added']], ['cm2', ['removed']]]);
    expect(j.signoffs.map((s: { change: string; state?: string }) => [s.change, s.state])).toEqual([
      ['now stale', 'stale'], ['given', 'current'], ['withdrawn', undefined]]);
    // The new sign-off took the withdrawn one's id (so2): they are told apart by what they cover.
    expect(j.signoffs.map((s: { id: string; covers: string }) => [s.id, s.covers])).toEqual([
      ['so1', 'Loads'], ['so2', 'the whole record'], ['so2', 'Capacity']]);
  });

  it('a title block changed alone is a difference', async () => {
    const a = sheet();
    const r = await calc(write('ma.lt', a), '--diff', write('mb.lt', { ...a, meta: { ...a.meta, job: 'LT-27-101' } }));
    expect(r.out.split('\n')).toEqual(['Title block (1 differs)', expect.stringMatching(/^ {2}job {2}.*: \(empty\) {2}→ {2}.*: LT-27-101$/)]);
  });
});
