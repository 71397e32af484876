import { beforeAll, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import type { Page } from 'playwright-core';
import { DESKTOP, PHONE, screenshot, servedAppInChromium, watchConsole } from '../support/browser';
import { signInThroughScreen } from '../support/sign-in-page';
import { createShopWithPeople, type TestShop } from '../support/people';
import { installStockTrees } from '@/server/services/tree-stock';

describe('a job and a walk in Chromium', () => {
  const app = servedAppInChromium();
  let shop: TestShop;

  beforeAll(async () => {
    shop = await createShopWithPeople(app.server.knex, 'Walk UI');
    await installStockTrees(app.server.knex, shop.shopId);
  });

  const signIn = (page: Page, email: string) => signInThroughScreen(page, app.server.url, email);
  const stepTitle = (page: Page) => page.getByTestId('step-title').innerText();
  const waitForStep = (page: Page, title: string) => page.getByTestId('step-title').filter({ hasText: title }).waitFor({ timeout: 15_000 });

  it('creates a job with a VIN, walks a stock tree with readings, a photo and an undo, resumes after a reload, finishes and opens the report (390x844)', async () => {
    const page = await app.browser.newPage({ viewport: PHONE });
    const errors = watchConsole(page);
    await signIn(page, shop.people.tech.email);

    // A new job; the VIN is checked as it is typed (49 CFR 565.15 published examples).
    await page.goto(app.server.url + '/jobs');
    await page.getByTestId('job-new').click();
    await page.getByTestId('job-roNumber').fill('RO-7731');
    await page.getByTestId('job-customerName').fill('Morgan Teague');
    await page.getByTestId('job-vin').fill('1M8GDM9A0KP042788');
    await page.getByTestId('vin-status-warning').waitFor();
    expect(await page.getByTestId('vin-override').isVisible()).toBe(true);
    await page.getByTestId('job-vin').fill('1g4ah59h45g118341');
    expect(await page.getByTestId('vin-status-valid').innerText()).toContain('Model year 2005');
    await page.getByTestId('job-make').fill('Buick');
    await page.getByTestId('job-model').fill('Century');
    await page.getByTestId('install-add').click();
    await page.getByTestId('install-0-text').fill('Ported upper intake');
    await screenshot(page, 'walk-job-form-phone');
    await page.getByTestId('job-save').click();
    await page.getByTestId('job-page').waitFor({ timeout: 15_000 });
    expect(await page.getByTestId('job-details').innerText()).toContain('2005 Buick Century');
    await screenshot(page, 'walk-job-page-phone');

    // The tree for the job's install is suggested; starting it opens the walk.
    await page.getByTestId('start-walk-lean-after-intake-manifold').click();
    await page.waitForURL(/\/walks\/\d+$/, { timeout: 15_000 });
    const walkUrl = page.url();
    await waitForStep(page, 'Read total fuel trim at idle');
    await screenshot(page, 'walk-step-phone');
    // Nothing to take back yet: no Back button until the first answer.
    expect(await page.getByTestId('walk-back').count()).toBe(0);

    // Cautions come before the question.
    const caution = await page.getByTestId('step-cautions').boundingBox();
    const title = await page.getByTestId('step-title').boundingBox();
    expect(caution!.y).toBeLessThan(title!.y);
    expect(await page.getByTestId('step-cautions').innerText()).toMatch(/Caution/);

    // A reading with its live verdict and the branch it leads to.
    await page.getByTestId('reading-value').fill('18');
    await page.getByTestId('reading-verdict-lean').waitFor();
    expect(await page.getByTestId('reading-leads-to').innerText()).toContain('2 500');
    await page.getByTestId('step-note').fill('Warm engine, accessories off');
    await screenshot(page, 'walk-reading-phone');
    await page.getByTestId('reading-submit').click();
    await waitForStep(page, '2 500');
    await page.getByTestId('walk-back').waitFor();

    // A photo at this step, through the web file chooser.
    const jpeg = await sharp({ create: { width: 640, height: 480, channels: 3, background: '#44617a' } }).jpeg().toBuffer();
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.getByTestId('photo-add').click()]);
    await chooser.setFiles({ name: 'scan-tool.jpg', mimeType: 'image/jpeg', buffer: jpeg });
    await page.locator('[data-testid^="photo-remove-"]').first().waitFor({ timeout: 15_000 });

    await page.getByTestId('reading-value').fill('3');
    await page.getByTestId('reading-submit').click();
    await waitForStep(page, 'Measure manifold vacuum at idle');

    // Back undoes the last answer; answering again moves on.
    await page.getByTestId('walk-back').click();
    await waitForStep(page, '2 500');
    await page.getByTestId('reading-value').fill('3');
    await page.getByTestId('reading-submit').click();
    await waitForStep(page, 'Measure manifold vacuum at idle');

    // A reload resumes at the same step: the state is the server's.
    const reads: string[] = [];
    const onRequest = (r: { url(): string }) => {
      const path = new URL(r.url()).pathname;
      if (path.startsWith('/api/') || path.includes('/js/web/[id]-')) reads.push(path);
    };
    page.on('request', onRequest);
    await page.reload();
    await waitForStep(page, 'Measure manifold vacuum at idle');
    expect(page.url()).toBe(walkUrl);
    page.off('request', onRequest);
    // The page asked for the session, the walk and the route chunk before its
    // JavaScript ran (public/early-requests.js), and the app used those answers
    // instead of asking again.
    const walkApi = new URL(walkUrl).pathname.replace('/walks/', '/api/walks/');
    expect(reads.filter((p) => p === walkApi)).toHaveLength(1);
    expect(reads.filter((p) => p === '/api/auth/me')).toHaveLength(1);
    expect(reads.filter((p) => p.includes('/js/web/[id]-'))).toHaveLength(1);

    await page.getByTestId('reading-value').fill('15');
    await page.getByTestId('reading-verdict-low').waitFor();
    await page.getByTestId('reading-submit').click();
    await waitForStep(page, 'Inspect every hose');
    await page.getByTestId('answer-answer.hose-off').click();
    await page.getByTestId('step-cause').waitFor({ timeout: 15_000 });
    expect(await stepTitle(page)).toContain('Vacuum hose off or split');
    await page.getByTestId('walk-progress').scrollIntoViewIfNeeded();
    await screenshot(page, 'walk-cause-phone');

    await page.getByTestId('finish-note').fill('Hose refitted and clamped; trims +2 % after');
    await page.getByTestId('finish-submit').click();
    await page.getByTestId('walk-finished').waitFor({ timeout: 15_000 });
    expect(await page.getByTestId('walk-back').count()).toBe(0); // read-only now

    await page.getByTestId('walk-open-report').click();
    await page.getByTestId('walk-report').waitFor({ timeout: 15_000 });
    const report = await page.getByTestId('walk-report').innerText();
    for (const words of ['RO RO-7731', 'Morgan Teague', 'Vacuum hose off or split', 'Lean', 'Warm engine, accessories off', 'Hose refitted', 'Caution']) expect(report).toContain(words);
    expect(await page.getByTestId('report-step-1').innerText()).toContain('18 %');
    expect(await page.locator('[data-testid="walk-report"] img').count()).toBeGreaterThan(0);
    await screenshot(page, 'walk-report-phone');
    const pdf = await page.request.get(walkUrl.replace('/walks/', '/api/walks/') + '/report.pdf');
    expect(pdf.status()).toBe(200);
    expect(pdf.headers()['content-type']).toBe('application/pdf');

    expect(errors).toEqual([]);
    await page.close();
  });

  it('shows the jobs as a table on a wide screen and finds one by VIN', async () => {
    const page = await app.browser.newPage({ viewport: DESKTOP });
    const errors = watchConsole(page);
    await signIn(page, shop.people.lead.email);
    await page.goto(app.server.url + '/jobs');
    await page.getByTestId('job-table').waitFor({ timeout: 15_000 });
    await page.getByTestId('job-search').fill('118341');
    await page.getByTestId('job-row-RO-7731').waitFor();
    await screenshot(page, 'walk-jobs-desktop');
    expect(errors).toEqual([]);
    await page.close();
  });

  it('says so, instead of waiting for ever, at an address that names no walk', async () => {
    const page = await app.browser.newPage({ viewport: PHONE });
    await signIn(page, shop.people.tech.email);
    await page.goto(app.server.url + '/walks/not-a-walk');
    await page.getByTestId('walk-error').getByText('That address names no walk.').waitFor({ timeout: 15_000 });
    // Asking again would get the same answer: no "Try again" for an address that names no walk, or a walk that does not exist.
    expect(await page.getByTestId('load-retry').count()).toBe(0);
    await page.goto(app.server.url + '/walks/999999999');
    await page.getByTestId('walk-error').getByText('That walk was not found.').waitFor({ timeout: 15_000 });
    expect(await page.getByTestId('load-retry').count()).toBe(0);
    await page.close();
  });
});
