/// <reference types="node" />
import path from 'node:path';
import type { Knex } from 'knex';
import { loadConfig } from './server/config';

/** Knex settings built from the server config; used by scripts and the app. */
export function knexSettings(db = loadConfig().db): Knex.Config {
  return {
    client: 'mysql2',
    // No `charset` here: the database is created utf8mb4_unicode_ci and
    // tables inherit it (a charset option makes knex force general_ci).
    connection: {
      host: db.host,
      port: db.port,
      user: db.user,
      password: db.password,
      database: db.database,
      timezone: 'Z',
      dateStrings: false,
      supportBigNumbers: true,
      connectTimeout: 3000,
      // The walk step append sends its statements as two batches (server/repositories/walk-append-repository.ts).
      // Every value is still a binding escaped by the driver; never build SQL text from input.
      multipleStatements: true,
    },
    pool: { min: 0, max: 20 },
    acquireConnectionTimeout: 5000,
    migrations: {
      directory: path.join(__dirname, 'server', 'migrations'),
      extension: 'ts',
      loadExtensions: ['.ts'],
      tableName: 'knex_migrations',
    },
  };
}

export default knexSettings();
