// The CSV of a batch run: a header naming inputs of the template (and meta:KEY columns
// for the title block), then one row per run with values as they would be typed
// ("18 in", "5000 psi"). Rows are counted as a spreadsheet counts them: the header is
// row 1. An empty cell keeps the template's value. Parsing and quoting by papaparse.

import Papa from 'papaparse';
import type { CalcDocument } from '../document';
import { META_ARG_KEYS, META_KEYS_TEXT, type MetaSetting } from './meta';

export interface BatchRun {
  /** Its row in the file (the header is row 1). */
  row: number;
  /** Input values of this run, each with the column it came from (as messages name it). */
  sets: { name: string; value: string; column: string }[];
  metas: MetaSetting[];
}

/** A column of the CSV: an input by name, or a title-block field. */
type Column = { input: string } | { meta: MetaSetting['field']; key: string } | { skip: true };

const META_PREFIX = 'meta:';

/** `fc` → "column 2 (fc)", for messages. */
export const columnName = (k: number, head: string): string => `column ${k + 1} (${head || 'no name'})`;

function readHeader(head: string[], doc: CalcDocument, problems: string[]): Column[] {
  const inputs = new Set(doc.cells.flatMap((c) => (c.kind === 'input' ? [c.name] : [])));
  const seen = new Map<string, number>();
  return head.map((raw, k): Column => {
    const h = raw.trim();
    const bad = (m: string): Column => (problems.push(`row 1, ${columnName(k, h)}: ${m}`), { skip: true });
    if (h === '') return bad('the header names no input');
    if (seen.has(h)) return bad(`${h} is already column ${seen.get(h)! + 1}`);
    seen.set(h, k);
    if (h.toLowerCase().startsWith(META_PREFIX)) {
      const key = h.slice(META_PREFIX.length).trim();
      const field = META_ARG_KEYS.get(key.toLowerCase());
      return field ? { meta: field, key } : bad(`"${key}" is no title-block key; meta: columns are ${META_KEYS_TEXT}`);
    }
    if (!inputs.has(h)) {
      const names = [...inputs];
      return bad(`the template has no input named ${h}${names.length ? ` (its inputs: ${names.slice(0, 40).join(', ')}${names.length > 40 ? ', …' : ''})` : ''}`);
    }
    return { input: h };
  });
}

/** The runs of a batch CSV, or the problems that stop it (each naming its row and column). */
export function readBatchCsv(text: string, doc: CalcDocument): { runs: BatchRun[]; problems: string[] } {
  const problems: string[] = [];
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: 'greedy' });
  for (const e of parsed.errors) {
    if (e.code === 'UndetectableDelimiter') continue; // one column: read as such
    problems.push(`row ${(e.row ?? 0) + 1}: ${e.message}`);
  }
  const [head, ...body] = parsed.data;
  if (!head) return { runs: [], problems: [...problems, 'the file is empty: write a header of input names, then one row per run'] };
  const columns = readHeader(head, doc, problems);
  if (body.length === 0) problems.push('there is no row under the header: one row per run');
  const runs = body.map((cells, k): BatchRun => {
    const row = k + 2;
    if (cells.length !== head.length) {
      problems.push(`row ${row}: ${cells.length} value${cells.length === 1 ? '' : 's'} for ${head.length} columns`);
    }
    const run: BatchRun = { row, sets: [], metas: [] };
    columns.forEach((col, c) => {
      const value = (cells[c] ?? '').trim();
      if ('skip' in col || value === '') return;
      if ('input' in col) run.sets.push({ name: col.input, value, column: columnName(c, head[c]) });
      else if (/[\r\n]/.test(value)) problems.push(`row ${row}, ${columnName(c, head[c])}: a title-block field is one line`);
      else run.metas.push({ key: col.key, field: col.meta, value });
    });
    return run;
  });
  return { runs: problems.length ? [] : runs, problems };
}
