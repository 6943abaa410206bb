// The table kind: its text block (a row a line), its values read by column type (a bare
// number in the column's unit, a quantity in any unit of the same kind, yes/no, text),
// bad values named by row and column while the last good value keeps computing, editing
// one value, the record's static table, and Review showing a changed value old → new.
// Unit factors: 1 ft = 0.3048 m exactly (NIST SP 811, Appendix B.8); 1 psf = 47.880 26 Pa
// (NIST SP 811, Appendix B.8, pound-force per square foot).

import { describe, expect, it } from 'vitest';
import type { CalcDocument, TableCell } from '../../runtime/document';
import { setTableValue } from '../../runtime/edit/table-ops';
import { createEngine } from '../../runtime/engine';
import { parse, serialize } from '../../runtime/format/index';
import { staticHtml } from '../../runtime/record/static-html';
import { compare, issueRevision, returnToBaseline } from '../../runtime/review/index';

const TEXT = `loadtrace 1

table t1  storeys
  column level   text
  column h       ft
  column LL      psf
  column reduce  yes/no
  label  Storeys, roof first
  | Roof | 12 | 20 | no
  | 2 | 11'-6" | 50 psf | yes
  | 1 | 3.5 m | 2.394 kPa | yes
`;

const doc = (): CalcDocument => {
  const r = parse(TEXT);
  expect(r.errors).toEqual([]);
  return r.doc;
};

async function run(d: CalcDocument) {
  const engine = createEngine(d);
  await engine.settled();
  return engine;
}

describe('table text format', () => {
  it('reads columns and rows, and writes the same text back', () => {
    const t = doc().cells[0] as TableCell;
    expect(t.name).toBe('storeys');
    expect(t.columns).toEqual([{ name: 'level', type: 'text' }, { name: 'h', type: 'ft' }, { name: 'LL', type: 'psf' }, { name: 'reduce', type: 'yes/no' }]);
    expect(t.rows[1]).toEqual(['2', `11'-6"`, '50 psf', 'yes']);
    expect(serialize(doc())).toBe(TEXT);
  });

  it('keeps a | or \\ inside a value, and empty values, through a round trip', () => {
    const d = doc();
    const t = d.cells[0] as TableCell;
    const edited = { ...d, cells: [{ ...t, rows: [['a|b', '', 'c\\', '']] }] };
    const back = parse(serialize(edited));
    expect(back.errors).toEqual([]);
    expect((back.doc.cells[0] as TableCell).rows).toEqual([['a|b', '', 'c\\', '']]);
    expect(serialize(edited)).toContain('  | a\\|b |  | c\\\\ |\n');
  });

  it('says what is wrong with a column line, at its line', () => {
    const r = parse('loadtrace 1\n\ntable t1  x\n  column 2x ft\n');
    expect(r.errors[0].line).toBe(4);
    expect(r.errors[0].message).toContain('cannot be a column name');
  });
});

