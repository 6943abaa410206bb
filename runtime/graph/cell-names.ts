// What a cell's source can see of the others by name: the scope its formula compiles
// in (whose value of which type, an upstream error if the named cell has one), the
// display unit of a named cell (for checks and figure labels), what a sweep needs of
// the cells it varies and plots, and how a message names a cell.

import { cellName, type Cell } from '../document';
import { CellError } from '../formula/cell-error';
import type { CompileScope, NameInfo } from '../formula/compile';
import { isSymbol, unbracket, type MathNode } from '../formula/nodes';
import { columnOf } from '../formula/parse';
import type { LibFunction } from '../library/types';
import type { CellProgram } from './cell-program';
import type { SweepCellInfo } from './what-if';

/** The cells that own each name, in document order (more than one is an error the engine reports). */
export function nameOwners(cells: readonly Cell[], has: (id: string) => boolean): Map<string, string[]> {
  const owners = new Map<string, string[]>();
  for (const cell of cells) {
    const name = cellName(cell);
    if (!name || !has(cell.id)) continue;
    const list = owners.get(name);
    if (list) {
      if (!list.includes(cell.id)) list.push(cell.id);
    } else owners.set(name, [cell.id]);
  }
  return owners;
}

/** What the names need of a computing cell. */
export interface NamedSlot {
  cell: Cell;
  program?: CellProgram;
}

export class CellNames {
  constructor(
    /** name → ids of the cells of that name (more than one is an error at each). */
    private readonly owners: () => ReadonlyMap<string, string[]>,
    private readonly slot: (id: string) => NamedSlot | undefined,
    private readonly cells: () => readonly Cell[],
  ) {}

  /** A cell as a message names it: its place in the sheet, and its label. */
  describe(id: string): string {
    const cells = this.cells();
    const i = cells.findIndex((c) => c.id === id);
    return cells[i]?.label ? `cell ${i + 1} (${cells[i].label})` : `cell ${i + 1}`;
  }

  private only(name: string): NamedSlot | undefined {
    const owners = this.owners().get(name);
    return owners?.length === 1 ? this.slot(owners[0]) : undefined;
  }

  /** The scope a formula in `source` compiles in. */
  scopeFor(source: string, functions: ReadonlyMap<string, LibFunction<unknown>>): CompileScope {
    return {
      functions,
      isCell: (name) => this.owners().has(name),
      names: () => this.owners().keys(),
      describe: (name) => {
        const owner = this.owners().get(name)?.[0];
        const cell = owner ? this.slot(owner)?.cell : undefined;
        return cell && `${name} (the ${cell.kind}${cell.label ? ` "${cell.label.length > 60 ? `${cell.label.slice(0, 60)}…` : cell.label}"` : ''})`;
      },
      lookup: (name): NameInfo | undefined => {
        const owners = this.owners().get(name);
        if (!owners) return undefined;
        const slot = this.slot(owners[0])!;
        const type = slot.program?.type;
        if (!type || owners.length > 1) {
          throw new CellError('upstream', `reads ${name}, which has an error`, columnOf(source, name), name);
        }
        return { key: slot.cell.id, type, unwrap: slot.program?.unwrap };
      },
    };
  }

  /** Display unit of the cell of this name ('' when none or unknown). */
  unitOfName(name: string): string {
    const owner = this.owners().get(name)?.[0];
    return owner ? this.slot(owner)?.program?.unit ?? '' : '';
  }

  /** Display unit for one side of a check (a mathjs node): the unit of the cell it names, if it is a bare name. */
  unitOfNode(node: MathNode): string {
    const n = unbracket(node);
    return isSymbol(n) ? this.unitOfName(n.name) : '';
  }

  /** What a sweep needs of a cell it names (none when the name is missing or taken twice). */
  sweepInfo(name: string): SweepCellInfo | undefined {
    const slot = this.only(name);
    return slot && { id: slot.cell.id, kind: slot.cell.kind, program: slot.program };
  }
}
