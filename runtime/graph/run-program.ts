// A run cell in the graph: the trace (the cells of its sections) computed again for every
// row of a table, inputs of the trace named like a column taking the row's value. The
// run's variable reads the table and every cell of the trace, so it recomputes when any
// of them changes; within it, only the rows whose values changed are computed again while
// nothing else the trace reads has changed (an edit to one mark's column size recomputes
// that mark only; an edit to a storey recomputes every mark that reads the storeys).

import type { Cell, RunCell } from '../document';
import { CellError } from '../formula/cell-error';
import { describeType, NUMBER, sameType, TABLE, TEXT, type VType } from '../formula/value-type';
import type { ColumnInfo, RunColumn, RunTrace, RunValue, TableEntry, TableValue } from '../table/types';
import { failing, type CellProgram, type CheckResult } from './cell-program';
import { Pacer } from './pacer';
import { RowEvaluator, sameRead } from './run-rows';
import type { SweepCellInfo, WhatIfGraph } from './what-if';

/** What a run needs of the engine while it compiles. */
export interface RunEnv {
  cells(): readonly Cell[];
  named(name: string): SweepCellInfo | undefined;
  graph: WhatIfGraph;
}

/** The cells of the trace: each named section and the cells after it, up to the next section. */
export function traceCells(cells: readonly Cell[], sections: readonly string[]): { cells: Cell[]; missing?: string } {
  const out: Cell[] = [];
  for (const sid of sections) {
    const at = cells.findIndex((c) => c.id === sid);
    if (at < 0 || cells[at].kind !== 'section') return { cells: out, missing: sid };
    for (let i = at + 1; i < cells.length && cells[i].kind !== 'section'; i++) out.push(cells[i]);
  }
  return { cells: out };
}

interface Last {
  programs: (CellProgram | undefined)[];
  reads: unknown[];
  byRow: Map<readonly TableEntry[], RunTrace>;
}

