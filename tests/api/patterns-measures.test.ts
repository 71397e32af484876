import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Knex } from 'knex';
import { createTestApp } from '../support/test-app';
import { createShopWithPeople, type TestShop } from '../support/people';
import { installStockTrees } from '@/server/services/tree-stock';
import { createPatternService } from '@/server/services/pattern-service';
import type { InstallType } from '@/trees/tree-format';

/**
 * Every Patterns measure against a small fixture whose answers are worked out
 * by hand below (the comments show the arithmetic). Rows are inserted with
 * Knex so every date is exact. Range: Monday 2 March to Sunday 29 March 2026
 * (four whole weeks); comeback window 30 days.
 */
const t = createTestApp();
const service = createPatternService(t.knex);
const RANGE = { from: '2026-03-02', to: '2026-03-29' };
const at = (s: string) => new Date(`${s}Z`);

const L = 'lean-after-intake-manifold'; // symptom lean_code
const H = 'hiss-at-idle'; // symptom hiss_at_idle
const I = 'high-idle-after-throttle-body'; // symptom high_or_hunting_idle
const POO = 'port-left-open';
const VHO = 'vacuum-hose-off-or-split';
const TBG = 'throttle-body-gasket-leak';
const TSM = 'throttle-stop-misadjusted';

interface JobSpec { ro: string; vin: string | null; make?: string; engine?: string; install: InstallType[] }
interface WalkSpec {
  job: number | null;
  tree: string;
  by: number;
  outcome?: 'fixed' | 'not_fixed' | 'referred';
  cause?: string;
  started: string;
  finished?: string;
  time?: number;
  steps?: number;
}

async function fixtureWriter(knex: Knex, shopId: number) {
  await installStockTrees(knex, shopId);
  const trees = new Map<string, { id: number; version: number }>();
  for (const r of await knex('trees').where({ shop_id: shopId }).select('id', 'slug', 'published_version_id')) trees.set(r.slug, { id: r.id, version: r.published_version_id });
  return {
    async job(j: JobSpec): Promise<number> {
      const [id] = await knex('jobs').insert({ shop_id: shopId, ro_number: j.ro, customer_name: `Customer ${j.ro}`, vin: j.vin, make: j.make ?? 'Ford', model: 'Test', engine: j.engine ?? '5.0 V8', vehicle_year: 2015 });
      if (j.install.length) await knex('job_changes').insert(j.install.map((type, position) => ({ job_id: id, shop_id: shopId, position, install_type: type })));
      return id as number;
    },
    async walk(w: WalkSpec): Promise<number> {
      const tree = trees.get(w.tree)!;
      const [id] = await knex('walks').insert({
        shop_id: shopId,
        job_id: w.job,
        tree_id: tree.id,
        tree_version_id: tree.version,
        started_by: w.by,
        status: w.finished ? 'finished' : 'open',
        current_step: w.cause ?? 'somewhere',
        step_count: w.steps ?? 3,
        outcome: w.outcome ?? null,
        cause_step: w.cause ?? null,
        cause_code: w.cause ?? null,
        cause_text: w.cause ? `Found ${w.cause}` : w.outcome === 'referred' ? 'Calibration specialist: the tune needs a look' : null,
        finished_by: w.finished ? w.by : null,
        time_spent_s: w.finished ? (w.time ?? 600) : null,
        started_at: at(w.started),
        finished_at: w.finished ? at(w.finished) : null,
      });
      return id as number;
    },
  };
}

