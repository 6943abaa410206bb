// `npm run calc -- TEMPLATE --batch RUNS.csv --out DIR` (issue 19): one record per CSV row
// plus DIR/index.csv; a bad CSV is refused naming its row and column (the header is row 1).
// Records are packed into the stub shell (LOADTRACE_SHELL); PDFs per row: tests/e2e/pdf.test.ts.

import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { parseArgs, UsageError } from '../../runtime/cli/args';
import { parse } from '../../runtime/format/index';
import { unpack } from '../../runtime/record/index';
import { calc, scratchWithStubShell } from './helpers';

const TEMPLATE = 'docs-templates/spread-footing.lt';
const scratch = scratchWithStubShell('cli-batch');
/** Writes a CSV and runs the footing template over it into a fresh folder. */
async function batch(name: string, csv: string, ...more: string[]) {
  const file = join(scratch(), `${name}.csv`);
  writeFileSync(file, csv);
  const out = join(scratch(), name);
  const r = await calc(TEMPLATE, '--batch', file, '--out', out, ...more);
  return { code: r.code, stdout: r.out, err: r.err, out };
}

const index = (out: string) => Papa.parse<Record<string, string>>(readFileSync(join(out, 'index.csv'), 'utf8'), { header: true, skipEmptyLines: true }).data;


