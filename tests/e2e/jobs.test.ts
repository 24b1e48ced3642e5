import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { crc32, deflateSync } from 'node:zlib';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { adminToken, importCsv } from './api-setup';
import { account, launchBrowser, openPage, signIn } from './browser';

// Invented models unique to this file: an R-410A air conditioner and a coil rated for it with a TXV.
const OUTDOOR = 'E2JB-AC36-410';
const COIL = 'E2JB-COIL-36';
const OUTDOOR_CSV = ['model,system_type,refrigerant,nominal_tons,metering_required,mca_amps,mocp_amps', `${OUTDOOR},ac,R-410A,3,txv,18.5,30`].join('\n');
const COIL_CSV = ['model,min_tons,max_tons,refrigerants,metering_type,metering_refrigerant', `${COIL},2.5,3.5,R-410A,txv,R-410A`].join('\n');
const CONTACT = 'homeowner-e2e@example.test';
const SHOTS = path.join(os.tmpdir(), 'shots');

/** A valid 4×4 PNG (solid copper colour) built from its chunks, so the server's byte check sees a real image. */
function smallPng(): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
    const len = Buffer.alloc(4);
    len.writeUInt32BE(data.length);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(body));
    return Buffer.concat([len, body, crc]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(4, 0);
  ihdr.writeUInt32BE(4, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 2; // RGB
  const row = Buffer.from([0, ...Array.from({ length: 4 }, () => [184, 115, 51]).flat()]);
  const raw = Buffer.concat(Array.from({ length: 4 }, () => row));
  return Buffer.concat([Buffer.from([137, 80, 78, 71, 13, 10, 26, 10]), chunk('IHDR', ihdr), chunk('IDAT', deflateSync(raw)), chunk('IEND', Buffer.alloc(0))]);
}

async function shot(page: Page, name: string) {
  mkdirSync(SHOTS, { recursive: true });
  await page.screenshot({ path: path.join(SHOTS, `${name}.png`) });
}

async function pick(page: Page, slot: string, model: string) {
  await page.getByTestId(`${slot}-search`).fill(model);
  await page.getByTestId(`${slot}-result-${model}`).click({ timeout: 15_000 });
  await expect.poll(() => page.getByTestId(`${slot}-picked`).textContent()).toContain(model);
}

/** The number shown in a test id's text ("10.0 °F"); NaN when it shows a dash. */
async function shown(page: Page, testId: string): Promise<number> {
  const text = (await page.getByTestId(testId).first().textContent()) ?? '';
  const match = /[−-]?\d+(\.\d+)?/.exec(text);
  return match ? Number(match[0].replace('−', '-')) : Number.NaN;
}

let browser: Browser;
let token: string;
beforeAll(async () => {
  browser = await launchBrowser();
  token = await adminToken();
  await importCsv(token, 'outdoor-units', OUTDOOR_CSV, 'e2e-jobs-outdoor.csv');
  await importCsv(token, 'indoor-coils', COIL_CSV, 'e2e-jobs-coils.csv');
});
afterAll(async () => {
  await browser?.close();
});

describe('closing out an install on a phone (390×844)', () => {
  it('when a tech saves a check to a new job and fills in the record, then serials, photo, readings, checklist, finalize and the e-mailed PDF all land', async () => {
    const page = await openPage(browser, 'phone');
    await signIn(page, account('tech'));
    await expect.poll(() => page.url(), { timeout: 15_000 }).toContain('/check');
    await pick(page, 'outdoor', OUTDOOR);
    await pick(page, 'indoorCoil', COIL);
    // A repair of an existing R-410A system: the 2025 new-system refrigerant limit (AIM Act technology
    // transitions rule, 40 CFR 84 subpart B) does not block it.
    await page.getByTestId('scope-component-replacement').click();
    await page.getByTestId('run-check').click();
    await expect.poll(() => page.getByTestId('verdict-word').textContent(), { timeout: 15_000 }).toMatch(/^Compatible/);

    // Save to a new job: the job's fields are validated beside each field first.
    await page.getByTestId('save-to-job').click();
    await page.getByTestId('save-to-job-new').click();
    await page.getByTestId('job-customer').fill('Robin Example');
    await page.getByTestId('job-address').fill('12 Sample Lane, Springfield');
    await page.getByTestId('job-state').fill('X');
    await page.getByTestId('save-to-job-confirm').click();
    await expect.poll(() => page.getByText('state must be a two-letter code').count()).toBeGreaterThan(0);
    await page.getByTestId('job-state').fill('tx');
    await page.getByTestId('job-email').fill(CONTACT);
    await page.getByTestId('save-to-job-confirm').click();
    await expect.poll(() => page.url(), { timeout: 15_000 }).toMatch(/\/jobs\/systems\/\d+$/);
    const systemId = Number(/systems\/(\d+)$/.exec(page.url())![1]);
    await expect.poll(() => page.getByTestId('record-verdict').textContent(), { timeout: 15_000 }).toContain('Compatible');
    expect(await page.getByTestId('safety-note').textContent()).toContain('Safety');
    await shot(page, 'record-phone-top');

    // Serials, saved with the revision they started from.
    await page.getByTestId('serial-outdoor').fill('SN-E2E-0001');
    await page.getByTestId('serial-indoorCoil').fill('SN-E2E-0002');
    await page.getByTestId('serials-save').click();
    await expect.poll(() => page.getByTestId('record-status').textContent(), { timeout: 15_000 }).toContain('revision 2');

    // A nameplate photo: a real PNG through the hidden file input, shown back through an authenticated fetch.
    await page.getByTestId('photo-nameplate-input').setInputFiles({ name: 'nameplate.png', mimeType: 'image/png', buffer: smallPng() });
    await expect.poll(() => page.getByTestId('photo-added').count(), { timeout: 15_000 }).toBe(1);
    await expect.poll(() => page.locator('[data-testid="photos-card"] img').count(), { timeout: 15_000 }).toBeGreaterThan(0);

    // Readings: R-410A dew 118.4 psig at 40 °F, bubble 318.5 psig at 100 °F — CoolProp 8.0.0, Lemmon 2003 EOS
    // (values.json PT-02). Superheat 50 − 40 = 10 °F and subcooling 100 − 90 = 10 °F by definition (DESIGN §4).
    await page.getByTestId('reading-add').click();
    await page.getByTestId('metering-txv').click();
    await page.getByTestId('reading-suctionPsig').fill('118.4');
    await page.getByTestId('reading-suctionLineF').fill('50');
    await page.getByTestId('reading-liquidPsig').fill('318.5');
    await page.getByTestId('reading-liquidLineF').fill('90');
    await expect.poll(() => shown(page, 'superheat'), { timeout: 10_000 }).toBeGreaterThan(9);
    expect(await shown(page, 'superheat')).toBeLessThan(11);
    expect(await shown(page, 'subcooling')).toBeGreaterThan(9);
    expect(await shown(page, 'subcooling')).toBeLessThan(11);
    await page.getByTestId('reading-outdoorDbF').fill('95');
    await page.getByTestId('readings-result').scrollIntoViewIfNeeded();
    await shot(page, 'record-phone-readings');
    await page.getByTestId('reading-save').click();
    const saved = page.locator('[data-testid^="saved-reading-figures-"]');
    await expect.poll(() => saved.count(), { timeout: 15_000 }).toBe(1);
    expect(await saved.textContent()).toMatch(/Superheat (9|10|11)\.\d °F/);
    expect(await saved.textContent()).toMatch(/Subcooling (9|10|11)\.\d °F/);

    // Checklist: the first item does not apply (with a word why), the last is left open, the rest are done.
    const ids = await page
      .locator('[data-testid^="checklist-state-"]')
      .evaluateAll((els) => els.map((e) => (e.getAttribute('data-testid') ?? '').replace('checklist-state-', '')));
    expect(ids.length).toBeGreaterThan(3);
    await page.getByTestId(`checklist-${ids[0]}-state-not-applicable`).click();
    await page.getByTestId(`checklist-${ids[0]}-why`).fill('Drier fitted at the factory in this unit');
    await page.getByTestId(`checklist-${ids[0]}-why-save`).click();
    await expect.poll(() => page.getByTestId(`checklist-state-${ids[0]}`).textContent(), { timeout: 15_000 }).toBe('Not applicable');
    for (const id of ids.slice(1, -1)) {
      await page.getByTestId(`checklist-${id}-state-done`).click();
      await expect.poll(() => page.getByTestId(`checklist-state-${id}`).textContent(), { timeout: 15_000 }).toBe('Done');
    }
    expect(await page.getByTestId('checklist-open-count').textContent()).toContain('1 of');

    // Finalize with one item open: the reason is asked for.
    await page.getByTestId('record-finalize').click();
    await page.getByTestId('finalize-confirm').click();
    await expect.poll(() => page.getByText('Say why items are left open').count()).toBeGreaterThan(0);
    await page.getByTestId('finalize-reason').fill('Breaker check waits for the electrician');
    await page.getByTestId('finalize-confirm').click();
    await expect.poll(() => page.getByTestId('record-status').textContent(), { timeout: 15_000 }).toContain('Final');

    // Send: the job's contact e-mail is the default; the local mail service receives the PDF.
    await page.getByTestId('record-send').click();
    await expect.poll(() => page.getByTestId('send-to').inputValue()).toBe(CONTACT);
    await page.getByTestId('send-confirm').click();
    await expect.poll(() => page.getByTestId('report-sent').count(), { timeout: 30_000 }).toBe(1);
    const mailDir = inject('mailDir');
    const messages = readdirSync(mailDir).map((f) => readFileSync(path.join(mailDir, f), 'utf8'));
    expect(messages.some((m) => m.includes(CONTACT) && m.includes('application/pdf'))).toBe(true);
    // A second send within the minute asks first.
    await page.getByTestId('record-send').click();
    await page.getByTestId('send-confirm').click();
    await expect.poll(() => page.getByTestId('send-again').count(), { timeout: 15_000 }).toBe(1);
    await page.getByTestId('report-card').scrollIntoViewIfNeeded();
    await shot(page, 'record-phone-send-again');
    await page.getByTestId('send-again').click();
    await expect.poll(() => page.getByTestId('send-dialog').count(), { timeout: 15_000 }).toBe(0);

    // The report as a file, kept for a look with pdftoppm.
    const pdf = await fetch(`${inject('baseUrl')}/api/systems/${systemId}/report.pdf`, { headers: { Authorization: `Bearer ${token}` } });
    expect(pdf.status).toBe(200);
    mkdirSync(SHOTS, { recursive: true });
    writeFileSync(path.join(SHOTS, 'record-report.pdf'), Buffer.from(await pdf.arrayBuffer()));

    // The job lists the record; the same record side by side on a wide screen.
    await page.getByTestId('record-job').click();
    await expect.poll(() => page.getByTestId(`record-${systemId}`).textContent(), { timeout: 15_000 }).toContain('Final');
    await shot(page, 'job-phone');
    const wide = await openPage(browser, 'wide');
    await signIn(wide, account('tech'));
    await wide.goto(`/jobs/systems/${systemId}`);
    await expect.poll(() => wide.getByTestId('record-verdict').textContent(), { timeout: 15_000 }).toContain('Compatible');
    await expect.poll(() => wide.getByTestId('serial-text-outdoor').count()).toBe(0);
    expect(await wide.getByTestId('serial-outdoor').inputValue()).toBe('SN-E2E-0001');
    await shot(wide, 'record-wide');
    await wide.getByTestId('nav-jobs').first().click();
    await wide.getByTestId('jobs-search').fill('Sample Lane');
    await expect.poll(() => wide.getByTestId('jobs-list').textContent(), { timeout: 15_000 }).toContain('Robin Example');
    await shot(wide, 'jobs-wide');
  }, 300_000);
});
