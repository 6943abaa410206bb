// The one mathjs instance Loadtrace uses: for parsing formulas and for its unit
// tables. Formulas are never evaluated by mathjs (the engine compiles its own
// closures on plain numbers), but the instance is still locked down so nothing
// reachable from it can redefine units, switch number types or evaluate text.

import { create, createUnitDependencies, parseDependencies, unitDependencies, type MathJsInstance } from 'mathjs';
import { addTradeUnits } from './trade';

function build(): MathJsInstance {
  // Only what the engine uses (the parser and the unit tables), not `all`: a third of
  // the bundle, and the app starts without building every mathjs function.
  const math = create({ parseDependencies, unitDependencies, createUnitDependencies }, { predictable: true }) as MathJsInstance;
  addTradeUnits(math);
  const refuse = (name: string) => () => {
    throw new Error(`${name} is not available in Loadtrace formulas`);
  };
  // Keep `parse` and `unit` for the engine; everything that evaluates text,
  // changes the instance or builds new units is replaced.
  const parse = math.parse;
  const unit = math.unit;
  const blocked = [
    'import', 'createUnit', 'evaluate', 'compile', 'simplify', 'simplifyConstant',
    'simplifyCore', 'derivative', 'resolve', 'reviver', 'replacer', 'config', 'chain',
    'rationalize', 'parser', 'leafCount', 'symbolicEqual', 'help',
  ];
  const overrides: Record<string, () => never> = {};
  for (const name of blocked) overrides[name] = refuse(name);
  math.import(overrides, { override: true });
  return Object.assign(math, { parse, unit });
}

export const math = build();
