// The working of a library function, recorded while it computes. A function that shows
// its working asks `working()` for the recorder at its start and writes each step it takes
// (`w?.step(...)`): the recorder exists only while someone asked for the working of one
// call (workingOf in run.ts), so on the ordinary path `w` is undefined and `w?.step(...)`
// does not even build its arguments. The display reads these records, never a second
// copy of the formula, so it cannot drift from the result.

import type { LibValue } from '../library/types';
import { nameUses } from '../formula/tokens';

/**
 * A value as the working shows it: a number that is a pure ratio, a text or a yes/no, or
 * an SI number with the US customary unit to show it in (`[0.1905, 'in']`; an SI sheet
 * shows the SI counterpart, mm).
 */
export type Shown = LibValue | readonly [number, string];

export interface StepOptions {
  /** Values of names in the expression that are not inputs or earlier steps of the group. */
  vars?: Record<string, Shown>;
  /** The clause for the margin. */
  clause?: string;
  /** Why a branch or a limit applied, in words. */
  note?: string;
  /** This step governs (the least of the candidate strengths, the limit that bit). */
  governs?: boolean;
  /**
   * The expression is written in the units the clause states (psi, in, ft²), not SI: its
   * values are shown, and checked, in those units on any sheet.
   */
  code?: boolean;
}

export interface Step {
  kind: 'step';
  /** The symbol computed, as a name the hand calc typesets (`R_n`, `vc_a`, `lambda_s`). */
  symbol: string;
  /** The expression in the formula language over names; absent for a look-up. */
  expr?: string;
  value: LibValue;
  /** US customary display unit of the value ('' for a pure number, text or yes/no). */
  unit: string;
  /** Every name in `expr` with its value, as it was when the step was taken. */
  vars: Record<string, Shown>;
  /** Names of `expr` the recorder could not find (a slip in the library: a test fails on it). */
  missing?: string[];
  clause?: string;
  note?: string;
  governs?: boolean;
  code?: boolean;
}

/** A call of another library function inside this one: a nested, foldable group. */
export interface Group {
  kind: 'group';
  /** The library function's name (as a formula calls it). */
  fn: string;
  /** Its arguments by name. */
  inputs: { name: string; value: Shown }[];
  entries: Entry[];
  /** Its result and the unit to show it in, once it has returned. */
  value?: LibValue;
  unit?: string;
  clause?: string;
}

/** For a working too long to list: the method followed, with its published reference. */
export interface Method {
  kind: 'method';
  text: string;
  reference: string;
}

/** A figure that belongs to the working: the name of a figure function and its arguments. */
export interface FigureRef {
  kind: 'figure';
  fn: string;
  args: LibValue[];
}

export type Entry = Step | Group | Method | FigureRef;

/** Words of the formula language that are operators or constants, not names. */
const WORDS = new Set(['pi', 'and', 'or', 'not', 'xor', 'mod', 'true', 'false']);

interface Frame {
  group: Group;
  scope: Map<string, Shown>;
  /** The outermost computation writes straight into the root group. */
  inline: boolean;
}

/** The symbol a group's result goes by in the caller's scope: its last step's, else the function's name. */
function resultName(g: Group): string {
  for (let i = g.entries.length - 1; i >= 0; i--) {
    const e = g.entries[i];
    if (e.kind === 'step') return e.symbol;
    if (e.kind === 'group') break;
  }
  return g.fn;
}

export class Recorder {
  private readonly frames: Frame[];
  private opened = false;

  constructor(readonly root: Group, rootScope: Map<string, Shown>) {
    this.frames = [{ group: root, scope: rootScope, inline: true }];
  }

  private get top(): Frame {
    return this.frames[this.frames.length - 1];
  }

  /** How deep the recorder is in nested calls (0 in the root); a balanced working ends at 0. */
  get depth(): number {
    return this.frames.length - 1;
  }

