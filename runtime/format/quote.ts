// When a value can be written as it is, and how it is quoted when it cannot.
// A quoted value is a JSON string literal (RFC 8259 §7), recognised by its
// leading `"`, so any string survives the trip through a text file.

import { isName } from '../formula/tokens';
import type { Decoded } from './types';

/**
 * Characters never written raw: C0/C1 controls and DEL (line breaks, tabs, CR),
 * zero-width and bidirectional controls (they hide or reorder text in a diff a
 * reviewer reads), line/paragraph separators and the byte-order mark.
 */
const HIDDEN = /[\u0000-\u001f\u007f-\u009f\u200b-\u200f\u2028\u2029\u202a-\u202e\u2066-\u2069\ufeff]/;
/** A surrogate half with no partner cannot be stored as UTF-8. */
const LONE_SURROGATE = /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;
/** The JSON escapes beyond what JSON.stringify does, so a quoted value is all visible text. */
const ESCAPE_TOO = /[\u007f-\u009f\u200b-\u200f\u2028\u2029\u202a-\u202e\u2066-\u2069\ufeff]/g;

const CELL_ID = /^[A-Za-z0-9_-]+$/;

export function isIdentifier(s: string): boolean {
  return isName(s);
}

export function isCellId(s: string): boolean {
  return CELL_ID.test(s);
}

function hasHiddenText(s: string): boolean {
  return HIDDEN.test(s) || LONE_SURROGATE.test(s);
}

/** A value that reads back exactly when written raw after its key. */
export function isPlain(s: string): boolean {
  return s !== '' && !s.startsWith('"') && !/^\s|\s$/.test(s) && !hasHiddenText(s);
}

/** Note lines may be empty or indented (Markdown needs both); trailing blanks are still quoted. */
export function isPlainNoteLine(s: string): boolean {
  return !s.startsWith('"') && !/\s$/.test(s) && !hasHiddenText(s);
}

/** A JSON string literal with every invisible character escaped. */
export function quote(s: string): string {
  return JSON.stringify(s).replace(ESCAPE_TOO, (c) => '\\u' + c.charCodeAt(0).toString(16).padStart(4, '0'));
}

export function encodeValue(s: string): string {
  return isPlain(s) ? s : quote(s);
}

/** `  | text`, `  |` for an empty line, `  | "..."` when the line needs quoting. */
export function encodeNoteLine(s: string): string {
  if (s === '') return '  |';
  return '  | ' + (isPlainNoteLine(s) ? s : quote(s));
}

const SIMPLE_ESCAPES = '"\\/bfnrt';

/**
 * Reads the JSON string literal that opens at `text[start]` (a `"`).
 * Returns the decoded string and the index just past the closing quote.
 * `column` is the 1-based column of `text[0]`, used for error positions.
 */
export function scanQuoted(
  text: string,
  start: number,
  column: number,
): { ok: true; value: string; end: number } | { ok: false; message: string; column: number } {
  let i = start + 1;
  while (i < text.length) {
    const c = text[i];
    if (c === '"') {
      const literal = text.slice(start, i + 1);
      try {
        return { ok: true, value: JSON.parse(literal) as string, end: i + 1 };
      } catch {
        // The scan below rejects what JSON rejects; this is a second line of defence.
        return { ok: false, message: 'quoted text is not a valid JSON string', column: column + start };
      }
    }
    if (c === '\\') {
      const e = text[i + 1];
      if (e === 'u') {
        if (!/^[0-9A-Fa-f]{4}$/.test(text.slice(i + 2, i + 6))) {
          return { ok: false, message: 'bad \\u escape in quoted text (needs 4 hex digits)', column: column + i };
        }
        i += 6;
        continue;
      }
      if (e === undefined || !SIMPLE_ESCAPES.includes(e)) {
        return { ok: false, message: `bad escape \\${e ?? ''} in quoted text`, column: column + i };
      }
      i += 2;
      continue;
    }
    if (c.charCodeAt(0) < 0x20) {
      return { ok: false, message: 'control character inside quoted text (write it as an escape)', column: column + i };
    }
    i++;
  }
  return { ok: false, message: 'quoted text has no closing "', column: column + start };
}

/**
 * Decodes a whole value: raw text as it stands, or one JSON string literal with
 * nothing after it. `text` has no leading padding or trailing blanks left.
 */
export function decodeValue(text: string, column: number, what: string): Decoded {
  if (text === '') return { ok: false, message: `missing ${what} (write "" for an empty one)`, column };
  if (!text.startsWith('"')) return { ok: true, value: text };
  const q = scanQuoted(text, 0, column);
  if (!q.ok) return q;
  if (q.end < text.length) {
    const at = q.end + /^[ \t]*/.exec(text.slice(q.end))![0].length;
    return { ok: false, message: `unexpected text after the quoted ${what}`, column: column + at };
  }
  return { ok: true, value: q.value };
}
