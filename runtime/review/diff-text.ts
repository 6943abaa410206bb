// Two records side by side as plain text, for `npm run calc -- A --diff B`:
// only the inputs, results and checks that differ.

import { changeName, onlyChanged, type Comparison, type ResultChange } from './compare';
import type { IssuedResult } from './types';

const VERDICT: Record<IssuedResult['status'], string> = { ok: 'ok', fail: 'NOT OK', error: 'error', pending: 'pending' };

function shown(r: IssuedResult | undefined, check: boolean): string {
  if (!r) return '(none)';
  if (r.status === 'error' || r.status === 'pending') return VERDICT[r.status];
  if (!check) return r.text ?? '';
  return `${r.text ?? ''} ${r.status === 'ok' ? 'pass' : VERDICT[r.status]}`.trim();
}

/** "+0.093" / "−0.012" (a true minus, as the sheet prints it). */
export function deltaText(d: number | undefined): string {
  if (d === undefined) return '';
  const s = Math.abs(d) < 5e-4 ? '0.000' : Math.abs(d).toFixed(3);
  return d > 0 && s !== '0.000' ? `+${s}` : d < 0 && s !== '0.000' ? `−${s}` : `±${s}`;
}

function block(title: string, head: string[], rows: string[][]): string[] {
  if (rows.length === 0) return [];
  const all = [head, ...rows];
  const widths = head.map((_, i) => Math.max(...all.map((l) => (l[i] ?? '').length)));
  const line = (l: string[]) => '  ' + l.map((c, i) => c.padEnd(widths[i])).join('  ').trimEnd();
  return [`${title} (${rows.length} differ${rows.length === 1 ? 's' : ''})`, line(head), ...all.slice(1).map(line)];
}

function resultRows(list: ResultChange[], check: boolean): string[][] {
  return list.map((r) => {
    const row = [changeName(r), shown(r.before, check), shown(r.after, check)];
    if (check) row.push(deltaText(r.deltaRatio));
    return row;
  });
}

/** Side-by-side lines of what differs; `a` and `b` name the two records. */
export function diffText(c: Comparison, a: string, b: string): string {
  const d = onlyChanged(c);
  const lines = [
    ...block('Inputs', ['name', a, b], d.inputs.map((r) => [r.name, r.before ?? '(none)', r.after ?? '(none)'])),
    ...block('Results', ['name', a, b], resultRows(d.results, false)),
    ...block('Checks', ['name', a, b, 'Δ ratio'], resultRows(d.checks, true)),
  ];
  return lines.length ? lines.join('\n') : `no differences in inputs, results or checks between ${a} and ${b}`;
}
