import crypto from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { installStockTrees } from '@/server/services/tree-stock';
import { treeStatsSchema, type TreeStatsAnswer } from '@/shared/schemas/tree-authoring';
import type { ReadingParams } from '@/shared/readings/reading-kinds';
import { soundTree } from '@/trees/fixtures/sound-tree';
import { readingFor } from '@/trees/fixtures/walk-helpers';
import { createTestApp } from '../support/test-app';
import { createShopWithPeople, signedIn, type TestShop } from '../support/people';

type Agent = Awaited<ReturnType<typeof signedIn>>;
const uuid = () => crypto.randomUUID();
const doc = soundTree();
const params = (step: string) => (doc.machine.states as Record<string, { meta: { reading?: ReadingParams } }>)[step].meta.reading!;

/**
 * A hand-made fixture on the sound test tree (trees/fixtures/sound-tree.ts).
 * Each walk lists its answers; "undo" takes back the one before. Seconds of
 * work are set after finishing so the medians can be worked out on paper.
 */
type Move = string | { trims: string } | { pressure: string } | 'undo';
const WALKS: Array<{ name: string; moves: Move[]; outcome?: 'fixed' | 'not_fixed' | 'referred'; seconds?: number }> = [
  { name: 'W1', moves: ['sound', { trims: 'code_lean' }, { pressure: 'below' }], outcome: 'fixed', seconds: 600 },
  { name: 'W2', moves: ['split', 'done', { trims: 'lean' }, 'gasket', 'done', { trims: 'code_lean' }, { pressure: 'below' }], outcome: 'fixed', seconds: 1500 },
  { name: 'W3', moves: ['sound', { trims: 'lean' }, 'none', { pressure: 'within' }], outcome: 'fixed', seconds: 900 },
  { name: 'W4', moves: ['sound', { trims: 'normal' }, 'undo', { trims: 'code_lean' }, { pressure: 'within' }], outcome: 'fixed', seconds: 500 },
  { name: 'W5', moves: ['sound', { trims: 'rich' }], outcome: 'referred', seconds: 200 },
  { name: 'W6', moves: ['split', 'done'], outcome: 'not_fixed', seconds: 100 },
  { name: 'W7', moves: ['sound'] }, // left open: not counted in answers
  { name: 'W8', moves: ['sound', { trims: 'code_lean' }, { pressure: 'below' }], outcome: 'fixed', seconds: 480 },
];

