/**
 * A bounded in-process cache of values derived from tree versions, keyed by
 * version id. Safe because a stored version is never changed in place (a new
 * version gets a new id); each process keeps its own copy, so running several
 * server processes needs no coordination. Least recently used entries go first.
 */
export function versionCache<T>(limit = 500) {
  const entries = new Map<number, T>();
  return {
    /** The cached value for a version, or undefined. */
    peek(versionId: number): T | undefined {
      const hit = entries.get(versionId);
      if (hit !== undefined) {
        entries.delete(versionId);
        entries.set(versionId, hit);
      }
      return hit;
    },
    /** The cached value for a version, made (and kept) on a miss. */
    get(versionId: number, make: () => T): T {
      const hit = this.peek(versionId);
      if (hit !== undefined) return hit;
      const value = make();
      if (entries.size >= limit) entries.delete(entries.keys().next().value!);
      entries.set(versionId, value);
      return value;
    },
    get size() {
      return entries.size;
    },
  };
}
