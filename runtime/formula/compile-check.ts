// Compiling a check: `demand <= capacity` (or `capacity >= demand`) gives a ratio,
// any other true/false expression is a plain condition.

import { isOperator, isParenthesis, type MathNode } from './nodes';
import type { LibFunction } from '../library/types';
import { CellError } from './cell-error';
import type { Ev } from './closures';
import { compileExpression, Compiler, type CompileScope } from './compile';
import { parseFormula } from './parse';
import { describeType, NUMBER, sameType, type VType } from './value-type';

/**
 * Syntax and forbidden constructs only, with every name taken as a pure number:
 * used where a full compile cannot run (a cell inside a loop).
 */
export function structuralProblem(source: string, functions: ReadonlyMap<string, LibFunction<unknown>>): CellError | undefined {
  const scope: CompileScope = {
    lookup: (name) => ({ key: name, type: NUMBER }),
    isCell: () => true,
    names: () => [],
    functions,
  };
  try {
    compileExpression(source, scope);
  } catch (e) {
    if (e instanceof CellError && (e.kind === 'syntax' || e.kind === 'not-allowed')) return e;
  }
  return undefined;
}

export interface CompiledCheck {
  /** Demand/capacity form, or a plain condition. */
  form: 'ratio' | 'condition';
  inputs: string[];
  reads: string[];
  clauses: string[];
  demand?: { type: VType; run: Ev; source: MathNode };
  capacity?: { type: VType; run: Ev; source: MathNode };
  /** Evaluates to true when the check passes. */
  pass: Ev;
}

const RATIO_OPS: Record<string, 'le' | 'ge'> = { '<=': 'le', '<': 'le', '>=': 'ge', '>': 'ge' };

/**
 * Compile a check. `demand <= capacity` (or `capacity >= demand`) gives a
 * demand/capacity ratio; anything else true/false is a plain condition.
 */
export function compileCheck(source: string, scope: CompileScope): CompiledCheck {
  const ast = parseFormula(source);
  const c = new Compiler(source, scope);
  const top = isParenthesis(ast) ? ast.content : ast;
  const dir = isOperator(top) && top.args.length === 2 ? RATIO_OPS[top.op] : undefined;
  if (dir && isOperator(top)) {
    const left = c.node(top.args[0], 1);
    const right = c.node(top.args[1], 1);
    if (left.type.t === 'num' && sameType(left.type, right.type)) {
      const [d, k, dn, kn] = dir === 'le' ? [left, right, top.args[0], top.args[1]] : [right, left, top.args[1], top.args[0]];
      const strict = top.op === '<' || top.op === '>';
      const de = d.ev, ke = k.ev;
      return {
        form: 'ratio',
        inputs: c.inputs,
        reads: c.reads,
        clauses: c.clauses,
        demand: { type: d.type, run: de, source: dn },
        capacity: { type: k.type, run: ke, source: kn },
        pass: strict ? (v) => (de(v) as number) < (ke(v) as number) : (v) => (de(v) as number) <= (ke(v) as number),
      };
    }
  }
  const root = c.node(ast, 0);
  if (root.type.t !== 'bool') {
    throw new CellError('unit', `a check must be a comparison such as Vu <= phiVc, or a true/false condition; this gives ${describeType(root.type)}`);
  }
  return { form: 'condition', inputs: c.inputs, reads: c.reads, clauses: c.clauses, pass: root.ev };
}

