// Every renderer of text a document carries is linear: hostile note Markdown (unclosed
// links, brackets, stars, backticks) at 100 KB and 1 MB renders well inside the suite's
// 2 s hang guard (an outcome threshold, not a speed target: before the fix, 400 KB of
// "[a](" took 50 s in the app's renderer and 100 KB took 4.8 s in the record's).
import { describe, expect, it } from 'vitest';
import { liveMarkdown, recordMarkdown } from '../../runtime/kinds/note';
import { HANG_MS, timed } from './figures';

const PATTERNS = ['[a](', '[', '](', '*a', '**a*', '`', '$', '[a](b ', '[**a', '*', '_', '<a href="javascript:alert(1)">', '1. [a](', '- *'];
const SIZES = [100_000, 1_000_000];

describe.each([
  ['the app', liveMarkdown],
  ['the record', recordMarkdown],
] as const)('%s renders hostile note Markdown in linear time', (_where, render) => {
  for (const size of SIZES) {
    it.each(PATTERNS)(`"%s" repeated to ${size / 1000} KB`, (pattern) => {
      const text = pattern.repeat(Math.ceil(size / pattern.length));
      const { ms, value } = timed(`markdown ${_where} ${JSON.stringify(pattern)} ${size}`, () => render(text));
      expect(ms).toBeLessThan(HANG_MS);
      expect(value).not.toMatch(/<a href="javascript/i);
      expect(value).not.toMatch(/<script/i);
    });
  }
});
