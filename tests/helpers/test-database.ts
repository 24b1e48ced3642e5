import { createHash, randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { inject } from 'vitest';
import { migrations } from '../../server/db/migrations';
import { openDatabase } from '../../server/db/data-source';

declare module 'vitest' {
  export interface ProvidedContext {
    /** The PostgreSQL server the api-pg project runs against (tests/helpers/postgres-global-setup.ts). */
    postgresUrl: string;
  }
}

/**
 * The PostgreSQL server this test file runs against: the api-pg project's (provided by its global
 * setup), or TANDEM_TEST_DATABASE_URL when a file is run by hand; undefined means SQLite.
 */
export function testPostgresUrl(): string | undefined {
  if (process.env.TANDEM_TEST_ON_SQLITE === '1') return undefined;
  return inject('postgresUrl') || process.env.TANDEM_TEST_DATABASE_URL || undefined;
}

/** True when this run's test apps use PostgreSQL (for tests that are SQLite-only by nature). */
export const onPostgres = testPostgresUrl() !== undefined;

export interface TestDatabase {
  /** What openDatabase takes: a SQLite file path or a PostgreSQL URL. */
  target: string;
  /** A folder for the app's other files (photos, reports); removed with the database. */
  dir: string;
  drop(): Promise<void>;
}

/** A fresh database for one test app: a temp SQLite file, or a new PostgreSQL database from a migrated template. */
export async function createTestDatabase(): Promise<TestDatabase> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'tandem-test-'));
  const url = testPostgresUrl();
  if (!url) return { target: path.join(dir, 'test.sqlite'), dir, drop: async () => rmSync(dir, { recursive: true, force: true }) };
  const name = `tandem_t_${process.pid}_${randomBytes(4).toString('hex')}`;
  await withAdmin(url, async (admin) => {
    const template = await ensureTemplate(admin, url);
    await admin.query(`CREATE DATABASE "${name}" TEMPLATE "${template}"`);
  });
  return {
    target: databaseUrl(url, name),
    dir,
    drop: async () => {
      await withAdmin(url, (admin) => admin.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`));
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

/** The same server with another database name. */
export function databaseUrl(serverUrl: string, database: string): string {
  const url = new URL(serverUrl);
  url.pathname = `/${database}`;
  return url.toString();
}

async function withAdmin<T>(url: string, work: (admin: pg.Client) => Promise<T>): Promise<T> {
  const admin = new pg.Client({ connectionString: url });
  await admin.connect();
  try {
    return await work(admin);
  } finally {
    await admin.end();
  }
}

// A migrated template per set of migrations: copying it (CREATE DATABASE … TEMPLATE) takes a fraction
// of running every migration again for each test app.
const TEMPLATE = `tandem_tpl_${createHash('sha256').update(migrations.map((m) => m.name).join(',')).digest('hex').slice(0, 12)}`;
const TEMPLATE_LOCK = 0x74706c;

async function ensureTemplate(admin: pg.Client, url: string): Promise<string> {
  const exists = async () => (await admin.query('SELECT 1 FROM pg_database WHERE datname = $1', [TEMPLATE])).rowCount === 1;
  if (await exists()) return TEMPLATE;
  // Test files run in parallel workers: one builds the template, the others wait for it.
  await admin.query('SELECT pg_advisory_lock($1)', [TEMPLATE_LOCK]);
  try {
    if (await exists()) return TEMPLATE;
    const building = `${TEMPLATE}_build`;
    await admin.query(`DROP DATABASE IF EXISTS "${building}" WITH (FORCE)`);
    await admin.query(`CREATE DATABASE "${building}"`);
    const dataSource = await openDatabase(databaseUrl(url, building));
    await dataSource.destroy();
    await admin.query(`ALTER DATABASE "${building}" RENAME TO "${TEMPLATE}"`);
    return TEMPLATE;
  } finally {
    await admin.query('SELECT pg_advisory_unlock($1)', [TEMPLATE_LOCK]);
  }
}
