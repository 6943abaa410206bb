// Long recomputes run in slices of tasks, so the page can paint, take input and show
// "computing" in between; short ones run at once. Time is a fake clock here (each probe
// call "costs" a set number of ms), so nothing depends on the speed of the machine.

import { afterEach, describe, expect, it, vi } from 'vitest';
import { setInputValue } from '../../runtime/edit';
import { createEngine } from '../../runtime/engine';
import { Pacer, SLICE_MS } from '../../runtime/graph/pacer';
import type { LibFunction } from '../../runtime/library/types';
import { doc, formula, input, run } from './helpers';

let clock = 0;
function fakeClock(): void {
  clock = 1000;
  vi.spyOn(performance, 'now').mockImplementation(() => clock);
}
afterEach(() => {
  vi.restoreAllMocks();
});

/** A library function that takes `cost` ms of the fake clock and counts its calls. */
function costly(cost: number) {
  const log = { calls: 0 };
  const fn: LibFunction = {
    name: 'slow', params: [{ name: 'x', type: '1' }], returns: '1',
    clause: 'test probe', doc: 'advances the fake clock',
    fn: (x: number) => {
      clock += cost;
      log.calls++;
      return x;
    },
  };
  return { fn, log };
}

const turn = () => new Promise<void>((r) => setImmediate(r));

describe('pacer', () => {
  it('runs work at once while the slice lasts, then in a later task', async () => {
    fakeClock();
    const p = new Pacer();
    p.begin();
    expect(p.pace(() => 1)).toBe(1);
    clock += SLICE_MS + 1;
    const order: string[] = [];
    const timer = turn().then(() => order.push('a task queued before'));
    const later = p.pace(() => order.push('late work'));
    expect(later).toBeInstanceOf(Promise);
    const sameTask = Promise.resolve().then(() => order.push('a microtask queued after'));
    await Promise.all([later, sameTask, timer]);
    // the late work waited for a task of its own
    expect(order).toEqual(['a microtask queued after', 'a task queued before', 'late work']);
  });

  it('work that waited for a slice still shares slices', async () => {
    fakeClock();
    const p = new Pacer();
    p.begin();
    clock += SLICE_MS;
    const tasks: number[] = [];
    // counts turns of the event loop
    let task = 0;
    let ticking = true;
    const tick = () => {
      task++;
      if (ticking) setImmediate(tick);
    };
    setImmediate(tick);
    // each job costs a quarter slice: four fit in one slice
    const jobs = Array.from({ length: 10 }, () => p.pace(() => {
      tasks.push(task);
      clock += SLICE_MS / 4;
    }));
    await Promise.all(jobs);
    ticking = false;
    const perSlice = [...new Set(tasks)].map((t) => tasks.filter((x) => x === t).length);
    expect(perSlice).toEqual([4, 4, 2]);
  });
});

describe('engine with a long recompute', () => {
  it('lets another task run in between, then tells subscribers once with every value', async () => {
    const { fn, log } = costly(15);
    const cells = [input('a', '1'), ...Array.from({ length: 10 }, (_, i) => formula(`y${i}`, `slow(a + ${i})`))];
    const d = doc(...cells);
    const { engine, byName } = await run(d, [fn]);
    fakeClock();
    log.calls = 0;
    const heard: string[][] = [];
    engine.subscribe((ids) => heard.push(ids));
    engine.update(setInputValue(engine.doc, d.cells[0].id, '100'));
    const callsAtTurn = await turn().then(() => log.calls);
    await engine.settled();
    // 15 ms a cell: three fit in a 40 ms slice before the page gets a turn
    expect(callsAtTurn).toBe(3);
    expect(log.calls).toBe(10);
    expect(heard).toHaveLength(1);
    expect(heard[0]).toHaveLength(11);
    expect(byName('y9').value).toBe(109);
  });

  it('a short recompute does not wait for another task', async () => {
    const { fn, log } = costly(1);
    const d = doc(input('a', '1'), ...Array.from({ length: 10 }, (_, i) => formula(`y${i}`, `slow(a + ${i})`)));
    const { engine } = await run(d, [fn]);
    fakeClock();
    log.calls = 0;
    engine.update(setInputValue(engine.doc, d.cells[0].id, '2'));
    expect(await turn().then(() => log.calls)).toBe(10);
  });
});

describe('a sweep of heavy cells', () => {
  it('yields to other tasks between slices of its points, and every point is still computed', async () => {
    // 12 points, each running slow() once at 15 ms of the fake clock: 180 ms in all.
    const { fn, log } = costly(15);
    const d = doc(input('a', '1'), formula('y', 'slow(a) * 2'));
    d.cells.push({ kind: 'sweep', id: 'w', input: 'a', from: '1', to: '12', steps: 11, outputs: ['y'], fixed: true }); // range as written (not centred on a)
    fakeClock();
    const engine = createEngine(d, { functions: [fn] });
    let turns = 0;
    let ticking = true;
    const tick = () => {
      turns++;
      if (ticking) setImmediate(tick);
    };
    setImmediate(tick);
    await engine.settled();
    ticking = false;
    const sweep = engine.state('w')!.sweep!;
    expect(sweep.series[0].values).toEqual(Array.from({ length: 12 }, (_, i) => 2 * (i + 1))); // y = 2a at a = 1…12 (arithmetic)
    expect(log.calls).toBeGreaterThanOrEqual(13); // the cell y itself, then the 12 points
    // 40 ms slices of 15 ms points: the page had turns while the sweep ran
    expect(turns).toBeGreaterThanOrEqual(3);
    engine.dispose();
  });
});
