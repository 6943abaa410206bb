// The one reading of a formula's text into tokens, as the mathjs parser reads it:
// words, numbers (1e5 is one number), quoted texts ("edge", 'edge', with \ escapes),
// # comments, spaces and the rest. Rename, the editor's highlighting and completion,
// and every look-up of a name in a source use it, so a word inside a quoted text is
// never taken for a name. The one pattern a cell name must match is here too.

/** A cell name: an ASCII letter or _, then letters, digits and _ (as a RegExp source, unanchored). */
export const NAME_PATTERN = '[A-Za-z_][A-Za-z0-9_]*';
const NAME = new RegExp(`^${NAME_PATTERN}$`);

/** Is `text` a well-formed cell name? (Reserved words and function names are the engine's concern.) */
export function isName(text: string): boolean {
  return NAME.test(text);
}

export type TokenType = 'word' | 'number' | 'string' | 'comment' | 'space' | 'other';

export interface Token {
  type: TokenType;
  text: string;
  /** 0-based offsets in the source: [from, to). */
  from: number;
  to: number;
  /** A quoted text or comment that runs to the end of the source without closing. */
  open?: boolean;
}

// mathjs's letters (parse.isValidLatinOrGreek): a word is these and digits.
const LETTER = /[A-Za-z_$\u00C0-\u02AF\u0370-\u03FF\u2100-\u214F]/;
const DIGIT = /[0-9]/;

const isLetter = (c: string | undefined): boolean => c !== undefined && LETTER.test(c);
const isDigit = (c: string | undefined): boolean => c !== undefined && DIGIT.test(c);

/** After one of these, `'` is the transpose operator; anywhere else it opens a quoted text. */
function endsValue(t: Token | undefined): boolean {
  if (!t) return false;
  return t.type === 'word' || t.type === 'number' || t.type === 'string' || (t.type === 'other' && /^[)\]}!']$/.test(t.text));
}

/** The end of a number starting at `i` (mathjs getToken's number rule). */
function numberEnd(s: string, i: number): number {
  const two = s.slice(i, i + 2);
  if (two === '0b' || two === '0o' || two === '0x') {
    let j = i + 2;
    while (isLetter(s[j]) || isDigit(s[j])) j++;
    return j;
  }
  let j = i;
  while (isDigit(s[j])) j++;
  // A decimal mark, unless it starts an element-wise operator (./ .* .^).
  if (s[j] === '.' && !/[/*^]/.test(s[j + 1] ?? '')) j++;
  while (isDigit(s[j])) j++;
  if ((s[j] === 'e' || s[j] === 'E') && (isDigit(s[j + 1]) || ((s[j + 1] === '+' || s[j + 1] === '-') && isDigit(s[j + 2])))) {
    j += s[j + 1] === '+' || s[j + 1] === '-' ? 2 : 1;
    while (isDigit(s[j])) j++;
  }
  return j;
}

/** The end of a quoted text opened at `i`, and whether it closes. */
function stringEnd(s: string, i: number): { end: number; open: boolean } {
  const quote = s[i];
  let j = i + 1;
  while (j < s.length && s[j] !== quote) j += s[j] === '\\' ? 2 : 1;
  return j < s.length ? { end: j + 1, open: false } : { end: s.length, open: true };
}

/** Every token of `source`, in order; their texts joined give the source back. */
export function tokenize(source: string): Token[] {
  const out: Token[] = [];
  let last: Token | undefined; // the last token that is not space or comment
  let i = 0;
  const push = (type: TokenType, end: number, open?: boolean) => {
    const t: Token = { type, text: source.slice(i, end), from: i, to: end };
    if (open) t.open = true;
    out.push(t);
    if (type !== 'space' && type !== 'comment') last = t;
    i = end;
  };
  while (i < source.length) {
    const c = source[i];
    if (/\s/.test(c)) {
      let j = i + 1;
      while (j < source.length && /\s/.test(source[j])) j++;
      push('space', j);
    } else if (c === '#') {
      const nl = source.indexOf('\n', i);
      push('comment', nl < 0 ? source.length : nl);
    } else if (isDigit(c) || (c === '.' && isDigit(source[i + 1]))) {
      push('number', numberEnd(source, i));
    } else if (isLetter(c)) {
      let j = i + 1;
      while (isLetter(source[j]) || isDigit(source[j])) j++;
      push('word', j);
    } else if (c === '"' || (c === "'" && !endsValue(last))) {
      const s = stringEnd(source, i);
      push('string', s.end, s.open);
    } else {
      push('other', i + 1);
    }
  }
  return out;
}

/** A word the parser reads as a symbol, with what stands around it. */
export interface NameUse {
  name: string;
  from: number;
  to: number;
  /** Followed by `(`: the parser reads a function call, never a cell. */
  call: boolean;
  /** Right after a number (spaces between or not): where a unit is written (`12 in`). */
  afterNumber: boolean;
  /** Written against the number before it with no space (`2L`). */
  touchesNumber: boolean;
}

/** The words of `source` that are names (cells, units or functions), outside quoted texts and comments. */
export function nameUses(source: string): NameUse[] {
  const tokens = tokenize(source);
  const out: NameUse[] = [];
  let prev: Token | undefined; // previous token that is not space or comment
  for (let k = 0; k < tokens.length; k++) {
    const t = tokens[k];
    if (t.type === 'space' || t.type === 'comment') continue;
    if (t.type === 'word') {
      let n = k + 1;
      while (n < tokens.length && (tokens[n].type === 'space' || tokens[n].type === 'comment')) n++;
      out.push({
        name: t.text, from: t.from, to: t.to,
        call: tokens[n]?.type === 'other' && tokens[n].text === '(',
        afterNumber: prev?.type === 'number',
        touchesNumber: prev?.type === 'number' && tokens[k - 1] === prev,
      });
    }
    prev = t;
  }
  return out;
}

/** 1-based column of the first use of `name` as a symbol in `source` (for error markers). */
export function columnOfName(source: string, name: string): number | undefined {
  const use = nameUses(source).find((u) => u.name === name);
  return use ? use.from + 1 : undefined;
}

/**
 * `source` with every use of the cell name `from` read as a value (not a function
 * call) written as `to`; quoted texts, comments, numbers and other words stay as
 * they are. A name written against a number (`2L`) gets a space, so the new name
 * cannot run into the number (`2e5`).
 */
export function renameUses(source: string, from: string, to: string): string {
  let out = '';
  let at = 0;
  for (const u of nameUses(source)) {
    if (u.name !== from || u.call) continue;
    out += source.slice(at, u.from) + (u.touchesNumber ? ' ' : '') + to;
    at = u.to;
  }
  return at === 0 ? source : out + source.slice(at);
}
