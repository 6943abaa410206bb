// The summary counts every cell in error, not only the checks: a broken formula no check
// reads made the app say "25 checks: 1 NOT OK" (issue 15, item 10). Live and record alike.
import { describe, expect, it } from 'vitest';
import { summaryListHtml, summaryOf } from '../../runtime/present/summary';
import { staticHtml } from '../../runtime/record/static-html';
import { check, doc, formula, input, run } from '../engine/helpers';

const d = doc(
  input('a', '2 ft'), formula('bad', 'a + 1 psi', 'ft'), formula('after', 'bad * 2', 'ft'),
  check('a <= 3 ft', { label: 'Width within the bay' }),
);

describe('the summary counts every cell in error', () => {
  it('in the app: the head counts them and the broken formula is listed first', async () => {
    const { engine } = await run(d);
    const state = (id: string) => engine.state(id);
    const html = summaryListHtml(summaryOf(d, state, new Map()));
    expect(html).toMatch(/1 check: none NOT OK; 2 cells in error, 1 at its source/);
    expect(html.indexOf('bad: ')).toBeGreaterThan(0);
    expect(html.indexOf('bad: ')).toBeLessThan(html.indexOf('Width within the bay'));
    engine.dispose();
  });

  it('in the record: the same count, the broken formula first', async () => {
    const { engine } = await run(d);
    const html = staticHtml(d, (id) => engine.state(id));
    expect(html).toMatch(/1 check: none NOT OK; 2 cells in error, 1 at its source/);
    expect(html.indexOf('bad: ')).toBeLessThan(html.indexOf('Width within the bay'));
    engine.dispose();
  });
});
