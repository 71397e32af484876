import crypto from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { installStockTrees } from '@/server/services/tree-stock';
import { createTestApp } from '../support/test-app';
import { createShopWithPeople, signedIn } from '../support/people';

// Lean at idle, normal at 2 500 rpm, low vacuum, a hose found off: a cause in four answers.
const PATH = [
  { type: 'reading', value: 18, unit: '%' },
  { type: 'reading', value: 3, unit: '%' },
  { type: 'reading', value: 15, unit: 'inHg' },
  { type: 'answer.hose-off' },
];

/** How many of the walks get a third, competing writer. */
const RACED = 6;

describe('walk steps under concurrent writers', () => {
  const t = createTestApp();
  afterAll(() => t.close());
  let walkIds: number[] = [];
  let agents: Array<Awaited<ReturnType<typeof signedIn>>> = [];

  beforeAll(async () => {
    const shop = await createShopWithPeople(t.knex, 'Durable');
    await installStockTrees(t.knex, shop.shopId);
    const tree = await t.knex('trees').where({ shop_id: shop.shopId, slug: 'lean-after-intake-manifold' }).first('id');
    agents = await Promise.all([shop.people.tech.email, shop.people.lead.email, shop.people.owner.email].map((e) => signedIn(t.app, e)));
    const job = await agents[0].post('/api/jobs').send({ roNumber: 'D-1', customerName: 'Load Test' });
    walkIds = [];
    for (let i = 0; i < 24; i++) walkIds.push((await agents[0].post('/api/walks').send({ jobId: job.body.job.id, treeId: tree.id })).body.walk.id);
  });

  it('keeps every acknowledged step exactly once, in order, with retries and two devices on one walk', async () => {
    const acknowledged: Array<{ walkId: number; stepId: string }> = [];
    const refusedIds: string[] = [];
    const walker = async (walkId: number, w: number) => {
      for (const event of PATH) {
        const stepId = crypto.randomUUID();
        // Each step is sent twice at once (a retry after a lost answer), from two signed-in devices.
        const sends = [agents[w % 3], agents[(w + 1) % 3]].map((a) => a.post(`/api/walks/${walkId}/steps`).send({ stepId, event }));
        const results = await Promise.all(sends);
        const raced = w < RACED;
        for (const r of results) expect(r.status, JSON.stringify(r.body)).toBe(raced && r.status === 409 ? 409 : 200);
        const ok = results.filter((r) => r.status === 200);
        // A retry gets the answer recorded the first time, never a second record.
        for (const r of ok) expect(r.body.step).toEqual(ok[0].body.step);
        if (ok.length) acknowledged.push({ walkId, stepId });
        else refusedIds.push(stepId);
      }
    };
    // Plus a third writer racing on the first walks with its own answers: some are refused (409), never half-written.
    const racer = async (walkId: number) => {
      for (let i = 0; i < 4; i++) {
        const stepId = crypto.randomUUID();
        const r = await agents[2].post(`/api/walks/${walkId}/steps`).send({ stepId, event: PATH[i] });
        if (r.status === 200) acknowledged.push({ walkId, stepId });
        else {
          expect(r.status).toBe(409);
          refusedIds.push(stepId);
        }
      }
    };
    await Promise.all([...walkIds.map((id, w) => walker(id, w)), ...walkIds.slice(0, RACED).map((id) => racer(id))]);

    const rows = await t.knex('walk_steps').whereIn('walk_id', walkIds).select('id', 'walk_id', 'seq');
    const count = new Map<string, number>();
    for (const r of rows) count.set(r.id, (count.get(r.id) ?? 0) + 1);
    for (const a of acknowledged) expect(count.get(a.stepId), a.stepId).toBe(1);
    for (const id of refusedIds) expect(count.has(id)).toBe(false);
    expect(rows).toHaveLength(acknowledged.length);
    // Sequence numbers have no gaps and no repeats within each walk.
    for (const id of walkIds) {
      const seqs = rows.filter((r) => r.walk_id === id).map((r) => r.seq).sort((a, b) => a - b);
      expect(seqs).toEqual(seqs.map((_, i) => i + 1));
    }
    // Walks nobody raced on ended at the cause, and the cached position matches the replay.
    for (const id of walkIds.slice(RACED)) {
      const walk = (await agents[0].get(`/api/walks/${id}`)).body;
      expect(walk.position).toMatchObject({ stepId: 'vacuum-hose-off-or-split', stepsTaken: 4 });
      expect(walk.walk.currentStep).toBe(walk.position.stepId);
    }
  });
});
