import crypto from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { installStockTrees } from '@/server/services/tree-stock';
import { boxesOf, DESKTOP, PHONE, screenshot, servedAppInChromium, watchConsole } from '../support/browser';
import { createShopWithPeople, signedIn, TEST_PASSWORD, type TestShop } from '../support/people';

const LEAN_TREE = 'lean-after-intake-manifold';

/** Signs the context in through the API (the page's own scripts may be blocked). */
async function signInContext(context: BrowserContext, url: string, email: string) {
  const res = await context.request.post(`${url}/api/auth/sign-in`, { data: { email, password: TEST_PASSWORD }, headers: { 'X-Baywalk-Request': '1' } });
  expect(res.status()).toBe(200);
}

describe("a walk page drawn by the server before the app loads", () => {
  const app = servedAppInChromium();
  let shop: TestShop;
  let walkId: number;
  let firstStepWalkId: number;
  let title: string;

  beforeAll(async () => {
    shop = await createShopWithPeople(app.server.knex, 'First paint');
    await installStockTrees(app.server.knex, shop.shopId);
    const tech = await signedIn(app.server.app, shop.people.tech.email);
    const tree = await app.server.knex('trees').where({ shop_id: shop.shopId, slug: LEAN_TREE }).first('id');
    const job = await tech.post('/api/jobs').send({ roNumber: 'FP-1', customerName: 'Noor Haddad', make: 'Chevrolet', model: 'Camaro', year: 2016, install: [{ type: 'intake_manifold', text: '' }] });
    const walk = await tech.post('/api/walks').send({ jobId: job.body.job.id, treeId: tree.id });
    walkId = walk.body.walk.id;
    title = walk.body.doc?.title ?? (await tech.get(`/api/walks/${walkId}`)).body.doc.title;
    // One answer in: the Back button shows, and the step has cautions and two paragraphs.
    await tech.post(`/api/walks/${walkId}/steps`).send({ stepId: crypto.randomUUID(), event: { type: 'reading', value: 18, unit: '%' } });
    // At its first step: no Back button, and a paragraph then a numbered list.
    firstStepWalkId = (await tech.post('/api/walks').send({ jobId: job.body.job.id, treeId: tree.id })).body.walk.id;
  });

  // Each drawn part beside the real screen's element for it: a step with two paragraphs, and the first step with a list.
  const firstStepParts = (): Array<[shell: string, app: string]> => [
    ['[data-part="progress"]', '[data-testid="walk-progress"]'],
    ['[data-part="cautions"]', '[data-testid="step-cautions"]'],
    ['[data-part="title"]', '[data-testid="step-title"]'],
    ['.wf-md-text >> nth=0', '[data-testid="walk-screen"] >> text=/^Before clearing anything/'],
    ['.wf-md-mark >> nth=2', '[data-testid="walk-screen"] >> text=/^3\\.$/'],
    ['.wf-md-li .wf-md-text >> nth=2', '[data-testid="walk-screen"] >> text=/^Add short-term and long-term trim/'],
  ];
  const parts = (): Array<[shell: string, app: string]> => [
    ['[data-part="header"]', '[data-testid="app-header"]'],
    ['[data-part="tree"]', `[data-testid="walk-screen"] >> text="${title}"`],
    ['[data-part="progress"]', '[data-testid="walk-progress"]'],
    ['[data-part="back"]', '[data-testid="walk-back"]'],
    ['[data-part="cautions"]', '[data-testid="step-cautions"]'],
    ['.wf-caution-text >> nth=2', '[data-testid="step-cautions"] >> text=/^With the engine running/'],
    ['[data-part="title"]', '[data-testid="step-title"]'],
    ['.wf-md-text >> nth=0', '[data-testid="walk-screen"] >> text=/^Hold the engine steady/'],
    ['.wf-md-text >> nth=1', '[data-testid="walk-screen"] >> text=/^Why: a vacuum leak/'],
  ];

  for (const [name, viewport] of [['phone', PHONE], ['desktop', DESKTOP]] as const) {
    it(`draws the current step where the walk screen draws it, then gives way to it, at ${viewport.width}x${viewport.height}`, async () => {
      const context = await app.browser.newContext({ viewport });
      await signInContext(context, app.server.url, shop.people.tech.email);
      await compare(context, `${app.server.url}/walks/${walkId}`, parts(), `walk-first-paint-${name}`);
      await compare(context, `${app.server.url}/walks/${firstStepWalkId}`, firstStepParts(), `walk-first-paint-list-${name}`);
      await context.close();
    });
  }

  /** The drawn page without the app's JavaScript, then the walk screen with it: the same places, and the drawing gone. */
  async function compare(context: BrowserContext, url: string, pairs: Array<[string, string]>, shot: string) {
    // Without the app's JavaScript: only what the server drew.
    const bare = await context.newPage();
    await bare.route('**/_expo/static/**', (route) => route.abort());
    await bare.goto(url);
    await bare.locator('#boot-shell-walk [data-part="title"]').waitFor();
    await bare.evaluate(() => document.fonts.ready);
    const drawn = await boxesOf(bare, pairs.map(([s]) => `#boot-shell-walk ${s}`));
    await screenshot(bare, shot);
    await bare.close();

    // With it: the walk screen takes over in the same places, and the drawn page is gone.
    const page = await context.newPage();
    const errors = watchConsole(page);
    await page.goto(url);
    await page.getByTestId('step-title').waitFor({ timeout: 30_000 });
    await page.locator('#boot-shell-walk').waitFor({ state: 'detached', timeout: 30_000 });
    const real = await boxesOf(page, pairs.map(([, a]) => a));
    expect(real).toEqual(drawn);
    expect(errors).toEqual([]);
    await page.close();
  }

  it('is drawn only for a signed-in person who may read the open walk, and never stored', async () => {
    const page = async (email: string | null, path = `/walks/${walkId}`) => {
      const context = await app.browser.newContext();
      if (email) await signInContext(context, app.server.url, email);
      const res = await context.request.get(app.server.url + path);
      const out = { status: res.status(), drawn: (await res.text()).includes('id="boot-shell-walk"'), cache: res.headers()['cache-control'] };
      await context.close();
      return out;
    };
    expect(await page(shop.people.tech.email)).toEqual({ status: 200, drawn: true, cache: 'private, no-store' });
    // Signed out, a role that may not read walks, another shop, the report page, no such walk: the plain page.
    const other = await createShopWithPeople(app.server.knex, 'First paint elsewhere');
    // A finished walk shows its outcome, not a step: the app draws that.
    const tech = await signedIn(app.server.app, shop.people.tech.email);
    const job = await tech.post('/api/jobs').send({ roNumber: 'FP-2', customerName: 'Idris Salo', install: [] });
    const tree = await app.server.knex('trees').where({ shop_id: shop.shopId, slug: LEAN_TREE }).first('id');
    const done = (await tech.post('/api/walks').send({ jobId: job.body.job.id, treeId: tree.id })).body.walk.id;
    expect((await tech.post(`/api/walks/${done}/finish`).send({ outcome: 'referred', causeText: 'Sent to the dyno shop' })).status).toBe(200);
    for (const [who, path] of [
      [null, `/walks/${walkId}`],
      [shop.people.support.email, `/walks/${walkId}`],
      [other.people.tech.email, `/walks/${walkId}`],
      [shop.people.tech.email, `/walks/${walkId}/report`],
      [shop.people.tech.email, '/walks/999999999'],
      [shop.people.tech.email, `/walks/${done}`],
    ] as const) {
      expect(await page(who, path), `${who} ${path}`).toEqual({ status: 200, drawn: false, cache: 'no-cache' });
    }
  });
});
