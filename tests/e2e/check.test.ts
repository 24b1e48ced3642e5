import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { account, launchBrowser, openPage, screenshot, signIn, type ViewportName } from './browser';
import { adminToken, importCsv } from './api-setup';

// Invented models unique to this file. The heat pump runs R-410A; the kept coil's factory TXV is set
// for R-22, which does not meter R-410A (common practice: a metering device rated for the system's refrigerant).
const OUTDOOR = 'E2CK-HP36-410';
const COIL = 'E2CK-COIL-R22';
const OUTDOOR_CSV = ['model,system_type,refrigerant,nominal_tons,metering_required,mca_amps,mocp_amps', `${OUTDOOR},heat-pump,R-410A,3,txv,21.2,35`].join('\n');
const COIL_CSV = ['model,min_tons,max_tons,refrigerants,metering_type,metering_refrigerant,metering_bidirectional', `${COIL},2.5,3.5,R-22,txv,R-22,yes`].join('\n');



async function pick(page: Page, slot: string, model: string) {
  await page.getByTestId(`${slot}-search`).fill(model);
  await page.getByTestId(`${slot}-result-${model}`).click({ timeout: 15_000 });
  await expect.poll(() => page.getByTestId(`${slot}-picked`).textContent()).toContain(model);
}

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  const token = await adminToken();
  await importCsv(token, 'outdoor-units', OUTDOOR_CSV);
  await importCsv(token, 'indoor-coils', COIL_CSV);
});
afterAll(async () => {
  await browser?.close();
});

describe.each(['phone', 'wide'] as ViewportName[])('the driveway check at the %s viewport', (viewport) => {
  it('when a tech checks an R-410A heat pump on a kept coil with an R-22 TXV, then a blocker explains the fix; with the network cut, the device computes it and says so', async () => {
    const page = await openPage(browser, viewport);
    await signIn(page, account('tech'));
    // Check is the tech's first section.
    await expect.poll(() => page.url(), { timeout: 15_000 }).toContain('/check');
    await screenshot(page, `check-empty-${viewport}`);

    await pick(page, 'outdoor', OUTDOOR);
    await pick(page, 'indoorCoil', COIL);
    await page.getByTestId('indoorCoil-kept').click();
    await page.getByTestId('scope-component-replacement').click();
    await page.getByTestId('run-check').click();

    await expect.poll(() => page.getByTestId('verdict-word').textContent(), { timeout: 15_000 }).toBe('Not compatible');
    expect(await page.getByTestId('offline-note').count()).toBe(0);
    await expect.poll(() => page.getByTestId('group-blocker').textContent()).toContain('Blockers');
    await page.getByTestId('finding-refrigerant.metering-device').click();
    const fix = page.getByTestId('finding-fix-refrigerant.metering-device');
    await expect.poll(() => fix.textContent()).toContain('R-410A');
    await expect.poll(() => page.getByTestId('safety-note').textContent()).toContain('Safety');
    await fix.scrollIntoViewIfNeeded();
    await screenshot(page, `check-blocker-${viewport}`);

    // No connection: the request fails as the network would, and the shared engine runs on the device.
    await page.route('**/api/checks', (route) => route.abort('internetdisconnected'));
    await page.getByTestId('run-check').click();
    await expect.poll(() => page.getByTestId('offline-note').textContent(), { timeout: 15_000 }).toContain('Computed on this device — no connection');
    expect(await page.getByTestId('verdict-word').textContent()).toBe('Not compatible');
    expect(await page.getByTestId('finding-refrigerant.metering-device').count()).toBe(1);
    await page.getByTestId('offline-note').scrollIntoViewIfNeeded();
    await screenshot(page, `check-offline-${viewport}`);

    // The nameplate form for a part in no catalog starts empty (no size or refrigerant preset), the model first.
    await page.getByTestId('outdoor-mode-typed').click();
    await expect.poll(() => page.getByTestId('outdoor-field-model').isVisible()).toBe(true);
    expect(await page.getByTestId('outdoor-field-nominalTons').inputValue()).toBe('');
    expect(await page.getByTestId('outdoor-field-refrigerant').locator('[aria-pressed="true"]').count()).toBe(0);
    await page.getByTestId('part-outdoor').scrollIntoViewIfNeeded();
    await screenshot(page, `check-nameplate-${viewport}`);
    await page.context().close();
  });
});
