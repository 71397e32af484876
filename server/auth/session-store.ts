import { ConnectSessionKnexStore } from 'connect-session-knex';
import type { SessionData } from 'express-session';
import type { Knex } from 'knex';

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
 */
export class SessionStore extends ConnectSessionKnexStore {
  /** When this process last wrote each session's expiry. */
  private readonly touched = new Map<string, number>();

  constructor(knex: Knex) {
    super({ knex, tableName: 'sessions', createTable: false, cleanupInterval: 0 });
    this.ready.catch(() => undefined);
    this.ready = Promise.resolve();
  }

  override get(sid: string, cb: (err: unknown, session?: SessionData | null) => void) {
    return quiet(super.get(sid, cb));
  }
  override set(sid: string, session: SessionData, cb?: (err?: unknown) => void) {
    this.remember(sid);
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
