import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import crypto from 'node:crypto';
import request from 'supertest';
import { createTestApp } from '../support/test-app';
import { agent, createShopWithPeople, signedIn, type TestShop } from '../support/people';
import { linkFrom, startTestMailCatcher } from '../support/mail-catcher';

const unique = () => crypto.randomBytes(4).toString('hex');

describe('invitations through the SMTP catcher', () => {
  let catcher: Awaited<ReturnType<typeof startTestMailCatcher>>;
  let t: ReturnType<typeof createTestApp>;
  let shop: TestShop;

  beforeAll(async () => {
    catcher = await startTestMailCatcher();
    t = createTestApp(catcher.appConfig());
    shop = await createShopWithPeople(t.knex, 'Invite <b>&</b>');
  });
  afterAll(async () => {
    await t.close();
    await catcher.close();
  });

  async function invite(email: string, role = 'tech') {
    const owner = await signedIn(t.app, shop.people.owner.email);
    const res = await owner.post('/api/invitations').send({ email, role });
    expect(res.status).toBe(201);
    return { owner, res, mail: await catcher.waitForMail(email) };
  }

  it('mails a link with text and HTML parts; accepting sets name and password and signs in', async () => {
    const email = `new-tech-${unique()}@shop.example`;
    const { owner, res, mail } = await invite(email);
    expect(res.body.invitation).toMatchObject({ email, role: 'tech', invitedBy: shop.people.owner.name });
    const days = (Date.parse(res.body.invitation.expiresAt) - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThanOrEqual(7);

    expect(mail.subject).toContain(shop.name);
    expect(mail.text).toContain(shop.name);
    expect(mail.html).toBeTruthy();
    // The shop's name carries markup; the HTML part shows it escaped, never as tags.
    expect(mail.html).toContain('Invite &lt;b&gt;&amp;&lt;/b&gt;');
    expect(mail.html).not.toContain('<b>&</b>');

    const { url, token } = linkFrom(mail, '/accept-invite');
    expect(url.origin).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
    // Only a hash is stored.
    const row = await t.knex('invitations').where({ id: res.body.invitation.id }).first();
    expect(row.token_hash).toBe(crypto.createHash('sha256').update(token).digest('hex'));
    expect(JSON.stringify(row)).not.toContain(token);

    const pending = await owner.get('/api/invitations');
    expect(pending.body.invitations.map((i: { email: string }) => i.email)).toContain(email);

    const newcomer = agent(t.app);
    const look = await newcomer.post('/api/invitations/lookup').send({ token });
    expect(look.body).toEqual({ email, role: 'tech', shopName: shop.name });
    const accepted = await newcomer.post('/api/invitations/accept').send({ token, name: 'Rui Costa', password: 'my own long password' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.user).toMatchObject({ email, name: 'Rui Costa', role: 'tech', shop: { id: shop.shopId } });
    expect((await newcomer.get('/api/shop')).body.shop.id).toBe(shop.shopId);
    const later = await signedIn(t.app, email, 'my own long password');
    expect((await later.get('/api/auth/me')).body.user.name).toBe('Rui Costa');
    expect((await owner.get('/api/invitations')).body.invitations.map((i: { email: string }) => i.email)).not.toContain(email);
  });

  it('refuses a reused link with a clear message', async () => {
    const email = `reuse-${unique()}@shop.example`;
    const { mail } = await invite(email, 'support');
    const { token } = linkFrom(mail, '/accept-invite');
    expect((await agent(t.app).post('/api/invitations/accept').send({ token, name: 'First', password: 'first long password' })).status).toBe(200);
    const again = await agent(t.app).post('/api/invitations/accept').send({ token, name: 'Second', password: 'second long password' });
    expect(again.status).toBe(410);
    expect(again.body.error.code).toBe('link_used');
    expect(again.body.error.message).toMatch(/already been used/);
    expect((await t.knex('users').where({ email }).first()).name).toBe('First');
  });

  it('refuses an expired link', async () => {
    const email = `late-${unique()}@shop.example`;
    const { res, mail } = await invite(email);
    const { token } = linkFrom(mail, '/accept-invite');
    await t.knex('invitations').where({ id: res.body.invitation.id }).update({ expires_at: new Date(Date.now() - 1000) });
    const look = await agent(t.app).post('/api/invitations/lookup').send({ token });
    expect(look.status).toBe(410);
    expect(look.body.error.message).toMatch(/expired \(invitations last 7 days\)/);
    const accept = await agent(t.app).post('/api/invitations/accept').send({ token, name: 'Late', password: 'a long password here' });
    expect(accept.body.error.code).toBe('link_expired');
    expect(await t.knex('users').where({ email }).first()).toBeUndefined();
  });

  it('refuses forged and truncated links', async () => {
    const forged = crypto.randomBytes(32).toString('base64url');
    const res = await agent(t.app).post('/api/invitations/accept').send({ token: forged, name: 'Mallory', password: 'a long password here' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('link_invalid');
    expect(res.body.error.message).toMatch(/not valid/);
    const short = await agent(t.app).post('/api/invitations/lookup').send({ token: 'abc' });
    expect(short.status).toBe(400);
    expect(short.body.error.details.fields.token).toMatch(/not complete/);
  });

  it('a withdrawn or replaced invitation stops working', async () => {
    const email = `withdrawn-${unique()}@shop.example`;
    const { owner, res, mail } = await invite(email);
    const first = linkFrom(mail, '/accept-invite').token;
    const resent = await owner.post('/api/invitations').send({ email, role: 'lead' });
    expect(resent.status).toBe(201);
    const second = linkFrom(await catcher.waitForMail(email, 2), '/accept-invite').token;
    expect((await agent(t.app).post('/api/invitations/lookup').send({ token: first })).body.error.code).toBe('link_revoked');
    expect((await owner.delete(`/api/invitations/${resent.body.invitation.id}`)).status).toBe(204);
    expect((await agent(t.app).post('/api/invitations/lookup').send({ token: second })).status).toBe(410);
    expect((await owner.delete(`/api/invitations/${res.body.invitation.id}`)).status).toBe(404);
  });

  it('refuses to invite an address that already has an account, and non-owners', async () => {
    const owner = await signedIn(t.app, shop.people.owner.email);
    const res = await owner.post('/api/invitations').send({ email: shop.people.lead.email, role: 'tech' });
    expect(res.status).toBe(409);
    expect(res.body.error.details.fields.email).toMatch(/already has a Baywalk account/);
    const lead = await signedIn(t.app, shop.people.lead.email);
    expect((await lead.post('/api/invitations').send({ email: `x-${unique()}@shop.example`, role: 'tech' })).status).toBe(403);
    expect((await request(t.app).get('/api/invitations')).status).toBe(401);
  });
});

describe('when the mail server refuses', () => {
  // Port 1 on loopback: nothing listens, so the SMTP connection is refused.
  const t = createTestApp({ smtp: { host: '127.0.0.1', port: 1, secure: false, from: 'Baywalk <no-reply@baywalk.localhost>', user: undefined, pass: undefined } });
  afterAll(() => t.close());

  it('answers 502 with a message and keeps no pending invitation', async () => {
    const shop = await createShopWithPeople(t.knex);
    const owner = await signedIn(t.app, shop.people.owner.email);
    const email = `unsent-${unique()}@shop.example`;
    const res = await owner.post('/api/invitations').send({ email, role: 'tech' });
    expect(res.status).toBe(502);
    expect(res.body.error.message).toMatch(/could not be e-mailed/);
    expect((await owner.get('/api/invitations')).body.invitations).toEqual([]);
  });
});
