// Building blocks the cell kinds are made of: header forms and attribute types. Each
// names the cell field it reads and writes, typed: a field of the wrong type, or one
// the kind does not have, does not compile.

import type { Cell } from '../document';
import { decodeValue, encodeValue, isIdentifier, quote, scanQuoted } from './quote';
import type { AttrSpec, HeaderSpec } from './types';

/** The keys of C whose values (when present) are of type V. */
type KeysOf<C, V> = { [P in keyof C]-?: Exclude<C[P], undefined> extends V ? P : never }[keyof C] & string;

/** An optional text field written as one attribute line. */
export function textAttr<C extends Cell>(key: string, field: KeysOf<C, string>): AttrSpec<C> {
  return {
    key,
    write: (cell) => {
      const v = cell[field];
      return typeof v === 'string' ? [v] : [];
    },
    read: (cell, value) => {
      Reflect.set(cell, field, value);
      return undefined;
    },
  };
}

/** An optional whole number (e.g. significant figures). */
export function integerAttr<C extends Cell>(key: string, field: KeysOf<C, number>): AttrSpec<C> {
  return {
    key,
    write: (cell) => {
      const v = cell[field];
      return typeof v === 'number' ? [String(v)] : [];
    },
    read: (cell, value) => {
      const n = /^[+-]?[0-9]+$/.test(value) ? Number(value) : NaN;
      if (!Number.isSafeInteger(n)) return `${key} must be a whole number, not ${JSON.stringify(value)}`;
      Reflect.set(cell, field, n === 0 ? 0 : n); // no -0: it would print back as 0
      return undefined;
    },
  };
}

/**
 * An optional list, one line per item, in order. An empty list is written as
 * nothing and so reads back as absent: `[]` is normalised away.
 */
export function listAttr<C extends Cell>(key: string, field: KeysOf<C, string[]>): AttrSpec<C> {
  return {
    key,
    repeatable: true,
    write: (cell) => {
      const v: unknown = cell[field];
      return Array.isArray(v) ? v.map(String) : [];
    },
    read: (cell, value) => {
      const list: unknown = cell[field];
      if (Array.isArray(list)) list.push(value);
      else Reflect.set(cell, field, [value]);
      return undefined;
    },
  };
}

/** Label and clause, which every kind carries, written last. */
export function commonAttrs<C extends Cell>(): AttrSpec<C>[] {
  return [textAttr<Cell>('label', 'label'), textAttr<Cell>('clause', 'clause')];
}

/** Header with nothing after the id (the note); `make` builds the cell from its id. */
export function bareHeader<C extends Cell>(kind: C['kind'], make: (id: string) => C): HeaderSpec<C> {
  return {
    write: () => '',
    read: (id, tail, column) =>
      tail === ''
        ? { ok: true, cell: make(id) }
        : { ok: false, message: `nothing may follow the id of a ${kind}`, column },
  };
}

/** Header `<kind> <id>  <value>` (section title, check expression); `make` builds the cell. */
export function valueHeader<C extends Cell>(field: KeysOf<C, string>, what: string, make: (id: string, value: string) => C): HeaderSpec<C> {
  return {
    write: (cell) => encodeValue(String(cell[field])),
    read: (id, tail, column) => {
      const d = decodeValue(tail, column, what);
      return d.ok ? { ok: true, cell: make(id, d.value) } : d;
    },
  };
}

/**
 * Header `<kind> <id>  name = value` (input, formula). The name is raw when it
 * is an identifier, else quoted; the split is at the first `=` after the name.
 */
export function assignHeader<C extends Cell & { name: string }>(
  field: KeysOf<C, string>, what: string, make: (id: string, name: string, value: string) => C,
): HeaderSpec<C> {
  return {
    write: (cell) => `${isIdentifier(cell.name) ? cell.name : quote(cell.name)} = ${encodeValue(String(cell[field]))}`,
    read: (id, tail, column) => {
      let name: string;
      let eq: number;
      if (tail.startsWith('"')) {
        const q = scanQuoted(tail, 0, column);
        if (!q.ok) return q;
        name = q.value;
        eq = q.end;
        while (tail[eq] === ' ') eq++;
        if (tail[eq] !== '=') return { ok: false, message: 'expected = after the quoted name', column: column + eq };
      } else {
        eq = tail.indexOf('=');
        if (eq < 0) return { ok: false, message: `expected "name = ${what}"`, column };
        name = tail.slice(0, eq).replace(/[ \t]+$/, '');
        if (name === '') return { ok: false, message: 'missing name before =', column };
      }
      let start = eq + 1;
      while (tail[start] === ' ') start++;
      const d = decodeValue(tail.slice(start), column + start, what);
      return d.ok ? { ok: true, cell: make(id, name, d.value) } : d;
    },
  };
}
