// Small values inside one review attribute line (`formula  f1 qu ok value=200 ...`):
// words separated by spaces, each raw when it has no blank and no hidden character,
// else a JSON string literal as everywhere else in the format.

import { isIdentifier, isPlain, quote, scanQuoted } from '../quote';

/** A word written raw when it reads back exactly, else quoted. `-` is kept for "none". */
export function encodeToken(s: string): string {
  return isPlain(s) && !/\s/.test(s) && s !== '-' ? s : quote(s);
}

/** A name: raw when it is an identifier (as in cell headers), else quoted. */
export function encodeName(s: string): string {
  return isIdentifier(s) ? s : quote(s);
}

/** Every double, -0, NaN and the infinities included, as JavaScript prints it. */
export function encodeNumber(x: number): string {
  return Object.is(x, -0) ? '-0' : String(x);
}

const NUMBER = /^-?(?:(?:0|[1-9][0-9]*)(?:\.[0-9]+)?(?:e[+-]?[0-9]+)?|Infinity)$|^NaN$/;

export function decodeNumber(s: string): number | undefined {
  return NUMBER.test(s) ? Number(s) : undefined;
}

export type Token = { text: string; quoted: boolean };

/** Reads the words of one line, left to right; every method throws a message string on a fault. */
export class Tokens {
  private i = 0;
  constructor(private readonly line: string) {}

  private skip(): void {
    while (this.line[this.i] === ' ' || this.line[this.i] === '\t') this.i++;
  }

  get done(): boolean {
    this.skip();
    return this.i >= this.line.length;
  }

  /** The next word, raw or quoted. */
  next(what: string): Token {
    this.skip();
    if (this.i >= this.line.length) throw `missing ${what}`;
    if (this.line[this.i] === '"') {
      const q = scanQuoted(this.line, this.i, 1);
      if (!q.ok) throw `${what}: ${q.message}`;
      this.i = q.end;
      if (this.i < this.line.length && this.line[this.i] !== ' ' && this.line[this.i] !== '\t') throw `unexpected text after the quoted ${what}`;
      return { text: q.value, quoted: true };
    }
    const start = this.i;
    while (this.i < this.line.length && this.line[this.i] !== ' ' && this.line[this.i] !== '\t') this.i++;
    return { text: this.line.slice(start, this.i), quoted: false };
  }

  /** The next `key=value` pair; the value is raw or quoted. */
  pair(): { key: string; value: Token } {
    this.skip();
    const m = /^([a-z]+)=/.exec(this.line.slice(this.i));
    if (!m) throw `expected key=value, not ${JSON.stringify(this.line.slice(this.i).split(' ')[0])}`;
    this.i += m[0].length;
    if (this.i >= this.line.length || this.line[this.i] === ' ') throw `missing value after ${m[1]}= (write "" for an empty one)`;
    return { key: m[1], value: this.next(`${m[1]} value`) };
  }

  /** Whatever is left of the line, after one `=` (for `name = value as typed`). */
  restAfterEquals(): string {
    this.skip();
    if (this.line[this.i] !== '=') throw 'expected = after the name';
    this.i++;
    this.skip();
    const rest = this.line.slice(this.i);
    this.i = this.line.length;
    return rest;
  }
}
