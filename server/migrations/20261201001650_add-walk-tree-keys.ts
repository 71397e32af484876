import type { Knex } from 'knex';

/**
 * Foreign keys from walks to the tree library (its tables are created by
 * earlier migrations). Trees are retired, never deleted; a delete only comes
 * with the whole shop, so the walks go with it.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('walks', (t) => {
    t.foreign('tree_id', 'walks_tree_fk').references('trees.id').onDelete('CASCADE');
    t.foreign('tree_version_id', 'walks_tree_version_fk').references('tree_versions.id').onDelete('CASCADE');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('walks', (t) => {
    t.dropForeign('tree_id', 'walks_tree_fk');
    t.dropForeign('tree_version_id', 'walks_tree_version_fk');
  });
}
