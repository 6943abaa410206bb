// A formula cell as a hand calc: symbol = symbolic formula = formula with the values
// it reads put in (with units) = result in the display unit. mathjs is used here only
// to parse and typeset; nothing is evaluated.

import type { MathNode } from 'mathjs';
import { MAX_FORMULA_LENGTH, parseFormula } from '../formula/parse';
import type { CellState, DisplayValue } from '../engine-types';
import { clippedTex, nameTex, textTex } from './names';
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

const parsed = new Map<string, MathNode | undefined>();
const CACHE_LIMIT = 5000;

function remember<K, V>(cache: Map<K, V>, key: K, value: V): V {
  if (cache.size >= CACHE_LIMIT) cache.clear();
  cache.set(key, value);
  return value;
}

/**
 * Parses for display only, within the engine's limits (length, bracket depth); undefined
 * when the text does not parse or is over them (the engine reports why). Cached by text.
 */
export function parseForDisplay(expr: string): MathNode | undefined {
  if (parsed.has(expr)) return parsed.get(expr);
  let node: MathNode | undefined;
  try {
    node = parseFormula(expr);
  } catch {
    node = undefined;
  }
  // A text over the limit is not kept as a key: the cache holds formulas, not 10 MB strings.
  return expr.length > MAX_FORMULA_LENGTH ? node : remember(parsed, expr, node);
}

type Mode = 'symbolic' | 'values';

function valueTex(d: DisplayValue | undefined, bracket: boolean): string {
  if (!d) return '{?}';
  const tex = quantityTex(d);
  return bracket ? `\\left(${tex}\\right)` : `{${tex}}`;
}

/** Where a value stands in a formula, which decides whether it needs brackets. */
type Place = 'factor' | 'base' | 'after-sign' | 'term' | 'free';

/**
 * Brackets for a value put in place of a name: as a factor, a power's base or after a
 * minus sign, when it has a unit or is negative; as a later term of a sum, only when
 * negative. Function arguments, fractions and whole sides never need them.
 */
function bracketFor(place: Place, d: DisplayValue | undefined): boolean {
  if (!d || !needsBrackets(d) || place === 'free') return false;
  if (place === 'term') return typeof d.value === 'number' && d.value < 0;
  return true;
}

function placeOf(node: MathNode, parent: any, root: MathNode): Place {
  if (node === root || !parent || parent.type !== 'OperatorNode') return 'free';
  switch (parent.fn) {
    case 'multiply': return 'factor';
    case 'unaryMinus':
    case 'unaryPlus': return 'after-sign';
    case 'pow': return parent.args[0] === node ? 'base' : 'free';
    case 'add': return parent.args[0] === node ? 'free' : 'term';
    case 'subtract': return parent.args[0] === node ? 'free' : 'term';
    default: return 'free';
  }
}

/** Calls set as \\operatorname{f}(a, b) with plain brackets, so a long call can break after a comma. */
const BREAKABLE_CALLS = new Set(['min', 'max']);

/** Marks a slot in a template; control characters never occur in TeX that mathjs writes. */
const SLOT = /\u0001(\d+)\u0002/g;

/**
 * An expression typeset once per text and set of cell names: the symbolic form, and the
 * form with values as numbered slots filled in at each update (no re-typesetting by mathjs).
 */
interface TexTemplate {
  /** The names in the expression and whether each was a cell when typeset. */
  names: string[];
  cells: boolean[];
  symbolic: string;
  values: string;
  slots: { name: string; place: Place }[];
  readsCells: boolean;
}

// Parsed nodes are cached, so a node object stands for its text; a few variants per node
// cover names that are cells in one sheet and units in another.
const templates = new WeakMap<MathNode, TexTemplate[]>();

