import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { migrations } from '../../../server/db/migrations';
import { JobOptions1765200000000 } from '../../../server/db/migrations/1765200000000-job-options';
import { createTestApp, type TestApp } from '../../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

// Through TypeORM's schema API, so the same test reads SQLite and PostgreSQL alike.
async function schema() {
  const qr = t.ctx.dataSource.createQueryRunner();
  try {
    const outbox = await qr.getTable('outbound_emails');
    return {
      jobOptions: await qr.hasTable('job_options'),
      shopSettings: await qr.hasTable('shop_settings'),
      outboxColumns: outbox?.columns.map((c) => c.name) ?? [],
      systemIdNullable: outbox?.findColumnByName('systemId')?.isNullable,
    };
  } finally {
    await qr.release();
  }
}

describe('migration 1765200000000 (job options)', () => {
  it('when it is undone and run again, then its tables and the outbox columns come and go cleanly', async () => {
    expect(await schema()).toMatchObject({ jobOptions: true, shopSettings: true, systemIdNullable: true });
    expect((await schema()).outboxColumns).toContain('jobId');
    // Undo the later migrations first, then this one.
    const later = migrations.length - 1 - migrations.indexOf(JobOptions1765200000000);
    for (let i = 0; i <= later; i++) await t.ctx.dataSource.undoLastMigration({ transaction: 'all' });
    const undone = await schema();
    expect(undone).toMatchObject({ jobOptions: false, shopSettings: false, systemIdNullable: false });
    expect(undone.outboxColumns).not.toContain('jobId');
    await t.ctx.dataSource.runMigrations({ transaction: 'all' });
    expect(await schema()).toMatchObject({ jobOptions: true, shopSettings: true, systemIdNullable: true });
    expect((await schema()).outboxColumns).toContain('jobId');
  });
});
