// Comparing document versions and reading what a cell mentions: the cheap
// questions the engine asks on every update before it recompiles anything.

import type { Cell } from '../document';
import { describe } from '../kinds/index';
import type { CellProgram } from './cell-program';

/** Indexes of cells that are new objects, when no cell was added, removed or moved. */
export function samePlaces(prev: readonly Cell[], next: readonly Cell[]): number[] | undefined {
  if (prev.length !== next.length) return undefined;
  const out: number[] = [];
  for (let i = 0; i < next.length; i++) {
    if (prev[i] === next[i]) continue;
    if (prev[i].id !== next[i].id) return undefined;
    out.push(i);
  }
  return out;
}

/** Names the cell's source mentions (cells or not), as its kind reads them. */
export function refsOf(cell: Cell): string[] {
  return describe(cell.kind).refs(cell);
}

export function sameCell(a: Cell, b: Cell): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}

/** An input or a table whose values (not its name or kind) changed cannot change the graph's shape. */
export function isInputValueOnly(a: Cell, b: Cell): boolean {
  return (a.kind === 'input' || a.kind === 'table') && b.kind === a.kind && a.name === b.name;
}

export function sameTypeOrBoth(a: CellProgram['type'], b: CellProgram['type']): boolean {
  if (!a || !b) return a === b;
  if (a.t !== b.t) return false;
  return a.t !== 'num' || String(a.dims) === String((b as { dims: readonly number[] }).dims);
}