describe('table values', () => {
  it('reads each value in its column: bare numbers in the column unit, other units converted', async () => {
    const engine = await run(doc());
    const s = engine.state('t1')!;
    expect(s.status).toBe('ok');
    const rows = s.table!.rows;
    expect(rows[0][1]).toBeCloseTo(12 * 0.3048, 12); // 12 ft = 3.6576 m
    expect(rows[1][1]).toBeCloseTo(11.5 * 0.3048, 12); // 11'-6" = 11.5 ft = 3.5052 m
    expect(rows[2][1]).toBeCloseTo(3.5, 12);
    expect(rows[0][2]).toBeCloseTo(20 * 47.88026, 3); // 20 psf = 957.6 Pa
    expect(rows[2][2]).toBeCloseTo(2394, 9); // 2.394 kPa as typed, SI
    expect(rows.map((r) => r[3])).toEqual([false, true, true]);
    expect(rows.map((r) => r[0])).toEqual(['Roof', '2', '1']);
    engine.dispose();
  });

  it('names the row and column of a bad value, and keeps computing with the last good one', async () => {
    const d = doc();
    const engine = await run(d);
    const good = engine.state('t1')!.table!.rows[1][2];
    const bad = setTableValue(d, 't1', 1, 2, '50 ft');
    engine.update(bad);
    await engine.settled();
    const s = engine.state('t1')!;
    expect(s.status).toBe('error');
    expect(s.error!.message).toContain('row 2 (2), column LL');
    expect(s.error!.message).toContain('"50 ft" is');
    expect(s.table!.rows[1][2]).toBe(good);
    expect(s.table!.problems).toEqual([expect.objectContaining({ row: 1, column: 2 })]);
    // Nothing typed is lost: the bad text stays in the document.
    expect((bad.cells[0] as TableCell).rows[1][2]).toBe('50 ft');
    engine.dispose();
  });

  it('refuses a column type that is no unit, and a word in a number column', async () => {
    const d = parse('loadtrace 1\n\ntable t1  x\n  column a  furlongs per fortnight\n  | 1\n').doc;
    let engine = await run(d);
    expect(engine.state('t1')!.error!.message).toContain('column a: "furlongs per fortnight" is not a unit');
    engine.dispose();
    engine = await run(setTableValue(doc(), 't1', 0, 3, 'maybe'));
    expect(engine.state('t1')!.error!.message).toContain('reduce takes yes or no, not "maybe"');
    engine.dispose();
  });

  it('an edit makes a new array of the row edited only', () => {
    const d = doc();
    const next = setTableValue(d, 't1', 2, 2, '60');
    const [a, b] = [d.cells[0] as TableCell, next.cells[0] as TableCell];
    expect(b.rows[2]).toEqual(['1', '3.5 m', '60', 'yes']);
    expect(b.rows[0]).toBe(a.rows[0]);
    expect(b.rows[1]).toBe(a.rows[1]);
    expect(setTableValue(d, 't1', 2, 2, ' 2.394 kPa ')).toBe(d);
    expect(() => setTableValue(d, 't1', 5, 0, 'x')).toThrow('has no row 6');
  });
});

describe('table in the record and in review', () => {
  it('the static page shows the table with its units', async () => {
    const d = doc();
    const engine = await run(d);
    const html = staticHtml(d, (id) => engine.state(id));
    expect(html).toContain('<table class="lt-table">');
    expect(html).toContain('<th scope="col">LL<span class="tbl-unit">psf</span></th>');
    expect(html).toContain('<td>11&#39;-6&quot;</td>');
    engine.dispose();
  });

  it('Review shows a changed table value old → new, and returns it to the issued value', async () => {
    let d = doc();
    let engine = await run(d);
    d = issueRevision(d, (id) => engine.state(id), 'A. Preparer', '2026-12-01', 'For check');
    engine.dispose();
    d = setTableValue(d, 't1', 1, 2, '60 psf');
    engine = await run(d);
    const c = compare(d, (id) => engine.state(id))!;
    expect(c.inputs.filter((r) => r.changed)).toEqual([
      { id: 't1--2-3', name: 'storeys[2].LL', before: '50 psf', after: '60 psf', changed: true },
    ]);
    const back = returnToBaseline(d);
    expect((back.cells[0] as TableCell).rows[1][2]).toBe('50 psf');
    // The issued values travel in the text format.
    expect(parse(serialize(d)).doc.review!.revisions[0].baseline.inputs).toHaveLength(12);
    engine.dispose();
  });
});

describe('the table example in FORMAT.md', () => {
  it('reads with no error and is written back byte for byte', async () => {
    const { readFileSync } = await import('node:fs');
    const spec = readFileSync(new URL('../../runtime/format/FORMAT.md', import.meta.url), 'utf8');
    const example = [...spec.matchAll(/```loadtrace\n([\s\S]*?)```/g)].map((m) => m[1]).find((e) => e.startsWith('table '))!;
    const r = parse(`loadtrace 1\n\n${example}`);
    expect(r.errors).toEqual([]);
    expect(serialize(r.doc)).toBe(`loadtrace 1\n\n${example}`);
  });
});
