import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { account, launchBrowser, openPage, signIn } from './browser';
import { saveShot } from './shots';

let browser: Browser;
let techToken: string;

async function tokenFor(role: 'tech') {
  const who = account(role);
  const res = await fetch(`${inject('baseUrl')}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: who.email, password: who.password }),
  });
  return ((await res.json()) as { token: string }).token;
}

async function api<T>(method: string, url: string, body?: unknown): Promise<T> {
  const res = await fetch(`${inject('baseUrl')}/api${url}`, {
    method,
    headers: { Authorization: `Bearer ${techToken}`, 'Content-Type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  expect(res.ok, `${method} ${url}: ${res.status}`).toBe(true);
  return (await res.json()) as T;
}

beforeAll(async () => {
  browser = await launchBrowser();
  techToken = await tokenFor('tech');
});
afterAll(async () => {
  await browser?.close();
});

describe('editing a job on a phone (390×844)', () => {
  it('when a tech edits a job with a bad state and e-mail, then plain-word errors show; when fixed, the job and its history hold the change', async () => {
    const job = await api<{ id: number }>('POST', '/jobs', {
      customerName: 'Ines Varga',
      siteAddress: '14 Larkspur Ct',
      state: 'OH',
      contactPhone: '555-0142',
      notes: 'Side gate code on file',
    });
    const page = await openPage(browser, 'phone');
    await signIn(page, account('tech'));
    await page.goto(`/jobs/${job.id}`);
    await page.getByTestId('job-edit-open').click();
    await page.getByTestId('job-state').fill('9Z');
    await page.getByTestId('job-email').fill('not-an-address');
    await page.getByTestId('job-edit-save').click();
    await expect.poll(() => page.getByTestId('job-edit').textContent()).toContain('state must be a two-letter code');
    expect(await page.getByTestId('job-edit').textContent()).toContain('enter a valid e-mail');
    await saveShot(page, 'job-edit-errors-phone');

    await page.getByTestId('job-state').fill('KY');
    await page.getByTestId('job-email').fill('ines.varga@example.test');
    await page.getByTestId('job-address').fill('16 Larkspur Ct');
    await page.getByTestId('job-phone').fill('');
    await page.getByTestId('job-status-closed').click();
    await page.getByTestId('job-edit-save').click();
    await expect.poll(() => page.getByTestId('job-edit').count()).toBe(0);
    await expect.poll(() => page.getByTestId('job-contact').textContent()).toContain('E-mail: ines.varga@example.test');
    expect(await page.getByTestId('job-contact').textContent()).toContain('No phone given.');
    await saveShot(page, 'job-edit-saved-phone');

    // The server holds the change, and the history names who changed which fields.
    const saved = await api<{
      state: string;
      siteAddress: string;
      contactEmail: string | null;
      contactPhone: string | null;
      status: string;
      notes: string | null;
      history: { by: { name: string } | null; changes: { field: string; from: unknown; to: unknown }[] }[];
    }>('GET', `/jobs/${job.id}`);
    expect(saved).toMatchObject({ state: 'KY', siteAddress: '16 Larkspur Ct', contactEmail: 'ines.varga@example.test', contactPhone: null, status: 'closed' });
    expect(saved.notes).toBe('Side gate code on file');
    const last = saved.history.at(-1)!;
    expect(last.by?.name).toBe(account('tech').name);
    expect(last.changes.map((c) => c.field).sort()).toEqual(['contactEmail', 'contactPhone', 'siteAddress', 'state', 'status']);
    expect(last.changes.find((c) => c.field === 'contactPhone')).toMatchObject({ from: '555-0142', to: null });
  });
});
