import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemoCatalog } from '../../../seed/demo-catalog';
import { createTestApp, type TestApp } from '../../helpers/test-app';

// This checks the demo files load cleanly through the importer; it is not a fixture for other tests.
let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  await seedDemoCatalog(t.ctx);
});
afterAll(async () => {
  await t.close();
});

describe('demo catalog', () => {
  it('when the demo files are imported, then every row is accepted and the sizes meet issue 3', async () => {
    const counts = await t.ctx.dataSource.query(
      `SELECT (SELECT COUNT(*) FROM outdoor_units) o, (SELECT COUNT(*) FROM indoor_coils) c, (SELECT COUNT(*) FROM air_handlers) a,
              (SELECT COUNT(*) FROM metering_devices) m, (SELECT COUNT(*) FROM rated_combinations) r, (SELECT COUNT(*) FROM distributors) d`,
    );
    expect(counts[0].o).toBeGreaterThanOrEqual(40);
    expect(counts[0].c).toBeGreaterThanOrEqual(80);
    expect(counts[0].a).toBeGreaterThanOrEqual(20);
    expect(counts[0].m).toBeGreaterThanOrEqual(10);
    expect(counts[0].r).toBeGreaterThanOrEqual(150);
    expect(counts[0].d).toBe(2);
    const rejected = await t.ctx.dataSource.query('SELECT SUM(rejected) n FROM imports');
    expect(rejected[0].n).toBe(0);
  });

  it('when the demo catalog is loaded, then every rated combination names catalog equipment', async () => {
    const orphans = await t.ctx.dataSource.query(
      `SELECT r.id FROM rated_combinations r
       LEFT JOIN outdoor_units o ON o."normalizedModel" = r."normalizedOutdoorModel"
       LEFT JOIN indoor_coils c ON c."normalizedModel" = r."normalizedIndoorModel"
       WHERE o.id IS NULL OR c.id IS NULL`,
    );
    expect(orphans).toEqual([]);
  });
});
