import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { networkQuiet } from '@/app/pwa/network-quiet';

/** A page clock whose last fetch ended at `lastEnd` (ms, performance time), read as fake time passes. */
function pageClock(lastEnd: () => number) {
  return { now: () => Date.now(), lastResourceEnd: lastEnd };
}

describe('networkQuiet (asking a new version to take over only after the page stops fetching)', () => {
  beforeEach(() => {
    vi.useFakeTimers({ now: 10_000 });
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it('resolves at once when the last fetch ended longer ago than the quiet time', async () => {
    const quiet = vi.fn();
    void networkQuiet(2_000, pageClock(() => 7_500)).then(quiet);
    await vi.advanceTimersByTimeAsync(0);
    expect(quiet).toHaveBeenCalledOnce();
  });

  it('waits until the quiet time has passed since the last fetch ended', async () => {
    const quiet = vi.fn();
    void networkQuiet(2_000, pageClock(() => 9_400)).then(quiet);
    await vi.advanceTimersByTimeAsync(1_300);
    expect(quiet).not.toHaveBeenCalled();
    await vi.advanceTimersByTimeAsync(100);
    expect(quiet).toHaveBeenCalledOnce();
  });

  it('waits again when another fetch ends during the wait (a lazy page loading its parts)', async () => {
    let lastEnd = 9_000;
    const quiet = vi.fn();
    void networkQuiet(2_000, pageClock(() => lastEnd)).then(quiet);
    await vi.advanceTimersByTimeAsync(500);
    lastEnd = 10_500;
    await vi.advanceTimersByTimeAsync(500);
    expect(quiet).not.toHaveBeenCalled();
    await vi.advanceTimersByTimeAsync(1_499);
    expect(quiet).not.toHaveBeenCalled();
    await vi.advanceTimersByTimeAsync(1);
    expect(quiet).toHaveBeenCalledOnce();
  });
});
