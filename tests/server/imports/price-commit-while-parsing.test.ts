import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AppError } from '../../../server/lib/errors';
import { uploadImport } from '../../../server/imports/imports.service';
import { sql } from '../../helpers/sql';
import { createTestApp, type TestApp } from '../../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

/**
 * Rows enough that on PostgreSQL several parts (2000 rows each, server/imports/price-commit-stream.ts)
 * are written before the last row is validated; `badLine` (1-based data row) gets a price that is not a number.
 */
function priceFile(rows: number, prefix: string, badLine?: number): Buffer {
  const lines = ['model,price,effective_from'];
  for (let i = 1; i <= rows; i++) lines.push(`${prefix}-${String(i).padStart(5, '0')},${i === badLine ? 'twelve' : `${100 + (i % 900)}.50`},2025-03-01`);
  return Buffer.from(`${lines.join('\n')}\n`);
}

const upload = (buffer: Buffer, distributor: string) => uploadImport(t.ctx, { buffer, fileName: 'prices.csv', kind: 'prices', distributor, dryRun: false, userId: null });

const count = async (query: string, params: unknown[] = []) => Number((await sql<{ n: number }>(t.ctx.dataSource, query, params))[0].n);

describe('a price file committed while it is validated', () => {
  it('when every row is valid, then every row is stored once, with the import counts and the import id', async () => {
    const view = await upload(priceFile(7_500, 'WP'), 'While Supply');
    expect(view.counts).toMatchObject({ rows: 7_500, inserted: 7_500, updated: 0, unchanged: 0, rejected: 0 });
    expect(await count('SELECT COUNT(*) AS "n" FROM "price_entries" WHERE "importId" = ?', [view.id])).toBe(7_500);
    // 100 + (i % 900) dollars and 50 cents for i = 1…7500 (the file above): 7500 × 100.50 + 100 × (sum of i % 900).
    const [{ cents }] = await sql<{ cents: number }>(t.ctx.dataSource, 'SELECT SUM("priceCents") AS "cents" FROM "price_entries" WHERE "importId" = ?', [view.id]);
    let expected = 0;
    for (let i = 1; i <= 7_500; i++) expected += (100 + (i % 900)) * 100 + 50;
    expect(Number(cents)).toBe(expected);
  });

  it('when the same file comes again with one price changed, then one row is updated and the rest are unchanged', async () => {
    const lines = priceFile(7_500, 'WP').toString().split('\n');
    lines[6_001] = 'WP-06001,999.99,2025-03-01';
    const view = await upload(Buffer.from(lines.join('\n')), 'While Supply');
    expect(view.counts).toMatchObject({ rows: 7_500, inserted: 0, updated: 1, unchanged: 7_499, rejected: 0 });
    const [{ cents }] = await sql<{ cents: number }>(t.ctx.dataSource, 'SELECT "priceCents" AS "cents" FROM "price_entries" WHERE "normalizedModel" = ?', ['WP06001']);
    expect(Number(cents)).toBe(99_999);
  });

  it('when the last row is invalid, then the upload is refused with every error counted and nothing of it is kept, not even its new distributor', async () => {
    const importsBefore = await count('SELECT COUNT(*) AS "n" FROM "imports"');
    const pricesBefore = await count('SELECT COUNT(*) AS "n" FROM "price_entries"');
    const refusal = await upload(priceFile(7_500, 'WQ', 7_500), 'Refused Supply').catch((err: unknown) => err);
    expect(refusal).toBeInstanceOf(AppError);
    expect((refusal as AppError).code).toBe('rows-rejected');
    expect((refusal as AppError).details).toMatchObject({ counts: { rows: 7_500, rejected: 1 }, errorsTotal: 1 });
    expect(await count('SELECT COUNT(*) AS "n" FROM "price_entries"')).toBe(pricesBefore);
    expect(await count('SELECT COUNT(*) AS "n" FROM "imports"')).toBe(importsBefore);
    expect(await count('SELECT COUNT(*) AS "n" FROM "distributors" WHERE "name" = ?', ['Refused Supply'])).toBe(0);
  });

  it('when the first row is invalid and a later one too, then both are reported (the rest of the file is still read)', async () => {
    const lines = priceFile(5_000, 'WR', 1).toString().split('\n');
    lines[4_500] = 'WR-04500,,2025-03-01';
    const refusal = (await upload(Buffer.from(lines.join('\n')), 'Refused Supply').catch((err: unknown) => err)) as AppError;
    expect(refusal.code).toBe('rows-rejected');
    expect(refusal.details).toMatchObject({ counts: { rows: 5_000, rejected: 2 } });
    expect(await count('SELECT COUNT(*) AS "n" FROM "price_entries" WHERE "normalizedModel" LIKE ?', ['WR%'])).toBe(0);
  });
});
