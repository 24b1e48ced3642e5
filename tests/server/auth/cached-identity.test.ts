import type { Express } from 'express';
import request from 'supertest';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { signToken } from '../../../server/auth/tokens';
import { dialectOf } from '../../../server/db/dialect';
import { User } from '../../../server/users/user.entity';
import { sql } from '../../helpers/sql';
import { onPostgres } from '../../helpers/test-database';
import { twoInstances } from '../../helpers/two-instances';

// Users and catalog versions are kept in memory per instance (server/db/change-watch.ts). Two instances
// on one database: A is a test app, B a second app with its own data source — on SQLite a second
// connection to the same file (as a second process would open it), on PostgreSQL its own pool and
// LISTEN connection. Every change made through one must be seen by the other's next request.
const two = twoInstances();
afterEach(() => vi.restoreAllMocks());

const as = (token: string) => ({ Authorization: `Bearer ${token}` });
let serial = 0;
async function newUser(role: 'tech' | 'admin') {
  const repo = two.a.ctx.dataSource.getRepository(User);
  const user = await repo.save(repo.create({ email: `cached-${role}-${++serial}@test.invalid`, name: `Cached ${serial}`, role, passwordHash: 'x', active: true }));
  return { id: user.id, token: signToken(two.a.ctx.config.jwtSecret, { userId: user.id, role }) };
}

describe('the signed-in user, kept in memory', () => {
  it('when the same token comes twice with nothing changed, then the user row is read once (the cache is used)', async () => {
    const { token } = await newUser('tech');
    const read = vi.spyOn(dialectOf(two.bSource), 'userById');
    // On PostgreSQL the user's insert is announced to B a moment after it commits: until then B reads through.
    await vi.waitFor(async () => {
      read.mockClear();
      await request(two.b).get('/api/auth/me').set(as(token)).expect(200);
      await request(two.b).get('/api/catalog/outdoor-units').set(as(token)).expect(200);
      expect(read.mock.calls.length).toBeLessThanOrEqual(1);
    }, { timeout: 3000, interval: 50 });
    read.mockClear();
    await request(two.b).get('/api/auth/me').set(as(token)).expect(200);
    expect(read).not.toHaveBeenCalled();
  });

  it('when an admin deactivates a user on A, then B refuses that user\'s token on its next request', async () => {
    const { id, token } = await newUser('tech');
    await request(two.b).get('/api/auth/me').set(as(token)).expect(200);
    await request(two.b).get('/api/auth/me').set(as(token)).expect(200);
    await request(two.a.app).patch(`/api/users/${id}`).set(as(two.a.tokenFor('admin'))).send({ active: false }).expect(200);
    await request(two.b).get('/api/auth/me').set(as(token)).expect(401);
    await request(two.b).post('/api/checks').set(as(token)).send({}).expect(401);
  });

  it('when an admin is demoted on A, then B answers 403 on admin routes at once, and 200 again once promoted', async () => {
    const { id, token } = await newUser('admin');
    await request(two.b).get('/api/users').set(as(token)).expect(200);
    await request(two.b).get('/api/users').set(as(token)).expect(200);
    await request(two.a.app).patch(`/api/users/${id}`).set(as(two.a.tokenFor('admin'))).send({ role: 'tech' }).expect(200);
    await request(two.b).get('/api/users').set(as(token)).expect(403);
    await request(two.a.app).patch(`/api/users/${id}`).set(as(two.a.tokenFor('admin'))).send({ role: 'admin' }).expect(200);
    await request(two.b).get('/api/users').set(as(token)).expect(200);
  });

  it('when an admin is demoted by raw SQL on A (no TypeORM events), then both A and B answer 403', async () => {
    const { id, token } = await newUser('admin');
    await request(two.a.app).get('/api/users').set(as(token)).expect(200);
    await request(two.b).get('/api/users').set(as(token)).expect(200);
    await sql(two.a.ctx.dataSource, 'UPDATE "users" SET "role" = ? WHERE "id" = ?', ['tech', id]);
    await waitForEcho();
    await request(two.b).get('/api/users').set(as(token)).expect(403);
    await request(two.a.app).get('/api/users').set(as(token)).expect(403);
  });

  it('when B changes a user through its own repository, then B itself sees it on the next request', async () => {
    const { id, token } = await newUser('admin');
    await request(two.b).get('/api/users').set(as(token)).expect(200);
    await two.bSource.getRepository(User).update({ id }, { role: 'tech' });
    await request(two.b).get('/api/users').set(as(token)).expect(403);
  });
});

