/**
 * A very short-lived, per-process cache of promised values, for facts read on
 * every request (who a session belongs to, that person's role). Concurrent
 * misses for one key share a single load, so a burst of requests costs one
 * query. Entries live `ttlMs` at most; writes made through this process forget
 * the keys they touch at once, while other server processes see the change
 * when the entry runs out (the bound on staleness across processes).
 * A failed load is never kept.
 */
export function shortCache<K, V>(ttlMs: number, limit = 10_000) {
  const entries = new Map<K, { at: number; value: Promise<V> }>();

  function prune(now: number) {
    for (const [k, e] of entries) if (now - e.at >= ttlMs) entries.delete(k);
    // Still full of fresh entries (a flood of distinct keys): start over rather than grow.
    if (entries.size >= limit) entries.clear();
  }

  return {
    /** The value for a key: the kept one while fresh, else a new load (shared by callers meanwhile). */
    get(key: K, load: () => Promise<V>): Promise<V> {
      const now = Date.now();
      const hit = entries.get(key);
      if (hit && now - hit.at < ttlMs) return hit.value;
      if (entries.size >= limit) prune(now);
      const value = load();
      const entry = { at: now, value };
      entries.set(key, entry);
      value.catch(() => {
        if (entries.get(key) === entry) entries.delete(key);
      });
      return value;
    },
    forget(key: K) {
      entries.delete(key);
    },
    clear() {
      entries.clear();
    },
    get size() {
      return entries.size;
    },
  };
}

export type ShortCache<K, V> = ReturnType<typeof shortCache<K, V>>;
