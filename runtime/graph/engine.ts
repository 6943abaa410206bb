// The calc engine: one @observablehq/runtime variable per cell that computes,
// keyed by cell id. `update(doc)` diffs the new document against the running one
// and redefines only what changed; the runtime then recomputes only what depends
// on it. Observers turn values and errors into CellStates for the view.

import { Runtime, RuntimeError, type Module, type Variable } from '@observablehq/runtime';
import type { CalcDocument, Cell } from '../document';
import { cellName } from '../document';
import type { CellState, Engine, WhatIfOutcome } from '../engine-types';
import { CellError } from '../formula/cell-error';
import { nameProblem } from '../formula/names';
import { describe } from '../kinds/index';
import { loopMessages } from './cycles';
import { ReadersIndex } from './readers';
import { Notifier } from './notifier';
import { isInputValueOnly, refsOf, sameCell, samePlaces, sameTypeOrBoth } from './doc-diff';
import { cellSystem, sheetSystem, type UnitSystem } from '../units/systems';
import type { LibFunction } from '../library/types';
import { BUILTINS } from '../formula/builtins';
import { failing, type CellProgram } from './cell-program';
import { buildState, sameState } from './cell-state';
import type { ProgramEnv } from './program-env';
// The figure functions, which only figure cells may call, and the what-if evaluator.
import { figureLibrary } from '../figures/functions';
import { whatIfRun, type WhatIfGraph } from './what-if';
import { Pacer } from './pacer';
import { computeAfterThisTask } from './scheduling';
import { CellNames, nameOwners } from './cell-names';
import { upstreamFirst } from './upstream-first';
import { traceStateLookup } from './trace-states';
// The working of a cell's library calls, asked for by the view (runtime/working).
import { captureCalls, type LibraryCall } from '../working/calls';

export interface EngineOptions {
  functions?: readonly LibFunction[];
}

interface Slot {
  cell: Cell;
  /** Names the cell's source mentions (cells or not), for the dependency graph. */
  refs: string[];
  program?: CellProgram;
  variable?: Variable;
  observer?: { dead: boolean };
  state: CellState;
}

// The runtime must never see host globals: any name it cannot resolve is an error.
const strictGlobal = (name: string) => {
  throw new CellError('unknown-name', `"${name}" is not the name of any cell`);
};

class DocEngine implements Engine {
  doc: CalcDocument;
  /** Splits a long recompute into slices of tasks (see pacer.ts). */
  private readonly pacer = new Pacer();
  private readonly runtime = computeAfterThisTask(new Runtime({}, strictGlobal), this.pacer);
  private readonly module: Module = this.runtime.module();
  private readonly slots = new Map<string, Slot>();
  private owners = new Map<string, string[]>();
  /** What each source sees of the other cells by name (see cell-names.ts). */
  private readonly names = new CellNames(() => this.owners, (id) => this.slots.get(id), () => this.doc.cells);
  private readonly functions: ReadonlyMap<string, LibFunction>;
  private readonly functionNames: ReadonlySet<string>;
  /** The library plus the figure functions, which only figure cells may call. */
  private readonly figureFunctions: ReadonlyMap<string, LibFunction<unknown>>;
  private readonly notifier = new Notifier((changed) => this.addReaders(changed));
  private cycleMembers = new Map<string, string>();
  /** name → ids of the cells whose source mentions it. */
  private readonly readers = new ReadersIndex();
  /** The sheet's unit system (the vote of its display units), and whether an edit may have changed it. */
  private system: UnitSystem | undefined;
  private systemStale = false;
  private disposed = false;

  constructor(doc: CalcDocument, options: EngineOptions) {
    const fns = options.functions ?? [];
    this.functions = new Map(fns.map((f) => [f.name, f]));
    this.figureFunctions = new Map<string, LibFunction<unknown>>([...this.functions, ...figureLibrary.map((f) => [f.name, f] as const)]);
    this.functionNames = new Set([...BUILTINS.keys(), ...this.figureFunctions.keys()]);
    this.doc = { meta: doc.meta, cells: [] };
    this.update(doc);
  }

