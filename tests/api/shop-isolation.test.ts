import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { installStockTrees } from '@/server/services/tree-stock';
import { createInvitationRepository } from '@/server/repositories/invitation-repository';
import { hashLinkToken } from '@/server/auth/link-tokens';
import { createTestApp } from '../support/test-app';
import { createShopWithPeople, signedIn, type TestShop } from '../support/people';

type Agent = Awaited<ReturnType<typeof signedIn>>;
type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

interface Home {
  shop: TestShop;
  owner: Agent;
  tech: Agent;
}

/**
 * One resource: how to make a record in shop A, the calls by id that shop B
 * must find "not found" (404, exactly like an id that does not exist), a
 * list of shop B that must not show it, and a read by shop A afterwards
 * proving it was not touched. Write calls carry a valid body, so validation
 * cannot hide a leak. Adding a resource is one more entry in RESOURCES.
 */
interface Resource {
  name: string;
  create: (home: Home) => Promise<string | number>;
  calls: Array<[Method, string, (Record<string, unknown> | 'photo')?]>;
  list?: [string, (body: any) => Array<string | number>];
  readBack?: string;
}

const uuid = () => crypto.randomUUID();
const jobBody = () => ({ roNumber: `ISO-${uuid().slice(0, 8)}`, customerName: 'Iso Lation', install: [{ type: 'intake_manifold', text: 'Plenum' }] });

async function makeWalk(home: Home) {
  const tree = await t.knex('trees').where({ shop_id: home.shop.shopId, slug: 'lean-after-intake-manifold' }).first('id');
  const job = await home.tech.post('/api/jobs').send(jobBody());
  const walk = await home.tech.post('/api/walks').send({ jobId: job.body.job.id, treeId: tree.id });
  expect(walk.status, JSON.stringify(walk.body)).toBe(201);
  return walk.body.walk.id as number;
}

const tinyJpeg = () => sharp({ create: { width: 16, height: 16, channels: 3, background: '#777777' } }).jpeg().toBuffer();

const RESOURCES: Resource[] = [
  { name: 'people', create: async (h) => h.shop.people.tech.id, calls: [['patch', '/people/:id', { role: 'lead' }]], list: ['/people', (b) => b.people.map((p: { id: number }) => p.id)] },
  {
    name: 'invitations',
    create: async (h) =>
      createInvitationRepository(t.knex).create({ shop_id: h.shop.shopId, email: `iso-${uuid()}@shop.example`, role: 'tech', token_hash: hashLinkToken(uuid()), invited_by: h.shop.people.owner.id, expires_at: new Date(Date.now() + 86_400_000) }),
    calls: [['delete', '/invitations/:id']],
    list: ['/invitations', (b) => b.invitations.map((i: { id: number }) => i.id)],
  },
  {
    name: 'jobs',
    create: async (h) => (await h.tech.post('/api/jobs').send(jobBody())).body.job.id,
    calls: [['get', '/jobs/:id'], ['put', '/jobs/:id', jobBody()], ['get', '/jobs/:id/walks']],
    list: ['/jobs', (b) => b.items.map((j: { id: number }) => j.id)],
    readBack: '/jobs/:id',
  },
  {
    name: 'trees',
    create: async (h) => (await t.knex('trees').where({ shop_id: h.shop.shopId }).first('id')).id,
    calls: [
      ['get', '/trees/:id'],
      // Authoring (tests/api/tree-authoring.test.ts): drafts, publish, retire, history, files, statistics.
      ['get', '/trees/:id/draft'],
      ['post', '/trees/:id/draft'],
      ['put', '/trees/:id/draft', { revision: 1, doc: { id: 'not-mine' } }],
      ['delete', '/trees/:id/draft'],
      ['post', '/trees/:id/publish', { revision: 1, note: 'Not mine to publish' }],
      ['post', '/trees/:id/retire'],
      ['post', '/trees/:id/restore'],
      ['get', '/trees/:id/history'],
      ['get', '/trees/:id/versions/1'],
      ['get', '/trees/:id/diff?from=1&to=2'],
      ['get', '/trees/:id/stats'],
      ['get', '/trees/:id/export'],
    ],
    list: ['/trees', (b) => b.trees.map((x: { id: number }) => x.id)],
    readBack: '/trees/:id',
  },
  {
    name: 'walks',
    create: makeWalk,
    calls: [
      ['get', '/walks/:id'],
      ['post', '/walks/:id/steps', { stepId: uuid(), event: { type: 'reading', value: 18, unit: '%' } }],
      ['post', '/walks/:id/undo', { stepId: uuid() }],
      ['post', '/walks/:id/finish', { outcome: 'fixed', note: 'not mine' }],
      ['post', '/walks/:id/photos', 'photo'],
      ['get', '/walks/:id/report.pdf'],
    ],
    readBack: '/walks/:id',
  },
  {
    name: 'photos',
    create: async (h) => {
      const walkId = await makeWalk(h);
      const res = await h.tech.post(`/api/walks/${walkId}/photos`).field('step', 'trim-idle').attach('photo', await tinyJpeg(), { filename: 'a.jpg', contentType: 'image/jpeg' });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      return res.body.photo.id;
    },
    calls: [['get', '/photos/:id'], ['get', '/photos/:id/thumb']],
    readBack: '/photos/:id',
  },
];

