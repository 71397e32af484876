import type { Knex } from 'knex';

/** Which walk step a photo was taken at; a photo belongs to at most one walk. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('walk_photos', (t) => {
    t.uuid('photo_id').primary().references('photos.id').onDelete('CASCADE');
    t.integer('walk_id').unsigned().notNullable().references('walks.id').onDelete('CASCADE');
    t.integer('shop_id').unsigned().notNullable().references('shops.id').onDelete('CASCADE');
    // The tree step shown when the photo was taken, and how many step records existed then.
    t.string('step_id', 64).notNullable();
    t.integer('at_seq').unsigned().notNullable();
    t.string('caption', 200).nullable();
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.index(['walk_id', 'at_seq']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('walk_photos');
}
