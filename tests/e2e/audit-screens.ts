import type { Page } from 'playwright-core';
import { expect, inject } from 'vitest';
import { account, signIn } from './browser';
import { adminToken, importCsv } from './api-setup';

/**
 * Every screen the accessibility and target-size audits visit, in one list: add a screen here
 * (Readings, Jobs…) and both audits cover it at both viewports.
 * Models here are invented and unique to the audits.
 */

export interface AuditScreen {
  name: string;
  /** Who is signed in; null for the signed-out screens. */
  role: 'tech' | 'estimator' | 'admin' | null;
  /** Brings the page to the state to audit (the page is already signed in as `role`). */
  open(page: Page): Promise<void>;
}

const OUTDOOR = 'AUD-HP36-410';
const COIL = 'AUD-COIL-R22';
// A heat pump on R-410A and a coil whose factory TXV is for R-22: the metering device does not fit
// (common practice: a metering device rated for the system's refrigerant), which gives a blocker,
// and the short form leaves cautions and notes (facts not given).
const OUTDOOR_CSV = [
  'model,system_type,refrigerant,nominal_tons,metering_required,mca_amps,mocp_amps,seer2,eer2,hspf2',
  `${OUTDOOR},heat-pump,R-410A,3,txv,21.2,35,14.3,11.2,7.5`,
].join('\n');
const COIL_CSV = ['model,min_tons,max_tons,refrigerants,metering_type,metering_refrigerant,metering_bidirectional', `${COIL},2.5,3.5,R-22,txv,R-22,yes`].join('\n');
const PREVIEW_CSV = ['model,system_type,refrigerant,nominal_tons', 'AUD-PREVIEW-1,ac,R-454B,2', 'AUD-PREVIEW-2,ac,R-454B,not-a-number'].join('\n');

/** The job, system record and options job the audits open, made through the API by seedAuditData. */
const seeded = { jobId: 0, systemId: 0, optionsJobId: 0 };

async function api<T>(token: string, method: string, url: string, body?: unknown): Promise<T> {
  const res = await fetch(`${inject('baseUrl')}${url}`, {
    method,
    headers: { Authorization: `Bearer ${token}`, ...(body ? { 'Content-Type': 'application/json' } : {}) },
    body: body ? JSON.stringify(body) : undefined,
  });
  const text = await res.text();
  expect(res.ok, `${method} ${url}: ${res.status} ${text}`).toBe(true);
  return JSON.parse(text) as T;
}

async function catalogId(token: string, kind: string, model: string): Promise<number> {
  const list = await api<{ items: { id: number }[] }>(token, 'GET', `/api/catalog/${kind}?q=${encodeURIComponent(model)}`);
  expect(list.items.length, `${kind} ${model} in the catalog`).toBeGreaterThan(0);
  return list.items[0].id;
}

/**
 * Puts the audits' parts in the catalog, and one job with a system record whose report is sent
 * (so the Outbox has a message), and a job with two priced options. Each test file runs it once.
 */
