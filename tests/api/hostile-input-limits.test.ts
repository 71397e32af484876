import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hashPassword } from '@/server/auth/passwords';
import { loadConfig } from '@/server/config';
import { createShopRepository } from '@/server/repositories/shop-repository';
import { createUserRepository } from '@/server/repositories/user-repository';
import { createTestApp } from '../support/test-app';
import { agent } from '../support/people';

/**
 * Found by the hostile-input properties: a sign-in naming an e-mail longer
 * than the rate-limit key column made the store fail, and the limiter then let
 * the request through uncounted. A real account may have a long address, so
 * its failed sign-ins must still be counted.
 */
describe('rate limits with very long e-mail addresses', () => {
  const base = loadConfig().rateLimits;
  const t = createTestApp({ rateLimits: { ...base, signInPerAccount: 2, signInPerIp: 1000 } });
  // 63 + 1 + 190 = 254 characters: the longest address the schema takes.
  const tag = Math.random().toString(36).slice(2, 8);
  const email = `${'l'.repeat(57)}${tag}@${'d'.repeat(60)}.${'e'.repeat(60)}.${'f'.repeat(60)}.example`;

  beforeAll(async () => {
    const shopId = await createShopRepository(t.knex).create({ name: `Long Mail ${tag}` });
    await createUserRepository(t.knex).create({ shop_id: shopId, email, name: 'Long Address', role: 'owner', password_hash: await hashPassword('correct horse battery') });
  });
  afterAll(() => t.close());

  it('counts failed sign-ins for a 254-character address and then refuses with 429', async () => {
    expect(email).toHaveLength(254);
    const a = agent(t.app);
    const statuses: number[] = [];
    for (let i = 0; i < 3; i++) statuses.push((await a.post('/api/auth/sign-in').send({ email, password: 'wrong password' })).status);
    expect(statuses).toEqual([401, 401, 429]);
    // The right password is refused too while the account is locked out.
    const locked = await a.post('/api/auth/sign-in').send({ email, password: 'correct horse battery' });
    expect(locked.status).toBe(429);
    expect(locked.body.error.message).toMatch(/Too many sign-in attempts/);
  });
});
