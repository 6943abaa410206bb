// Feet-inch notation as drawings write it (1'-6", 1' 6", 6", 2', 6 1/2") turned into
// quantity text the formula language reads ("1 ft + 6 in"). Anything else is left as is.

const NUM = String.raw`\d+(?:\.\d+)?`;
const FEET_MARK = `['′]`;
const INCH_MARK = `(?:["″]|'')`;
// Inches: a whole or decimal number, an optional proper fraction after a space, or a
// fraction alone ("1/2\"").
const INCHES = String.raw`(?:(${NUM})(?:\s+(\d+)\/(\d+))?|(\d+)\/(\d+))\s*${INCH_MARK}`;
const FEET = String.raw`(${NUM})\s*${FEET_MARK}(?!['′])`;

// feet, then optionally (dash or spaces) inches; or inches alone.
const TOKEN = new RegExp(
  String.raw`(?<![\w.])(?:${FEET}(?:\s*-?\s*${INCHES})?|${INCHES})`,
  'g',
);

function inchesText(whole?: string, num?: string, den?: string, fnum?: string, fden?: string): string {
  if (fnum !== undefined && fden !== undefined) return fraction(0, Number(fnum), Number(fden));
  if (whole === undefined) return '';
  if (num !== undefined && den !== undefined) return fraction(Number(whole), Number(num), Number(den));
  return whole;
}

function fraction(whole: number, num: number, den: number): string {
  if (den === 0) return `${whole} + ${num}/${den}`; // left for the parser to report
  return String(whole + num / den);
}

/**
 * Rewrites every feet-inch token in `text`: `1'-6"` → `1 ft + 6 in`, `6"` → `6 in`,
 * `2'` → `2 ft`. A compound token inside a longer expression is parenthesised so that
 * `2 * 1'-6"` keeps its meaning. Text without such a token comes back unchanged.
 */
export function normalizeFeetInches(text: string): string {
  const trimmed = text.trim();
  let count = 0;
  let whole = false;
  const out = text.replace(TOKEN, (match, ft, i1, n1, d1, fn1, fd1, i2, n2, d2, fn2, fd2, offset: number) => {
    count++;
    const parts: string[] = [];
    if (ft !== undefined) parts.push(`${ft} ft`);
    const inches = ft !== undefined ? inchesText(i1, n1, d1, fn1, fd1) : inchesText(i2, n2, d2, fn2, fd2);
    if (inches !== '') parts.push(`${inches} in`);
    const q = parts.join(' + ');
    whole = match.trim() === trimmed && offset === text.indexOf(trimmed);
    return parts.length > 1 && !whole ? `(${q})` : q;
  });
  return count === 0 ? text : out;
}

/** True when the text holds feet-inch notation (a feet or inch mark after a number). */
export function hasFeetInches(text: string): boolean {
  TOKEN.lastIndex = 0;
  const found = TOKEN.test(text);
  TOKEN.lastIndex = 0;
  return found;
}

/**
 * normalizeFeetInches, with a map from a 1-based column of the rewritten text back to
 * the column of what was typed, so an error in `1'-6" x` points at the x people see.
 */
export function normalizeFeetInchesMapped(text: string): { text: string; typedColumn: (column: number) => number } {
  const pieces: { at: number; typedAt: number; length: number; typedLength: number }[] = [];
  const out = normalizeFeetInches(text);
  if (out === text) return { text, typedColumn: (c) => c };
  // Replay the rewrite to learn where each token went (the same pattern, in order).
  let shift = 0;
  const token = new RegExp(TOKEN.source, 'g'); // its own copy: normalizeFeetInches resets TOKEN
  for (let m = token.exec(text); m; m = token.exec(text)) {
    const rewritten = normalizeFeetInches(m[0]);
    const whole = m[0].trim() === text.trim() && m.index === text.indexOf(text.trim());
    const length = rewritten !== m[0] && rewritten.includes('+') && !whole ? rewritten.length + 2 : rewritten.length;
    pieces.push({ at: m.index + shift, typedAt: m.index, length, typedLength: m[0].length });
    shift += length - m[0].length;
  }
  const typedColumn = (column: number): number => {
    let delta = 0;
    for (const p of pieces) {
      const i = column - 1;
      if (i < p.at) break;
      if (i < p.at + p.length) return p.typedAt + 1; // inside a rewritten token: its start
      delta = p.typedAt + p.typedLength - (p.at + p.length);
    }
    return column + delta;
  };
  return { text: out, typedColumn };
}
