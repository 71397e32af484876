import type { Knex } from 'knex';

/**
 * The first (shop_id, install_type) index is a prefix of
 * job_changes_shop_install_job_idx, which also serves the shop foreign key:
 * one fewer index to keep up on every job save.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('job_changes', (t) => {
    t.dropIndex([], 'job_changes_shop_id_install_type_index');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('job_changes', (t) => {
    t.index(['shop_id', 'install_type'], 'job_changes_shop_id_install_type_index');
  });
}
