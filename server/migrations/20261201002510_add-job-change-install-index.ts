import type { Knex } from 'knex';

/** Lets Patterns go from a walk's job to its install types (filter and repeat causes) from the index alone. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('job_changes', (t) => {
    t.index(['job_id', 'install_type'], 'job_changes_job_install_idx');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('job_changes', (t) => {
    t.dropIndex([], 'job_changes_job_install_idx');
  });
}
