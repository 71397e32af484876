import type { Knex } from 'knex';

/** People of a shop with their role (owner, lead, tech, support). */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('users', (t) => {
    t.increments('id').primary();
    t.integer('shop_id').unsigned().notNullable().references('shops.id').onDelete('CASCADE');
    t.string('email', 254).notNullable().unique();
    t.string('name', 120).notNullable();
    t.string('password_hash', 100).notNullable();
    t.enu('role', ['owner', 'lead', 'tech', 'support']).notNullable();
    t.boolean('active').notNullable().defaultTo(true);
    t.timestamp('last_sign_in_at', { precision: 3 }).nullable();
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.index(['shop_id', 'role']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('users');
}