  /**
   * A computation that is a library function of its own starts: the first one writes into
   * the root (it is the call asked about), any later one opens a nested group. Pair with end().
   */
  open(fn: string, inputs: Record<string, Shown>, clause?: string): this {
    if (!this.opened) {
      this.opened = true;
      const f = this.top;
      for (const [k, v] of Object.entries(inputs)) f.scope.set(k, v);
      f.group.clause ??= clause;
      this.frames.push({ group: f.group, scope: f.scope, inline: true });
      return this;
    }
    const group: Group = { kind: 'group', fn, inputs: Object.entries(inputs).map(([name, value]) => ({ name, value })), entries: [], clause };
    this.top.group.entries.push(group);
    this.frames.push({ group, scope: new Map(Object.entries(inputs)), inline: false });
    return this;
  }

  /** The computation opened last returns `value` (shown in `unit`); its result joins the caller's scope. */
  end(value: LibValue, unit = ''): void {
    const f = this.frames.pop();
    if (!f || this.frames.length === 0) throw new Error('working: end() without open()');
    if (f.inline) return;
    f.group.value = value;
    f.group.unit = unit;
    this.top.scope.set(resultName(f.group), unit && typeof value === 'number' ? [value, unit] : value);
  }

  /** One step: `symbol = expr` with its value. Names in `expr` come from `o.vars`, then the group's scope. */
  step(symbol: string, expr: string | undefined, value: LibValue, unit = '', o: StepOptions = {}): void {
    const f = this.top;
    const vars: Record<string, Shown> = {};
    const missing: string[] = [];
    if (expr !== undefined) {
      for (const use of nameUses(expr)) {
        if (use.call || WORDS.has(use.name) || use.name in vars) continue;
        const v = o.vars && use.name in o.vars ? o.vars[use.name] : f.scope.get(use.name);
        if (v === undefined) missing.push(use.name);
        else vars[use.name] = v;
      }
    }
    const step: Step = { kind: 'step', symbol, expr, value, unit, vars };
    if (missing.length) step.missing = missing;
    if (o.clause) step.clause = o.clause;
    if (o.note) step.note = o.note;
    if (o.governs) step.governs = true;
    if (o.code) step.code = true;
    f.group.entries.push(step);
    f.scope.set(symbol, unit && typeof value === 'number' ? [value, unit] : value);
  }

  /** The unit a name of the group's scope is shown in ('' when it has none or is not there). */
  unitOf(name: string): string {
    const v = this.top.scope.get(name);
    return Array.isArray(v) ? v[1] : '';
  }

  /** A value read from a table: one step naming the row. */
  lookup(symbol: string, value: LibValue, unit: string, row: string, clause?: string): void {
    this.step(symbol, undefined, value, unit, { note: row, clause });
  }

  /** A name for a value the group already has (an earlier step or input): the function's result. */
  result(symbol: string, of: string, value: LibValue, unit = '', o: StepOptions = {}): void {
    this.step(symbol, of, value, unit, o);
  }

  /** The method of a long computation, with its reference, in place of its many steps. */
  method(text: string, reference: string): void {
    this.top.group.entries.push({ kind: 'method', text, reference });
  }

  /** A figure drawn by a figure function, shown with the working. */
  figure(fn: string, args: LibValue[]): void {
    this.top.group.entries.push({ kind: 'figure', fn, args });
  }
}

let current: Recorder | undefined;

/** The recorder of the working being asked for, or undefined on the ordinary path. */
export function working(): Recorder | undefined {
  return current;
}

/** Runs `f` with `rec` as the recorder (undefined: not recording); restores the one before. */
export function withRecorder<T>(rec: Recorder | undefined, f: () => T): T {
  const before = current;
  current = rec;
  try {
    return f();
  } finally {
    current = before;
  }
}

/** Runs `f` without recording: an iteration's thousand trials are not a working. */
export function quietly<T>(f: () => T): T {
  return current ? withRecorder(undefined, f) : f();
}

/** Ends the group `w` opened (if recording) and hands back the value: `return ended(w, out, 'psf')`. */
export function ended<T extends LibValue>(w: Recorder | undefined, value: T, unit = ''): T {
  w?.end(value, unit);
  return value;
}
