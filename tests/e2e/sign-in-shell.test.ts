import { describe, expect, it } from 'vitest';
import { boxesOf, DESKTOP, PHONE, screenshot, servedAppInChromium, watchConsole } from '../support/browser';

// What the pre-rendered sign-in page of public/index.html draws, and the
// real screen's element for each (components/auth/auth-frame.tsx, sign-in-form.tsx).
const PARTS: Array<[shell: string, app: string]> = [
  ['.bs-title', 'h1'],
  ['.bs-tagline', 'text=Guided fault-finding'],
  ['.bs-card', '[data-testid="sign-in-form"] >> xpath=..'],
  ['.bs-heading', '[data-testid="sign-in-form"] h2'],
  ['.bs-field:nth-of-type(1) .bs-input', '[data-testid="sign-in-email"]'],
  ['.bs-field:nth-of-type(2) .bs-input', '[data-testid="sign-in-password"]'],
  ['.bs-button', '[data-testid="sign-in-submit"]'],
  ['.bs-links a:nth-child(1)', '[data-testid="link-forgot"]'],
  ['.bs-links a:nth-child(2)', '[data-testid="link-sign-up"]'],
];

describe('sign-in page drawn before the app loads', () => {
  const app = servedAppInChromium();

  for (const [name, viewport] of [['phone', PHONE], ['desktop', DESKTOP]] as const) {
    it(`matches the real sign-in screen, then gives way to it, at ${viewport.width}x${viewport.height}`, async () => {
      // Without the app's JavaScript: only the page's own shell.
      const bare = await app.browser.newPage({ viewport });
      await bare.route('**/_expo/static/**', (route) => route.abort());
      await bare.goto(app.server.url + '/sign-in');
      await bare.locator('#boot-shell .bs-tagline').waitFor();
      await bare.evaluate(() => document.fonts.ready);
      const shell = await boxesOf(bare, PARTS.map(([s]) => `#boot-shell ${s}`));
      await screenshot(bare, `sign-in-shell-${name}`);
      await bare.close();

      // With it: the real screen takes over, in the same places, and the shell is gone.
      const page = await app.browser.newPage({ viewport });
      const errors = watchConsole(page);
      await page.goto(app.server.url + '/sign-in');
      await page.getByTestId('sign-in-form').waitFor();
      await page.locator('#boot-shell').waitFor({ state: 'detached' });
      const real = await boxesOf(page, PARTS.map(([, a]) => a));
      expect(real).toEqual(shell);
      expect(errors).toEqual([]);
      await page.close();
    });
  }

  it('is left hidden on every other address', async () => {
    const page = await app.browser.newPage({ viewport: PHONE });
    await page.route('**/_expo/static/**', (route) => route.abort());
    for (const path of ['/', '/walks/1', '/sign-up', '/g/some-token']) {
      await page.goto(app.server.url + path);
      expect(await page.locator('#boot-shell').isVisible(), path).toBe(false);
    }
    await page.close();
  });
});
