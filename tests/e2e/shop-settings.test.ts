import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DEFAULT_SHOP_SETTINGS } from '../../shared/estimates/shop-defaults';
import type { ShopSettingsResponse } from '../../shared/schemas/options';
import { account, launchBrowser, openPage, screenshot, signIn } from './browser';
import { adminToken } from './api-setup';

/**
 * Admin → Pricing (issue 11): the shop's labor rate, markup or margin, tax, repair-or-replace threshold,
 * energy assumptions and rebate tiers. The figures typed here are invented test values within the schema.
 */

async function shopSettings(): Promise<ShopSettingsResponse> {
  const res = await fetch(`${inject('baseUrl')}/api/settings/shop`, { headers: { Authorization: `Bearer ${await adminToken()}` } });
  expect(res.status).toBe(200);
  return (await res.json()) as ShopSettingsResponse;
}

/** Puts the defaults back so other files' options are priced as they expect. */
async function restoreDefaults(): Promise<void> {
  const res = await fetch(`${inject('baseUrl')}/api/settings/shop`, {
    method: 'PUT',
    headers: { Authorization: `Bearer ${await adminToken()}`, 'Content-Type': 'application/json' },
    body: JSON.stringify(DEFAULT_SHOP_SETTINGS),
  });
  expect(res.status, await res.clone().text()).toBe(200);
}

async function openPricing(page: Page) {
  await page.goto('/admin/users');
  await page.getByTestId('admin-section-pricing').click({ timeout: 15_000 });
  await expect.poll(() => page.url()).toContain('/admin/pricing');
  await expect.poll(() => page.getByTestId('shop-laborRateCents').isVisible(), { timeout: 15_000 }).toBe(true);
}

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await restoreDefaults();
  await browser?.close();
});

describe('Admin → Pricing at the phone viewport', () => {
  it('when an admin changes the labor rate and tax and adds a rebate tier, then a reload shows them and the server holds cents', async () => {
    const page = await openPage(browser, 'phone');
    await signIn(page, account('admin'));
    await openPricing(page);
    expect(await page.getByRole('heading', { level: 1 }).count()).toBe(1);
    expect(await page.getByRole('heading', { level: 1, name: 'Pricing and estimates' }).count()).toBe(1);
    // The default as a hint, in dollars: shared/estimates/shop-defaults.ts (9500 cents).
    expect(await page.getByText('Default $95.00').count()).toBe(1);
    expect(await page.getByTestId('shop-settings-note').textContent()).toMatch(/options already saved keep/);

    // Out of range first: the schema's 30 % limit for tax (shared/schemas/options.ts), in words beside the field.
    await page.getByTestId('shop-taxRatePct').fill('45');
    await page.getByTestId('save-shop-settings').click();
    await expect.poll(() => page.getByText('Too big: enter 30 or less.').count()).toBe(1);
    await screenshot(page, 'shop-settings-error-phone');

    await page.getByTestId('shop-laborRateCents').fill('112.50');
    await page.getByTestId('shop-taxRatePct').fill('7.25');
    // Retyped, the field's message and the banner go.
    await expect.poll(() => page.getByText('Too big: enter 30 or less.').count()).toBe(0);
    expect(await page.getByText('Some entries need fixing').count()).toBe(0);
    await page.getByTestId('pricing-margin').click();
    await page.getByTestId('shop-targetMarginPct').fill('28');
    await page.getByTestId('tier-add').click();
    const added = DEFAULT_SHOP_SETTINGS.rebateTiers.length;
    await page.getByTestId(`tier-${added}-name`).fill('E2E shop tier');
    await page.getByTestId(`tier-${added}-hspf2`).fill('8.1');
    await page.getByTestId('tier-add').scrollIntoViewIfNeeded();
    await screenshot(page, 'shop-settings-tiers-phone');
    const save = page.getByTestId('save-shop-settings');
    expect((await save.boundingBox())!.height).toBeGreaterThanOrEqual(48);
    await save.click();
    await expect.poll(() => page.getByText('New options use these figures').count(), { timeout: 15_000 }).toBe(1);
    await screenshot(page, 'shop-settings-saved-phone');

    // Money typed in dollars is stored as cents.
    const stored = (await shopSettings()).settings;
    expect(stored).toMatchObject({ laborRateCents: 11250, taxRatePct: 7.25, pricing: 'margin', targetMarginPct: 28 });
    expect(stored.rebateTiers.at(-1)).toEqual({ name: 'E2E shop tier', hspf2: 8.1 });

    await page.reload();
    await expect.poll(() => page.getByTestId('shop-laborRateCents').inputValue(), { timeout: 15_000 }).toBe('112.50');
    expect(await page.getByTestId('shop-taxRatePct').inputValue()).toBe('7.25');
    expect(await page.getByTestId('shop-targetMarginPct').inputValue()).toBe('28');
    expect(await page.getByTestId(`tier-${added}-name`).inputValue()).toBe('E2E shop tier');

    // Removing the tier and saving takes it off the server's list.
    // The Save at the foot of the form does the same as the one at the top.
    await page.getByTestId(`tier-remove-${added}`).click();
    await page.getByTestId('save-shop-settings-bottom').click();
    await expect.poll(async () => (await shopSettings()).settings.rebateTiers.length, { timeout: 15_000 }).toBe(added);
    await page.context().close();
  });

  it('when an estimator signs in, then there is no Admin tab and the Pricing address sends them away', async () => {
    const page = await openPage(browser, 'phone');
    await signIn(page, account('estimator'));
    await expect.poll(() => page.getByTestId('bottom-tabs').isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await page.getByTestId('bottom-tabs').getByTestId('nav-admin').count()).toBe(0);
    await page.goto('/admin/pricing');
    await expect.poll(() => page.url(), { timeout: 15_000 }).not.toContain('/admin');
    expect(await page.getByTestId('shop-laborRateCents').count()).toBe(0);
    await page.context().close();
  });
});

describe('Admin → Pricing at the wide viewport', () => {
  it('when an admin opens Pricing on a wide screen, then the form shows every section', async () => {
    const page = await openPage(browser, 'wide');
    await signIn(page, account('admin'));
    await openPricing(page);
    for (const name of ['Labor, markup and tax', 'Repair or replace', 'Energy estimates', 'Rebate tiers']) {
      expect(await page.getByRole('heading', { level: 2, name }).count(), name).toBe(1);
    }
    await screenshot(page, 'shop-settings-wide');
    await page.context().close();
  });
});
