// The general functions a formula may call besides the structural library:
// each with a type rule (checked at compile time) and a plain-number body.

import { DIMLESS, isDimless, sameDims, scaleDims, unitInfo } from '../units/dimension';
import type { Kernel } from './closures';
import { describeType, NUMBER, numType, type VType } from './value-type';

export interface Builtin {
  name: string;
  signature: string;
  doc: string;
  minArgs: number;
  maxArgs: number;
  /** Result type, or a sentence saying what is wrong with the arguments. */
  type(args: VType[]): VType | string;
  fn: Kernel;
}

const ANGLE = unitInfo('rad').dims;

function allNum(args: VType[]): string | undefined {
  const bad = args.findIndex((a) => a.t !== 'num');
  return bad < 0 ? undefined : `argument ${bad + 1} is ${describeType(args[bad])}, not a number`;
}

function sameAll(args: VType[]): VType | string {
  const e = allNum(args);
  if (e) return e;
  const first = args[0] as { t: 'num'; dims: readonly number[]; hint?: string };
  for (let i = 1; i < args.length; i++) {
    const a = args[i] as { dims: readonly number[] };
    if (!sameDims(first.dims, a.dims)) {
      return `its arguments must have the same units: argument 1 is ${describeType(first)}, argument ${i + 1} is ${describeType(args[i])}`;
    }
  }
  return first;
}

function pureNumbers(args: VType[]): VType | string {
  const e = allNum(args);
  if (e) return e;
  const bad = args.findIndex((a) => a.t === 'num' && !isDimless(a.dims));
  return bad < 0 ? NUMBER : `argument ${bad + 1} must be a pure number, got ${describeType(args[bad])}`;
}

function root(k: number) {
  return (args: VType[]): VType | string => {
    const e = allNum(args);
    if (e) return e;
    return numType(scaleDims((args[0] as { dims: readonly number[] }).dims, 1 / k));
  };
}

function angleOrNumber(args: VType[]): VType | string {
  const a = args[0];
  if (a.t === 'num' && (isDimless(a.dims) || sameDims(a.dims, ANGLE))) return NUMBER;
  return `its argument must be an angle (e.g. 30 deg), got ${describeType(a)}`;
}

function toAngle(args: VType[]): VType | string {
  const r = pureNumbers(args);
  return typeof r === 'string' ? r : numType(ANGLE, 'rad');
}

function stepRound(round: (x: number) => number) {
  return (x: number, step: number) => {
    if (!(step > 0)) throw new Error('the step must be greater than zero');
    // Snap values a rounding error away from a whole step onto it.
    const n = x / step;
    const near = Math.round(n);
    return (Math.abs(n - near) < 1e-9 ? near : round(n)) * step;
  };
}

