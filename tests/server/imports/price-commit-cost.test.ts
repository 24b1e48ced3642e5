import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sqliteHandle } from '../../../server/db/sqlite-handle';
import { uploadImport } from '../../../server/imports/imports.service';
import { createTestApp, type TestApp } from '../../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  await uploadImport(t.ctx, { buffer: Buffer.from('model,system_type,refrigerant,nominal_tons\nYC-0001,ac,R-454B,2\n'), fileName: 'units.csv', kind: 'outdoor-units', dryRun: false, userId: null });
});
afterAll(async () => {
  await t.close();
});

const FILE_ROWS = 500;
const HISTORY_ROWS = 60_000;

/** The bench's commit: 500 invented models, all effective on `day`, so every row is new. */
function priceFile(day: string): Buffer {
  const lines = ['model,price,effective_from'];
  for (let i = 0; i < FILE_ROWS; i++) lines.push(`YC-${String(i).padStart(4, '0')},${100 + i}.25,${day}`);
  return Buffer.from(`${lines.join('\n')}\n`);
}

const commit = (distributor: string, day: string) =>
  uploadImport(t.ctx, { buffer: priceFile(day), fileName: 'prices.csv', kind: 'prices', distributor, dryRun: false, userId: null });

/** A long price history for the distributor: the same models on many earlier days, written straight to the table. */
function writeHistory(distributorId: number) {
  const raw = sqliteHandle(t.ctx.dataSource.manager)!;
  const insert = raw.prepare('INSERT INTO price_entries (distributorId, model, normalizedModel, priceCents, currency, effectiveFrom, description, importId) VALUES (?, ?, ?, ?, ?, ?, ?, NULL)');
  raw.prepare('BEGIN').run();
  for (let i = 0; i < HISTORY_ROWS; i++) {
    const model = `YC-${String(i % FILE_ROWS).padStart(4, '0')}`;
    const day = new Date(Date.UTC(2000, 0, 1) + Math.floor(i / FILE_ROWS) * 86_400_000).toISOString().slice(0, 10);
    insert.run(distributorId, model, model.replace(/-/g, ''), 10_000 + i, 'USD', day, null);
  }
  raw.prepare('COMMIT').run();
}

/** Main-thread CPU time of `work` (user + system), in ms: what a commit takes away from the checks. */
async function cpuMs(work: () => Promise<unknown>): Promise<number> {
  const before = process.cpuUsage();
  await work();
  const used = process.cpuUsage(before);
  return (used.user + used.system) / 1000;
}

describe('a price commit does not cost the checks more as the price history grows (issue 8, fault 6)', () => {
  it('when a distributor has 60,000 stored prices, then committing 500 more costs about what it does for a new distributor', async () => {
    await commit('Fresh Supply', '2025-01-01');
    await commit('Long Supply', '2025-01-01');
    const [{ id }] = (await t.ctx.dataSource.query("SELECT id FROM distributors WHERE name = 'Long Supply'")) as { id: number }[];
    writeHistory(id);
    // Warm both paths once more, then compare the same commit with and without the history.
    await commit('Fresh Supply', '2025-02-01');
    await commit('Long Supply', '2025-02-01');
    const fresh = await cpuMs(() => commit('Fresh Supply', '2025-03-01'));
    const long = await cpuMs(() => commit('Long Supply', '2025-03-01'));
    // Reading the whole history (the old plan) cost many times the commit itself; point lookups add almost nothing.
    expect(long).toBeLessThan(2 * fresh + 20);
    const [{ n }] = (await t.ctx.dataSource.query('SELECT COUNT(*) AS n FROM price_entries WHERE distributorId = ?', [id])) as { n: number }[];
    expect(n).toBe(HISTORY_ROWS + 3 * FILE_ROWS);
  });
});
