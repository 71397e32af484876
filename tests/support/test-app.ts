/// <reference types="node" />
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import { loadConfig } from '@/server/config';
import { openDatabase } from '@/server/db';
import { createApp } from '@/server/app';

process.env.BAYWALK_BCRYPT_COST ??= '4';

/** Builds the real app on the test database; close() releases the pool. */
export function createTestApp(overrides: Partial<ReturnType<typeof loadConfig>> = {}) {
  const config = { ...loadConfig(), logLevel: 'silent', ...overrides };
  const knex = openDatabase(config.db);
  const built = createApp({ config, knex, serveWeb: overrides.distDir !== undefined });
  return { ...built, config, knex, close: () => knex.destroy() };
}

/**
 * The app listening on a free loopback port, serving the web build too (for
 * browser tests). `overrides` change its config, e.g. a mail catcher's appConfig().
 */
export async function startTestServer(overrides: Partial<ReturnType<typeof loadConfig>> = {}) {
  const t = createTestApp({ distDir: loadConfig().distDir, ...overrides });
  const server: Server = await new Promise((resolve) => {
    const s = t.app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const { port } = server.address() as AddressInfo;
  return {
    ...t,
    url: `http://127.0.0.1:${port}`,
    async close() {
      server.closeAllConnections();
      await new Promise((r) => server.close(r));
      await t.close();
    },
  };
}
