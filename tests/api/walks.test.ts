import crypto from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { installStockTrees } from '@/server/services/tree-stock';
import { createTestApp } from '../support/test-app';
import { createShopWithPeople, signedIn, type TestShop } from '../support/people';
import { pdfText } from '../support/pdf-text';

const uuid = () => crypto.randomUUID();
type Agent = Awaited<ReturnType<typeof signedIn>>;

// A path through the stock tree "lean-after-intake-manifold" to a cause:
// lean at idle, normal at 2 500 rpm, low vacuum, a hose found off.
const LEAN_PATH = [
  { type: 'reading', value: 18, unit: '%' },
  { type: 'reading', value: 3, unit: '%' },
  { type: 'reading', value: 15, unit: 'inHg' },
  { type: 'answer.hose-off' },
];

/** A shop with the stock library, a job, and a tech signed in. */
async function setUp(t: ReturnType<typeof createTestApp>, label: string) {
  const shop = await createShopWithPeople(t.knex, label);
  await installStockTrees(t.knex, shop.shopId);
  const tree = await t.knex('trees').where({ shop_id: shop.shopId, slug: 'lean-after-intake-manifold' }).first('id', 'published_version_id');
  const tech = await signedIn(t.app, shop.people.tech.email);
  const job = await tech.post('/api/jobs').send({ roNumber: `W-${uuid().slice(0, 8)}`, customerName: 'Rowan Pike', install: [{ type: 'intake_manifold', text: '' }] });
  expect(job.status).toBe(201);
  return { shop, tech, treeId: tree.id as number, versionId: tree.published_version_id as number, jobId: job.body.job.id as number };
}

async function startWalk(a: Agent, jobId: number, treeId: number) {
  const res = await a.post('/api/walks').send({ jobId, treeId });
  expect(res.status).toBe(201);
  return res.body.walk.id as number;
}

