import type { Knex } from 'knex';

/**
 * The altitude (and barometer, when measured) a walk's readings are judged at,
 * fixed when the walk starts: a later change to the shop's altitude must not
 * change the verdicts of readings already recorded.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('walks', (t) => {
    t.integer('altitude_m').notNullable().defaultTo(0).after('tree_version_id');
    t.double('baro_kpa').nullable().after('altitude_m');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('walks', (t) => {
    t.dropColumn('baro_kpa');
    t.dropColumn('altitude_m');
  });
}
