// `npm run calc -- A.lt B.lt ... --package OUT.html [--pdf OUT.pdf]`: a project's calcs as
// one package (runtime/package). The contents' sheet numbers come from printing it: the
// page each contents link lands on in the PDF is where that calc starts.

import { mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { basename, join } from 'node:path';
import type { CalcDocument } from '../document';
import { createEngine } from '../engine';
import type { Engine } from '../engine-types';
import { packageHtml, packageParts, type PackageSheet } from '../package/build';
import type { PackageInfo, SheetNumbers } from '../package/front';
import { callsOf } from '../working/calls';
import type { CalcArgs, Paper } from './args';
import { loadDocument } from './load';
import { withMeta } from './meta';
import { openPrinter, type Printer } from './pdf';
import { pdfPages } from './pdf-pages';
import { exitCode, resultRows } from './report';

function packageInfo(first: CalcDocument, args: CalcArgs, writtenAt: string): PackageInfo {
  const info: PackageInfo = {
    title: 'Calculations', meta: { ...first.meta, subject: '' }, writtenAt, engineer: { name: '', license: '', firm: '' },
  };
  for (const c of args.covers ?? []) {
    if (c.field === 'title') info.title = c.value;
    else info.engineer[c.field] = c.value;
  }
  return info;
}

/** Sheet numbers read from a printed package: each calc starts where the contents' link to it lands. */
function numbersFrom(pdf: Buffer, count: number, paper: Paper): SheetNumbers | undefined {
  const { pages, dests } = pdfPages(pdf);
  const starts = Array.from({ length: count }, (_x, i) => dests.get(`lt-sheet-${i + 1}`));
  if (starts.some((s) => s === undefined)) return undefined;
  const ranges = starts.map((s, i): [number, number] => [s!, (starts[i + 1] ?? pages.length + 1) - 1]);
  return { ranges, total: pages.length, paper };
}

const sameNumbers = (a: SheetNumbers, b: SheetNumbers) => a.total === b.total && a.ranges.every((r, i) => r[0] === b.ranges[i][0] && r[1] === b.ranges[i][1]);

/**
 * The package with its contents numbered: printed once with room for the widest numbers
 * to learn where each calc starts, then again with those numbers (and once more if the
 * contents then take another number of sheets). Printing the whole, not each part alone:
 * Chromium shrinks a document to fit its widest line, so a part alone may print larger.
 */
async function numberedPackage(printer: Printer, sheets: readonly PackageSheet[], info: PackageInfo, files: string[], paper: Paper, pdf: string) {
  let numbers: SheetNumbers = { ranges: sheets.map(() => [888, 888]), total: 888, paper };
  for (let round = 0; round < 3; round++) {
    const pkg = await packageHtml(await packageParts(sheets, info, numbers), info, files);
    await printer.print(pkg.html, pdf, paper);
    const printed = numbersFrom(readFileSync(pdf), sheets.length, paper);
    if (!printed) throw new Error('the printed package has no link to every calc from its contents');
    if (sameNumbers(printed, numbers)) return { pkg, numbers };
    numbers = printed;
  }
  throw new Error('the contents\' sheet numbers did not settle after three printings');
}

export async function writePackage(args: CalcArgs, out: (s: string) => void, err: (s: string) => void): Promise<number> {
  const files = args.files ?? [args.file];
  const engines: Engine[] = [];
  try {
    const sheets: PackageSheet[] = [];
    let broken = false;
    let code: 0 | 1 | 2 = 0;
    for (const file of files) {
      const loaded = await loadDocument(file, err);
      if (!loaded) return 2;
      broken ||= loaded.broken;
      const doc = withMeta(loaded.doc, args.metas ?? []);
      const engine = createEngine(doc);
      engines.push(engine);
      await engine.settled();
      const rows = resultRows(doc, engine);
      code = Math.max(code, exitCode(rows)) as 0 | 1 | 2;
      sheets.push({ doc, state: (id) => engine.state(id), calls: callsOf(engine), file: basename(file) });
    }
    const info = packageInfo(sheets[0].doc, args, new Date().toISOString());
    const names = sheets.map((s) => s.file);
    const paper = args.paper ?? 'Letter';
    let printer: Printer | undefined;
    try {
      printer = await openPrinter();
    } catch (e) {
      if (args.pdfTo !== undefined) {
        err(`--pdf ${args.pdfTo}: ${(e as Error).message}`);
        return 2;
      }
      err(`the package's contents give no sheet numbers: ${(e as Error).message}`);
    }
    try {
      const started = Date.now();
      const dir = mkdtempSync(join(tmpdir(), 'loadtrace-package-'));
      const pdf = args.pdfTo ?? join(dir, 'package.pdf');
      let numbered;
      try {
        numbered = printer ? await numberedPackage(printer, sheets, info, names, paper, pdf) : undefined;
      } finally {
        if (args.pdfTo === undefined) rmSync(dir, { recursive: true, force: true });
      }
      const numbers = numbered?.numbers;
      const pkg = numbered?.pkg ?? (await packageHtml(await packageParts(sheets, info), info, names));
      writeFileSync(args.packageTo!, pkg.html);
      err(`package written: ${args.packageTo} (${sheets.length} calcs${numbers ? `, ${numbers.total} sheets on ${paper}` : ''}, ${
        (pkg.html.length / 1e6).toFixed(2)} MB, seal SHA-256 ${pkg.seal})`);
      if (numbers && args.pdfTo !== undefined) {
        err(`PDF written: ${args.pdfTo} (${numbers.total} sheets, ${paper}, ${(statSync(args.pdfTo).size / 1e6).toFixed(2)} MB, ${((Date.now() - started) / 1000).toFixed(1)} s)`);
      }
    } finally {
      await printer?.close();
    }
    sheets.forEach((s, i) => out(`${i + 1}  ${s.file}  ${s.doc.meta.subject}`));
    return broken ? 2 : code;
  } finally {
    for (const e of engines) e.dispose();
  }
}
