// The closures a compiled formula is made of: each node becomes a function of the
// input slots, folded to a constant when it reads no cell. Plain numbers throughout.

import { DIMLESS } from '../units/dimension';
import { isConstant, isOperator, isParenthesis, type MathNode } from './nodes';
import type { VType } from './value-type';

export type Ev = (a: readonly unknown[]) => unknown;

export interface CNode {
  type: VType;
  ev: Ev;
  /** Present when the node reads no cell: its value, computed once. */
  constant?: { value: unknown };
}

export function constant(type: VType, value: unknown): CNode {
  return { type, ev: () => value, constant: { value } };
}

/** A node computed from others; folded to a constant when all of them are. */
/**
 * A function of plain values whose types the compiler has checked (numbers in SI, texts,
 * booleans). Declared as a method, so each one names its own argument types.
 */
export type Kernel = { run(...values: unknown[]): unknown }['run'];

export function derive(type: VType, args: CNode[], f: Kernel): CNode {
  if (args.every((a) => a.constant)) return constant(type, f(...args.map((a) => a.constant!.value)));
  // Fixed-arity closures: no argument arrays on the hot path.
  const evs = args.map((a) => a.ev);
  switch (evs.length) {
    case 1: {
      const [e0] = evs;
      return { type, ev: (a) => f(e0(a)) };
    }
    case 2: {
      const [e0, e1] = evs;
      if (args[1].constant) {
        const c = args[1].constant.value;
        return { type, ev: (a) => f(e0(a), c) };
      }
      return { type, ev: (a) => f(e0(a), e1(a)) };
    }
    case 3: {
      const [e0, e1, e2] = evs;
      return { type, ev: (a) => f(e0(a), e1(a), e2(a)) };
    }
    default:
      return { type, ev: (a) => f(...evs.map((e) => e(a))) };
  }
}

/** + − × ÷ with the operator written into the closure, and a constant operand inlined. */
export function arithmetic(op: string, type: VType, x: CNode, y: CNode): CNode {
  if (x.constant && y.constant) {
    const p = x.constant.value as number, q = y.constant.value as number;
    return constant(type, op === '+' ? p + q : op === '-' ? p - q : op === '*' ? p * q : p / q);
  }
  const e0 = x.ev as (a: readonly unknown[]) => number;
  const e1 = y.ev as (a: readonly unknown[]) => number;
  if (y.constant) {
    const c = y.constant.value as number;
    switch (op) {
      case '+': return { type, ev: (a) => e0(a) + c };
      case '-': return { type, ev: (a) => e0(a) - c };
      case '*': return { type, ev: (a) => e0(a) * c };
      default: return { type, ev: (a) => e0(a) / c };
    }
  }
  switch (op) {
    case '+': return { type, ev: (a) => e0(a) + e1(a) };
    case '-': return { type, ev: (a) => e0(a) - e1(a) };
    case '*': return { type, ev: (a) => e0(a) * e1(a) };
    default: return { type, ev: (a) => e0(a) / e1(a) };
  }
}

export function hintOf(x: CNode): string | undefined {
  return x.type.t === 'num' ? x.type.hint : undefined;
}

export function dimsOf(x: CNode): readonly number[] {
  return (x.type as { dims: readonly number[] }).dims;
}

/** A number written without any name: `2`, `-3`, `(1/2)`, `1e3`. */
export function pureConstant(n: MathNode): number | undefined {
  if (isConstant(n)) return typeof n.value === 'number' ? n.value : undefined;
  if (isParenthesis(n)) return pureConstant(n.content);
  if (isOperator(n)) {
    const vals: number[] = [];
    for (const arg of n.args) {
      const v = pureConstant(arg);
      if (v === undefined) return undefined;
      vals.push(v);
    }
    if (n.args.length === 1) return n.fn === 'unaryMinus' ? -vals[0] : n.fn === 'unaryPlus' ? vals[0] : undefined;
    const [a, b] = vals;
    switch (n.fn) {
      case 'add': return a + b;
      case 'subtract': return a - b;
      case 'multiply': return a * b;
      case 'divide': return a / b;
      case 'pow': return Math.pow(a, b);
    }
  }
  return undefined;
}

export function compareFn(op: string): (p: number, q: number) => boolean {
  switch (op) {
    case '<': return (p, q) => p < q;
    case '>': return (p, q) => p > q;
    case '<=': return (p, q) => p <= q;
    default: return (p, q) => p >= q;
  }
}

/** Numbers equal to 12 significant figures count as equal (unit conversions leave crumbs). */
export function approxEqual(a: unknown, b: unknown): boolean {
  if (typeof a !== 'number' || typeof b !== 'number') return a === b;
  return a === b || Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b));
}

export function arity(min: number, max: number): string {
  if (min === max) return `${min} argument${min === 1 ? '' : 's'}`;
  return `${min} to ${max} arguments`;
}


export { DIMLESS };
