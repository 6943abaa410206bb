// One call of a library function as a formula made it: the function, the values it was
// given and the units they were written in. A type of its own, so the engine's types can
// name it without importing the formula compiler that captures calls (runtime/working/calls.ts).

import type { LibFunction, LibValue } from './types';

export interface LibraryCall {
  lib: LibFunction<unknown>;
  args: LibValue[];
  /** The unit each argument was written in, when the formula says (`5000 psi`, a cell's unit). */
  units: (string | undefined)[];
}
