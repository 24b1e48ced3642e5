import type { Express } from 'express';
import pg from 'pg';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { openDatabase } from '../../server/db/data-source';
import { migrations } from '../../server/db/migrations';
import { TEST_PASSWORD } from '../helpers/test-app';
import { sql } from '../helpers/sql';
import { databaseUrl, onPostgres, testPostgresUrl } from '../helpers/test-database';
import { twoInstances } from '../helpers/two-instances';

// Two server instances on one PostgreSQL database (issue 13): A is a test app, B a second app with its
// own connection pool, in-memory catalog index and rate limits, sharing only the database and the
// JWT secret, as two processes behind a load balancer would.
// PostgreSQL only: SQLite serves one instance per file by design, so this is skipped there.
describe.skipIf(!onPostgres)('two instances on one PostgreSQL', () => {
  const two = twoInstances();

  const OUTDOOR = ['model,brand,system_type,refrigerant,nominal_tons,seer2,mca_amps,mocp_amps', 'MI-30-X,Twinfield,ac,R-454B,2.5,15.2,16,25'].join('\n');
  const search = (app: Express, token: string) =>
    request(app).get('/api/catalog/outdoor-units').query({ q: 'MI-30-X' }).set('Authorization', `Bearer ${token}`).expect(200);
  const models = (res: request.Response) => (res.body.items as { model: string }[]).map((i) => i.model);

  it('when a user signs in on A, then the token works on B', async () => {
    const signIn = await request(two.a.app).post('/api/auth/sign-in').send({ email: 'tech@test.invalid', password: TEST_PASSWORD }).expect(200);
    const me = await request(two.b).get('/api/auth/me').set('Authorization', `Bearer ${signIn.body.token}`).expect(200);
    expect(me.body.user ?? me.body).toMatchObject({ email: 'tech@test.invalid', role: 'tech' });
  });

  it('when an import commits on A, then a search on B sees it at once, and when B reverts it, A sees that at once', async () => {
    const admin = two.a.tokenFor('admin');
    // Both instances build their index first, so a stale one would answer from memory.
    expect(models(await search(two.a.app, admin))).toEqual([]);
    expect(models(await search(two.b, admin))).toEqual([]);

    const imported = await request(two.a.app)
      .post('/api/imports')
      .set('Authorization', `Bearer ${admin}`)
      .field('kind', 'outdoor-units')
      .field('dryRun', 'false')
      .attach('file', Buffer.from(OUTDOOR), { filename: 'outdoor.csv', contentType: 'text/csv' })
      .expect(201);
    expect(models(await search(two.b, admin))).toEqual(['MI-30-X']);

    await request(two.b).post(`/api/imports/${imported.body.import.id}/revert`).set('Authorization', `Bearer ${admin}`).expect(200);
    expect(models(await search(two.a.app, admin))).toEqual([]);
    expect(models(await search(two.b, admin))).toEqual([]);
  });

  it('when A and B commit previews at the same moment, then both land whole and neither is lost', async () => {
    const admin = two.a.tokenFor('admin');
    const preview = (app: Express, model: string) =>
      request(app)
        .post('/api/imports')
        .set('Authorization', `Bearer ${admin}`)
        .field('kind', 'outdoor-units')
        .field('dryRun', 'true')
        .attach('file', Buffer.from(OUTDOOR.replace('MI-30-X', model)), { filename: 'outdoor.csv', contentType: 'text/csv' })
        .expect(201);
    const [pa, pb] = await Promise.all([preview(two.a.app, 'MI-A-1'), preview(two.b, 'MI-B-1')]);
    const commit = (app: Express, id: number) => request(app).post(`/api/imports/${id}/commit`).set('Authorization', `Bearer ${admin}`);
    const [ca, cb] = await Promise.all([commit(two.a.app, pa.body.import.id), commit(two.b, pb.body.import.id)]);
    expect([ca.status, cb.status]).toEqual([200, 200]);
    // One preview committed from both instances at once: exactly one wins (the write lock spans instances).
    const pc = await preview(two.a.app, 'MI-C-1');
    const both = await Promise.all([commit(two.a.app, pc.body.import.id), commit(two.b, pc.body.import.id)]);
    expect(both.map((r) => r.status).sort()).toEqual([200, 409]);
    const list = await request(two.b).get('/api/catalog/outdoor-units').query({ q: 'MI-', pageSize: 100 }).set('Authorization', `Bearer ${admin}`).expect(200);
    expect(models(list).sort()).toEqual(['MI-A-1', 'MI-B-1', 'MI-C-1']);
  });

  it('when two instances start at once on an empty database, then both open and each migration ran once', async () => {
    const serverUrl = testPostgresUrl()!;
    const name = `tandem_empty_${process.pid}_${Date.now()}`;
    const admin = new pg.Client({ connectionString: serverUrl });
    await admin.connect();
    try {
      await admin.query(`CREATE DATABASE "${name}"`);
      const url = databaseUrl(serverUrl, name);
      const both = await Promise.all([openDatabase(url), openDatabase(url)]);
      try {
        const ran = await sql<{ name: string }>(both[1], 'SELECT name FROM migrations ORDER BY id');
        expect(ran.map((r) => r.name)).toEqual(migrations.map((m) => m.name));
      } finally {
        await Promise.all(both.map((d) => d.destroy()));
      }
    } finally {
      await admin.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
      await admin.end();
    }
  });
});

