import type { Knex } from 'knex';

/**
 * Trees of a shop's library: the identity and the searchable facts of each
 * tree. The procedure itself lives in immutable tree_versions rows; this row
 * points at the published one. `revision` goes up on every change to this
 * row so a later editor can refuse a save made against a stale copy.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('trees', (t) => {
    t.increments('id').primary();
    t.integer('shop_id').unsigned().notNullable().references('shops.id').onDelete('CASCADE');
    t.string('slug', 64).notNullable();
    t.string('title', 140).notNullable();
    t.string('symptom', 40).notNullable();
    t.json('install_types').notNullable();
    t.text('summary').notNullable();
    t.enu('status', ['active', 'retired']).notNullable().defaultTo('active');
    /** Where it came from: the stock library or the shop's own authors. */
    t.enu('source', ['stock', 'shop']).notNullable().defaultTo('shop');
    /** The tree_versions row walks start from; null until one is published. */
    t.integer('published_version_id').unsigned().nullable();
    t.integer('revision').unsigned().notNullable().defaultTo(1);
    t.integer('created_by').unsigned().nullable().references('users.id').onDelete('SET NULL');
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.timestamp('updated_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.unique(['shop_id', 'slug']);
    t.index(['shop_id', 'status', 'symptom']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('trees');
}
