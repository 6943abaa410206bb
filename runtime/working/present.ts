// A recorded working as the reader sees it, DOM-free: each step as one hand-calc line
// (symbol = expression = values put in = result) in TeX, with its note, clause and
// governing mark; each nested call as a foldable group headed by the call with its
// arguments and result. Both the live sheet and the record's static page draw from this.

import type { MathNode } from 'mathjs';
import type { CellState, DisplayValue } from '../engine-types';
import { displayNumber, displayOther } from '../formula/display';
import { exprTex, parseForDisplay, type HandCalcScope } from '../handcalc/formula';
import { nameTex, textTex } from '../handcalc/names';
import { quantityTex } from '../handcalc/quantity';
import { counterpart, type UnitSystem } from '../units/systems';
import type { Entry, Group, Shown, Step } from './recorder';
import type { Working } from './run';

export interface StepLine {
  kind: 'step';
  /** symbol = expression = values = result, as one TeX line. */
  tex: string;
  note?: string;
  clause?: string;
  governs?: boolean;
  /** Shown in the units the clause states (psi, in) whatever the sheet's system. */
  code?: boolean;
}

export interface CallBlock {
  kind: 'call';
  /** The library function's name. */
  fn: string;
  /** The call with its arguments, as TeX: vc_punch(5000 psi, 20 in, ...). */
  head: string;
  /** name = value for each argument. */
  inputs: string[];
  /** = result, as TeX (absent when the call failed). */
  result?: string;
  clause?: string;
  lines: WorkingLine[];
  /** The same call with the same arguments appears earlier at this level: shown once. */
  repeat?: boolean;
}

export interface MethodLine {
  kind: 'method';
  text: string;
  reference: string;
}

export interface FigureLine {
  kind: 'figure';
  fn: string;
  args: readonly (number | string | boolean)[];
}

export type WorkingLine = StepLine | CallBlock | MethodLine | FigureLine;

/** The unit a US unit is shown in on a sheet of `system`. */
function unitIn(u: string, system: UnitSystem): string {
  return system === 'US' || !u ? u : counterpart(u, 'SI');
}

/** A shown value as the hand calc prints it. */
export function shownDisplay(v: Shown, system: UnitSystem): DisplayValue {
  if (Array.isArray(v)) return displayNumber(v[0], unitIn(v[1], system));
  const x = v as number | string | boolean;
  return typeof x === 'number' ? displayNumber(x, '') : displayOther(x);
}

function stateOf(d: DisplayValue): CellState {
  return { id: '', status: 'ok', value: d.value, display: d, clauses: [], reads: [] };
}

const nodes = new Map<string, MathNode | undefined>();

/**
 * A step's expression parsed for display, without the brackets a fraction bar or a function's
 * own brackets make redundant: `Mu / (phi * b * d^2)` sets as a plain fraction. Cached by text, so
 * the typesetter's templates (kept per node) are reused.
 */
function displayNode(expr: string): MathNode | undefined {
  if (nodes.has(expr)) return nodes.get(expr);
  const parsed = parseForDisplay(expr);
  const strip = (n: MathNode, redundant: boolean): MathNode => {
    if (redundant && n.type === 'ParenthesisNode') return strip((n as unknown as { content: MathNode }).content, true);
    const op = n as unknown as { type: string; fn?: unknown };
    const inner = n.type === 'FunctionNode' || (n.type === 'OperatorNode' && op.fn === 'divide');
    return n.map((child) => strip(child, inner));
  };
  const node = parsed && strip(parsed, true);
  if (nodes.size > 2000) nodes.clear();
  nodes.set(expr, node);
  return node;
}

/** The TeX line of one step. */
export function stepTex(s: Step, sheet: UnitSystem): string {
  const system = s.code ? 'US' : sheet;
  const symbol = nameTex(s.symbol);
  const result = quantityTex(shownDisplay(s.unit && typeof s.value === 'number' ? [s.value, s.unit] : s.value, system));
  const parts = [symbol];
  const node = s.expr === undefined ? undefined : displayNode(s.expr);
  if (node) {
    const scope: HandCalcScope = {
      isCell: (n) => n in s.vars,
      state: (n) => (n in s.vars ? stateOf(shownDisplay(s.vars[n], system)) : undefined),
    };
    // A result named again (vc_a = vc_a) shows its value once.
    const same = node.type === 'SymbolNode' && (node as unknown as { name: string }).name === s.symbol;
    if (!same) parts.push(exprTex(node, scope, 'symbolic'));
    if (node.type !== 'ConstantNode') parts.push(exprTex(node, scope, 'values'));
  }
  const bare = (t: string) => t.replace(/^\{(.*)\}$/, '$1');
  if (bare(parts[parts.length - 1]) !== bare(result)) parts.push(result);
  return parts.join(' = ');
}

function inputTex(name: string, v: Shown, system: UnitSystem): string {
  return `${nameTex(name)} = ${quantityTex(shownDisplay(v, system))}`;
}

function callHead(g: Group, system: UnitSystem): string {
  const args = g.inputs.map((i) => quantityTex(shownDisplay(i.value, system))).join(',\\allowbreak\\,');
  return `\\operatorname{${g.fn.replace(/_/g, '\\_')}}(${args})`;
}

function groupKey(g: Group): string {
  return `${g.fn}(${JSON.stringify(g.inputs.map((i) => i.value))})`;
}

/** A group (the call asked about, or one nested in it) as a block of lines. */
export function callBlock(g: Group, system: UnitSystem, seen = new Set<string>()): CallBlock {
  const lines: WorkingLine[] = [];
  const here = new Set<string>();
  for (const e of g.entries) lines.push(entryLine(e, system, here));
  const block: CallBlock = {
    kind: 'call',
    fn: g.fn,
    head: callHead(g, system),
    inputs: g.inputs.map((i) => inputTex(i.name, i.value, system)),
    lines,
  };
  if (g.value !== undefined) {
    block.result = quantityTex(shownDisplay(g.unit && typeof g.value === 'number' ? [g.value, g.unit] : g.value, system));
  }
  if (g.clause) block.clause = g.clause;
  const key = groupKey(g);
  if (seen.has(key)) block.repeat = true;
  seen.add(key);
  return block;
}

function entryLine(e: Entry, system: UnitSystem, seen: Set<string>): WorkingLine {
  switch (e.kind) {
    case 'step': {
      const line: StepLine = { kind: 'step', tex: stepTex(e, system) };
      if (e.note) line.note = e.note;
      if (e.clause) line.clause = e.clause;
      if (e.governs) line.governs = true;
      if (e.code && system === 'SI') line.code = true;
      return line;
    }
    case 'group':
      return callBlock(e, system, seen);
    case 'method':
      return { kind: 'method', text: e.text, reference: e.reference };
    case 'figure':
      return { kind: 'figure', fn: e.fn, args: e.args };
  }
}

/** The working of one call, ready to draw: its block, or the error that stopped it. */
export function presentWorking(w: Working, system: UnitSystem): { block: CallBlock; error?: string } {
  const block = callBlock(w.root, system);
  return w.error ? { block, error: w.error } : { block };
}

/** Plain text of a TeX-free note, for \text{}. */
export function noteTex(note: string): string {
  return textTex(note);
}
