// A check cell as a hand calc: the condition with names, the same with values,
// demand against capacity, the ratio, and the outcome in words.

import type { MathNode } from 'mathjs';
import type { CellState } from '../engine-types';
import { exprTex, parseForDisplay, type HandCalcScope } from './formula';
import { clippedTex, nameTex, textTex } from './names';
import { numberTex, quantityTex } from './quantity';

const RELATIONS: Record<string, { tex: string; demandFirst: boolean }> = {
  smallerEq: { tex: '\\le', demandFirst: true },
  smaller: { tex: '<', demandFirst: true },
  largerEq: { tex: '\\ge', demandFirst: false },
  larger: { tex: '>', demandFirst: false },
};

export interface CheckTex {
  /** The condition with names, e.g. {V_{\mathrm{u}}} \le {\phi V_{\mathrm{c}}}. */
  condition: string;
  /** The condition with values put in; demand and capacity when the engine gives them. */
  substituted?: string;
  /** demand / capacity = ratio, when the check has a ratio. */
  ratio?: string;
  /** "OK" or "NOT OK" as TeX text; undefined while pending or on an error. */
  verdict?: string;
  /** Everything on one line, parts joined by \quad. */
  line: string;
}

function unwrap(node: MathNode): MathNode {
  let n: any = node;
  while (n.type === 'ParenthesisNode') n = n.content;
  return n;
}

/** The ratio figure to show: two decimals, as a utilisation is usually read. */
export function ratioText(ratio: number): string {
  if (!Number.isFinite(ratio)) return ratio > 0 ? '∞' : '—';
  return ratio.toFixed(2);
}

export function checkTex(
  expr: string,
  own: CellState | undefined,
  scope: HandCalcScope,
  node: MathNode | undefined = parseForDisplay(expr),
): CheckTex {
  if (!node) {
    const condition = clippedTex(expr);
    return { condition, line: condition };
  }
  const condition = exprTex(node, scope, 'symbolic');
  const top: any = unwrap(node);
  const rel = top.type === 'OperatorNode' ? RELATIONS[top.fn] : undefined;
  const done = own && (own.status === 'ok' || own.status === 'fail');
  let substituted: string | undefined;
  let ratio: string | undefined;
  if (rel && own?.demand && own.capacity) {
    const [left, right] = rel.demandFirst ? [own.demand, own.capacity] : [own.capacity, own.demand];
    substituted = `${quantityTex(left)} ${rel.tex} ${quantityTex(right)}`;
    if (own.ratio !== undefined) {
      const [dNode, cNode] = rel.demandFirst ? top.args : [top.args[1], top.args[0]];
      const frac = `\\dfrac{${exprTex(dNode, scope, 'symbolic')}}{${exprTex(cNode, scope, 'symbolic')}}`;
      ratio = `${frac} = ${numberTex(ratioText(own.ratio))}`;
    }
  } else if (done) {
    substituted = exprTex(node, scope, 'values');
  }
  const verdict = done ? textTex(own!.status === 'ok' ? 'OK' : 'NOT OK') : undefined;
  const line = [condition, substituted && `\\Rightarrow\\; ${substituted}`, ratio, verdict]
    .filter(Boolean)
    .join('\\qquad ');
  return { condition, substituted, ratio, verdict, line };
}

/** Symbol line for a named check, e.g. {\mathit{chk}} : condition. */
export function checkSymbol(name: string | undefined): string | undefined {
  return name ? nameTex(name) : undefined;
}