  state(id: string): CellState | undefined {
    return this.slots.get(id)?.state;
  }

  subscribe(listener: (changed: string[]) => void): () => void {
    return this.notifier.subscribe(listener);
  }

  settled(): Promise<void> {
    return this.notifier.settled();
  }

  dispose(): void {
    if (this.disposed) return;
    this.disposed = true;
    for (const slot of this.slots.values()) this.dropVariable(slot);
    this.slots.clear();
    this.runtime.dispose();
    this.notifier.close();
  }

  update(doc: CalcDocument): void {
    if (this.disposed) throw new Error('this engine has been disposed');
    const prev = this.doc.cells;
    this.doc = doc;
    const dirty = new Set<string>();
    let structural = false;

    // Pure edits keep unchanged cells as the same objects: compare pointers first, so
    // an edit costs what it touches, not the size of the document.
    const touched = samePlaces(prev, doc.cells);
    if (touched) {
      for (const i of touched) {
        const cell = doc.cells[i];
        const slot = this.slots.get(cell.id)!;
        if (sameCell(slot.cell, cell)) {
          slot.cell = cell;
          continue;
        }
        structural = this.replaceCell(slot, cell) || structural;
        dirty.add(cell.id);
      }
      this.finishUpdate(dirty, structural);
      return;
    }

    const seen = new Set<string>();
    for (const cell of doc.cells) {
      if (seen.has(cell.id)) continue; // a repeated id is ignored: ids are the format's job
      seen.add(cell.id);
      const slot = this.slots.get(cell.id);
      if (!slot) {
        const slot = this.newSlot(cell);
        this.slots.set(cell.id, slot);
        this.readers.add(slot.cell.id, slot.refs);
        dirty.add(cell.id);
        structural = true;
        continue;
      }
      if (slot.cell === cell || sameCell(slot.cell, cell)) {
        slot.cell = cell;
        continue;
      }
      structural = this.replaceCell(slot, cell) || structural;
      dirty.add(cell.id);
    }
    for (const [id, slot] of this.slots) {
      if (seen.has(id)) continue;
      this.dropVariable(slot);
      this.readers.remove(slot.cell.id, slot.refs);
      this.slots.delete(id);
      this.notifier.markChanged(id);
      structural = true;
    }
    this.finishUpdate(dirty, structural);
  }

  /** Puts a changed cell in its slot; true when the change can alter the graph's shape. */
  private replaceCell(slot: Slot, cell: Cell): boolean {
    const before = slot.cell;
    slot.cell = cell;
    if (cellSystem(before) !== cellSystem(cell)) this.systemStale = true;
    const refs = refsOf(cell);
    if (String(refs) !== String(slot.refs)) {
      this.readers.remove(slot.cell.id, slot.refs);
      slot.refs = refs;
      this.readers.add(slot.cell.id, slot.refs);
    }
    return before.kind !== cell.kind || cellName(before) !== cellName(cell) || !isInputValueOnly(before, cell);
  }

  private finishUpdate(dirty: Set<string>, structural: boolean): void {
    const affected = new Set(dirty);
    if (structural) {
      const before = this.owners;
      this.owners = nameOwners(this.doc.cells, (id) => this.slots.has(id));
      const namesChanged = new Set<string>();
      for (const n of new Set([...before.keys(), ...this.owners.keys()])) {
        if (String(before.get(n)) !== String(this.owners.get(n))) namesChanged.add(n);
      }
      for (const n of namesChanged) for (const id of this.readers.of(n)) affected.add(id);
      for (const n of namesChanged) for (const id of this.owners.get(n) ?? []) affected.add(id);
      for (const id of this.updateCycles()) affected.add(id);
      for (const slot of this.slots.values()) if (describe(slot.cell.kind).program?.followsSheet) affected.add(slot.cell.id);
    }
    if (structural || this.systemStale) {
      this.systemStale = false;
      const system = sheetSystem(this.doc);
      if (system !== this.system) {
        this.system = system;
        // Checks and figures with no named cell to take a unit from show theirs in the sheet's system.
        for (const slot of this.slots.values()) if (describe(slot.cell.kind).program?.followsUnits) affected.add(slot.cell.id);
      }
    }
    this.recompile(affected);
    this.notifier.queue();
  }

