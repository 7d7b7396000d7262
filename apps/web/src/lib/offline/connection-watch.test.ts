import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createConnectionWatch } from './connection-watch';

/** The query library's online flag as far as the watch uses it: a value, and listeners told of each change. */
function onlineFlag() {
  let value = true;
  const listeners = new Set<(online: boolean) => void>();
  return {
    isOnline: () => value,
    setOnline: (next: boolean) => {
      if (next === value) return;
      value = next;
      for (const listener of listeners) listener(next);
    },
    subscribe: (listener: (online: boolean) => void) => {
      listeners.add(listener);
      return () => void listeners.delete(listener);
    },
  };
}

// The probe answers from a list; the flag is the test's own, so no browser events interfere.
function setUp(answers: boolean[]) {
  const online = onlineFlag();
  const changes: boolean[] = [];
  online.subscribe((isOnline) => changes.push(isOnline));
  let probes = 0;
  const watch = createConnectionWatch({
    reachServer: async () => {
      probes += 1;
      const answer = answers.shift();
      if (answer === undefined) throw new Error('no more answers');
      return answer;
    },
    probeEveryMs: 5_000,
    online,
  });
  return { online, changes, watch, probes: () => probes };
}

describe('createConnectionWatch', () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it('counts the app offline at the first request that finds no server, and online again when a probe gets through', async () => {
    const { online, changes, watch, probes } = setUp([false, false, true]);
    expect(online.isOnline()).toBe(true);
    watch.unreachable();
    expect(online.isOnline()).toBe(false);
    await vi.advanceTimersByTimeAsync(4_999);
    expect(probes()).toBe(0);
    await vi.advanceTimersByTimeAsync(1);
    expect(probes()).toBe(1);
    await vi.advanceTimersByTimeAsync(10_000);
    expect(probes()).toBe(3);
    expect(online.isOnline()).toBe(true);
    expect(changes).toEqual([false, true]);
    // Back online, it stops asking.
    await vi.advanceTimersByTimeAsync(60_000);
    expect(probes()).toBe(3);
  });

  it('runs one probe at a time however many requests fail meanwhile', async () => {
    const { watch, probes } = setUp([false, true]);
    watch.unreachable();
    watch.unreachable();
    await vi.advanceTimersByTimeAsync(2_000);
    watch.unreachable();
    await vi.advanceTimersByTimeAsync(3_000);
    expect(probes()).toBe(1);
  });

  it('stops probing when the browser reports the network back by itself', async () => {
    const { online, watch, probes } = setUp([false, false]);
    watch.unreachable();
    online.setOnline(true);
    await vi.advanceTimersByTimeAsync(30_000);
    expect(probes()).toBe(0);
  });

  it('takes a probe that throws for no answer and keeps trying', async () => {
    const { online, watch, probes } = setUp([]);
    watch.unreachable();
    await vi.advanceTimersByTimeAsync(15_000);
    expect(probes()).toBe(3);
    expect(online.isOnline()).toBe(false);
    watch.stop();
    await vi.advanceTimersByTimeAsync(15_000);
    expect(probes()).toBe(3);
  });
});
