// The headless result of a document: one row a cell, as JSON or an aligned table.

import type { CalcDocument, Cell } from '../document';
import { cellName } from '../document';
import type { Engine } from '../engine-types';

export interface ResultRow {
  id: string;
  kind: Cell['kind'];
  name: string | null;
  label: string | null;
  /** Number in the display unit, or a text/boolean, or null when there is none. */
  value: number | string | boolean | null;
  unit: string | null;
  status: 'ok' | 'fail' | 'error' | 'pending';
  ratio: number | null;
  clause: string | null;
  error: string | null;
}

export function resultRows(doc: CalcDocument, engine: Engine): ResultRow[] {
  return doc.cells.map((cell) => {
    const s = engine.state(cell.id);
    const value = s?.display ? s.display.value : null;
    return {
      id: cell.id,
      kind: cell.kind,
      name: cellName(cell) ?? null,
      label: cell.label ?? (cell.kind === 'section' ? cell.title : null),
      value: typeof value === 'number' && !Number.isFinite(value) ? null : value,
      unit: s?.display ? s.display.unit : null,
      status: s?.status ?? 'pending',
      ratio: s?.ratio !== undefined && Number.isFinite(s.ratio) ? s.ratio : null,
      clause: cell.clause ?? (s?.clauses.length ? s.clauses.join('; ') : null),
      error: s?.error?.message ?? null,
    };
  });
}

export function exitCode(rows: ResultRow[]): 0 | 1 | 2 {
  if (rows.some((r) => r.status === 'error' || r.status === 'pending')) return 2;
  if (rows.some((r) => r.kind === 'check' && r.status === 'fail')) return 1;
  return 0;
}

export function table(rows: ResultRow[], engine: Engine): string {
  const lines: string[][] = [['name', 'label', 'value', 'unit', 'status']];
  for (const r of rows) {
    if (r.kind === 'note') continue;
    if (r.kind === 'section') {
      lines.push([`== ${r.label ?? ''}`, '', '', '', '']);
      continue;
    }
    const s = engine.state(r.id);
    const shown = r.kind === 'check'
      ? s?.ratio !== undefined ? `${s.demand?.text} / ${s.capacity?.text} = ${s.display?.text}` : (s?.display?.text ?? '')
      : s?.display ? s.display.text.replace(new RegExp(` ${escape(s.display.unit)}$`), '') : '';
    const status = r.status === 'error' ? `error: ${r.error}` : r.kind === 'check' ? (r.status === 'ok' ? 'pass' : r.status) : r.status;
    lines.push([r.name ?? (r.kind === 'check' ? '(check)' : ''), clip(r.label ?? '', 44), clip(shown, 60), r.kind === 'check' ? '' : (r.unit ?? ''), status]);
  }
  const widths = lines[0].map((_, i) => Math.max(...lines.map((l) => (i === 4 ? 0 : l[i].length))));
  return lines.map((l) => l.map((c, i) => (i === 4 ? c : c.padEnd(widths[i]))).join('  ').trimEnd()).join('\n');
}

function clip(s: string, n: number): string {
  return s.length > n ? `${s.slice(0, n - 1)}…` : s;
}

function escape(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
