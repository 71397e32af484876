import type { Knex } from 'knex';

/**
 * Who last saved a draft and when, and who published a version: the history
 * screen shows "who, when" for every version, and a later save is refused
 * with the name of the person whose save it would overwrite.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('tree_versions', (t) => {
    t.integer('updated_by').unsigned().nullable().references('users.id').onDelete('SET NULL').after('author_id');
    t.timestamp('updated_at', { precision: 3 }).nullable().after('created_at');
    t.integer('published_by').unsigned().nullable().references('users.id').onDelete('SET NULL').after('published_at');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('tree_versions', (t) => {
    t.dropForeign('updated_by');
    t.dropForeign('published_by');
    t.dropColumn('updated_by');
    t.dropColumn('updated_at');
    t.dropColumn('published_by');
  });
}
