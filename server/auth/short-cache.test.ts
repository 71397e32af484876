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

  it('loads again once the entry is older than its lifetime', async () => {
    vi.useFakeTimers();
    const cache = shortCache<string, number>(1000);
    let loads = 0;
    const load = async () => ++loads;
    expect(await cache.get('k', load)).toBe(1);
    vi.advanceTimersByTime(999);
    expect(await cache.get('k', load)).toBe(1);
    vi.advanceTimersByTime(1);
    expect(await cache.get('k', load)).toBe(2);
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
