// The source editor's highlighting and completion read a formula with the engine's
// tokenizer: a quoted text is marked as a text and nothing in it is completed.

import { describe, expect, it } from 'vitest';
import { completionPlace, sourceMarks } from '../../cells/source-marks';

const words = { names: new Set(['c1', 'd', 'edge']), functions: new Set(['bo_punch', 'max']), units: new Set(['in']) };
const marked = (text: string, mode: 'formula' | 'note' = 'formula') =>
  sourceMarks(text, mode, words).map((m) => `${m.cls.replace('cm-lt-', '')}:${text.slice(m.from, m.to)}`);

describe('source marks', () => {
  it('marks a quoted text as a text, even when it spells a cell name', () => {
    expect(marked('bo_punch(c1, c1, d, "edge") + 2 in + edge')).toEqual([
      'fn:bo_punch', 'name:c1', 'name:c1', 'name:d', 'str:"edge"', 'num:2', 'unit:in', 'name:edge',
    ]);
  });

  it('marks only the math of a note, offset to its place', () => {
    expect(marked('At $d = 2 in$ from "edge"', 'note')).toEqual(['mathmark:$', 'name:d', 'num:2', 'unit:in', 'mathmark:$']);
  });

  it('completes names but not inside a quoted text, a comment or a note\'s words', () => {
    expect(completionPlace('bo_punch(c1, c1, d, ', 'formula')).toEqual({ complete: true, afterNumber: false });
    expect(completionPlace('bo_punch(c1, c1, d, "', 'formula').complete).toBe(false);
    expect(completionPlace("2 + '", 'formula').complete).toBe(false);
    expect(completionPlace('d # then ', 'formula').complete).toBe(false);
    expect(completionPlace('12 ', 'formula')).toEqual({ complete: true, afterNumber: true });
    expect(completionPlace('With ', 'note').complete).toBe(false);
    expect(completionPlace('With $2 ', 'note')).toEqual({ complete: true, afterNumber: true });
  });
});
