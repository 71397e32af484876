import { describe, expect, it } from 'vitest';
import { versionCache } from './version-cache';

describe('versionCache', () => {
  it('makes a value once per version and returns the same one after', () => {
    const cache = versionCache<{ v: number }>();
    let made = 0;
    const a = cache.get(7, () => ({ v: ++made }));
    const b = cache.get(7, () => ({ v: ++made }));
    expect(b).toBe(a);
    expect(made).toBe(1);
    expect(cache.get(8, () => ({ v: ++made }))).toEqual({ v: 2 });
  });

  it('stays within its limit, dropping the least recently used version first', () => {
    const cache = versionCache<number>(3);
    for (const id of [1, 2, 3]) cache.get(id, () => id * 10);
    cache.peek(1); // 1 is now the most recently used
    cache.get(4, () => 40);
    expect(cache.size).toBe(3);
    expect(cache.peek(2)).toBeUndefined();
    expect(cache.peek(1)).toBe(10);
    expect(cache.peek(4)).toBe(40);
  });
});
