import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemoIfEmpty } from '../../../seed/demo';
import { listOptions } from '../../../server/options/options.service';
import { JobRow } from '../../../server/jobs/job.entity';
import { createTestApp, type TestApp } from '../../helpers/test-app';

// Checks the demo seed runs and its options job is usable; it is not a fixture for other tests.
let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  await t.ctx.dataSource.query('DELETE FROM users');
  await seedDemoIfEmpty(t.ctx);
}, 120_000);
afterAll(async () => {
  await t.close();
});

describe('demo options', () => {
  it('when the demo is seeded, then the failed-outdoor-unit job has two priced options with verdicts and rated figures', async () => {
    const job = await t.ctx.dataSource.getRepository(JobRow).findOneByOrFail({ customerName: 'Fenwick Ostrander' });
    const { items } = await listOptions(t.ctx, job.id, { existingAgeYears: 14 });
    expect(items.map((o) => o.name)).toEqual(['Heat pump with cased coil', 'Heat pump, coil rated with this furnace, TXV kit']);
    for (const o of items) {
      expect(o.lines.filter((l) => l.priceSource === 'price-list').length).toBeGreaterThanOrEqual(2);
      expect(o.price.totalCents).toBeGreaterThan(0);
      expect(o.efficiency.seer2).toBeDefined();
      expect(o.check.verdict).not.toBe('incompatible');
    }
  });
});
