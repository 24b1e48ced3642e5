import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const auth = (r: request.Test) => r.set('Authorization', `Bearer ${t.tokenFor('admin')}`);
function preview(distributor: string, csv: string) {
  return auth(request(t.app).post('/api/imports')).field('kind', 'prices').field('distributor', distributor).field('dryRun', 'true').attach('file', Buffer.from(csv), { filename: 'p.csv', contentType: 'text/csv' });
}
const rows = (n: number, cents: number) => `model,price,effective_from\n${Array.from({ length: n }, (_, i) => `QC-${i},${(cents / 100).toFixed(2)},2025-01-01`).join('\n')}\n`;
const priceCount = async () => ((await t.ctx.dataSource.query('SELECT COUNT(*) AS n FROM price_entries')) as { n: number }[])[0].n;

describe('imports under concurrency', () => {
  it('when one preview is committed ten times at once, then exactly one commit lands and the rest are 409', async () => {
    for (let round = 0; round < 5; round++) {
      const p = await preview(`Race ${round}`, rows(200, 1250)).expect(201);
      const before = await priceCount();
      const answers = await Promise.all(Array.from({ length: 10 }, () => auth(request(t.app).post(`/api/imports/${p.body.import.id}/commit`))));
      expect(answers.map((a) => a.status).sort()).toEqual([200, ...Array(9).fill(409)]);
      expect((await priceCount()) - before).toBe(200);

      const reverts = await Promise.all(Array.from({ length: 10 }, () => auth(request(t.app).post(`/api/imports/${p.body.import.id}/revert`))));
      expect(reverts.map((a) => a.status).sort()).toEqual([200, ...Array(9).fill(409)]);
      expect(await priceCount()).toBe(before);
    }
  });

  it('when overlapping imports of the same rows commit at once, then the rows hold one of them whole and each revert undoes only its own', async () => {
    const a = await preview('Overlap', rows(100, 1000)).expect(201);
    const b = await preview('Overlap', rows(100, 2000)).expect(201);
    const [ca, cb] = await Promise.all([auth(request(t.app).post(`/api/imports/${a.body.import.id}/commit`)), auth(request(t.app).post(`/api/imports/${b.body.import.id}/commit`))]);
    expect([ca.status, cb.status]).toEqual([200, 200]);
    const stored = (await t.ctx.dataSource.query(`SELECT DISTINCT p."priceCents" AS c FROM price_entries p JOIN distributors d ON d.id = p."distributorId" WHERE d.name = 'Overlap'`)) as { c: number }[];
    // All 100 rows carry the price of whichever commit ran second: never a mix of the two files.
    expect(stored).toHaveLength(1);
    const second = stored[0].c === 2000 ? b : a;
    const first = second === a ? b : a;
    // The earlier import can not be reverted under the later one; the later reverts, then the earlier.
    await auth(request(t.app).post(`/api/imports/${first.body.import.id}/revert`)).expect(409);
    await auth(request(t.app).post(`/api/imports/${second.body.import.id}/revert`)).expect(200);
    await auth(request(t.app).post(`/api/imports/${first.body.import.id}/revert`)).expect(200);
    expect(await t.ctx.dataSource.query(`SELECT COUNT(*) AS n FROM price_entries p JOIN distributors d ON d.id = p."distributorId" WHERE d.name = 'Overlap'`)).toEqual([{ n: 0 }]);
  });
});
