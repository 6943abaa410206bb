import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { CalcDocument, Cell } from '../../runtime/document';
import { emptyMeta } from '../../runtime/document';
import {
  EditError, addCell, applyDelta, canRedo, canUndo, deleteCell, diffSheets, duplicateCell, insertCell,
  moveCell, packSheets, record, redo, renameCell, renameInExpr, setCellFields, setExpr, setInputValue, setInputValueKeepUnit,
  setMeta, startHistory, applySource, undo, unpackSheets,
} from '../../runtime/edit/index';

function sheet(): CalcDocument {
  return {
    meta: { ...emptyMeta(), project: 'Harbour St. parking deck' },
    cells: [
      { id: 's1', kind: 'section', title: 'Loads' },
      { id: 'i1', kind: 'input', name: 'D', value: '120 psf', unit: 'psf' },
      { id: 'i2', kind: 'input', name: 'L', value: '50 psf' },
      { id: 'f1', kind: 'formula', name: 'w_u', expr: '1.2 D + 1.6 L', unit: 'psf' },
      { id: 'k1', kind: 'check', expr: 'w_u <= 300 psf' },
      { id: 'n1', kind: 'note', text: 'Loads per *ASCE 7-22*.' },
    ],
  };
}

const ids = (d: CalcDocument) => d.cells.map((c) => c.id);

