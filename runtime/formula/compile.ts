// Compiling a formula: check every node against an allow-list, resolve names to
// cells, infer and check units once, and build a closure that evaluates on plain
// numbers in SI base units. Nothing here evaluates text or reaches the host.

import type { LibFunction } from '../library/types';
import { addDims, DIMLESS, isDimless, scaleDims, isUnitName, unitInfo } from '../units/dimension';
import { BUILTINS } from './builtins';
import { CellError } from './cell-error';
import { approxEqual, arithmetic, arity, compareFn, constant, derive, dimsOf, hintOf, pureConstant, type CNode, type Ev } from './closures';
import {
  isCall, isConditional, isConstant, isOperator, isParenthesis, isRelational, isSymbol, type CallNode, type ConditionalNode, type ConstNode, type MathNode, type OpNode, type RelationalNode,
} from './nodes';
import { columnOf, parseFormula } from './parse';
import { nearestName } from './suggest';
import { BOOL, describeType, NUMBER, numType, sameType, TEXT, typeFromDeclaration, type VType } from './value-type';

/** What the compiler needs to know about a cell name. */
export interface NameInfo {
  /** Key of the cell's runtime variable (its id). */
  key: string;
  type: VType;
  /** The variable holds a check result `{ value }` rather than a plain value. */
  unwrap?: boolean;
}

export interface CompileScope {
  /** The cell a name refers to; may throw CellError('upstream') when that cell is broken. */
  lookup(name: string): NameInfo | undefined;
  /** Is there a cell of this name (it then shadows any unit of the same name)? */
  isCell(name: string): boolean;
  /** Every cell name, for "did you mean". */
  names(): Iterable<string>;
  /** What a suggested name is ("the input d, Effective depth"), so a look-alike is not taken for the one meant. */
  describe?(name: string): string | undefined;
  functions: ReadonlyMap<string, LibFunction<unknown>>;
  /**
   * Only when the working of a cell's calls is asked for: the function a library call
   * runs, given the function and the types of its arguments (their units as written).
   */
  wrapLibrary?(lib: LibFunction<unknown>, argTypes: readonly VType[]): LibFunction<unknown>['fn'];
}


export interface CompiledExpr {
  type: VType;
  /** Runtime variable keys this expression reads, in slot order. */
  inputs: string[];
  /** Cell names read, in first-use order. */
  reads: string[];
  /** Clauses of the library functions called. */
  clauses: string[];
  run: Ev;
}

const MAX_DEPTH = 120;

/** Words of other languages people type in a formula, with what to write instead. */
const NOT_FORMULA_WORDS: Record<string, string> = {
  if: 'write a choice as condition ? value_if_true : value_if_false, e.g. h > 12 in ? 0.9 : 1',
  then: 'write a choice as condition ? value_if_true : value_if_false',
  else: 'write a choice as condition ? value_if_true : value_if_false',
  elif: 'write a choice as condition ? value_if_true : value_if_false',
  return: 'a formula is only its expression, e.g. 1.2*PD + 1.6*PL',
};

/** "there is no function sum": with the nearest name, or what exists. */
function unknownFunction(name: string, functions: ReadonlyMap<string, LibFunction<unknown>>): string {
  if (NOT_FORMULA_WORDS[name]) return `"${name}" is not part of the formula language: ${NOT_FORMULA_WORDS[name]}`;
  if (name === 'sum') return 'there is no function "sum": add the terms with +, e.g. PD + PL';
  const near = nearestName(name, [...BUILTINS.keys(), ...functions.keys()]);
  if (near) return `there is no function "${name}"; did you mean ${near}?`;
  return `there is no function "${name}"; the general ones are ${[...BUILTINS.keys()].join(', ')}, and the structural library's are offered as you type a name`;
}
// After an explicit * or / a one-letter unit is too easily a mistyped cell name
// (L is litres, A amperes); only these are accepted there.
const SHORT_UNITS_AFTER_OPERATOR = new Set(['m', 'N', 'g', 's']);

export class Compiler {
  readonly inputs: string[] = [];
  readonly reads: string[] = [];
  readonly clauses: string[] = [];
  private readonly slots = new Map<string, number>();

  constructor(private readonly source: string, private readonly scope: CompileScope) {}

  fail(kind: CellError['kind'], message: string, name?: string): never {
    throw new CellError(kind, message, name ? columnOf(this.source, name) : undefined);
  }

