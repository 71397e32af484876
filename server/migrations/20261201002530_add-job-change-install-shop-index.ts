import type { Knex } from 'knex';

/**
 * (job_id, install_type, shop_id): with shop_id in it, the repeat-causes join
 * (which also checks the shop) is answered from the index alone, with no
 * read of the row. Replaces job_changes_job_install_idx (dropped next).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('job_changes', (t) => {
    t.index(['job_id', 'install_type', 'shop_id'], 'job_changes_job_install_shop_idx');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('job_changes', (t) => {
    t.dropIndex([], 'job_changes_job_install_shop_idx');
  });
}
