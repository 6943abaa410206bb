// The mathjs parse-tree nodes the formula language reads, with type guards: mathjs's
// own node types (its MathNode is one interface, not a union to switch on), so the
// compiler reads each node's fields as mathjs declares them.

import type {
  ConditionalNode, ConstantNode, FunctionNode, MathNode, OperatorNode, OperatorNodeFn, OperatorNodeOp,
  ParenthesisNode, RelationalNode, SymbolNode,
} from 'mathjs';

export type { ConditionalNode, MathNode, RelationalNode, SymbolNode };
/** An operator node of any operator. */
export type OpNode = OperatorNode<OperatorNodeOp, OperatorNodeFn>;
/** A constant as the parser makes it: a number, a quoted text, true/false, null. */
export type ConstNode = ConstantNode<string | number | boolean | null | undefined>;
/** A call; the parser also calls things that are not names (a.b(), f(1)(2)), which the compiler refuses. */
export type CallNode = FunctionNode<MathNode>;

export const isSymbol = (n: MathNode): n is SymbolNode => n.type === 'SymbolNode';
export const isConstant = (n: MathNode): n is ConstNode => n.type === 'ConstantNode';
export const isParenthesis = (n: MathNode): n is ParenthesisNode => n.type === 'ParenthesisNode';
export const isOperator = (n: MathNode): n is OpNode => n.type === 'OperatorNode';
export const isConditional = (n: MathNode): n is ConditionalNode => n.type === 'ConditionalNode';
export const isRelational = (n: MathNode): n is RelationalNode => n.type === 'RelationalNode';
export const isCall = (n: MathNode): n is CallNode => n.type === 'FunctionNode';

/** The node inside any number of brackets. */
export function unbracket(n: MathNode): MathNode {
  while (isParenthesis(n)) n = n.content;
  return n;
}