  node(n: MathNode, depth: number): CNode {
    if (depth > MAX_DEPTH) this.fail('syntax', 'the formula is nested too deeply');
    const q = this.quantity(n);
    if (q) return q;
    if (isConstant(n)) return this.constantNode(n);
    if (isSymbol(n)) return this.symbol(n.name);
    if (isParenthesis(n)) return this.node(n.content, depth + 1);
    if (isOperator(n)) return this.operator(n, depth);
    if (isConditional(n)) return this.conditional(n, depth);
    if (isRelational(n)) return this.relational(n, depth);
    if (isCall(n)) return this.call(n, depth);
    switch (n.type) {
      case 'AssignmentNode':
      case 'FunctionAssignmentNode':
        return this.fail('not-allowed', 'a formula cannot assign; give the name in the cell and only the expression here');
      case 'AccessorNode':
      case 'IndexNode':
        return this.fail('not-allowed', 'property and index access (a.b, a[1]) are not part of the formula language');
      case 'ArrayNode':
      case 'RangeNode':
        return this.fail('not-allowed', 'lists and ranges are not part of the formula language');
      case 'ObjectNode':
        return this.fail('not-allowed', 'objects are not part of the formula language');
      case 'BlockNode':
        return this.fail('not-allowed', 'a formula holds one expression; use one cell per result');
      default:
        return this.fail('not-allowed', `"${n.type}" is not part of the formula language`);
    }
  }

  private constantNode(n: ConstNode): CNode {
    const v = n.value;
    if (typeof v === 'number') return constant(NUMBER, v);
    if (typeof v === 'string') {
      if (v.length > 200) this.fail('not-allowed', 'a quoted text in a formula may have at most 200 characters');
      return constant(TEXT, v);
    }
    if (typeof v === 'boolean') return constant(BOOL, v);
    return this.fail('not-allowed', `the constant ${String(v)} is not part of the formula language`);
  }

  private symbol(name: string): CNode {
    const info = this.scope.lookup(name);
    if (!info) return this.unknown(name);
    let slot = this.slots.get(info.key);
    if (slot === undefined) {
      slot = this.inputs.length;
      this.slots.set(info.key, slot);
      this.inputs.push(info.key);
    }
    if (!this.reads.includes(name)) this.reads.push(name);
    const i = slot;
    const ev: Ev = info.unwrap ? (a) => (a[i] as { value: unknown }).value : (a) => a[i];
    return { type: info.type, ev };
  }

  private unknown(name: string): never {
    const word = NOT_FORMULA_WORDS[name];
    if (word) return this.fail('not-allowed', `"${name}" is not part of the formula language: ${word}`, name);
    const near = nearestName(name, this.scope.names());
    let msg = `"${name}" is not the name of any cell`;
    if (near) msg += `; did you mean ${this.scope.describe?.(near) ?? near}?`;
    else if (isUnitName(name)) msg += `; to use the unit ${name}, write it after a number (e.g. 1 ${name})`;
    return this.fail('unknown-name', msg, name);
  }

  /** `12 in`, `150 lbf/ft^3`, `5 kip ft`: a number followed by units folds to a constant. */
  private quantity(n: MathNode): CNode | undefined {
    if (!isOperator(n) || n.args.length !== 2) return undefined;
    const implicit = n.fn === 'multiply' && n.implicit;
    const chained = !implicit && (n.fn === 'multiply' || n.fn === 'divide');
    if (!implicit && !chained) return undefined;
    const left = implicit ? this.numberOrQuantity(n.args[0]) : this.quantityOnly(n.args[0]);
    if (!left) return undefined;
    const unit = this.unitExpr(n.args[1], chained);
    if (!unit) return undefined;
    const sign = n.fn === 'divide' ? -1 : 1;
    const value = sign > 0 ? left.value * unit.factor : left.value / unit.factor;
    const dims = addDims(left.dims, unit.dims, sign);
    const hint = left.hint ? `${left.hint}${sign > 0 ? '*' : '/'}${unit.text}` : unit.text;
    return constant(numType(dims, hint), value);
  }

  private numberOrQuantity(n: MathNode): { value: number; dims: readonly number[]; hint?: string } | undefined {
    const q = this.quantityOnly(n);
    if (q) return q;
    const v = pureConstant(n);
    return v === undefined ? undefined : { value: v, dims: DIMLESS };
  }

  private quantityOnly(n: MathNode): { value: number; dims: readonly number[]; hint?: string } | undefined {
    const q = this.quantity(n);
    if (!q?.constant || q.type.t !== 'num') return undefined;
    return { value: q.constant.value as number, dims: q.type.dims, hint: q.type.hint };
  }

