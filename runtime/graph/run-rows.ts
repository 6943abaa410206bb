// One row of a run: the trace's compiled programs evaluated with the inputs bound to the
// row's values, never touching the reactive graph (as what-if.ts evaluates a sweep point).
// Cells that read no bound input are computed once for every row of a run (the shared
// work: plan, storeys), cells that do once per row. A row whose values, and everything
// else the trace reads, are unchanged since the last run is not computed again.

import type { CheckResult } from './cell-program';
import type { Outcome, WhatIfGraph } from './what-if';

export type RowOutcomes = ReadonlyMap<string, Outcome>;

export class RowEvaluator {
  private readonly tainted = new Map<string, boolean>();
  private readonly shared = new Map<string, Outcome>();

  /** `bound`: the ids of the inputs a row sets. */
  constructor(private readonly graph: WhatIfGraph, private readonly bound: ReadonlySet<string>) {}

  /** Every target's outcome with the bound inputs set to `values` (id → value). */
  row(values: ReadonlyMap<string, unknown>, targets: readonly string[]): Map<string, Outcome> {
    const memo = new Map<string, Outcome>();
    for (const [id, value] of values) memo.set(id, { ok: true, value });
    const out = new Map<string, Outcome>();
    for (const id of targets) out.set(id, this.evaluate(id, memo, new Set()));
    return out;
  }

  private readsBound(id: string, visiting: Set<string>): boolean {
    if (this.bound.has(id)) return true;
    const known = this.tainted.get(id);
    if (known !== undefined) return known;
    if (visiting.has(id)) return false;
    visiting.add(id);
    const p = this.graph.program(id);
    const t = !!p && p.inputs.some((i) => this.readsBound(i, visiting));
    visiting.delete(id);
    this.tainted.set(id, t);
    return t;
  }

  private evaluate(id: string, memo: Map<string, Outcome>, visiting: Set<string>): Outcome {
    const store = this.readsBound(id, new Set()) ? memo : this.shared;
    const hit = store.get(id);
    if (hit) return hit;
    const p = this.graph.program(id);
    let out: Outcome;
    if (!p || visiting.has(id)) out = { ok: false, error: `${this.graph.nameOf(id)} does not compute` };
    else {
      visiting.add(id);
      const args: unknown[] = [];
      let broken: Outcome | undefined;
      for (const i of p.inputs) {
        const o = this.evaluate(i, memo, visiting);
        if (!o.ok) {
          broken = { ok: false, error: `reads ${this.graph.nameOf(i)}, which has an error` };
          break;
        }
        args.push(o.value);
      }
      visiting.delete(id);
      if (broken) out = broken;
      else {
        try {
          const v = p.definition(...args);
          out = v instanceof Promise ? { ok: false, error: `${this.graph.nameOf(id)} cannot be run per row` } : { ok: true, value: v };
        } catch (e) {
          out = { ok: false, error: e instanceof Error ? e.message : String(e) };
        }
      }
    }
    store.set(id, out);
    return out;
  }
}

/** Two values a trace read are the same (a check's result compared by what it says). */
export function sameRead(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (typeof a !== 'object' || typeof b !== 'object' || !a || !b || !('pass' in a) || !('pass' in b)) return false;
  const x = a as CheckResult, y = b as CheckResult;
  return x.value === y.value && x.pass === y.pass && x.demand === y.demand && x.capacity === y.capacity;
}
