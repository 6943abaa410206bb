// The static rendering (runtime/record/static-html.ts): every result in the result
// column, the check summary governing-first, the review state printed with its
// revision log and stale sign-offs, and the print title block escaped into CSS.

import { describe, expect, it } from 'vitest';
import type { CalcDocument } from '../../runtime/document';
import { setInputValue } from '../../runtime/edit/index';
import { createEngine } from '../../runtime/engine';
import { addComment, issueRevision, signOff } from '../../runtime/review/index';
import { pageCss, staticHtml } from '../../runtime/record/index';

const meta = { project: 'Test block', job: 'T-1', subject: 'Slab', preparedBy: 'A', checkedBy: 'B', revision: '', date: '2026-12-01' };
const doc: CalcDocument = {
  meta,
  cells: [
    { id: 's1', kind: 'section', title: 'Loads' },
    { id: 'i1', kind: 'input', name: 'h', value: '9 in' },
    { id: 'i2', kind: 'input', name: 'wc', value: '150 pcf' },
    { id: 'f1', kind: 'formula', name: 'q', expr: 'h * wc', unit: 'psf', precision: 4 },
    { id: 'k1', kind: 'check', expr: 'q <= 120 psf', label: 'light enough' },
    { id: 'k2', kind: 'check', expr: 'q <= 110 psf', label: 'very light' },
  ],
};

async function render(d: CalcDocument): Promise<string> {
  const engine = createEngine(d);
  await engine.settled();
  const html = staticHtml(d, (id) => engine.state(id));
  engine.dispose();
  return html;
}

const cell = (html: string, id: string) => new RegExp(`id="lt-c-${id}"[\\s\\S]*?<div class="lt-res">([\\s\\S]*?)</div>`).exec(html)?.[1];

describe('static rendering', () => {
  it('shows each result in the result column and the failing check first in the summary', async () => {
    const html = await render(doc);
    // 9 in × 150 lbf/ft³ = 0.75 ft × 150 = 112.5 psf (arithmetic; common practice for slab self-weight)
    expect(cell(html, 'f1')).toBe('112.5 psf');
    expect(cell(html, 'i1')).toBe('9 in');
    expect(cell(html, 'k1')).toBe('✓ OK<br>0.94'); // 112.5 / 120 = 0.9375 → 0.94
    expect(cell(html, 'k2')).toBe('✗ NOT OK<br>1.02'); // 112.5 / 110 = 1.0227 → 1.02 (two decimals, as printed)
    const summary = /<section class="lt-summary"[\s\S]*?<\/section>/.exec(html)![0];
    expect(summary.indexOf('very light')).toBeLessThan(summary.indexOf('light enough'));
    expect(summary).toContain('1 NOT OK');
  });

  it('prints the revision log, comments and sign-offs, and marks a sign-off stale after a change', async () => {
    const engine = createEngine(doc);
    await engine.settled();
    let d = issueRevision(doc, (id) => engine.state(id), 'A. Preparer', '2026-12-01', 'First issue <b>', { label: '0' });
    engine.dispose();
    d = addComment(d, 'f1', { author: 'B. Checker', time: '2026-12-02', text: 'Use 145 pcf? <script>x</script>' }).doc;
    d = signOff(d, { scope: 's1', by: 'B. Checker', date: '2026-12-02' }).doc;
    let html = await render(d);
    expect(html).toContain('Revision log');
    expect(html).toContain('First issue &lt;b&gt;');
    expect(html).toContain('Use 145 pcf? &lt;script&gt;x&lt;/script&gt;');
    expect(html).toContain('1 open of 1');
    expect(html).toContain('✓ current');
    html = await render(setInputValue(d, 'i2', '145 pcf'));
    expect(html).toContain('⚠ stale: changed since signed');
  });

  it('writes the title block into the page margins as escaped CSS strings', () => {
    const css = pageCss({ ...meta, project: 'a"b\\c</style><script>' });
    expect(css).not.toMatch(/<|<\/style/);
    expect(css).toContain('"a\\22 b\\5c c\\3c /style\\3e \\3c script\\3e "');
    expect(css).toContain('counter(page) " OF " counter(pages)');
  });
});
