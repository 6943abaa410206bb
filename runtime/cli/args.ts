// Command-line arguments of `npm run calc -- FILE [--set NAME=VALUE]... [--json] ...`.

import { parseCoverSpec, type CoverSetting } from './cover';
import { parseMetaSpec, type MetaSetting } from './meta';

export type Paper = 'Letter' | 'A4';
/** What a batch writes for each row. */
export type BatchOutput = 'record' | 'pdf' | 'both';

export interface CalcArgs {
  file: string;
  /** Every FILE given: one, or several with --package. */
  files?: string[];
  /** A calc package of every FILE: one HTML file (runtime/package). */
  packageTo?: string;
  /** The package's cover: its title and the engineer of record. */
  covers?: CoverSetting[];
  sets: { name: string; value: string }[];
  /** Title-block fields set from the command line, in order (a later one wins). */
  metas?: MetaSetting[];
  json: boolean;
  exportTo?: string;
  pdfTo?: string;
  /** Letter when absent. */
  paper?: Paper;
  diffWith?: string;
  /** A CSV of inputs: one run a row (runtime/cli/batch.ts). */
  batch?: string;
  outDir?: string;
  /** record when absent. */
  batchAs?: BatchOutput;
  /** Check a record file against its seal, part by part, and print the result. */
  verify?: boolean;
}

export class UsageError extends Error {}

export const USAGE = `usage: npm run calc -- FILE [--set NAME=VALUE]... [--meta KEY=VALUE]... [--json]
                      [--export OUT.html] [--pdf OUT.pdf [--paper letter|a4]] [--diff OTHER]
       npm run calc -- FILE --batch RUNS.csv --out DIR [--as record|pdf|both] [--paper letter|a4]
       npm run calc -- RECORD.html --verify
       npm run calc -- FILE... --package OUT.html [--pdf OUT.pdf [--paper letter|a4]] [--meta KEY=VALUE]... [--cover KEY=VALUE]...
  FILE              a template or record (.lt text, or an exported .html record)
  --set NAME=VALUE  override an input, e.g. --set fc="5000 psi"
  --meta KEY=VALUE  set a title-block field of what is written, e.g. --meta job=LT-26-301;
                    KEY is one of project, job, subject, by (or prepared), checked, revision, date
  --json            print the results as JSON instead of a table
  --diff OTHER      compare with a second record (e.g. another revision): the title block,
                    inputs, results, checks, comments and sign-offs that differ; exit 0 (2 if unreadable)
  --export OUT.html write the calc record: one self-contained, sealed HTML file
                    (builds the app shell first if dist-record/ is missing or stale);
                    refused (exit 2) when the document has lines that cannot be read
                    or is an altered record
  --verify          check every part of a record file against its seal (read with a
                    real HTML parser) and say what it is; exit 0 when every part is as
                    written, 2 naming the first part that differs
  --pdf OUT.pdf     print the record's calc sheets to PDF through Chromium (/usr/bin/chromium)
  --paper SIZE      letter (default) or a4
  --batch RUNS.csv  run FILE once per row of a CSV whose header names inputs (values with
                    units, e.g. 18 in); meta:KEY columns set the title block of that row
  --out DIR         where a batch writes one file per row and index.csv
  --as WHAT         a batch writes a record (default), a pdf, or both per row
  --package OUT.html  one calc package of every FILE, in the order given: cover, contents with
                    sheet numbers, revision log, codes and references cited, then each calc's
                    sheets numbered across the package; --pdf prints it (--meta sets every title block)
  --cover KEY=VALUE the package's cover: title, engineer, license (or licence), firm
exit code: 0 every check passes, 1 a check fails, 2 the document, an override or a row is broken`;

const PAPERS: Record<string, Paper> = { letter: 'Letter', a4: 'A4' };
const BATCH_OUTPUTS: readonly BatchOutput[] = ['record', 'pdf', 'both'];

