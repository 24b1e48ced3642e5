import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const tables = async () =>
  ((await t.ctx.dataSource.query("SELECT name FROM sqlite_master WHERE type = 'table'")) as { name: string }[]).map((r) => r.name);
const outboxColumns = async () =>
  (await t.ctx.dataSource.query('PRAGMA table_info(outbound_emails)')) as { name: string; notnull: number }[];

describe('migration 1765200000000 (job options)', () => {
  it('when it is undone and run again, then its tables and the outbox columns come and go cleanly', async () => {
    expect(await tables()).toEqual(expect.arrayContaining(['job_options', 'shop_settings']));
    expect((await outboxColumns()).find((c) => c.name === 'systemId')?.notnull).toBe(0);
    await t.ctx.dataSource.undoLastMigration({ transaction: 'all' });
    expect(await tables()).not.toContain('job_options');
    expect((await outboxColumns()).map((c) => c.name)).not.toContain('jobId');
    expect((await outboxColumns()).find((c) => c.name === 'systemId')?.notnull).toBe(1);
    await t.ctx.dataSource.runMigrations({ transaction: 'all' });
    expect(await tables()).toEqual(expect.arrayContaining(['job_options', 'shop_settings']));
    expect((await outboxColumns()).map((c) => c.name)).toContain('jobId');
  });
});
