import crypto from 'node:crypto';
import request from 'supertest';
import type { Knex } from 'knex';
import type { Express } from 'express';
import { ROLES, type Role } from '@/shared/roles';
import { hashPassword } from '@/server/auth/passwords';
import { createShopRepository } from '@/server/repositories/shop-repository';
import { createUserRepository } from '@/server/repositories/user-repository';

export const TEST_PASSWORD = 'correct horse battery';

export interface TestShop {
  shopId: number;
  name: string;
  people: Record<Role, { id: number; email: string; name: string }>;
}

/** A fresh shop with one person per role; names are unique so tests never collide. */
export async function createShopWithPeople(knex: Knex, label = 'Test'): Promise<TestShop> {
  const tag = crypto.randomBytes(5).toString('hex');
  const name = `${label} Shop ${tag}`;
  const shopId = await createShopRepository(knex).create({ name });
  const users = createUserRepository(knex);
  const hash = await hashPassword(TEST_PASSWORD);
  const people = {} as TestShop['people'];
  for (const role of ROLES) {
    const email = `${role}-${tag}@shop.example`;
    const id = await users.create({ shop_id: shopId, email, name: `${role} ${tag}`, role, password_hash: hash });
    people[role] = { id, email, name: `${role} ${tag}` };
  }
  return { shopId, name, people };
}

/** A supertest agent that keeps cookies and sends the header the CSRF guard wants. */
export function agent(app: Express) {
  return request.agent(app).set('X-Baywalk-Request', '1');
}

/** An agent signed in as the given person. */
export async function signedIn(app: Express, email: string, password = TEST_PASSWORD) {
  const a = agent(app);
  const res = await a.post('/api/auth/sign-in').send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in failed for ${email}: ${res.status} ${JSON.stringify(res.body)}`);
  return a;
}
