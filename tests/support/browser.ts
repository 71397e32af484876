/// <reference types="node" />
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, expect } from 'vitest';
import { chromium, type Browser, type Page } from 'playwright-core';
import { startTestServer } from './test-app';

export const PHONE = { width: 390, height: 844 } as const;
export const DESKTOP = { width: 1280, height: 800 } as const;
export const SCREENSHOT_DIR = path.resolve(__dirname, '../../test-artifacts/screenshots');

/** Debian's Chromium, headless, with the flags this closed network needs. */
export async function launchBrowser(): Promise<Browser> {
  // playwright gives each launch a fresh temporary profile (a new --user-data-dir).
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

/**
 * The served web build and a Chromium for the tests of one describe block:
 * started before them, closed after them. Read `server` and `browser` inside
 * hooks and tests (they are set once the block starts).
 */
export function servedAppInChromium(): { readonly server: Awaited<ReturnType<typeof startTestServer>>; readonly browser: Browser } {
  const held = {} as { server: Awaited<ReturnType<typeof startTestServer>>; browser: Browser };
  beforeAll(async () => {
    held.server = await startTestServer();
    held.browser = await launchBrowser();
  });
  afterAll(async () => {
    await held.browser?.close();
    await held.server?.close();
  });
  return held;
}

/** Collects console errors and page errors for a page. */
export function watchConsole(page: Page): string[] {
  const errors: string[] = [];
  page.on('console', (msg) => {
    if (msg.type() === 'error') errors.push(msg.text());
  });
  page.on('pageerror', (err) => errors.push(err.message));
  return errors;
}

/** Saves a screenshot under test-artifacts/screenshots (git-ignored). */
export async function screenshot(page: Page, name: string) {
  fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`), fullPage: true });
}

/** The boxes of the first element of each selector, rounded to whole pixels: for comparing a drawn page with the real screen. */
export async function boxesOf(page: Page, selectors: string[]) {
  const out = [];
  for (const s of selectors) {
    const box = await page.locator(s).first().boundingBox();
    expect(box, s).not.toBeNull();
    out.push({ x: Math.round(box!.x), y: Math.round(box!.y), width: Math.round(box!.width), height: Math.round(box!.height) });
  }
  return out;
}
