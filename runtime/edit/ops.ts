// Pure edits of a calc sheet. Each takes a sheet and returns a new one (the old one
// is never touched), so undo is a list of sheets and the view can diff by identity.

import type { CalcDocument, Cell, CellKind, DocMeta } from '../document';
import { cellName } from '../document';
import { isName, renameUses } from '../formula/tokens';
import { describe } from '../kinds/index';
import { COMMON_FIELDS, type CellFields, type CellOf } from '../kinds/types';
import { hasFeetInches } from '../units/feet-inches';
import { canonicalUnit, typedUnit } from '../units/systems';

/** An edit that cannot be made (unknown cell, bad name). The message is for people. */
export class EditError extends Error {
  override name = 'EditError';
}

const ID = /^[A-Za-z0-9_-]+$/;

export function indexOfCell(doc: CalcDocument, id: string): number {
  const i = doc.cells.findIndex((c) => c.id === id);
  if (i < 0) throw new EditError(`no cell with id "${id}"`);
  return i;
}

/** A cell id not yet used in the sheet, from a readable stem (`f3`, `in12`). */
export function freshId(doc: CalcDocument, stem: string): string {
  const base = stem.replace(/[^A-Za-z0-9_-]/g, '') || 'c';
  const used = new Set(doc.cells.map((c) => c.id));
  for (let n = 1; ; n++) {
    const id = `${base}${n}`;
    if (!used.has(id)) return id;
  }
}

/** A name not yet published by any cell: `name`, else `name_2`, `name_3`, ... */
export function freshName(doc: CalcDocument, name: string): string {
  const used = new Set(doc.cells.map(cellName).filter((n): n is string => !!n));
  if (!used.has(name)) return name;
  const stem = name.replace(/_\d+$/, '');
  for (let n = 2; ; n++) {
    const candidate = `${stem}_${n}`;
    if (!used.has(candidate)) return candidate;
  }
}

/** A new cell of `kind` with placeholder content that computes. */
export function blankCell<K extends CellKind>(doc: CalcDocument, kind: K): CellOf<K> {
  const d = describe(kind);
  if (!d.blank) throw new EditError(`a ${kind} cell cannot be added`);
  return d.blank(freshId(doc, d.stem), (stem) => freshName(doc, stem));
}

function withCells(doc: CalcDocument, cells: Cell[]): CalcDocument {
  return { ...doc, cells };
}

/** Inserts `cell` at `index` (end when omitted). Its id must be new. */
export function insertCell(doc: CalcDocument, cell: Cell, index = doc.cells.length): CalcDocument {
  if (!ID.test(cell.id)) throw new EditError(`cell id "${cell.id}" may use only letters, digits, _ and -`);
  if (doc.cells.some((c) => c.id === cell.id)) throw new EditError(`a cell with id "${cell.id}" already exists`);
  const at = Math.max(0, Math.min(index, doc.cells.length));
  const cells = doc.cells.slice();
  cells.splice(at, 0, cell);
  return withCells(doc, cells);
}

/** Adds a blank cell of `kind` after the cell `afterId` (or at the end). Returns the new id too. */
export function addCell(doc: CalcDocument, kind: CellKind, afterId?: string): { doc: CalcDocument; id: string } {
  const cell = blankCell(doc, kind);
  const index = afterId === undefined ? doc.cells.length : indexOfCell(doc, afterId) + 1;
  return { doc: insertCell(doc, cell, index), id: cell.id };
}

/** Copies a cell just below itself, with a new id and (for named cells) a new name. */
export function duplicateCell(doc: CalcDocument, id: string): { doc: CalcDocument; id: string } {
  const i = indexOfCell(doc, id);
  const src = doc.cells[i];
  const copy: Cell = { ...structuredClone(src), id: freshId(doc, describe(src.kind).stem) };
  if ('name' in copy && copy.name) copy.name = freshName(doc, copy.name);
  return { doc: insertCell(doc, copy, i + 1), id: copy.id };
}

/** Moves a cell by `delta` places (negative = up), clamped to the sheet. */
export function moveCell(doc: CalcDocument, id: string, delta: number): CalcDocument {
  const from = indexOfCell(doc, id);
  const to = Math.max(0, Math.min(doc.cells.length - 1, from + delta));
  if (to === from) return doc;
  const cells = doc.cells.slice();
  const [cell] = cells.splice(from, 1);
  cells.splice(to, 0, cell);
  return withCells(doc, cells);
}

export function deleteCell(doc: CalcDocument, id: string): CalcDocument {
  const i = indexOfCell(doc, id);
  return withCells(doc, doc.cells.filter((_, j) => j !== i));
}

/** Replaces cell `id` by `patch` applied to it; the kind and id cannot change. */
export function updateCell<C extends Cell>(doc: CalcDocument, id: string, patch: (cell: C) => C): CalcDocument {
  const i = indexOfCell(doc, id);
  const old = doc.cells[i] as C;
  const next = patch(old);
  if (next === old) return doc;
  if (next.id !== old.id || next.kind !== old.kind) throw new EditError('an edit cannot change a cell\'s id or kind');
  const cells = doc.cells.slice();
  cells[i] = next;
  return withCells(doc, cells);
}

