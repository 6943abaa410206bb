// A sweep cell: the runtime variable reads the swept input and the plotted cells, so it
// recomputes whenever they change; its value is the whole sweep, evaluated point by
// point on the compiled programs with the input overridden (what-if.ts). The range is
// centred on the input's value within its limits, unless the author fixed it (`range
// fixed`): then it stays as written, and points beyond min/max are listed as outside.

import type { SweepCell } from '../document';
import { CellError } from '../formula/cell-error';
import { limitsText, parseQuantityText } from '../formula/input-value';
import { describeType } from '../formula/value-type';
import type { SweepResult, SweepSeries } from '../figures/spec';
import { sameDims } from '../units/dimension';
import { failing, type CellProgram } from './cell-program';
import { outcomeOf, WhatIf, type SweepCellInfo, type WhatIfGraph } from './what-if';
import { Pacer } from './pacer';

export const DEFAULT_STEPS = 20;
export const MAX_STEPS = 200;

/**
 * The range swept, SI: as written when the author fixed it; else as wide as written and
 * centred on the input's current value, moved (or, when wider than they allow, cut) to
 * lie within the input's least and greatest values. Its direction is kept.
 */
export function sweepRange(from: number, to: number, current: number, limits: { min?: number; max?: number }, fixed: boolean): [number, number] {
  if (fixed || !Number.isFinite(current)) return [from, to];
  const width = Math.abs(to - from);
  let lo = current - width / 2;
  let hi = current + width / 2;
  const { min = -Infinity, max = Infinity } = limits;
  if (hi - lo >= max - min) [lo, hi] = [min, max];
  else if (lo < min) [lo, hi] = [min, min + width];
  else if (hi > max) [lo, hi] = [max - width, max];
  return from <= to ? [lo, hi] : [hi, lo];
}

/** The points swept, SI: `steps` equal intervals from `from` to `to`. */
export function sweepPoints(from: number, to: number, steps: number): number[] {
  return Array.from({ length: steps + 1 }, (_, i) => (i === steps ? to : from + ((to - from) * i) / steps));
}