export function parseArgs(argv: string[]): CalcArgs {
  const out: CalcArgs & Required<Pick<CalcArgs, 'metas' | 'files' | 'covers'>> = { file: '', files: [], sets: [], metas: [], covers: [], json: false };
  let paperGiven = false;
  /** The value after an option, as `--opt VALUE` or `--opt=VALUE`. */
  const value = (a: string, opt: string, i: number, what: string): [string, number] => {
    const v = a === opt ? argv[i + 1] : a.slice(opt.length + 1);
    if (v === undefined || v === '') throw new UsageError(`${opt} needs ${what}`);
    return [v, a === opt ? i + 1 : i];
  };
  const is = (a: string, opt: string) => a === opt || a.startsWith(`${opt}=`);
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    let v: string;
    if (a === '--json') out.json = true;
    else if (a === '--verify') out.verify = true;
    else if (is(a, '--set')) {
      [v, i] = value(a, '--set', i, 'NAME=VALUE');
      const eq = v.indexOf('=');
      if (eq <= 0) throw new UsageError(`--set ${v}: write it as NAME=VALUE, e.g. --set fc="5000 psi"`);
      out.sets.push({ name: v.slice(0, eq).trim(), value: v.slice(eq + 1).trim() });
    } else if (is(a, '--meta')) {
      [v, i] = value(a, '--meta', i, 'KEY=VALUE');
      out.metas.push(parseMetaSpec(v, (m) => new UsageError(m)));
    } else if (is(a, '--cover')) {
      [v, i] = value(a, '--cover', i, 'KEY=VALUE');
      out.covers.push(parseCoverSpec(v, (m) => new UsageError(m)));
    } else if (is(a, '--package')) [out.packageTo, i] = value(a, '--package', i, 'an output file');
    else if (is(a, '--export')) [out.exportTo, i] = value(a, '--export', i, 'an output file');
    else if (is(a, '--pdf')) [out.pdfTo, i] = value(a, '--pdf', i, 'an output file');
    else if (is(a, '--paper')) {
      [v, i] = value(a, '--paper', i, 'a size: letter or a4');
      const p = PAPERS[v.toLowerCase()];
      if (!p) throw new UsageError(`--paper ${v}: the sizes are letter and a4`);
      out.paper = p;
      paperGiven = true;
    } else if (is(a, '--diff')) [out.diffWith, i] = value(a, '--diff', i, 'a second record');
    else if (is(a, '--batch')) [out.batch, i] = value(a, '--batch', i, 'a CSV file of inputs');
    else if (is(a, '--out')) [out.outDir, i] = value(a, '--out', i, 'a folder');
    else if (is(a, '--as')) {
      [v, i] = value(a, '--as', i, 'record, pdf or both');
      if (!BATCH_OUTPUTS.includes(v as BatchOutput)) throw new UsageError(`--as ${v}: write record, pdf or both`);
      out.batchAs = v as BatchOutput;
    } else if (a === '--help' || a === '-h') throw new UsageError(USAGE);
    else if (a.startsWith('-')) throw new UsageError(`unknown option ${a}\n${USAGE}`);
    else out.files.push(a);
  }
  if (out.files.length === 0) throw new UsageError(USAGE);
  out.file = out.files[0];
  if (out.packageTo !== undefined) {
    for (const [opt, given] of [['--export', out.exportTo], ['--diff', out.diffWith], ['--batch', out.batch], ['--set', out.sets[0]], ['--json', out.json || undefined], ['--verify', out.verify]] as const) {
      if (given !== undefined) throw new UsageError(`${opt} does not go with --package: a package is written from its files as they are`);
    }
    if (paperGiven && out.pdfTo === undefined) throw new UsageError('--paper goes with --pdf');
    return out;
  }
  if (out.files.length > 1) throw new UsageError(`only one FILE may be given (got ${out.files.join(', ')}); several go with --package OUT.html`);
  if (out.covers.length > 0) throw new UsageError('--cover goes with --package');
  if (out.batch !== undefined) {
    if (out.outDir === undefined) throw new UsageError('--batch needs --out DIR, the folder for the files it writes');
    for (const [opt, given] of [['--export', out.exportTo], ['--pdf', out.pdfTo], ['--diff', out.diffWith]] as const) {
      if (given !== undefined) throw new UsageError(`${opt} does not go with --batch: a batch writes one file per row into --out (choose with --as)`);
    }
  } else {
    if (out.outDir !== undefined) throw new UsageError('--out is the folder of a --batch run; for one file use --export or --pdf');
    if (argv.some((a) => is(a, '--as'))) throw new UsageError('--as goes with --batch');
    if (paperGiven && out.pdfTo === undefined) throw new UsageError('--paper goes with --pdf (or a --batch that writes pdf)');
  }
  return out;
}
