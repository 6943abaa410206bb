// The computing state's timing (fake timers: this is behaviour, not speed). It shows
// only when the engine has not settled within COMPUTING_AFTER_MS of a change, hides
// when it settles, and holds other status messages back while it shows.

import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { COMPUTING_AFTER_MS, COMPUTING_TEXT, ComputingState } from '../../cells/computing';

function deferred() {
  let resolve!: () => void;
  const promise = new Promise<void>((r) => (resolve = r));
  return { promise, resolve };
}

function page(initial = '') {
  const log: string[] = [];
  let text = initial;
  const state = new ComputingState({
    said: () => text,
    say: (t) => {
      text = t;
      log.push(`say ${t}`);
    },
    mark: (on) => log.push(on ? 'mark on' : 'mark off'),
  });
  return { state, log, text: () => text };
}

beforeEach(() => {
  vi.useFakeTimers();
});
afterEach(() => {
  vi.useRealTimers();
});

describe('computing state', () => {
  it('the delay is about 100 ms, as issue 3 asks', () => {
    expect(COMPUTING_AFTER_MS).toBe(100);
  });

  it('never shows for a change that settles within the delay', async () => {
    const p = page('Saving…');
    const s = deferred();
    p.state.watch(s.promise);
    await vi.advanceTimersByTimeAsync(COMPUTING_AFTER_MS - 1);
    s.resolve();
    await vi.advanceTimersByTimeAsync(1000);
    expect(p.log).toEqual([]);
    expect(p.state.showing).toBe(false);
    expect(p.text()).toBe('Saving…');
  });

  it('shows after the delay when not settled, and hides when it settles', async () => {
    const p = page('Saving…');
    const s = deferred();
    p.state.watch(s.promise);
    await vi.advanceTimersByTimeAsync(COMPUTING_AFTER_MS - 1);
    expect(p.state.showing).toBe(false);
    await vi.advanceTimersByTimeAsync(1);
    expect(p.state.showing).toBe(true);
    expect(p.text()).toBe(COMPUTING_TEXT);
    await vi.advanceTimersByTimeAsync(2000);
    expect(p.log).toEqual(['mark on', `say ${COMPUTING_TEXT}`]); // no flicker while it lasts
    s.resolve();
    await vi.advanceTimersByTimeAsync(0);
    expect(p.state.showing).toBe(false);
    expect(p.log).toEqual(['mark on', `say ${COMPUTING_TEXT}`, 'mark off', 'say Saving…']);
  });

  it('a message written while computing waits until computing is over', async () => {
    const p = page('');
    const s = deferred();
    p.state.watch(s.promise);
    await vi.advanceTimersByTimeAsync(COMPUTING_AFTER_MS);
    p.state.status('Saved');
    expect(p.text()).toBe(COMPUTING_TEXT);
    s.resolve();
    await vi.advanceTimersByTimeAsync(0);
    expect(p.text()).toBe('Saved');
  });

  it('messages pass straight through when not computing', () => {
    const p = page('');
    p.state.status('Cell deleted');
    expect(p.text()).toBe('Cell deleted');
  });

  it('each change restarts the wait; only the latest change hides it', async () => {
    const p = page('');
    const first = deferred();
    const second = deferred();
    p.state.watch(first.promise);
    await vi.advanceTimersByTimeAsync(60);
    p.state.watch(second.promise);
    await vi.advanceTimersByTimeAsync(60); // 120 ms after the first change, 60 after the second
    expect(p.state.showing).toBe(false);
    await vi.advanceTimersByTimeAsync(40);
    expect(p.state.showing).toBe(true);
    first.resolve(); // e.g. a replaced engine letting go: not the change being followed
    await vi.advanceTimersByTimeAsync(0);
    expect(p.state.showing).toBe(true);
    second.resolve();
    await vi.advanceTimersByTimeAsync(0);
    expect(p.state.showing).toBe(false);
  });
});
