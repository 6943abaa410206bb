import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { readScheduleCsv, writeScheduleCsv, type ScheduleRow } from '../../runtime/building/schedule-csv';
import { inch, kip, kN, mm } from '../../runtime/units/si';

const good = [
  'mark,x,y,c1 [in],c2 [in],D [kip],L [kip]',
  'C-4,4,C,20,24,,',
  'C-5,5,C,450 mm,500 mm,310,95',
  '"D,1",1,D,"1\'-6""",18,,', // a quote inside a field: doubled, the field quoted (RFC 4180)
  '',
].join('\n');

describe('reading a column schedule', () => {
  it('header units, cell units, feet-inches and loads that override', () => {
    const { rows, issues } = readScheduleCsv(good);
    expect(issues).toEqual([]);
    expect(rows.map((r) => r.mark)).toEqual(['C-4', 'C-5', 'D,1']);
    expect(rows[0].c1).toBeCloseTo(20 * inch, 12); // 20 in = 0.508 m (inch exact, 25.4 mm)
    expect(rows[1].c2).toBeCloseTo(500 * mm, 12);
    expect(rows[2].c1).toBeCloseTo(18 * inch, 12); // 1'-6" = 18 in
    expect(rows[1].loads).toEqual({ D: expect.closeTo(310 * kip, 6), L: expect.closeTo(95 * kip, 6) });
    expect(rows[0].loads).toEqual({});
  });

  it('checks marks and grid lines against the building when it is known', () => {
    const ctx = { marks: new Set(['C-4', 'C-5', 'D,1']), xLines: ['1', '4', '5'], yLines: ['C', 'D'] };
    expect(readScheduleCsv(good, ctx).issues).toEqual([]);
  });
});

describe('bad CSV: an error naming the row (the header is row 1) and the column; no rows taken', () => {
  const one = (text: string, ctx = {}) => {
    const r = readScheduleCsv(text, ctx);
    expect(r.rows).toEqual([]);
    return r.issues;
  };

  it('a missing column', () => {
    expect(one('mark,x,y,c1 [in]\nA1,1,A,20\n')).toEqual([{ table: 'csv', row: 1, column: 'c2', message: 'the column "c2" is missing (needed: mark, x, y, c1, c2)' }]);
  });

  it('an unknown mark and an unknown grid line', () => {
    const issues = one('mark,x,y,c1 [in],c2 [in]\nA1,1,A,20,20\nZ9,1,Q,20,20\n', { marks: new Set(['A1']), xLines: ['1'], yLines: ['A'] });
    expect(issues).toContainEqual({ table: 'csv', row: 3, column: 'mark', message: 'unknown mark "Z9": no column of the building has it' });
    expect(issues).toContainEqual({ table: 'csv', row: 3, column: 'y', message: '"Q" is not a y line (y lines: A)' });
  });

  it('text in a number, and a number with no unit anywhere', () => {
    const issues = one('mark,x,y,c1 [in],c2\nA1,1,A,twenty,20\n');
    expect(issues).toContainEqual({ table: 'csv', row: 2, column: 'c1', message: '"twenty" is not a number with a unit (e.g. 20 in)' });
    expect(issues).toContainEqual(expect.objectContaining({ row: 2, column: 'c2', message: expect.stringMatching(/has no unit/) }));
  });

  it('a unit of the wrong kind, in a cell or in the header', () => {
    expect(one('mark,x,y,c1,c2 [in]\nA1,1,A,20 kip,20\n')).toContainEqual({ table: 'csv', row: 2, column: 'c1', message: '"20 kip" is a force, not a length' });
    expect(one('mark,x,y,c1 [in],c2 [in],D [in]\nA1,1,A,20,20,100\n')).toContainEqual(expect.objectContaining({ row: 2, column: 'D', message: expect.stringMatching(/^the header's unit in is a length/) }));
  });

  it('a header unit that is no unit, a duplicate mark, an unclosed quote', () => {
    expect(one('mark,x,y,c1 [inchez],c2 [in]\nA1,1,A,20,20\n')).toContainEqual(expect.objectContaining({ row: 1, column: 'c1 [inchez]' }));
    expect(one('mark,x,y,c1 [in],c2 [in]\nA1,1,A,20,20\nA1,2,A,20,20\n')).toContainEqual({ table: 'csv', row: 3, column: 'mark', message: 'mark "A1" is already row 2' });
    expect(one('mark,x,y,c1 [in],c2 [in]\n"A1,1,A,20,20\n').length).toBeGreaterThan(0);
  });
});

const name = fc.string({ minLength: 1, maxLength: 8 }).map((s) => s.trim()).filter((s) => s.length > 0 && !s.includes('\uFEFF'));
const row: fc.Arbitrary<ScheduleRow> = fc.record({
  mark: name,
  x: name,
  y: name,
  c1: fc.double({ min: 0.05, max: 3, noNaN: true }),
  c2: fc.double({ min: 0.05, max: 3, noNaN: true }),
  loads: fc.record({ D: fc.double({ min: 0, max: 5e7, noNaN: true }), L: fc.double({ min: 0, max: 5e7, noNaN: true }) }, { requiredKeys: [] }),
});
const uniqueRows = fc.uniqueArray(row, { minLength: 1, maxLength: 12, selector: (r) => r.mark });

describe('property: CSV in → out → in is lossless', () => {
  it('any schedule written and read back is the same, in US or SI units', () => {
    fc.assert(
      fc.property(uniqueRows, fc.constantFrom({ length: 'in', force: 'kip' }, { length: 'mm', force: 'kN' }, { length: 'ft', force: 'lbf' }), (rows, units) => {
        const first = readScheduleCsv(writeScheduleCsv(rows, units));
        expect(first.issues).toEqual([]);
        expect(first.rows).toEqual(rows);
        // and once more, from what was read
        const again = readScheduleCsv(writeScheduleCsv(first.rows, units));
        expect(again.rows).toEqual(first.rows);
      }),
      { numRuns: 200 },
    );
  });

  it('a schedule typed with mixed units reads the same after writing it out', () => {
    const typed = 'mark,x,y,c1,c2,D\nA1,1,A,22 in,560 mm,1200 kN\nA2,2,A,0.5 m,1.75 ft,250 kip\n';
    const first = readScheduleCsv(typed);
    expect(first.issues).toEqual([]);
    expect(readScheduleCsv(writeScheduleCsv(first.rows)).rows).toEqual(first.rows);
    expect(first.rows[0].loads.D).toBeCloseTo(1200 * kN, 6);
  });
});
