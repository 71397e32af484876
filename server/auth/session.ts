import session from 'express-session';
import type { Knex } from 'knex';
import type { Config } from '../config';
import { SessionStore } from './session-store';

const TWELVE_HOURS_MS = 12 * 60 * 60 * 1000;

/** Sessions kept in MariaDB so any number of server processes share them. */
export function sessionMiddleware(knex: Knex, config: Config) {
  return session({
    name: 'baywalk.sid',
    secret: config.sessionSecret,
    store: new SessionStore(knex),
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: config.secureCookies,
      maxAge: TWELVE_HOURS_MS,
    },
  });
}
