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
 */
export class SessionStore extends ConnectSessionKnexStore {
  constructor(knex: Knex) {
    super({ knex, tableName: 'sessions', createTable: false, cleanupInterval: 0 });
    this.ready.catch(() => undefined);
    this.ready = Promise.resolve();
  }

  override get(sid: string, cb: (err: unknown, session?: SessionData | null) => void) {
    return quiet(super.get(sid, cb));
  }
  override set(sid: string, session: SessionData, cb?: (err?: unknown) => void) {
    return quiet(super.set(sid, session, cb));
  }
  override touch(sid: string, session: SessionData, cb?: () => void) {
    return quiet(super.touch(sid, session, cb));
  }
  override destroy(sid: string, cb?: (err?: unknown) => void) {
    return quiet(super.destroy(sid, cb));
  }
}

function quiet<T>(p: Promise<T>): Promise<T> {
  p.catch(() => undefined);
  return p;
}
