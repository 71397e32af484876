import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import crypto from 'node:crypto';
import { createTestApp } from '../support/test-app';
import { agent, createShopWithPeople, signedIn, TEST_PASSWORD, type TestShop } from '../support/people';

const unique = () => crypto.randomBytes(4).toString('hex');

describe('sign-up', () => {
  const t = createTestApp();
  afterAll(() => t.close());

  it('creates a shop and its owner, signed in, with default shop settings', async () => {
    const email = `founder-${unique()}@new-shop.example`;
    const a = agent(t.app);
    const res = await a.post('/api/auth/sign-up').send({ shopName: 'Ridgeback Engine Works', name: 'Ada Founder', email, password: 'a long enough password' });
    expect(res.status).toBe(201);
    expect(res.body.user).toMatchObject({ email, name: 'Ada Founder', role: 'owner', shop: { name: 'Ridgeback Engine Works' } });
    expect(String(res.headers['set-cookie'])).toMatch(/baywalk\.sid=/);
    const me = await a.get('/api/auth/me');
    expect(me.body.user.email).toBe(email);
    const shop = await a.get('/api/shop');
    expect(shop.status).toBe(200);
    expect(shop.body.shop).toEqual({ id: res.body.user.shop.id, name: 'Ridgeback Engine Works', altitudeM: 0, pressureUnit: 'inHg', comebackWindowDays: 30 });
    const row = await t.knex('users').where({ email }).first();
    expect(row.password_hash).not.toContain('a long enough password');
  });

  it('refuses an address that already has an account, naming the field, and creates no shop', async () => {
    const email = `taken-${unique()}@new-shop.example`;
    await agent(t.app).post('/api/auth/sign-up').send({ shopName: 'First Shop', name: 'One', email, password: 'a long enough password' });
    const shopsBefore = Number((await t.knex('shops').count({ n: '*' }).first())!.n);
    const again = await agent(t.app).post('/api/auth/sign-up').send({ shopName: 'Second Shop', name: 'Two', email: email.toUpperCase(), password: 'another long password' });
    expect(again.status).toBe(409);
    expect(again.body.error.details.fields.email).toMatch(/already has a Baywalk account/);
    expect(Number((await t.knex('shops').count({ n: '*' }).first())!.n)).toBe(shopsBefore);
  });

  it('names every field that needs fixing', async () => {
    const res = await agent(t.app).post('/api/auth/sign-up').send({ shopName: 'x', name: '', email: 'nope', password: 'short' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.details.fields).sort()).toEqual(['email', 'name', 'password', 'shopName']);
    expect(res.body.error.details.fields.password).toMatch(/at least 10/);
  });
});

describe('shop settings', () => {
  const t = createTestApp();
  let shop: TestShop;
  beforeAll(async () => {
    shop = await createShopWithPeople(t.knex);
  });
  afterAll(() => t.close());

  it('every staff role reads them; only the owner changes them', async () => {
    for (const role of ['owner', 'lead', 'tech', 'support'] as const) {
      const a = await signedIn(t.app, shop.people[role].email);
      const res = await a.get('/api/shop');
      expect(res.status).toBe(200);
      expect(res.body.shop.name).toBe(shop.name);
    }
    const lead = await signedIn(t.app, shop.people.lead.email);
    const refused = await lead.put('/api/shop').send({ name: 'Lead Renames', altitudeM: 10, pressureUnit: 'kPa', comebackWindowDays: 10 });
    expect(refused.status).toBe(403);

    const owner = await signedIn(t.app, shop.people.owner.email);
    const saved = await owner.put('/api/shop').send({ name: `${shop.name} West`, altitudeM: 1620, pressureUnit: 'kPa', comebackWindowDays: 45 });
    expect(saved.status).toBe(200);
    expect(saved.body.shop).toMatchObject({ name: `${shop.name} West`, altitudeM: 1620, pressureUnit: 'kPa', comebackWindowDays: 45 });
    expect((await owner.get('/api/auth/me')).body.user.shop.name).toBe(`${shop.name} West`);
  });

  it('refuses impossible values field by field and keeps what was saved', async () => {
    const owner = await signedIn(t.app, shop.people.owner.email);
    const before = (await owner.get('/api/shop')).body.shop;
    const res = await owner.put('/api/shop').send({ name: '', altitudeM: 99999, pressureUnit: 'furlongs', comebackWindowDays: 0 });
    expect(res.status).toBe(400);
    expect(res.body.error.details.fields).toMatchObject({
      name: expect.stringMatching(/shop name/),
      altitudeM: expect.stringMatching(/at most 5500 m/),
      pressureUnit: expect.stringMatching(/pressure unit/),
      comebackWindowDays: expect.stringMatching(/at least 1 day/),
    });
    const text = await owner.put('/api/shop').send({ ...before, altitudeM: '1200' });
    expect(text.status).toBe(400);
    expect(text.body.error.details.fields.altitudeM).toMatch(/number/);
    expect((await owner.get('/api/shop')).body.shop).toEqual(before);
  });
});