describe('walks API', () => {
  const t = createTestApp();
  let ctx: Awaited<ReturnType<typeof setUp>>;
  let other: TestShop;
  beforeAll(async () => {
    ctx = await setUp(t, 'Walks');
    other = await createShopWithPeople(t.knex, 'Elsewhere');
  });
  afterAll(() => t.close());

  it('walks a stock tree to a cause, judging readings and recording every step', async () => {
    const id = await startWalk(ctx.tech, ctx.jobId, ctx.treeId);
    const start = await ctx.tech.get(`/api/walks/${id}`).set('Accept-Encoding', 'gzip, deflate, br');
    expect(start.status).toBe(200);
    // A walk with its tree document is tens of kilobytes: a browser gets it compressed.
    expect(start.headers['content-encoding']).toMatch(/^(br|gzip)$/);
    expect(start.body.position).toMatchObject({ stepId: 'trim-idle', final: false, stepsTaken: 0 });
    expect(start.body.position.shortestToCause).toBeGreaterThan(0);
    expect(start.body.walk.tree).toMatchObject({ id: ctx.treeId, versionId: ctx.versionId });
    expect(start.body.doc.id).toBe('lean-after-intake-manifold');
    expect(start.body.job.id).toBe(ctx.jobId);

    const targets: string[] = [];
    for (const [i, event] of LEAN_PATH.entries()) {
      const res = await ctx.tech.post(`/api/walks/${id}/steps`).send({ stepId: uuid(), event, note: i === 3 ? 'Booster line was off the nipple' : undefined });
      expect(res.status, JSON.stringify(res.body)).toBe(200);
      expect(res.body.step.seq).toBe(i + 1);
      expect(res.body.position.stepsTaken).toBe(i + 1);
      targets.push(res.body.position.stepId);
    }
    expect(targets).toEqual(['trim-2500-after-lean-idle', 'vacuum-idle', 'visual-hoses', 'vacuum-hose-off-or-split']);

    const walk = (await ctx.tech.get(`/api/walks/${id}`)).body;
    expect(walk.position).toMatchObject({ stepId: 'vacuum-hose-off-or-split', final: true, shortestToCause: 0 });
    expect(walk.history.map((h: { verdict: string | null }) => h.verdict)).toEqual(['lean', 'normal', 'low', null]);
    expect(walk.history[0]).toMatchObject({ readingValue: 18, readingUnit: '%', fromStep: 'trim-idle', by: { id: ctx.shop.people.tech.id } });
    expect(walk.history[0].judgement.summary).toMatch(/Lean/);
    expect(walk.history[3].note).toBe('Booster line was off the nipple');
    expect(walk.walk).toMatchObject({ currentStep: 'vacuum-hose-off-or-split', stepCount: 4, status: 'open' });
    // The job now shows an open walk.
    expect((await ctx.tech.get(`/api/jobs/${ctx.jobId}`)).body.job.openWalks).toBeGreaterThanOrEqual(1);
  });

  it('refuses an event the step does not offer (409 with the reason) and records nothing', async () => {
    const id = await startWalk(ctx.tech, ctx.jobId, ctx.treeId);
    const wrong = await ctx.tech.post(`/api/walks/${id}/steps`).send({ stepId: uuid(), event: { type: 'answer.hose-off' } });
    expect(wrong.status).toBe(409);
    expect(wrong.body.error.code).toBe('step_refused');
    expect(wrong.body.error.message).toMatch(/does not offer that.*a reading/);
    const badUnit = await ctx.tech.post(`/api/walks/${id}/steps`).send({ stepId: uuid(), event: { type: 'reading', value: 12, unit: 'inHg' } });
    expect(badUnit.status).toBe(409);
    expect(badUnit.body.error.message).toMatch(/percent/);
    const malformed = await ctx.tech.post(`/api/walks/${id}/steps`).send({ stepId: 'not-a-uuid', event: { type: 'reading', value: 'lots' } });
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.details.fields.stepId).toMatch(/UUID/);
    expect(await t.knex('walk_steps').where({ walk_id: id }).count({ n: '*' })).toEqual([{ n: 0 }]);
  });

  it('records a step sent twice with the same id only once, with the same answer', async () => {
    const id = await startWalk(ctx.tech, ctx.jobId, ctx.treeId);
    const stepId = uuid();
    const body = { stepId, event: LEAN_PATH[0] };
    const [a, b] = await Promise.all([ctx.tech.post(`/api/walks/${id}/steps`).send(body), ctx.tech.post(`/api/walks/${id}/steps`).send(body)]);
    const c = await ctx.tech.post(`/api/walks/${id}/steps`).send(body);
    for (const r of [a, b, c]) {
      expect(r.status).toBe(200);
      expect(r.body.step).toEqual(a.body.step);
    }
    expect(await t.knex('walk_steps').where({ walk_id: id }).count({ n: '*' })).toEqual([{ n: 1 }]);
    // The same id for another walk is refused, not silently reused.
    const id2 = await startWalk(ctx.tech, ctx.jobId, ctx.treeId);
    expect((await ctx.tech.post(`/api/walks/${id2}/steps`).send(body)).status).toBe(409);
  });

  it('undoes the last step as a record of its own; history is kept', async () => {
    const id = await startWalk(ctx.tech, ctx.jobId, ctx.treeId);
    expect((await ctx.tech.post(`/api/walks/${id}/undo`).send({ stepId: uuid() })).status).toBe(409); // nothing to undo yet
    for (const event of LEAN_PATH.slice(0, 2)) await ctx.tech.post(`/api/walks/${id}/steps`).send({ stepId: uuid(), event });
    const undoId = uuid();
    const undo = await ctx.tech.post(`/api/walks/${id}/undo`).send({ stepId: undoId });
    expect(undo.status).toBe(200);
    expect(undo.body.position).toMatchObject({ stepId: 'trim-2500-after-lean-idle', stepsTaken: 1 });
    expect((await ctx.tech.post(`/api/walks/${id}/undo`).send({ stepId: undoId })).body.step.id).toBe(undoId); // retry: same record
    // A different answer now takes the other branch.
    const lean = await ctx.tech.post(`/api/walks/${id}/steps`).send({ stepId: uuid(), event: { type: 'reading', value: 16, unit: '%' } });
    expect(lean.body.position.stepId).toBe('fuel-pressure');
    const walk = (await ctx.tech.get(`/api/walks/${id}`)).body;
    expect(walk.history.map((h: { kind: string; undone: boolean }) => `${h.kind}${h.undone ? '(undone)' : ''}`)).toEqual(['event', 'event(undone)', 'undo', 'event']);
    expect(walk.position.path).toEqual(['trim-idle', 'trim-2500-after-lean-idle', 'fuel-pressure']);
  });

  it('finishes with the cause from the cause step, counts time, and is read-only afterwards', async () => {
    const id = await startWalk(ctx.tech, ctx.jobId, ctx.treeId);
    for (const event of LEAN_PATH) await ctx.tech.post(`/api/walks/${id}/steps`).send({ stepId: uuid(), event });
    const done = await ctx.tech.post(`/api/walks/${id}/finish`).send({ outcome: 'fixed', note: 'Refitted the hose; trims +2 % after.' });
    expect(done.status).toBe(200);
    expect(done.body.walk).toMatchObject({
      status: 'finished',
      outcome: 'fixed',
      causeStep: 'vacuum-hose-off-or-split',
      causeCode: done.body.doc.machine.states['vacuum-hose-off-or-split'].meta.cause.code,
      finishNote: 'Refitted the hose; trims +2 % after.',
      finishedBy: { id: ctx.shop.people.tech.id },
    });
    expect(done.body.walk.causeCode).toBeTruthy();
    expect(done.body.walk.causeText).toBe(done.body.doc.machine.states['vacuum-hose-off-or-split'].meta.title);
    expect(done.body.walk.timeSpentS).toBeGreaterThanOrEqual(0);
    expect(done.body.walk.finishedAt).toBeTruthy();
    for (const res of [
      await ctx.tech.post(`/api/walks/${id}/steps`).send({ stepId: uuid(), event: { type: 'done' } }),
      await ctx.tech.post(`/api/walks/${id}/undo`).send({ stepId: uuid() }),
      await ctx.tech.post(`/api/walks/${id}/finish`).send({ outcome: 'not_fixed' }),
    ]) {
      expect(res.status).toBe(409);
      expect(res.body.error.message).toMatch(/finished/);
    }
  });

  it('makes a PDF report with the job, the steps, readings, verdicts, the cause and the cautions', async () => {
    const id = await startWalk(ctx.tech, ctx.jobId, ctx.treeId);
    for (const event of LEAN_PATH) await ctx.tech.post(`/api/walks/${id}/steps`).send({ stepId: uuid(), event, note: 'Checked twice' });
    const photo = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#556677' } }).jpeg().toBuffer();
    expect((await ctx.tech.post(`/api/walks/${id}/photos`).field('step', 'visual-hoses').attach('photo', photo, 'hose.jpg')).status).toBe(201);
    await ctx.tech.post(`/api/walks/${id}/finish`).send({ outcome: 'fixed', note: 'New clamp fitted' });
    const res = await ctx.tech.get(`/api/walks/${id}/report.pdf`).buffer(true).parse((r, cb) => {
      const parts: Buffer[] = [];
      r.on('data', (c: Buffer) => parts.push(c));
      r.on('end', () => cb(null, Buffer.concat(parts)));
    });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toMatch(/attachment; filename="baywalk-W-[\w-]+-walk-\d+\.pdf"/);
    const pdf = res.body as Buffer;
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    // Embedded images: the photo thumbnail is in the file.
    expect(pdf.includes(Buffer.from('/Subtype /Image'))).toBe(true);
    const text = pdfText(pdf);
    for (const words of ['Rowan Pike', 'Vacuum hose off or split', 'Verdict: Lean', 'Answer: 15 inHg', 'Note: Checked twice', 'New clamp fitted', 'CAUTION: Exhaust gas', `tech `, 'Time spent']) {
      expect(text, words).toContain(words);
    }
    const o = await signedIn(t.app, other.people.tech.email);
    expect((await o.get(`/api/walks/${id}/report.pdf`)).status).toBe(404);
  });

  it('asks for a cause in words when finishing as fixed before reaching a cause step', async () => {
    const id = await startWalk(ctx.tech, ctx.jobId, ctx.treeId);
    const res = await ctx.tech.post(`/api/walks/${id}/finish`).send({ outcome: 'fixed' });
    expect(res.status).toBe(400);
    expect(res.body.error.details.fields.causeText).toBeTruthy();
    const ok = await ctx.tech.post(`/api/walks/${id}/finish`).send({ outcome: 'fixed', causeText: 'Cracked PCV elbow found by eye' });
    expect(ok.body.walk).toMatchObject({ causeStep: null, causeCode: null, causeText: 'Cracked PCV elbow found by eye' });
  });

  it('keeps a walk on its pinned version when a new version is published', async () => {
    const id = await startWalk(ctx.tech, ctx.jobId, ctx.treeId);
    await ctx.tech.post(`/api/walks/${id}/steps`).send({ stepId: uuid(), event: LEAN_PATH[0] });
    // Publish a changed copy as a new version straight in the library tables.
    const v = await t.knex('tree_versions').where({ id: ctx.versionId }).first();
    const doc = typeof v.doc === 'string' ? JSON.parse(v.doc) : v.doc;
    doc.title = 'Lean after intake (revised)';
    const [newId] = await t.knex('tree_versions').insert({ tree_id: ctx.treeId, shop_id: ctx.shop.shopId, version: 99, state: 'published', doc: JSON.stringify(doc), published_at: new Date() });
    await t.knex('trees').where({ id: ctx.treeId }).update({ published_version_id: newId });
    const walk = (await ctx.tech.get(`/api/walks/${id}`)).body;
    expect(walk.walk.tree.versionId).toBe(ctx.versionId);
    expect(walk.doc.title).not.toBe('Lean after intake (revised)');
    const fresh = await startWalk(ctx.tech, ctx.jobId, ctx.treeId);
    expect((await ctx.tech.get(`/api/walks/${fresh}`)).body.walk.tree.versionId).toBe(newId);
    await t.knex('trees').where({ id: ctx.treeId }).update({ published_version_id: ctx.versionId });
  });

  it("answers 404 for another shop's job, walk and walk steps", async () => {
    const id = await startWalk(ctx.tech, ctx.jobId, ctx.treeId);
    const o = await signedIn(t.app, other.people.tech.email);
    expect((await o.get(`/api/walks/${id}`)).status).toBe(404);
    expect((await o.post(`/api/walks/${id}/steps`).send({ stepId: uuid(), event: LEAN_PATH[0] })).status).toBe(404);
    expect((await o.post(`/api/walks/${id}/undo`).send({ stepId: uuid() })).status).toBe(404);
    expect((await o.post(`/api/walks/${id}/finish`).send({ outcome: 'fixed', causeText: 'x' })).status).toBe(404);
    expect((await o.get(`/api/jobs/${ctx.jobId}/walks`)).status).toBe(404);
    // Starting a walk on another shop's job, or with another shop's tree, is refused too.
    expect((await o.post('/api/walks').send({ jobId: ctx.jobId, treeId: ctx.treeId })).status).toBe(404);
    const support = await signedIn(t.app, ctx.shop.people.support.email);
    expect((await support.get(`/api/walks/${id}`)).status).toBe(403);
  });

  it('lists the walks of a job', async () => {
    const res = await ctx.tech.get(`/api/jobs/${ctx.jobId}/walks`);
    expect(res.status).toBe(200);
    expect(res.body.items.length).toBeGreaterThan(3);
    expect(res.body.items[0].tree.title).toBeTruthy();
  });

  it("reads the tree versions of a job's walks list in one query however many walks it has", async () => {
    const fuel = await t.knex('trees').where({ shop_id: ctx.shop.shopId, slug: 'hiss-at-idle' }).first('id', 'title');
    const job = await ctx.tech.post('/api/jobs').send({ roNumber: `Q-${uuid().slice(0, 8)}`, customerName: 'Ash Vale', install: [] });
    const jobId = job.body.job.id as number;
    // Only reads of tree versions are counted: the session and user reads come and go with their one-second cache.
    const queriesToList = async () => {
      let n = 0;
      const count = (q: { sql: string }) => void (q.sql.includes('tree_versions') && n++);
      t.knex.on('query', count);
      try {
        const res = await ctx.tech.get(`/api/jobs/${jobId}/walks`);
        expect(res.status).toBe(200);
        return { n, items: res.body.items as { tree: { id: number; title: string } }[] };
      } finally {
        t.knex.off('query', count);
      }
    };
    await startWalk(ctx.tech, jobId, ctx.treeId);
    const one = await queriesToList();
    expect(one.items).toHaveLength(1);
    for (const treeId of [ctx.treeId, fuel.id, fuel.id]) await startWalk(ctx.tech, jobId, treeId);
    const four = await queriesToList();
    expect(four.items).toHaveLength(4);
    expect(one.n).toBe(1);
    expect(four.n).toBe(1);
    // Each walk still names its own tree.
    expect(four.items.filter((w) => w.tree.id === fuel.id).map((w) => w.tree.title)).toEqual([fuel.title, fuel.title]);
  });
});
