import type { Knex } from 'knex';

/**
 * Guest links: one customer, one published tree version (pinned when the link
 * is made), one walk at most. Only the SHA-256 of the token is kept; the
 * token itself lives in the mail (or the clipboard) and nowhere else.
 * A resend replaces token_hash, so the link sent before stops working.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('guest_links', (t) => {
    t.increments('id').primary();
    t.integer('shop_id').unsigned().notNullable().references('shops.id').onDelete('CASCADE');
    t.integer('tree_id').unsigned().notNullable().references('trees.id').onDelete('CASCADE');
    t.integer('tree_version_id').unsigned().notNullable().references('tree_versions.id').onDelete('CASCADE');
    t.string('customer_name', 120).notNullable();
    t.string('customer_email', 254).nullable();
    t.text('note').nullable();
    t.specificType('token_hash', 'CHAR(64)').notNullable().unique();
    t.timestamp('expires_at', { precision: 3 }).notNullable();
    t.integer('created_by').unsigned().nullable().references('users.id').onDelete('SET NULL');
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.timestamp('last_sent_at', { precision: 3 }).nullable();
    t.integer('sent_count').unsigned().notNullable().defaultTo(0);
    t.timestamp('opened_at', { precision: 3 }).nullable();
    t.timestamp('acknowledged_at', { precision: 3 }).nullable();
    t.integer('walk_id').unsigned().nullable().unique().references('walks.id').onDelete('SET NULL');
    t.timestamp('revoked_at', { precision: 3 }).nullable();
    t.integer('revoked_by').unsigned().nullable().references('users.id').onDelete('SET NULL');
    t.timestamp('handled_at', { precision: 3 }).nullable();
    t.integer('handled_by').unsigned().nullable().references('users.id').onDelete('SET NULL');
    t.integer('job_id').unsigned().nullable().references('jobs.id').onDelete('SET NULL');
    t.index(['shop_id', 'created_at']);
    t.index(['shop_id', 'handled_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('guest_links');
}
