import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { expect, inject } from 'vitest';
import { launchChromium } from './chromium';
import type { E2eAccount } from './global-setup';

/** Shared browser helpers: Debian's Chromium through playwright-core, phone and wide viewports. */

export const VIEWPORTS = {
  phone: { width: 390, height: 844 },
  wide: { width: 1440, height: 900 },
} as const;
export type ViewportName = keyof typeof VIEWPORTS;

const SCREENSHOT_DIR = path.resolve(__dirname, 'screenshots');

export const launchBrowser = launchChromium;

export async function openPage(browser: Browser, viewport: ViewportName): Promise<Page> {
  const context = await browser.newContext({ viewport: VIEWPORTS[viewport], baseURL: inject('baseUrl'), deviceScaleFactor: 1 });
  const page = await context.newPage();
  page.on('pageerror', (err) => console.error(`[browser ${viewport}] ${err.message}`));
  return page;
}

export function account(role: 'tech' | 'estimator' | 'admin'): E2eAccount {
  return inject('accounts')[role];
}

export async function signIn(page: Page, who: E2eAccount): Promise<void> {
  await page.goto('/sign-in');
  await page.getByTestId('sign-in-email').fill(who.email);
  await page.getByTestId('sign-in-password').fill(who.password);
  await page.getByTestId('sign-in-submit').click();
  await expect.poll(() => page.url(), { timeout: 15_000 }).not.toContain('/sign-in');
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`), fullPage: false });
}
