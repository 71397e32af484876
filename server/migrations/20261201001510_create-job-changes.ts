import type { Knex } from 'knex';

/** The install done on a job, one row per change, so patterns can count causes by install type. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('job_changes', (t) => {
    t.increments('id').primary();
    t.integer('job_id').unsigned().notNullable().references('jobs.id').onDelete('CASCADE');
    t.integer('shop_id').unsigned().notNullable().references('shops.id').onDelete('CASCADE');
    t.smallint('position').unsigned().notNullable();
    t.string('install_type', 40).notNullable();
    t.string('description', 200).notNullable().defaultTo('');
    t.unique(['job_id', 'position']);
    t.index(['shop_id', 'install_type']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('job_changes');
}