/** Stores an input's value exactly as typed; a bad value is kept so the engine can report it. */
export function setInputValue(doc: CalcDocument, id: string, value: string): CalcDocument {
  return updateCell(doc, id, (cell) => {
    if (cell.kind !== 'input') throw new EditError(`cell "${cell.id}" is a ${cell.kind}, not an input`);
    return cell.value === value ? cell : { ...cell, value };
  });
}

/**
 * Stores a typed value as setInputValue does, and keeps what the reader sees in the
 * same unit: an input with no display unit shows the unit typed, so when a value is
 * typed in another unit (450 mm where 18 in stood) the unit shown before becomes the
 * display unit (in for feet-inch values).
 */
export function setInputValueKeepUnit(doc: CalcDocument, id: string, value: string): CalcDocument {
  const next = setInputValue(doc, id, value);
  const before = doc.cells[indexOfCell(doc, id)];
  if (next === doc || before.kind !== 'input' || before.unit || before.choices) return next;
  const was = typedUnit(before.value);
  const now = typedUnit(value);
  // A bare number typed for a quantity keeps the quantity's unit, so the engine can say
  // "B is a length: add a unit" instead of taking 11 as a pure number.
  if (!was || (now && canonicalUnit(was) === canonicalUnit(now))) return next;
  return setCellFields(next, id, { unit: hasFeetInches(before.value) ? 'in' : was });
}

/** Sets the expression of a cell that has one (a formula's, a check's condition, a figure's call). */
export function setExpr(doc: CalcDocument, id: string, expr: string): CalcDocument {
  return updateCell(doc, id, (cell) => {
    if (!('expr' in cell)) throw new EditError(`cell "${cell.id}" is a ${cell.kind}, which has no expression`);
    return cell.expr === expr ? cell : { ...cell, expr };
  });
}

export type { CellFields };

/** The fields a cell of this kind may set: its editor panel's, and those every cell has. */
function fieldsOf(kind: CellKind): Map<string, ((value: unknown) => string | undefined) | undefined> {
  return new Map([...COMMON_FIELDS.map((k) => [k, undefined] as const), ...describe(kind).fields.map((f) => [String(f.key), f.check] as const)]);
}

/**
 * `cell` with each field set to its value, or removed when the value is undefined; the
 * same object when nothing changes. The keys are the caller's to check against the
 * kind (its fields, its source), so the copy is written by key.
 */
export function withFields<C extends Cell>(cell: C, entries: Iterable<[string, unknown]>): C {
  const next: C = { ...cell };
  let changed = false;
  for (const [key, value] of entries) {
    if (value === undefined) {
      if (key in next) { Reflect.deleteProperty(next, key); changed = true; }
    } else if (JSON.stringify(Reflect.get(next, key)) !== JSON.stringify(value)) {
      Reflect.set(next, key, Array.isArray(value) ? value.slice() : value);
      changed = true;
    }
  }
  return changed ? next : cell;
}

/** Sets (or, with '' / undefined / [], removes) the optional fields of a cell. */
export function setCellFields(doc: CalcDocument, id: string, fields: CellFields): CalcDocument {
  return updateCell(doc, id, (cell) => {
    const allowed = fieldsOf(cell.kind);
    const entries = Object.entries(fields).map(([key, value]): [string, unknown] => {
      if (!allowed.has(key)) throw new EditError(`a ${cell.kind} cell has no ${key}`);
      if (value === '' || (Array.isArray(value) && value.length === 0)) return [key, undefined];
      const problem = value === undefined ? undefined : allowed.get(key)?.(value);
      if (problem) throw new EditError(problem);
      return [key, value];
    });
    return withFields(cell, entries);
  });
}

/** Why `name` cannot name cell `id` (syntax or already taken), or undefined. */
export function nameClash(doc: CalcDocument, id: string, name: string): string | undefined {
  if (!isName(name)) return `"${name}" is not a valid name: letters, digits and _, starting with a letter`;
  const other = doc.cells.find((c) => c.id !== id && cellName(c) === name);
  return other ? `"${name}" already names another cell` : undefined;
}

/** Rewrites the uses of the name `from` as `to` in an expression (not function calls, quoted texts or numbers). */
export function renameInExpr(expr: string, from: string, to: string): string {
  return renameUses(expr, from, to);
}

/**
 * Renames a named cell. With `updateReferences` every formula and check that reads
 * the old name is rewritten to the new one in the same edit.
 */
export function renameCell(doc: CalcDocument, id: string, name: string, updateReferences = true): CalcDocument {
  const i = indexOfCell(doc, id);
  const cell = doc.cells[i];
  const named = describe(cell.kind).named;
  if (!named) throw new EditError(`a ${cell.kind} cell has no name`);
  const old = cellName(cell);
  if (named === 'optional' && name === '') {
    if (old === undefined) return doc;
    return updateCell(doc, id, (c) => withFields(c, [['name', undefined]]));
  }
  if (old === name) return doc;
  const problem = nameClash(doc, id, name);
  if (problem) throw new EditError(problem);
  const cells = doc.cells.map((c) => {
    if (c.id === id) return { ...c, name };
    return updateReferences && old ? describe(c.kind).rename(c, old, name) : c;
  });
  return withCells(doc, cells);
}

export function setMeta(doc: CalcDocument, key: keyof DocMeta, value: string): CalcDocument {
  if (doc.meta[key] === value) return doc;
  return { ...doc, meta: { ...doc.meta, [key]: value } };
}
