import crypto from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { ROLES, type Role } from '@/shared/roles';
import { NAV_ITEMS, navItemsFor } from '@/shared/nav-items';
import { DESKTOP, PHONE, launchBrowser, screenshot, watchConsole } from '../support/browser';
import { startTestServer } from '../support/test-app';
import { signInThroughScreen } from '../support/sign-in-page';
import { createShopWithPeople } from '../support/people';
import { linkFrom, startTestMailCatcher } from '../support/mail-catcher';

const VIEWPORTS = [
  ['phone', PHONE],
  ['desktop', DESKTOP],
] as const;

let catcher: Awaited<ReturnType<typeof startTestMailCatcher>>;
let t: Awaited<ReturnType<typeof startTestServer>>;
let url: string;
let browser: Browser;

beforeAll(async () => {
  catcher = await startTestMailCatcher();
  t = await startTestServer(catcher.appConfig());
  url = t.url;
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await t?.close();
  await catcher?.close();
});

const signIn = (page: Page, email: string) => signInThroughScreen(page, url, email);

/** The navigation entries shown, by their test ids, in order. */
async function navShown(page: Page, wide: boolean): Promise<string[]> {
  const nav = page.getByTestId(wide ? 'nav-rail' : 'nav-bar');
  await nav.waitFor();
  const ids = await nav.locator('[data-testid^="nav-"]').evaluateAll((els) => els.map((e) => e.getAttribute('data-testid')));
  return ids.filter((id): id is string => !!id);
}

