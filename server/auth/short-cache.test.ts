import { afterEach, describe, expect, it, vi } from 'vitest';
import { shortCache } from './short-cache';

describe('shortCache', () => {
  afterEach(() => vi.useRealTimers());

  it('shares one load between concurrent callers and keeps it while fresh', async () => {
    const cache = shortCache<string, number>(1000);
    let loads = 0;
    const load = () => new Promise<number>((resolve) => setTimeout(() => resolve(++loads), 5));
    const [a, b, c] = await Promise.all([cache.get('k', load), cache.get('k', load), cache.get('k', load)]);
    expect([a, b, c]).toEqual([1, 1, 1]);
    expect(await cache.get('k', load)).toBe(1);
    expect(loads).toBe(1);
  });

  it('never serves an entry older than its lifetime; in its second half, serves it while one reload runs', async () => {
    vi.useFakeTimers();
    const cache = shortCache<string, number>(1000);
    let loads = 0;
    const load = async () => ++loads;
    expect(await cache.get('k', load)).toBe(1);
    vi.advanceTimersByTime(499);
    expect(await cache.get('k', load)).toBe(1);
    expect(loads).toBe(1);
    // Second half: the kept value answers at once, and a single reload starts behind it.
    vi.advanceTimersByTime(1);
    const [a, b] = [cache.get('k', load), cache.get('k', load)];
    expect(loads).toBe(2);
    expect([await a, await b]).toEqual([1, 1]);
    expect(await cache.get('k', load)).toBe(2);
    // Past the lifetime with no request in between: the caller waits for a fresh value.
    vi.advanceTimersByTime(1000);
    expect(await cache.get('k', load)).toBe(3);
  });

  it('drops an entry whose background reload failed, so the next caller sees the failure', async () => {
    vi.useFakeTimers();
    const cache = shortCache<string, number>(1000);
    expect(await cache.get('k', async () => 1)).toBe(1);
    vi.advanceTimersByTime(600);
    expect(await cache.get('k', () => Promise.reject(new Error('database down')))).toBe(1);
    await Promise.resolve();
    await Promise.resolve();
    await expect(cache.get('k', () => Promise.reject(new Error('database down')))).rejects.toThrow('database down');
  });

  it('forgets a key at once, and never keeps a failed load', async () => {
    const cache = shortCache<string, number>(60_000);
    let loads = 0;
    await cache.get('k', async () => ++loads);
    cache.forget('k');
    expect(await cache.get('k', async () => ++loads)).toBe(2);
    await expect(cache.get('bad', () => Promise.reject(new Error('database down')))).rejects.toThrow('database down');
    await Promise.resolve();
    expect(await cache.get('bad', async () => 7)).toBe(7);
  });

  it('stays within its limit under a flood of distinct keys', async () => {
    const cache = shortCache<number, number>(60_000, 100);
    for (let i = 0; i < 1000; i++) await cache.get(i, async () => i);
    expect(cache.size).toBeLessThanOrEqual(100);
  });
});
