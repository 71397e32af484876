import type { Knex } from 'knex';

/** Hit counters for rate limits, shared by every server process (express-rate-limit store). */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('rate_limits', (t) => {
    t.string('key', 191).primary();
    t.integer('hits').unsigned().notNullable();
    t.timestamp('reset_at', { precision: 3 }).notNullable().index();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('rate_limits');
}
