// Each cell kind and the title block, read and written. The expected layout is the
// one specified in runtime/format/FORMAT.md (the format's spec); its examples are
// read from that file so the spec and the code cannot drift apart.

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { emptyMeta, type CalcDocument, type Cell } from '../../runtime/document';
import { parse, serialize } from '../../runtime/format/index';

const spec = readFileSync(new URL('../../runtime/format/FORMAT.md', import.meta.url), 'utf8');
const examples = [...spec.matchAll(/```loadtrace\n([\s\S]*?)```/g)].map((m) => m[1]);

const doc = (cells: Cell[], meta = emptyMeta()): CalcDocument => ({ meta, cells });
const text = (...lines: string[]): string => lines.join('\n') + '\n';

describe('the example in FORMAT.md', () => {
  it('reads without errors into the document it shows', () => {
    const { doc: d, errors } = parse(examples[0]);
    expect(errors).toEqual([]); // spec: FORMAT.md example is a valid file
    expect(d.meta).toStrictEqual({
      project: 'Harbour Lane Offices', job: 'LT-26-031', subject: 'Typical interior column, roof to soil',
      preparedBy: 'A. Preparer', checkedBy: 'B. Checker', revision: '0', date: '2026-12-01',
    }); // spec: FORMAT.md §Layout, title-block keywords map to DocMeta fields
    expect(d.cells.map((c) => `${c.kind} ${c.id}`)).toEqual([
      'section s1', 'note n1', 'input c3', 'input c4', 'formula c5', 'check c6',
    ]); // spec: one block per cell, in file order
    expect(d.cells[2]).toStrictEqual({
      kind: 'input', id: 'c3', name: 'fc', value: '5000 psi', unit: 'psi', min: '2500 psi', max: '10000 psi',
      label: 'Specified compressive strength of concrete', description: 'Longer description...',
      clause: 'ACI 318-19 §19.2.1.1',
    }); // spec: `about` is the description
    expect(d.cells[3]).toStrictEqual({
      kind: 'input', id: 'c4', name: 'position', value: 'interior', choices: ['interior', 'edge', 'corner'],
    }); // spec: `choice` repeats, order kept
    expect(d.cells[4]).toStrictEqual({
      kind: 'formula', id: 'c5', name: 'qu', expr: '1.2*D + 1.6*L', unit: 'psf', precision: 3,
      label: 'Factored floor load',
    }); // spec: precision is a whole number
  });

  it('is written back byte for byte', () => {
    expect(serialize(parse(examples[0]).doc)).toBe(examples[0]); // spec: FORMAT.md example is serializer output
  });

  it('the quoting example reads and is written back byte for byte', () => {
    const file = 'loadtrace 1\n\n' + examples[1];
    const r = parse(file);
    expect(r.errors).toEqual([]);
    expect(r.doc.cells[0]).toStrictEqual({
      kind: 'input', id: 'c7', name: "f'c", value: '4000 psi', label: '  indented label', description: '',
    }); // spec: FORMAT.md §Quoting, quoted name and values
    expect((r.doc.cells[1] as { text: string }).text.split('\n')).toEqual([
      'Lines that start with a quote mark, or hold tabs or trailing blanks, are quoted:',
      '"Quoted" text\tend ',
      '    indented lines stay raw',
    ]); // spec: FORMAT.md §Quoting; RFC 8259 §7 escapes \" and \t
    expect(serialize(r.doc)).toBe(file);
  });
});

describe('title block', () => {
  it('writes set fields in fixed order, values in column 11, and omits empty ones', () => {
    const meta = { ...emptyMeta(), date: '2026-12-01', project: 'Quarry Road Depot', checkedBy: 'C. Reviewer' };
    expect(serialize(doc([], meta))).toBe(
      text('loadtrace 1', 'project   Quarry Road Depot', 'checked   C. Reviewer', 'date      2026-12-01'),
    ); // spec: FORMAT.md §Layout, fixed order, empty field has no line
  });

  it('reads a missing line as an empty string', () => {
    const r = parse(text('loadtrace 1', 'job  LT-9'));
    expect(r.errors).toEqual([]);
    expect(r.doc.meta).toStrictEqual({ ...emptyMeta(), job: 'LT-9' }); // spec: missing line reads as ''
  });

  it('an empty document is just the header line', () => {
    expect(serialize(doc([]))).toBe('loadtrace 1\n'); // spec: FORMAT.md §Layout
    expect(parse('loadtrace 1\n')).toStrictEqual({ doc: doc([]), errors: [] });
  });
});

