import type { Knex } from 'knex';

/**
 * Index for the Patterns measures: every one of them reads a shop's finished
 * walks over a date range. The trailing columns make it covering, so the
 * aggregates are answered from the index without touching the rows
 * (see scripts/patterns-bench.ts for the plans and times on 100 000 walks).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('walks', (t) => {
    t.index(
      ['shop_id', 'status', 'finished_at', 'tree_id', 'outcome', 'cause_code', 'job_id', 'started_by', 'step_count', 'time_spent_s'],
      'walks_patterns_idx',
    );
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('walks', (t) => {
    t.dropIndex([], 'walks_patterns_idx');
  });
}
