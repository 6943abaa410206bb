// Table: rows of typed, unit-carrying values under named columns (storeys, column marks),
// edited value by value where they stand. Its source is the block as the text format
// writes it, without the `table <id>` line: the name, the columns, the rows.

import type { TableCell } from '../document';
import { readRow, tableFormat, writeRow } from '../format/kinds/table';
import { isName } from '../formula/tokens';
import { tableProgram } from '../graph/table-program';
import { labelHtml, liveFrame, recordFrame, renderLabel, statusOf, type CellViewBase, type ViewContext } from '../present/cell-frame';
import { errorHtml, errorOf, renderError } from '../present/error-line';
import { escapeHtml } from '../present/escape';
import { marginRefs } from '../present/margin';
import { liveTableHtml, recordTableHtml } from '../present/table-html';
import type { TableProblem } from '../table/types';
import { CLAUSE_FIELD, LABEL_FIELD, liveView, NO_ERROR_COLUMN } from './shared';
import type { KindDescription, ParsedSource } from './types';

/** The table's source: `name`, then `column NAME TYPE` lines, then `| a | b` rows. */
export function tableSource(cell: Pick<TableCell, 'name' | 'columns' | 'rows'>): string {
  return [cell.name, ...cell.columns.map((c) => `column ${c.name} ${c.type}`), ...cell.rows.map((r) => `| ${writeRow(r)}`)].join('\n');
}

export function parseTableSource(source: string): ParsedSource<Pick<TableCell, 'name' | 'columns' | 'rows'>> {
  const lines = source.split('\n').map((l) => l.trim()).filter((l) => l !== '');
  const name = lines.shift() ?? '';
  if (!isName(name)) return { ok: false, message: 'start with the table\'s name (letters, digits and _), then a line "column NAME TYPE" per column, then a line "| a | b" per row', column: 1 };
  const columns: TableCell['columns'] = [];
  const rows: string[][] = [];
  for (const line of lines) {
    if (line.startsWith('|')) {
      rows.push(readRow(line.slice(1)));
      continue;
    }
    const m = /^column\s+(\S+)\s+(\S.*)$/.exec(line);
    if (!m || rows.length) return { ok: false, message: `"${line.slice(0, 40)}": after the name come "column NAME TYPE" lines, then "| a | b" rows`, column: 1 };
    if (!isName(m[1])) return { ok: false, message: `"${m[1]}" cannot be a column name (letters, digits and _)`, column: 1 };
    columns.push({ name: m[1], type: m[2] });
  }
  if (columns.length === 0) return { ok: false, message: 'give the table a column: "column NAME TYPE", the type a unit (ft, psf), number, yes/no or text', column: 1 };
  return { ok: true, value: { name, columns, rows } };
}

export interface TableView extends CellViewBase {
  kind: 'table';
  cell: TableCell;
  problems: readonly TableProblem[];
}

export function bindTable(cell: TableCell, ctx: ViewContext): TableView {
  const state = ctx.state(cell.id);
  return {
    id: cell.id, kind: 'table', status: statusOf(state), number: ctx.number, label: cell.label,
    refs: marginRefs(cell.clause, state), error: errorOf(state, ''), cell, problems: state?.table?.problems ?? [],
  };
}

export function renderTableView(v: TableView): string {
  const rows = v.cell.rows.length;
  return liveFrame(v, `${renderLabel(v.label)}<div class="tbl-name"><code>${escapeHtml(v.cell.name)}</code> · ${rows} row${rows === 1 ? '' : 's'}</div>${
    liveTableHtml(v.cell, v.problems)}${renderError(v.error)}`);
}

export const table: KindDescription<'table'> = {
  kind: 'table',
  stem: 't',
  blank: (id, freshName) => ({ id, kind: 'table', name: freshName('tbl'), columns: [{ name: 'item', type: 'text' }, { name: 'L', type: 'ft' }], rows: [['a', '10']] }),
  named: 'required',
  fields: [LABEL_FIELD, CLAUSE_FIELD],
  refs: () => [],
  rename: (cell) => cell,
  format: tableFormat,
  source: { mode: 'note', write: tableSource, read: parseTableSource, owns: ['name', 'columns', 'rows'], errorAt: NO_ERROR_COLUMN },
  numbering: 'item',
  program: {
    compile: (cell, env) => tableProgram(cell, env.previous),
    settle(_cell, program, value, state) {
      if (value === undefined || value === null) {
        state.status = 'pending';
        return;
      }
      state.table = program?.table;
      if (program?.inputError) {
        state.status = 'error';
        state.error = program.inputError.toData();
      }
    },
    followsUnits: false,
  },
  summaryTitle: null,
  live: liveView(bindTable, renderTableView),
  record: (cell, ctx) => {
    const s = ctx.state(cell.id);
    const rows = cell.rows.length;
    return recordFrame(cell, ctx, `${labelHtml(cell.label)}<div class="lt-meta">table <code>${escapeHtml(cell.name)}</code>, ${rows} row${rows === 1 ? '' : 's'}</div>${
      recordTableHtml(cell, s?.table?.problems ?? [])}${errorHtml(s)}`, '', 'pending');
  },
};
