// What the engine offers a kind's program while it compiles a cell: the scope its
// formula sees, display units of named cells, the sheet's unit system, what a sweep
// needs of the cells it names, and the cell's previous program.

import type { Cell } from '../document';
import type { CompileScope } from '../formula/compile';
import type { MathNode } from '../formula/nodes';
import type { LibFunction } from '../library/types';
import type { UnitSystem } from '../units/systems';
import type { CellProgram } from './cell-program';
import type { SweepCellInfo, WhatIfGraph } from './what-if';

export interface ProgramEnv {
  /** The scope a formula in `source` compiles in: the library, and with `figures` the figure functions too. */
  scope(source: string, figures?: boolean): CompileScope;
  /** The library, for a formula's faults of its own. */
  functions: ReadonlyMap<string, LibFunction<unknown>>;
  /** Display unit of the cell a (mathjs) node names, if it is a bare name; '' otherwise. */
  unitOfNode(node: MathNode): string;
  /** Display unit of the cell of this name ('' when none). */
  unitOfName(name: string): string;
  /** The sheet's unit system (the vote of its display units). */
  system: UnitSystem;
  /** What a sweep needs of a cell it names. */
  sweepInfo(name: string): SweepCellInfo | undefined;
  /** The compiled programs, for evaluating what-if points. */
  whatIf: WhatIfGraph;
  /** The cells of the sheet, in order (a run finds its trace's sections in them). */
  cells(): readonly Cell[];
  /** The cell's program before this compile (an input keeps computing with its last good value). */
  previous?: CellProgram;
}
