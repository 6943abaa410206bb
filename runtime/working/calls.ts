// The library calls of a formula or check, with the argument values they were called with:
// the cell's expression compiled again with each library function wrapped to note its call,
// then run on the values the engine holds for the cells it reads. The working of each call
// is then workingOf(call.lib, call.args): the same function on the same values.

import { compileExpression, type CompileScope } from '../formula/compile';
import type { VType } from '../formula/value-type';
import type { LibraryCall } from '../library/call';
import type { LibValue } from '../library/types';

export type { LibraryCall };

const unitOf = (t: VType): string | undefined => (t.t === 'num' ? t.hint : undefined);

/**
 * Every library call `expr` makes, in the order it makes them, when the cells it reads
 * hold `valueOf(key)` (the key of each cell's runtime variable). A call whose arguments
 * fail, or an expression that no longer compiles, gives the calls made up to there.
 */
export function captureCalls(expr: string, scope: CompileScope, valueOf: (key: string) => unknown): LibraryCall[] {
  const calls: LibraryCall[] = [];
  const wrapped: CompileScope = {
    lookup: (n) => scope.lookup(n),
    isCell: (n) => scope.isCell(n),
    names: () => scope.names(),
    functions: scope.functions,
    wrapLibrary: (lib, types) => {
      const units = types.map(unitOf);
      return (...args: unknown[]) => {
        calls.push({ lib, args: args as LibValue[], units });
        return lib.fn(...args);
      };
    },
  };
  try {
    const compiled = compileExpression(expr, wrapped);
    compiled.run(compiled.inputs.map(valueOf));
  } catch {
    // What was called before the failure is still worth showing; the cell shows the error.
  }
  return calls;
}

/** An engine's library calls as the record's static page asks for them. */
export function callsOf(engine: { libraryCalls?(id: string): LibraryCall[] }): (id: string) => LibraryCall[] {
  return (id) => engine.libraryCalls?.(id) ?? [];
}
