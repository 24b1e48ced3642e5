import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { adminToken, importCsv } from './api-setup';
import { account, launchBrowser, openPage, screenshot, signIn } from './browser';

// An invented outdoor unit unique to this file: R-454B with its own 12 °F target subcooling.
const UNIT = 'E2RD-AC30-454';
const UNIT_CSV = ['model,system_type,refrigerant,nominal_tons,metering_required,target_subcooling_f', `${UNIT},ac,R-454B,2.5,txv,12`].join(
  '\n',
);

/** The number shown in a test id's text ("10.0 °F", "−2.3 °F"); NaN when it shows a dash. */
async function shown(page: Page, testId: string): Promise<number> {
  const text = (await page.getByTestId(testId).first().textContent()) ?? '';
  const match = /[−-]?\d+(\.\d+)?/.exec(text);
  return match ? Number(match[0].replace('−', '-')) : Number.NaN;
}

const near = (page: Page, testId: string) => expect.poll(() => shown(page, testId), { timeout: 10_000 });
const verdict = (page: Page) => expect.poll(() => page.getByTestId('reading-verdict').textContent(), { timeout: 10_000 });

async function openReadings(page: Page): Promise<void> {
  await signIn(page, account('tech'));
  await page.getByTestId('nav-readings').first().click();
  await expect.poll(() => page.url(), { timeout: 15_000 }).toContain('/readings');
  await expect.poll(() => page.getByTestId('reading-verdict').textContent(), { timeout: 15_000 }).toBe('Waiting for readings');
}

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  await importCsv(await adminToken(), 'outdoor-units', UNIT_CSV);
});
afterAll(async () => {
  await browser?.close();
});

