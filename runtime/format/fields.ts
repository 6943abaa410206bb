// Building blocks the cell kinds are made of: header forms and attribute types.

import type { Cell } from '../document';
import { decodeValue, encodeValue, isIdentifier, quote, scanQuoted } from './quote';
import type { AttrSpec, HeaderSpec } from './types';

type Fields = Record<string, unknown>;
const fields = (cell: Cell): Fields => cell as unknown as Fields;

/** An optional text field written as one attribute line. */
export function textAttr<C extends Cell>(key: string, field: string): AttrSpec<C> {
  return {
    key,
    write: (cell) => {
      const v = fields(cell)[field];
      return typeof v === 'string' ? [v] : [];
    },
    read: (cell, value) => {
      fields(cell)[field] = value;
      return undefined;
    },
  };
}

/** An optional whole number (e.g. significant figures). */
export function integerAttr<C extends Cell>(key: string, field: string): AttrSpec<C> {
  return {
    key,
    write: (cell) => {
      const v = fields(cell)[field];
      return typeof v === 'number' ? [String(v)] : [];
    },
    read: (cell, value) => {
      const n = /^[+-]?[0-9]+$/.test(value) ? Number(value) : NaN;
      if (!Number.isSafeInteger(n)) return `${key} must be a whole number, not ${JSON.stringify(value)}`;
      fields(cell)[field] = n === 0 ? 0 : n; // no -0: it would print back as 0
      return undefined;
    },
  };
}

/**
 * An optional list, one line per item, in order. An empty list is written as
 * nothing and so reads back as absent: `[]` is normalised away.
 */
export function listAttr<C extends Cell>(key: string, field: string): AttrSpec<C> {
  return {
    key,
    repeatable: true,
    write: (cell) => {
      const v = fields(cell)[field];
      return Array.isArray(v) ? (v as string[]) : [];
    },
    read: (cell, value) => {
      const f = fields(cell);
      const list = f[field];
      if (Array.isArray(list)) list.push(value);
      else f[field] = [value];
      return undefined;
    },
  };
}

/** Label and clause, which every kind carries, written last. */
export function commonAttrs<C extends Cell>(): AttrSpec<C>[] {
  return [textAttr<C>('label', 'label'), textAttr<C>('clause', 'clause')];
}

function make<C extends Cell>(kind: C['kind'], id: string, values: Fields): C {
  return { kind, id, ...values } as unknown as C;
}

/** Header with nothing after the id (the note). */
export function bareHeader<C extends Cell>(kind: C['kind'], defaults: Fields): HeaderSpec<C> {
  return {
    write: () => '',
    read: (id, tail, column) =>
      tail === ''
        ? { ok: true, cell: make<C>(kind, id, { ...defaults }) }
        : { ok: false, message: `nothing may follow the id of a ${kind}`, column },
  };
}

/** Header `<kind> <id>  <value>` (section title, check expression). */
export function valueHeader<C extends Cell>(kind: C['kind'], field: string, what: string): HeaderSpec<C> {
  return {
    write: (cell) => encodeValue(String(fields(cell)[field])),
    read: (id, tail, column) => {
      const d = decodeValue(tail, column, what);
      return d.ok ? { ok: true, cell: make<C>(kind, id, { [field]: d.value }) } : d;
    },
  };
}

/**
 * Header `<kind> <id>  name = value` (input, formula). The name is raw when it
 * is an identifier, else quoted; the split is at the first `=` after the name.
 */
export function assignHeader<C extends Cell>(kind: C['kind'], valueField: string, what: string): HeaderSpec<C> {
  return {
    write: (cell) => {
      const name = String(fields(cell).name);
      return `${isIdentifier(name) ? name : quote(name)} = ${encodeValue(String(fields(cell)[valueField]))}`;
    },
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
      return d.ok ? { ok: true, cell: make<C>(kind, id, { name, [valueField]: d.value }) } : d;
    },
  };
}