describe('cell kinds', () => {
  it('section: title after two spaces, label and clause', () => {
    const c: Cell = { kind: 'section', id: 's-2', title: 'Footing', label: 'Spread footing F2', clause: 'ACI 318-19 Ch. 13' };
    const t = text('loadtrace 1', '', 'section s-2  Footing', '  label  Spread footing F2', '  clause ACI 318-19 Ch. 13');
    expect(serialize(doc([c]))).toBe(t); // spec: FORMAT.md §Layout table
    expect(parse(t)).toStrictEqual({ doc: doc([c]), errors: [] });
  });

  it('note: one | line per text line, `|` alone for an empty line, no lines for empty text', () => {
    const c: Cell = { kind: 'note', id: 'n_1', text: 'Soil report R-12.\n\n  - allowable 3 ksf', label: 'Basis' };
    const t = text('loadtrace 1', '', 'note n_1', '  label  Basis', '  | Soil report R-12.', '  |', '  |   - allowable 3 ksf');
    expect(serialize(doc([c]))).toBe(t); // spec: FORMAT.md §Layout, note text
    expect(parse(t)).toStrictEqual({ doc: doc([c]), errors: [] });
    const empty: Cell = { kind: 'note', id: 'n2', text: '' };
    expect(serialize(doc([empty]))).toBe(text('loadtrace 1', '', 'note n2')); // spec: '' has no text lines
    expect(parse(text('loadtrace 1', '', 'note n2')).doc.cells).toStrictEqual([empty]);
  });

  it('input: name = value, then unit, min, max, choices, label, about, clause in that order', () => {
    const c: Cell = {
      kind: 'input', id: 'c9', name: 'soil', value: 'medium sand', choices: ['loose sand', 'medium sand'],
      label: 'Bearing stratum', description: 'From boring B-3', clause: 'IBC Table 1806.2', unit: 'ksf',
    };
    const t = text(
      'loadtrace 1', '', 'input c9  soil = medium sand', '  unit   ksf', '  choice loose sand', '  choice medium sand',
      '  label  Bearing stratum', '  about  From boring B-3', '  clause IBC Table 1806.2',
    );
    expect(serialize(doc([c]))).toBe(t); // spec: FORMAT.md §Layout table, written order
    expect(parse(t)).toStrictEqual({ doc: doc([c]), errors: [] });
  });

  it('input: attributes may come in any order when read', () => {
    const r = parse(text('loadtrace 1', '', 'input c1  h = 10 in', '  max 24 in', '  min 6 in'));
    expect(r.errors).toEqual([]);
    expect(r.doc.cells).toStrictEqual([{ kind: 'input', id: 'c1', name: 'h', value: '10 in', min: '6 in', max: '24 in' }]);
  });

  it('formula: precision is a whole number, keys padded to the longest formula key', () => {
    const c: Cell = { kind: 'formula', id: 'f1', name: 'Pu', expr: '1.2*PD + 1.6*PL', unit: 'kip', precision: 4, clause: 'ASCE 7-22 §2.3.1' };
    const t = text('loadtrace 1', '', 'formula f1  Pu = 1.2*PD + 1.6*PL', '  unit      kip', '  precision 4', '  clause    ASCE 7-22 §2.3.1');
    expect(serialize(doc([c]))).toBe(t); // spec: FORMAT.md §Layout, one key width per kind
    expect(parse(t)).toStrictEqual({ doc: doc([c]), errors: [] });
    expect(parse(text('loadtrace 1', '', 'formula f1  x = 1', '  precision -2')).doc.cells[0])
      .toStrictEqual({ kind: 'formula', id: 'f1', name: 'x', expr: '1', precision: -2 }); // spec: -?[0-9]+
  });

  it('check: condition after the id, optional name', () => {
    const c: Cell = { kind: 'check', id: 'k1', expr: 'qu_soil <= qa', name: 'bearing_ok' };
    const t = text('loadtrace 1', '', 'check k1  qu_soil <= qa', '  name   bearing_ok');
    expect(serialize(doc([c]))).toBe(t); // spec: FORMAT.md §Layout table
    expect(parse(t)).toStrictEqual({ doc: doc([c]), errors: [] });
  });

  it('refuses to write a cell that could not be read back', () => {
    const badId = { kind: 'section', id: 'has space', title: 'T' } as Cell;
    expect(() => serialize(doc([badId]))).toThrow(/not \[A-Za-z0-9_-\]\+/); // spec: FORMAT.md §Layout, ids
    const badKind = { kind: 'sketch', id: 'x' } as unknown as Cell;
    expect(() => serialize(doc([badKind]))).toThrow(/no text format for cell kind "sketch"/);
  });

  it('leaves absent optional fields absent and drops an empty choice list', () => {
    const r = parse(text('loadtrace 1', '', 'input c1  x = 1', '', 'check k1  x > 0'));
    expect(r.errors).toEqual([]);
    for (const key of ['label', 'clause', 'unit', 'min', 'max', 'choices', 'description']) {
      expect(Object.keys(r.doc.cells[0])).not.toContain(key); // spec: absent stays absent (no `key: undefined`)
    }
    expect(Object.keys(r.doc.cells[1])).not.toContain('name');
    const withEmpty: Cell = { kind: 'input', id: 'c1', name: 'x', value: '1', choices: [] };
    expect(parse(serialize(doc([withEmpty]))).doc.cells[0]).not.toHaveProperty('choices'); // spec: [] normalised away
  });
});
