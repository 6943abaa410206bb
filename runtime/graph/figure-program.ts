// A figure cell compiles like a formula whose value is a figure spec. The engine also
// records in which display unit to label each argument: the unit of the cell it names,
// or the unit typed after a number, and the sheet's unit system for the rest.

import type { FigureCell } from '../document';
import { CellError } from '../formula/cell-error';
import { compileExpression, type CompileScope } from '../formula/compile';
import { parseFormula } from '../formula/parse';
import { FIGURE } from '../formula/value-type';
import { FIGURE_FUNCTIONS } from '../figures/functions';
import type { FigureSpec, UnitSystem } from '../figures/spec';
import { unitInfo } from '../units/dimension';
import { systemOf, typedUnit } from '../units/systems';
import { asCellError, failing, type CellProgram } from './cell-program';

const BY_NAME = new Map(FIGURE_FUNCTIONS.map((f) => [f.name, f]));

function knownUnit(u: string | undefined): string | undefined {
  if (!u) return undefined;
  try {
    unitInfo(u);
    return u;
  } catch {
    return undefined;
  }
}

/** Display unit per parameter of the figure function called at the top of `expr`. */
export function argumentUnits(expr: string, unitOf: (name: string) => string): Record<string, string> {
  const units: Record<string, string> = {};
  // The figure call itself, or each branch of `cond ? fig(...) : fig(...)`.
  const calls: any[] = [];
  const visit = (n: any, depth: number) => {
    while (n?.type === 'ParenthesisNode') n = n.content;
    if (depth > 8 || !n) return;
    if (n.type === 'ConditionalNode') {
      visit(n.trueExpr, depth + 1);
      visit(n.falseExpr, depth + 1);
    } else if (n.type === 'FunctionNode') calls.push(n);
  };
  visit(parseFormula(expr), 0);
  for (const node of calls) {
    const fn = BY_NAME.get(node.fn?.name);
    if (fn) addUnits(node, fn, units, unitOf);
  }
  return units;
}

function addUnits(node: any, fn: (typeof FIGURE_FUNCTIONS)[number], units: Record<string, string>, unitOf: (name: string) => string): void {
  (node.args as any[]).forEach((arg, i) => {
    const param = fn.params[i];
    if (!param || param.type === 'text' || param.type === '1') return;
    while (arg?.type === 'ParenthesisNode') arg = arg.content;
    const u = arg?.type === 'SymbolNode' ? knownUnit(unitOf(arg.name)) : knownUnit(typedUnit(arg.toString()));
    if (u && !units[param.name]) units[param.name] = u;
  });
}

export function figureProgram(cell: FigureCell, scope: CompileScope, unitOf: (name: string) => string): CellProgram {
  let compiled;
  try {
    compiled = compileExpression(cell.expr, scope);
  } catch (e) {
    return failing(asCellError(e));
  }
  const { reads, clauses, inputs, run } = compiled;
  if (compiled.type.t !== 'figure') {
    const names = FIGURE_FUNCTIONS.map((f) => f.name).join(', ');
    return failing(new CellError('not-allowed', `a figure cell calls a figure function (${names}); this gives a value, not a drawing`), reads);
  }
  const units = argumentUnits(cell.expr, unitOf);
  // The sheet's system: the arguments' units first, then every cell the figure reads.
  const seen = [...Object.values(units), ...reads.map(unitOf)];
  const system: UnitSystem = seen.map((u) => (u ? systemOf(u) : undefined)).find((s) => s) ?? 'US';
  return {
    type: FIGURE,
    inputs,
    reads,
    clauses,
    unit: '',
    definition: (...args: unknown[]): FigureSpec => ({ ...(run(args) as FigureSpec), units, system }),
  };
}