const photosDir = fs.mkdtempSync(path.join(os.tmpdir(), 'baywalk-iso-photos-'));
const t = createTestApp({ photosDir });

describe('cross-shop isolation', () => {
  let a: Home;
  let b: Home;
  beforeAll(async () => {
    const home = async (label: string): Promise<Home> => {
      const shop = await createShopWithPeople(t.knex, label);
      await installStockTrees(t.knex, shop.shopId);
      return { shop, owner: await signedIn(t.app, shop.people.owner.email), tech: await signedIn(t.app, shop.people.tech.email) };
    };
    [a, b] = await Promise.all([home('IsoA'), home('IsoB')]);
  });
  afterAll(async () => {
    await t.close();
    fs.rmSync(photosDir, { recursive: true, force: true });
  });

  for (const resource of RESOURCES) {
    it(`${resource.name}: another shop's owner sees 404 by id, and the record stays intact`, async () => {
      const id = await resource.create(a);
      const before = resource.readBack ? await a.owner.get(`/api${resource.readBack.replace(':id', String(id))}`) : undefined;
      if (before) expect(before.status).toBe(200);

      for (const [method, template, body] of resource.calls) {
        const send = async (url: string) => {
          const call = b.owner[method](url);
          if (body === 'photo') return call.field('step', 'trim-idle').attach('photo', await tinyJpeg(), { filename: 'b.jpg', contentType: 'image/jpeg' });
          return body ? call.send(body) : call;
        };
        const url = `/api${template.replace(':id', String(id))}`;
        const res = await send(url);
        expect(res.status, `${method.toUpperCase()} ${url}: ${JSON.stringify(res.body).slice(0, 200)}`).toBe(404);
        // The same answer as for an id that does not exist.
        const missing = await send(`/api${template.replace(':id', '987654321')}`);
        expect(missing.status).toBe(404);
        expect(res.body.error?.message).toBe(missing.body.error?.message);
      }

      if (resource.list) {
        const [listPath, ids] = resource.list;
        const theirs = await b.owner.get(`/api${listPath}`);
        expect(theirs.status).toBe(200);
        expect(ids(theirs.body).map(String)).not.toContain(String(id));
        const ours = await a.owner.get(`/api${listPath}`);
        expect(ids(ours.body).map(String)).toContain(String(id));
      }

      if (before && resource.readBack) {
        const after = await a.owner.get(`/api${resource.readBack.replace(':id', String(id))}`);
        expect(after.status).toBe(200);
        if (after.type === 'application/json') expect(after.body).toEqual(before.body);
      }
    });
  }

  it('shop settings are always the caller’s own shop', async () => {
    expect((await b.owner.get('/api/shop')).body.shop.id).toBe(b.shop.shopId);
    await b.owner.put('/api/shop').send({ name: 'B renamed', altitudeM: 5, pressureUnit: 'kPa', comebackWindowDays: 9 });
    expect((await a.owner.get('/api/shop')).body.shop.name).toBe(a.shop.name);
  });
});
