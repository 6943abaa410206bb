// The one mathjs instance Loadtrace uses: for parsing formulas and for its unit
// tables. Formulas are never evaluated by mathjs (the engine compiles its own
// closures on plain numbers), but the instance is still locked down so nothing
// reachable from it can redefine units, switch number types or evaluate text.

import {
  BigNumberDependencies, ComplexDependencies, create, createCreateUnit, createUnitClass, createUnitFunction,
  FractionDependencies, type FactoryFunction, type FactoryFunctionMap, type MathJsInstance,
} from 'mathjs';
import {
  absDependencies, addScalarDependencies, divideScalarDependencies, equalDependencies, fixDependencies,
  formatDependencies, isNumericDependencies, multiplyScalarDependencies, numberDependencies, parseDependencies,
  powDependencies, roundDependencies, subtractScalarDependencies,
} from 'mathjs/number';
import { addTradeUnits } from './trade';

// mathjs exports the factory of each class and function from its entry points; its type
// declarations list only (most of) the dependency groups, and the Unit groups pull in the
// general (matrix, BigNumber, Complex) arithmetic this instance is built to leave out.
declare module 'mathjs' {
  export const subtractScalarDependencies: FactoryFunctionMap;
  export const createUnitClass: FactoryFunction<unknown>;
  export const createUnitFunction: FactoryFunction<unknown>;
  export const createCreateUnit: FactoryFunction<unknown>;
}

function build(): MathJsInstance {
  // Only what the engine uses: the parser (number-only build: no matrix machinery behind
  // its nodes) and the Unit class with number-only arithmetic. Building the general
  // typed functions the Unit class would otherwise get took most of the start-up time
  // (npm run bench:mathjs). Values are plain numbers (`predictable`, config.number is
  // 'number'); the BigNumber, Complex and Fraction classes stay because the unit tables
  // hold a few such values (degF, VAR).
  const math = create({
    parseDependencies,
    BigNumberDependencies, ComplexDependencies, FractionDependencies,
    addScalarDependencies, subtractScalarDependencies, multiplyScalarDependencies, divideScalarDependencies,
    powDependencies, absDependencies, fixDependencies, roundDependencies, equalDependencies,
    isNumericDependencies, formatDependencies, numberDependencies,
    createUnitClass, createUnitFunction, createCreateUnit,
  }, { predictable: true }) as MathJsInstance;
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
