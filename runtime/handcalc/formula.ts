// A formula cell as a hand calc: symbol = symbolic formula = formula with the values
// it reads put in (with units) = result in the display unit. mathjs is used here only
// to parse and typeset; nothing is evaluated.

import { parse, type MathNode } from 'mathjs';
import type { CellState, DisplayValue } from '../engine-types';
import { nameTex, textTex } from './names';
import { needsBrackets, quantityTex } from './quantity';

/** What the typesetter needs to know about the cells a formula reads. */
export interface HandCalcScope {
  /** Is `name` a cell of the sheet (as opposed to a unit or constant)? */
  isCell(name: string): boolean;
  /** The current state of the cell called `name`. */
  state(name: string): CellState | undefined;
}

/** Functions mathjs typesets well on its own; every other call is set as an operator name. */
const MATHJS_TEX = new Set([
  'sqrt', 'cbrt', 'abs', 'exp', 'log', 'log10', 'sin', 'cos', 'tan', 'asin', 'acos', 'atan',
  'floor', 'ceil', 'min', 'max', 'pow',
]);

const CONSTANTS: Record<string, string> = { pi: '\\pi', e: 'e', tau: '\\tau', Infinity: '\\infty' };

/** Parses for display only; undefined when the text does not parse (the engine reports why). */
export function parseForDisplay(expr: string): MathNode | undefined {
  try {
    return parse(expr);
  } catch {
    return undefined;
  }
}

type Mode = 'symbolic' | 'values';

function valueTex(d: DisplayValue | undefined, bracket: boolean): string {
  if (!d) return '{?}';
  const tex = quantityTex(d);
  return bracket ? `\\left(${tex}\\right)` : `{${tex}}`;
}

/**
 * Whether a value put in place of `node` needs brackets to read right: as a factor,
 * a power's base or after a minus sign, when it has a unit or is negative; in a
 * sum, only when negative. Function arguments, fractions and whole sides never do.
 */
function bracketFor(node: MathNode, parents: Map<MathNode, MathNode | null>, d: DisplayValue | undefined): boolean {
  if (!d || !needsBrackets(d)) return false;
  const parent: any = parents.get(node);
  if (!parent || parent.type !== 'OperatorNode') return false;
  const negative = typeof d.value === 'number' && d.value < 0;
  switch (parent.fn) {
    case 'multiply':
    case 'unaryMinus':
    case 'unaryPlus':
      return true;
    case 'pow':
      return parent.args[0] === node;
    case 'add':
    case 'subtract':
      return negative && (parent.fn === 'subtract' || parent.args[0] !== node);
    default:
      return false;
  }
}

/** Calls set as \operatorname{f}(a, b) with plain brackets, so a long call can break after a comma. */
const BREAKABLE_CALLS = new Set(['min', 'max']);

/** mathjs toTex options with our handler: names, units upright, library calls, values. */
function texOptions(scope: HandCalcScope, mode: Mode, root: MathNode) {
  const parents = new Map<MathNode, MathNode | null>();
  root.traverse((n: MathNode, _path: string, parent: MathNode | null) => {
    parents.set(n, parent);
  });
  const handler = (node: any, options: any): string | undefined => {
    if (node.type === 'SymbolNode') {
      const name: string = node.name;
      if (scope.isCell(name)) {
        if (mode === 'symbolic') return nameTex(name);
        const d = scope.state(name)?.display;
        return valueTex(d, node !== root && bracketFor(node, parents, d));
      }
      if (name in CONSTANTS) return `{${CONSTANTS[name]}}`;
      return `{\\mathrm{${name}}}`; // a unit
    }
    if (node.type === 'FunctionNode' && (BREAKABLE_CALLS.has(node.fn?.name) || !MATHJS_TEX.has(node.fn?.name))) {
      const fname = String(node.fn?.name ?? node.name ?? 'f').replace(/_/g, '\\_');
      const args = node.args.map((a: MathNode) => a.toTex(options)).join(',\\allowbreak\\,');
      return `\\operatorname{${fname}}(${args})`;
    }
    if (node.type === 'ConstantNode' && typeof node.value === 'string') return textTex(node.value);
    if (node.type === 'ConstantNode' && typeof node.value === 'boolean') return textTex(node.value ? 'yes' : 'no');
    return undefined;
  };
  return { implicit: 'hide', parenthesis: 'keep', handler } as const;
}

/** The expression typeset with names (symbolic) or with the values it reads put in. */
export function exprTex(node: MathNode, scope: HandCalcScope, mode: Mode): string {
  return node.toTex(texOptions(scope, mode, node) as any);
}

/** Whether the expression reads any cell. */
function readsCells(node: MathNode, scope: HandCalcScope): boolean {
  return node.filter((n: any) => n.type === 'SymbolNode' && scope.isCell(n.name)).length > 0;
}

export interface FormulaTex {
  /** The cell's own symbol, e.g. {M_{\mathrm{u}}}. */
  symbol: string;
  /** The formula with names; undefined when the text does not parse. */
  symbolic?: string;
  /** The formula with values put in; omitted when it would repeat another part. */
  substituted?: string;
  /** The result in its display unit; undefined while pending or on an error. */
  result?: string;
  /** Each part after the symbol, in order; `line` joins them with = signs. */
  parts: string[];
  line: string;
  /** The same as `line`, one part a row, for long formulas. */
  aligned: string;
}

function joinParts(symbol: string, parts: string[]): { line: string; aligned: string } {
  const line = [symbol, ...parts].join(' = ');
  const aligned = parts.length <= 1
    ? line
    : `\\begin{aligned}${symbol} &= ${parts.join(' \\\\ &= ')}\\end{aligned}`;
  return { line, aligned };
}

/** Typesets a formula cell `name = expr` given its own state and the states of what it reads. */
export function formulaTex(
  name: string,
  expr: string,
  own: CellState | undefined,
  scope: HandCalcScope,
  node: MathNode | undefined = parseForDisplay(expr),
): FormulaTex {
  const symbol = nameTex(name);
  const parts: string[] = [];
  let symbolic: string | undefined;
  let substituted: string | undefined;
  if (node) {
    symbolic = exprTex(node, scope, 'symbolic');
    parts.push(symbolic);
    const lone = node.type === 'SymbolNode' || (node.type === 'ParenthesisNode' && (node as any).content.type === 'SymbolNode');
    if (readsCells(node, scope) && !lone) {
      substituted = exprTex(node, scope, 'values');
      parts.push(substituted);
    }
  } else {
    symbolic = textTex(expr);
    parts.push(symbolic);
  }
  const result = own && (own.status === 'ok' || own.status === 'fail') && own.display
    ? quantityTex(own.display)
    : undefined;
  if (result !== undefined && result !== parts[parts.length - 1]) parts.push(result);
  return { symbol, symbolic, substituted, result, parts, ...joinParts(symbol, parts) };
}
