/// <reference types="node" />
// Loads demo data into an empty database and prints the demo sign-ins.
import { loadConfig } from '@/server/config';
import { openDatabase } from '@/server/db';
import { demoPresent, seedDemoIfEmpty } from '@/server/seeds/demo-seed';
import { DEMO_PASSWORD, DEMO_PEOPLE, DEMO_SHOP } from '@/server/seeds/demo-people';

async function main() {
  const knex = openDatabase(loadConfig().db);
  try {
    if (await seedDemoIfEmpty(knex)) console.log(`baywalk: loaded demo data for ${DEMO_SHOP.name}`);
    if (await demoPresent(knex)) {
      console.log(`baywalk: demo sign-ins (password for all: ${DEMO_PASSWORD})`);
      for (const p of DEMO_PEOPLE) console.log(`  ${p.role.padEnd(8)} ${p.email}  (${p.name})`);
    }
  } finally {
    await knex.destroy();
  }
}

main().catch((err) => {
  console.error(`baywalk: loading demo data failed: ${err.message}`);
  process.exit(1);
});
