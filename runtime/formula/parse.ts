// Parsing a formula with mathjs, with the limits that keep a hostile record from
// exhausting the stack or memory: length, bracket depth, and a catch-all that
// turns any parser failure into a syntax error with a column.

import { isCall, isSymbol, type MathNode } from './nodes';
import { math } from '../units/math';
import { CellError } from './cell-error';

export const MAX_FORMULA_LENGTH = 2000;
export const MAX_BRACKET_DEPTH = 40;

// The engine reads each formula twice (for its names, then to compile it) and a sheet
// often repeats one; parsing is most of the cost of opening a large sheet.
const CACHE_SIZE = 8000;
const cache = new Map<string, MathNode | CellError>();

export function parseFormula(source: string): MathNode {
  const hit = cache.get(source);
  if (hit !== undefined) {
    if (hit instanceof CellError) throw hit;
    return hit;
  }
  let out: MathNode | CellError;
  try {
    out = parseUncached(source);
  } catch (e) {
    if (!(e instanceof CellError)) throw e;
    out = e;
  }
  if (cache.size >= CACHE_SIZE) cache.delete(cache.keys().next().value as string);
  cache.set(source, out);
  if (out instanceof CellError) throw out;
  return out;
}

function parseUncached(source: string): MathNode {
  if (source.length > MAX_FORMULA_LENGTH) {
    throw new CellError('syntax', `the formula is ${source.length} characters long; the limit is ${MAX_FORMULA_LENGTH}`);
  }
  if (source.trim() === '') throw new CellError('syntax', 'the formula is empty', 1);
  let depth = 0;
  for (let i = 0; i < source.length; i++) {
    const c = source[i];
    if (c === '(' || c === '[' || c === '{') {
      if (++depth > MAX_BRACKET_DEPTH) {
        throw new CellError('syntax', `brackets are nested more than ${MAX_BRACKET_DEPTH} deep`, i + 1);
      }
    } else if (c === ')' || c === ']' || c === '}') depth--;
  }
  try {
    return math.parse(source) as MathNode;
  } catch (e) {
    const err = e as { message?: string; char?: number };
    if (e instanceof RangeError) throw new CellError('syntax', 'the formula is nested too deeply to read');
    const raw = String(err.message ?? e).replace(/\s*\(char \d+\)\s*$/, '');
    const column = typeof err.char === 'number' ? Math.max(1, Math.min(err.char, source.length + 1)) : undefined;
    throw new CellError('syntax', `cannot read the formula: ${plainSyntax(raw)}`, column);
  }
}

// mathjs's messages are close to plain English already; soften the jargon a little.
function plainSyntax(msg: string): string {
  return msg
    .replace(/^Unexpected end of expression$/, 'it ends too early (a value or closing bracket is missing)')
    .replace(/^Value expected$/, 'a value is missing')
    .replace(/^Parenthesis \) expected$/, 'a closing bracket ) is missing')
    .replace(/^Unexpected operator (.*)$/, 'unexpected operator $1')
    .replace(/^Syntax error in part "(.*)"$/, 'unexpected text "$1"');
}

/** Names of all symbols used as values (not called as functions). */
export function symbolNames(node: MathNode): string[] {
  const out: string[] = [];
  const seen = new Set<string>();
  const walk = (n: MathNode, depth: number) => {
    if (depth > 200) return;
    if (isSymbol(n)) {
      if (!seen.has(n.name)) {
        seen.add(n.name);
        out.push(n.name);
      }
      return;
    }
    // A call's own name is no value: only its arguments are walked.
    if (isCall(n)) {
      for (const a of n.args) walk(a, depth + 1);
      return;
    }
    n.forEach((child) => walk(child, depth + 1));
  };
  walk(node, 0);
  return out;
}

/** 1-based column of the first use of a name, for error markers (runtime/formula/tokens.ts). */
export { columnOfName as columnOf } from './tokens';