describe('the catalog versions, kept in memory', () => {
  const OUTDOOR = ['model,brand,system_type,refrigerant,nominal_tons,seer2,mca_amps,mocp_amps', 'CI-36-Q,Tandem Test,ac,R-454B,3,15.2,16,25'].join('\n');
  const search = (app: Express) =>
    request(app).get('/api/catalog/outdoor-units').query({ q: 'CI-36-Q' }).set(as(two.a.tokenFor('admin'))).expect(200);
  const models = (res: request.Response) => (res.body.items as { model: string }[]).map((i) => i.model);

  it('when an import commits on A, then B\'s next search sees it, and when A reverts it, B\'s next search does not', async () => {
    expect(models(await search(two.b))).toEqual([]);
    expect(models(await search(two.b))).toEqual([]);
    const imported = await request(two.a.app)
      .post('/api/imports')
      .set(as(two.a.tokenFor('admin')))
      .field('kind', 'outdoor-units')
      .field('dryRun', 'false')
      .attach('file', Buffer.from(OUTDOOR), { filename: 'outdoor.csv', contentType: 'text/csv' })
      .expect(201);
    expect(models(await search(two.b))).toEqual(['CI-36-Q']);
    await request(two.a.app).post(`/api/imports/${imported.body.import.id}/revert`).set(as(two.a.tokenFor('admin'))).expect(200);
    expect(models(await search(two.b))).toEqual([]);
    expect(models(await search(two.a.app))).toEqual([]);
  });
});

describe('the rule and shop settings, kept in memory', () => {
  it('when an admin saves the rules on A and the rebate tiers on A, then B checks and answers with them on its next request', async () => {
    const admin = as(two.a.tokenFor('admin'));
    const tech = as(two.a.tokenFor('tech'));
    const before = (await request(two.b).get('/api/settings/rules').set(tech).expect(200)).body;
    await request(two.b).get('/api/settings/rules').set(tech).expect(200);
    const cfmPerTonMin = before.settings.cfmPerTonMin + 5;
    await request(two.a.app)
      .put('/api/settings/rules')
      .set(admin)
      .send({ settings: { ...before.settings, rebateTiers: undefined, cfmPerTonMin }, transitionRules: before.transitionRules })
      .expect(200);
    await vi.waitFor(async () => expect((await request(two.b).get('/api/settings/rules').set(tech).expect(200)).body.settings.cfmPerTonMin).toBe(cfmPerTonMin), { timeout: 2000, interval: 20 });
    const shop = (await request(two.a.app).get('/api/settings/shop').set(admin).expect(200)).body.settings;
    const tier = { name: 'Cache test tier (invented)', seer2: 16 };
    await request(two.a.app).put('/api/settings/shop').set(admin).send({ ...shop, rebateTiers: [tier] }).expect(200);
    await vi.waitFor(async () => expect((await request(two.b).get('/api/settings/rules').set(tech).expect(200)).body.settings.rebateTiers).toEqual([tier]), { timeout: 2000, interval: 20 });
  });
});

describe.skipIf(!onPostgres)('when B loses its LISTEN connection', () => {
  it('then B reads every request through (a deactivation is still refused at once) and listens again afterwards', async () => {
    const { id, token } = await newUser('tech');
    await request(two.b).get('/api/auth/me').set(as(token)).expect(200);
    const read = vi.spyOn(dialectOf(two.bSource), 'userById');
    // Both instances' listeners: B's is the one under test, A's comes back the same way.
    const killed = await sql<{ pid: number }>(
      two.a.ctx.dataSource,
      `SELECT pg_terminate_backend(pid) AS pid FROM pg_stat_activity WHERE datname = current_database() AND query = 'LISTEN tandem_changes'`,
    );
    expect(killed.length).toBe(2);
    await new Promise((resolve) => setTimeout(resolve, 100));
    await request(two.b).get('/api/auth/me').set(as(token)).expect(200);
    await request(two.b).get('/api/auth/me').set(as(token)).expect(200);
    expect(read).toHaveBeenCalledTimes(2);
    // While it is down, a change made with no notification at all is still seen.
    await two.a.ctx.dataSource.query('ALTER TABLE "users" DISABLE TRIGGER "users_notify_change"');
    try {
      await sql(two.a.ctx.dataSource, 'UPDATE "users" SET "role" = ? WHERE "id" = ?', ['estimator', id]);
      const me = await request(two.b).get('/api/auth/me').set(as(token)).expect(200);
      expect(me.body.user?.role ?? me.body.role).toBe('estimator');
    } finally {
      await two.a.ctx.dataSource.query('ALTER TABLE "users" ENABLE TRIGGER "users_notify_change"');
    }
    // Reconnects about a second later and caches again.
    await vi.waitFor(async () => {
      read.mockClear();
      await request(two.b).get('/api/auth/me').set(as(token)).expect(200);
      await request(two.b).get('/api/auth/me').set(as(token)).expect(200);
      expect(read.mock.calls.length).toBeLessThanOrEqual(1);
    }, { timeout: 5000, interval: 200 });
  });
});

/** Raw SQL on PostgreSQL announces itself only through the trigger's NOTIFY: give it the moment a commit takes to reach a listener. */
async function waitForEcho() {
  if (onPostgres) await new Promise((resolve) => setTimeout(resolve, 50));
}