function buildTemplate(node: MathNode, isCell: (name: string) => boolean): TexTemplate {
  const parents = new Map<MathNode, MathNode | null>();
  node.traverse((n: MathNode, _path: string, parent: MathNode | null) => {
    parents.set(n, parent);
  });
  const slots: TexTemplate['slots'] = [];
  const options = (mode: Mode) => {
    // mathjs's templates typeset a call's arguments twice (2^depth for nested calls):
    // each node's TeX is made once per pass and reused, so typesetting stays linear.
    const done = new Map<MathNode, string>();
    const once = (n: any, opts: any): string => {
      let tex = done.get(n);
      if (tex === undefined) {
        tex = own(n, opts) ?? (n._toTex(opts) as string);
        done.set(n, tex);
      }
      return tex;
    };
    const own = (n: any, opts: any): string | undefined => {
      if (n.type === 'SymbolNode') {
        const name: string = n.name;
        if (isCell(name)) {
          if (mode === 'symbolic') return nameTex(name);
          slots.push({ name, place: placeOf(n, parents.get(n), node) });
          return `\u0001${slots.length - 1}\u0002`;
        }
        if (name in CONSTANTS) return `{${CONSTANTS[name]}}`;
        return `{\\mathrm{${name}}}`; // a unit
      }
      if (n.type === 'FunctionNode' && (BREAKABLE_CALLS.has(n.fn?.name) || !MATHJS_TEX.has(n.fn?.name))) {
        const fname = String(n.fn?.name ?? n.name ?? 'f').replace(/_/g, '\\_');
        const args = n.args.map((a: MathNode) => a.toTex(opts)).join(',\\allowbreak\\,');
        return `\\operatorname{${fname}}(${args})`;
      }
      if (n.type === 'ConstantNode' && typeof n.value === 'string') return textTex(n.value);
      if (n.type === 'ConstantNode' && typeof n.value === 'boolean') return textTex(n.value ? 'yes' : 'no');
      return undefined;
    };
    return { implicit: 'hide', parenthesis: 'keep', handler: once } as any;
  };
  const names = [...new Set(node.filter((n: any) => n.type === 'SymbolNode').map((n: any) => n.name as string))];
  const symbolic = node.toTex(options('symbolic'));
  const values = node.toTex(options('values'));
  return { names, cells: names.map(isCell), symbolic, values, slots, readsCells: slots.length > 0 };
}

/** The template for a node, cached by node and by which of its names are cells. */
function templateFor(node: MathNode, scope: HandCalcScope): TexTemplate {
  let list = templates.get(node);
  const hit = list?.find((t) => t.names.every((n, i) => scope.isCell(n) === t.cells[i]));
  if (hit) return hit;
  const t = buildTemplate(node, (n) => scope.isCell(n));
  if (!list) templates.set(node, (list = []));
  if (list.length >= 4) list.shift();
  list.push(t);
  return t;
}

function fill(t: TexTemplate, scope: HandCalcScope): string {
  return t.values.replace(SLOT, (_m, i: string) => {
    const slot = t.slots[Number(i)];
    const d = scope.state(slot.name)?.display;
    return valueTex(d, bracketFor(slot.place, d));
  });
}

/** The expression typeset with names (symbolic) or with the values it reads put in. */
export function exprTex(node: MathNode, scope: HandCalcScope, mode: Mode): string {
  const t = templateFor(node, scope);
  return mode === 'symbolic' ? t.symbolic : fill(t, scope);
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
    const t = templateFor(node, scope);
    symbolic = t.symbolic;
    parts.push(symbolic);
    const lone = node.type === 'SymbolNode' || (node.type === 'ParenthesisNode' && (node as any).content.type === 'SymbolNode');
    if (t.readsCells && !lone) {
      substituted = fill(t, scope);
      parts.push(substituted);
    }
  } else {
    symbolic = clippedTex(expr);
    parts.push(symbolic);
  }
  const result = own && (own.status === 'ok' || own.status === 'fail') && own.display
    ? quantityTex(own.display)
    : undefined;
  if (result !== undefined && result !== parts[parts.length - 1]) parts.push(result);
  return { symbol, symbolic, substituted, result, parts, ...joinParts(symbol, parts) };
}