  // ---- compiling -------------------------------------------------------

  private newSlot(cell: Cell): Slot {
    return {
      cell,
      refs: refsOf(cell),
      state: { id: cell.id, status: describe(cell.kind).program ? 'pending' : 'ok', clauses: [], reads: [] },
    };
  }

  /** Finds loops; returns the cells whose membership in a loop changed. */
  private updateCycles(): string[] {
    const edges = (id: string) => {
      const out: string[] = [];
      for (const r of this.slots.get(id)?.refs ?? []) for (const o of this.owners.get(r) ?? []) out.push(o);
      return out;
    };
    const next = loopMessages([...this.slots.keys()], edges, (id) => cellName(this.slots.get(id)!.cell) ?? id);
    const changed: string[] = [];
    for (const id of new Set([...next.keys(), ...this.cycleMembers.keys()])) {
      if (next.get(id) !== this.cycleMembers.get(id)) changed.push(id);
    }
    this.cycleMembers = next;
    return changed;
  }

  /** Compiles the affected cells, upstream first, then any reader whose input type changed. */
  private recompile(affected: Set<string>): void {
    const done = new Set<string>();
    const queue = [...affected];
    const { slots, owners } = this;
    // Lazy, so a cell added to `affected` meanwhile is still waited for.
    const upstream = function* (id: string) {
      for (const r of slots.get(id)?.refs ?? []) for (const up of owners.get(r) ?? []) if (affected.has(up)) yield up;
    };
    const compile = (id: string) => {
      const slot = this.slots.get(id);
      if (!slot) return;
      const before = slot.program?.type;
      const unitBefore = slot.program?.unit;
      this.compileSlot(slot);
      const after = slot.program?.type;
      const typeChanged = !sameTypeOrBoth(before, after);
      // Checks (demand, capacity) and figures (their labels) show the unit of a cell they name: a new display unit there is news to them.
      if (typeChanged || unitBefore !== slot.program?.unit) {
        const name = cellName(slot.cell);
        if (name) for (const id of this.readers.of(name)) {
          const reader = this.slots.get(id)?.cell;
          if (!done.has(id) && (typeChanged || (reader && describe(reader.kind).program?.followsUnits))) {
            affected.add(id);
            queue.push(id);
          }
        }
      }
    };
    upstreamFirst(queue, upstream, compile, done);
  }

  private compileSlot(slot: Slot): void {
    const cell = slot.cell;
    this.notifier.markChanged(cell.id);
    if (!describe(cell.kind).program) {
      slot.state = { id: cell.id, status: 'ok', clauses: [], reads: [] };
      return;
    }
    const program = this.program(slot);
    slot.program = program;
    this.define(slot, program);
  }

  private program(slot: Slot): CellProgram {
    const cell = slot.cell;
    const name = cellName(cell);
    const fail = (e: CellError): CellProgram => failing(e);
    if (name !== undefined) {
      const problem = nameProblem(name, this.functionNames);
      if (problem) return fail(new CellError('syntax', problem));
      const owners = this.owners.get(name) ?? [];
      if (owners.length > 1) {
        const others = owners.filter((o) => o !== cell.id).map((o) => this.names.describe(o));
        return fail(new CellError('duplicate-name', `the name ${name} is also used by ${others.join(' and ')}; each name must be unique`));
      }
    }
    const spec = describe(cell.kind).program;
    if (!spec) return fail(new CellError('not-allowed', 'this cell does not compute'));
    const env = this.programEnv(slot);
    const loop = this.cycleMembers.get(cell.id);
    // A formula that cannot compile for its own reasons says so before the loop does.
    if (loop) return fail(spec.ownProblem?.(cell, env) ?? new CellError('cycle', `these cells use each other in a loop: ${loop}`));
    return spec.compile(cell, env);
  }

