// `table <id>  name`, its columns one a line, then its rows one a line:
//   column level  text
//   column LL     psf
//   | Roof | 20
//   | 5    | 50
// A row's values are separated by `|`; a `|` or `\` inside a value is written `\|` or `\\`.
// Values are trimmed, so a row line reads back as the values typed (FORMAT.md, "Tables").

import type { TableCell } from '../../document';
import { commonAttrs } from '../fields';
import { decodeValue, encodeValue, isIdentifier } from '../quote';
import type { AttrSpec, HeaderSpec, KindFormat } from '../types';

const header: HeaderSpec<TableCell> = {
  write: (cell) => encodeValue(cell.name),
  read: (id, tail, column) => {
    const d = decodeValue(tail, column, 'table name');
    if (!d.ok) return d;
    return { ok: true, cell: { kind: 'table', id, name: d.value, columns: [], rows: [] } };
  },
};

/** `column NAME TYPE`: the name is the first word, the type the rest of the line. */
const column: AttrSpec<TableCell> = {
  key: 'column',
  repeatable: true,
  // Names padded to the longest, so the types stand in a column.
  write: (cell) => {
    const w = Math.max(...cell.columns.map((c) => c.name.length));
    return cell.columns.map((c) => `${c.name.padEnd(w)}  ${c.type}`);
  },
  read: (cell, value) => {
    const m = /^(\S+)\s+(\S.*)$/s.exec(value);
    if (!m) return 'a column is "column NAME TYPE", the type a unit (ft, psf), number, yes/no or text';
    if (!isIdentifier(m[1])) return `"${m[1]}" cannot be a column name (letters, digits and _, not starting with a digit)`;
    cell.columns.push({ name: m[1], type: m[2] });
    return undefined;
  },
};

/** One row as a line: values joined by ` | `, with `|` and `\` escaped. */
export function writeRow(row: readonly string[]): string {
  // An empty last value leaves no trailing blank (which would make the line quoted).
  return row.map((v) => v.replace(/\\/g, '\\\\').replace(/\|/g, '\\|')).join(' | ').trimEnd();
}

/** A row line back into its values (trimmed). */
export function readRow(line: string): string[] {
  const out: string[] = [];
  let cur = '';
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (ch === '\\' && (line[i + 1] === '|' || line[i + 1] === '\\')) {
      cur += line[++i];
    } else if (ch === '|') {
      out.push(cur.trim());
      cur = '';
    } else cur += ch;
  }
  out.push(cur.trim());
  return out;
}

export const tableFormat: KindFormat<TableCell> = {
  kind: 'table',
  header,
  attrs: [column, ...commonAttrs<TableCell>()],
  body: {
    write: (cell) => cell.rows.map(writeRow),
    read: (cell, lines) => {
      cell.rows = lines.map(readRow);
    },
  },
};
