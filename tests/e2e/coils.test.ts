import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { account, launchBrowser, openPage, screenshot, signIn, type ViewportName } from './browser';
import { adminToken, importCsv } from './api-setup';

// Invented models unique to this file. A 3-ton R-410A heat pump and a kept 1200 CFM air handler
// (400 CFM/ton, inside the common 350–450 band: common practice, no source).
const OUTDOOR = 'E2CO-HP36';
const HANDLER = 'E2CO-AH36';
// Constructed so that: E2CO-FIT covers 3 tons for R-410A with a bidirectional TXV (passes);
// E2CO-SMALL's range stops at 2 tons (capacity range blocker); E2CO-A2L lists only R-454B (listing blocker).
const COILS_CSV = [
  'model,brand,description,configuration,cased,material,min_tons,max_tons,refrigerants,metering_type,metering_refrigerant,metering_bidirectional,width_in',
  'E2CO-FIT,Fieldstone,cased multi-position coil,multi-position,yes,aluminum,2.5,3.5,R-410A,txv,R-410A,yes,17.5',
  'E2CO-SMALL,Fieldstone,small coil,upflow,yes,aluminum,1.5,2,R-410A,txv,R-410A,yes,14',
  'E2CO-A2L,Fieldstone,A2L coil,upflow,yes,aluminum,2.5,3.5,R-454B,txv,R-454B,yes,17.5',
].join('\n');

async function importPrices(token: string, distributor: string, csv: string) {
  const form = new FormData();
  form.append('file', new Blob([csv], { type: 'text/csv' }), 'e2e-coil-prices.csv');
  form.append('kind', 'prices');
  form.append('distributor', distributor);
  form.append('dryRun', 'false');
  const res = await fetch(`${inject('baseUrl')}/api/imports`, { method: 'POST', headers: { Authorization: `Bearer ${token}` }, body: form });
  expect(res.status, await res.clone().text()).toBe(201);
}

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  const token = await adminToken();
  await importCsv(token, 'outdoor-units', `model,system_type,refrigerant,nominal_tons,metering_required\n${OUTDOOR},heat-pump,R-410A,3,txv`);
  await importCsv(token, 'air-handlers', `model,kind,min_tons,max_tons,airflow_cfm,refrigerants\n${HANDLER},air-handler,2,4,1200,R-410A`);
  await importCsv(token, 'indoor-coils', COILS_CSV);
  await importCsv(token, 'rated-combinations', `outdoor_model,indoor_model,seer2,eer2,hspf2,reference\n${OUTDOOR},E2CO-FIT,15.2,12.1,7.8,E2CO-REF`);
  await importPrices(token, 'Coastline Supply', 'model,price,effective_from\nE2CO-FIT,612.40,2025-01-02');
});
afterAll(async () => {
  await browser?.close();
});

describe.each(['phone', 'wide'] as ViewportName[])('Replacement coils at the %s viewport', (viewport) => {
  it('when an estimator picks a heat pump and the kept air handler, then the compatible coil is listed with rating and price, and the others only when asked', async () => {
    const page = await openPage(browser, viewport);
    await signIn(page, account('estimator'));
    await page.goto('/coils');
    await expect.poll(() => page.getByRole('heading', { name: 'Replacement coils' }).count(), { timeout: 15_000 }).toBe(1);

    for (const [slot, model] of [['outdoor', OUTDOOR], ['airHandler', HANDLER]] as const) {
      await page.getByTestId(`${slot}-search`).fill(model);
      await page.getByTestId(`${slot}-result-${model}`).click({ timeout: 15_000 });
      await expect.poll(() => page.getByTestId(`${slot}-picked`).textContent()).toContain(model);
    }

    const fit = page.getByTestId('coil-row-E2CO-FIT');
    await expect.poll(() => fit.count(), { timeout: 15_000 }).toBe(1);
    // Price as imported above; rating as in the rated-combinations file.
    await expect.poll(() => fit.textContent()).toContain('$612.40');
    expect(await fit.textContent()).toContain('SEER2 15.2');
    expect(await fit.textContent()).toContain('Compatible');
    expect(await page.getByTestId('coil-row-E2CO-SMALL').count()).toBe(0);
    expect(await page.getByTestId('coil-row-E2CO-A2L').count()).toBe(0);
    const box = await fit.boundingBox();
    expect(box!.height).toBeGreaterThanOrEqual(48);
    await screenshot(page, `coils-list-${viewport}`);
    // The screen's title is the h1; its own sections are level 2 (the shared Safety block is outside this screen's files).
    expect(await page.getByRole('heading', { level: 1, name: 'Replacement coils' }).count()).toBe(1);
    expect(await page.getByRole('heading', { level: 2, name: 'Coils', exact: true }).count()).toBe(1);

    await fit.click();
    const detail = page.getByTestId('coil-detail-E2CO-FIT');
    await expect.poll(() => detail.textContent()).toContain('Coastline Supply');
    expect(await detail.textContent()).toContain('HSPF2 7.8');
    await screenshot(page, `coils-detail-${viewport}`);

    // Fuzzy search: a missing dash and lower case still find it, and the coils whose models are unlike it
    // drop out (other test files add their own compatible coils to the shared catalog, so no exact count).
    await page.getByTestId('coils-search').fill('e2cofit');
    const rowIds = () => page.locator('[data-testid^="coil-row-"]').evaluateAll((rows) => rows.map((r) => r.getAttribute('data-testid') ?? ''));
    // E2CO-FIT stays; a compatible coil unlike the query (another file's E2OP-ALT, when present) drops out.
    await expect
      .poll(async () => {
        const ids = await rowIds();
        return ids.includes('coil-row-E2CO-FIT') && !ids.some((id) => id.startsWith('coil-row-E2OP-ALT'));
      }, { timeout: 15_000 })
      .toBe(true);
    await page.getByTestId('coils-search').fill('');

    await page.getByTestId('coils-toggles-incompatible').click();
    await expect.poll(() => page.getByTestId('coil-row-E2CO-SMALL').count(), { timeout: 15_000 }).toBe(1);
    expect(await page.getByTestId('coil-row-E2CO-SMALL').textContent()).toContain('Not compatible');
    await screenshot(page, `coils-incompatible-${viewport}`);
    await page.close();
  });
});
