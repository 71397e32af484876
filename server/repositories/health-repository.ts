import type { Knex } from 'knex';

/** Database round trip used by the health check. */
export function createHealthRepository(knex: Knex) {
  return {
    async ping(): Promise<{ version: string }> {
      const [rows] = await knex.raw('SELECT VERSION() AS version');
      return { version: String((rows as Array<{ version: string }>)[0]?.version ?? 'unknown') };
    },
  };
}
