import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp } from '../support/test-app';
import { agent, createShopWithPeople, signedIn, type TestShop } from '../support/people';
import { installStockTrees, loadStockLibrary } from '@/server/services/tree-stock';
import type { TreeDetail, TreeList } from '@/shared/schemas/trees';
import { treeDetailSchema, treeListSchema } from '@/shared/schemas/trees';

describe('trees API', () => {
  const t = createTestApp();
  const library = loadStockLibrary();
  let shop: TestShop;
  let other: TestShop;
  let otherTreeId: number;

  beforeAll(async () => {
    shop = await createShopWithPeople(t.knex, 'Trees');
    other = await createShopWithPeople(t.knex, 'Other');
    await installStockTrees(t.knex, shop.shopId);
    await installStockTrees(t.knex, other.shopId);
    otherTreeId = (await t.knex('trees').where({ shop_id: other.shopId }).first('id')).id;
  });
  afterAll(() => t.close());

  const list = async (query = '') => {
    const a = await signedIn(t.app, shop.people.tech.email);
    const res = await a.get(`/api/trees${query}`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    return treeListSchema.parse(res.body) as TreeList;
  };

  it('has a valid stock library to install', () => {
    expect(library.rejected).toEqual([]);
    expect(library.trees.length).toBeGreaterThan(0);
  });

  it('lists every stock tree for the shop, each with a published version', async () => {
    const { trees } = await list();
    expect(trees.map((x) => x.slug).sort()).toEqual(library.trees.map((x) => x.doc.id).sort());
    for (const tree of trees) {
      const stock = library.trees.find((x) => x.doc.id === tree.slug)!.doc;
      expect(tree).toMatchObject({ title: stock.title, symptom: stock.symptom, publishedVersion: 1, source: 'stock', status: 'active' });
      expect(tree.steps).toBe(Object.keys(stock.machine.states).length);
    }
  });

  it('filters by symptom and by install type', async () => {
    const symptom = library.trees[0].doc.symptom;
    const bySymptom = await list(`?symptom=${symptom}`);
    expect(bySymptom.trees.length).toBe(library.trees.filter((x) => x.doc.symptom === symptom).length);
    expect(bySymptom.trees.every((x) => x.symptom === symptom)).toBe(true);

    const installType = library.trees[0].doc.installTypes[0];
    const byInstall = await list(`?installType=${installType}`);
    expect(byInstall.trees.length).toBe(library.trees.filter((x) => x.doc.installTypes.includes(installType)).length);
    expect(byInstall.trees.every((x) => x.installTypes.includes(installType))).toBe(true);
  });

  it('searches titles and summaries by text, treating % and _ literally', async () => {
    const target = library.trees[library.trees.length - 1].doc;
    const word = target.title.split(/\s+/).find((w) => w.length > 5)!;
    const found = await list(`?q=${encodeURIComponent(word.toUpperCase())}`);
    expect(found.trees.map((x) => x.slug)).toContain(target.id);
    expect(found.trees.every((x) => `${x.title} ${x.summary}`.toLowerCase().includes(word.toLowerCase()))).toBe(true);
    expect((await list('?q=%25')).trees.every((x) => `${x.title}${x.summary}`.includes('%'))).toBe(true);
    expect((await list('?q=zzqx-nothing-like-this')).trees).toEqual([]);
  });

  it('answers a bad filter with 400 and a message naming the field', async () => {
    const a = await signedIn(t.app, shop.people.tech.email);
    const res = await a.get('/api/trees?symptom=sparkly');
    expect(res.status).toBe(400);
    expect(res.body.error.details.fields.symptom).toMatch(/Choose a symptom/);
  });

  it('fetches one tree with its published document, figures, steps in walk order and reachable causes', async () => {
    const { trees } = await list();
    const a = await signedIn(t.app, shop.people.support.email);
    for (const summary of trees) {
      const res = await a.get(`/api/trees/${summary.id}`);
      expect(res.status).toBe(200);
      const detail = treeDetailSchema.parse(res.body) as TreeDetail;
      const stock = library.trees.find((x) => x.doc.id === summary.slug)!.doc;
      expect(detail.version).toMatchObject({ version: 1, state: 'published', source: 'stock' });
      expect(detail.version!.doc).toEqual(stock);
      expect(detail.findings.filter((f) => f.severity === 'error')).toEqual([]);
      expect(detail.stats!.steps).toBe(Object.keys(stock.machine.states).length);
      expect(detail.steps[0]).toMatchObject({ id: stock.machine.initial, depth: 0 });
      expect(detail.steps.map((s) => s.depth)).toEqual([...detail.steps.map((s) => s.depth)].sort((x, y) => x - y));
      const causeSteps = Object.entries(stock.machine.states).filter(([, s]) => s.meta.kind === 'cause').map(([id]) => id);
      expect(detail.causes.map((c) => c.stepId).sort()).toEqual(causeSteps.sort());
      for (const c of detail.causes) expect(c.shortest).toBe(detail.stats!.shortestToCause[c.stepId]);
    }
  });

  it('answers a repeat fetch with 304 by ETag, and shows a publish made through this server on the very next fetch', async () => {
    const { trees } = await list();
    const target = trees.find((x) => x.slug === 'lean-after-intake-manifold')!;
    const tech = await signedIn(t.app, shop.people.tech.email);
    const first = await tech.get(`/api/trees/${target.id}`);
    expect(first.status).toBe(200);
    expect(first.headers.etag).toMatch(/^"[\w-]+"$/);
    const again = await tech.get(`/api/trees/${target.id}`).set('If-None-Match', first.headers.etag);
    expect(again.status).toBe(304);

    const lead = await signedIn(t.app, shop.people.lead.email);
    const draft = await lead.post(`/api/trees/${target.id}/draft`);
    expect(draft.status, JSON.stringify(draft.body)).toBe(201);
    const published = await lead.post(`/api/trees/${target.id}/publish`).send({ revision: draft.body.revision, note: 'Republished unchanged' });
    expect(published.status, JSON.stringify(published.body)).toBe(200);
    // Well inside the page cache's second: the write through this process is seen at once.
    const after = await tech.get(`/api/trees/${target.id}`).set('If-None-Match', first.headers.etag);
    expect(after.status).toBe(200);
    expect(treeDetailSchema.parse(after.body).version).toMatchObject({ version: draft.body.version, state: 'published' });
  });

  it("answers 404 for another shop's tree and for ids that are not ids", async () => {
    const a = await signedIn(t.app, shop.people.owner.email);
    for (const id of [String(otherTreeId), '999999999', 'abc', '1.5', '-3']) {
      const res = await a.get(`/api/trees/${id}`);
      expect(res.status, id).toBe(404);
      expect(res.body.error.message).toBe('That tree was not found.');
    }
    const theirs = await signedIn(t.app, other.people.lead.email);
    expect((await theirs.get(`/api/trees/${otherTreeId}`)).status).toBe(200);
  });

  it('answers 401 to anyone not signed in', async () => {
    expect((await request(t.app).get('/api/trees')).status).toBe(401);
    expect((await request(t.app).get(`/api/trees/${otherTreeId}`)).status).toBe(401);
  });
});

describe('installing the stock library', () => {
  const t = createTestApp();
  afterAll(() => t.close());

  it('is idempotent and adds a new published version when the shipped tree changes', async () => {
    const shop = await createShopWithPeople(t.knex, 'Stock');
    const library = loadStockLibrary();
    const first = await installStockTrees(t.knex, shop.shopId, library);
    expect(first.added).toHaveLength(library.trees.length);
    const again = await installStockTrees(t.knex, shop.shopId, library);
    expect(again).toMatchObject({ added: [], updated: [] });
    expect(await t.knex('trees').where({ shop_id: shop.shopId }).count({ n: '*' }).first()).toMatchObject({ n: library.trees.length });

    // The shipped library changes one tree's title.
    const changed = structuredClone(library);
    changed.trees[0].doc.title = `${changed.trees[0].doc.title} (revised)`;
    const update = await installStockTrees(t.knex, shop.shopId, changed);
    expect(update.updated).toEqual([changed.trees[0].doc.id]);
    const tree = await t.knex('trees').where({ shop_id: shop.shopId, slug: changed.trees[0].doc.id }).first();
    expect(tree.title).toMatch(/\(revised\)$/);
    const versions = await t.knex('tree_versions').where({ tree_id: tree.id }).orderBy('version');
    expect(versions.map((v: { version: number; state: string }) => [v.version, v.state])).toEqual([[1, 'retired'], [2, 'published']]);
    expect(tree.published_version_id).toBe(versions[1].id);

    // Once the shop has its own version, the stock library leaves the tree alone.
    await t.knex('tree_versions').insert({ tree_id: tree.id, shop_id: shop.shopId, version: 3, state: 'draft', doc: JSON.stringify(changed.trees[0].doc), source: 'shop', note: 'Our edit' });
    changed.trees[0].doc.title = 'Another shipped title';
    expect((await installStockTrees(t.knex, shop.shopId, changed)).updated).toEqual([]);
  });
});

describe('a shop opened by sign-up', () => {
  const t = createTestApp();
  afterAll(() => t.close());

  it('starts with the whole stock library published', async () => {
    const a = agent(t.app);
    const email = `founder-${Date.now()}-${Math.random().toString(36).slice(2, 8)}@trees.example`;
    const res = await a.post('/api/auth/sign-up').send({ shopName: 'Copperline Engine Works', name: 'Rene Founder', email, password: 'a long enough password' });
    expect(res.status, JSON.stringify(res.body)).toBeLessThan(300);
    const list = await a.get('/api/trees');
    expect(list.status).toBe(200);
    expect(list.body.trees.map((x: { slug: string }) => x.slug).sort()).toEqual(loadStockLibrary().trees.map((x) => x.doc.id).sort());
    expect(list.body.trees.every((x: { publishedVersion: number }) => x.publishedVersion === 1)).toBe(true);
  });
});
