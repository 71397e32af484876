import { ConnectSessionKnexStore } from 'connect-session-knex';
import type { SessionData } from 'express-session';
import type { Knex } from 'knex';
import { identityCache } from './identity-cache';

/**
 * connect-session-knex with two traps removed:
 * - its start-up table check is a promise every call awaits; when the
 *   database is down at start it rejects for ever, so sessions would never
 *   recover. The table comes from a migration, so the check is dropped.
 * - each method calls back with the error AND rethrows it; express-session
 *   ignores the returned promise, so the rethrow would be an unhandled
 *   rejection that ends the process. The callback already has the error.
 * And one cost removed: rolling sessions "touch" (write back the expiry, a
 * durable write) on EVERY request, reads included. Once a minute per session
 * and process is plenty for a 12-hour session (the load benchmark's finding).
 * Reads go through the identity cache (identity-cache.ts): a burst of
 * requests on one session costs one query a second, not one each.
 */
export class SessionStore extends ConnectSessionKnexStore {
  /** When this process last wrote each session's expiry. */
  private readonly touched = new Map<string, number>();
  private readonly cached: ReturnType<typeof identityCache>['sessions'];

  constructor(knex: Knex) {
    super({ knex, tableName: 'sessions', createTable: false, cleanupInterval: 0 });
    this.ready.catch(() => undefined);
    this.ready = Promise.resolve();
    this.cached = identityCache(knex).sessions;
  }

  override async get(sid: string, cb: (err: unknown, session?: SessionData | null) => void) {
    let text: string | null;
    try {
      text = await this.cached.get(sid, async () => {
        const stored = await super.get(sid, () => undefined);
        return stored ? JSON.stringify(stored) : null;
      });
    } catch (err) {
      cb(err);
      return null;
    }
    // A fresh copy each time: express-session changes the object it is given.
    const session = text === null ? null : (JSON.parse(text) as SessionData);
    cb(null, session);
    return session;
  }
  override set(sid: string, session: SessionData, cb?: (err?: unknown) => void) {
    this.remember(sid);
    this.cached.forget(sid);
    return quiet(super.set(sid, session, cb));
  }
  override touch(sid: string, session: SessionData, cb?: () => void) {
    const last = this.touched.get(sid);
    if (last !== undefined && Date.now() - last < TOUCH_EVERY_MS) {
      cb?.();
      return Promise.resolve();
    }
    this.remember(sid);
    return quiet(super.touch(sid, session, cb));
  }
  override destroy(sid: string, cb?: (err?: unknown) => void) {
    this.touched.delete(sid);
    this.cached.forget(sid);
    return quiet(super.destroy(sid, cb));
  }

  private remember(sid: string) {
    const now = Date.now();
    // Bounded: entries older than the interval are worthless, so they go when the map grows.
    if (this.touched.size >= 10_000) for (const [k, t] of this.touched) if (now - t >= TOUCH_EVERY_MS) this.touched.delete(k);
    this.touched.set(sid, now);
  }
}

const TOUCH_EVERY_MS = 60_000;

function quiet<T>(p: Promise<T>): Promise<T> {
  p.catch(() => undefined);
  return p;
}
