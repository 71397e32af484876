import type { Knex } from 'knex';

/**
 * At most one draft per tree, enforced by the database: `draft_of` is the
 * tree id while a row is a draft and NULL otherwise, and NULLs never collide
 * in a unique key. The service checks first to give a helpful message; this
 * key stops two simultaneous "new draft" requests from both succeeding.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw("ALTER TABLE tree_versions ADD COLUMN draft_of INT UNSIGNED AS (IF(state = 'draft', tree_id, NULL)) PERSISTENT");
  await knex.raw('ALTER TABLE tree_versions ADD UNIQUE KEY tree_versions_one_draft (draft_of)');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('ALTER TABLE tree_versions DROP INDEX tree_versions_one_draft');
  await knex.raw('ALTER TABLE tree_versions DROP COLUMN draft_of');
}
