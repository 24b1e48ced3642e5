import { inject } from 'vitest';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { account, launchBrowser, openPage, screenshot, signIn } from './browser';
import { adminToken, importCsv } from './api-setup';

/**
 * What each role may touch (Issue 7 item 5): an admin's own role and active switch are locked with
 * the reason on screen, and a tech sees where a part is in stock but no amounts. Models and the
 * distributor are invented and unique to this file.
 */

const UNIT = 'ZQE2E-AC-030';
// Ratings are made-up example values within the schema's ranges (no source: invented test data).
const OUTDOOR_CSV = ['model,brand,system_type,refrigerant,nominal_tons', `${UNIT},Quillmoor,ac,R-454B,2.5`].join('\r\n');
const PRICE_CSV = ['model,price,effective_from', `${UNIT},1876.25,2024-03-01`].join('\r\n');
const DISTRIBUTOR = 'Larchmont Supply';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  const token = await adminToken();
  await importCsv(token, 'outdoor-units', OUTDOOR_CSV);
  const form = new FormData();
  form.append('file', new Blob([PRICE_CSV], { type: 'text/csv' }), 'e2e-access-prices.csv');
  form.append('kind', 'prices');
  form.append('distributor', DISTRIBUTOR);
  form.append('dryRun', 'false');
  const res = await fetch(`${inject('baseUrl')}/api/imports`, {
    method: 'POST',
    headers: { Authorization: `Bearer ${token}` },
    body: form,
  });
  expect(res.status, await res.clone().text()).toBe(201);
});
afterAll(async () => {
  await browser?.close();
});

describe('access by role in the browser', () => {
  it.each(['phone', 'wide'] as const)(
    'when an admin opens Users on a %s, then their own role and active controls are disabled with the reason, and others stay enabled',
    async (viewport) => {
      const page = await openPage(browser, viewport);
      const me = account('admin');
      const other = account('tech');
      await signIn(page, me);
      await page.goto('/admin/users');
      const own = page.getByTestId(`user-row-${me.email}`);
      await expect.poll(() => own.isVisible(), { timeout: 15_000 }).toBe(true);
      expect(await own.getByTestId('own-row-reason').textContent()).toMatch(/can not change your own role or deactivate yourself/);
      expect(await page.getByTestId(`role-${me.email}`).isDisabled()).toBe(true);
      expect(await page.getByTestId(`toggle-active-${me.email}`).isDisabled()).toBe(true);
      expect(await page.getByTestId(`reset-password-${me.email}`).isDisabled()).toBe(false);
      expect(await page.getByTestId(`role-${other.email}`).isDisabled()).toBe(false);
      expect(await page.getByTestId(`toggle-active-${other.email}`).isDisabled()).toBe(false);
      await screenshot(page, `access-own-row-${viewport}`);
      await page.context().close();
    },
  );

  it('when a tech on a phone opens a part a distributor stocks, then it says where it is in stock and shows no price', async () => {
    const page = await openPage(browser, 'phone');
    await signIn(page, account('tech'));
    await page.getByTestId('nav-catalog').first().click();
    await page.getByTestId('catalog-search').fill(UNIT);
    const item = page.getByTestId(`catalog-item-${UNIT}`);
    await expect.poll(() => item.isVisible(), { timeout: 15_000 }).toBe(true);
    await item.click();
    const prices = page.getByTestId('catalog-prices');
    await expect.poll(() => prices.isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await prices.textContent()).toContain(`In stock at ${DISTRIBUTOR}`);
    const section = await page.getByTestId('catalog-prices-section').textContent();
    expect(section).not.toMatch(/\$|1,876|1876/);
    await page.getByTestId('catalog-prices-section').scrollIntoViewIfNeeded();
    await screenshot(page, 'access-tech-stock-phone');
    await page.context().close();
  });
});
