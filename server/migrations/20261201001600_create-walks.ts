import type { Knex } from 'knex';

/**
 * Walks: one pass through one published tree version, for a job (or, later,
 * a guest link: job_id is then null). The version is pinned at the start so
 * later publications never change a walk. current_step and step_count are a
 * cache of the replayed position, rewritten in the same transaction as each step.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('walks', (t) => {
    t.increments('id').primary();
    t.integer('shop_id').unsigned().notNullable().references('shops.id').onDelete('CASCADE');
    t.integer('job_id').unsigned().nullable().references('jobs.id').onDelete('CASCADE');
    // The tree tables belong to the tree library; the service checks these ids inside the shop.
    t.integer('tree_id').unsigned().notNullable();
    t.integer('tree_version_id').unsigned().notNullable();
    t.integer('started_by').unsigned().nullable().references('users.id').onDelete('SET NULL');
    t.enu('status', ['open', 'finished']).notNullable().defaultTo('open');
    t.string('current_step', 64).notNullable();
    t.integer('step_count').unsigned().notNullable().defaultTo(0);
    t.enu('outcome', ['fixed', 'not_fixed', 'referred']).nullable();
    t.string('cause_step', 64).nullable();
    t.string('cause_code', 64).nullable();
    t.text('cause_text').nullable();
    t.text('finish_note').nullable();
    t.integer('finished_by').unsigned().nullable().references('users.id').onDelete('SET NULL');
    t.integer('time_spent_s').unsigned().nullable();
    t.timestamp('started_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.timestamp('last_step_at', { precision: 3 }).nullable();
    t.timestamp('finished_at', { precision: 3 }).nullable();
    t.index(['shop_id', 'status']);
    t.index(['shop_id', 'job_id']);
    t.index(['shop_id', 'tree_id']);
    t.index(['shop_id', 'cause_code']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('walks');
}
