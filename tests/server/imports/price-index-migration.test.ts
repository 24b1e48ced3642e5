import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readCurrentPrices } from '../../../server/catalog/prices.service';
import { migrations } from '../../../server/db/migrations';
import { PriceIndexByModel1765460000000 } from '../../../server/db/migrations/1765460000000-price-index-by-model';
import { sql } from '../../helpers/sql';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { onPostgres } from '../../helpers/test-database';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

/**
 * price_entries' indexes other than the primary key, as "col,col" plus " unique", read from each database's
 * own catalog (its CREATE INDEX text keeps the column order, which TypeORM's table reader does not on PostgreSQL).
 */
async function priceIndexes(): Promise<string[]> {
  const rows = onPostgres
    ? await sql<{ definition: string }>(t.ctx.dataSource, `SELECT "indexdef" AS "definition" FROM "pg_indexes" WHERE "tablename" = 'price_entries' AND "indexname" NOT LIKE 'PK_%'`)
    : await sql<{ definition: string }>(t.ctx.dataSource, `SELECT "sql" AS "definition" FROM "sqlite_master" WHERE "type" = 'index' AND "tbl_name" = 'price_entries' AND "sql" IS NOT NULL`);
  return rows
    .map(({ definition }) => {
      const columns = /\(([^)]*)\)\s*$/.exec(definition)![1].split(',').map((c) => c.trim().replace(/"/g, ''));
      return `${columns.join(',')}${/CREATE UNIQUE/i.test(definition) ? ' unique' : ''}`;
    })
    .sort();
}

const NEW_INDEXES = ['distributorId,importId', 'normalizedModel,distributorId,effectiveFrom unique'];
const OLD_INDEXES = ['distributorId,normalizedModel,effectiveFrom unique', 'importId', 'normalizedModel'];

describe('migration 1765460000000 (price indexes led by the model)', () => {
  it('when migrated, then price_entries keeps two indexes besides its key: the unique one led by the model, and distributor + import', async () => {
    expect(await priceIndexes()).toEqual(NEW_INDEXES);
  });

  it('when a distributor prices the same model on the same date twice, then the unique index refuses the second row', async () => {
    await sql(t.ctx.dataSource, `INSERT INTO "distributors" ("name") VALUES ('Index Supply')`);
    const [{ id }] = await sql<{ id: number }>(t.ctx.dataSource, `SELECT "id" FROM "distributors" WHERE "name" = 'Index Supply'`);
    const insert = () =>
      sql(t.ctx.dataSource, 'INSERT INTO "price_entries" ("distributorId", "model", "normalizedModel", "priceCents", "currency", "effectiveFrom") VALUES (?, ?, ?, ?, ?, ?)', [
        id,
        'IX-100',
        'IX100',
        12345,
        'USD',
        '2025-01-01',
      ]);
    await insert();
    await expect(insert()).rejects.toThrow();
    const prices = await readCurrentPrices(t.ctx.dataSource, '2025-06-01', ['IX100']);
    expect(prices.get('IX100')).toEqual([{ distributor: 'Index Supply', priceCents: 12345, currency: 'USD', effectiveFrom: '2025-01-01' }]);
  });

  it.skipIf(onPostgres)('when prices are read by model, then SQLite searches the model-led unique index', async () => {
    // "SEARCH … USING INDEX" is how SQLite's EXPLAIN QUERY PLAN names an index lookup (sqlite.org/eqp.html).
    const plan = (await t.ctx.dataSource.query('EXPLAIN QUERY PLAN SELECT "priceCents" FROM "price_entries" WHERE "normalizedModel" IN (?, ?) AND "effectiveFrom" <= ?', [
      'IX100',
      'IX200',
      '2025-06-01',
    ])) as { detail: string }[];
    expect(plan.map((p) => p.detail).join(' | ')).toContain('USING INDEX IDX_price_entries_normalizedModel_distributorId_effectiveFrom');
  });

  it('when it is undone and run again, then the old indexes come back and go again', async () => {
    // Undo the later migrations too, then this one.
    for (let i = migrations.indexOf(PriceIndexByModel1765460000000); i < migrations.length; i++) await t.ctx.dataSource.undoLastMigration({ transaction: 'all' });
    expect(await priceIndexes()).toEqual(OLD_INDEXES);
    await t.ctx.dataSource.runMigrations({ transaction: 'all' });
    expect(await priceIndexes()).toEqual(NEW_INDEXES);
  });
});