describe('edit operations', () => {
  it('never touch the sheet they are given', () => {
    const d = sheet();
    const frozen = JSON.stringify(d);
    setInputValue(d, 'i1', '100 psf');
    setExpr(d, 'f1', 'D + L');
    moveCell(d, 'i2', -1);
    deleteCell(d, 'n1');
    duplicateCell(d, 'f1');
    renameCell(d, 'i1', 'DL');
    setCellFields(d, 'f1', { unit: 'kPa', label: 'factored load' });
    setMeta(d, 'job', '24-118');
    expect(JSON.stringify(d)).toBe(frozen);
  });

  it('set values and expressions, sharing unchanged cells', () => {
    const d = sheet();
    const e = setInputValue(d, 'i1', '450 mm');
    expect(e.cells[1]).toMatchObject({ value: '450 mm', unit: 'psf' });
    expect(e.cells[0]).toBe(d.cells[0]);
    expect(setInputValue(d, 'i1', '120 psf')).toBe(d); // same value: same sheet
    expect(setExpr(d, 'k1', 'w_u <= 250 psf').cells[4]).toMatchObject({ expr: 'w_u <= 250 psf' });
    expect(applySource(d, 'n1', 'x').cells[5]).toMatchObject({ text: 'x' });
    expect(applySource(d, 's1', 'Gravity loads').cells[0]).toMatchObject({ title: 'Gravity loads' });
    expect(() => setInputValue(d, 'f1', '3')).toThrow(EditError);
    expect(() => setExpr(d, 'nope', '3')).toThrow(/no cell/);
  });

  it('keep the unit shown when a value is typed in another unit', () => {
    const d = sheet();
    // i2 shows the unit typed (psf); a value in kPa keeps psf as its display unit
    expect(setInputValueKeepUnit(d, 'i2', '2.4 kPa').cells[2]).toMatchObject({ value: '2.4 kPa', unit: 'psf' });
    // same unit typed, or a display unit already set: only the value changes
    expect(setInputValueKeepUnit(d, 'i2', '40 psf').cells[2]).not.toHaveProperty('unit');
    expect(setInputValueKeepUnit(d, 'i1', '5 kPa').cells[1]).toMatchObject({ value: '5 kPa', unit: 'psf' });
    const ft = setInputValue(d, 'i2', `1'-6"`);
    expect(setInputValueKeepUnit(ft, 'i2', '450 mm').cells[2]).toMatchObject({ value: '450 mm', unit: 'in' });
    expect(setInputValueKeepUnit(d, 'i2', '50 psf')).toBe(d);
  });

  it('add, duplicate, move and delete', () => {
    const d = sheet();
    const added = addCell(d, 'formula', 'i2');
    expect(ids(added.doc)).toEqual(['s1', 'i1', 'i2', added.id, 'f1', 'k1', 'n1']);
    expect(added.doc.cells[3]).toMatchObject({ kind: 'formula', name: 'y' });

    const dup = duplicateCell(d, 'i1');
    expect(ids(dup.doc)[2]).toBe(dup.id);
    expect(dup.doc.cells[2]).toMatchObject({ kind: 'input', name: 'D_2', value: '120 psf' });
    expect(duplicateCell(dup.doc, 'i1').doc.cells[2]).toMatchObject({ name: 'D_3' });

    expect(ids(moveCell(d, 'k1', -2))).toEqual(['s1', 'i1', 'k1', 'i2', 'f1', 'n1']);
    expect(ids(moveCell(d, 'k1', 10))).toEqual(['s1', 'i1', 'i2', 'f1', 'n1', 'k1']);
    expect(moveCell(d, 's1', -1)).toBe(d);
    expect(ids(deleteCell(d, 'i2'))).toEqual(['s1', 'i1', 'f1', 'k1', 'n1']);
    expect(() => insertCell(d, { id: 'i1', kind: 'note', text: '' })).toThrow(/already exists/);
    expect(() => insertCell(d, { id: 'a b', kind: 'note', text: '' })).toThrow(EditError);
  });

  it('rename and rewrite the formulas that read the name', () => {
    const d = renameCell(sheet(), 'i1', 'DL');
    expect(d.cells[1]).toMatchObject({ name: 'DL' });
    expect(d.cells[3]).toMatchObject({ expr: '1.2 DL + 1.6 L' });
    expect(renameCell(sheet(), 'i1', 'DL', false).cells[3]).toMatchObject({ expr: '1.2 D + 1.6 L' });
    expect(() => renameCell(sheet(), 'i1', 'L')).toThrow(/already names/);
    expect(() => renameCell(sheet(), 'i1', '2x')).toThrow(/not a valid name/);
    expect(() => renameCell(sheet(), 's1', 'x')).toThrow(/has no name/);
    const named = renameCell(sheet(), 'k1', 'chk_w');
    expect(named.cells[4]).toMatchObject({ name: 'chk_w' });
    expect(renameCell(named, 'k1', '').cells[4]).not.toHaveProperty('name');
  });

  it('renames only whole names, not functions or parts of numbers', () => {
    expect(renameInExpr('max(D, D_2) + D*2 + 1e5', 'D', 'DL')).toBe('max(DL, D_2) + DL*2 + 1e5');
    expect(renameInExpr('e + 2e3 + e(1)', 'e', 'k')).toBe('k + 2e3 + e(1)');
  });

  it('set and remove optional fields', () => {
    const d = setCellFields(sheet(), 'f1', { unit: 'kPa', precision: 3, clause: 'ASCE 7-22 §2.3.1' });
    expect(d.cells[3]).toMatchObject({ unit: 'kPa', precision: 3, clause: 'ASCE 7-22 §2.3.1' });
    const e = setCellFields(d, 'f1', { unit: '', precision: undefined });
    expect(e.cells[3]).not.toHaveProperty('unit');
    expect(e.cells[3]).not.toHaveProperty('precision');
    expect(setCellFields(e, 'f1', { clause: 'ASCE 7-22 §2.3.1' })).toBe(e);
    expect(() => setCellFields(d, 'n1', { unit: 'in' })).toThrow(/no unit/);
    expect(() => setCellFields(d, 'f1', { precision: 0 })).toThrow(/precision/);
    expect(setCellFields(d, 'i1', { choices: ['a', 'b'] }).cells[1]).toMatchObject({ choices: ['a', 'b'] });
  });

  it('set title-block fields', () => {
    const d = setMeta(sheet(), 'checkedBy', 'R. Okafor');
    expect(d.meta.checkedBy).toBe('R. Okafor');
    expect(d.meta.project).toBe('Harbour St. parking deck');
  });
});