describe('calc --batch', () => {
  it('writes one record per row, with the row\'s inputs and title block, and an index of outcomes', async () => {
    const r = await batch('two', 'B,L,meta:subject,meta:job\n9 ft,10 ft,Footing F-1,LT-27-040\n8 ft,10 ft,"Footing F-2, grid C",LT-27-040\n');
    expect(r.code).toBe(1); // a check fails in the second row
    expect(readdirSync(r.out).sort()).toEqual(['index.csv', 'spread-footing-row2.html', 'spread-footing-row3.html']);
    const doc3 = parse((await unpack(readFileSync(join(r.out, 'spread-footing-row3.html'), 'utf8'))).docText!).doc;
    expect(doc3.meta.subject).toBe('Footing F-2, grid C');
    expect(doc3.meta.job).toBe('LT-27-040');
    expect(doc3.cells.find((c) => c.kind === 'input' && c.name === 'B')).toMatchObject({ value: '8 ft' });
    expect(doc3.meta.project).toBe(parse(readFileSync(TEMPLATE, 'utf8')).doc.meta.project); // not in the CSV: kept

    const rows = index(r.out);
    expect(rows.map((x) => [x.row, x.files, x.status])).toEqual([
      ['2', 'spread-footing-row2.html', 'ok'],
      ['3', 'spread-footing-row3.html', 'fail'],
    ]);
    // Row 3 fails on plan area. Hand calc with the template's other inputs (net pressure,
    // common practice: q_net = q_allow − h·wc − (Df − h)·γs − surcharge; ACI 318-19
    // §13.3.1.1 sizes the base on service loads):
    //   q_net = 4000 − (28/12)(150) − (4 − 28/12)(120) − 100 = 4000 − 350 − 200 − 100 = 3350 psf
    //   A_req = (180 + 95) kip / 3350 psf = 82.09 ft²;  B·L = 8 × 10 = 80 ft²;  82.09 / 80 = 1.026
    expect(rows[1]).toMatchObject({ 'checks failing': '1', 'governing check': 'Plan area', 'governing ratio': '1.03' });
    expect(r.stdout.split('\n')).toEqual([
      'row 2  pass  spread-footing-row2.html  governing ' + rows[0]['governing ratio'] + ' ' + rows[0]['governing check'],
      'row 3  NOT OK (1)  spread-footing-row3.html  governing 1.03 Plan area',
    ]);
    expect(r.err).toMatch(/2 of 2 rows written to .*index: .*index\.csv/);
  });

  it('an empty cell keeps the template\'s value', async () => {
    const r = await batch('empty', 'B,fc\n,4500 psi\n');
    expect(r.code).toBe(0);
    const doc = parse((await unpack(readFileSync(join(r.out, 'spread-footing-row2.html'), 'utf8'))).docText!).doc;
    const template = parse(readFileSync(TEMPLATE, 'utf8')).doc;
    const value = (d: typeof doc, n: string) => d.cells.find((c) => c.kind === 'input' && c.name === n)!;
    expect(value(doc, 'B')).toEqual(value(template, 'B'));
    expect(value(doc, 'fc')).toMatchObject({ value: '4500 psi' });
  });

  it('a value the input refuses names its row and column; the other rows are still written; exit 2', async () => {
    const r = await batch('badvalue', 'B,fc\n9 ft,4000 psi\n9 ft,lots\n9 ft,100 psi\n9 ft,4500 psi\n');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/badvalue\.csv: row 3, column 2 \(fc\): the value of fc "lots" is not a number with a unit/);
    expect(r.err).toMatch(/badvalue\.csv: row 4, column 2 \(fc\): .*below the allowed minimum 2500 psi/);
    expect(readdirSync(r.out).sort()).toEqual(['index.csv', 'spread-footing-row2.html', 'spread-footing-row5.html']);
    expect(index(r.out).map((x) => [x.row, x.status, x.files])).toEqual([['2', 'ok', 'spread-footing-row2.html'], ['3', 'error', ''], ['4', 'error', ''], ['5', 'ok', 'spread-footing-row5.html']]);
  });

  it('a bad CSV is refused before any run, each problem at its row and column', async () => {
    const cases: [string, string, RegExp][] = [
      ['unknown', 'B,fcc\n9 ft,4000 psi\n', /unknown\.csv: row 1, column 2 \(fcc\): the template has no input named fcc \(its inputs: PD, PL, /],
      ['twice', 'B,B\n9 ft,9 ft\n', /twice\.csv: row 1, column 2 \(B\): B is already column 1/],
      ['metakey', 'B,meta:engineer\n9 ft,X\n', /metakey\.csv: row 1, column 2 \(meta:engineer\): "engineer" is no title-block key; meta: columns are project, job, subject, by \(or prepared\)/],
      ['short', 'B,L\n9 ft,10 ft\n9 ft\n', /short\.csv: row 3: 1 value for 2 columns/],
      ['quote', 'B,L\n9 ft,10 ft\n"9 ft,10 ft\n', /quote\.csv: row 3: .*[Qq]uote/],
      ['nothing', '', /nothing\.csv: the file is empty/],
      ['headonly', 'B,L\n', /headonly\.csv: there is no row under the header/],
    ];
    for (const [name, csv, message] of cases) {
      const r = await batch(name, csv);
      expect(r.code, name).toBe(2);
      expect(r.err, name).toMatch(message);
      expect(() => readdirSync(r.out), name).toThrow(); // nothing written
    }
  });

  it('usage: --batch needs --out and writes per row, not to one --export', () => {
    expect(() => parseArgs([TEMPLATE, '--batch', 'runs.csv'])).toThrow(UsageError);
    expect(() => parseArgs([TEMPLATE, '--batch', 'runs.csv'])).toThrow(/--batch needs --out DIR/);
    expect(() => parseArgs([TEMPLATE, '--batch', 'r.csv', '--out', 'o', '--export', 'a.html'])).toThrow(/--export does not go with --batch/);
    expect(() => parseArgs([TEMPLATE, '--batch', 'r.csv', '--out', 'o', '--as', 'docx'])).toThrow('--as docx: write record, pdf or both');
    expect(() => parseArgs([TEMPLATE, '--out', 'o'])).toThrow(/--out is the folder of a --batch run/);
    expect(parseArgs([TEMPLATE, '--batch', 'r.csv', '--out', 'o', '--as', 'both']).batchAs).toBe('both');
  });
});
