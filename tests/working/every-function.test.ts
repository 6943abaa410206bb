// Every library function shows its working: over random valid arguments (fast-check), the
// working recorded while the function computes ends in the value it returns, each step's
// expression evaluated on the values it shows gives the value it shows, and every name it
// shows was given. A function with no recorded steps fails here.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { libraryFunctions } from '../../runtime/library/index';
import { LibraryError, type LibValue } from '../../runtime/library/types';
import { argsArb } from './arbitrary-args';
import { checkCall } from './check-working';

/** The plate solver is slow: fewer samples for it. */
const RUNS = (name: string) => (name.startsWith('plate_') ? 6 : 60);
const ONLY = process.env.WORKING_ONLY ? new RegExp(process.env.WORKING_ONLY) : undefined;

describe('every library function records its working', () => {
  for (const f of libraryFunctions) {
    if (ONLY && !ONLY.test(f.name)) continue;
    it(`${f.name}: last step = value returned; every step evaluates to what it shows`, () => {
      let valid = 0;
      fc.assert(
        fc.property(argsArb(f), (args: LibValue[]) => {
          try {
            f.fn(...args);
          } catch (e) {
            if (e instanceof LibraryError) return; // not a valid call: the function refused it
            throw e;
          }
          valid++;
          const { problems } = checkCall(f, args);
          expect(problems, `${f.name}(${args.map(String).join(', ')})`).toEqual([]);
        }),
        { numRuns: RUNS(f.name), seed: 18 },
      );
      if (process.env.WORKING_COUNTS) console.log(f.name, valid);
      expect(valid, `${f.name}: valid random calls`).toBeGreaterThanOrEqual(f.name.startsWith('plate_') ? 2 : 8);
    });
  }
});
