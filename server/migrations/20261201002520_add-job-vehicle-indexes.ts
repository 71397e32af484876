import type { Knex } from 'knex';

/** The make and engine pickers of Patterns list a shop's distinct values; these indexes answer that without a scan. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('jobs', (t) => {
    t.index(['shop_id', 'make'], 'jobs_shop_make_idx');
    t.index(['shop_id', 'engine'], 'jobs_shop_engine_idx');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('jobs', (t) => {
    t.dropIndex([], 'jobs_shop_make_idx');
    t.dropIndex([], 'jobs_shop_engine_idx');
  });
}
