import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import crypto from 'node:crypto';
import { FORGOT_PASSWORD_ANSWER } from '@/shared/schemas/auth';
import { createTestApp } from '../support/test-app';
import { agent, createShopWithPeople, signedIn, TEST_PASSWORD, type TestShop } from '../support/people';
import { linkFrom, startTestMailCatcher } from '../support/mail-catcher';

describe('password reset through the SMTP catcher', () => {
  let catcher: Awaited<ReturnType<typeof startTestMailCatcher>>;
  let t: ReturnType<typeof createTestApp>;
  let shop: TestShop;

  beforeAll(async () => {
    catcher = await startTestMailCatcher();
    t = createTestApp(catcher.appConfig());
    shop = await createShopWithPeople(t.knex, 'Reset');
  });
  afterAll(async () => {
    await t.close();
    await catcher.close();
  });

  const forgot = (email: string) => agent(t.app).post('/api/auth/forgot-password').send({ email });

  it('answers the same whether or not the address exists, and mails only real accounts', async () => {
    const known = await forgot(shop.people.lead.email);
    const unknown = await forgot(`nobody-${crypto.randomBytes(4).toString('hex')}@shop.example`);
    expect(known.status).toBe(200);
    expect(unknown.status).toBe(200);
    expect(known.body).toEqual(unknown.body);
    expect(known.body.message).toBe(FORGOT_PASSWORD_ANSWER);
    const mail = await catcher.waitForMail(shop.people.lead.email);
    expect(mail.text).toContain(shop.name);
    expect(mail.html).toContain('Choose a new password');
    await new Promise((r) => setTimeout(r, 200));
    expect(await catcher.mailTo('nobody@shop.example')).toHaveLength(0);
  });

  it('follows the link, sets the new password, signs in, and ends the old sessions', async () => {
    const email = shop.people.tech.email;
    const oldSession = await signedIn(t.app, email);
    await forgot(email);
    const { token } = linkFrom(await catcher.waitForMail(email), '/reset-password');
    const row = await t.knex('password_resets').where({ token_hash: crypto.createHash('sha256').update(token).digest('hex') }).first();
    expect(row).toBeTruthy();
    const minutes = (new Date(row.expires_at).getTime() - Date.now()) / 60_000;
    expect(minutes).toBeGreaterThan(59);
    expect(minutes).toBeLessThanOrEqual(60);

    const a = agent(t.app);
    expect((await a.post('/api/auth/reset-password/check').send({ token })).body).toEqual({ email, shopName: shop.name });
    const done = await a.post('/api/auth/reset-password').send({ token, password: 'a brand new password' });
    expect(done.status).toBe(200);
    expect(done.body.user.email).toBe(email);
    expect((await a.get('/api/auth/me')).body.user.email).toBe(email);
    expect((await oldSession.get('/api/auth/me')).body.user).toBeNull();
    expect((await agent(t.app).post('/api/auth/sign-in').send({ email, password: TEST_PASSWORD })).status).toBe(401);
    const fresh = await signedIn(t.app, email, 'a brand new password');
    expect((await fresh.get('/api/auth/me')).body.user.email).toBe(email);
  });

  it('refuses a reused link, and older links die once one is used', async () => {
    const email = shop.people.support.email;
    await forgot(email);
    await forgot(email);
    const first = linkFrom(await catcher.waitForMail(email, 1), '/reset-password').token;
    const second = linkFrom(await catcher.waitForMail(email, 2), '/reset-password').token;
    expect((await agent(t.app).post('/api/auth/reset-password').send({ token: second, password: 'first new password' })).status).toBe(200);
    const reused = await agent(t.app).post('/api/auth/reset-password').send({ token: second, password: 'second new password' });
    expect(reused.status).toBe(410);
    expect(reused.body.error.code).toBe('link_used');
    expect(reused.body.error.message).toMatch(/already been used/);
    expect((await agent(t.app).post('/api/auth/reset-password').send({ token: first, password: 'third new password' })).body.error.code).toBe('link_used');
    await signedIn(t.app, email, 'first new password');
  });

  it('refuses an expired link after one hour', async () => {
    const email = shop.people.owner.email;
    await forgot(email);
    const { token } = linkFrom(await catcher.waitForMail(email), '/reset-password');
    await t.knex('password_resets').where({ token_hash: crypto.createHash('sha256').update(token).digest('hex') }).update({ expires_at: new Date(Date.now() - 1000) });
    const res = await agent(t.app).post('/api/auth/reset-password').send({ token, password: 'too late password' });
    expect(res.status).toBe(410);
    expect(res.body.error.message).toMatch(/expired \(links last one hour\)/);
    await signedIn(t.app, email, TEST_PASSWORD);
  });

  it('refuses a forged link and a weak password with clear messages', async () => {
    const forged = await agent(t.app).post('/api/auth/reset-password').send({ token: crypto.randomBytes(32).toString('base64url'), password: 'a long password here' });
    expect(forged.status).toBe(400);
    expect(forged.body.error.code).toBe('link_invalid');
    const weak = await agent(t.app).post('/api/auth/reset-password').send({ token: crypto.randomBytes(32).toString('base64url'), password: 'short' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.details.fields.password).toMatch(/at least 10/);
  });

  it('sends nothing to a deactivated account', async () => {
    const s2 = await createShopWithPeople(t.knex, 'Inactive');
    await t.knex('users').where({ id: s2.people.tech.id }).update({ active: false });
    const res = await forgot(s2.people.tech.email);
    expect(res.body.message).toBe(FORGOT_PASSWORD_ANSWER);
    await new Promise((r) => setTimeout(r, 300));
    expect(await catcher.mailTo(s2.people.tech.email)).toHaveLength(0);
  });
});