describe('step statistics from finished walks', () => {
  const t = createTestApp();
  let shop: TestShop;
  let lead: Agent;
  let tech: Agent;
  let treeId: number;
  let v1: number;
  let jobId: number;

  async function walk(moves: Move[], outcome?: 'fixed' | 'not_fixed' | 'referred', seconds?: number, tree = treeId) {
    const started = await tech.post('/api/walks').send({ jobId, treeId: tree });
    expect(started.status, JSON.stringify(started.body)).toBe(201);
    const id = started.body.walk.id as number;
    const ctx = started.body.walk.context;
    for (const m of moves) {
      if (m === 'undo') {
        expect((await tech.post(`/api/walks/${id}/undo`).send({ stepId: uuid() })).status).toBe(200);
        continue;
      }
      const event =
        typeof m === 'string'
          ? { type: m === 'done' ? 'done' : `answer.${m}` }
          : 'trims' in m
            ? readingFor(params('read-trims'), m.trims, ctx)
            : readingFor(params('read-pressure'), m.pressure, ctx);
      const res = await tech.post(`/api/walks/${id}/steps`).send({ stepId: uuid(), event });
      expect(res.status, JSON.stringify(res.body)).toBe(200);
    }
    if (outcome) {
      const res = await tech.post(`/api/walks/${id}/finish`).send({ outcome });
      expect(res.status, JSON.stringify(res.body)).toBe(200);
      await t.knex('walks').where({ id }).update({ time_spent_s: seconds });
    }
    return id;
  }

  const stats = async (query = '') => {
    const res = await tech.get(`/api/trees/${treeId}/stats${query}`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    return treeStatsSchema.parse(res.body);
  };
  const counts = (s: TreeStatsAnswer, step: string) => Object.fromEntries(s.steps.find((x) => x.stepId === step)!.options.map((o) => [o.key, o.count]));

  beforeAll(async () => {
    shop = await createShopWithPeople(t.knex, 'Stats');
    await installStockTrees(t.knex, shop.shopId);
    [lead, tech] = await Promise.all([signedIn(t.app, shop.people.lead.email), signedIn(t.app, shop.people.tech.email)]);
    const imported = await lead.post('/api/trees/import').send({ text: JSON.stringify(doc) });
    expect(imported.status, JSON.stringify(imported.body)).toBe(201);
    treeId = imported.body.treeId;
    const draft = await lead.get(`/api/trees/${treeId}/draft`);
    const pub = await lead.post(`/api/trees/${treeId}/publish`).send({ revision: draft.body.revision, note: 'Fixture' });
    v1 = pub.body.versionId;
    const job = await tech.post('/api/jobs').send({ roNumber: `S-${uuid().slice(0, 8)}`, customerName: 'Noor Vale', install: [{ type: 'intake_manifold', text: '' }] });
    jobId = job.body.job.id;
    for (const w of WALKS) await walk(w.moves, w.outcome, w.seconds);
    // A finished walk on another tree of the same shop must not be counted.
    const other = (await t.knex('trees').where({ shop_id: shop.shopId, slug: 'lean-after-intake-manifold' }).first('id')).id;
    const o = await tech.post('/api/walks').send({ jobId, treeId: other });
    await tech.post(`/api/walks/${o.body.walk.id}/finish`).send({ outcome: 'not_fixed' });
  });
  afterAll(() => t.close());

  it('counts each answer and verdict taken at each step, leaving out open walks and undone answers', async () => {
    const s = await stats();
    // Worked by hand from WALKS: only finished walks W1–W6 and W8 count.
    expect(counts(s, 'look-hoses')).toEqual({ 'answer.split': 2, 'answer.sound': 5 });
    expect(counts(s, 'replace-hose')).toEqual({ done: 2 });
    expect(counts(s, 'read-trims')).toEqual({ normal: 0, lean: 2, rich: 1, code_lean: 4, code_rich: 0 });
    expect(counts(s, 'smoke-test')).toEqual({ 'answer.gasket': 1, 'answer.none': 1 });
    expect(counts(s, 'reseal-gasket')).toEqual({ done: 1 });
    expect(counts(s, 'read-pressure')).toEqual({ below: 3, within: 2, above: 0 });
    expect(s.steps.find((x) => x.stepId === 'read-trims')!.total).toBe(7);
    // Labels come from the tree: answer words and verdict words.
    const look = s.steps.find((x) => x.stepId === 'look-hoses')!;
    expect(look.options.find((o) => o.key === 'answer.split')).toMatchObject({ label: 'One is off or split', target: 'replace-hose' });
    expect(s.steps.find((x) => x.stepId === 'read-trims')!.options.find((o) => o.key === 'code_lean')!.label).toBe('Lean enough to set a code');
  });

  it('counts causes reached with the median answers and minutes to each, and how walks ended', async () => {
    const s = await stats();
    // weak-pump: W1, W2, W8 → answers 3, 7, 3 (median 3); seconds 600, 1500, 480 (median 600 = 10 min).
    // intake-leak: W3, W4 → answers 4, 3 (median 3.5); seconds 900, 500 (median 700 = 11.7 min).
    expect(s.causes).toEqual([
      { stepId: 'weak-pump', code: 'weak-fuel-supply', title: 'Fuel supply too weak', count: 3, medianSteps: 3, medianMinutes: 10 },
      { stepId: 'intake-leak', code: 'intake-leak', title: 'Leak at the intake', count: 2, medianSteps: 3.5, medianMinutes: 11.7 },
    ]);
    // Every walk to a cause: answers 3, 7, 4, 3, 3 → 3; seconds 600, 1500, 900, 500, 480 → 600 = 10 min.
    expect(s.toCause).toEqual({ medianSteps: 3, medianMinutes: 10 });
    // W1–W8: seven finished (five at a cause, W5 at a refer step, W6 closed early), W7 open.
    expect(s.walks).toEqual({ total: 8, finished: 7, open: 1, toCause: 5, toRefer: 1, unfinished: 1 });
  });

  it('narrows to one version when asked, and a new version adds to the tree total', async () => {
    const d = await lead.post(`/api/trees/${treeId}/draft`);
    const changed = structuredClone(d.body.doc);
    changed.title = 'Fixture, version 2';
    const saved = await lead.put(`/api/trees/${treeId}/draft`).send({ revision: d.body.revision, doc: changed });
    const pub = await lead.post(`/api/trees/${treeId}/publish`).send({ revision: saved.body.revision, note: 'Version 2' });
    expect(pub.status).toBe(200);
    await walk(['sound', { trims: 'rich' }], 'referred', 120);

    const v2 = await stats(`?version=${pub.body.versionId}`);
    expect(v2.walks).toEqual({ total: 1, finished: 1, open: 0, toCause: 0, toRefer: 1, unfinished: 0 });
    expect(counts(v2, 'read-trims')).toMatchObject({ rich: 1, code_lean: 0 });
    expect(v2.toCause).toEqual({ medianSteps: null, medianMinutes: null });

    const first = await stats(`?version=${v1}`);
    expect(first.walks.total).toBe(8);
    const all = await stats();
    expect(all.walks).toEqual({ total: 9, finished: 8, open: 1, toCause: 5, toRefer: 2, unfinished: 1 });
    expect(counts(all, 'look-hoses')['answer.sound']).toBe(6);
    expect((await tech.get(`/api/trees/${treeId}/stats?version=987654321`)).status).toBe(404);
  });

  it("never counts another shop's walks", async () => {
    const other = await createShopWithPeople(t.knex, 'Stats other');
    const theirs = await signedIn(t.app, other.people.lead.email);
    expect((await theirs.get(`/api/trees/${treeId}/stats`)).status).toBe(404);
  });
});
