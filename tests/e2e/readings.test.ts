import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { DESKTOP, PHONE, screenshot, servedAppInChromium, watchConsole } from '../support/browser';
import { signInThroughScreen } from '../support/sign-in-page';
import { createShopWithPeople, type TestShop } from '../support/people';
import { createShopRepository } from '@/server/repositories/shop-repository';

describe('Readings screen in Chromium', () => {
  const app = servedAppInChromium();
  let shop: TestShop;

  beforeAll(async () => {
    shop = await createShopWithPeople(app.server.knex, 'Readings UI');
    // A shop up in the hills that reads kPa: the screen should start from these settings.
    await createShopRepository(app.server.knex).update(shop.shopId, { altitude_m: 1500, pressure_unit: 'kPa' });
  });

  const signIn = (page: Page, email: string) => signInThroughScreen(page, app.server.url, email);

  async function openReadings(page: Page) {
    await page.goto(app.server.url + '/readings');
    await page.getByTestId('readings-screen').waitFor({ timeout: 30_000 });
    // The shop's altitude and unit arrive from GET /api/shop.
    await expect.poll(() => page.getByTestId('altitude').inputValue(), { timeout: 15_000 }).toBe('1500');
    await expect.poll(() => page.getByTestId('vacuum-unit').innerText()).toContain('kPa');
  }

  it('judges a typed vacuum live at 390x844 and shows an impossible value inline', async () => {
    const page = await app.browser.newPage({ viewport: PHONE });
    const errors = watchConsole(page);
    await signIn(page, shop.people.tech.email);
    await openReadings(page);
    expect(await page.getByTestId('readings-empty').isVisible()).toBe(true);

    // At 1 500 m a stock engine should pull about 40.8–54.3 kPa (US Standard Atmosphere 1976 and the 17–21 inHg sea-level band).
    await page.getByTestId('vacuum').fill('48');
    await expect.poll(() => page.getByTestId('vacuum-verdict').innerText()).toContain('Within range');
    expect(await page.getByTestId('vacuum-verdict').innerText()).toContain('✔'); // an icon as well as the word
    expect(await page.getByTestId('vacuum-gauge').getAttribute('aria-label')).toMatch(/Expected 40\.8 to 54\.3 kPa; measured 48 kPa/);
    expect(await page.getByTestId('baro-line').innerText()).toMatch(/84\.6 kPa, standard atmosphere at 1500 m/);

    // Low and floating: mixture first, with the running-engine caution before the checks.
    await page.getByTestId('vacuum').fill('35');
    await page.getByTestId('needle-floating').click();
    await expect.poll(() => page.getByTestId('vacuum-verdict').innerText()).toContain('Low');
    expect(await page.getByTestId('vacuum-causes').innerText()).toMatch(/1\.\s*Mixture wrong/);
    expect(await page.getByTestId('vacuum-caution-running_engine').innerText()).toMatch(/exhaust gas indoors/);
    await page.getByTestId('vacuum-result').scrollIntoViewIfNeeded();
    await screenshot(page, 'readings-phone-low');

    // More vacuum than the air pressure is impossible: the message sits beside the field.
    await page.getByTestId('vacuum').fill('95');
    await page.getByTestId('vacuum-error').waitFor();
    expect(await page.getByTestId('vacuum-error').innerText()).toMatch(/more than the air pressure here \(84\.6 kPa\).*Use 0 to 84\.6 kPa/);
    expect(await page.getByTestId('vacuum-result').count()).toBe(0);
    await screenshot(page, 'readings-phone-impossible');

    // Text that is not a number is caught the same way.
    await page.getByTestId('vacuum').fill('4o');
    expect(await page.getByTestId('vacuum-error').innerText()).toMatch(/is not a number/);
    await page.getByTestId('vacuum').fill('');

    // Trims: lean at idle that improves at 2 500 rpm.
    await page.getByTestId('bank1-idle-short').fill('12');
    await page.getByTestId('bank1-idle-long').fill('10');
    await page.getByTestId('bank1-at2500-short').fill('2');
    await page.getByTestId('bank1-at2500-long').fill('1');
    await expect.poll(() => page.getByTestId('trims-verdict').innerText()).toContain('Lean');
    expect(await page.getByTestId('trims-causes').innerText()).toMatch(/Unmetered air/);

    // A trim no engine computer can report.
    await page.getByTestId('bank1-idle-short').fill('150');
    expect(await page.getByTestId('bank1-idle-short-error').innerText()).toMatch(/−100 to \+99\.22 %/);
    await page.getByTestId('bank1-idle-short').fill('12');

    // The server gives the same verdicts.
    await page.getByTestId('server-check').click();
    await page.getByTestId('server-answer').waitFor();
    expect(await page.getByTestId('server-answer').innerText()).toMatch(/The server agrees.*Fuel trims: Lean/s);
    await page.getByTestId('trims-result').scrollIntoViewIfNeeded();
    await screenshot(page, 'readings-phone-trims');
    expect(errors).toEqual([]);
    await page.close();
  });

  it('lays the form and the verdict side by side at 1280x800', async () => {
    const page = await app.browser.newPage({ viewport: DESKTOP });
    const errors = watchConsole(page);
    await signIn(page, shop.people.support.email);
    await openReadings(page);
    await page.getByTestId('vacuum').fill('30');
    await page.getByTestId('needle-steady').click();
    await expect.poll(() => page.getByTestId('vacuum-verdict').innerText()).toContain('Low');
    const form = await page.getByTestId('readings-form').boundingBox();
    const results = await page.getByTestId('readings-results').boundingBox();
    expect(results!.x).toBeGreaterThan(form!.x + form!.width - 1);
    expect(results!.x + results!.width - form!.x).toBeLessThanOrEqual(960);
    await page.getByTestId('vacuum-gauge').scrollIntoViewIfNeeded();
    await screenshot(page, 'readings-desktop');
    expect(errors).toEqual([]);
    await page.close();
  });
});