export async function seedAuditData(): Promise<void> {
  const token = await adminToken();
  await importCsv(token, 'outdoor-units', OUTDOOR_CSV, 'audit-outdoor.csv');
  await importCsv(token, 'indoor-coils', COIL_CSV, 'audit-coils.csv');
  const job = await api<{ id: number }>(token, 'POST', '/api/jobs', {
    customerName: 'Audit Example',
    siteAddress: '7 Audit Row, Springfield',
    state: 'TX',
    contactEmail: 'audit-homeowner@example.test',
  });
  const record = await api<{ id: number }>(token, 'POST', `/api/jobs/${job.id}/systems`, {
    scope: 'component-replacement',
    site: { state: 'TX', indoorLocation: 'attic' },
    outdoor: { id: await catalogId(token, 'outdoor-units', OUTDOOR) },
    indoorCoil: { id: await catalogId(token, 'indoor-coils', COIL), kept: true },
    serials: { outdoor: 'AUD-SN-0001' },
  });
  await api(token, 'POST', `/api/systems/${record.id}/send`, { to: 'audit-homeowner@example.test' });
  seeded.jobId = job.id;
  seeded.systemId = record.id;
  const outdoorId = await catalogId(token, 'outdoor-units', OUTDOOR);
  const optionsJob = await api<{ id: number }>(token, 'POST', '/api/jobs', { customerName: 'Audit Household', siteAddress: '3 Audit Way', state: 'GA', contactEmail: 'audit@example.test' });
  seeded.optionsJobId = optionsJob.id;
  for (const [name, cents, hours] of [
    ['Outdoor unit only', 310_000, 6],
    ['Outdoor unit and line set', 310_000, 9],
  ] as const) {
    await api(token, 'POST', `/api/jobs/${optionsJob.id}/options`, {
      name,
      outdoor: { id: outdoorId },
      lines: [{ kind: 'outdoor-unit', model: OUTDOOR, quantity: 1, unitPriceCents: cents }],
      laborHours: hours,
    });
  }
}

async function visible(page: Page, testId: string) {
  await expect.poll(() => page.getByTestId(testId).first().isVisible(), { timeout: 15_000 }).toBe(true);
}

async function pick(page: Page, slot: string, model: string) {
  await page.getByTestId(`${slot}-search`).fill(model);
  await page.getByTestId(`${slot}-result-${model}`).click({ timeout: 15_000 });
  await expect.poll(() => page.getByTestId(`${slot}-picked`).textContent()).toContain(model);
}

