import type { Knex } from 'knex';

/** Invitations to join a shop: single-use links, stored as a SHA-256 of the token. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('invitations', (t) => {
    t.increments('id').primary();
    t.integer('shop_id').unsigned().notNullable().references('shops.id').onDelete('CASCADE');
    t.string('email', 254).notNullable();
    t.enu('role', ['owner', 'lead', 'tech', 'support']).notNullable();
    t.string('token_hash', 64).notNullable().unique();
    t.integer('invited_by').unsigned().nullable().references('users.id').onDelete('SET NULL');
    t.timestamp('expires_at', { precision: 3 }).notNullable();
    t.timestamp('accepted_at', { precision: 3 }).nullable();
    t.timestamp('revoked_at', { precision: 3 }).nullable();
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.index(['shop_id', 'email']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('invitations');
}
