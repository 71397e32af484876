import crypto from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import sharp from 'sharp';
import { installStockTrees } from '@/server/services/tree-stock';
import { DESKTOP, PHONE, launchBrowser, screenshot, watchConsole } from '../support/browser';
import { startTestServer } from '../support/test-app';
import { signInThroughScreen } from '../support/sign-in-page';
import { createShopWithPeople, type TestShop } from '../support/people';
import { startTestMailCatcher } from '../support/mail-catcher';

// Generous waits: the machine is shared, and each step is a round trip to MariaDB.
const WAIT = { timeout: 45_000 };

let catcher: Awaited<ReturnType<typeof startTestMailCatcher>>;
let t: Awaited<ReturnType<typeof startTestServer>>;
let url: string;
let browser: Browser;
let shop: TestShop;

beforeAll(async () => {
  catcher = await startTestMailCatcher();
  t = await startTestServer(catcher.appConfig());
  url = t.url;
  browser = await launchBrowser();
  shop = await createShopWithPeople(t.knex, 'Guest UI');
  await installStockTrees(t.knex, shop.shopId);
  await t.knex('shops').where({ id: shop.shopId }).update({ contact_phone: '+1 555 0199', contact_email: 'help@guest-ui.example' });
});
afterAll(async () => {
  await browser?.close();
  await t?.close();
  await catcher?.close();
});

const signIn = (page: Page, email: string) => signInThroughScreen(page, url, email, { timeout: WAIT.timeout });

/** Types a reading at the current step, checks the live verdict, and sends it. */
async function reading(page: Page, stepId: string, value: string, verdict: string) {
  const step = page.getByTestId(`step-${stepId}`);
  await step.waitFor(WAIT);
  await step.getByTestId('reading-value').fill(value);
  await step.getByTestId(`reading-verdict-${verdict}`).waitFor(WAIT);
  await step.getByTestId('reading-submit').click();
}

