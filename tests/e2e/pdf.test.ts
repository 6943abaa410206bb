// `npm run calc -- FILE --pdf OUT.pdf` (issue 19): the calc record's sheets printed by
// Chromium, read back with poppler (pdfinfo, pdftotext, pdffonts): a page count with
// "sheet n of m" on every page, every check's label and ratio, the hand calcs' text
// searchable, the --meta title block on every sheet, fonts embedded, Letter or A4.

import { spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseArgs } from '../../runtime/cli/args';
import { runCalc } from '../../runtime/cli/main';
import type { CalcDocument } from '../../runtime/document';
import { createEngine } from '../../runtime/engine';
import type { Engine } from '../../runtime/engine-types';
import { parse } from '../../runtime/format/index';
import { ratioText } from '../../runtime/handcalc/index';
import { libraryFunctions } from '../../runtime/library/index';
import { unitText as resultText } from '../../runtime/present/units-text';
import { ROOT } from './harness';

const MAIN = join(ROOT, 'docs-templates/load-path.lt');
let dir: string;
let doc: CalcDocument;
let engine: Engine;

async function calc(...argv: string[]): Promise<{ code: number; err: string }> {
  const err: string[] = [];
  const code = await runCalc(parseArgs(argv), () => {}, (s) => err.push(s));
  return { code, err: err.join('\n') };
}

const pdfinfo = (pdf: string) => spawnSync('pdfinfo', [pdf], { encoding: 'utf8' }).stdout;
const pageCount = (pdf: string) => Number(/Pages:\s+(\d+)/.exec(pdfinfo(pdf))?.[1]);
/** One page's text, or the whole file's, with runs of white space made one space. */
const text = (pdf: string, page?: number) =>
  spawnSync('pdftotext', [...(page ? ['-f', String(page), '-l', String(page)] : []), pdf, '-'], { encoding: 'utf8' })
    .stdout.replace(/\s+/g, ' ');

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'loadtrace-pdf-'));
  doc = parse(readFileSync(MAIN, 'utf8')).doc;
  engine = createEngine(doc);
  await engine.settled();
});
afterAll(() => {
  engine.dispose();
  rmSync(dir, { recursive: true, force: true });
});

describe('calc --pdf', () => {
  it('prints the main template as numbered calc sheets with every check, searchable, fonts embedded, under 2 MB', async () => {
    const pdf = join(dir, 'main.pdf');
    const r = await calc(MAIN, '--pdf', pdf, '--meta', 'job=LT-26-907', '--meta', 'by=A. Nwosu', '--meta', 'revision=C');
    expect(r.err).toContain(`PDF written: ${pdf}`);
    expect(r.code).toBe(0);
    expect(statSync(pdf).size).toBeLessThan(2e6);
    expect(pdfinfo(pdf)).toMatch(/Page size:\s+612 x 792 pts \(letter\)/);

    const pages = pageCount(pdf);
    expect(pages).toBeGreaterThan(3);
    for (let n = 1; n <= pages; n++) {
      const t = text(pdf, n);
      expect(t, `sheet ${n}`).toMatch(new RegExp(`sheet ${n} of ${pages}\\b`, 'i'));
      // The title block of every sheet, with the values given on the command line.
      for (const v of ['LT-26-907', 'A. Nwosu', 'REV. C', doc.meta.project, doc.meta.checkedBy]) expect(t, `sheet ${n}`).toContain(v);
    }

    const all = text(pdf);
    const found = (s: string) => expect(all.includes(s), `"${s}" in the PDF's text`).toBe(true);
    const checks = doc.cells.filter((c) => c.kind === 'check');
    expect(checks.length).toBeGreaterThan(20);
    for (const c of checks) {
      found(c.label!.replace(/\s+/g, ' '));
      const ratio = engine.state(c.id)!.ratio;
      if (ratio !== undefined) found(`${ratioText(ratio)} `);
    }
    // The hand calcs are text, not pictures: every library function called (set by name
    // in the equation) and every formula's result, as the result column prints it.
    const library = new Set(libraryFunctions.map((f) => f.name));
    let called = 0;
    for (const c of doc.cells) {
      if (c.kind !== 'formula') continue;
      for (const fn of c.expr.matchAll(/([a-z][a-z0-9_]*)\(/gi)) {
        if (!library.has(fn[1])) continue;
        found(fn[1]);
        called++;
      }
      found(resultText(engine.state(c.id)!.display!.text));
    }
    expect(called).toBeGreaterThan(30);
    // Fonts embedded, every one.
    const fonts = spawnSync('pdffonts', [pdf], { encoding: 'utf8' }).stdout.split('\n').slice(2).filter((l) => l.trim());
    expect(fonts.length).toBeGreaterThan(0);
    for (const f of fonts) expect(f.split(/\s+/).at(-5), f).toBe('yes'); // columns: ... emb sub uni object ID
    spawnSync('pdftoppm', ['-png', '-r', '50', '-f', '1', '-l', '2', pdf, join(ROOT, 'test-artifacts', 'calc-pdf-sheet')]);
  }, 120_000);

  it('prints on A4 when asked', async () => {
    const pdf = join(dir, 'footing-a4.pdf');
    const r = await calc(join(ROOT, 'docs-templates/spread-footing.lt'), '--pdf', pdf, '--paper', 'a4');
    expect(r.code).toBe(0);
    expect(pdfinfo(pdf)).toMatch(/Page size:\s+595\.\d+ x 842\.\d+ pts \(A4\)/);
    const pages = pageCount(pdf);
    for (let n = 1; n <= pages; n++) expect(text(pdf, n)).toMatch(new RegExp(`sheet ${n} of ${pages}\\b`, 'i'));
  }, 120_000);

  it('a batch writes a PDF per row, each with its own title block, over one Chromium', async () => {
    const csv = join(dir, 'runs.csv');
    writeFileSync(csv, 'B,meta:subject\n9 ft,Footing F-1\n10 ft,Footing F-2\n');
    const out = join(dir, 'runs');
    const r = await calc(join(ROOT, 'docs-templates/spread-footing.lt'), '--batch', csv, '--out', out, '--as', 'pdf');
    expect(r.code).toBe(0);
    expect(readdirSync(out).sort()).toEqual(['index.csv', 'spread-footing-row2.pdf', 'spread-footing-row3.pdf']);
    for (const [file, subject] of [['spread-footing-row2.pdf', 'Footing F-1'], ['spread-footing-row3.pdf', 'Footing F-2']]) {
      const pdf = join(out, file);
      const pages = pageCount(pdf);
      for (let n = 1; n <= pages; n++) {
        const t = text(pdf, n);
        expect(t).toContain(subject);
        expect(t).toMatch(new RegExp(`sheet ${n} of ${pages}\\b`, 'i'));
      }
    }
  }, 120_000);
});
