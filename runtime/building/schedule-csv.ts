// A column schedule as CSV, in and out: a row per mark with its grid position, its size and
// loads (optional) that replace the computed ones at its base.
//
//   mark,x,y,c1 [in],c2 [in],D [kip],L [kip]
//   C-4,4,C,20,20,,
//   C-5,5,C,450 mm,450 mm,310,95
//
// A header may carry the unit in brackets; a cell may carry its own (a number alone takes
// the header's). Every problem is named by its row (the header is row 1, as a spreadsheet
// counts) and its column. Reading changes nothing: the caller keeps its document as it was
// when there is any issue. Writing puts numbers in the header's unit with the fewest digits
// that read back to the same value, so in → out → in is lossless. Parsing and quoting by
// papaparse.

import Papa from 'papaparse';
import { parseQuantityText } from '../formula/input-value';
import { describeDims, sameDims, unitInfo, type Dims } from '../units/dimension';
import type { InputIssue } from './issues';
import type { LoadOverride } from './takedown';

export interface ScheduleRow {
  mark: string;
  x: string;
  y: string;
  /** Column sides along x and y, m. */
  c1: number;
  c2: number;
  /** Loads at the base that replace the computed ones, N. */
  loads: LoadOverride;
}

/** What the rows are checked against, when known: the building's marks and grid line names. */
export interface ScheduleContext {
  marks?: ReadonlySet<string>;
  xLines?: readonly string[];
  yLines?: readonly string[];
}

type Kind = 'length' | 'force';
const SIZE_COLUMNS = ['c1', 'c2'] as const;
const LOAD_COLUMNS = ['D', 'L', 'Lr', 'S'] as const;
const REQUIRED = ['mark', 'x', 'y', 'c1', 'c2'] as const;
const KIND_UNIT: Record<Kind, string> = { length: 'm', force: 'N' };

const dimsOf = (k: Kind): Dims => unitInfo(KIND_UNIT[k]).dims;

interface Header {
  /** Column name as the schedule knows it, or undefined for a column it does not read. */
  key?: string;
  unit?: string;
  text: string;
}

function readHeader(text: string): Header | { error: string } {
  const m = /^\s*([^[\]()]*?)\s*(?:[[(]\s*([^\])]*?)\s*[\])])?\s*$/.exec(text);
  const name = (m?.[1] ?? text).trim();
  const unit = m?.[2]?.trim() || undefined;
  const known = [...REQUIRED, ...LOAD_COLUMNS].find((k) => k.toLowerCase() === name.toLowerCase());
  if (unit !== undefined) {
    try {
      unitInfo(unit);
    } catch {
      return { error: `"${unit}" in the header is not a unit Loadtrace knows` };
    }
  }
  return { key: known, unit, text };
}

/** A value of the given kind from a cell (its own unit, or the header's for a bare number). */
function readValue(cell: string, kind: Kind, headerUnit: string | undefined): number | string {
  const t = cell.trim();
  if (/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t)) {
    if (!headerUnit) return `"${t}" has no unit; write it as e.g. ${kind === 'length' ? '20 in or 500 mm' : '120 kip or 530 kN'}, or put the unit in the header`;
    const u = unitInfo(headerUnit);
    if (!sameDims(u.dims, dimsOf(kind))) return `the header's unit ${headerUnit} is a ${describeDims(u.dims)}, not a ${kind}`;
    return Number(t) * u.factor;
  }
  let q;
  try {
    q = parseQuantityText(t, 'the value');
  } catch {
    return `"${t}" is not a number with a unit (e.g. ${kind === 'length' ? '20 in' : '120 kip'})`;
  }
  if (!sameDims(q.dims, dimsOf(kind))) return `"${t}" is a ${describeDims(q.dims)}, not a ${kind}`;
  return q.si;
}

