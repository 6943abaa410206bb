// What the source editor marks and when it completes, read with the engine's own
// tokenizer (runtime/formula/tokens.ts): a quoted text stays a text, a comment a
// comment. Plain functions of the text, so they are tested without an editor.

import { nameUses, NAME_PATTERN, tokenize } from '../runtime/formula/tokens';

/** A formula's source, or a note's text with $...$ math. */
export type SourceMode = 'formula' | 'note';

/** A name being typed, right before the cursor. */
export const NAME_BEFORE = new RegExp(`${NAME_PATTERN}$`);
/** What completion may go on filtering by: a name, or nothing yet. */
export const NAME_SO_FAR = new RegExp(`^(?:${NAME_PATTERN})?$`);

export interface SourceMarkRange {
  from: number;
  to: number;
  cls: string;
}

export interface MarkWords {
  names: ReadonlySet<string>;
  functions: ReadonlySet<string>;
  units: ReadonlySet<string>;
}

/** Marks for each token of a formula, shifted by `offset`. */
function formulaMarks(text: string, words: MarkWords, offset: number, out: SourceMarkRange[]): void {
  const uses = new Map(nameUses(text).map((u) => [u.from, u]));
  for (const t of tokenize(text)) {
    let cls: string | undefined;
    if (t.type === 'number') cls = 'cm-lt-num';
    else if (t.type === 'string') cls = 'cm-lt-str';
    else if (t.type === 'word') {
      const u = uses.get(t.from)!;
      if (u.call && words.functions.has(u.name)) cls = 'cm-lt-fn';
      else if (words.names.has(u.name)) cls = 'cm-lt-name';
      else if (words.units.has(u.name) || u.afterNumber) cls = 'cm-lt-unit';
      else if (words.functions.has(u.name)) cls = 'cm-lt-fn';
      else cls = 'cm-lt-unknown';
    }
    if (cls) out.push({ from: offset + t.from, to: offset + t.to, cls });
  }
}

/** The marks of a source, in order: a whole formula, or the $...$ math of a note. */
export function sourceMarks(text: string, mode: SourceMode, words: MarkWords): SourceMarkRange[] {
  const out: SourceMarkRange[] = [];
  if (mode === 'formula') {
    formulaMarks(text, words, 0, out);
    return out;
  }
  // In notes only the $...$ math is code; mark the math and what is in it.
  const re = /\$([^$\n]+)\$/g;
  for (let m = re.exec(text); m; m = re.exec(text)) {
    out.push({ from: m.index, to: m.index + 1, cls: 'cm-lt-mathmark' });
    formulaMarks(m[1], words, m.index + 1, out);
    out.push({ from: m.index + m[0].length - 1, to: m.index + m[0].length, cls: 'cm-lt-mathmark' });
  }
  return out;
}

/**
 * Whether a name typed after `before` may be completed (not inside a quoted text, a
 * comment, or a note's plain text), and whether it follows a number (a unit, then).
 */
export function completionPlace(before: string, mode: SourceMode): { complete: boolean; afterNumber: boolean } {
  let code = before;
  if (mode === 'note') {
    const dollars = before.match(/\$/g)?.length ?? 0;
    if (dollars % 2 === 0) return { complete: false, afterNumber: false }; // outside $...$
    code = before.slice(before.lastIndexOf('$') + 1);
  }
  const tokens = tokenize(code);
  const last = tokens.at(-1);
  if (last?.open || last?.type === 'comment') return { complete: false, afterNumber: false };
  return { complete: true, afterNumber: tokens.filter((t) => t.type !== 'space').at(-1)?.type === 'number' };
}
