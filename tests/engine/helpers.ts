// Small builders for engine tests.
import type { CalcDocument, Cell } from '../../runtime/document';
import { emptyMeta } from '../../runtime/document';
import { createEngine } from '../../runtime/engine';
import type { LibFunction } from '../../runtime/library/types';

let n = 0;
export function input(name: string, value: string, extra: Partial<Cell> = {}): Cell {
  return { kind: 'input', id: `i${++n}`, name, value, ...extra } as Cell;
}
export function formula(name: string, expr: string, unit?: string, extra: Partial<Cell> = {}): Cell {
  return { kind: 'formula', id: `f${++n}`, name, expr, ...(unit !== undefined ? { unit } : {}), ...extra } as Cell;
}
export function check(expr: string, extra: Partial<Cell> = {}): Cell {
  return { kind: 'check', id: `k${++n}`, expr, ...extra } as Cell;
}
export function doc(...cells: Cell[]): CalcDocument {
  return { meta: emptyMeta(), cells };
}

export async function run(d: CalcDocument, functions?: LibFunction[]) {
  const engine = createEngine(d, functions ? { functions } : {});
  await engine.settled();
  const byName = (name: string) => {
    const cell = engine.doc.cells.find((c) => 'name' in c && c.name === name);
    if (!cell) throw new Error(`no cell ${name}`);
    return engine.state(cell.id)!;
  };
  return { engine, byName, state: (c: Cell) => engine.state(c.id)! };
}