/** Read a column schedule; rows are returned only when there is no issue. */
export function readScheduleCsv(text: string, ctx: ScheduleContext = {}): { rows: ScheduleRow[]; issues: InputIssue[] } {
  const table = 'csv';
  const issues: InputIssue[] = [];
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: 'greedy' });
  for (const e of parsed.errors) {
    if (e.code === 'UndetectableDelimiter') continue; // one column: the missing columns are named below
    issues.push({ table, row: (e.row ?? 0) + 1, message: e.message });
  }
  const [head = [], ...body] = parsed.data;
  const headers = head.map(readHeader);
  const at = new Map<string, number>();
  headers.forEach((h, k) => {
    if ('error' in h) issues.push({ table, row: 1, column: head[k], message: h.error });
    else if (h.key && at.has(h.key)) issues.push({ table, row: 1, column: head[k], message: `column ${h.key} is given twice` });
    else if (h.key) at.set(h.key, k);
  });
  for (const c of REQUIRED) if (!at.has(c)) issues.push({ table, row: 1, column: c, message: `the column "${c}" is missing (needed: ${REQUIRED.join(', ')})` });
  if (issues.length > 0) return { rows: [], issues };
  const unitOf = (key: string) => (headers[at.get(key)!] as Header).unit;
  const rows: ScheduleRow[] = [];
  const seen = new Map<string, number>();
  body.forEach((cells, k) => {
    const row = k + 2;
    const cell = (key: string) => (at.has(key) ? (cells[at.get(key)!] ?? '').trim() : '');
    const bad = (column: string, message: string) => issues.push({ table, row, column, message });
    const mark = cell('mark');
    if (mark === '') bad('mark', 'the row has no mark');
    else if (seen.has(mark)) bad('mark', `mark "${mark}" is already row ${seen.get(mark)}`);
    else if (ctx.marks && !ctx.marks.has(mark)) bad('mark', `unknown mark "${mark}": no column of the building has it`);
    seen.set(mark, row);
    for (const [col, lines] of [['x', ctx.xLines], ['y', ctx.yLines]] as const) {
      const v = cell(col);
      if (v === '') bad(col, `the grid line ${col} is empty`);
      else if (lines && !lines.includes(v)) bad(col, `"${v}" is not a ${col} line (${col} lines: ${lines.join(', ')})`);
    }
    const value = (key: string, kind: Kind, required: boolean): number | undefined => {
      const t = cell(key);
      if (t === '') {
        if (required) bad(key, `${key} is empty`);
        return undefined;
      }
      const v = readValue(t, kind, unitOf(key));
      if (typeof v === 'string') bad(key, v);
      else if (v < 0 || (kind === 'length' && v === 0)) bad(key, `${key} must be ${kind === 'length' ? 'greater than 0' : '0 or more'}`);
      else return v;
      return undefined;
    };
    const [c1, c2] = SIZE_COLUMNS.map((c) => value(c, 'length', true));
    const loads: LoadOverride = {};
    for (const c of LOAD_COLUMNS) {
      const v = at.has(c) ? value(c, 'force', false) : undefined;
      if (v !== undefined) loads[c] = v;
    }
    if (c1 !== undefined && c2 !== undefined) rows.push({ mark, x: cell('x'), y: cell('y'), c1, c2, loads });
  });
  return issues.length > 0 ? { rows: [], issues } : { rows, issues };
}

/** Fewest digits of si/unit that read back (as readValue does) to exactly si; the value in m or N otherwise. */
function numberText(si: number, unit: string, kind: Kind): string {
  const f = unitInfo(unit).factor;
  for (let p = 1; p <= 17; p++) {
    const t = String(Number((si / f).toPrecision(p)));
    if (Number(t) * f === si) return t;
  }
  return `${String(si)} ${KIND_UNIT[kind]}`;
}

/** Write a column schedule, lengths and forces in the units given (loads columns only when some row has them). */
export function writeScheduleCsv(rows: readonly ScheduleRow[], units: { length: string; force: string } = { length: 'in', force: 'kip' }): string {
  const loads = LOAD_COLUMNS.filter((c) => rows.some((r) => r.loads[c] !== undefined));
  const header = ['mark', 'x', 'y', ...SIZE_COLUMNS.map((c) => `${c} [${units.length}]`), ...loads.map((c) => `${c} [${units.force}]`)];
  const body = rows.map((r) => [
    r.mark, r.x, r.y,
    numberText(r.c1, units.length, 'length'), numberText(r.c2, units.length, 'length'),
    ...loads.map((c) => (r.loads[c] === undefined ? '' : numberText(r.loads[c]!, units.force, 'force'))),
  ]);
  return Papa.unparse([header, ...body], { newline: '\n' }) + '\n';
}