  private unitExpr(n: MathNode, strict: boolean): { factor: number; dims: readonly number[]; text: string } | undefined {
    if (isSymbol(n)) {
      const name = n.name;
      if (this.scope.isCell(name) || !isUnitName(name)) return undefined;
      if (strict && name.length === 1 && !SHORT_UNITS_AFTER_OPERATOR.has(name)) return undefined;
      const u = unitInfo(name);
      return { factor: u.factor, dims: u.dims, text: name };
    }
    if (isParenthesis(n)) {
      const u = this.unitExpr(n.content, strict);
      return u && { ...u, text: `(${u.text})` };
    }
    if (isOperator(n) && n.fn === 'pow') {
      const base = this.unitExpr(n.args[0], strict);
      const p = pureConstant(n.args[1]);
      if (!base || p === undefined) return undefined;
      return { factor: Math.pow(base.factor, p), dims: scaleDims(base.dims, p), text: `${base.text}^${p}` };
    }
    if (isOperator(n) && (n.fn === 'multiply' || n.fn === 'divide') && n.args.length === 2) {
      const a = this.unitExpr(n.args[0], strict);
      const b = a && this.unitExpr(n.args[1], strict || !n.implicit);
      if (!a || !b) return undefined;
      const div = n.fn === 'divide';
      return {
        factor: div ? a.factor / b.factor : a.factor * b.factor,
        dims: addDims(a.dims, b.dims, div ? -1 : 1),
        text: `${a.text}${div ? '/' : '*'}${b.text}`,
      };
    }
    return undefined;
  }

  private operator(n: OpNode, depth: number): CNode {
    const op: string = n.op;
    const args: CNode[] = n.args.map((a) => this.node(a, depth + 1));
    if (args.length === 1) {
      const [x] = args;
      if (op === '-' || op === '+') {
        this.needNum(x, op);
        return op === '-' ? derive(x.type, [x], (x0: number) => -x0) : x;
      }
      if (op === 'not') {
        this.needBool(x, 'not');
        return derive(BOOL, [x], (x0: unknown) => !x0);
      }
      return this.fail('not-allowed', `the operator ${op} is not part of the formula language`);
    }
    const [x, y] = args;
    switch (op) {
      case '+':
      case '-': {
        this.needSame(x, y, op === '+' ? 'add' : 'subtract');
        return arithmetic(op, x.type, x, y);
      }
      case '*':
      case '/': {
        this.needNum(x, op);
        this.needNum(y, op);
        const div = op === '/';
        const dims = addDims(dimsOf(x), dimsOf(y), div ? -1 : 1);
        // Scaling by a pure number keeps the unit people typed: 8 * 1.00 in^2 is still in^2.
        const hint = isDimless(dimsOf(y)) ? hintOf(x) : !div && isDimless(dimsOf(x)) ? hintOf(y) : undefined;
        return arithmetic(op, numType(dims, hint), x, y);
      }
      case '^':
        return this.power(x, y);
      case '<':
      case '>':
      case '<=':
      case '>=':
        this.needSame(x, y, 'compare');
        this.needNum(x, op);
        return derive(BOOL, args, compareFn(op));
      case '==':
      case '!=': {
        this.needSame(x, y, 'compare');
        const eq = x.type.t === 'num' ? approxEqual : (a: unknown, b: unknown) => a === b;
        return derive(BOOL, args, op === '==' ? (p: unknown, q: unknown) => eq(p, q) : (p: unknown, q: unknown) => !eq(p, q));
      }
      case 'and':
      case 'or':
      case 'xor': {
        this.needBool(x, op);
        this.needBool(y, op);
        const f = op === 'and' ? (p: unknown, q: unknown) => !!p && !!q : op === 'or' ? (p: unknown, q: unknown) => !!p || !!q : (p: unknown, q: unknown) => !!p !== !!q;
        return derive(BOOL, args, f);
      }
      default:
        return this.fail('not-allowed', `the operator ${op} is not part of the formula language`);
    }
  }

  private power(x: CNode, y: CNode): CNode {
    this.needNum(x, '^');
    this.needNum(y, '^');
    if (!isDimless(dimsOf(y))) this.fail('unit', `an exponent must be a pure number, got ${describeType(y.type)}`);
    if (isDimless(dimsOf(x))) return derive(NUMBER, [x, y], Math.pow);
    if (!y.constant) {
      this.fail('unit', `${describeType(x.type)} can only be raised to a fixed power (e.g. ^2 or ^0.5), not to a computed one`);
    }
    const p = y.constant.value as number;
    return derive(numType(scaleDims(dimsOf(x), p)), [x, y], p === 2 ? (b: number) => b * b : p === 0.5 ? (b: number) => Math.sqrt(b) : Math.pow);
  }

  private conditional(n: ConditionalNode, depth: number): CNode {
    const c = this.node(n.condition, depth + 1);
    const a = this.node(n.trueExpr, depth + 1);
    const b = this.node(n.falseExpr, depth + 1);
    this.needBool(c, 'the condition of ? :');
    this.needSame(a, b, 'choose between');
    const ce = c.ev, ae = a.ev, be = b.ev;
    const node: CNode = { type: a.type, ev: (v) => (ce(v) ? ae(v) : be(v)) };
    if (c.constant && a.constant && b.constant) node.constant = { value: node.ev([]) };
    return node;
  }

