import type { Knex } from 'knex';
import type { Role } from '@/shared/roles';
import { shortCache } from './short-cache';

/**
 * How long one server process may answer from what it read about a session
 * or a person. Within the process every change forgets its entry at once;
 * another process sharing the database sees a sign-out, a deactivation or a
 * role change within this time. Reading both on every request is what kept
 * the API far slower than bare Express under load.
 */
export const IDENTITY_CACHE_MS = 1000;

/** The signed-in person's row as sessions need it. */
export interface SessionUserRow {
  id: number;
  shop_id: number;
  role: Role;
  active: number | boolean;
  name: string;
  email: string;
  shop_name: string;
}

function makeCaches() {
  return {
    /** Stored session data by session id, as JSON text so no request can change another's copy. */
    sessions: shortCache<string, string | null>(IDENTITY_CACHE_MS),
    users: shortCache<number, SessionUserRow | undefined>(IDENTITY_CACHE_MS),
  };
}

// One set per database pool (keyed by its settings object, which its transactions share): test processes run
// several databases side by side, and ids repeat between them.
const byDatabase = new WeakMap<object, ReturnType<typeof makeCaches>>();

/** The identity caches of one database pool; a transaction of the pool finds the same ones. */
export function identityCache(knex: Knex) {
  const key = knex.client.config as object;
  let caches = byDatabase.get(key);
  if (!caches) byDatabase.set(key, (caches = makeCaches()));
  return caches;
}
