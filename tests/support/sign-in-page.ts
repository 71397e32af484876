import type { Page } from 'playwright-core';
import { TEST_PASSWORD } from './people';

/**
 * Signs a person in through the sign-in screen of the app at `baseUrl`, as
 * they would; answers once the app has left the sign-in screen and its shell shows.
 */
export async function signInThroughScreen(page: Page, baseUrl: string, email: string, { password = TEST_PASSWORD, timeout = 30_000 } = {}) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByTestId('sign-in-email').fill(email);
  await page.getByTestId('sign-in-password').fill(password);
  await page.getByTestId('sign-in-submit').click();
  // Each role lands on its own first screen; all that matters here is leaving sign-in.
  await page.waitForURL((url) => url.pathname !== '/sign-in', { timeout });
  await page.getByTestId('app-shell').waitFor({ timeout });
}