describe('undo history', () => {
  it('undoes and redoes every step', () => {
    const d0 = sheet();
    const d1 = setInputValue(d0, 'i1', '100 psf');
    const d2 = deleteCell(d1, 'n1');
    let h = record(record(startHistory(d0), d1, undefined, 0), d2, undefined, 10);
    expect(canUndo(h)).toBe(true);
    h = undo(h);
    expect(h.present).toBe(d1);
    h = undo(h);
    expect(h.present).toBe(d0);
    expect(canUndo(h)).toBe(false);
    expect(undo(h)).toBe(h);
    h = redo(redo(h));
    expect(h.present).toBe(d2);
    expect(canRedo(h)).toBe(false);
  });

  it('merges typing in one field and drops the redo branch on a new edit', () => {
    const d0 = sheet();
    let h = startHistory(d0);
    h = record(h, setInputValue(d0, 'i1', '1'), 'value:i1', 0);
    h = record(h, setInputValue(d0, 'i1', '12'), 'value:i1', 300);
    h = record(h, setInputValue(d0, 'i1', '120'), 'value:i1', 600);
    expect(h.past.length).toBe(1);
    h = record(h, setInputValue(h.present, 'i2', '40 psf'), 'value:i2', 700);
    expect(h.past.length).toBe(2);
    h = undo(h);
    const branch = record(h, setMeta(h.present, 'job', 'x'), undefined, 800);
    expect(canRedo(branch)).toBe(false);
    // a step after the pause starts a new undo step even with the same key
    const late = record(h, setInputValue(h.present, 'i1', '9'), 'value:i1', 5000);
    expect(late.past.length).toBe(h.past.length + 1);
  });
});

// Random edit sequences, to check a saved history rebuilds every sheet exactly.
const editArb = fc.oneof(
  fc.record({ op: fc.constant('value'), v: fc.string({ maxLength: 8 }) }),
  fc.record({ op: fc.constant('add'), k: fc.constantFrom('note', 'formula', 'input', 'section', 'check') }),
  fc.record({ op: fc.constant('move'), by: fc.integer({ min: -3, max: 3 }) }),
  fc.record({ op: fc.constant('delete') }),
  fc.record({ op: fc.constant('meta'), v: fc.string({ maxLength: 5 }) }),
  fc.record({ op: fc.constant('dup') }),
);

function applyEdit(d: CalcDocument, e: any, pick: number): CalcDocument {
  const target: Cell | undefined = d.cells[pick % Math.max(1, d.cells.length)];
  switch (e.op) {
    case 'value': return target?.kind === 'input' ? setInputValue(d, target.id, e.v) : d;
    case 'add': return addCell(d, e.k, target?.id).doc;
    case 'move': return target ? moveCell(d, target.id, e.by) : d;
    case 'delete': return target ? deleteCell(d, target.id) : d;
    case 'dup': return target ? duplicateCell(d, target.id).doc : d;
    default: return setMeta(d, 'subject', e.v);
  }
}

describe('history deltas', () => {
  it('rebuild every sheet of a random edit sequence (200 runs)', () => {
    fc.assert(fc.property(fc.array(fc.tuple(editArb, fc.nat(20)), { maxLength: 25 }), (edits) => {
      const sheets = [sheet()];
      for (const [e, pick] of edits) sheets.push(applyEdit(sheets[sheets.length - 1], e, pick));
      const { base, steps } = packSheets(sheets);
      // through a structured copy, as IndexedDB stores it
      const stored = JSON.parse(JSON.stringify({ base, steps }));
      expect(unpackSheets(stored.base, stored.steps)).toEqual(sheets);
    }), { numRuns: 200 });
  });

  it('carry only what changed', () => {
    const d0 = sheet();
    const d1 = setInputValue(d0, 'i1', '90 psf');
    expect(diffSheets(d0, d1)).toEqual({ cells: [d1.cells[1]] });
    expect(diffSheets(d0, d0)).toEqual({});
    expect(applyDelta(d0, {})).toBe(d0);
    expect(diffSheets(d0, moveCell(d0, 'n1', -1))).toEqual({ order: ['s1', 'i1', 'i2', 'f1', 'n1', 'k1'] });
  });
});
