import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Distributor } from '../../../server/catalog/distributor.entity';
import { PriceEntry } from '../../../server/catalog/price-entry.entity';
import { dialectOf } from '../../../server/db/dialect';
import { createTestApp, type TestApp } from '../../helpers/test-app';

// The bulk insert both dialects offer (server/db/*-dialect.ts insertRows). SQLite writes many rows a
// statement and the rest one at a time: every count around the statement size must land whole.
let t: TestApp;
let distributorId: number;

beforeAll(async () => {
  t = await createTestApp();
  distributorId = (await t.ctx.dataSource.getRepository(Distributor).save({ name: 'Insert Test Supply' })).id;
});
afterAll(() => t.close());

const COLUMNS: (keyof PriceEntry & string)[] = ['distributorId', 'model', 'normalizedModel', 'priceCents', 'currency', 'effectiveFrom', 'description', 'importId'];

function priceRows(batch: number, count: number): unknown[][] {
  return Array.from({ length: count }, (_, i) => [
    distributorId,
    `IR-${batch}-${i}`,
    `IR${batch}${i}`,
    100 + i,
    'USD',
    '2025-01-01',
    // Every other description blank (null), and one with a quote and a comma, as a file may hold.
    i % 2 ? null : `part ${i}, "kit"`,
    null,
  ]);
}

describe('insertRows', () => {
  it.each([1, 24, 25, 26, 49, 50, 51, 137, 1000])('when %i rows are inserted, then each lands once with its own values', async (count) => {
    const repo = t.ctx.dataSource.getRepository(PriceEntry);
    const rows = priceRows(count, count);
    await t.ctx.dataSource.transaction((manager) => dialectOf(manager).insertRows(manager, PriceEntry, COLUMNS, rows));
    const stored = await repo.find({ where: { effectiveFrom: '2025-01-01' }, order: { id: 'ASC' } });
    const mine = stored.filter((e) => e.model.startsWith(`IR-${count}-`));
    expect(mine).toHaveLength(count);
    expect(mine.map((e) => [e.distributorId, e.model, e.normalizedModel, e.priceCents, e.currency, e.effectiveFrom, e.description, e.importId])).toEqual(rows);
  });

  it('when one row of a many-row statement breaks the unique index, then none of the call is kept', async () => {
    const repo = t.ctx.dataSource.getRepository(PriceEntry);
    const before = await repo.count();
    const rows = priceRows(9000, 120);
    rows[75] = [...rows[10]];
    await expect(t.ctx.dataSource.transaction((manager) => dialectOf(manager).insertRows(manager, PriceEntry, COLUMNS, rows))).rejects.toThrow();
    expect(await repo.count()).toBe(before);
  });
});
