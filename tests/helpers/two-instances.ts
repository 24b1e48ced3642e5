import type { Express } from 'express';
import pino from 'pino';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll } from 'vitest';
import { createApp } from '../../server/app';
import { openDatabase } from '../../server/db/data-source';
import { databaseTarget } from '../../server/env';
import { createTestApp, type TestApp } from './test-app';

export interface TwoInstances {
  /** Instance A: a test app (users, tokens, its own database). */
  a: TestApp;
  /** Instance B: a second app on A's database with its own data source, sharing only the database and the JWT secret. */
  b: Express;
  bSource: DataSource;
}

/**
 * Two server instances on one database, as two processes behind a load balancer would run: B has its
 * own connection (SQLite: a second connection to the same file; PostgreSQL: its own pool and LISTEN
 * connection), in-memory caches and rate limits. Registers beforeAll/afterAll; read the fields in tests.
 */
export function twoInstances(): TwoInstances {
  const both = {} as TwoInstances;
  beforeAll(async () => {
    both.a = await createTestApp();
    both.bSource = await openDatabase(databaseTarget(both.a.ctx.config));
    both.b = createApp({ dataSource: both.bSource, config: both.a.ctx.config, logger: pino({ level: 'silent' }) });
  });
  afterAll(async () => {
    await both.bSource?.destroy();
    await both.a?.close();
  });
  return both;
}