describe('guest link, end to end through the SMTP catcher and Chromium', () => {
  it('support sends a link; the customer walks it on a phone to a cause with a reading and a photo; support reviews it and turns it into a job', async () => {
    const customerEmail = `diy-${crypto.randomBytes(4).toString('hex')}@home.example`;

    // Support creates and e-mails the link.
    const staffPage = await browser.newPage({ viewport: DESKTOP });
    const staffErrors = watchConsole(staffPage);
    await signIn(staffPage, shop.people.support.email);
    await staffPage.getByTestId('nav-support').click();
    await staffPage.getByTestId('support-inbox').waitFor(WAIT);
    await staffPage.getByTestId('support-new-link').click();
    await staffPage.getByTestId('new-link').waitFor(WAIT);
    await staffPage.getByTestId('link-tree-lean-after-intake-manifold').click();
    await staffPage.getByTestId('link-customer-name').fill('Jordan Vale');
    await staffPage.getByTestId('link-customer-email').fill(customerEmail);
    await staffPage.getByTestId('link-note').fill('Lean code after fitting a ported intake at home');
    await screenshot(staffPage, 'guest-link-new-desktop');
    await staffPage.getByTestId('link-send').click();
    await staffPage.getByTestId('issued-mailed').waitFor(WAIT);
    await screenshot(staffPage, 'guest-link-sent-desktop');

    // The customer reads the mail and opens the link on a phone.
    const mail = await catcher.waitForMail(customerEmail, 1, 30_000);
    expect(mail.subject).toContain(shop.name);
    expect(mail.text).toMatch(/engine work can hurt/i);
    const link = (mail.text ?? '').match(/https?:\/\/\S+\/g\/[A-Za-z0-9_-]+/)?.[0];
    expect(link, 'a /g/ link in the mail').toBeTruthy();
    expect(new URL(link!).origin).toBe(url);

    const guestContext = await browser.newContext({ viewport: PHONE });
    const guest = await guestContext.newPage();
    const guestErrors = watchConsole(guest);
    await guest.goto(link!);
    await guest.getByTestId('guest-safety').waitFor(WAIT);
    expect(await guest.getByText('Engine work can hurt').isVisible()).toBe(true);
    expect(await guest.getByText('Local rules apply').isVisible()).toBe(true);
    await screenshot(guest, 'guest-link-safety-phone');
    // Nothing starts before the notice is acknowledged.
    expect(await guest.getByTestId('guest-safety-ack').getAttribute('aria-checked')).toBe('false');
    expect((await t.knex('guest_links').where({ shop_id: shop.shopId }).first('acknowledged_at', 'walk_id', 'opened_at'))).toMatchObject({ acknowledged_at: null, walk_id: null });
    await guest.getByTestId('guest-safety-ack').click();
    expect(await guest.getByTestId('guest-safety-ack').getAttribute('aria-checked')).toBe('true');
    await guest.getByTestId('guest-safety-start').click();
    await guest.getByTestId('guest-walk').waitFor(WAIT);
    // The binding cookie is httpOnly and scoped to this link's guest API.
    const cookie = (await guestContext.cookies()).find((c) => c.name === 'baywalk.guest');
    expect(cookie?.httpOnly).toBe(true);
    expect(cookie?.sameSite).toBe('Lax');
    expect(cookie?.path).toMatch(/^\/api\/guest\/links\/\d+$/);

    // Walk to a cause: trims lean at idle, normal at 2 500 rpm, low vacuum, a hose found off.
    await reading(guest, 'trim-idle', '18', 'lean');
    await screenshot(guest, 'guest-link-walk-phone');
    await reading(guest, 'trim-2500-after-lean-idle', '3', 'normal');
    await reading(guest, 'vacuum-idle', '15', 'low');
    await guest.getByTestId('step-visual-hoses').waitFor(WAIT);
    await guest.getByTestId('step-note').fill('The small hose behind the manifold was off');
    await guest.getByTestId('answer-answer.hose-off').click();
    const cause = guest.getByTestId('step-vacuum-hose-off-or-split');
    await cause.waitFor(WAIT);
    await cause.getByTestId('step-cause').waitFor(WAIT);

    // A photo at the cause step, through the browser's file picker.
    const jpeg = await sharp({ create: { width: 800, height: 600, channels: 3, background: '#556b2f' } }).jpeg().toBuffer();
    const [chooser] = await Promise.all([guest.waitForEvent('filechooser', WAIT), cause.getByTestId('photo-add').click()]);
    await chooser.setFiles({ name: 'hose.jpg', mimeType: 'image/jpeg', buffer: jpeg });
    await guest.waitForFunction(() => document.querySelectorAll('[data-testid^="photo-remove-"]').length === 1, undefined, WAIT);
    await guest.getByTestId('photo-uploading').waitFor({ state: 'detached', ...WAIT });
    // The thumbnail loads through the guest photo route (the staff one would need a session).
    await guest.waitForFunction(
      () => [...document.querySelectorAll('[data-testid^="photo-"] img')].some((i) => (i as HTMLImageElement).complete && (i as HTMLImageElement).naturalWidth > 0 && (i as HTMLImageElement).src.includes('/api/guest/links/')),
      undefined,
      WAIT,
    );
    await screenshot(guest, 'guest-link-cause-phone');

    await guest.getByTestId('finish-submit').click();
    await guest.getByTestId('guest-finished').waitFor(WAIT);
    await screenshot(guest, 'guest-link-finished-phone');
    // The phone page never scrolls sideways.
    expect(await guest.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);

    // Support sees the finished walk and turns it into a job.
    await staffPage.goto(`${url}/support`);
    const review = staffPage.getByTestId('support-review');
    await review.waitFor(WAIT);
    await review.getByText('Jordan Vale').click();
    await staffPage.getByTestId('guest-link-page').waitFor(WAIT);
    expect(await staffPage.getByTestId('link-status').textContent()).toContain('Finished');
    await staffPage.getByTestId('walk-report').waitFor(WAIT);
    const report = (await staffPage.getByTestId('walk-report').textContent()) ?? '';
    expect(report).toContain('18');
    expect(report).toContain('The small hose behind the manifold was off');
    expect(await staffPage.locator('[data-testid="walk-report"] img').count()).toBeGreaterThanOrEqual(1);
    await screenshot(staffPage, 'guest-link-review-desktop');

    await staffPage.getByTestId('link-to-job').click();
    const ro = `GL-${crypto.randomBytes(3).toString('hex').toUpperCase()}`;
    await staffPage.getByTestId('job-roNumber').fill(ro);
    expect(await staffPage.getByTestId('job-customerName').inputValue()).toBe('Jordan Vale');
    await staffPage.getByTestId('job-from-walk-submit').click();
    await staffPage.getByTestId('link-job').waitFor(WAIT);
    await screenshot(staffPage, 'guest-link-job-desktop');
    // The inbox on a phone: the walk is handled now, listed with its status.
    await staffPage.setViewportSize(PHONE);
    await staffPage.goto(`${url}/support`);
    await staffPage.getByTestId('support-links').getByText('Jordan Vale').waitFor(WAIT);
    await screenshot(staffPage, 'guest-link-inbox-phone');
    await staffPage.getByTestId('support-links').getByText('Jordan Vale').click();
    await staffPage.getByTestId('link-job').waitFor(WAIT);
    await screenshot(staffPage, 'guest-link-page-phone');
    expect(await staffPage.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);

    const job = await t.knex('jobs').where({ shop_id: shop.shopId, ro_number: ro }).first('id', 'customer_name');
    expect(job.customer_name).toBe('Jordan Vale');
    const linked = await t.knex('guest_links').where({ shop_id: shop.shopId, job_id: job.id }).first('walk_id');
    expect((await t.knex('walks').where({ id: linked.walk_id }).first('job_id', 'status')).job_id).toBe(job.id);

    expect(guestErrors, guestErrors.join('\n')).toEqual([]);
    expect(staffErrors, staffErrors.join('\n')).toEqual([]);
    await guestContext.close();
  });

  it('an expired link shows a clear page with the shop contact, not an error', async () => {
    const support = await browser.newPage({ viewport: DESKTOP });
    await signIn(support, shop.people.support.email);
    const treeId = (await t.knex('trees').where({ shop_id: shop.shopId, slug: 'hiss-at-idle' }).first('id')).id as number;
    const answer = await support.evaluate(async (id) => {
      const res = await fetch('/api/guest-links', {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', 'X-Baywalk-Request': '1' },
        body: JSON.stringify({ treeId: id, customerName: 'Late Customer' }),
      });
      return (await res.json()) as { url: string; link: { id: number } };
    }, treeId);
    await t.knex('guest_links').where({ id: answer.link.id }).update({ expires_at: new Date(Date.now() - 60_000) });

    const page = await browser.newPage({ viewport: PHONE });
    const errors = watchConsole(page);
    await page.goto(answer.url);
    await page.getByTestId('guest-link-expired').waitFor(WAIT);
    expect(await page.getByText('This link has expired').isVisible()).toBe(true);
    expect(await page.getByTestId('shop-call').textContent()).toContain('+1 555 0199');
    expect(await page.getByTestId('shop-email').textContent()).toContain('help@guest-ui.example');
    await screenshot(page, 'guest-link-expired-phone');
    // The refusal is the page's content, not a console error.
    expect(errors.filter((e) => !/410/.test(e))).toEqual([]);
  });
});
