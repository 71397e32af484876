import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../support/test-app';
import { agent, createShopWithPeople, signedIn, type TestShop } from '../support/people';
import { ROLES } from '@/shared/roles';
import { judgeIdleVacuum } from '@/shared/readings';

describe('POST /api/readings/check', () => {
  const t = createTestApp();
  let shop: TestShop;
  beforeAll(async () => {
    shop = await createShopWithPeople(t.knex, 'Readings');
  });
  afterAll(() => t.close());

  it('refuses anonymous callers with 401', async () => {
    const res = await agent(t.app).post('/api/readings/check').send({ vacuum: { value: 18, unit: 'inHg' } });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('answers every staff role with the same judgement the shared module gives', async () => {
    const body = { vacuum: { value: 14, unit: 'inHg' }, altitude: { value: 1500, unit: 'm' }, profile: 'stock', needle: 'steady' };
    const expected = judgeIdleVacuum({ reading: 'vacuum', value: 14, unit: 'inHg', profile: 'stock', needle: 'steady' }, { altitudeM: 1500 });
    for (const role of ROLES) {
      const a = await signedIn(t.app, shop.people[role].email);
      const res = await a.post('/api/readings/check').send(body);
      expect(res.status, role).toBe(200);
      expect(res.body.vacuum).toEqual(JSON.parse(JSON.stringify(expected)));
      expect(res.body.baro).toMatchObject({ source: 'altitude', altitudeM: 1500 });
    }
  });

  it('judges MAP with a measured barometric pressure and trims per bank, with causes, checks and cautions', async () => {
    const a = await signedIn(t.app, shop.people.tech.email);
    const res = await a.post('/api/readings/check').send({
      map: { value: 48, unit: 'kPa' },
      baro: { value: 100, unit: 'kPa' },
      trims: {
        bank1: { idle: { shortPct: 12, longPct: 10 }, at2500: { shortPct: 3, longPct: 2 } },
        bank2: { idle: { shortPct: 11, longPct: 9 }, at2500: { shortPct: 2, longPct: 2 } },
      },
    });
    expect(res.status).toBe(200);
    expect(res.body.vacuum.verdict).toBe('low');
    expect(res.body.vacuum.profile).toBe('stock');
    expect(res.body.trims).toMatchObject({ verdict: 'lean', pattern: 'unmetered_air', scope: 'both_banks' });
    expect(res.body.trims.causes[0].cause).toMatch(/unmetered air/i);
    expect(res.body.trims.nextChecks.length).toBeGreaterThan(0);
    expect(res.body.trims.cautions.map((c: { kind: string }) => c.kind)).toContain('running_engine');
  });

  it('answers 400 with field-level messages for input of the wrong shape', async () => {
    const a = await signedIn(t.app, shop.people.support.email);
    const res = await a.post('/api/readings/check').send({ vacuum: { value: 'eighteen', unit: 'furlongs' }, profile: 'turbo' });
    expect(res.status).toBe(400);
    expect(res.body.error.details.fields['vacuum.value']).toMatch(/Enter the vacuum as a number/);
    expect(res.body.error.details.fields['vacuum.unit']).toMatch(/Pick a pressure unit/);
    expect(res.body.error.details.fields.profile).toMatch(/Pick an engine profile/);
  });

  it('answers 400 asking for something to judge when the body is empty', async () => {
    const a = await signedIn(t.app, shop.people.lead.email);
    const res = await a.post('/api/readings/check').send({});
    expect(res.status).toBe(400);
    expect(res.body.error.details.fields.vacuum).toMatch(/Enter an idle vacuum or MAP reading, or fuel trims/);
  });

  it('refuses vacuum and MAP together', async () => {
    const a = await signedIn(t.app, shop.people.lead.email);
    const res = await a.post('/api/readings/check').send({ vacuum: { value: 18, unit: 'inHg' }, map: { value: 40, unit: 'kPa' } });
    expect(res.status).toBe(400);
    expect(res.body.error.details.fields.map).toMatch(/not both/);
  });

  it('answers 400 naming each physically impossible field (ReadingError)', async () => {
    const a = await signedIn(t.app, shop.people.owner.email);
    const res = await a.post('/api/readings/check').send({
      vacuum: { value: 35, unit: 'inHg' },
      trims: { bank1: { idle: { shortPct: 120, longPct: 0 } } },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('bad_request');
    expect(res.body.error.message).toMatch(/more than the air pressure/);
    expect(res.body.error.details.fields.vacuum).toMatch(/Use 0 to 29\.9 inHg/);
    expect(res.body.error.details.fields['trims.bank1.idle.shortPct']).toMatch(/−100 to \+99\.22 %/);
  });

  it('refuses an altitude above the troposphere and a negative MAP', async () => {
    const a = await signedIn(t.app, shop.people.tech.email);
    const high = await a.post('/api/readings/check').send({ vacuum: { value: 10, unit: 'inHg' }, altitude: { value: 12_000, unit: 'm' } });
    expect(high.status).toBe(400);
    expect(high.body.error.details.fields.altitude).toMatch(/above the troposphere/);
    const negative = await a.post('/api/readings/check').send({ map: { value: -4, unit: 'kPa' } });
    expect(negative.status).toBe(400);
    expect(negative.body.error.details.fields.map).toMatch(/cannot be below 0/);
  });

  it('never answers 500 to non-JSON or absurd numbers', async () => {
    const a = await signedIn(t.app, shop.people.tech.email);
    const text = await a.post('/api/readings/check').set('Content-Type', 'application/json').send('{"vacuum":');
    expect(text.status).toBe(400);
    const huge = await a.post('/api/readings/check').send({ vacuum: { value: 1e308, unit: 'psi' } });
    expect(huge.status).toBe(400);
    expect(huge.body.error.details.fields.vacuum).toBeTruthy();
  });
});
