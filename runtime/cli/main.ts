// `npm run calc -- FILE [--set NAME=VALUE]... [--json]`: run a template or record
// headless with the same engine the browser uses.

import { writeFileSync } from 'node:fs';
import { cellName, type CalcDocument } from '../document';
import { nearestName } from '../formula/suggest';
import { createEngine } from '../engine';
import { setInputValueKeepUnit } from '../edit/index';
import { parseArgs, UsageError, type CalcArgs } from './args';
import { printDiff } from './diff';
import { exitCode, resultRows, table } from './report';
import { exportRecord } from '../record/index';
import { loadDocument } from './load';
import { parseWithParse5 } from '../record/node';
import { writePackage } from './package';
import { recordShellFile } from './record-shell';
import { runBatch } from './batch';
import { withMeta } from './meta';
import { openPrinter, sheetsPage } from './pdf';
import type { Engine } from '../engine-types';
import { callsOf } from '../working/calls';
import { verifyReport } from './verify-report';


/**
 * What the CLI says when Loadtrace itself fails (a fault of ours, not of the document):
 * exit 2, never 1, which means "a check fails".
 */
export function crashMessage(e: unknown): string {
  const what = e instanceof Error ? `${e.name}: ${e.message}` : String(e);
  return `the engine failed (${what}); this is a fault in Loadtrace, not a result: no check was decided`;
}

export async function runCalc(args: CalcArgs, out: (s: string) => void, err: (s: string) => void): Promise<number> {
  try {
    return await calc(args, out, err);
  } catch (e) {
    err(crashMessage(e));
    return 2;
  }
}

/** Why --set cannot change `name`: what it is instead, and what to set. */
function notAnInput(doc: CalcDocument, name: string): string {
  const cell = doc.cells.find((c) => cellName(c) === name);
  const inputs = doc.cells.flatMap((c) => (c.kind === 'input' ? [c.name] : []));
  if (cell && (cell.kind === 'formula' || cell.kind === 'check')) {
    const reads = inputs.filter((n) => new RegExp(`(^|[^A-Za-z0-9_])${n}(?![A-Za-z0-9_])`).test(cell.expr));
    return `${name} is a ${cell.kind} (${name} = ${cell.expr}), not an input; --set changes inputs only${reads.length ? `: set one it reads (${reads.join(', ')})` : ''}`;
  }
  const near = nearestName(name, inputs);
  return `there is no input named ${name}${near ? `; did you mean ${near}?` : ''}`;
}

async function calc(args: CalcArgs, out: (s: string) => void, err: (s: string) => void): Promise<number> {
  if (args.verify) return verifyReport(args.file, out, err);
  if (args.packageTo !== undefined) return writePackage(args, out, err);
  const loaded = await loadDocument(args.file, err);
  if (!loaded) return 2;
  const writes = args.exportTo !== undefined ? `--export ${args.exportTo}` : args.batch !== undefined ? `--batch ${args.batch}` : undefined;
  if (writes && loaded.broken) {
    // A record is never written from a document with lines dropped or from an altered record:
    // the new file's seal would vouch for what was lost or changed.
    err(`${writes}: not written: ${loaded.parseErrors
      ? `${loaded.parseErrors} line${loaded.parseErrors === 1 ? '' : 's'} of ${args.file} could not be read (above) and would be missing from the record`
      : `${args.file} is not as Loadtrace wrote it (above)`}`);
    return 2;
  }
  let doc: CalcDocument = withMeta(loaded.doc, args.metas ?? []);
  for (const { name, value } of args.sets) {
    const cell = doc.cells.find((c) => c.kind === 'input' && c.name === name);
    if (!cell) {
      err(`--set ${name}: ${notAnInput(doc, name)}`);
      return 2;
    }
    doc = setInputValueKeepUnit(doc, cell.id, value);
  }
  if (args.batch !== undefined) {
    const code = await runBatch(doc, args, out, err);
    return loaded.broken ? 2 : code;
  }
  if (args.diffWith !== undefined) {
    const other = await loadDocument(args.diffWith, err);
    if (!other) return 2;
    await printDiff({ name: args.file, doc }, { name: args.diffWith, doc: other.doc }, args.json, out);
    return loaded.broken || other.broken ? 2 : 0;
  }
  const engine = createEngine(doc);
  await engine.settled();
  const rows = resultRows(doc, engine);
  for (const { name, value } of args.sets) {
    const cell = doc.cells.find((c) => c.kind === 'input' && c.name === name)!;
    const s = engine.state(cell.id);
    if (s?.status === 'error') {
      err(`--set ${name}=${value}: ${s.error?.message}`);
      engine.dispose();
      return 2;
    }
  }
  if (args.exportTo !== undefined) {
    try {
      const record = await exportRecord(doc, (id) => engine.state(id), recordShellFile(err), { parseHtml: parseWithParse5, calls: callsOf(engine) });
      writeFileSync(args.exportTo, record.html);
      err(`record written: ${args.exportTo} (${(record.html.length / 1e6).toFixed(2)} MB, SHA-256 ${record.digest})`);
    } catch (e) {
      err(`--export ${args.exportTo}: ${(e as Error).message}`);
      engine.dispose();
      return 2;
    }
  }
  if (args.pdfTo !== undefined && !(await writePdf(doc, engine, args, err))) {
    engine.dispose();
    return 2;
  }
  out(args.json ? JSON.stringify(rows, null, 2) : table(rows, engine));
  engine.dispose();
  return loaded.broken ? 2 : exitCode(rows);
}

/** `--pdf`: the record's sheets through Chromium; false (with the reason told) when it cannot. */
async function writePdf(doc: CalcDocument, engine: Engine, args: CalcArgs, err: (s: string) => void): Promise<boolean> {
  const to = args.pdfTo!;
  try {
    const printer = await openPrinter();
    try {
      const bytes = await printer.print(await sheetsPage(doc, (id) => engine.state(id), undefined, callsOf(engine)), to, args.paper ?? 'Letter');
      err(`PDF written: ${to} (${(bytes / 1e6).toFixed(2)} MB, ${args.paper ?? 'Letter'})`);
    } finally {
      await printer.close();
    }
    return true;
  } catch (e) {
    err(`--pdf ${to}: ${(e as Error).message}`);
    return false;
  }
}

async function main(): Promise<void> {
  let args: CalcArgs;
  try {
    args = parseArgs(process.argv.slice(2));
  } catch (e) {
    if (e instanceof UsageError) {
      console.error(e.message);
      process.exit(2);
    }
    throw e;
  }
  // A fault outside runCalc's own await (a timer, a stray promise) is still exit 2.
  const crash = (e: unknown) => {
    console.error(crashMessage(e));
    process.exit(2);
  };
  process.on('uncaughtException', crash);
  process.on('unhandledRejection', crash);
  const code = await runCalc(args, (s) => console.log(s), (s) => console.error(s));
  process.exitCode = code;
}

if (import.meta.url === `file://${process.argv[1]}`) void main();