export const AUDIT_SCREENS: AuditScreen[] = [
  {
    name: 'sign-in',
    role: null,
    open: async (page) => {
      await page.goto('/sign-in');
      await visible(page, 'sign-in-email');
    },
  },
  {
    name: 'check-empty',
    role: 'tech',
    open: async (page) => {
      await page.goto('/check');
      await visible(page, 'run-check');
    },
  },
  {
    name: 'check-result',
    role: 'tech',
    open: async (page) => {
      await page.goto('/check');
      await pick(page, 'outdoor', OUTDOOR);
      await pick(page, 'indoorCoil', COIL);
      await page.getByTestId('indoorCoil-kept').click();
      await page.getByTestId('scope-component-replacement').click();
      await page.getByTestId('run-check').click();
      await visible(page, 'group-blocker');
      await visible(page, 'group-info');
      // The Safety block opened, and one finding opened to its details.
      const safetyToggle = page.getByTestId('safety-toggle');
      if (await safetyToggle.count()) {
        if ((await safetyToggle.getAttribute('aria-expanded')) !== 'true') await safetyToggle.click();
      }
      await page.getByTestId('finding-refrigerant.metering-device').click();
      await visible(page, 'finding-detail-refrigerant.metering-device');
    },
  },
  {
    name: 'check-nameplate',
    role: 'tech',
    open: async (page) => {
      await page.goto('/check');
      await page.getByTestId('outdoor-mode-typed').click();
      await visible(page, 'outdoor-field-model');
    },
  },
  {
    name: 'catalog-list',
    role: 'estimator',
    open: async (page) => {
      await page.goto('/catalog');
      await page.getByTestId('catalog-search').fill('AUD-');
      await visible(page, `catalog-item-${OUTDOOR}`);
    },
  },
  {
    name: 'catalog-detail',
    role: 'estimator',
    open: async (page) => {
      await page.goto('/catalog');
      await page.getByTestId('catalog-search').fill(OUTDOOR);
      await visible(page, `catalog-item-${OUTDOOR}`);
      await page.getByTestId(`catalog-item-${OUTDOOR}`).first().click();
      await visible(page, 'catalog-specs');
    },
  },
  {
    name: 'account',
    role: 'tech',
    open: async (page) => {
      await page.goto('/account');
      await visible(page, 'account-role');
    },
  },
  {
    name: 'admin-users',
    role: 'admin',
    open: async (page) => {
      await page.goto('/admin/users');
      await visible(page, `user-row-${account('tech').email}`);
    },
  },
  {
    name: 'admin-users-add-dialog',
    role: 'admin',
    open: async (page) => {
      await page.goto('/admin/users');
      await visible(page, 'add-user');
      await page.getByTestId('add-user').click();
      await visible(page, 'add-user-dialog');
    },
  },
  {
    name: 'admin-imports-preview',
    role: 'admin',
    open: async (page) => {
      await page.goto('/admin/imports');
      await visible(page, 'import-pick');
      await page.getByTestId('import-kind-outdoor-units').click();
      const chooser = page.waitForEvent('filechooser');
      await page.getByTestId('import-pick').click();
      await (await chooser).setFiles({ name: 'audit-preview.csv', mimeType: 'text/csv', buffer: Buffer.from(PREVIEW_CSV, 'utf8') });
      await expect.poll(() => page.getByTestId('import-file-name').textContent(), { timeout: 15_000 }).toContain('audit-preview.csv');
      await page.getByTestId('import-upload').click();
      await visible(page, 'import-preview');
    },
  },
  {
    name: 'admin-rules',
    role: 'admin',
    open: async (page) => {
      await page.goto('/admin/rules');
      await visible(page, 'save-rules');
      await visible(page, 'setting-cfmPerTonMin');
    },
  },
  {
    name: 'admin-pricing',
    role: 'admin',
    open: async (page) => {
      await page.goto('/admin/pricing');
      await visible(page, 'save-shop-settings');
      await visible(page, 'rebate-tiers');
    },
  },
  {
    name: 'readings',
    role: 'tech',
    open: async (page) => {
      await page.goto('/readings');
      await visible(page, 'reading-verdict');
      await visible(page, 'chart-card');
    },
  },
  {
    name: 'jobs-list',
    role: 'tech',
    open: async (page) => {
      await page.goto('/jobs');
      await visible(page, 'jobs-list');
      await expect.poll(() => page.getByTestId('jobs-list').textContent(), { timeout: 15_000 }).toContain('Audit Example');
    },
  },
  {
    name: 'job-detail',
    role: 'tech',
    open: async (page) => {
      await page.goto(`/jobs/${seeded.jobId}`);
      await visible(page, `record-${seeded.systemId}`);
    },
  },
  {
    name: 'system-record',
    role: 'tech',
    open: async (page) => {
      await page.goto(`/jobs/systems/${seeded.systemId}`);
      await visible(page, 'record-verdict');
      await visible(page, 'record-status');
    },
  },
  {
    name: 'coils',
    role: 'estimator',
    open: async (page) => {
      await page.goto('/coils');
      await pick(page, 'outdoor', OUTDOOR);
      await visible(page, 'coils-count');
    },
  },
  {
    name: 'admin-outbox',
    role: 'admin',
    open: async (page) => {
      await page.goto('/admin/outbox');
      await visible(page, 'outbox-list');
      await expect.poll(() => page.getByTestId('outbox-list').textContent(), { timeout: 15_000 }).toContain('audit-homeowner@example.test');
    },
  },
  {
    name: 'job-options',
    role: 'estimator',
    open: async (page) => {
      await page.goto(`/jobs/options/${seeded.optionsJobId}`);
      await visible(page, 'option-cards');
      await visible(page, 'option-card-Outdoor unit only');
    },
  },
  {
    name: 'not-found',
    role: 'tech',
    open: async (page) => {
      await page.goto('/no-such-place-here');
      await page.waitForLoadState('networkidle');
      await page.waitForTimeout(500);
    },
  },
];

/** Signs in (or not) for a screen; returns nothing, the page keeps its session in storage. */
export async function signInFor(page: Page, role: AuditScreen['role']): Promise<void> {
  if (role) await signIn(page, account(role));
}
