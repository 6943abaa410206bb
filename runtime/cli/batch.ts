// `npm run calc -- TEMPLATE --batch RUNS.csv --out DIR [--as record|pdf|both]`: the
// template run once per row of the CSV, one record and/or PDF per row, and DIR/index.csv
// with each row's file, outcome and governing check. A row whose value is refused is
// named (row and column) and listed in the index; the other rows are still written.

import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { basename, extname, join } from 'node:path';
import Papa from 'papaparse';
import type { CalcDocument } from '../document';
import { setInputValueKeepUnit } from '../edit/index';
import { createEngine } from '../engine';
import type { Engine } from '../engine-types';
import { ratioText } from '../handcalc/index';
import { exportRecord } from '../record/index';
import { parseWithParse5 } from '../record/node';
import type { CalcArgs } from './args';
import { readBatchCsv, type BatchRun } from './batch-csv';
import { withMeta } from './meta';
import { openPrinter, sheetsPage, type Printer } from './pdf';
import { recordShellFile } from './record-shell';
import { callsOf } from '../working/calls';

/** One line of the index. */
export interface BatchIndexRow {
  row: number;
  files: string[];
  /** ok: every check passes; fail: one or more does not; error: the row could not be computed. */
  status: 'ok' | 'fail' | 'error';
  failing: number;
  /** The check with the highest demand/capacity ratio (a failing one first). */
  governing: string;
  ratio: string;
  message: string;
}

const INDEX_HEAD = ['row', 'files', 'status', 'checks failing', 'governing check', 'governing ratio', 'message'];

/** The governing check of a computed run: failing first, then the highest ratio. */
function governing(doc: CalcDocument, engine: Engine): Pick<BatchIndexRow, 'status' | 'failing' | 'governing' | 'ratio' | 'message'> {
  let failing = 0;
  let broken = '';
  let best: { name: string; ratio: number; fail: boolean } | undefined;
  for (const c of doc.cells) {
    if (c.kind !== 'check' && c.kind !== 'formula' && c.kind !== 'input') continue;
    const s = engine.state(c.id);
    if (s?.status === 'error' || s?.status === 'pending') {
      broken ||= `${c.kind === 'check' ? c.label || c.name || c.id : c.name}: ${s.error?.message ?? 'not computed'}`;
      continue;
    }
    if (c.kind !== 'check') continue;
    const fail = s?.status === 'fail';
    if (fail) failing++;
    const ratio = s?.ratio ?? -Infinity;
    // A failing check governs over any passing one; then the higher ratio.
    if (!best || (fail && !best.fail) || (fail === best.fail && ratio > best.ratio)) best = { name: c.label || c.name || c.expr, ratio, fail };
  }
  return {
    status: broken ? 'error' : failing ? 'fail' : 'ok',
    failing,
    governing: best?.name ?? '',
    ratio: best && best.ratio !== -Infinity ? ratioText(best.ratio) : '',
    message: broken,
  };
}

/** The row's document: the template (with --set and --meta), then the row's values and title block. */
function rowDocument(doc: CalcDocument, run: BatchRun): CalcDocument {
  let d = withMeta(doc, run.metas);
  for (const s of run.sets) d = setInputValueKeepUnit(d, d.cells.find((c) => c.kind === 'input' && c.name === s.name)!.id, s.value);
  return d;
}

export async function runBatch(doc: CalcDocument, args: CalcArgs, out: (s: string) => void, err: (s: string) => void): Promise<number> {
  const csv = args.batch!;
  let text: string;
  try {
    text = readFileSync(csv, 'utf8');
  } catch (e) {
    err(`cannot read ${csv}: ${(e as Error).message}`);
    return 2;
  }
  const { runs, problems } = readBatchCsv(text, doc);
  if (problems.length) {
    for (const p of problems) err(`${csv}: ${p}`);
    return 2;
  }
  const dir = args.outDir!;
  const as = args.batchAs ?? 'record';
  const stem = basename(args.file, extname(args.file));
  const width = String(runs.at(-1)!.row).length;
  let shell: string | undefined;
  let printer: Printer | undefined;
  const index: BatchIndexRow[] = [];
  try {
    mkdirSync(dir, { recursive: true });
    if (as !== 'pdf') shell = recordShellFile(err);
    if (as !== 'record') printer = await openPrinter();
    for (const run of runs) index.push(await oneRun(doc, run, `${stem}-row${String(run.row).padStart(width, '0')}`));
  } catch (e) {
    err(`--batch ${csv}: ${(e as Error).message}`);
    return 2;
  } finally {
    await printer?.close();
  }

  async function oneRun(template: CalcDocument, run: BatchRun, name: string): Promise<BatchIndexRow> {
    const d = rowDocument(template, run);
    const engine = createEngine(d);
    try {
      await engine.settled();
      // A value the input refuses: named by row and column, and nothing is written for the row.
      for (const s of run.sets) {
        const st = engine.state(d.cells.find((c) => c.kind === 'input' && c.name === s.name)!.id);
        if (st?.status === 'error') {
          const message = `row ${run.row}, ${s.column}: ${st.error?.message ?? 'refused'}`;
          err(`${csv}: ${message}`);
          return { row: run.row, files: [], status: 'error', failing: 0, governing: '', ratio: '', message };
        }
      }
      const files: string[] = [];
      const state = (id: string) => engine.state(id);
      if (shell !== undefined) {
        files.push(`${name}.html`);
        writeFileSync(join(dir, `${name}.html`), (await exportRecord(d, state, shell, { parseHtml: parseWithParse5, calls: callsOf(engine) })).html);
      }
      if (printer) {
        files.push(`${name}.pdf`);
        await printer.print(await sheetsPage(d, state, undefined, callsOf(engine)), join(dir, `${name}.pdf`), args.paper ?? 'Letter');
      }
      return { row: run.row, files, ...governing(d, engine) };
    } finally {
      engine.dispose();
    }
  }

  const lines = index.map((r) => [r.row, r.files.join(' '), r.status, r.failing, r.governing, r.ratio, r.message]);
  writeFileSync(join(dir, 'index.csv'), `${Papa.unparse([INDEX_HEAD, ...lines])}\n`);
  for (const r of index) {
    out(`row ${r.row}  ${r.status === 'ok' ? 'pass' : r.status === 'fail' ? `NOT OK (${r.failing})` : 'error'}  ${
      r.files.join(' ') || '(nothing written)'}${r.governing ? `  governing ${r.ratio || '—'} ${r.governing}` : ''}`);
  }
  const written = index.filter((r) => r.files.length).length;
  err(`${written} of ${index.length} row${index.length === 1 ? '' : 's'} written to ${dir}; index: ${join(dir, 'index.csv')}`);
  return index.some((r) => r.status === 'error') ? 2 : index.some((r) => r.status === 'fail') ? 1 : 0;
}
