import type { Knex } from 'knex';

/** Shops: every record in Baywalk belongs to one. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('shops', (t) => {
    t.increments('id').primary();
    t.string('name', 120).notNullable();
    t.integer('altitude_m').notNullable().defaultTo(0);
    t.string('pressure_unit', 8).notNullable().defaultTo('inHg');
    t.integer('comeback_window_days').notNullable().defaultTo(30);
    t.string('contact_phone', 40).nullable();
    t.string('contact_email', 254).nullable();
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('shops');
}