const list: Builtin[] = [
  { name: 'sqrt', signature: 'sqrt(x)', doc: 'Square root; the unit is rooted too.', minArgs: 1, maxArgs: 1, type: root(2), fn: Math.sqrt },
  { name: 'cbrt', signature: 'cbrt(x)', doc: 'Cube root.', minArgs: 1, maxArgs: 1, type: root(3), fn: Math.cbrt },
  { name: 'abs', signature: 'abs(x)', doc: 'Absolute value.', minArgs: 1, maxArgs: 1, type: sameAll, fn: Math.abs },
  { name: 'min', signature: 'min(a, b, ...)', doc: 'Least of its arguments (same units).', minArgs: 1, maxArgs: 32, type: sameAll, fn: Math.min },
  { name: 'max', signature: 'max(a, b, ...)', doc: 'Greatest of its arguments (same units).', minArgs: 1, maxArgs: 32, type: sameAll, fn: Math.max },
  { name: 'hypot', signature: 'hypot(a, b, ...)', doc: 'Square root of the sum of squares.', minArgs: 1, maxArgs: 32, type: sameAll, fn: Math.hypot },
  {
    name: 'clamp', signature: 'clamp(x, lo, hi)', doc: 'x limited to the range lo..hi.', minArgs: 3, maxArgs: 3, type: sameAll,
    fn: (x: number, lo: number, hi: number) => Math.min(Math.max(x, lo), hi),
  },
  { name: 'ceil_to', signature: 'ceil_to(x, step)', doc: 'x rounded up to a whole number of steps (e.g. ceil_to(B, 3 in)).', minArgs: 2, maxArgs: 2, type: sameAll, fn: stepRound(Math.ceil) },
  { name: 'floor_to', signature: 'floor_to(x, step)', doc: 'x rounded down to a whole number of steps.', minArgs: 2, maxArgs: 2, type: sameAll, fn: stepRound(Math.floor) },
  { name: 'round_to', signature: 'round_to(x, step)', doc: 'x rounded to the nearest whole number of steps.', minArgs: 2, maxArgs: 2, type: sameAll, fn: stepRound(Math.round) },
  { name: 'ceil', signature: 'ceil(x)', doc: 'Round a pure number up.', minArgs: 1, maxArgs: 1, type: pureNumbers, fn: Math.ceil },
  { name: 'floor', signature: 'floor(x)', doc: 'Round a pure number down.', minArgs: 1, maxArgs: 1, type: pureNumbers, fn: Math.floor },
  {
    name: 'round', signature: 'round(x, digits)', doc: 'Round a pure number (to digits decimals).', minArgs: 1, maxArgs: 2, type: pureNumbers,
    fn: (x: number, n: number = 0) => {
      const k = Math.pow(10, Math.round(n));
      return Math.round(x * k) / k;
    },
  },
  { name: 'exp', signature: 'exp(x)', doc: 'e to the power x.', minArgs: 1, maxArgs: 1, type: pureNumbers, fn: Math.exp },
  {
    name: 'log', signature: 'log(x, base)', doc: 'Natural logarithm, or to a base.', minArgs: 1, maxArgs: 2, type: pureNumbers,
    fn: (x: number, b?: number) => (b === undefined ? Math.log(x) : Math.log(x) / Math.log(b)),
  },
  { name: 'log10', signature: 'log10(x)', doc: 'Logarithm to base 10.', minArgs: 1, maxArgs: 1, type: pureNumbers, fn: Math.log10 },
  { name: 'sin', signature: 'sin(angle)', doc: 'Sine.', minArgs: 1, maxArgs: 1, type: angleOrNumber, fn: Math.sin },
  { name: 'cos', signature: 'cos(angle)', doc: 'Cosine.', minArgs: 1, maxArgs: 1, type: angleOrNumber, fn: Math.cos },
  { name: 'tan', signature: 'tan(angle)', doc: 'Tangent.', minArgs: 1, maxArgs: 1, type: angleOrNumber, fn: Math.tan },
  { name: 'asin', signature: 'asin(x)', doc: 'Arcsine, as an angle.', minArgs: 1, maxArgs: 1, type: toAngle, fn: Math.asin },
  { name: 'acos', signature: 'acos(x)', doc: 'Arccosine, as an angle.', minArgs: 1, maxArgs: 1, type: toAngle, fn: Math.acos },
  { name: 'atan', signature: 'atan(x)', doc: 'Arctangent, as an angle.', minArgs: 1, maxArgs: 1, type: toAngle, fn: Math.atan },
  {
    name: 'atan2', signature: 'atan2(y, x)', doc: 'Angle of the point (x, y).', minArgs: 2, maxArgs: 2,
    type: (a) => {
      const r = sameAll(a);
      return typeof r === 'string' ? r : numType(ANGLE, 'rad');
    },
    fn: Math.atan2,
  },
  {
    name: 'sign', signature: 'sign(x)', doc: '-1, 0 or 1.', minArgs: 1, maxArgs: 1,
    type: (a) => allNum(a) ?? NUMBER, fn: Math.sign,
  },
];

export const BUILTINS: ReadonlyMap<string, Builtin> = new Map(list.map((b) => [b.name, b]));
export { DIMLESS };
