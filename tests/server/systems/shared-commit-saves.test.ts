import type { Server } from 'node:http';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { uploadImport } from '../../../server/imports/imports.service';
import { JobRow } from '../../../server/jobs/job.entity';
import { withBatchedWrite } from '../../../server/systems/record-write-batch';
import { AppError } from '../../../server/lib/errors';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { onPostgres } from '../../helpers/test-database';
import { sql } from '../../helpers/sql';
import { authFor, buildFixture, recordBody, type Fixture } from './system-fixtures';

// Saves that arrive together share one write transaction (server/systems/record-write-batch.ts). These
// tests send them together to a LISTENING server, so they really are in flight at the same moment.
const TECHS = 20;

let t: TestApp;
let f: Fixture;
let server: Server;
beforeAll(async () => {
  t = await createTestApp();
  f = await buildFixture(t);
  server = t.app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
});
afterAll(async () => {
  await new Promise((resolve) => server.close(resolve));
  await t.close();
});

const auth = () => authFor(t, 'tech');
const create = () => request(server).post(`/api/jobs/${f.jobId}/systems`).set(auth()).send(recordBody(f));
const createAsEstimator = () => request(server).post(`/api/jobs/${f.jobId}/systems`).set(authFor(t, 'estimator')).send(recordBody(f));
const revisionsOf = async (id: number) =>
  (
    await sql<{ revision: number }>(
      t.ctx.dataSource,
      'SELECT "revision" FROM "system_revisions" WHERE "systemId" = ? ORDER BY "revision"',
      [id],
    )
  ).map((r) => Number(r.revision));

describe('saves that arrive together', () => {
  it('when 20 techs create records at the same moment, then 20 records land, each answered as it reads back', async () => {
    const answers = await Promise.all(Array.from({ length: TECHS }, () => create()));
    expect(answers.map((a) => a.status)).toEqual(Array(TECHS).fill(201));
    const ids = answers.map((a) => a.body.id as number);
    expect(new Set(ids).size).toBe(TECHS);
    for (const answer of answers.slice(0, 3)) {
      const { currentCheck: _today, ...stored } = (await request(server).get(`/api/systems/${answer.body.id}`).set(auth()).expect(200))
        .body;
      expect(answer.body).toEqual(stored);
    }
    for (const id of ids) expect(await revisionsOf(id)).toEqual([1]);
  });

  it('when 20 techs each save their own record at the same moment, then each save is revision 2, answered as it reads back (without the lists)', async () => {
    const records = (await Promise.all(Array.from({ length: TECHS }, () => create().expect(201)))).map((r) => r.body.id as number);
    const answers = await Promise.all(
      records.map((id, i) =>
        request(server)
          .patch(`/api/systems/${id}`)
          .set(auth())
          .send({ revision: 1, serials: { outdoor: `QX2611A1${String(i).padStart(4, '0')}` } }),
      ),
    );
    expect(answers.map((a) => a.status)).toEqual(Array(TECHS).fill(200));
    answers.forEach((a, i) =>
      expect(a.body).toMatchObject({ revision: 2, latestRevision: 2, serials: { outdoor: `QX2611A1${String(i).padStart(4, '0')}` } }),
    );
    for (const answer of answers.slice(0, 3)) {
      // A save answers the revision it wrote; the app reloads the lists (readings, photos, revisions) itself.
      const {
        currentCheck: _today,
        readings: _r,
        attachments: _a,
        revisions: _v,
        ...stored
      } = (await request(server).get(`/api/systems/${answer.body.id}`).set(auth()).expect(200)).body;
      expect(answer.body).toEqual(stored);
    }
    for (const id of records) expect(await revisionsOf(id)).toEqual([1, 2]);
  });

  it('when two saves from revision 1 of one record arrive with saves of other records, then one wins, the other alone gets 409 with the current revision', async () => {
    const [shared, ...others] = (await Promise.all(Array.from({ length: 6 }, () => create().expect(201)))).map((r) => r.body.id as number);
    const patch = (id: number, serial: string) =>
      request(server)
        .patch(`/api/systems/${id}`)
        .set(auth())
        .send({ revision: 1, serials: { outdoor: serial } });
    const [first, second, ...rest] = await Promise.all([
      patch(shared, 'QX2611A20001'),
      patch(shared, 'QX2611A20002'),
      ...others.map((id, i) => patch(id, `QX2611A3000${i}`)),
    ]);
    expect([first.status, second.status].sort()).toEqual([200, 409]);
    const refused = first.status === 409 ? first : second;
    expect(refused.body.error).toMatchObject({ code: 'stale-revision', details: { currentRevision: 2 } });
    expect(rest.map((r) => r.status)).toEqual(Array(others.length).fill(200));
    expect(await revisionsOf(shared)).toEqual([1, 2]);
    for (const id of others) expect(await revisionsOf(id)).toEqual([1, 2]);
  });
});

