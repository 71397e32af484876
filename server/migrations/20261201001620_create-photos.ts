import type { Knex } from 'knex';

/** Photos: re-encoded without metadata, stored through the photo store under opaque keys. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('photos', (t) => {
    t.uuid('id').primary();
    t.integer('shop_id').unsigned().notNullable().references('shops.id').onDelete('CASCADE');
    t.integer('uploaded_by').unsigned().nullable().references('users.id').onDelete('SET NULL');
    t.string('content_type', 32).notNullable();
    t.integer('width').unsigned().notNullable();
    t.integer('height').unsigned().notNullable();
    t.integer('bytes').unsigned().notNullable();
    t.string('storage_key', 200).notNullable();
    t.string('thumb_key', 200).notNullable();
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.index(['shop_id', 'created_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('photos');
}
