import type { Health } from '@/shared/schemas/health';
import { createHealthRepository } from '../repositories/health-repository';
import type { Knex } from 'knex';

const DB_TIMEOUT_MS = 2000;

/** Reports the server and database state without ever throwing. */
export function createHealthService(knex: Knex, startedAt = Date.now()) {
  const repo = createHealthRepository(knex);
  return {
    async check(): Promise<Health> {
      const server = { ok: true, uptimeSeconds: Math.round((Date.now() - startedAt) / 1000) };
      const started = Date.now();
      try {
        const { version } = await Promise.race([
          repo.ping(),
          new Promise<never>((_, reject) => (setTimeout(() => reject(new Error('timeout')), DB_TIMEOUT_MS) as unknown as NodeJS.Timeout).unref()),
        ]);
        return { status: 'ok', server, database: { ok: true, version, latencyMs: Date.now() - started } };
      } catch {
        return {
          status: 'degraded',
          server,
          database: { ok: false, message: 'The database is not answering. The server keeps running and will reconnect on its own.' },
        };
      }
    },
  };
}