export function sweepProgram(cell: SweepCell, lookup: (name: string) => SweepCellInfo | undefined, graph: WhatIfGraph): CellProgram {
  const reads = [cell.input, ...cell.outputs];
  const fail = (kind: CellError['kind'], msg: string) => failing(new CellError(kind, msg), reads);
  const input = lookup(cell.input);
  if (!cell.input.trim()) return fail('syntax', 'name the input to sweep');
  if (!input) return fail('unknown-name', `"${cell.input}" is not the name of any cell`);
  if (input.kind !== 'input') return fail('not-allowed', `${cell.input} is not an input cell; a sweep varies an input`);
  const itype = input.program?.type;
  if (!itype) return fail('upstream', `reads ${cell.input}, which has an error`);
  if (itype.t !== 'num') return fail('unit', `${cell.input} is ${describeType(itype)}; a sweep varies a number`);
  let from: number, to: number;
  try {
    const a = parseQuantityText(cell.from, 'from');
    const b = parseQuantityText(cell.to, 'to');
    for (const [what, q] of [['from', a], ['to', b]] as const) {
      if (!sameDims(q.dims, itype.dims)) {
        return fail('unit', `${what} (${(what === 'from' ? cell.from : cell.to).trim()}) must be ${describeType(itype)} like ${cell.input}`);
      }
    }
    from = a.si;
    to = b.si;
  } catch (e) {
    return failing(e instanceof CellError ? e : new CellError('syntax', String(e)), reads);
  }
  if (from === to) return fail('range', 'from and to are the same value; give a range');
  const steps = cell.steps ?? DEFAULT_STEPS;
  if (!Number.isInteger(steps) || steps < 1 || steps > MAX_STEPS) return fail('range', `steps must be a whole number from 1 to ${MAX_STEPS}`);
  if (cell.outputs.length === 0) return fail('syntax', 'name at least one result or check to plot');
  const outs: { name: string; info: SweepCellInfo }[] = [];
  for (const name of cell.outputs) {
    const info = lookup(name);
    if (!info) return fail('unknown-name', `"${name}" is not the name of any cell`);
    if (info.kind !== 'formula' && info.kind !== 'check') return fail('not-allowed', `${name} is not a result or a check`);
    const t = info.program?.type;
    if (!t) return fail('upstream', `reads ${name}, which has an error`);
    if (info.kind === 'formula' && t.t !== 'num') return fail('unit', `${name} is ${describeType(t)}; only numbers and checks can be plotted`);
    if (info.id === input.id) return fail('not-allowed', `${name} is the input swept`);
    outs.push({ name, info });
  }
  const inputs = [...new Set([input.id, ...outs.map((o) => o.info.id)])];
  const unit = input.program?.unit ?? '';
  return {
    inputs,
    reads,
    clauses: [],
    unit: '',
    definition: async (current: unknown): Promise<SweepResult> => {
      // Programs as they are now (a display unit may have changed since this sweep compiled).
      const now = (id: string, was?: CellProgram) => graph.program(id) ?? was;
      const inputNow = now(input.id, input.program);
      const bounds = { min: inputNow?.input?.min?.si, max: inputNow?.input?.max?.si };
      const xs = sweepPoints(...sweepRange(from, to, current as number, bounds, cell.fixed === true), steps);
      const w = new WhatIf(graph, input.id);
      const ids = outs.map((o) => o.info.id);
      // Each point runs the calc again: a sweep of heavy cells (plate solves) yields to the
      // page between slices rather than holding it for the whole sweep.
      const pacer = new Pacer();
      pacer.begin();
      const points: ReturnType<WhatIf['at']>[] = [];
      for (const x of xs) points.push(await pacer.pace(() => w.at(x, ids)));
      const series = outs.map((o, k) => seriesOf(o.name, { ...o.info, program: now(o.info.id, o.info.program) },
        points.map((p) => outcomeOf(p[k], o.info.kind === 'check')), xs));
      const result: SweepResult = { input: cell.input, unit: inputNow?.unit ?? unit, xs, current: current as number, series };
      const limits = inputNow?.input ? limitsText(inputNow.input) : '';
      if (limits) {
        result.limits = limits;
        const outside = xs.flatMap((x, i) => (w.outside(x) ? [i] : []));
        if (outside.length) result.outside = outside;
      }
      return result;
    },
  };
}

function seriesOf(name: string, info: SweepCellInfo, outcomes: ReturnType<typeof outcomeOf>[], xs: number[]): SweepSeries {
  const isCheck = info.kind === 'check';
  const ratio = isCheck && info.program?.form === 'ratio';
  const s: SweepSeries = {
    name,
    kind: isCheck ? (ratio ? 'ratio' : 'condition') : 'value',
    unit: isCheck ? '' : info.program?.unit ?? '',
    values: outcomes.map((o) => (typeof o.value === 'number' ? o.value : typeof o.value === 'boolean' ? (o.value ? 1 : 0) : null)),
  };
  const errors: Record<number, string> = {};
  outcomes.forEach((o, i) => {
    if (o.error) errors[i] = o.error;
  });
  if (Object.keys(errors).length) s.errors = errors;
  if (!isCheck) return s;
  s.pass = outcomes.map((o) => (o.pass === undefined ? null : o.pass));
  const first = s.pass.findIndex((p) => p === false);
  if (first >= 0) s.firstFail = first;
  if (ratio) {
    // Where the ratio crosses 1 between neighbouring points that pass and fail.
    const at: number[] = [];
    for (let i = 1; i < xs.length; i++) {
      const r0 = s.values[i - 1], r1 = s.values[i];
      if (r0 === null || r1 === null || s.pass[i - 1] === null || s.pass[i] === null || s.pass[i - 1] === s.pass[i] || r0 === r1) continue;
      const t = (1 - r0) / (r1 - r0);
      if (t >= 0 && t <= 1) at.push(xs[i - 1] + t * (xs[i] - xs[i - 1]));
    }
    if (at.length) s.crossings = at;
  }
  return s;
}
