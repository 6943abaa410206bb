// The sheet view's put-off typesetting: nothing before the next frame, then a few a task.
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { LaterBatches } from '../../cells/later-batches';

describe('LaterBatches', () => {
  beforeEach(() => {
    vi.useFakeTimers();
    // A frame is a timer here: 16 ms (common practice: 60 Hz displays).
    vi.stubGlobal('requestAnimationFrame', (f: FrameRequestCallback) => setTimeout(() => f(performance.now()), 16));
  });
  afterEach(() => {
    vi.useRealTimers();
    vi.unstubAllGlobals();
  });

  it('waits for the next frame, then runs a batch per task, each id once', () => {
    const ran: string[][] = [];
    let task: string[] = [];
    const later = new LaterBatches((id) => task.push(id), 3);
    for (const id of ['a', 'b', 'c', 'b', 'd', 'e', 'f', 'g']) later.add(id);
    vi.advanceTimersByTime(15);
    expect(task).toEqual([]); // nothing before the frame
    const step = () => {
      vi.advanceTimersToNextTimer();
      if (task.length) ran.push(task);
      task = [];
    };
    for (let i = 0; i < 6; i++) step();
    expect(ran).toEqual([['a', 'b', 'c'], ['d', 'e', 'f'], ['g']]);
  });

  it('starts afresh once the queue has run dry', () => {
    const ran: string[] = [];
    const later = new LaterBatches((id) => ran.push(id), 2);
    later.add('x');
    vi.runAllTimers();
    later.add('y');
    expect(ran).toEqual(['x']);
    vi.runAllTimers();
    expect(ran).toEqual(['x', 'y']);
  });
});
