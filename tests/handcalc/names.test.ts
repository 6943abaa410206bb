// Names typeset our own way, consistently: trade symbols from one table, plain rules for the
// rest. The symbols are those of ACI 318-19 Ch. 2 (Notation: f′c, φVc, λs, ℓn, bo) and ASCE
// 7-22 §4.7 (KLL, AT, L/Lo); the trade writes plain words upright (common practice).
import { describe, expect, it } from 'vitest';
import { readFileSync, readdirSync } from 'node:fs';
import katex from 'katex';
import { nameTex } from '../../runtime/handcalc/names';
import { formulaTex } from '../../runtime/handcalc/formula';
import { parse } from '../../runtime/format/index';
import { cellName } from '../../runtime/document';

const mathml = (tex: string) => katex.renderToString(tex, { output: 'mathml', throwOnError: true, strict: 'ignore' });

describe('trade symbols', () => {
  it("writes f'c with the prime on the f, as ACI 318-19 Ch. 2 does, and carries later parts into its subscript", () => {
    expect(nameTex('fc')).toBe("{f'_{\\mathrm{c}}}");
    expect(nameTex('fc_col')).toBe("{f'_{\\mathrm{c},\\text{col}}}");
    // The prime is one glyph of the symbol: KaTeX sets it in the same msubsup as f and c.
    expect(mathml(nameTex('fc'))).toMatch(/<msubsup><mi>f<\/mi><mi mathvariant="normal">c<\/mi><mo[^>]*>′<\/mo><\/msubsup>/);
  });

  it('writes φVc, λs and εt from run-together and short names', () => {
    expect(nameTex('phiVc')).toBe('{\\phi V_{\\mathrm{c}}}');
    expect(nameTex('phi_Vc')).toBe('{\\phi V_{\\mathrm{c}}}');
    expect(nameTex('lam_s')).toBe('{\\lambda_{\\mathrm{s}}}');
    expect(nameTex('lambda_s')).toBe('{\\lambda_{\\mathrm{s}}}');
    expect(nameTex('eps_t')).toBe('{\\varepsilon_{\\mathrm{t}}}');
  });

  it('writes spans with ℓ and the live load names of ASCE 7-22 §4.7', () => {
    expect(nameTex('ln')).toBe('{\\ell_{\\mathrm{n}}}');
    expect(nameTex('l2')).toBe('{\\ell_{2}}');
    expect(nameTex('KLL')).toBe('{K_{\\text{LL}}}');
    expect(nameTex('L_Lo')).toBe('{L/L_{\\mathrm{o}}}');
    expect(nameTex('sqrt_fc')).toBe("{\\sqrt{f'_{\\mathrm{c}}}}");
  });

  it('no rule turns a word of the name into a prime', () => {
    expect(nameTex('f_c_prime')).toBe('{f_{\\mathrm{c},\\text{prime}}}');
    expect(nameTex('d_prime')).not.toContain("'");
  });
});

describe('plain words stay words', () => {
  it('bar, floors and chk are upright words, not a letter with a subscript', () => {
    expect(nameTex('bar')).toBe('{\\text{bar}}');
    expect(nameTex('floors')).toBe('{\\text{floors}}');
    expect(nameTex('chk_w')).toBe('{\\text{chk}_{\\mathrm{w}}}');
    expect(nameTex('tension_controlled')).toBe('{\\text{tension controlled}}');
  });

  it('a function name in a formula is upright text, one element', () => {
    const t = formulaTex('vc', 'vc_punch(fc, c1, c2, d, "interior")', undefined, { isCell: () => true, state: () => undefined });
    expect(t.symbolic).toContain('\\operatorname{vc\\_punch}');
    expect(mathml(t.symbolic!)).toContain('<mi mathvariant="normal">vc_punch</mi>');
  });

  it('no cell name of any template prints as a row of single letters (a letter-spaced word)', () => {
    const dir = new URL('../../docs-templates/', import.meta.url);
    const names = new Set<string>();
    for (const f of readdirSync(dir)) {
      for (const c of parse(readFileSync(new URL(f, dir), 'utf8')).doc.cells) {
        const n = cellName(c);
        if (n) names.add(n);
      }
    }
    expect(names.size).toBeGreaterThan(100);
    for (const n of names) {
      // Two Latin letters each in its own <mi>, side by side (not a base and its subscript), is a word set as letters.
      expect(mathml(nameTex(n)), n).not.toMatch(/(?<!<msub>|<msubsup>)<mi(?: mathvariant="[a-z]+")?>[A-Za-z]<\/mi><mi(?: mathvariant="[a-z]+")?>[A-Za-z]<\/mi>/);
    }
  });
});
