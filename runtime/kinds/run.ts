// Run: the trace written once in the sheet (its sections), computed again for every row
// of a table, an input of the trace named like a column taking the row's value. It shows
// a result table (a row a mark: its results, its governing check and status) whose rows
// open their own trace, and stands in the summary of checks with its governing row.

import type { RunCell } from '../document';
import { runFormat } from '../format/kinds/run';
import { isName, NAME_PATTERN } from '../formula/tokens';
import { runProgram } from '../graph/run-program';
import { labelHtml, liveFrame, recordFrame, renderLabel, statusOf, type CellViewBase, type ViewContext } from '../present/cell-frame';
import { errorHtml, errorOf, renderError } from '../present/error-line';
import { escapeHtml } from '../present/escape';
import { marginRefs } from '../present/margin';
import { runTableHtml, runSummaryText } from '../present/run-html';
import type { RunValue } from '../table/types';
import { CLAUSE_FIELD, LABEL_FIELD, liveView, NO_ERROR_COLUMN } from './shared';
import type { KindDescription, ParsedSource } from './types';

type RunFields = Pick<RunCell, 'name' | 'table' | 'trace' | 'results'>;

/** `footings = each marks through s5, s6 show B, h, punch_ok` */
export function runSource(c: RunFields): string {
  return `${c.name} = each ${c.table} through ${c.trace.join(', ')}${c.results.length ? ` show ${c.results.join(', ')}` : ''}`;
}

const SOURCE = new RegExp(String.raw`^\s*(${NAME_PATTERN})\s*=\s*each\s+(${NAME_PATTERN})\s+through\s+(.+?)(?:\s+show\s+(.+?))?\s*$`);

export function parseRunSource(source: string): ParsedSource<RunFields> {
  const m = SOURCE.exec(source);
  if (!m) return { ok: false, message: 'write NAME = each TABLE through SECTION-IDS show RESULTS, e.g. footings = each marks through s5, s6 show B, h, punch_ok', column: 1 };
  const list = (t: string | undefined) => (t ?? '').split(',').map((x) => x.trim()).filter(Boolean);
  const trace = list(m[3]);
  const bad = trace.find((t) => !/^[A-Za-z0-9_-]+$/.test(t));
  if (bad !== undefined) return { ok: false, message: `"${bad}" is not a section id`, column: source.indexOf(bad) + 1 };
  const results = list(m[4]);
  const badName = results.find((r) => !isName(r));
  if (badName !== undefined) return { ok: false, message: `"${badName}" is not a cell name`, column: source.indexOf(badName) + 1 };
  return { ok: true, value: { name: m[1], table: m[2], trace, results } };
}

export interface RunView extends CellViewBase {
  kind: 'run';
  name: string;
  run?: RunValue;
}

export function bindRun(cell: RunCell, ctx: ViewContext): RunView {
  const state = ctx.state(cell.id);
  return {
    id: cell.id, kind: 'run', status: statusOf(state), number: ctx.number, label: cell.label,
    refs: marginRefs(cell.clause, state), error: errorOf(state, runSource(cell)), name: cell.name, run: state?.run,
  };
}

export function renderRunView(v: RunView): string {
  const head = v.run ? `<div class="tbl-name"><code>${escapeHtml(v.name)}</code> · ${escapeHtml(runSummaryText(v.run))}</div>` : '';
  return liveFrame(v, `${renderLabel(v.label)}${head}${v.run ? runTableHtml(v.run, true) : ''}${renderError(v.error)}<div class="run-trace" data-run-trace></div>`);
}

export const run: KindDescription<'run'> = {
  kind: 'run',
  stem: 'r',
  blank: (id, freshName) => ({ id, kind: 'run', name: freshName('runs'), table: '', trace: [], results: [] }),
  named: 'required',
  fields: [LABEL_FIELD, CLAUSE_FIELD],
  refs: (cell) => [...new Set([cell.table, ...cell.results].filter((n) => n !== ''))],
  rename: (cell, from, to) => (cell.table !== from && !cell.results.includes(from) ? cell
    : { ...cell, table: cell.table === from ? to : cell.table, results: cell.results.map((r) => (r === from ? to : r)) }),
  format: runFormat,
  source: { mode: 'formula', write: runSource, read: parseRunSource, owns: ['name', 'table', 'trace', 'results'], errorAt: NO_ERROR_COLUMN },
  numbering: 'item',
  program: {
    compile: (cell, env) => runProgram(cell, { cells: () => env.cells(), named: (n) => env.sweepInfo(n), graph: env.whatIf }),
    settle(_cell, _program, value, state) {
      if (value === undefined || value === null) {
        state.status = 'pending';
        return;
      }
      const r = value as RunValue;
      state.run = r;
      state.status = r.failing ? 'fail' : r.errors ? 'error' : 'ok';
      if (r.worst) state.ratio = r.worst.ratio;
      state.display = { value: r.traces.length, unit: '', text: runSummaryText(r) };
    },
    followsUnits: false,
    followsSheet: true,
  },
  // The governing row stands for the run in the summary of checks.
  summaryTitle: (cell, state) => {
    const r = state?.run;
    const worst = r?.worst ? `: governing ${r.traces[r.worst.row].key} (${r.worst.name})` : '';
    return `${cell.label || cell.name}, every row of ${cell.table}${worst}`;
  },
  live: liveView(bindRun, renderRunView),
  record: (cell, ctx) => {
    const s = ctx.state(cell.id);
    const body = `${labelHtml(cell.label)}<div class="lt-meta">run <code>${escapeHtml(cell.name)}</code>: every row of <code>${
      escapeHtml(cell.table)}</code> through the trace ${escapeHtml(cell.trace.join(', '))}${s?.run ? `; ${escapeHtml(runSummaryText(s.run))}` : ''}</div>${
      s?.run ? runTableHtml(s.run, false) : ''}${errorHtml(s)}`;
    return recordFrame(cell, ctx, body, s?.run?.worst ? escapeHtml(s.run.worst.ratio.toFixed(2)) : '', 'pending');
  },
};
