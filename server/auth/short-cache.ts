/**
 * A very short-lived, per-process cache of promised values, for facts read on
 * every request (who a session belongs to, that person's role, a tree page).
 *
 * - No entry is ever served once older than `maxAgeMs`: that is the bound on
 *   how stale an answer can be when another server process changed the fact.
 * - In the second half of that time an entry is still served, while ONE
 *   request's worth of reload runs in the background, so under steady load no
 *   request waits for a reload (a wait every second showed as the p99).
 * - Concurrent misses for one key share a single load.
 * - Writes made through this process `forget` the keys they touch at once.
 * - A failed load is never kept; a failed background reload drops the entry.
 */
export function shortCache<K, V>(maxAgeMs: number, limit = 10_000) {
  interface Entry {
    at: number;
    value: Promise<V>;
    reloading?: boolean;
  }
  const entries = new Map<K, Entry>();
  const freshFor = maxAgeMs / 2;

  function prune(now: number) {
    for (const [k, e] of entries) if (now - e.at >= maxAgeMs) entries.delete(k);
    // Still full of live entries (a flood of distinct keys): start over rather than grow.
    if (entries.size >= limit) entries.clear();
  }

  function store(key: K, value: Promise<V>, at: number): Entry {
    const entry: Entry = { at, value };
    entries.set(key, entry);
    value.catch(() => {
      if (entries.get(key) === entry) entries.delete(key);
    });
    return entry;
  }

  return {
    /** The value for a key: the kept one while it may be served, else a new load (shared by callers meanwhile). */
    get(key: K, load: () => Promise<V>): Promise<V> {
      const now = Date.now();
      const hit = entries.get(key);
      if (hit && now - hit.at < maxAgeMs) {
        if (now - hit.at >= freshFor && !hit.reloading) {
          hit.reloading = true;
          const next = load();
          // Swapped in only once loaded, and only if nothing replaced or forgot the entry meanwhile.
          next.then(
            () => {
              if (entries.get(key) === hit) store(key, next, now);
            },
            () => {
              if (entries.get(key) === hit) entries.delete(key);
            },
          );
        }
        return hit.value;
      }
      if (entries.size >= limit) prune(now);
      return store(key, load(), now).value;
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
