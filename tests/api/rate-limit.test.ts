import { afterAll, describe, expect, it } from 'vitest';
import crypto from 'node:crypto';
import { loadConfig } from '@/server/config';
import { createTestApp } from '../support/test-app';
import { agent, createShopWithPeople, TEST_PASSWORD } from '../support/people';
import { startTestMailCatcher } from '../support/mail-catcher';

// Low limits for this file only. Each test uses its own documentation-range
// IP (X-Forwarded-For is trusted from loopback) and its own accounts, so the
// counters, kept in MariaDB, never mix with other suites.
const limits = { ...loadConfig().rateLimits, signInPerIp: 6, signInPerAccount: 3, resetPerIp: 4, resetPerAccount: 2, signUpPerIp: 3 };
const ip = () => `203.0.113.${crypto.randomInt(1, 255)}`;
const t = createTestApp({ rateLimits: limits });
afterAll(() => t.close());

describe('sign-in rate limits', () => {
  it('per account: after 3 failed attempts even the right password waits, with a clear 429', async () => {
    const shop = await createShopWithPeople(t.knex, 'Limit');
    const from = ip();
    const attempt = (password: string, addr = from) =>
      agent(t.app).post('/api/auth/sign-in').set('X-Forwarded-For', addr).send({ email: shop.people.tech.email, password });
    for (let i = 0; i < 3; i++) expect((await attempt('wrong password')).status).toBe(401);
    const blocked = await attempt(TEST_PASSWORD, ip());
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('rate_limited');
    expect(blocked.body.error.message).toMatch(/Too many sign-in attempts\. Wait \d+ minutes? and try again/);
    expect(blocked.headers['retry-after']).toBeTruthy();
    // Another account from the same address is not affected.
    const other = await agent(t.app).post('/api/auth/sign-in').set('X-Forwarded-For', from).send({ email: shop.people.lead.email, password: TEST_PASSWORD });
    expect(other.status).toBe(200);
  });

  it('per IP: failed attempts across many accounts from one address are stopped', async () => {
    const from = ip();
    const statuses: number[] = [];
    for (let i = 0; i < 7; i++) {
      const res = await agent(t.app).post('/api/auth/sign-in').set('X-Forwarded-For', from).send({ email: `guess-${i}-${crypto.randomUUID()}@x.example`, password: 'guess guess' });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, 6)).toEqual([401, 401, 401, 401, 401, 401]);
    expect(statuses[6]).toBe(429);
  });

  it('successful sign-ins do not count, so a busy shop behind one address is never locked out', async () => {
    const shop = await createShopWithPeople(t.knex, 'Busy');
    const from = ip();
    for (let i = 0; i < 10; i++) {
      const res = await agent(t.app).post('/api/auth/sign-in').set('X-Forwarded-For', from).send({ email: shop.people.owner.email, password: TEST_PASSWORD });
      expect(res.status).toBe(200);
    }
  });
});

describe('sign-up rate limit', () => {
  it('per IP: a fourth new shop from one address within the hour waits, with a clear 429; another address is not affected', async () => {
    const from = ip();
    const signUp = (addr: string) =>
      agent(t.app).post('/api/auth/sign-up').set('X-Forwarded-For', addr).send({ shopName: 'Limit Garage', name: 'Ada Quill', email: `owner-${crypto.randomUUID()}@x.example`, password: TEST_PASSWORD });
    for (let i = 0; i < 3; i++) expect((await signUp(from)).status).toBe(201);
    const before = Number((await t.knex('shops').count({ n: '*' }).first())!.n);
    const blocked = await signUp(from);
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('rate_limited');
    expect(blocked.body.error.message).toMatch(/Too many new shops from this network\. Wait \d+ minutes? and try again/);
    expect(Number((await t.knex('shops').count({ n: '*' }).first())!.n)).toBe(before);
    const neighbour = from.replace(/\d+$/, (d) => String((Number(d) % 254) + 1));
    expect((await signUp(neighbour)).status).toBe(201);
  });
});

describe('password reset rate limits', () => {
  it('per account and per IP', async () => {
    const catcher = await startTestMailCatcher();
    const r = createTestApp({ ...catcher.appConfig(), rateLimits: limits });
    try {
      const shop = await createShopWithPeople(r.knex, 'ResetLimit');
      const forgot = (email: string, addr: string) => agent(r.app).post('/api/auth/forgot-password').set('X-Forwarded-For', addr).send({ email });
      expect((await forgot(shop.people.tech.email, ip())).status).toBe(200);
      expect((await forgot(shop.people.tech.email, ip())).status).toBe(200);
      const third = await forgot(shop.people.tech.email, ip());
      expect(third.status).toBe(429);
      expect(third.body.error.message).toMatch(/Too many password reset requests/);

      const from = ip();
      const statuses = [];
      for (let i = 0; i < 5; i++) statuses.push((await forgot(`someone-${i}-${crypto.randomUUID()}@x.example`, from)).status);
      expect(statuses).toEqual([200, 200, 200, 200, 429]);
      // Let the two reset mails arrive before the catcher closes.
      await catcher.waitForMail(shop.people.tech.email, 2);
    } finally {
      await r.close();
      await catcher.close();
    }
  });
});

describe('the limits are shared through MariaDB', () => {
  it('a second app process sees the counts of the first', async () => {
    const shop = await createShopWithPeople(t.knex, 'Shared');
    const other = createTestApp({ rateLimits: limits });
    try {
      const from = ip();
      for (let i = 0; i < 3; i++) {
        const app = i % 2 === 0 ? t.app : other.app;
        await agent(app).post('/api/auth/sign-in').set('X-Forwarded-For', from).send({ email: shop.people.support.email, password: 'wrong password' });
      }
      const res = await agent(other.app).post('/api/auth/sign-in').set('X-Forwarded-For', from).send({ email: shop.people.support.email, password: TEST_PASSWORD });
      expect(res.status).toBe(429);
    } finally {
      await other.close();
    }
  });
});
