/** A small seeded random source (mulberry32), so the demo history comes out the same on every run. */
export interface Random {
  /** A float in [0, 1). */
  next(): number;
  /** An integer in [min, max]. */
  int(min: number, max: number): number;
  /** True with probability p. */
  chance(p: number): boolean;
  /** One item of a list. */
  pick<T>(items: readonly T[]): T;
  /** One item, drawn with the given weights. */
  weighted<T>(items: ReadonlyArray<readonly [T, number]>): T;
  /** A version-4-shaped UUID from the stream (never from the clock). */
  uuid(): string;
}

/** A seeded random source; the same seed gives the same sequence. */
export function seededRandom(seed: number): Random {
  let a = seed >>> 0;
  const next = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const hex = (n: number) => Array.from({ length: n }, () => Math.floor(next() * 16).toString(16)).join('');
  const r: Random = {
    next,
    int: (min, max) => min + Math.floor(next() * (max - min + 1)),
    chance: (p) => next() < p,
    pick: (items) => items[Math.floor(next() * items.length)],
    weighted(items) {
      const total = items.reduce((s, [, w]) => s + w, 0);
      let x = next() * total;
      for (const [item, w] of items) {
        x -= w;
        if (x < 0) return item;
      }
      return items[items.length - 1][0];
    },
    uuid: () => `${hex(8)}-${hex(4)}-4${hex(3)}-${'89ab'[Math.floor(next() * 4)]}${hex(3)}-${hex(12)}`,
  };
  return r;
}
