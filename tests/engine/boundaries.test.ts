import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { math } from '../../runtime/units/math';

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const p = join(dir, f);
    return statSync(p).isDirectory() ? files(p) : p.endsWith('.ts') && !p.endsWith('.d.ts') ? [p] : [];
  });
}

describe('the engine stays free of the DOM', () => {
  const sources = files('runtime').map((f) => ({ f, text: readFileSync(f, 'utf8').replace(/\/\/.*$/gm, '').replace(/\/\*[\s\S]*?\*\//g, '') }));
  it('has sources to check', () => expect(sources.length).toBeGreaterThan(30));
  it.each(['document', 'window', 'localStorage', 'indexedDB', 'HTMLElement', 'navigator'])('no file under runtime/ uses %s', (word) => {
    const re = new RegExp(`(?<![.\\w'"-])${word}\\s*[.\\[(]`);
    const hits = sources.filter(({ text }) => re.test(text)).map(({ f }) => f);
    expect(hits).toEqual([]);
  });
  it('no file under runtime/ imports from cells/', () => {
    const hits = sources.filter(({ text }) => /from\s+['"](\.\.\/)+cells\//.test(text)).map(({ f }) => f);
    expect(hits).toEqual([]);
  });
});

describe('the mathjs instance is locked down', () => {
  it.each(['evaluate', 'compile', 'import', 'createUnit', 'simplify', 'derivative', 'resolve', 'config'])('%s refuses', (name) => {
    expect(() => (math as any)[name]('1')).toThrow(/not available/);
  });
  it('parse and units still work for the engine', () => {
    expect(math.parse('a + 1').type).toBe('OperatorNode');
    expect((math.unit('1 kip') as any).value).toBeCloseTo(4448.2216152605, 9);
  });
});