for (const [name, viewport] of VIEWPORTS) {
  const wide = viewport === DESKTOP;
  describe(`accounts in Chromium at ${viewport.width}x${viewport.height}`, () => {
    it('signs up a new shop, lands in the app as its owner, and signs out', async () => {
      const page = await browser.newPage({ viewport });
      const errors = watchConsole(page);
      const email = `founder-${crypto.randomBytes(4).toString('hex')}@e2e.example`;
      await page.goto(url + '/');
      await page.getByTestId('link-sign-up').click();
      await page.getByTestId('sign-up-form').waitFor();
      // Field-level messages from the shared schema before anything is sent.
      await page.getByTestId('sign-up-submit').click();
      expect(await page.getByTestId('sign-up-shop-error').textContent()).toMatch(/shop name/);
      expect(await page.getByTestId('sign-up-password-error').textContent()).toMatch(/at least 10/);
      await screenshot(page, `accounts-sign-up-errors-${name}`);

      await page.getByTestId('sign-up-shop').fill('Harbour Light Engines');
      await page.getByTestId('sign-up-name').fill('Noor Haddad');
      await page.getByTestId('sign-up-email').fill(email);
      await page.getByTestId('sign-up-password').fill('harbour light password');
      await page.getByTestId('sign-up-submit').click();
      await page.getByTestId('app-shell').waitFor({ timeout: 15_000 });
      expect(await page.getByTestId('signed-in-person').textContent()).toContain('Noor Haddad');
      expect(await navShown(page, wide)).toEqual(navItemsFor('owner').map((i) => `nav-${i.key}`));
      await screenshot(page, `accounts-signed-up-${name}`);

      await page.getByTestId('sign-out').click();
      await page.getByTestId('sign-in-form').waitFor();
      expect(new URL(page.url()).pathname).toBe('/sign-in');
      // The signed-in pages are closed again.
      await page.goto(url + '/settings');
      await page.getByTestId('sign-in-form').waitFor();
      expect(new URL(page.url()).searchParams.get('next')).toBe('/settings');
      expect(errors.filter((e) => !/401|Failed to load resource/.test(e))).toEqual([]);
      await page.close();
    });

    it('shows each role only the navigation it may use', async () => {
      const shop = await createShopWithPeople(t.knex, 'Nav');
      for (const role of ROLES) {
        const page = await browser.newPage({ viewport });
        await signIn(page, shop.people[role].email);
        const shown = await navShown(page, wide);
        expect(shown, role).toEqual(navItemsFor(role as Role).map((i) => `nav-${i.key}`));
        for (const item of NAV_ITEMS.filter((i) => !i.roles.includes(role))) expect(await page.getByTestId(`nav-${item.key}`).count()).toBe(0);
        expect(await page.getByTestId('signed-in-person').textContent()).toContain(shop.people[role].name);
        // Every navigation target is at least 48 px tall.
        for (const id of shown) expect((await page.getByTestId(id).boundingBox())!.height).toBeGreaterThanOrEqual(48);
        await screenshot(page, `accounts-nav-${role}-${name}`);
        await page.close();
      }
    });

    it('the owner invites someone through Settings; the invitation mail leads to a signed-in account', async () => {
      const shop = await createShopWithPeople(t.knex, 'Team');
      const page = await browser.newPage({ viewport });
      const errors = watchConsole(page);
      await signIn(page, shop.people.owner.email);
      await page.getByTestId('nav-settings').click();
      await page.getByTestId('settings-people').click();
      await page.getByTestId(wide ? 'people-table' : 'people-list').waitFor();
      expect(await page.getByTestId(`person-${shop.people.lead.email}`).textContent()).toMatch(/Lead technician.*Active/);

      const invitee = `joiner-${crypto.randomBytes(4).toString('hex')}@e2e.example`;
      await page.getByTestId('invite-email').fill('not an address');
      await page.getByTestId('invite-submit').click();
      expect(await page.getByTestId('invite-email-error').textContent()).toMatch(/valid e-mail/);
      await page.getByTestId('invite-email').fill(invitee);
      await page.getByTestId('invite-role-support').click();
      await page.getByTestId('invite-submit').click();
      await page.getByTestId('invite-sent').waitFor();
      await page.getByTestId(`invitation-${invitee}`).waitFor();
      await screenshot(page, `accounts-people-${name}`);
      // A reload keeps the page (the deep link survives the session check).
      await page.reload();
      await page.getByTestId(`invitation-${invitee}`).waitFor();
      expect(new URL(page.url()).pathname).toBe('/settings/people');

      // Deactivate the tech, with confirmation.
      await page.getByTestId(`deactivate-${shop.people.tech.id}`).click();
      await page.getByTestId(`confirm-deactivate-${shop.people.tech.id}`).waitFor();
      await page.getByTestId(`confirm-yes-${shop.people.tech.id}`).click();
      await page.getByTestId(`reactivate-${shop.people.tech.id}`).waitFor();
      expect(await page.getByTestId(`person-${shop.people.tech.email}`).textContent()).toContain('Deactivated');
      // The only owner cannot demote themselves: the refusal is shown beside the row.
      await page.getByTestId(`change-role-${shop.people.owner.id}`).click();
      await page.getByTestId(`role-choice-${shop.people.owner.id}-lead`).click();
      expect(await page.getByTestId(`person-error-${shop.people.owner.id}`).textContent()).toMatch(/only active owner/);

      const mail = await catcher.waitForMail(invitee);
      const { url: link } = linkFrom(mail, '/accept-invite');
      const guest = await browser.newPage({ viewport });
      await guest.goto(`${url}${link.pathname}${link.search}`);
      await guest.getByTestId('accept-form').waitFor();
      expect(await guest.getByTestId('accept-form').textContent()).toContain(shop.name);
      await guest.getByTestId('accept-name').fill('Ines Varga');
      await guest.getByTestId('accept-password').fill('ines long password');
      await guest.getByTestId('accept-submit').click();
      await guest.getByTestId('app-shell').waitFor({ timeout: 15_000 });
      expect(await navShown(guest, wide)).toEqual(navItemsFor('support').map((i) => `nav-${i.key}`));
      // The same link a second time is refused with a clear message.
      const again = await browser.newPage({ viewport });
      await again.goto(`${url}${link.pathname}${link.search}`);
      await again.getByTestId('invite-refused').waitFor();
      expect(await again.getByTestId('invite-refused').textContent()).toMatch(/already been used/);
      await screenshot(again, `accounts-invite-used-${name}`);
      expect(errors.filter((e) => !/40\d|Failed to load resource/.test(e))).toEqual([]);
      await Promise.all([page.close(), guest.close(), again.close()]);
    });

    it('the owner edits shop settings with altitude in feet; bad values get field messages', async () => {
      const shop = await createShopWithPeople(t.knex, 'Settings');
      const page = await browser.newPage({ viewport });
      await signIn(page, shop.people.owner.email);
      await page.goto(`${url}/settings/shop`);
      await page.getByTestId('shop-settings-form').waitFor();
      await page.getByTestId('shop-name').fill('');
      await page.getByTestId('shop-comeback').fill('0');
      await page.getByTestId('shop-save').click();
      expect(await page.getByTestId('shop-name-error').textContent()).toMatch(/shop name/);
      expect(await page.getByTestId('shop-comeback-error').textContent()).toMatch(/at least 1 day/);
      await page.getByTestId('shop-name').fill('High Desert Speed');
      await page.getByTestId('shop-comeback').fill('45');
      await page.getByTestId('shop-altitude-unit-ft').click();
      await page.getByTestId('shop-altitude').fill('5280');
      await page.getByTestId('shop-pressure-unit-kPa').click();
      await page.getByTestId('shop-save').click();
      await page.getByTestId('shop-saved').waitFor();
      await screenshot(page, `accounts-shop-settings-${name}`);
      const row = await t.knex('shops').where({ id: shop.shopId }).first();
      // 5 280 ft × 0.3048 m/ft = 1 609.344 m (international foot, exact), saved rounded.
      expect(row).toMatchObject({ name: 'High Desert Speed', altitude_m: 1609, pressure_unit: 'kPa', comeback_window_days: 45 });
      await page.close();
    });

    it('forgot password: the mailed link sets a new password and signs in', async () => {
      const shop = await createShopWithPeople(t.knex, 'Forgot');
      const page = await browser.newPage({ viewport });
      await page.goto(`${url}/sign-in`);
      await page.getByTestId('link-forgot').click();
      await page.getByTestId('forgot-email').fill(shop.people.lead.email);
      await page.getByTestId('forgot-submit').click();
      await page.getByTestId('forgot-sent').waitFor();
      const { url: link } = linkFrom(await catcher.waitForMail(shop.people.lead.email), '/reset-password');
      await page.goto(`${url}${link.pathname}${link.search}`);
      await page.getByTestId('reset-form').waitFor();
      await page.getByTestId('reset-password').fill('lead new password');
      await page.getByTestId('reset-submit').click();
      await page.getByTestId('app-shell').waitFor({ timeout: 15_000 });
      expect(await navShown(page, wide)).toEqual(navItemsFor('lead').map((i) => `nav-${i.key}`));
      await page.close();
    });
  });
}
