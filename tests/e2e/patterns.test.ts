import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { DESKTOP, PHONE, screenshot, servedAppInChromium, watchConsole } from '../support/browser';
import { createShopWithPeople, TEST_PASSWORD, type TestShop } from '../support/people';
import { installStockTrees } from '@/server/services/tree-stock';
import { seedDemoHistory } from '@/server/seeds/demo-history';
import { createPatternService } from '@/server/services/pattern-service';
import { presetRange } from '@/components/patterns/format';

/** Patterns in Chromium, on a fresh shop loaded with the demo history generator. */
describe('Patterns screen in Chromium', () => {
  const app = servedAppInChromium();
  let shop: TestShop;
  let patterns: ReturnType<typeof createPatternService>;

  beforeAll(async () => {
    shop = await createShopWithPeople(app.server.knex, 'Patterns UI');
    await installStockTrees(app.server.knex, shop.shopId);
    await seedDemoHistory(app.server.knex, shop.shopId);
    patterns = createPatternService(app.server.knex);
  });

  async function signIn(page: Page, email: string) {
    await page.goto(app.server.url + '/sign-in');
    await page.getByTestId('sign-in-email').fill(email);
    await page.getByTestId('sign-in-password').fill(TEST_PASSWORD);
    await page.getByTestId('sign-in-submit').click();
    await page.waitForURL((url) => url.pathname !== '/sign-in', { timeout: 30_000 });
  }

  const text = async (page: Page, testID: string) => (await page.getByTestId(testID).textContent())?.trim();

  for (const [name, viewport] of [['phone', PHONE], ['desktop', DESKTOP]] as const) {
    it(`shows figures, charts and tables, filters, sorts and drills down at ${viewport.width}x${viewport.height}`, async () => {
      const range = presetRange('26w');
      const all = await patterns.report(shop.shopId, range);
      const intake = await patterns.report(shop.shopId, { ...range, installType: 'intake_manifold' });
      expect(all.totals.finished).toBeGreaterThan(100);
      expect(intake.totals.finished).toBeLessThan(all.totals.finished);

      const page = await app.browser.newPage({ viewport });
      const errors = watchConsole(page);
      await signIn(page, shop.people.owner.email);
      await page.getByTestId('nav-patterns').click();
      await page.waitForURL((url) => url.pathname === '/patterns', { timeout: 30_000 });
      await page.getByTestId('patterns-results').waitFor({ timeout: 60_000 });

      // The headline number is the database's count; the charts fit the screen.
      expect(await text(page, 'figure-finished')).toBe(String(all.totals.finished));
      await page.getByTestId(`causes-chart-${all.causes[0].code}`).waitFor();
      const chart = await page.getByTestId('trend-chart').boundingBox();
      expect(chart!.width).toBeGreaterThan(200);
      expect(chart!.x + chart!.width).toBeLessThanOrEqual(viewport.width);
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(viewport.width);
      expect(await page.getByTestId('table-repeats').textContent()).toContain(all.repeats[0].title);
      await screenshot(page, `patterns-${name}`);

      // Tables are tables on a wide screen and lists of cards on a phone.
      expect(await page.locator('[data-testid="table-causes"] [role="columnheader"]').count()).toBe(viewport === DESKTOP ? 3 : 0);

      // Sorting by cause name puts them in alphabetical order.
      await page.getByTestId('table-causes-sort-cause').click();
      const alphabetical = [...all.causes].sort((a, b) => a.title.localeCompare(b.title))[0];
      await page.waitForFunction(
        (code) => document.querySelector('[data-testid="table-causes"] [data-testid^="table-causes-row-"]')?.getAttribute('data-testid') === `table-causes-row-${code}`,
        alphabetical.code,
        { timeout: 15_000 },
      );

      // A filter: intake-manifold installs only. The figures, the chart and the CSV link follow it.
      await page.getByTestId('more-filters').click();
      await page.getByTestId('filter-install-intake_manifold').click();
      expect(await page.getByTestId('filter-install-intake_manifold').getAttribute('aria-checked')).toBe('true');
      await page.waitForFunction((n) => document.querySelector('[data-testid="figure-finished"]')?.textContent?.trim() === n, String(intake.totals.finished), { timeout: 30_000 });
      expect(await page.getByTestId('export-causes').getAttribute('href')).toContain('installType=intake_manifold');
      await screenshot(page, `patterns-filtered-${name}`);

      // Drill down: the walks behind the top cause after intake installs (most walks first again), then one walk's own page.
      await page.getByTestId('table-causes-sort-walks').click();
      const top = intake.causes[0];
      await page.getByTestId(`table-causes-row-${top.code}`).click();
      await page.getByTestId('drill-list').waitFor({ timeout: 30_000 });
      expect(await text(page, 'drill-count')).toBe(top.walks === 1 ? '1 walk' : `${top.walks} walks`);
      const drill = await patterns.drill(shop.shopId, { ...range, installType: 'intake_manifold', measure: 'cause', code: top.code });
      expect(await page.locator('[data-testid^="drill-walk-"]').count()).toBe(drill.items.length);
      await screenshot(page, `patterns-drill-${name}`);
      expect(errors).toEqual([]);
      await page.getByTestId(`drill-walk-${drill.items[0].id}`).click();
      await page.waitForURL((url) => url.pathname === `/walks/${drill.items[0].id}`, { timeout: 30_000 });
      await page.close();
    });
  }

  it('keeps technicians out: no Patterns entry, and the page says whose it is', async () => {
    const page = await app.browser.newPage({ viewport: PHONE });
    await signIn(page, shop.people.tech.email);
    await page.getByTestId('app-shell').waitFor({ timeout: 30_000 });
    expect(await page.getByTestId('nav-patterns').count()).toBe(0);
    await page.goto(app.server.url + '/patterns');
    await page.getByTestId('patterns-error').waitFor({ timeout: 30_000 });
    expect(await page.getByTestId('patterns-error').textContent()).toContain('Patterns are for owners and leads');
    // A refusal answers the same the next time: nothing offers to ask again.
    expect(await page.getByTestId('load-retry').count()).toBe(0);
    await page.close();
  });

  it('says so when a period has no finished walks', async () => {
    const page = await app.browser.newPage({ viewport: DESKTOP });
    await signIn(page, shop.people.lead.email);
    await page.goto(app.server.url + '/patterns');
    await page.getByTestId('patterns-results').waitFor({ timeout: 60_000 });
    await page.getByTestId('filter-from').fill('2020-01-06');
    await page.getByTestId('filter-to').fill('2020-02-02');
    await page.getByTestId('filter-to').press('Enter');
    await page.getByTestId('patterns-empty').waitFor({ timeout: 30_000 });
    await screenshot(page, 'patterns-empty-desktop');
    await page.getByTestId('patterns-reset').click();
    await page.getByTestId('patterns-results').waitFor({ timeout: 30_000 });
    await page.close();
  });
});