describe('the shared transaction', () => {
  const jobCount = async () => Number((await sql<{ n: number }>(t.ctx.dataSource, 'SELECT COUNT(*) AS "n" FROM "jobs"'))[0].n);
  const insertJob = (name: string) =>
    withBatchedWrite(t.ctx, async (manager) => {
      const at = new Date().toISOString();
      await manager
        .getRepository(JobRow)
        .insert({ customerName: name, siteAddress: '1 Batch Rd', state: 'GA', status: 'open', createdAt: at, updatedAt: at });
      return name;
    });

  it('when one write in a batch is refused (AppError), then only its own writes are undone and the others commit', async () => {
    const before = await jobCount();
    const results = await Promise.allSettled([
      insertJob('Batch A'),
      withBatchedWrite(t.ctx, async (manager) => {
        const at = new Date().toISOString();
        await manager
          .getRepository(JobRow)
          .insert({ customerName: 'Batch refused', siteAddress: '2 Batch Rd', state: 'GA', status: 'open', createdAt: at, updatedAt: at });
        throw new AppError('refused-for-test', 'Refused for the test', 409);
      }),
      insertJob('Batch C'),
    ]);
    expect(results.map((r) => r.status)).toEqual(['fulfilled', 'rejected', 'fulfilled']);
    expect(await jobCount()).toBe(before + 2);
    expect(await sql(t.ctx.dataSource, 'SELECT 1 FROM "jobs" WHERE "customerName" = ?', ['Batch refused'])).toHaveLength(0);
  });

  it('when one write in a batch fails in the database, then it alone fails and the others run again and commit', async () => {
    const before = await jobCount();
    const results = await Promise.allSettled([
      insertJob('Batch D'),
      // NOT NULL violated: a database error, not a refusal (it may end the whole transaction on some engines).
      withBatchedWrite(t.ctx, (manager) => manager.query('INSERT INTO "jobs" ("customerName") VALUES (NULL)')),
      insertJob('Batch F'),
    ]);
    expect(results.map((r) => r.status)).toEqual(['fulfilled', 'rejected', 'fulfilled']);
    expect(await jobCount()).toBe(before + 2);
  });

  it.skipIf(onPostgres)(
    'when 20 saves are started together, then they are written in fewer commits than saves (SQLite: one connection)',
    async () => {
      const runner = t.ctx.dataSource.createQueryRunner();
      const original = runner.query.bind(runner);
      let commits = 0;
      runner.query = ((query: string, ...rest: unknown[]) => {
        if (/^COMMIT/i.test(query)) commits += 1;
        return (original as (q: string, ...r: unknown[]) => Promise<unknown>)(query, ...rest);
      }) as typeof runner.query;
      try {
        await Promise.all(Array.from({ length: TECHS }, (_, i) => insertJob(`Commit count ${i}`)));
      } finally {
        runner.query = original;
      }
      expect(commits).toBeGreaterThan(0);
      expect(commits).toBeLessThan(TECHS / 2);
    },
  );
});

describe('the price snapshot', () => {
  it('when prices are imported after a save, then the next save of the same parts carries the new price', async () => {
    // An estimator saves here: the amounts are for the office (a tech's answer leaves them out).
    const first = await createAsEstimator().expect(201);
    expect(first.body.prices.parts.indoorCoil).toMatchObject({ distributor: 'Tarn Supply', priceCents: 90000 });
    // An invented distributor undercuts the coil: 850.00 beats 900.00 from today on.
    await uploadImport(t.ctx, {
      buffer: Buffer.from('model,price,effective_from\nQX-CL36-B,850.00,2025-03-01\n'),
      fileName: 'prices.csv',
      kind: 'prices',
      dryRun: false,
      userId: t.users.admin.id,
      distributor: 'Brindle Supply',
    });
    const second = await createAsEstimator().expect(201);
    expect(second.body.prices.parts.indoorCoil).toMatchObject({ distributor: 'Brindle Supply', priceCents: 85000 });
    // 310000 (outdoor, Wexmoor) + 85000 (coil, Brindle): the sum of the best prices.
    expect(second.body.prices.totalCents).toBe(395000);
  });
});
