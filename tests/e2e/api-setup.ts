import { expect, inject } from 'vitest';
import { account } from './browser';

/** Test data set up through the product's own API (the browser tests' server starts empty). */

export async function adminToken(): Promise<string> {
  const admin = account('admin');
  const res = await fetch(`${inject('baseUrl')}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: admin.email, password: admin.password }),
  });
  return ((await res.json()) as { token: string }).token;
}

/** Imports a catalog CSV in one call (dryRun=false); fails the test unless every row is accepted. */
export async function importCsv(token: string, kind: string, csv: string, fileName = `e2e-${kind}.csv`): Promise<void> {
  const form = new FormData();
  form.append('file', new Blob([csv], { type: 'text/csv' }), fileName);
  form.append('kind', kind);
  form.append('dryRun', 'false');
  const res = await fetch(`${inject('baseUrl')}/api/imports`, { method: 'POST', headers: { Authorization: `Bearer ${token}` }, body: form });
  expect(res.status, await res.clone().text()).toBe(201);
}
