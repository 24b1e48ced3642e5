import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { migrations } from '../../../server/db/migrations';
import { RevisionBriefIndex1765440000000 } from '../../../server/db/migrations/1765440000000-revision-brief-index';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { onPostgres } from '../../helpers/test-database';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const BRIEF_SQL =
  'SELECT "id", "revision", "status", "verdict", "savedAt", "savedBy", "finalizedBy", "finalizedAt" FROM "system_revisions" WHERE "systemId" = ? ORDER BY "revision" ASC';

async function briefIndexExists(): Promise<boolean> {
  const qr = t.ctx.dataSource.createQueryRunner();
  try {
    return Boolean((await qr.getTable('system_revisions'))?.indices.some((i) => i.name === 'IDX_system_revisions_brief'));
  } finally {
    await qr.release();
  }
}

describe('migration 1765440000000 (revisions in brief from an index)', () => {
  it.skipIf(onPostgres)(
    'when a record lists its revisions in brief, then SQLite answers from the covering index alone (no table row, no overflow pages read)',
    async () => {
      // "USING COVERING INDEX" is how SQLite's EXPLAIN QUERY PLAN names a lookup that never reads the table
      // (sqlite.org/eqp.html and sqlite.org/queryplanner.html, "Covering Indexes").
      const plan = (await t.ctx.dataSource.query(`EXPLAIN QUERY PLAN ${BRIEF_SQL}`, [1])) as { detail: string }[];
      expect(plan.map((p) => p.detail).join(' | ')).toContain('USING COVERING INDEX IDX_system_revisions_brief');
    },
  );

  it('when it is undone and run again, then the index goes and comes back', async () => {
    expect(await briefIndexExists()).toBe(true);
    // Undo the later migrations too, then this one.
    for (let i = migrations.indexOf(RevisionBriefIndex1765440000000); i < migrations.length; i++) await t.ctx.dataSource.undoLastMigration({ transaction: 'all' });
    expect(await briefIndexExists()).toBe(false);
    await t.ctx.dataSource.runMigrations({ transaction: 'all' });
    expect(await briefIndexExists()).toBe(true);
  });
});
