import type { Knex } from 'knex';

/**
 * Versions of a tree: each row is one full tree document and is never
 * rewritten once published (walks keep pointing at the version they ran).
 * A draft may be replaced while it is a draft; publishing stamps
 * published_at and makes the row read-only by rule of the service.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('tree_versions', (t) => {
    t.increments('id').primary();
    t.integer('tree_id').unsigned().notNullable().references('trees.id').onDelete('CASCADE');
    t.integer('shop_id').unsigned().notNullable().references('shops.id').onDelete('CASCADE');
    t.integer('version').unsigned().notNullable();
    t.enu('state', ['draft', 'published', 'retired']).notNullable().defaultTo('draft');
    t.json('doc').notNullable();
    /** 'stock' when copied from the shipped library, so a later library update can tell it was not edited here. */
    t.enu('source', ['stock', 'shop']).notNullable().defaultTo('shop');
    t.integer('author_id').unsigned().nullable().references('users.id').onDelete('SET NULL');
    t.string('note', 500).notNullable().defaultTo('');
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.timestamp('published_at', { precision: 3 }).nullable();
    t.unique(['tree_id', 'version']);
    t.index(['shop_id', 'tree_id', 'state']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('tree_versions');
}
