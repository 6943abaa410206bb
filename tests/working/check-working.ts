// Checks a recorded working against itself and against the value returned: every step's
// expression, evaluated on the values the step shows, gives the step's value (so what is
// printed is what was computed), every name is found, and the last step is the result.
import { all, create } from 'mathjs';
import type { LibFunction, LibValue } from '../../runtime/library/types';
import type { Entry, Group, Shown, Step } from '../../runtime/working/recorder';
import { lastEntry, workingOf, type Working } from '../../runtime/working/run';
import { unitInfo } from '../../runtime/units/dimension';

const math = create(all);

/** Relative closeness for numbers; equality for texts and yes/no. */
export function same(a: LibValue | undefined, b: LibValue | undefined, rel = 1e-9): boolean {
  if (typeof a === 'number' && typeof b === 'number') {
    if (a === b || Math.abs(a - b) < 1e-14) return true; // mathjs takes numbers this close as equal
    return Math.abs(a - b) <= rel * Math.max(Math.abs(a), Math.abs(b), 1e-300);
  }
  return a === b;
}

function inUnit(v: Shown, code: boolean): LibValue {
  if (Array.isArray(v)) return code ? v[0] / unitInfo(v[1]).factor : v[0];
  return v as LibValue;
}

/** The step's expression evaluated on the values it shows (SI, or the clause's units for code steps). */
export function evaluateStep(s: Step): LibValue {
  const scope = new Map<string, unknown>();
  for (const [k, v] of Object.entries(s.vars)) scope.set(k, inUnit(v, !!s.code));
  const out = math.evaluate(s.expr!, scope);
  return typeof out === 'object' && out !== null && 'valueOf' in out ? (out as any).valueOf() : out;
}

function stepValue(s: Step): LibValue {
  return s.code && s.unit && typeof s.value === 'number' ? s.value / unitInfo(s.unit).factor : s.value;
}

/** Every problem found in a group and the groups nested in it. */
export function problemsOf(g: Group, path = g.fn): string[] {
  const out: string[] = [];
  if (!g.entries.some((e) => e.kind === 'step' || e.kind === 'group')) out.push(`${path}: no steps recorded`);
  for (const e of g.entries as Entry[]) {
    if (e.kind === 'group') {
      out.push(...problemsOf(e, `${path} › ${e.fn}`));
      const last = lastEntry(e);
      if (last && !same(last.value, e.value, 1e-9)) out.push(`${path} › ${e.fn}: last step ${String(last.value)} ≠ result ${String(e.value)}`);
      continue;
    }
    if (e.kind !== 'step') continue;
    if (e.missing) out.push(`${path}: step ${e.symbol} names ${e.missing.join(', ')}, which it was not given`);
    if (e.unit) {
      try {
        unitInfo(e.unit);
      } catch {
        out.push(`${path}: step ${e.symbol} has an unknown unit ${e.unit}`);
      }
    }
    if (e.expr === undefined || e.missing) continue;
    let got: LibValue;
    try {
      got = evaluateStep(e);
    } catch (err) {
      out.push(`${path}: step ${e.symbol} = ${e.expr} does not evaluate: ${(err as Error).message}`);
      continue;
    }
    if (!same(got, stepValue(e), 1e-7)) {
      out.push(`${path}: step ${e.symbol} = ${e.expr} gives ${String(got)}, recorded ${String(stepValue(e))} (vars ${JSON.stringify(e.vars)})`);
    }
  }
  return out;
}

/** The working of one call, checked: problems listed, empty when all is well. */
export function checkCall(f: LibFunction, args: LibValue[]): { working: Working; problems: string[] } {
  const plain = f.fn(...args);
  const working = workingOf(f, args);
  const problems: string[] = [];
  if (working.error) problems.push(`${f.name}: failed under the recorder: ${working.error}`);
  if (working.unbalanced) problems.push(`${f.name}: a group was opened and not ended`);
  if (!same(working.value, plain, 0)) problems.push(`${f.name}: recording changed the result (${String(working.value)} vs ${String(plain)})`);
  const last = lastEntry(working.root);
  if (!last) problems.push(`${f.name}: no working`);
  else if (!same(last.value, plain)) problems.push(`${f.name}: last step ${last.kind === 'step' ? last.symbol : last.fn} = ${String(last.value)} ≠ ${String(plain)}`);
  problems.push(...problemsOf(working.root));
  return { working, problems };
}