export function runProgram(cell: RunCell, env: RunEnv): CellProgram {
  const reads = [cell.table, ...cell.results];
  const fail = (kind: CellError['kind'], msg: string) => failing(new CellError(kind, msg), reads);
  if (!cell.table.trim()) return fail('syntax', 'name the table whose rows to run: over TABLE');
  const table = env.named(cell.table);
  if (!table) return fail('unknown-name', `"${cell.table}" is not the name of any cell`);
  if (table.kind !== 'table') return fail('not-allowed', `${cell.table} is a ${table.kind}, not a table`);
  const columns: ColumnInfo[] | undefined = table.program?.table?.columns;
  if (!columns) return fail('upstream', `reads ${cell.table}, which has an error`);
  if (cell.trace.length === 0) return fail('syntax', 'name the section(s) of the trace: trace SECTION-ID');
  const trace = traceCells(env.cells(), cell.trace);
  if (trace.missing !== undefined) return fail('unknown-name', `"${trace.missing}" is not the id of a section`);
  // Every cell of the trace that computes, compiled yet or not (a sweep or a run inside is left out).
  const computing = trace.cells.filter((c) => c.kind !== 'section' && c.kind !== 'note' && c.kind !== 'sweep' && c.kind !== 'run');
  // Inputs of the trace named like a column take the row's value.
  const bound: { id: string; column: number }[] = [];
  for (const c of trace.cells) {
    if (c.kind !== 'input') continue;
    const k = columns.findIndex((col) => col.name === c.name);
    if (k < 0) continue;
    const t = env.graph.program(c.id)?.type;
    if (t && !sameType(t, columns[k].type)) {
      return fail('unit', `column ${columns[k].name} of ${cell.table} is ${describeType(columns[k].type)}, but the trace's input ${c.name} is ${describeType(t)}`);
    }
    bound.push({ id: c.id, column: k });
  }
  if (bound.length === 0) return fail('not-allowed', `no input of the trace is named like a column of ${cell.table} (${columns.map((c) => c.name).join(', ')}): nothing would change from row to row`);
  const results: RunColumn[] = [];
  const types: VType[] = [];
  for (const name of cell.results) {
    const c = trace.cells.find((x) => 'name' in x && x.name === name);
    if (!c) return fail('unknown-name', `"${name}" is not a cell of the trace`);
    if (c.kind !== 'formula' && c.kind !== 'check') return fail('not-allowed', `${name} is a ${c.kind}; a result is a formula or a check`);
    const p = env.graph.program(c.id);
    results.push({ name, id: c.id, kind: c.kind, unit: c.kind === 'formula' ? p?.unit ?? '' : '' });
    types.push(p?.type ?? NUMBER);
  }
  const checks = computing.filter((c) => c.kind === 'check').map((c) => ({ id: c.id, name: (c.kind === 'check' && (c.name ?? c.label)) || c.id }));
  const ids = computing.map((c) => c.id);
  const boundIds = new Set(bound.map((b) => b.id));
  let last: Last | undefined;

  const runRow = (ev: RowEvaluator, row: readonly TableEntry[]): RunTrace => {
    const outcomes = ev.row(new Map(bound.map((b) => [b.id, row[b.column]])), ids);
    let status: RunTrace['status'] = 'ok';
    let governing: RunTrace['governing'];
    for (const k of checks) {
      const o = outcomes.get(k.id);
      if (!o?.ok) {
        status = 'error';
        continue;
      }
      const r = o.value as CheckResult;
      if (!r.pass && status !== 'error') status = 'fail';
      if (typeof r.value === 'number' && (!governing || r.value > governing.ratio)) governing = { id: k.id, name: k.name, ratio: r.value };
    }
    const values = results.map((c) => {
      const o = outcomes.get(c.id);
      if (!o?.ok) return undefined;
      return c.kind === 'check' ? (o.value as CheckResult).value : o.value;
    });
    return { key: String(row[0]), source: row, outcomes, status, governing, results: values };
  };

  return {
    type: TABLE,
    inputs: [table.id, ...ids],
    reads,
    clauses: [],
    unit: '',
    definition: async (tv: unknown, ...traceValues: unknown[]): Promise<RunValue> => {
      const t = tv as TableValue;
      if (t.incomplete) throw new CellError('upstream', `reads ${cell.table}, which has an error`, undefined, cell.table);
      const programs = ids.map((id) => env.graph.program(id));
      const same = last && last.programs.every((p, i) => p === programs[i]) && last.reads.every((v, i) => sameRead(v, traceValues[i]));
      const ev = new RowEvaluator(env.graph, boundIds);
      const pacer = new Pacer();
      pacer.begin();
      const traces: RunTrace[] = [];
      for (const row of t.rows) {
        const kept = same ? last!.byRow.get(row) : undefined;
        traces.push(kept ?? await pacer.pace(() => runRow(ev, row)));
      }
      last = { programs, reads: traceValues, byRow: new Map(traces.map((tr) => [tr.source, tr])) };
      return runValue(cell, results, types, traces);
    },
  };
}

function runValue(cell: RunCell, results: RunColumn[], types: VType[], traces: RunTrace[]): RunValue {
  const entry = (v: unknown): TableEntry => (typeof v === 'number' || typeof v === 'string' || typeof v === 'boolean' ? v : NaN);
  let worst: RunValue['worst'];
  traces.forEach((tr, row) => {
    if (!tr.governing) return;
    const better = !worst || (tr.status === 'fail') > (traces[worst.row].status === 'fail')
      || ((tr.status === 'fail') === (traces[worst.row].status === 'fail') && tr.governing.ratio > worst.ratio);
    if (better) worst = { row, name: tr.governing.name, ratio: tr.governing.ratio };
  });
  return {
    name: cell.name, run: true, table: cell.table, results, traces, worst,
    failing: traces.filter((t) => t.status === 'fail').length,
    errors: traces.filter((t) => t.status === 'error').length,
    columns: [{ name: 'key', type: TEXT, unit: '' }, ...results.map((r, k): ColumnInfo => ({ name: r.name, type: types[k], unit: r.unit }))],
    rows: traces.map((tr) => [tr.key, ...tr.results.map(entry)]),
    problems: [], incomplete: false, typed: [],
  };
}
