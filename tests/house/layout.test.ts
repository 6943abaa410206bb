// The house rules a reviewer checks by hand, checked here: no source file over 400
// lines, no import cycle among the project's files (type-only imports included), and
// every cell kind of the Cell union described once (runtime/kinds/).

import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { CalcDocument } from '../../runtime/document';
import { emptyMeta } from '../../runtime/document';
import { blankCell } from '../../runtime/edit/index';
import { parse, serialize } from '../../runtime/format/index';
import { KIND_WORDS, describe as describeKind } from '../../runtime/kinds/index';
import { importCycles, importGraph, sourceFiles } from './imports';

const root = process.cwd();

describe('the layout of the code', () => {
  it('has no source file over 400 lines', () => {
    const long = sourceFiles(root)
      .map((f) => ({ f, lines: readFileSync(f, 'utf8').split('\n').length - 1 }))
      .filter(({ lines }) => lines > 400);
    expect(long).toEqual([]);
  });

  it('has no import cycle, type-only imports included', () => {
    expect(importGraph(root).size).toBeGreaterThan(200);
    expect(importCycles(root)).toEqual([]);
  });

  it('finds a cycle when there is one (the checker itself)', () => {
    // A made-up graph: three files in a ring, and one that only imports into it.
    const graph = new Map([['a.ts', ['b.ts']], ['b.ts', ['c.ts']], ['c.ts', ['a.ts']], ['d.ts', ['a.ts']]]);
    expect(importCycles(root, graph)).toEqual([['a.ts', 'b.ts', 'c.ts']]);
  });
});

describe('every cell kind is described once', () => {
  it('each description belongs to its kind and makes a blank cell that reads back from the text format', () => {
    for (const kind of KIND_WORDS) {
      const d = describeKind(kind);
      expect(d.kind).toBe(kind);
      if (!d.blank) continue; // a kind a person does not add
      const doc: CalcDocument = { meta: emptyMeta(), cells: [] };
      const blank = blankCell(doc, kind);
      expect(blank.kind).toBe(kind);
      expect(blank.id.startsWith(d.stem)).toBe(true);
      const round = parse(serialize({ ...doc, cells: [blank] }));
      expect(round.errors).toEqual([]);
      expect(round.doc.cells).toEqual([blank]);
    }
  });

  it('no two kinds share an id stem', () => {
    const stems = KIND_WORDS.map((k) => describeKind(k).stem);
    expect(new Set(stems).size).toBe(stems.length);
  });
});
