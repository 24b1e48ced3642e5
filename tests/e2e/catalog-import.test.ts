import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { account, launchBrowser, openPage, screenshot, signIn } from './browser';
import { adminToken, importCsv } from './api-setup';

/**
 * Story 3 in the browser: an admin uploads a distributor price file through Admin → Imports, reads
 * the preview (one rejected row and its reason), commits, and finds the price on the catalog item.
 * Models, brands and distributors here are invented and unique to this file.
 */

// Two invented outdoor units, put in the catalog through the API before the UI steps.
const UNIT_PHONE = 'ZQE2E-PH-036';
const UNIT_WIDE = 'ZQE2E-WD-048';
const OUTDOOR_CSV = [
  'model,brand,system_type,refrigerant,nominal_tons,seer2,eer2,liquid_line_od_in,suction_line_od_in,mca_amps,mocp_amps',
  // Ratings and sizes are made-up example values within the schema's ranges (no source: invented test data).
  `${UNIT_PHONE},Quillmoor,ac,R-454B,3,15.2,11.7,0.375,0.875,18,30`,
  `${UNIT_WIDE},Quillmoor,heat-pump,R-32,4,16.1,12.2,0.375,0.875,24,40`,
].join('\r\n');

// The price is in the $1,234.50 style distributors use (DESIGN.md §6); line 3 has a price that is no number.
const PRICE_CSV = ['model,price,effective_from', `${UNIT_PHONE},"$1,234.50",2024-01-15`, `${UNIT_WIDE},call us,2024-01-15`].join('\r\n');
// A distributor with its own headers: none match, so the admin maps them in the app.
const ODD_PRICE_CSV = ['Part Code,Net Cost,Starts', `${UNIT_WIDE},2310.00,2024-02-01`].join('\r\n');



/** Picks a file through the app's own picker button (expo-document-picker's hidden input). */
async function chooseFile(page: Page, name: string, csv: string) {
  const chooser = page.waitForEvent('filechooser');
  await page.getByTestId('import-pick').click();
  await (await chooser).setFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(csv, 'utf8') });
  await expect.poll(() => page.getByTestId('import-file-name').textContent()).toContain(name);
}

async function openCatalogItem(page: Page, model: string) {
  await page.getByTestId('nav-catalog').first().click();
  await expect.poll(() => page.url()).toContain('/catalog');
  await page.getByTestId('catalog-search').fill(model);
  const item = page.getByTestId(`catalog-item-${model}`);
  await expect.poll(() => item.isVisible(), { timeout: 15_000 }).toBe(true);
  await item.click();
  await expect.poll(() => page.getByTestId('catalog-specs').isVisible(), { timeout: 15_000 }).toBe(true);
}

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  await importCsv(await adminToken(), 'outdoor-units', OUTDOOR_CSV);
});
afterAll(async () => {
  await browser?.close();
});

