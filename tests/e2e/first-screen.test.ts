import { describe, expect, it } from 'vitest';
import { DESKTOP, PHONE, screenshot, servedAppInChromium, watchConsole } from '../support/browser';

describe('first screen in Chromium', () => {
  const app = servedAppInChromium();

  for (const [name, viewport] of [['phone', PHONE], ['desktop', DESKTOP]] as const) {
    it(`sends an anonymous visitor to sign-in, with the product and a connected database, at ${viewport.width}x${viewport.height}`, async () => {
      const page = await app.browser.newPage({ viewport });
      const errors = watchConsole(page);
      await page.goto(app.server.url + '/');
      // The status panel lives in the sign-in screen's footer.
      await page.getByTestId('status-db-ok').waitFor({ timeout: 30_000 });
      expect(new URL(page.url()).pathname).toBe('/sign-in');
      expect(await page.getByRole('heading', { name: 'Baywalk' }).isVisible()).toBe(true);
      expect(await page.getByTestId('sign-in-form').isVisible()).toBe(true);

      // The shipped Nunito Sans is loaded and applied (no network font).
      const font = await page.getByRole('heading', { name: 'Baywalk' }).evaluate((el) => getComputedStyle(el).fontFamily);
      expect(font).toContain('NunitoSans_700Bold');
      expect(await page.evaluate(() => document.fonts.check('700 16px NunitoSans_700Bold'))).toBe(true);

      // Content is centred with a maximum width on a wide screen.
      const box = await page.getByTestId('status-ready').boundingBox();
      expect(box).not.toBeNull();
      if (viewport === DESKTOP) {
        expect(box!.width).toBeLessThanOrEqual(960);
        expect(Math.abs(box!.x + box!.width / 2 - viewport.width / 2)).toBeLessThan(20);
      }

      await screenshot(page, `first-screen-${name}`);
      expect(errors).toEqual([]);
      await page.close();
    });
  }
});
