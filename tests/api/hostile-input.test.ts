import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import request from 'supertest';
import { apiRoutes } from '@/server/routes';
import { createPassport } from '@/server/auth/passport-setup';
import type { RouteDef } from '@/server/http/route-table';
import { installStockTrees } from '@/server/services/tree-stock';
import { createTestApp } from '../support/test-app';
import { createShopWithPeople, signedIn, type TestShop } from '../support/people';
import { bodyArb, expectSafeAnswer, fillPath, paramArb, queryArb, type HostileRequest, type ValidExamples } from './hostile-input-arbitraries';

/**
 * Property-based hostile requests against EVERY route of the API table, as
 * the shop's owner and as nobody: malformed, oversized and wrong-typed bodies,
 * odd query strings and path parameters. Whatever arrives, the answer is never
 * a 5xx or a stack trace, and every refusal is JSON carrying a message a
 * person can read. The routes are read from apiRoutes(), so routes added later
 * are covered without touching this file.
 */
const t = createTestApp();
const routes: RouteDef[] = apiRoutes(t.services, createPassport(t.knex) as never);
// Enough runs to meet every kind of body and parameter for each route, few enough to stay quick.
const RUNS = Number(process.env.BAYWALK_HOSTILE_RUNS ?? 24);

describe('hostile input to every API route (fast-check)', () => {
  let shop: TestShop;
  // Real ids of this shop, so some generated requests reach the handlers with a valid id.
  const realIds: string[] = [];
  // Valid bodies for a few deep routes; the generator corrupts one field of each.
  const examples: ValidExamples = {};

  beforeAll(async () => {
    shop = await createShopWithPeople(t.knex, 'Hostile');
    await installStockTrees(t.knex, shop.shopId);
    const owner = await signedIn(t.app, shop.people.owner.email);
    const tree = await t.knex('trees').where({ shop_id: shop.shopId, slug: 'lean-after-intake-manifold' }).first('id');
    const job = await owner.post('/api/jobs').send({ roNumber: 'H-1', customerName: 'Quinn Arbour' });
    const walk = await owner.post('/api/walks').send({ jobId: job.body.job.id, treeId: tree.id });
    realIds.push(String(tree.id), String(job.body.job.id), String(walk.body.walk.id), String(shop.people.tech.id));
    Object.assign(examples, {
      'post /auth/sign-in': { email: shop.people.owner.email, password: 'not the password' },
      'post /jobs': { roNumber: 'H-2', customerName: 'Quinn Arbour', year: 2019, mileage: 1200, install: [{ type: 'intake_manifold', text: '' }] },
      'put /jobs/:id': { roNumber: 'H-3', customerName: 'Quinn Arbour' },
      'post /walks': { jobId: job.body.job.id, treeId: tree.id },
      'post /walks/:id/steps': { stepId: '', event: { type: 'reading', value: 18, unit: '%' }, note: 'ok' },
      'post /walks/:id/undo': { stepId: '' },
      'post /walks/:id/finish': { outcome: 'not_fixed', causeText: null, note: null },
    });
  });
  afterAll(() => t.close());

  it('the route table is read, with parameters and schemas to aim at', () => {
    expect(routes.length).toBeGreaterThan(10);
    expect(routes.some((r) => r.path.includes(':'))).toBe(true);
    expect(routes.some((r) => r.body)).toBe(true);
  });

  for (const route of routes) {
    for (const who of ['owner', 'anonymous'] as const) {
      it(`${route.method.toUpperCase()} ${route.path} as ${who}: no 5xx, no stack trace, JSON refusals`, async () => {
        // A fresh session per route: sign-out and similar routes end the session they run in.
        const caller = who === 'owner' ? await signedIn(t.app, shop.people.owner.email) : request.agent(t.app);
        const arb = fc.record({
          params: fc.array(paramArb(realIds), { minLength: 4, maxLength: 4 }),
          query: queryArb(route.query),
          body: bodyArb(route.body, realIds, examples[`${route.method} ${route.path}`]),
          csrf: fc.boolean().map((b) => b || route.method === 'get'),
        });
        await fc.assert(
          fc.asyncProperty(arb, async (r: HostileRequest) => {
            const url = `/api${fillPath(route.path, r.params)}${r.query}`;
            let call = caller[route.method](url);
            if (r.csrf) call = call.set('X-Baywalk-Request', '1');
            if (r.body.contentType) call = call.set('Content-Type', r.body.contentType);
            if (r.body.encoding) call = call.set('Content-Encoding', r.body.encoding);
            const res = r.body.payload === undefined ? await call : await call.send(r.body.payload);
            expectSafeAnswer(res, `${route.method.toUpperCase()} ${url.slice(0, 200)} [${r.body.label}]`);
          }),
          { numRuns: RUNS },
        );
      });
    }
  }
});
