import type { Knex } from 'knex';
import { hashPassword } from '../auth/passwords';
import { createShopRepository } from '../repositories/shop-repository';
import { createUserRepository } from '../repositories/user-repository';
import { DEMO_PASSWORD, DEMO_PEOPLE, DEMO_SHOP } from './demo-people';
import { installStockTreesInAllShops } from '../services/tree-stock';
import { seedDemoShopHistory } from './demo-history';

/** Loads the demo shop when the database has no shop yet, and gives every shop the stock trees it lacks. Returns whether it seeded. */
export async function seedDemoIfEmpty(knex: Knex): Promise<boolean> {
  const shops = createShopRepository(knex);
  if ((await shops.count()) > 0) {
    // Shops made before a stock tree shipped get it on the next start (idempotent).
    await installStockTreesInAllShops(knex);
    return false;
  }
  const users = createUserRepository(knex);
  const hash = await hashPassword(DEMO_PASSWORD);
  await knex.transaction(async (trx) => {
    const shopId = await shops.create(DEMO_SHOP, trx);
    for (const person of DEMO_PEOPLE) {
      await users.create({ shop_id: shopId, email: person.email, name: person.name, role: person.role, password_hash: hash }, trx);
    }
  });
  await installStockTreesInAllShops(knex);
  // Six months of invented jobs and walks, so Patterns has something to show.
  await seedDemoShopHistory(knex, DEMO_PEOPLE[0].email);
  return true;
}

/** Whether the demo people exist (so start-up can print their sign-ins). */
export async function demoPresent(knex: Knex): Promise<boolean> {
  return !!(await createUserRepository(knex).findByEmail(DEMO_PEOPLE[0].email));
}