  /** What a kind's program sees of the engine while it compiles a cell. */
  private programEnv(slot: Slot): ProgramEnv {
    const names = this.names;
    return {
      scope: (source, figures) => names.scopeFor(source, figures ? this.figureFunctions : this.functions),
      functions: this.functions, unitOfNode: (n) => names.unitOfNode(n), unitOfName: (n) => names.unitOfName(n),
      system: this.system ?? sheetSystem(this.doc), sweepInfo: (n) => names.sweepInfo(n), whatIf: this.whatIfGraph, previous: slot.program,
      cells: () => this.doc.cells,
    };
  }

  private readonly whatIfGraph: WhatIfGraph = {
    program: (id) => this.slots.get(id)?.program,
    nameOf: (id) => {
      const slot = this.slots.get(id);
      return (slot && cellName(slot.cell)) ?? id;
    },
  };

  whatIf(input: string, values: readonly (number | string | boolean)[], outputs: readonly string[]): Record<string, WhatIfOutcome>[] {
    return whatIfRun(this.whatIfGraph, (n) => this.names.sweepInfo(n), input, values, outputs);
  }

  traceStates(runId: string, row: number) {
    return traceStateLookup(this.slots.get(runId)?.state, row, (id) => this.slots.get(id)?.cell, (id) => this.slots.get(id)?.program, (id) => this.state(id));
  }

  libraryCalls(id: string): LibraryCall[] {
    const slot = this.slots.get(id);
    if (!slot || (slot.cell.kind !== 'formula' && slot.cell.kind !== 'check')) return [];
    return captureCalls(slot.cell.expr, this.names.scopeFor(slot.cell.expr, this.functions), (key) => {
      const s = this.slots.get(key);
      return s?.cell.kind === 'check' ? { value: s.state.value } : s?.state.value;
    });
  }

  // ---- the reactive graph ------------------------------------------------

  private define(slot: Slot, program: CellProgram): void {
    const id = slot.cell.id;
    if (!slot.variable) {
      const observer = this.observer(slot);
      slot.observer = observer;
      slot.variable = this.module.variable(observer);
    }
    this.notifier.busy(slot.cell.id);
    const run = program.definition;
    slot.variable.define(id, program.inputs, (...args: unknown[]) => this.pacer.pace(() => run(...args)));
  }

  private observer(slot: Slot) {
    const handle = { dead: false };
    const settle = (next: CellState) => {
      if (handle.dead || this.disposed) return;
      if (!sameState(slot.state, next)) {
        slot.state = next;
        this.notifier.markChanged(slot.cell.id);
      }
      this.notifier.idle(slot.cell.id);
    };
    return Object.assign(handle, {
      pending: () => {
        if (!handle.dead) this.notifier.busy(slot.cell.id);
      },
      fulfilled: (value: unknown) => settle(buildState(slot.cell, slot.program, { value }, this.settler(slot))),
      rejected: (error: unknown) => settle(buildState(slot.cell, slot.program, { error: this.explain(error) }, this.settler(slot))),
    });
  }

  /** The kind's reading of a computed value into the cell's state. */
  private settler(slot: Slot) {
    return (value: unknown, state: CellState) => describe(slot.cell.kind).program?.settle(slot.cell, slot.program, value, state);
  }

  private explain(error: unknown): CellError {
    if (error instanceof CellError) return error;
    if (error instanceof RuntimeError && error.input) {
      const up = this.slots.get(error.input);
      const name = (up && cellName(up.cell)) ?? error.input;
      return new CellError('upstream', `reads ${name}, which has an error`, undefined, name);
    }
    return new CellError('library', error instanceof Error ? error.message : String(error));
  }

  private dropVariable(slot: Slot): void {
    if (slot.observer) slot.observer.dead = true;
    this.notifier.idle(slot.cell.id);
    slot.variable?.delete();
    slot.variable = undefined;
  }

  /** Readers of a changed cell re-show their substituted values too. */
  private addReaders(changed: Set<string>): void {
    const names = new Set<string>();
    for (const id of changed) {
      const slot = this.slots.get(id);
      const n = slot && cellName(slot.cell);
      if (n) names.add(n);
    }
    for (const n of names) for (const id of this.readers.of(n)) changed.add(id);
  }
}

export function createEngine(doc: CalcDocument, options: EngineOptions = {}): Engine {
  return new DocEngine(doc, options);
}
