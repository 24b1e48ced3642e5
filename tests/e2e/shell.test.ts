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

  it('when an admin opens Admin → Users, then the table lists the accounts, and a user added there can have their password reset', async () => {
    const page = await openPage(browser, viewport);
    await signIn(page, account('admin'));
    await page.goto('/admin/users');
    await expect.poll(() => page.getByTestId(`user-row-${account('tech').email}`).isVisible()).toBe(true);
    await screenshot(page, `admin-users-${viewport}`);

    // Add a user through the dialog, then reset their password; the new one signs in.
    const email = `new-${viewport}@example.test`;
    await page.getByTestId('add-user').click();
    await page.getByTestId('new-user-name').fill(`New ${viewport} tech`);
    await page.getByTestId('new-user-email').fill(email);
    await page.getByTestId('new-user-password').fill('first-password-1');
    await page.getByTestId('new-user-save').click();
    await expect.poll(() => page.getByTestId(`user-row-${email}`).isVisible()).toBe(true);
    await expect.poll(() => page.getByTestId('add-user-dialog').count()).toBe(0);
    await screenshot(page, `admin-user-added-${viewport}`);
    await page.getByTestId(`reset-password-${email}`).click();
    await page.getByTestId('reset-password-input').fill('second-password-2');
    await screenshot(page, `admin-reset-password-${viewport}`);
    await page.getByTestId('reset-password-save').click();
    await expect.poll(() => page.getByText('New password set').isVisible()).toBe(true);
    await page.context().close();

    const fresh = await openPage(browser, viewport);
    await signIn(fresh, { email, password: 'second-password-2', name: '', role: 'tech' });
    await expect.poll(() => fresh.getByTestId(viewport === 'phone' ? 'bottom-tabs' : 'side-rail').isVisible()).toBe(true);
    await fresh.context().close();
  });
});
