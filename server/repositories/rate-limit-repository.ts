import type { Knex } from 'knex';

/** Rate-limit counters in MariaDB, so every server process shares them. */
export function createRateLimitRepository(knex: Knex) {
  return {
    /** Adds one hit to a key; a key whose window ended starts again at 1. Answers the count and the window's end. */
    async increment(key: string, windowMs: number): Promise<{ hits: number; resetAt: Date }> {
      const now = new Date();
      const resetAt = new Date(now.getTime() + windowMs);
      // In ON DUPLICATE KEY UPDATE, `hits` is assigned first while `reset_at` still holds the old value.
      await knex.raw(
        'INSERT INTO rate_limits (`key`, hits, reset_at) VALUES (?, 1, ?) ON DUPLICATE KEY UPDATE hits = IF(reset_at <= ?, 1, hits + 1), reset_at = IF(reset_at <= ?, VALUES(reset_at), reset_at)',
        [key, resetAt, now, now],
      );
      const row = await knex('rate_limits').where({ key }).first<{ hits: number; reset_at: Date }>('hits', 'reset_at');
      return { hits: Number(row?.hits ?? 1), resetAt: row?.reset_at ?? resetAt };
    },
    async decrement(key: string): Promise<void> {
      await knex('rate_limits').where({ key }).where('hits', '>', 0).decrement('hits', 1);
    },
    async get(key: string): Promise<{ hits: number; resetAt: Date } | undefined> {
      const row = await knex('rate_limits').where({ key }).where('reset_at', '>', new Date()).first<{ hits: number; reset_at: Date }>('hits', 'reset_at');
      return row ? { hits: Number(row.hits), resetAt: row.reset_at } : undefined;
    },
    async reset(key: string): Promise<void> {
      await knex('rate_limits').where({ key }).delete();
    },
    /** Drops counters whose window ended long ago. */
    async prune(olderThan: Date): Promise<void> {
      await knex('rate_limits').where('reset_at', '<', olderThan).delete();
    },
  };
}
