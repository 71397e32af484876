import knexFactory, { type Knex } from 'knex';
import { knexSettings } from '@/knexfile';
import type { Config } from './config';

/** Opens a Knex pool for the configured database. */
export function openDatabase(db: Config['db']): Knex {
  return knexFactory(knexSettings(db));
}

/** Brings the schema up to date; returns the names of the migrations run. */
export async function migrateLatest(knex: Knex): Promise<string[]> {
  const [, applied] = await knex.migrate.latest();
  return applied as string[];
}