// Check values: R-410A dew 118.4 psig at 40 °F and bubble 318.5 psig at 100 °F — CoolProp 8.0.0,
// Lemmon 2003 EOS (values.json PT-02); tolerance 1 °F. Superheat and subcooling from their definitions (DESIGN §4).
describe('the Readings screen on a phone (390×844)', () => {
  it('when a tech types the readings field by field, then superheat, subcooling and the verdict follow each one; with the network cut they still do', async () => {
    const page = await openPage(browser, 'phone');
    await openReadings(page);
    await page.getByTestId('refrigerant-R-410A').click();
    await page.getByTestId('metering-txv').click();

    // Typed key by key: the dew point follows every keystroke.
    await page.getByTestId('reading-suctionPsig').pressSequentially('118.4');
    await near(page, 'suction-sat').toBeGreaterThan(39);
    expect(await shown(page, 'suction-sat')).toBeLessThan(41);
    expect(await shown(page, 'superheat')).toBeNaN();

    await page.getByTestId('reading-suctionLineF').fill('50');
    // 50 − 40 = 10 °F superheat
    await near(page, 'superheat').toBeGreaterThan(9);
    expect(await shown(page, 'superheat')).toBeLessThan(11);
    expect(await shown(page, 'strip-superheat')).toBeCloseTo(await shown(page, 'superheat'), 5);
    expect(await shown(page, 'subcooling')).toBeNaN();
    await verdict(page).toBe('Waiting for readings');

    await page.getByTestId('reading-liquidPsig').fill('318.5');
    await near(page, 'liquid-sat').toBeGreaterThan(99);
    await page.getByTestId('reading-liquidLineF').fill('90');
    // 100 − 90 = 10 °F subcooling
    await near(page, 'subcooling').toBeGreaterThan(9);
    expect(await shown(page, 'subcooling')).toBeLessThan(11);
    await verdict(page).toBe('Waiting for readings');
    expect(await page.getByTestId('reading-advice').textContent()).toContain('outdoor dry bulb');

    await page.getByTestId('reading-outdoorDbF').fill('95');
    // 10 °F against the shop's default 10 °F target ± 3 °F (shared defaults, common practice, no source)
    await verdict(page).toBe('On target');
    await page.getByTestId('reading-liquidLineF').fill('96');
    // 100 − 96 = 4 °F: short of the 10 °F target by more than the 3 °F margin
    await verdict(page).toBe('Off target');
    await near(page, 'subcooling').toBeLessThan(5);
    await page.getByTestId('readings-result').scrollIntoViewIfNeeded();
    await screenshot(page, 'readings-phone-online');

    // No signal: the same shared code keeps answering on the device, with no reload.
    await page.context().setOffline(true);
    await page.getByTestId('reading-liquidLineF').fill('');
    await near(page, 'subcooling').toBeNaN();
    await verdict(page).toBe('Waiting for readings');
    await page.getByTestId('reading-liquidLineF').pressSequentially('91');
    // 100 − 91 = 9 °F: within 10 ± 3 °F
    await verdict(page).toBe('On target');
    await near(page, 'subcooling').toBeGreaterThan(8);

    // A fixed orifice at 67 °F WB / 95 °F DB wants (3 × 67 − 80 − 95) / 2 = 13 °F superheat (values.json CM-05).
    await page.getByTestId('metering-piston').click();
    // A fixed orifice needs the indoor wet bulb before it can be judged.
    await verdict(page).toBe('Waiting for readings');
    await page.getByTestId('reading-indoorWbF').fill('67');
    await page.getByTestId('reading-suctionLineF').fill('62');
    // 62 − 40 = 22 °F against 13 ± 5 °F (shop default margin, common practice, no source)
    await verdict(page).toBe('Off target');
    await page.getByTestId('reading-suctionLineF').fill('53');
    await near(page, 'superheat').toBeGreaterThan(12);
    await verdict(page).toBe('On target');

    // The P–T lookup, also offline: 118.4 psig → dew about 40 °F.
    await page.getByTestId('pt-psig').fill('118.4');
    await expect.poll(() => page.getByTestId('pt-psig-answer').textContent()).toMatch(/Dew (39|40)\.\d °F/);
    await page.getByTestId('pt-temp').fill('200');
    await expect.poll(() => page.getByText(/critical/i).count()).toBeGreaterThan(0);
    await page.getByTestId('pt-lookup').scrollIntoViewIfNeeded();
    await screenshot(page, 'readings-phone-offline');
    await expect.poll(() => page.getByTestId('safety-note').textContent()).toContain('Section 608');

    // Evacuation, still offline: 450 microns, 800 after the 10-minute hold passes the shop's 500 / 1,000 limits
    // (values.json EV-01, common practice); a 20 psi drop over the nitrogen hold fails.
    await page.getByTestId('evac-finalMicrons').fill('450');
    await page.getByTestId('evac-decayMicrons').fill('800');
    await page.getByTestId('evac-decayHoldMinutes').fill('10');
    await expect.poll(() => page.getByTestId('evacuation-verdict-word').textContent()).toBe('Passed');
    await page.getByTestId('evac-testPsig').fill('300');
    await page.getByTestId('evac-nitrogenHoldMinutes').fill('30');
    await page.getByTestId('evac-dropPsig').fill('20');
    await expect.poll(() => page.getByTestId('pressure-test-verdict-word').textContent()).toBe('Failed');
    await page.getByTestId('evacuation-verdict').scrollIntoViewIfNeeded();
    await screenshot(page, 'readings-phone-evacuation');
    await page.context().close();
  });
});

describe('the Readings screen on a wide screen (1440×900)', () => {
  it('when readings are typed, then the form and the answer sit side by side', async () => {
    const page = await openPage(browser, 'wide');
    await openReadings(page);
    await page.getByTestId('metering-txv').click();
    await page.getByTestId('reading-suctionPsig').fill('118.4');
    await page.getByTestId('reading-suctionLineF').fill('52');
    await page.getByTestId('reading-liquidPsig').fill('318.5');
    await page.getByTestId('reading-liquidLineF').fill('89');
    await page.getByTestId('reading-outdoorDbF').fill('92');
    await verdict(page).toBe('On target');
    const form = await page.getByTestId('reading-suctionPsig').boundingBox();
    const answer = await page.getByTestId('readings-result').boundingBox();
    expect(answer && form && answer.x > form.x + form.width).toBe(true);
    await screenshot(page, 'readings-wide');

    // The refrigerant and target subcooling can come from a catalog outdoor unit.
    await page.getByTestId('readings-pick-unit').click();
    await page.getByTestId('outdoor-search').fill(UNIT);
    await page.getByTestId(`outdoor-result-${UNIT}`).click({ timeout: 15_000 });
    await expect.poll(() => page.getByTestId('readings-unit').textContent()).toContain(UNIT);
    expect(await page.getByTestId('reading-targetSubcoolingF').inputValue()).toBe('12');
    await expect.poll(() => page.getByTestId('pt-lookup').textContent()).toContain('R-454B');
    await page.context().close();
  });
});
