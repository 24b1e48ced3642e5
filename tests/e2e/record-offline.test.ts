import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { adminToken, importCsv } from './api-setup';
import { account, launchBrowser, openPage, signIn } from './browser';
import { SERVICE_WORKER_ACTIVE } from './page-timing';
import { saveShot } from './shots';

// Invented models unique to this file: an R-410A air conditioner and a coil rated for it with a TXV.
const OUTDOOR = 'OFL-AC30-410';
const COIL = 'OFL-COIL-30';
const OUTDOOR_CSV = ['model,system_type,refrigerant,nominal_tons,metering_required,mca_amps,mocp_amps', `${OUTDOOR},ac,R-410A,2.5,txv,16.1,25`].join('\n');
const COIL_CSV = ['model,min_tons,max_tons,refrigerants,metering_type,metering_refrigerant', `${COIL},2,3,R-410A,txv,R-410A`].join('\n');

interface Record {
  id: number;
  latestRevision: number;
  serials: { outdoor?: string; indoorCoil?: string };
  checklist: { id: string; state: string }[];
  readings: { label: string | null; results: { evacuation?: { passed: boolean | null } } }[];
}

let browser: Browser;
let techToken: string;
let parts: { outdoorId: number; coilId: number };

async function api<T>(method: string, url: string, body?: unknown): Promise<T> {
  const res = await fetch(`${inject('baseUrl')}/api${url}`, {
    method,
    headers: { Authorization: `Bearer ${techToken}`, 'Content-Type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  expect(res.ok, `${method} ${url}: ${res.status} ${await res.clone().text()}`).toBe(true);
  return (await res.json()) as T;
}

/** A job with a draft record on it (revision 1), made through the API. */
async function newRecord(customerName: string): Promise<Record> {
  const job = await api<{ id: number }>('POST', '/jobs', { customerName, siteAddress: '3 Quarry Ln', state: 'PA' });
  return api<Record>('POST', `/jobs/${job.id}/systems`, {
    scope: 'component-replacement',
    site: { state: 'PA', indoorLocation: 'basement' },
    outdoor: { id: parts.outdoorId },
    indoorCoil: { id: parts.coilId },
    serials: { outdoor: 'OFL-SN-0001' },
  });
}

async function openRecord(page: Page, id: number) {
  await page.goto(`/jobs/systems/${id}`);
  await expect.poll(() => page.getByTestId('serial-outdoor').count(), { timeout: 20_000 }).toBe(1);
}

/** The app has seen the signal go (its banner is up): a save made now is queued, never sent half-online. */
async function appKnowsItIsOffline(page: Page) {
  await expect.poll(() => page.getByTestId('connection-banner').count(), { timeout: 15_000 }).toBe(1);
}

const waitingText = (page: Page) => page.getByTestId('record-waiting-count').textContent();

beforeAll(async () => {
  browser = await launchBrowser();
  const admin = await adminToken();
  await importCsv(admin, 'outdoor-units', OUTDOOR_CSV, 'e2e-offline-outdoor.csv');
  await importCsv(admin, 'indoor-coils', COIL_CSV, 'e2e-offline-coils.csv');
  const tech = account('tech');
  const signedIn = await fetch(`${inject('baseUrl')}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: tech.email, password: tech.password }),
  });
  techToken = ((await signedIn.json()) as { token: string }).token;
  const find = async (kind: string, model: string) =>
    (await api<{ items: { id: number; model: string }[] }>('GET', `/catalog/${kind}?q=${model}`)).items.find((i) => i.model === model)!.id;
  parts = { outdoorId: await find('outdoor-units', OUTDOOR), coilId: await find('indoor-coils', COIL) };
});
afterAll(async () => {
  await browser?.close();
});

describe('a record edited with no signal, on a phone (390×844)', () => {
  it('when serials, a checklist item and a reading are saved offline, then they wait on the phone through a reload and land when the signal returns', async () => {
    const made = await newRecord('Wren Halloway');
    const item = made.checklist[0].id;
    const page = await openPage(browser, 'phone');
    await signIn(page, account('tech'));
    await openRecord(page, made.id);
    // One visit with a signal: the service worker holds the app, and the record reaches the kept cache.
    expect(await page.evaluate<boolean>(SERVICE_WORKER_ACTIVE)).toBe(true);
    await expect.poll(() => page.evaluate<string>("localStorage.getItem('tandem-query-cache') ?? ''"), { timeout: 10_000 }).toContain('OFL-SN-0001');

    await page.context().setOffline(true);
    await appKnowsItIsOffline(page);
    await page.getByTestId('serial-outdoor').fill('OFL-SN-0099');
    await page.getByTestId('serial-indoorCoil').fill('OFL-SN-0100');
    await page.getByTestId('serials-save').click();
    await expect.poll(() => waitingText(page)).toContain('1 change waiting for signal');
    await page.getByTestId(`checklist-${item}-state-done`).click();
    await expect.poll(() => waitingText(page)).toContain('2 changes waiting for signal');
    await expect.poll(() => page.getByTestId(`checklist-state-${item}`).textContent()).toBe('Done');
    await page.getByTestId('reading-add').click();
    // 450 microns: under the common 500-micron evacuation target (common practice, no source).
    await page.getByTestId('evac-finalMicrons').fill('450');
    await page.getByTestId('reading-save').click();
    await expect.poll(() => waitingText(page)).toContain('3 changes waiting for signal');
    await expect.poll(() => page.getByTestId('reading-kept').count()).toBe(1);
    await page.getByTestId('record-waiting').scrollIntoViewIfNeeded();
    await saveShot(page, 'record-offline-waiting-phone');

    // A reload with no signal: the record opens from the phone and the changes still wait.
    await page.reload();
    await expect.poll(() => page.getByTestId('serial-outdoor').count(), { timeout: 30_000 }).toBe(1);
    await expect.poll(() => waitingText(page)).toContain('3 changes waiting for signal');
    expect(await page.getByTestId('serial-outdoor').inputValue()).toBe('OFL-SN-0099');
    expect(await page.getByTestId(`checklist-state-${item}`).textContent()).toBe('Done');
    // Nothing reached the server yet.
    expect((await api<Record>('GET', `/systems/${made.id}`)).latestRevision).toBe(1);

    await page.context().setOffline(false);
    await expect.poll(() => page.getByTestId('record-waiting').count(), { timeout: 30_000 }).toBe(0);
    const synced = await api<Record>('GET', `/systems/${made.id}`);
    // The two saves went as one revision from revision 1; the reading joined the record.
    expect(synced.latestRevision).toBe(2);
    expect(synced.serials).toEqual({ outdoor: 'OFL-SN-0099', indoorCoil: 'OFL-SN-0100' });
    expect(synced.checklist.find((c) => c.id === item)?.state).toBe('done');
    expect(synced.readings).toHaveLength(1);
    expect(synced.readings[0].results.evacuation).toBeDefined();
    await expect.poll(() => page.getByTestId('record-status').textContent()).toContain('revision 2');
    await saveShot(page, 'record-offline-synced-phone');
  });

  it('when the record was changed on the server while the phone had no signal, then the waiting change opens the conflict dialog instead of overwriting', async () => {
    const made = await newRecord('Odo Brenner');
    const page = await openPage(browser, 'phone');
    await signIn(page, account('tech'));
    await openRecord(page, made.id);

    await page.context().setOffline(true);
    await appKnowsItIsOffline(page);
    await page.getByTestId('serial-outdoor').fill('OFL-SN-PHONE');
    await page.getByTestId('serials-save').click();
    await expect.poll(() => waitingText(page)).toContain('1 change waiting for signal');
    // Someone else saves revision 2 meanwhile (the test's own request is not cut off).
    await api('PATCH', `/systems/${made.id}`, { revision: 1, serials: { outdoor: 'OFL-SN-OFFICE' } });

    await page.context().setOffline(false);
    await expect.poll(() => page.getByTestId('conflict-dialog').count(), { timeout: 30_000 }).toBe(1);
    const row = await page.getByTestId('conflict-serial-outdoor').textContent();
    expect(row).toContain('Yours: OFL-SN-PHONE');
    expect(row).toContain('Theirs: OFL-SN-OFFICE');
    await saveShot(page, 'record-offline-conflict-phone');
    // Nothing was overwritten while the dialog waits.
    expect((await api<Record>('GET', `/systems/${made.id}`)).serials.outdoor).toBe('OFL-SN-OFFICE');

    await page.getByTestId('conflict-mine').click();
    await expect.poll(async () => (await api<Record>('GET', `/systems/${made.id}`)).latestRevision, { timeout: 30_000 }).toBe(3);
    expect((await api<Record>('GET', `/systems/${made.id}`)).serials.outdoor).toBe('OFL-SN-PHONE');
    await expect.poll(() => page.getByTestId('record-waiting').count()).toBe(0);
  });
});
