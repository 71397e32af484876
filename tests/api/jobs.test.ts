import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../support/test-app';
import { createShopWithPeople, signedIn, type TestShop } from '../support/people';

// Published example VIN (49 CFR 565.15 examples, REFERENCES.md §5): valid, model year 2005.
const GOOD_VIN = '1G4AH59H45G118341';
// The published altered example: check digit wrong.
const BAD_VIN = '1M8GDM9A0KP042788';

const job = (over: Record<string, unknown> = {}) => ({
  roNumber: `RO-${Math.random().toString(36).slice(2, 8)}`,
  customerName: 'Dana Whitlock',
  vin: GOOD_VIN,
  make: 'Buick',
  model: 'Century',
  engine: '3.1 V6',
  mileage: 142_300,
  install: [
    { type: 'intake_manifold', text: 'Ported upper intake plenum' },
    { type: 'throttle_body', text: '65 mm throttle body' },
  ],
  notes: 'Hunting idle since the install.',
  ...over,
});

describe('jobs API', () => {
  const t = createTestApp();
  let shop: TestShop;
  let other: TestShop;
  beforeAll(async () => {
    shop = await createShopWithPeople(t.knex, 'Jobs');
    other = await createShopWithPeople(t.knex, 'Other');
  });
  afterAll(() => t.close());

  it('creates a job, fills the model year from the VIN, and reads it back', async () => {
    const a = await signedIn(t.app, shop.people.tech.email);
    const input = job();
    const created = await a.post('/api/jobs').send(input);
    expect(created.status).toBe(201);
    expect(created.body.job).toMatchObject({
      roNumber: input.roNumber,
      vin: GOOD_VIN,
      vinOverride: false,
      year: 2005, // position 10 "5" with a digit in position 7 (49 CFR 565.15)
      install: input.install,
      createdBy: { id: shop.people.tech.id },
      openWalks: 0,
      walkCount: 0,
    });
    const read = await a.get(`/api/jobs/${created.body.job.id}`);
    expect(read.status).toBe(200);
    expect(read.body.job).toEqual(created.body.job);
  });

  it('edits a job, replacing its install list', async () => {
    const a = await signedIn(t.app, shop.people.lead.email);
    const { body } = await a.post('/api/jobs').send(job());
    const edited = await a.put(`/api/jobs/${body.job.id}`).send(job({ roNumber: body.job.roNumber, mileage: 150_000, install: [{ type: 'camshaft', text: 'Stage 2 cam' }], year: 2006 }));
    expect(edited.status).toBe(200);
    expect(edited.body.job).toMatchObject({ mileage: 150_000, year: 2006, install: [{ type: 'camshaft', text: 'Stage 2 cam' }] });
    const rows = await t.knex('job_changes').where({ job_id: body.job.id });
    expect(rows).toHaveLength(1);
  });

  it('refuses a wrong VIN check digit unless overridden, and names the field', async () => {
    const a = await signedIn(t.app, shop.people.tech.email);
    const refused = await a.post('/api/jobs').send(job({ vin: BAD_VIN }));
    expect(refused.status).toBe(400);
    expect(refused.body.error.details.fields.vin).toMatch(/check digit does not match/);
    const kept = await a.post('/api/jobs').send(job({ vin: BAD_VIN, vinOverride: true, year: 1979 }));
    expect(kept.status).toBe(201);
    expect(kept.body.job).toMatchObject({ vin: BAD_VIN, vinOverride: true, year: 1979 });
    // A pre-1981 serial shorter than 17 characters is accepted only with the override.
    expect((await a.post('/api/jobs').send(job({ vin: '1G37H5F123456' }))).status).toBe(400);
    expect((await a.post('/api/jobs').send(job({ vin: '1G37H5F123456', vinOverride: true }))).status).toBe(201);
  });

  it('explains each bad field', async () => {
    const a = await signedIn(t.app, shop.people.tech.email);
    const res = await a.post('/api/jobs').send({ roNumber: ' ', customerName: '', mileage: -4, year: 3000, install: [{ type: 'warp_drive' }] });
    expect(res.status).toBe(400);
    const f = res.body.error.details.fields;
    expect(f.roNumber).toMatch(/repair-order number/);
    expect(f.customerName).toMatch(/customer/);
    expect(f.mileage).toMatch(/negative/);
    expect(f.year).toMatch(/future/);
    expect(f['install.0.type']).toMatch(/kind of change/);
  });

  it('answers 409 with a clear message for a repeated RO number in the same shop, but not across shops', async () => {
    const a = await signedIn(t.app, shop.people.tech.email);
    const first = await a.post('/api/jobs').send(job({ roNumber: 'RO-1001' }));
    expect(first.status).toBe(201);
    const again = await a.post('/api/jobs').send(job({ roNumber: 'RO-1001' }));
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/RO-1001 is already a job/);
    const o = await signedIn(t.app, other.people.tech.email);
    expect((await o.post('/api/jobs').send(job({ roNumber: 'RO-1001' }))).status).toBe(201);
    // Renaming another job to a taken number is refused too.
    const second = await a.post('/api/jobs').send(job());
    expect((await a.put(`/api/jobs/${second.body.job.id}`).send(job({ roNumber: 'RO-1001' }))).status).toBe(409);
  });

  it("hides another shop's job (404) and lets only workshop roles in", async () => {
    const a = await signedIn(t.app, shop.people.tech.email);
    const { body } = await a.post('/api/jobs').send(job());
    const o = await signedIn(t.app, other.people.owner.email);
    expect((await o.get(`/api/jobs/${body.job.id}`)).status).toBe(404);
    expect((await o.put(`/api/jobs/${body.job.id}`).send(job())).status).toBe(404);
    expect((await o.get('/api/jobs?q=' + body.job.roNumber)).body.total).toBe(0);
    const support = await signedIn(t.app, shop.people.support.email);
    expect((await support.get('/api/jobs')).status).toBe(403);
    expect((await a.get('/api/jobs/not-a-number')).status).toBe(404);
  });

  it('searches by RO, VIN and customer, and pages', async () => {
    const s = await createShopWithPeople(t.knex, 'Search');
    const a = await signedIn(t.app, s.people.owner.email);
    for (let i = 0; i < 25; i++) {
      const res = await a.post('/api/jobs').send(job({ roNumber: `S-${String(i).padStart(3, '0')}`, customerName: i === 7 ? 'Priya Okonkwo' : `Customer ${i}`, vin: i === 3 ? 'JH2RC3605MM101581' : GOOD_VIN }));
      expect(res.status).toBe(201);
    }
    const page1 = await a.get('/api/jobs?pageSize=10');
    expect(page1.body).toMatchObject({ page: 1, pageSize: 10, total: 25 });
    expect(page1.body.items).toHaveLength(10);
    const page3 = await a.get('/api/jobs?pageSize=10&page=3');
    expect(page3.body.items).toHaveLength(5);
    const ids = new Set([...page1.body.items, ...page3.body.items].map((j: { id: number }) => j.id));
    expect(ids.size).toBe(15);
    expect((await a.get('/api/jobs?q=okonkwo')).body.items.map((j: { customerName: string }) => j.customerName)).toEqual(['Priya Okonkwo']);
    expect((await a.get('/api/jobs?q=s-012')).body.items.map((j: { roNumber: string }) => j.roNumber)).toEqual(['S-012']);
    expect((await a.get('/api/jobs?q=rc3605')).body.items.map((j: { roNumber: string }) => j.roNumber)).toEqual(['S-003']);
    expect((await a.get('/api/jobs?q=100%25')).body.total).toBe(0);
    const bad = await a.get('/api/jobs?pageSize=1000');
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.fields.pageSize).toMatch(/at most 100/);
  });
});
