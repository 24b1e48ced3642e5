import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { startLocalMailService } from '../../server/mail/local-mail-service';
// @ts-expect-error plain ESM script without types
import { buildWeb } from '../../scripts/build-web.mjs';

/**
 * Browser tests: build the web export once per run (skipped when sources are unchanged), start the
 * real server on a free loopback port with a temp database and no demo data, and create one account
 * per role through the product's own commands and API.
 */

export interface E2eAccount {
  email: string;
  password: string;
  name: string;
  role: 'tech' | 'estimator' | 'admin';
}

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    accounts: Record<'tech' | 'estimator' | 'admin', E2eAccount>;
    /** Where the local mail service keeps each message the server sends (.eml files). */
    mailDir: string;
  }
}

const root = path.resolve(__dirname, '../..');
const PASSWORD = 'e2e-password-1';
const ACCOUNTS: Record<'tech' | 'estimator' | 'admin', E2eAccount> = {
  admin: { email: 'e2e-admin@example.test', password: PASSWORD, name: 'Avery Admin', role: 'admin' },
  tech: { email: 'e2e-tech@example.test', password: PASSWORD, name: 'Toni Tech', role: 'tech' },
  estimator: { email: 'e2e-estimator@example.test', password: PASSWORD, name: 'Eli Estimator', role: 'estimator' },
};

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.listen(0, '127.0.0.1', () => {
      const address = srv.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      srv.close(() => resolve(port));
    });
    srv.on('error', reject);
  });
}

async function waitForHealth(url: string, child: ChildProcess): Promise<void> {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`server exited with code ${child.exitCode}`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error('server did not become healthy in 60 s');
}

async function api(url: string, pathname: string, body: unknown, token?: string): Promise<{ token: string }> {
  const res = await fetch(`${url}/api${pathname}`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
    body: JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${pathname} answered ${res.status}: ${await res.text()}`);
  return (await res.json()) as { token: string };
}

export default async function setup(project: TestProject) {
  buildWeb();
  const dir = mkdtempSync(path.join(os.tmpdir(), 'tandem-e2e-'));
  const port = await freePort();
  // Report e-mails go to a local mail service on a free loopback port, as demo mode does.
  const mail = await startLocalMailService({ dataDir: dir, port: 0 });
  const env = {
    ...process.env,
    PORT: String(port),
    DATABASE_PATH: path.join(dir, 'e2e.sqlite'),
    TANDEM_DATA_DIR: dir,
    TANDEM_DEMO: '0',
    TANDEM_LOG_LEVEL: 'warn',
    TANDEM_SIGNIN_LIMIT: '1000',
    TSX_TSCONFIG_PATH: path.join(root, 'server/tsconfig.json'),
    SMTP_HOST: mail.smtp.host,
    SMTP_PORT: String(mail.smtp.port),
    SMTP_TLS: 'none',
  };
  const admin = ACCOUNTS.admin;
  const created = spawnSync(
    process.execPath,
    ['--import', 'tsx', 'server/tasks/create-admin.ts', '--email', admin.email, '--name', admin.name, '--password', admin.password],
    { cwd: root, env, encoding: 'utf8' },
  );
  if (created.status !== 0) throw new Error(`create-admin failed: ${created.stderr}`);

  const server = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], { cwd: root, env, stdio: ['ignore', 'inherit', 'inherit'] });
  const baseUrl = `http://127.0.0.1:${port}`;
  await waitForHealth(baseUrl, server);
  const { token } = await api(baseUrl, '/auth/sign-in', { email: admin.email, password: admin.password });
  for (const account of [ACCOUNTS.tech, ACCOUNTS.estimator]) {
    await api(baseUrl, '/users', { email: account.email, name: account.name, role: account.role, password: account.password }, token);
  }

  project.provide('baseUrl', baseUrl);
  project.provide('accounts', ACCOUNTS);
  project.provide('mailDir', mail.dir);

  return async () => {
    server.kill('SIGTERM');
    await new Promise((r) => server.once('exit', r));
    await mail.close();
    rmSync(dir, { recursive: true, force: true });
  };
}
