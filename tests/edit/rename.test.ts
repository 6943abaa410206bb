// Renaming a cell rewrites the formulas that read it, and nothing else: never a
// quoted text (a choice like "edge" given to a library function), never a function
// name, never part of a number.

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { CalcDocument } from '../../runtime/document';
import { emptyMeta } from '../../runtime/document';
import { renameCell, renameInExpr } from '../../runtime/edit/index';
import { createEngine } from '../../runtime/engine';
import { tokenize } from '../../runtime/formula/tokens';
import { libraryFunctions } from '../../runtime/library/index';
import { formulas, NAMES, pick } from './formulas';

describe('rename', () => {
  it('leaves a quoted text that spells the old name as it is', () => {
    // The defect: renaming `edge` turned the position "edge" into "edge_dist".
    const doc: CalcDocument = {
      meta: emptyMeta(),
      cells: [
        { id: 'i1', kind: 'input', name: 'c1', value: '16 in' },
        { id: 'i2', kind: 'input', name: 'd', value: '7 in' },
        { id: 'i3', kind: 'input', name: 'edge', value: '2 ft' },
        { id: 'f1', kind: 'formula', name: 'bo', expr: 'bo_punch(c1, c1, d, "edge") + 0 * edge', unit: 'in' },
      ],
    };
    const renamed = renameCell(doc, 'i3', 'edge_dist');
    expect(renamed.cells[3]).toMatchObject({ expr: 'bo_punch(c1, c1, d, "edge") + 0 * edge_dist' });
  });

  it('rewrites names only: not in single-quoted texts, comments, function names or numbers', () => {
    expect(renameInExpr("f(x) + x + 'x' + \"a x\" # x", 'x', 'y')).toBe("f(y) + y + 'x' + \"a x\" # x");
  });

  it('keeps a name written against a number a name of its own', async () => {
    // `2L` reads the cell L (a cell shadows the litre); renamed to e5 it must not become the number 2e5.
    expect(renameInExpr('2L + L', 'L', 'e5')).toBe('2 e5 + e5');
    const doc: CalcDocument = {
      meta: emptyMeta(),
      cells: [
        { id: 'i1', kind: 'input', name: 'L', value: '3' },
        { id: 'f1', kind: 'formula', name: 'y', expr: '2L + 1' },
      ],
    };
    const values = async (d: CalcDocument) => {
      const engine = createEngine(d, { functions: libraryFunctions });
      await engine.settled();
      const out = d.cells.map((c) => engine.state(c.id)?.value);
      engine.dispose();
      return out;
    };
    expect(await values(doc)).toEqual([3, 7]);
    expect(await values(renameCell(doc, 'i1', 'e5'))).toEqual([3, 7]);
  });
});

describe('rename, for any formula', () => {
  const texts = (expr: string) => tokenize(expr).filter((t) => t.type === 'string' || t.type === 'comment').map((t) => t.text);
  const renames = fc.tuple(fc.constantFrom(...NAMES), fc.constantFrom('edge_dist', 'e5', 'L2', 'x_1'));

  it('never changes a quoted text or a comment', () => {
    fc.assert(fc.property(formulas, renames, (f, [from, to]) => {
      expect(texts(renameInExpr(f, from, to))).toEqual(texts(f));
    }), { numRuns: 500 });
  });

  it('gives a document that computes the same values', async () => {
    const values = async (d: CalcDocument) => {
      const engine = createEngine(d, { functions: [pick] });
      await engine.settled();
      const out = d.cells.map((c) => engine.state(c.id)?.error?.message ?? engine.state(c.id)?.value);
      engine.dispose();
      return out;
    };
    await fc.assert(fc.asyncProperty(fc.array(formulas, { minLength: 1, maxLength: 3 }), renames, async (exprs, [from, to]) => {
      const doc: CalcDocument = {
        meta: emptyMeta(),
        cells: [
          ...NAMES.map((n, i) => ({ id: `i${i}`, kind: 'input' as const, name: n, value: String(i + 2) })),
          ...exprs.map((expr, i) => ({ id: `f${i}`, kind: 'formula' as const, name: `y${i}`, expr })),
        ],
      };
      const before = await values(doc);
      // A drawn formula may divide by zero (a / (edge - pick(a, "a")) with edge = 4 = pick's 2 × 2):
      // such a draw says nothing about rename, so it is set aside and another drawn.
      fc.pre(before.every((v) => typeof v === 'number'));
      const renamed = renameCell(doc, `i${NAMES.indexOf(from)}`, to);
      expect(await values(renamed)).toEqual(before);
    }), { numRuns: 150 });
  });
});
