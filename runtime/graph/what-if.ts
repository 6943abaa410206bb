// What if an input had another value? Evaluates the compiled cell programs directly,
// upstream first, with the input overridden — never touching the reactive graph, so the
// document and the running engine stay as they are. Cells that do not depend on the
// input are computed once and shared by every point. A value outside the input's own
// least/greatest values is not computed: the sheet would refuse it for the input too.

import type { WhatIfOutcome } from '../engine-types';
import type { CellProgram, CheckResult } from './cell-program';
import { outsideLimits } from '../formula/input-value';

/** What a sweep or a what-if needs to know about a named cell. */
export interface SweepCellInfo {
  id: string;
  kind: string;
  program?: CellProgram;
}

/** What the evaluator needs from the engine: programs by cell id, and names. */
export interface WhatIfGraph {
  program(id: string): CellProgram | undefined;
  /** A cell's name for messages (its id when it has none). */
  nameOf(id: string): string;
}

export type Outcome = { ok: true; value: unknown } | { ok: false; error: string };

export type { WhatIfOutcome };

export class WhatIf {
  private readonly tainted = new Map<string, boolean>();
  private readonly stable = new Map<string, Outcome>();

  constructor(private readonly graph: WhatIfGraph, private readonly inputId: string) {}

  /** Why the input may not take `value` (outside its min/max), or undefined when it may. */
  outside(value: unknown): string | undefined {
    const input = this.graph.program(this.inputId)?.input;
    if (!input || typeof value !== 'number') return undefined;
    const why = outsideLimits(value, input);
    return why && `${this.graph.nameOf(this.inputId)} = ${why}; not computed`;
  }

  /** The raw runtime value of each target with the input set to `value` (SI number, text or boolean). */
  at(value: unknown, targets: readonly string[]): Outcome[] {
    const outside = this.outside(value);
    if (outside) return targets.map(() => ({ ok: false, error: outside }));
    const memo = new Map<string, Outcome>([[this.inputId, { ok: true, value }]]);
    return targets.map((id) => this.evaluate(id, memo, new Set()));
  }

  private dependsOnInput(id: string, visiting: Set<string>): boolean {
    if (id === this.inputId) return true;
    const known = this.tainted.get(id);
    if (known !== undefined) return known;
    if (visiting.has(id)) return false;
    visiting.add(id);
    const p = this.graph.program(id);
    const t = !!p && p.inputs.some((i) => this.dependsOnInput(i, visiting));
    visiting.delete(id);
    this.tainted.set(id, t);
    return t;
  }

  private evaluate(id: string, memo: Map<string, Outcome>, visiting: Set<string>): Outcome {
    const store = this.dependsOnInput(id, new Set()) ? memo : this.stable;
    const hit = store.get(id);
    if (hit) return hit;
    const p = this.graph.program(id);
    let out: Outcome;
    if (!p || visiting.has(id)) {
      out = { ok: false, error: `${this.graph.nameOf(id)} does not compute` };
    } else {
      visiting.add(id);
      const args: unknown[] = [];
      let broken: Outcome | undefined;
      for (const i of p.inputs) {
        const o = this.evaluate(i, memo, visiting);
        if (!o.ok) {
          broken = { ok: false, error: `reads ${this.graph.nameOf(i)}, which has an error (${o.error})` };
          break;
        }
        args.push(o.value);
      }
      visiting.delete(id);
      out = broken ?? run(p, args);
    }
    store.set(id, out);
    return out;
  }
}

function run(p: CellProgram, args: unknown[]): Outcome {
  try {
    return { ok: true, value: p.definition(...args) };
  } catch (e) {
    return { ok: false, error: e instanceof Error ? e.message : String(e) };
  }
}

/** A raw runtime value as people read it: a check gives its ratio (or condition) and pass. */
export function outcomeOf(o: Outcome, isCheck: boolean): WhatIfOutcome {
  if (!o.ok) return { error: o.error };
  if (isCheck) {
    const r = o.value as CheckResult;
    return { value: r.value, pass: r.pass };
  }
  return { value: o.value as number | string | boolean };
}

/**
 * engine.whatIf: each value of the input `input` in turn, the outcome of each named
 * output; the document and every cell state stay as they are.
 */
export function whatIfRun(
  graph: WhatIfGraph,
  cellNamed: (name: string) => SweepCellInfo | undefined,
  input: string,
  values: readonly (number | string | boolean)[],
  outputs: readonly string[],
): Record<string, WhatIfOutcome>[] {
  const inp = cellNamed(input);
  if (!inp || inp.kind !== 'input') throw new Error(`"${input}" is not the name of an input cell`);
  const outs = outputs.map((name) => {
    const info = cellNamed(name);
    if (!info) throw new Error(`"${name}" is not the name of any cell`);
    return { name, info };
  });
  const w = new WhatIf(graph, inp.id);
  return values.map((v) => {
    const got = w.at(v, outs.map((o) => o.info.id));
    return Object.fromEntries(outs.map((o, k) => [o.name, outcomeOf(got[k], o.info.kind === 'check')]));
  });
}