describe('people of the shop', () => {
  const t = createTestApp();
  let shop: TestShop;
  beforeAll(async () => {
    shop = await createShopWithPeople(t.knex);
  });
  afterAll(() => t.close());

  it('lists everyone for the owner, without password hashes; other roles are refused', async () => {
    const owner = await signedIn(t.app, shop.people.owner.email);
    const res = await owner.get('/api/people');
    expect(res.status).toBe(200);
    expect(res.body.people.map((p: { role: string }) => p.role)).toEqual(['owner', 'lead', 'tech', 'support']);
    expect(res.body.people[0]).toMatchObject({ email: shop.people.owner.email, active: true });
    expect(res.body.people[0].lastSignInAt).not.toBeNull();
    expect(JSON.stringify(res.body)).not.toMatch(/password|\$2[aby]\$/);
    for (const role of ['lead', 'tech', 'support'] as const) {
      expect((await (await signedIn(t.app, shop.people[role].email)).get('/api/people')).status).toBe(403);
    }
  });

  it('changes a role, and the new rights apply to the open session at once', async () => {
    const owner = await signedIn(t.app, shop.people.owner.email);
    const tech = await signedIn(t.app, shop.people.tech.email);
    expect((await tech.put('/api/shop').send({ name: 'x y', altitudeM: 0, pressureUnit: 'kPa', comebackWindowDays: 5 })).status).toBe(403);
    const res = await owner.patch(`/api/people/${shop.people.tech.id}`).send({ role: 'lead' });
    expect(res.status).toBe(200);
    expect(res.body.person).toMatchObject({ id: shop.people.tech.id, role: 'lead' });
    expect((await tech.get('/api/auth/me')).body.user.role).toBe('lead');
    await owner.patch(`/api/people/${shop.people.tech.id}`).send({ role: 'tech' });
  });

  it('deactivation cuts the person off at once and blocks sign-in; reactivation lets them back', async () => {
    const owner = await signedIn(t.app, shop.people.owner.email);
    const support = await signedIn(t.app, shop.people.support.email);
    const off = await owner.patch(`/api/people/${shop.people.support.id}`).send({ active: false });
    expect(off.status).toBe(200);
    expect(off.body.person.active).toBe(false);
    expect((await support.get('/api/auth/me')).body.user).toBeNull();
    expect((await support.get('/api/shop')).status).toBe(401);
    const again = await agent(t.app).post('/api/auth/sign-in').send({ email: shop.people.support.email, password: TEST_PASSWORD });
    expect(again.status).toBe(401);
    expect((await owner.patch(`/api/people/${shop.people.support.id}`).send({ active: true })).status).toBe(200);
    const back = await signedIn(t.app, shop.people.support.email);
    expect((await back.get('/api/auth/me')).body.user.role).toBe('support');
  });

  it('refuses an empty change and an unknown role with field messages', async () => {
    const owner = await signedIn(t.app, shop.people.owner.email);
    const empty = await owner.patch(`/api/people/${shop.people.lead.id}`).send({});
    expect(empty.status).toBe(400);
    expect(empty.body.error.details.fields._).toMatch(/Say what to change/);
    const bad = await owner.patch(`/api/people/${shop.people.lead.id}`).send({ role: 'captain' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.fields.role).toMatch(/Pick a role/);
    expect((await owner.patch('/api/people/not-a-number').send({ role: 'tech' })).status).toBe(404);
  });
});

describe('last-owner protection', () => {
  const t = createTestApp();
  afterAll(() => t.close());

  it('the only owner cannot demote or deactivate themselves', async () => {
    const shop = await createShopWithPeople(t.knex);
    const owner = await signedIn(t.app, shop.people.owner.email);
    const demote = await owner.patch(`/api/people/${shop.people.owner.id}`).send({ role: 'lead' });
    expect(demote.status).toBe(409);
    expect(demote.body.error.code).toBe('last_owner');
    expect(demote.body.error.message).toMatch(/only active owner.*Make someone else an owner first/);
    const deactivate = await owner.patch(`/api/people/${shop.people.owner.id}`).send({ active: false });
    expect(deactivate.status).toBe(409);
    const row = await t.knex('users').where({ id: shop.people.owner.id }).first();
    expect(row).toMatchObject({ role: 'owner', active: 1 });
  });

  it('with a second owner one may step down, but not both at the same moment', async () => {
    const shop = await createShopWithPeople(t.knex);
    const owner = await signedIn(t.app, shop.people.owner.email);
    expect((await owner.patch(`/api/people/${shop.people.lead.id}`).send({ role: 'owner' })).status).toBe(200);
    const second = await signedIn(t.app, shop.people.lead.email);
    // Each demotes the other at once: the lock on active owners lets exactly one through.
    const [a, b] = await Promise.all([
      owner.patch(`/api/people/${shop.people.lead.id}`).send({ role: 'lead' }),
      second.patch(`/api/people/${shop.people.owner.id}`).send({ role: 'tech' }),
    ]);
    // The one refused is stopped by the owner lock (409), or, when the other's demotion landed before its
    // request was checked, by no longer being an owner at all (403).
    const [won, lost] = a.status === 200 ? [a, b] : [b, a];
    expect(won.status).toBe(200);
    expect([403, 409]).toContain(lost.status);
    const owners = await t.knex('users').where({ shop_id: shop.shopId, role: 'owner', active: true });
    expect(owners).toHaveLength(1);
  });

  it('a deactivated owner does not count as the remaining owner', async () => {
    const shop = await createShopWithPeople(t.knex);
    const owner = await signedIn(t.app, shop.people.owner.email);
    await owner.patch(`/api/people/${shop.people.tech.id}`).send({ role: 'owner' });
    await owner.patch(`/api/people/${shop.people.tech.id}`).send({ active: false });
    const res = await owner.patch(`/api/people/${shop.people.owner.id}`).send({ role: 'lead' });
    expect(res.status).toBe(409);
  });
});
