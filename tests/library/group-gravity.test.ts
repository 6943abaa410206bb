import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { gravityFunctions } from '../../runtime/library/group-gravity';
import { supportFunctions } from '../../runtime/library/group-support';
import { typeFromDeclaration } from '../../runtime/formula/value-type';

const TYPES = new Set(['m', 'm^2', 'm^4', 'Pa', 'N', 'N*m', 'N/m', 'N/m^2', 'N/m^3', 'kg/m', '1', 'text', 'bool']);

const FILES = ['gravity-args', 'loads-combinations', 'loads-tributary', 'loads-reduction', 'loads-accumulation',
  'concrete', 'rebar', 'reinforcement-limits', 'resistance-factors', 'slab-action', 'slab-thickness',
  'slab-self-weight', 'slab-ddm', 'flexure', 'slab-ribbed', 'group-gravity'];

describe('gravity group: the entries the engine reads', () => {
  it('names are unique lower_snake trade symbols, and do not clash with the support group', () => {
    const names = gravityFunctions.map((f) => f.name);
    expect(new Set(names).size).toBe(names.length);
    for (const n of names) expect(n).toMatch(/^[a-z][a-z0-9_]*$/);
    const support = new Set(supportFunctions.map((f) => f.name));
    expect(names.filter((n) => support.has(n))).toEqual([]);
  });

  it.each(gravityFunctions.map((f) => [f.name, f] as const))('%s: params, optional count and fn arity agree', (_n, f) => {
    const optional = f.optional ?? 0;
    expect(optional).toBeGreaterThanOrEqual(0);
    expect(optional).toBeLessThanOrEqual(f.params.length);
    // fn.length counts parameters up to the first one with a default value
    expect([f.params.length, f.params.length - optional]).toContain(f.fn.length);
    const pnames = f.params.map((p) => p.name);
    expect(new Set(pnames).size).toBe(pnames.length);
  });

  it.each(gravityFunctions.map((f) => [f.name, f] as const))('%s: types are known to the engine, texts list their choices', (_n, f) => {
    for (const t of [...f.params.map((p) => p.type), f.returns]) {
      expect(TYPES.has(t)).toBe(true);
      expect(() => typeFromDeclaration(t)).not.toThrow();
    }
    for (const p of f.params) {
      if (p.type === 'text') expect(p.choices?.length ?? 0).toBeGreaterThan(0);
      expect(p.doc ?? '').not.toBe('');
    }
    expect(f.clause.length).toBeGreaterThan(5);
    expect(f.doc.length).toBeGreaterThan(5);
  });
});

describe('gravity library sources stay DOM-free', () => {
  it.each(FILES)('%s.ts', (file) => {
    const path = fileURLToPath(new URL(`../../runtime/library/${file}.ts`, import.meta.url));
    const src = readFileSync(path, 'utf8');
    expect(src).not.toMatch(/\b(document|window|HTMLElement|localStorage|navigator)\b\s*[.[]/);
    expect(src).not.toMatch(/from\s+['"][^'"]*cells\//);
    expect(src.split('\n').length).toBeLessThan(400);
  });
});
