// When the engine computes after an edit: right after the edit's task (a microtask),
// not on the next animation frame or macrotask, and once for all edits of that task.

import { describe, expect, it } from 'vitest';
import { setInputValue } from '../../runtime/edit';
import type { LibFunction } from '../../runtime/library/types';
import { doc, formula, input, run } from './helpers';

function counter() {
  let calls = 0;
  const fn: LibFunction = {
    name: 'tick', params: [{ name: 'x', type: '1' }], returns: '1',
    clause: 'test probe', doc: 'counts its calls',
    fn: (x: number) => {
      calls++;
      return x;
    },
  };
  return { fn, calls: () => calls };
}

describe('engine scheduling', () => {
  it('an edit is computed and heard before any timer queued ahead of it runs', async () => {
    const d = doc(input('a', '1'), formula('b', 'a * 2'));
    const { engine, byName } = await run(d);
    const heard: string[][] = [];
    engine.subscribe((ids) => heard.push(ids));
    let atTimer: { heard: number; b: unknown } | undefined;
    const timer = new Promise<void>((resolve) =>
      setTimeout(() => {
        atTimer = { heard: heard.length, b: byName('b').value };
        resolve();
      }, 0),
    );
    engine.update(setInputValue(engine.doc, d.cells[0].id, '4'));
    expect(byName('b').value).toBe(2); // not inside update() itself
    await timer;
    expect(atTimer).toEqual({ heard: 1, b: 8 });
  });

  it('several edits in one task make one compute and one notification', async () => {
    const { fn, calls } = counter();
    const d = doc(input('a', '1'), formula('b', 'tick(a * 2)'));
    const { engine, byName } = await run(d, [fn]);
    expect(calls()).toBe(1);
    const heard: string[][] = [];
    engine.subscribe((ids) => heard.push(ids));
    for (const v of ['2', '3', '5']) engine.update(setInputValue(engine.doc, d.cells[0].id, v));
    await engine.settled();
    expect(calls()).toBe(2);
    expect(heard).toHaveLength(1);
    expect(byName('b').value).toBe(10);
  });

  it('an engine disposed in the task of an edit never computes that edit', async () => {
    const { fn, calls } = counter();
    const d = doc(input('a', '1'), formula('b', 'tick(a)'));
    const { engine } = await run(d, [fn]);
    let heard = 0;
    engine.subscribe(() => heard++);
    engine.update(setInputValue(engine.doc, d.cells[0].id, '7'));
    engine.dispose();
    await new Promise((r) => setTimeout(r, 10));
    expect(calls()).toBe(1);
    expect(heard).toBe(0);
  });
});
