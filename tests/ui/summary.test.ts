// The summary of checks (runtime/present/summary.ts): one set of rows, order and words
// for the live list and the record's table.

import { describe, expect, it } from 'vitest';
import type { Cell } from '../../runtime/document';
import type { CellState } from '../../runtime/engine-types';
import { summaryCount, summaryListHtml, summaryOf, summaryRows, summaryTableHtml } from '../../runtime/present/summary';

const cells: Cell[] = [
  { id: 's1', kind: 'section', title: 'Slab' },
  { id: 'k1', kind: 'check', expr: 'a <= b', label: 'Flexure' },
  { id: 'k2', kind: 'check', expr: 'c <= d', name: 'punch_ok', clause: 'ACI 318-19 §22.6.1.2' },
  { id: 'k3', kind: 'check', expr: 'e <= f' },
  { id: 'k4', kind: 'check', expr: 'g == h' },
  { id: 'f1', kind: 'formula', name: 'x', expr: '1' },
];
const states: Record<string, CellState> = {
  k1: { id: 'k1', status: 'ok', ratio: 0.5, clauses: [], reads: [] },
  k2: { id: 'k2', status: 'ok', ratio: 0.9, clauses: [], reads: [] },
  k3: { id: 'k3', status: 'fail', ratio: 1.1, clauses: ['ACI 318-19 §8.3.1.1'], reads: [] },
  k4: { id: 'k4', status: 'error', clauses: [], reads: [] },
};
const numbers = new Map([['k1', '1.1'], ['k2', '1.2'], ['k3', '1.3'], ['k4', '1.4']]);

describe('summary of checks', () => {
  const rows = summaryRows(cells, (id) => states[id], numbers);

  it('lists the checks only, failures first, then errors, then passes by falling ratio', () => {
    expect(rows.map((r) => r.id)).toEqual(['k3', 'k4', 'k2', 'k1']);
    expect(rows.map((r) => r.title)).toEqual(['e <= f', 'g == h', 'punch_ok', 'Flexure']);
    expect(rows[0].reference).toBe('ACI 318-19 §8.3.1.1'); // the functions' clauses when it has none of its own
    expect(rows[2].reference).toBe('ACI 318-19 §22.6.1.2');
  });

  it('counts them in one wording', () => {
    expect(summaryCount(rows)).toBe('4 checks: 1 NOT OK, 1 without a result');
    expect(summaryCount(rows.filter((r) => r.status === 'ok'))).toBe('2 checks: all OK');
    expect(summaryCount(rows.filter((r) => r.status !== 'fail'))).toBe('3 checks: none NOT OK, 1 without a result');
    expect(summaryCount([rows[2]])).toBe('1 check: all OK');
  });

  it('draws the same rows and words live and in the record', () => {
    const summary = summaryOf({ cells }, (id) => states[id], numbers);
    expect(summary?.rows).toEqual(rows); // no cell but a check is in error
    const live = summaryListHtml(summary);
    const record = summaryTableHtml(summary);
    for (const html of [live, record]) {
      expect(html).toContain('4 checks: 1 NOT OK, 1 without a result');
      expect(html.indexOf('>1.3<')).toBeGreaterThan(0);
      expect(html.indexOf('>1.3<')).toBeLessThan(html.indexOf('>1.1<'));
    }
    expect(live).toContain('<span aria-hidden="true">✗</span> NOT OK');
    expect(record).toContain('<td class="lt-sum-v">✗ NOT OK</td>');
    expect(live).toContain('width:88.0%'); // ratio 1.1 on a bar that spans 0 to 1.25: 1.1 / 1.25 = 88 %
    const none = summaryOf({ cells: cells.filter((c) => c.kind !== 'check') }, (id) => states[id], numbers);
    expect(none).toBeUndefined();
    expect(summaryListHtml(none)).toBe('');
    expect(summaryTableHtml(none)).toBe('');
  });
});
