import type { Knex } from 'knex';

/**
 * (shop_id, cause_code, finished_at): the drill-down behind a cause reads the
 * newest walks first and stops after a page, instead of sorting every walk
 * that ever found the cause.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('walks', (t) => {
    t.index(['shop_id', 'cause_code', 'finished_at'], 'walks_cause_finished_idx');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('walks', (t) => {
    t.dropIndex([], 'walks_cause_finished_idx');
  });
}
