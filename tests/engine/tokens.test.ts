// The formula tokenizer (runtime/formula/tokens.ts) reads a source as the mathjs
// parser does: the names it finds are the parser's symbols, quoted texts and comments
// are never read as names, and the tokens give the source back.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseFormula, symbolNames } from '../../runtime/formula/parse';
import { columnOfName, isName, nameUses, tokenize } from '../../runtime/formula/tokens';
import { formulas } from '../edit/formulas';

describe('tokenize', () => {
  it('reads numbers, words, both quotes with escapes, comments and the transpose mark', () => {
    const kinds = (s: string) => tokenize(s).filter((t) => t.type !== 'space').map((t) => `${t.type}:${t.text}`);
    expect(kinds('2e5 + 1.5e-3 x')).toEqual(['number:2e5', 'other:+', 'number:1.5e-3', 'word:x']);
    expect(kinds('2edge')).toEqual(['number:2', 'word:edge']);
    expect(kinds('f("a \\" b", \'c\')')).toEqual(['word:f', 'other:(', 'string:"a \\" b"', 'other:,', "string:'c'", 'other:)']);
    expect(kinds("x' + 1 # note x")).toEqual(['word:x', "other:'", 'other:+', 'number:1', 'comment:# note x']);
    expect(tokenize('"open').at(-1)).toMatchObject({ type: 'string', open: true });
  });

  it('gives the source back, token after token', () => {
    fc.assert(fc.property(fc.string({ maxLength: 60 }), (s) => {
      const tokens = tokenize(s);
      expect(tokens.map((t) => t.text).join('')).toBe(s);
      tokens.forEach((t, i) => expect(t.from).toBe(i === 0 ? 0 : tokens[i - 1].to));
    }), { numRuns: 500 });
  });

  it('finds exactly the symbols the mathjs parser finds', () => {
    fc.assert(fc.property(formulas, (f) => {
      const uses = nameUses(f).filter((u) => !u.call).map((u) => u.name);
      expect(new Set(uses)).toEqual(new Set(symbolNames(parseFormula(f))));
    }), { numRuns: 300 });
  });

  it('points at a name, not at a quoted text spelling it', () => {
    expect(columnOfName('pick(x, "edge") + edge', 'edge')).toBe(19);
    expect(columnOfName('"edge"', 'edge')).toBeUndefined();
  });

  it('has one pattern for cell names', () => {
    expect(['fc', 'phi_Vc', '_x', 'M2'].every(isName)).toBe(true);
    expect(['2x', 'a-b', '', 'é', 'a b'].some(isName)).toBe(false);
  });
});