  private relational(n: RelationalNode, depth: number): CNode {
    const params: CNode[] = n.params.map((p) => this.node(p, depth + 1));
    const tests = n.conditionals.map((c, i) => {
      const op = ({ smaller: '<', larger: '>', smallerEq: '<=', largerEq: '>=', equal: '==', unequal: '!=' } as Record<string, string>)[c];
      if (!op) this.fail('not-allowed', `the comparison ${c} is not part of the formula language`);
      this.needSame(params[i], params[i + 1], 'compare');
      const cmp = compareFn(op);
      const f = op === '==' ? (a: unknown, b: unknown) => approxEqual(a, b) : op === '!=' ? (a: unknown, b: unknown) => !approxEqual(a, b) : (a: unknown, b: unknown) => cmp(a as number, b as number);
      return { i, f };
    });
    return derive(BOOL, params, (...v: unknown[]) => tests.every(({ i, f }) => f(v[i], v[i + 1])));
  }

  private call(n: CallNode, depth: number): CNode {
    if (!isSymbol(n.fn)) return this.fail('not-allowed', 'only named functions can be called');
    const name = n.fn.name;
    const args: CNode[] = n.args.map((a) => this.node(a, depth + 1));
    const builtin = BUILTINS.get(name);
    if (builtin) {
      if (args.length < builtin.minArgs || args.length > builtin.maxArgs) {
        this.fail('syntax', `${builtin.signature} takes ${arity(builtin.minArgs, builtin.maxArgs)}, got ${args.length}`, name);
      }
      const t = builtin.type(args.map((a) => a.type));
      if (typeof t === 'string') this.fail('unit', `${name}: ${t}`, name);
      const fn = builtin.fn;
      return derive(t, args, fn);
    }
    const lib = this.scope.functions.get(name);
    if (!lib) {
      this.fail('unknown-name', unknownFunction(name, this.scope.functions), name);
    }
    return this.library(lib, args, name);
  }

  private library(lib: LibFunction<unknown>, args: CNode[], name: string): CNode {
    const max = lib.params.length;
    const min = max - (lib.optional ?? 0);
    if (args.length < min || args.length > max) {
      this.fail('syntax', `${signatureOf(lib)} takes ${arity(min, max)}, got ${args.length}`, name);
    }
    args.forEach((a, i) => {
      const p = lib.params[i];
      const want = typeFromDeclaration(p.type);
      if (!sameType(a.type, want)) {
        this.fail('unit', `${name}: argument ${i + 1} (${p.name}) must be ${describeType(want)}, got ${describeType(a.type)}`, name);
      }
      if (p.choices && a.constant && !p.choices.includes(a.constant.value as string)) {
        this.fail('library', `${name}: ${p.name} must be one of ${p.choices.join(', ')}; got "${String(a.constant.value)}"`, name);
      }
    });
    if (!this.clauses.includes(lib.clause)) this.clauses.push(lib.clause);
    const fn = this.scope.wrapLibrary ? this.scope.wrapLibrary(lib, args.map((a) => a.type)) : lib.fn;
    const node = derive(typeFromDeclaration(lib.returns), args, (...v: unknown[]) => {
      try {
        return fn(...v);
      } catch (e) {
        throw new CellError('library', `${name}: ${(e as Error).message}`);
      }
    });
    return node;
  }

  private needNum(x: CNode, what: string): void {
    if (x.type.t !== 'num') this.fail('unit', `${what} needs numbers, got ${describeType(x.type)}`);
  }

  private needBool(x: CNode, what: string): void {
    if (x.type.t !== 'bool') this.fail('unit', `${what} needs a true/false value (a comparison), got ${describeType(x.type)}`);
  }

  private needSame(x: CNode, y: CNode, verb: string): void {
    if (!sameType(x.type, y.type)) {
      this.fail('unit', `cannot ${verb} ${describeType(x.type)} and ${describeType(y.type)}: the units do not agree`);
    }
  }
}

export function signatureOf(lib: LibFunction<unknown>): string {
  const req = lib.params.length - (lib.optional ?? 0);
  return `${lib.name}(${lib.params.map((p, i) => (i >= req ? `[${p.name}]` : p.name)).join(', ')})`;
}

function finish(c: Compiler, root: CNode): CompiledExpr {
  return { type: root.type, inputs: c.inputs, reads: c.reads, clauses: c.clauses, run: root.ev };
}

/** Compile a formula expression. Throws CellError. */
export function compileExpression(source: string, scope: CompileScope): CompiledExpr {
  const ast = parseFormula(source);
  const c = new Compiler(source, scope);
  return finish(c, c.node(ast, 0));
}