describe('Patterns measures on a hand-worked fixture', () => {
  let shop: TestShop;
  let other: TestShop;
  const W: Record<string, number> = {};
  let tech: number;
  let lead: number;

  beforeAll(async () => {
    shop = await createShopWithPeople(t.knex, 'Patterns measures');
    other = await createShopWithPeople(t.knex, 'Patterns other');
    await t.knex('shops').where({ id: shop.shopId }).update({ comeback_window_days: 30 });
    tech = shop.people.tech.id;
    lead = shop.people.lead.id;
    const f = await fixtureWriter(t.knex, shop.shopId);
    const V = (n: number) => `TESTVIN0000000${String(n).padStart(3, '0')}`;
    const J = {
      1: await f.job({ ro: 'P-1', vin: V(1), install: ['intake_manifold'] }),
      2: await f.job({ ro: 'P-2', vin: V(1), install: ['intake_manifold'] }),
      3: await f.job({ ro: 'P-3', vin: V(2), make: 'Chevrolet', engine: '6.2 V8', install: ['intake_manifold', 'throttle_body'] }),
      5: await f.job({ ro: 'P-5', vin: V(3), make: 'Chevrolet', engine: '6.2 V8', install: ['throttle_body'] }),
      6: await f.job({ ro: 'P-6', vin: V(3), make: 'Chevrolet', engine: '6.2 V8', install: ['throttle_body'] }),
      7: await f.job({ ro: 'P-7', vin: V(4), make: 'Dodge', engine: '5.7 V8', install: ['intake_manifold'] }),
      8: await f.job({ ro: 'P-8', vin: V(4), make: 'Dodge', engine: '5.7 V8', install: ['intake_manifold'] }),
      9: await f.job({ ro: 'P-9', vin: V(5), install: ['throttle_body'] }),
      10: await f.job({ ro: 'P-10', vin: V(5), install: ['throttle_body'] }),
      11: await f.job({ ro: 'P-11', vin: V(6), install: ['throttle_body'] }),
      12: await f.job({ ro: 'P-12', vin: V(6), install: ['throttle_body'] }),
      13: await f.job({ ro: 'P-13', vin: null, install: ['camshaft'] }),
      14: await f.job({ ro: 'P-14', vin: V(7), install: ['sensor_relocation'] }),
      15: await f.job({ ro: 'P-15', vin: V(8), install: ['intake_manifold'] }),
      16: await f.job({ ro: 'P-16', vin: V(9), install: ['throttle_body'] }),
      17: await f.job({ ro: 'P-17', vin: V(10), install: ['intake_manifold'] }),
    };
    W[1] = await f.walk({ job: J[1], tree: L, by: tech, outcome: 'fixed', cause: POO, started: '2026-03-02T08:00:00', finished: '2026-03-02T09:00:00', time: 1800, steps: 6 });
    W[3] = await f.walk({ job: J[3], tree: H, by: lead, outcome: 'fixed', cause: POO, started: '2026-03-03T08:00:00', finished: '2026-03-03T12:00:00', time: 2400, steps: 8 });
    W[9] = await f.walk({ job: J[9], tree: I, by: tech, outcome: 'fixed', cause: TSM, started: '2026-03-04T08:30:00', finished: '2026-03-04T09:00:00', time: 700, steps: 4 });
    W[5] = await f.walk({ job: J[5], tree: I, by: tech, outcome: 'fixed', cause: TBG, started: '2026-03-05T09:00:00', finished: '2026-03-05T10:00:00', time: 900, steps: 4 });
    W[15] = await f.walk({ job: J[1], tree: L, by: tech, outcome: 'fixed', cause: POO, started: '2026-03-05T08:00:00', finished: '2026-03-05T09:00:00', time: 1000, steps: 6 });
    W[11] = await f.walk({ job: J[11], tree: I, by: lead, outcome: 'fixed', cause: TSM, started: '2026-03-06T08:00:00', finished: '2026-03-06T09:00:00', time: 800, steps: 5 });
    W[2] = await f.walk({ job: J[2], tree: L, by: tech, outcome: 'fixed', cause: VHO, started: '2026-03-10T10:00:00', finished: '2026-03-10T11:00:00', time: 1200, steps: 5 });
    W[6] = await f.walk({ job: J[6], tree: L, by: tech, outcome: 'fixed', cause: VHO, started: '2026-03-12T08:00:00', finished: '2026-03-12T09:00:00', time: 600, steps: 3 });
    W[7] = await f.walk({ job: J[7], tree: L, by: lead, outcome: 'fixed', cause: POO, started: '2026-03-16T09:00:00', finished: '2026-03-16T10:00:00', time: 3000, steps: 10 });
    W[13] = await f.walk({ job: J[13], tree: L, by: lead, outcome: 'referred', started: '2026-03-18T09:00:00', finished: '2026-03-18T10:00:00', time: 2000, steps: 9 });
    W[8] = await f.walk({ job: J[8], tree: H, by: tech, outcome: 'fixed', cause: POO, started: '2026-03-20T08:00:00', finished: '2026-03-20T09:00:00', time: 1500, steps: 7 });
    W[14] = await f.walk({ job: J[14], tree: H, by: tech, outcome: 'not_fixed', started: '2026-03-24T09:00:00', finished: '2026-03-24T10:00:00', time: 2500, steps: 12 });
    // Last minute of the range: counted.
    W[17] = await f.walk({ job: J[16], tree: I, by: lead, outcome: 'fixed', cause: TBG, started: '2026-03-29T23:00:00', finished: '2026-03-29T23:59:00', time: 1100, steps: 4 });
    // Just outside the range on either side: not counted.
    W[16] = await f.walk({ job: J[15], tree: L, by: tech, outcome: 'fixed', cause: POO, started: '2026-03-29T23:30:00', finished: '2026-03-30T00:00:00', time: 900, steps: 5 });
    W[0] = await f.walk({ job: J[17], tree: L, by: tech, outcome: 'fixed', cause: POO, started: '2026-03-01T23:00:00', finished: '2026-03-01T23:59:00', time: 900, steps: 5 });
    // W9 closed 4 March 09:00: W10 starts exactly 30 days later, the last moment of the window (still open).
    W[10] = await f.walk({ job: J[10], tree: I, by: tech, started: '2026-04-03T09:00:00' });
    // W11 closed 6 March 09:00: W12 starts 31 days later, one day after the window.
    W[12] = await f.walk({ job: J[12], tree: I, by: tech, outcome: 'referred', started: '2026-04-06T09:00:00', finished: '2026-04-06T10:00:00' });
    // A guest walk (no job) with the commonest cause: never counted.
    W[90] = await f.walk({ job: null, tree: L, by: tech, outcome: 'fixed', cause: POO, started: '2026-03-10T08:00:00', finished: '2026-03-10T09:00:00' });

    // Another shop: the same VIN as W1 walked again for the same symptom, and its own cause counts. None of it may show.
    const o = await fixtureWriter(t.knex, other.shopId);
    const oj1 = await o.job({ ro: 'O-1', vin: V(1), install: ['intake_manifold'] });
    const oj2 = await o.job({ ro: 'O-2', vin: V(1), install: ['intake_manifold'] });
    await o.walk({ job: oj1, tree: L, by: other.people.tech.id, outcome: 'fixed', cause: POO, started: '2026-03-03T08:00:00', finished: '2026-03-03T09:00:00' });
    await o.walk({ job: oj2, tree: L, by: other.people.tech.id, outcome: 'fixed', cause: POO, started: '2026-03-11T08:00:00', finished: '2026-03-11T09:00:00' });
  });
  afterAll(() => t.close());

  it('counts finished walks and outcomes in the range only (boundaries, guests and other shops left out)', async () => {
    const r = await service.report(shop.shopId, RANGE);
    // In range: W1 W2 W3 W5 W6 W7 W8 W9 W11 W13 W14 W15 W17 = 13. W0 and W16 fall just outside; W10 is open; W12 is in April; W90 is a guest walk.
    expect(r.totals).toMatchObject({ finished: 13, withCause: 11, fixed: 11, notFixed: 1, referred: 1 });
    expect(r.filters).toMatchObject({ from: '2026-03-02', to: '2026-03-29', installType: null });
    expect(r.windowDays).toBe(30);
  });

  it('lists causes found with their count and share of finished walks', async () => {
    const r = await service.report(shop.shopId, RANGE);
    // port-left-open: W1 W3 W7 W8 W15 (5 walks); the rest 2 each, then by code.
    expect(r.causes.map((c) => [c.code, c.walks])).toEqual([
      [POO, 5],
      [TBG, 2],
      [TSM, 2],
      [VHO, 2],
    ]);
    expect(r.causes[0].share).toBeCloseTo(5 / 13, 10);
    expect(r.causes[3].share).toBeCloseTo(2 / 13, 10);
    // Titles come from the tree documents, not the code.
    expect(r.causes[0].title).not.toBe(POO);
    expect(r.causes[0].title.length).toBeGreaterThan(5);
  });

  it('ranks repeat causes: the same cause on two or more jobs with the same install type', async () => {
    const r = await service.report(shop.shopId, RANGE);
    // Intake manifold jobs with port-left-open: J1 (W1, W15), J3, J7, J8 → 4 jobs, 5 walks.
    // Throttle body: gasket on J5 and J16; stop screw on J9 and J11. vacuum-hose and port-left-open on throttle-body jobs: one job each → not repeats.
    expect(r.repeats.map((x) => [x.installType, x.code, x.jobs, x.walks])).toEqual([
      ['intake_manifold', POO, 4, 5],
      ['throttle_body', TBG, 2, 2],
      ['throttle_body', TSM, 2, 2],
    ]);
    expect(r.repeats[0].lastFoundAt).toBe('2026-03-20T09:00:00.000Z');
  });

  it('links comebacks: same VIN, another job, same symptom or same cause, up to the last day of the window', async () => {
    const r = await service.report(shop.shopId, RANGE);
    // (W9, W10) 30 days: the last day of the window counts. (W11, W12) 31 days: does not.
    // (W7, W8): hiss after lean, but the same cause. (W5, W6): other symptom and other cause: not a comeback.
    // (W1, W2) and (W15, W2): both fixed lean walks on V1 came back with lean on J2. W15 → W1 share a job: not a comeback.
    // The other shop's walks on V1 never pair with ours.
    expect(r.comebacks.map((c) => [c.first.walkId, c.again.walkId, c.days, c.sameSymptom, c.sameCause])).toEqual([
      [W[9], W[10], 30, true, false],
      [W[7], W[8], 3, false, true],
      [W[15], W[2], 5, true, false],
      [W[1], W[2], 8, true, false],
    ]);
    expect(r.totals.comebacks).toBe(4);
    expect(r.totals.cameBack).toBe(4);
    const c = r.comebacks[1];
    expect(c).toMatchObject({ vin: 'TESTVIN0000000004', first: { roNumber: 'P-7', causeCode: POO }, again: { roNumber: 'P-8', symptom: 'hiss_at_idle', causeCode: POO } });
  });

  it('drops the 30th-day comeback when the shop shortens its window to 29 days', async () => {
    await t.knex('shops').where({ id: shop.shopId }).update({ comeback_window_days: 29 });
    try {
      const r = await service.report(shop.shopId, RANGE);
      // With 29 days, W10 (30 days after W9) is outside; the others are 8 days or less.
      expect(r.comebacks.map((c) => c.again.walkId)).not.toContain(W[10]);
      expect(r.totals.comebacks).toBe(3);
    } finally {
      await t.knex('shops').where({ id: shop.shopId }).update({ comeback_window_days: 30 });
    }
  });

  it('counts walks ended referred or not fixed per tree', async () => {
    const r = await service.report(shop.shopId, RANGE);
    const title = async (slug: string) => (await t.knex('trees').where({ shop_id: shop.shopId, slug }).first('title')).title;
    // Lean: W1 W2 W6 W7 W13 W15 = 6, W13 referred. Hiss: W3 W8 W14 = 3, W14 not fixed. High idle: W5 W9 W11 W17 = 4, none.
    expect(r.unresolved.map((u) => [u.treeTitle, u.finished, u.referred, u.notFixed])).toEqual([
      [await title(L), 6, 1, 0],
      [await title(H), 3, 0, 1],
      [await title(I), 4, 0, 0],
    ]);
    expect(r.unresolved[0].share).toBeCloseTo(1 / 6, 10);
    expect(r.unresolved[1].share).toBeCloseTo(1 / 3, 10);
  });

  it('gives median and 90th percentile time and steps to a cause per tree (linear interpolation)', async () => {
    const r = await service.report(shop.shopId, RANGE);
    const trees: Record<string, number> = {};
    for (const row of await t.knex('trees').where({ shop_id: shop.shopId }).select('id', 'slug')) trees[row.slug] = row.id;
    const bySlug = (slug: string) => r.times.find((x) => x.treeId === trees[slug]);
    // Hiss: times 1500, 2400 → median at position 0.5 → 1950; p90 at 0.9 → 1500 + 0.9 × 900 = 2310. Steps 7, 8 → 7.5 and 7.9.
    expect(bySlug(H)).toMatchObject({ walks: 2, medianTimeS: 1950, p90TimeS: 2310, medianSteps: 7.5, p90Steps: 7.9 });
    // Lean: 600 1000 1200 1800 3000 → median 1200; p90 at 3.6 → 1800 + 0.6 × 1200 = 2520. Steps 3 5 6 6 10 → 6 and 6 + 0.6 × 4 = 8.4.
    expect(bySlug(L)).toMatchObject({ walks: 5, medianTimeS: 1200, p90TimeS: 2520, medianSteps: 6, p90Steps: 8.4 });
    // High idle: 700 800 900 1100 → median 850; p90 at 2.7 → 900 + 0.7 × 200 = 1040. Steps 4 4 4 5 → 4 and 4.7.
    expect(bySlug(I)).toMatchObject({ walks: 4, medianTimeS: 850, p90TimeS: 1040, medianSteps: 4, p90Steps: 4.7 });
    // Slowest median first.
    expect(r.times.map((x) => x.treeId)).toEqual([trees[H], trees[L], trees[I]]);
  });

  it('cuts weekly trends on Mondays and counts fixed walks that came back in the week they closed', async () => {
    const r = await service.report(shop.shopId, RANGE);
    expect(r.weeks).toEqual([
      // W1 W3 W9 W5 W15 W11; W1, W15 and W9 came back.
      { week: '2026-03-02', finished: 6, withCause: 6, fixed: 6, notFixed: 0, referred: 0, cameBack: 3 },
      { week: '2026-03-09', finished: 2, withCause: 2, fixed: 2, notFixed: 0, referred: 0, cameBack: 0 },
      // W7 (came back) W13 (referred) W8.
      { week: '2026-03-16', finished: 3, withCause: 2, fixed: 2, notFixed: 0, referred: 1, cameBack: 1 },
      // W14 (not fixed) and W17 in the last minute of Sunday.
      { week: '2026-03-23', finished: 2, withCause: 1, fixed: 1, notFixed: 1, referred: 0, cameBack: 0 },
    ]);
  });

  it('applies the install type, tree, make, engine and technician filters', async () => {
    const by = async (f: Record<string, unknown>) => (await service.report(shop.shopId, { ...RANGE, ...f })).totals.finished;
    // Jobs with a throttle body: J3 J5 J6 J9 J11 J16 → W3 W5 W6 W9 W11 W17.
    expect(await by({ installType: 'throttle_body' })).toBe(6);
    // Lead's walks: W3 W7 W11 W13 W17.
    expect(await by({ techId: lead })).toBe(5);
    const lean = (await t.knex('trees').where({ shop_id: shop.shopId, slug: L }).first('id')).id;
    expect(await by({ treeId: lean })).toBe(6);
    // Dodge (J7, J8): W7 W8. Chevrolet 6.2 V8 (J3 J5 J6): W3 W5 W6.
    expect(await by({ make: 'Dodge' })).toBe(2);
    expect(await by({ make: 'chevrolet', engine: '6.2 V8' })).toBe(3);
    const tb = await service.report(shop.shopId, { ...RANGE, installType: 'throttle_body' });
    expect(tb.causes.map((c) => [c.code, c.walks])).toEqual([
      [TBG, 2],
      [TSM, 2],
      [POO, 1],
      [VHO, 1],
    ]);
    // Comebacks follow the fixed walk's filters: only W9 → W10 is on a throttle-body job.
    expect(tb.comebacks.map((c) => c.first.walkId)).toEqual([W[9]]);
  });

  it('opens the walks behind a number, newest first', async () => {
    const ids = async (q: Record<string, unknown>) => (await service.drill(shop.shopId, { ...RANGE, ...q } as never)).items.map((w) => w.id);
    expect(await ids({ measure: 'cause', code: POO })).toEqual([W[8], W[7], W[15], W[3], W[1]]);
    // The repeat row (intake manifold, port-left-open) opens the same five: J3 had an intake manifold too.
    expect(await ids({ measure: 'cause', code: POO, installType: 'intake_manifold' })).toEqual([W[8], W[7], W[15], W[3], W[1]]);
    expect(await ids({ measure: 'unresolved' })).toEqual([W[14], W[13]]);
    expect(await ids({ measure: 'unresolved', outcome: 'referred' })).toEqual([W[13]]);
    expect(await ids({ measure: 'week', week: '2026-03-16' })).toEqual([W[8], W[13], W[7]]);
    const hiss = (await t.knex('trees').where({ shop_id: shop.shopId, slug: H }).first('id')).id;
    expect(await ids({ measure: 'timed', treeId: hiss })).toEqual([W[8], W[3]]);
    const all = await service.drill(shop.shopId, { ...RANGE, measure: 'finished' } as never);
    expect(all.total).toBe(13);
    expect(all.items[0]).toMatchObject({ id: W[17], roNumber: 'P-16', outcome: 'fixed', causeCode: TBG, steps: 4, timeSpentS: 1100 });
  });

  it("shows another shop only its own walks", async () => {
    const r = await service.report(other.shopId, RANGE);
    expect(r.totals.finished).toBe(2);
    expect(r.comebacks.map((c) => c.again.roNumber)).toEqual(['O-2']);
  });
});
