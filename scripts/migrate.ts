/// <reference types="node" />
// Runs the Knex migrations from TypeScript (the knex CLI cannot load knexfile.ts).
import { loadConfig } from '@/server/config';
import { openDatabase, migrateLatest } from '@/server/db';

async function main() {
  const knex = openDatabase(loadConfig().db);
  try {
    const applied = await migrateLatest(knex);
    console.log(applied.length ? `baywalk: applied ${applied.length} migration(s)` : 'baywalk: schema up to date');
  } finally {
    await knex.destroy();
  }
}

main().catch((err) => {
  console.error(`baywalk: migration failed: ${err.message}`);
  process.exit(1);
});
