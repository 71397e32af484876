/// <reference types="node" />
import crypto from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { installStockTrees } from '@/server/services/tree-stock';
import { DESKTOP, PHONE, screenshot, servedAppInChromium } from '../support/browser';
import { signInThroughScreen } from '../support/sign-in-page';
import { createShopWithPeople, signedIn, type TestShop } from '../support/people';

// The pages keep their strict CSP; the test context bypasses it only to inject axe-core.
const AXE = require.resolve('axe-core/axe.min.js');

interface Violation {
  id: string;
  impact: string | null;
  help: string;
  nodes: Array<{ target: string[]; failureSummary?: string }>;
}

/** Runs axe-core on the page as it stands; returns the serious and critical violations, readable. */
async function seriousViolations(page: Page): Promise<string[]> {
  await page.addScriptTag({ path: AXE });
  const violations: Violation[] = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: Document, opts: object) => Promise<{ violations: Violation[] }> } }).axe;
    return (await axe.run(document, { resultTypes: ['violations'] })).violations;
  });
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.impact} ${v.id}: ${v.help} — ${v.nodes.slice(0, 4).map((n) => n.target.join(' ')).join(' | ')}${v.nodes.length > 4 ? ` (+${v.nodes.length - 4} more)` : ''}`);
}

/** Waits until a screen has loaded its data: no requests in flight for a moment, then one more frame of rendering. */
async function settled(page: Page) {
  await page.waitForLoadState('networkidle');
  await page.waitForTimeout(300);
}

/**
 * axe-core on every main screen, as the shop's owner (who sees them all) at
 * phone size, and the sign-in screen signed out: no serious or critical
 * violations (names, labels, contrast, roles).
 */
describe('accessibility of the main screens (axe-core in Chromium)', () => {
  const app = servedAppInChromium();
  let shop: TestShop;
  const screens: Array<[string, () => string]> = [];

  beforeAll(async () => {
    shop = await createShopWithPeople(app.server.knex, 'Access');
    await installStockTrees(app.server.knex, shop.shopId);
    const owner = await signedIn(app.server.app, shop.people.owner.email);
    const tree = await app.server.knex('trees').where({ shop_id: shop.shopId, slug: 'lean-after-intake-manifold' }).first('id');
    const job = await owner.post('/api/jobs').send({ roNumber: 'A11Y-1', customerName: 'Ada Brennan', make: 'Ford', model: 'Mustang', year: 2015, install: [{ type: 'intake_manifold', text: '' }] });
    const walk = await owner.post('/api/walks').send({ jobId: job.body.job.id, treeId: tree.id });
    // A reading step with a recorded answer behind it: the walk screen at its fullest.
    await owner.post(`/api/walks/${walk.body.walk.id}/steps`).send({ stepId: crypto.randomUUID(), event: { type: 'reading', value: 18, unit: '%' } });
    screens.push(
      ['jobs', () => '/jobs'],
      ['job page', () => `/jobs/${job.body.job.id}`],
      ['walk', () => `/walks/${walk.body.walk.id}`],
      ['trees', () => '/trees'],
      ['tree page', () => `/trees/${tree.id}`],
      ['readings', () => '/readings'],
      ['settings', () => '/settings'],
      ['patterns', () => '/patterns'],
      ['support', () => '/support'],
    );
  });

  it('sign-in (signed out) has no serious or critical violations, at phone and desktop sizes', async () => {
    for (const viewport of [PHONE, DESKTOP]) {
      const page = await app.browser.newPage({ viewport, bypassCSP: true });
      await page.goto(`${app.server.url}/sign-in`);
      await page.getByTestId('sign-in-form').waitFor({ timeout: 30_000 });
      await settled(page);
      expect(await seriousViolations(page)).toEqual([]);
      await page.close();
    }
  });

  it('every main screen has no serious or critical violations (owner, 390x844)', async () => {
    const page = await app.browser.newPage({ viewport: PHONE, bypassCSP: true });
    await signInThroughScreen(page, app.server.url, shop.people.owner.email);
    const found: Record<string, string[]> = {};
    for (const [name, url] of screens) {
      await page.goto(app.server.url + url());
      await page.getByTestId('app-shell').waitFor({ timeout: 30_000 });
      await settled(page);
      // Still on the screen asked for (not bounced to sign-in or a not-found page).
      expect(new URL(page.url()).pathname, name).toBe(url());
      const v = await seriousViolations(page);
      if (v.length) {
        found[name] = v;
        await screenshot(page, `a11y-${name.replace(/\s+/g, '-')}`);
      }
    }
    expect(found).toEqual({});
  });
});
