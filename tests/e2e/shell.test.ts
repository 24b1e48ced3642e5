import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { account, launchBrowser, openPage, screenshot, signIn, VIEWPORTS, type ViewportName } from './browser';
import { NAV_ITEMS } from '../../constants/navigation';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const ROLES = ['tech', 'estimator', 'admin'] as const;

describe.each(Object.keys(VIEWPORTS) as ViewportName[])('app shell at the %s viewport', (viewport) => {
  it('when signed out, then the sign-in screen shows and bad credentials get a clear message', async () => {
    const page = await openPage(browser, viewport);
    await page.goto('/');
    await expect.poll(() => page.url()).toContain('/sign-in');
    await page.getByTestId('sign-in-email').fill(account('tech').email);
    await page.getByTestId('sign-in-password').fill('not-the-password');
    await page.getByTestId('sign-in-submit').click();
    await expect.poll(() => page.getByTestId('sign-in-error').textContent()).toContain('not right');
    await screenshot(page, `sign-in-error-${viewport}`);
    await page.context().close();
  });

  it.each(ROLES)('when the %s signs in, then they see their role’s navigation, a deep link reloads, and sign-out works', async (role) => {
    const page = await openPage(browser, viewport);
    await signIn(page, account(role));
    const navContainer = viewport === 'phone' ? 'bottom-tabs' : 'side-rail';
    await expect.poll(() => page.getByTestId(navContainer).isVisible()).toBe(true);

    for (const item of NAV_ITEMS) {
      const shown = await page.getByTestId(navContainer).getByTestId(`nav-${item.segment}`).count();
      expect(shown, `${item.label} for ${role}`).toBe(item.roles.includes(role) ? 1 : 0);
    }
    await screenshot(page, `home-${role}-${viewport}`);

    // A deep link survives a reload (served by the SPA fallback, session kept in storage).
    await page.goto('/account');
    await page.reload();
    await expect.poll(() => page.getByTestId('account-role').textContent()).toContain('Role');
    await screenshot(page, `account-${role}-${viewport}`);

    await page.getByTestId('sign-out').click();
    await expect.poll(() => page.url()).toContain('/sign-in');
    await page.context().close();
  });

  it('when an admin opens Admin → Users, then the table lists the accounts', async () => {
    const page = await openPage(browser, viewport);
    await signIn(page, account('admin'));
    await page.goto('/admin/users');
    await expect.poll(() => page.getByTestId(`user-row-${account('tech').email}`).isVisible()).toBe(true);
    await screenshot(page, `admin-users-${viewport}`);
    await page.context().close();
  });
});