describe('catalog and price imports in the browser', () => {
  it('when an admin on a phone uploads a price file with one bad row, then the preview shows that row and why, and after commit the catalog item shows the price', async () => {
    const page = await openPage(browser, 'phone');
    await signIn(page, account('admin'));
    await page.goto('/admin/imports');
    await page.getByTestId('import-kind-prices').click();
    await page.getByTestId('import-distributor').fill('Tidewater Supply E2E');
    await chooseFile(page, 'tidewater-prices.csv', PRICE_CSV);
    await screenshot(page, 'imports-ready-phone');
    await page.getByTestId('import-upload').click();

    const preview = page.getByTestId('import-preview');
    await expect.poll(() => preview.isVisible(), { timeout: 15_000 }).toBe(true);
    // Two data rows, one valid (line 2) and one rejected (line 3): counted from PRICE_CSV above.
    expect(await page.getByTestId('import-counts-rows').textContent()).toContain('2');
    expect(await page.getByTestId('import-counts-rejected').textContent()).toContain('1');
    const bad = page.getByTestId('rejected-row-3');
    expect(await bad.textContent()).toContain('call us');
    expect(await bad.textContent()).toMatch(/price/i);
    expect(await page.getByTestId('rejected-rows').locator('[data-testid^="rejected-row-"]').count()).toBe(1);
    await bad.scrollIntoViewIfNeeded();
    await screenshot(page, 'imports-preview-phone');

    await page.getByTestId('import-commit').click();
    await expect.poll(() => page.getByTestId('import-committed').isVisible(), { timeout: 15_000 }).toBe(true);
    await screenshot(page, 'imports-committed-phone');

    await openCatalogItem(page, UNIT_PHONE);
    await page.goBack();
    await expect.poll(() => page.getByTestId(`catalog-item-${UNIT_PHONE}`).isVisible(), { timeout: 15_000 }).toBe(true);
    await screenshot(page, 'catalog-list-phone');
    await page.getByTestId(`catalog-item-${UNIT_PHONE}`).click();
    const price = page.getByTestId('price-Tidewater Supply E2E');
    await expect.poll(() => price.isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await price.textContent()).toContain('$1,234.50');
    expect(await page.getByTestId('catalog-specs').textContent()).toContain('MCA 18 A / MOCP 30 A');
    expect(await page.getByTestId('catalog-specs').textContent()).toContain('3/8 in');
    await screenshot(page, 'catalog-detail-phone');
    await page.context().close();
  });

  it('when an admin on a wide screen uploads a file with its own headers, then they map the columns, commit, see the price, and can revert it', async () => {
    const page = await openPage(browser, 'wide');
    await signIn(page, account('admin'));
    await page.goto('/admin/imports');
    await page.getByTestId('import-kind-prices').click();
    await page.getByTestId('import-distributor').fill('Lanternfield Parts E2E');
    await chooseFile(page, 'lanternfield.csv', ODD_PRICE_CSV);
    await page.getByTestId('import-upload').click();

    await expect.poll(() => page.getByTestId('column-mapping').isVisible(), { timeout: 15_000 }).toBe(true);
    for (const [column, field] of [
      ['Part Code', 'model'],
      ['Net Cost', 'price'],
      ['Starts', 'effective_from'],
    ]) {
      await page.getByTestId(`map-${column}-${field}`).click();
    }
    await screenshot(page, 'imports-mapping-wide');
    await page.getByTestId('mapping-retry').click();
    await expect.poll(() => page.getByTestId('import-preview').isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await page.getByTestId('import-counts-rejected').textContent()).toContain('0');
    await page.getByTestId('import-commit').click();
    await expect.poll(() => page.getByTestId('import-committed').isVisible(), { timeout: 15_000 }).toBe(true);
    await screenshot(page, 'imports-committed-wide');

    await openCatalogItem(page, UNIT_WIDE);
    const price = page.getByTestId('price-Lanternfield Parts E2E');
    await expect.poll(() => price.isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await price.textContent()).toContain('$2,310.00');
    await screenshot(page, 'catalog-detail-wide');

    await page.getByTestId('nav-catalog').first().click();
    await page.getByTestId('catalog-search').fill('ZQE2E');
    await expect.poll(() => page.getByTestId(`catalog-item-${UNIT_PHONE}`).isVisible(), { timeout: 15_000 }).toBe(true);
    await screenshot(page, 'catalog-list-wide');
    // The refrigerant filter: only the R-32 unit of the two stays (their refrigerants are set in OUTDOOR_CSV).
    await page.getByTestId('catalog-refrigerant-R-32').click();
    await expect.poll(() => page.getByTestId(`catalog-item-${UNIT_PHONE}`).count(), { timeout: 15_000 }).toBe(0);
    expect(await page.getByTestId(`catalog-item-${UNIT_WIDE}`).isVisible()).toBe(true);

    // Revert the mapped import from the history, behind its confirmation.
    await page.goto('/admin/imports');
    const history = page.getByTestId('import-history');
    await expect.poll(() => history.isVisible(), { timeout: 15_000 }).toBe(true);
    await history.locator('[data-testid^="revert-"]').first().click();
    await expect.poll(() => page.getByTestId('revert-confirm').isVisible()).toBe(true);
    await page.waitForTimeout(400); // let the dialog's fade-in finish before the picture
    await screenshot(page, 'imports-revert-wide');
    await page.getByTestId('revert-confirm').click();
    await expect.poll(() => history.textContent(), { timeout: 15_000 }).toContain('Reverted');
    await expect.poll(() => page.getByTestId('revert-confirm').count()).toBe(0);
    await history.scrollIntoViewIfNeeded();
    await screenshot(page, 'imports-history-wide');
    await page.context().close();
  });
});
