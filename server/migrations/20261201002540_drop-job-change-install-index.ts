import type { Knex } from 'knex';

/** job_changes_job_install_idx is a prefix of job_changes_job_install_shop_idx: one fewer index to keep up. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('job_changes', (t) => {
    t.dropIndex([], 'job_changes_job_install_idx');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('job_changes', (t) => {
    t.index(['job_id', 'install_type'], 'job_changes_job_install_idx');
  });
}
