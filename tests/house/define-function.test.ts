// defineFunction keeps a library function's params and its arguments in step: each
// `@ts-expect-error` below is a definition the compiler refuses (npm test's typecheck
// fails if one of them compiles), and the last is one it accepts.

import { describe, expect, it } from 'vitest';
import { defineFunction } from '../../runtime/library/types';

const base = { returns: 'm', clause: 'test', doc: 'test' };

describe('defineFunction', () => {
  it('refuses a function out of step with its params, at compile time', () => {
    const wrong = [
      // @ts-expect-error a 'text' param hands the function a string, not a number
      defineFunction({ ...base, name: 'a', params: [{ name: 'x', type: 'text' }], fn: (x: number) => x }),
      // @ts-expect-error a length param hands a number, not a string
      defineFunction({ ...base, name: 'b', params: [{ name: 'x', type: 'm' }], fn: (x: string) => x }),
      // @ts-expect-error one argument more than there are params
      defineFunction({ ...base, name: 'c', params: [{ name: 'x', type: 'm' }], fn: (x: number, y: number) => x + y }),
      // @ts-expect-error one argument fewer than there are params
      defineFunction({ ...base, name: 'd', params: [{ name: 'x', type: 'm' }, { name: 'y', type: 'm' }], fn: (x: number) => x }),
      // @ts-expect-error a choice param hands one of its choices: the function must take them all
      defineFunction({ ...base, name: 'e', params: [{ name: 'p', type: 'text', choices: ['edge', 'corner'] }], fn: (p: 'edge') => p.length }),
    ];
    expect(wrong).toHaveLength(5);
  });

  it('accepts one in step, optional arguments included', () => {
    const f = defineFunction({
      ...base, name: 'ok', optional: 1,
      params: [{ name: 'x', type: 'm' }, { name: 'p', type: 'text', choices: ['edge', 'corner'] }, { name: 'b', type: 'bool' }],
      fn: (x: number, p: 'edge' | 'corner', b?: boolean) => (b ? x : x + p.length),
    });
    expect(f.fn(2, 'edge', true)).toBe(2);
    expect(f.params.map((p) => p.name)).toEqual(['x', 'p', 'b']);
  });
});
