import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { DESKTOP, PHONE, screenshot, servedAppInChromium, watchConsole } from '../support/browser';
import { signInThroughScreen } from '../support/sign-in-page';
import { createShopWithPeople, type TestShop } from '../support/people';
import { installStockTrees, loadStockLibrary } from '@/server/services/tree-stock';
import { SYMPTOM_LABELS } from '@/trees/tree-format';

describe('Trees screens in Chromium', () => {
  const app = servedAppInChromium();
  let shop: TestShop;
  const library = loadStockLibrary();

  beforeAll(async () => {
    shop = await createShopWithPeople(app.server.knex, 'Trees UI');
    await installStockTrees(app.server.knex, shop.shopId, library);
  });

  const signIn = (page: Page, email: string) => signInThroughScreen(page, app.server.url, email);

  for (const [name, viewport] of [['phone', PHONE], ['desktop', DESKTOP]] as const) {
    it(`shows the library by symptom, searches it, and opens a tree at ${viewport.width}x${viewport.height}`, async () => {
      const page = await app.browser.newPage({ viewport });
      const errors = watchConsole(page);
      await signIn(page, shop.people.tech.email);
      await page.goto(app.server.url + '/trees');
      await page.getByTestId('trees-results').waitFor({ timeout: 30_000 });

      // Every stock tree is listed under its symptom's heading.
      for (const { doc } of library.trees) {
        const group = page.getByTestId(`symptom-${doc.symptom}`);
        expect(await group.getByRole('heading', { name: SYMPTOM_LABELS[doc.symptom] }).isVisible()).toBe(true);
        expect(await group.getByTestId(`tree-card-${doc.id}`).isVisible()).toBe(true);
      }
      await screenshot(page, `trees-library-${name}`);

      // Searching narrows the list to the trees whose words match.
      const target = library.trees[0].doc;
      const word = target.title.split(/\s+/).find((w) => w.length > 5)!;
      await page.getByTestId('tree-search').fill(word);
      await page.waitForFunction(
        (n) => document.querySelectorAll('[data-testid^="tree-card-"]').length === n,
        library.trees.filter((t) => `${t.doc.title} ${t.doc.summary}`.toLowerCase().includes(word.toLowerCase())).length,
        { timeout: 10_000 },
      );
      expect(await page.getByTestId(`tree-card-${target.id}`).isVisible()).toBe(true);

      // A search that matches nothing says so and offers to clear it.
      await page.getByTestId('tree-search').fill('zzqx nothing');
      await page.getByTestId('trees-empty').waitFor();
      await page.getByTestId('trees-clear').click();
      await page.getByTestId(`tree-card-${target.id}`).waitFor();

      // An install-type chip filters; its state is a tick and a word, not colour alone.
      const install = target.installTypes[0];
      await page.getByTestId(`install-chip-${install}`).click();
      expect(await page.getByTestId(`install-chip-${install}`).getAttribute('aria-checked')).toBe('true');
      await page.waitForFunction(
        (n) => document.querySelectorAll('[data-testid^="tree-card-"]').length === n,
        library.trees.filter((t) => t.doc.installTypes.includes(install)).length,
        { timeout: 10_000 },
      );

      // Open the tree: steps in walk order with kind badges, cautions, and the causes it can reach.
      await page.getByTestId(`tree-card-${target.id}`).click();
      await page.getByTestId('tree-steps').waitFor({ timeout: 15_000 });
      expect(await page.getByRole('heading', { name: target.title }).isVisible()).toBe(true);
      const first = page.getByTestId(`step-${target.machine.initial}`);
      expect(await first.isVisible()).toBe(true);
      const kind = target.machine.states[target.machine.initial].meta.kind;
      expect(await page.getByTestId(`step-kind-${target.machine.initial}`).textContent()).toBe({ ask: 'Ask', reading: 'Reading', action: 'Action', cause: 'Cause', refer: 'Refer' }[kind]);
      const stepCount = await page.locator('[data-testid^="step-kind-"]').count();
      expect(stepCount).toBe(Object.keys(target.machine.states).length);
      const withCautions = Object.entries(target.machine.states).filter(([, s]) => s.meta.cautions.length > 0);
      expect(withCautions.length).toBeGreaterThan(0);
      expect(await page.getByTestId(`step-cautions-${withCautions[0][0]}`).textContent()).toContain('Caution');
      const causes = Object.entries(target.machine.states).filter(([, s]) => s.meta.kind === 'cause');
      for (const [id] of causes) expect(await page.getByTestId(`cause-${id}`).count()).toBe(1);

      if (viewport === DESKTOP) {
        // Two columns on a wide screen: causes beside the steps.
        const steps = await page.getByTestId('tree-steps').boundingBox();
        const causeBox = await page.getByTestId('tree-causes').boundingBox();
        expect(causeBox!.x).toBeGreaterThan(steps!.x + steps!.width - 1);
      }
      await screenshot(page, `trees-page-${name}`);

      await page.getByTestId('back-to-trees').click();
      await page.getByTestId('tree-library').waitFor();
      expect(errors).toEqual([]);
      await page.close();
    });
  }

  it("says so when a tree id is another shop's or does not exist", async () => {
    const other = await createShopWithPeople(app.server.knex, 'Trees UI other');
    await installStockTrees(app.server.knex, other.shopId, library);
    const theirs = (await app.server.knex('trees').where({ shop_id: other.shopId }).first('id')).id;
    const page = await app.browser.newPage({ viewport: PHONE });
    await signIn(page, shop.people.support.email);
    await page.goto(`${app.server.url}/trees/${theirs}`);
    await page.getByTestId('tree-error').waitFor({ timeout: 15_000 });
    expect(await page.getByTestId('tree-error').textContent()).toContain('That tree was not found.');
    await page.close();
  });
});
