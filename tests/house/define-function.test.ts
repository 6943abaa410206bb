// defineFunction keeps a library function's params and its arguments in step, and
// defineFigure a figure function's: each `@ts-expect-error` below is a definition the
// compiler refuses (npm test's typecheck fails if one of them compiles), and the last of
// each is one it accepts.

import { describe, expect, it } from 'vitest';
import { defineFigure } from '../../runtime/figures/functions';
import type { FigureSpec } from '../../runtime/figures/spec';
import { defineFunction } from '../../runtime/library/types';
import { workingOf } from '../../runtime/working/run';

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

describe('defineFigure', () => {
  const figure = { clause: 'test', doc: 'test' };
  const spec = (b: number): FigureSpec => ({ figure: 'footing', units: {}, system: 'US', B: b, L: b, h: 1, c1: 0.1, c2: 0.1, d: 0.5, bar: '#5', db: 0.016, s: 0.3, qu: 1 });

  it('refuses a builder out of step with its params, or one that gives no figure, at compile time', () => {
    const wrong = [
      // @ts-expect-error a 'text' param hands the builder a string, not a number
      defineFigure({ ...figure, name: 'a', params: [{ name: 'x', type: 'text' }], build: (x: number) => spec(x) }),
      // @ts-expect-error one argument more than there are params
      defineFigure({ ...figure, name: 'b', params: [{ name: 'x', type: 'm' }], build: (x: number, y: number) => spec(x + y) }),
      // @ts-expect-error a figure function gives a figure spec, not a number
      defineFigure({ ...figure, name: 'c', params: [{ name: 'x', type: 'm' }], build: (x: number) => x }),
    ];
    expect(wrong).toHaveLength(3);
  });

  it('accepts one in step, and marks its result a figure for the compiler', () => {
    const f = defineFigure({ ...figure, name: 'ok', params: [{ name: 'B', type: 'm' }], build: (b: number) => spec(b) });
    expect(f.returns).toBe('figure');
    expect(f.fn(2)).toMatchObject({ figure: 'footing', B: 2 });
    expect(workingOf(f, [2]).error).toBe('ok gives no value'); // a drawing has no working of values
  });
});
