/// <reference types="node" />
import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { loadConfig } from '@/server/config';

/** Brings the test database's schema up to date once per run. */
export default function setup() {
  const config = loadConfig();
  if (!config.db.database.includes('test')) {
    throw new Error(`Refusing to run tests against "${config.db.database}": set BAYWALK_DB_NAME to a test database (npm test does).`);
  }
  // Migrations are TypeScript files loaded by knex's own require, so they run under tsx.
  const root = path.resolve(__dirname, '../..');
  execFileSync(path.join(root, 'node_modules/.bin/tsx'), [path.join(root, 'scripts/migrate.ts')], { stdio: 'inherit', env: process.env });
}
