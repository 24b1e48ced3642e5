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

type Role = 'tech' | 'estimator' | 'admin';
const auth = (role: Role = 'tech') => ({ Authorization: `Bearer ${t.tokenFor(role)}` });
// Invented people and addresses.
const job = (over: object = {}) => ({ customerName: 'Nadia Okonkwo', siteAddress: '14 Larkspur Row, Fenwick', state: 'ga', ...over });

describe('POST /api/jobs', () => {
  it('when a tech creates a job, then 201 with the contract fields, status open and who created it', async () => {
    const res = await request(t.app)
      .post('/api/jobs')
      .set(auth('tech'))
      .send(job({ contactEmail: 'nadia@example.test', contactPhone: '555-0142', notes: 'Side gate' }))
      .expect(201);
    expect(res.body).toMatchObject({
      id: expect.any(Number),
      customerName: 'Nadia Okonkwo',
      siteAddress: '14 Larkspur Row, Fenwick',
      state: 'GA',
      contactEmail: 'nadia@example.test',
      contactPhone: '555-0142',
      notes: 'Side gate',
      status: 'open',
      createdBy: { id: t.users.tech.id, name: t.users.tech.name },
    });
    expect(Date.parse(res.body.createdAt)).not.toBeNaN();
  });

  it('when fields are missing or malformed, then 422 naming each field; with no token, 401', async () => {
    const res = await request(t.app)
      .post('/api/jobs')
      .set(auth())
      .send({ customerName: '', state: 'Georgia', contactEmail: 'not-mail' })
      .expect(422);
    const paths = res.body.error.details.map((d: { path: string }) => d.path).sort();
    expect(paths).toEqual(['contactEmail', 'customerName', 'siteAddress', 'state']);
    await request(t.app).post('/api/jobs').send(job()).expect(401);
    await request(t.app).get('/api/jobs').expect(401);
    await request(t.app).post('/api/jobs').set(auth()).set('Content-Type', 'application/json').send('{"customerName":').expect(400);
  });
});

describe('GET /api/jobs', () => {
  it('when jobs exist, then every role lists them newest first, searched by customer or address and filtered by status, paged', async () => {
    const app = await createTestApp();
    try {
      const a = (role: Role = 'tech') => ({ Authorization: `Bearer ${app.tokenFor(role)}` });
      const made: number[] = [];
      for (const [i, name] of ['Ilse Varga', 'Tomas Reyes', 'Ilse Brandt'].entries()) {
        const res = await request(app.app)
          .post('/api/jobs')
          .set(a('estimator'))
          .send(job({ customerName: name, siteAddress: `${i + 1} Quarry Lane` }))
          .expect(201);
        made.push(res.body.id);
      }
      await request(app.app).patch(`/api/jobs/${made[0]}`).set(a()).send({ status: 'closed' }).expect(200);

      const all = await request(app.app).get('/api/jobs').set(a('tech')).expect(200);
      expect(all.body).toMatchObject({ total: 3, page: 1, pageSize: 20 });
      expect(all.body.items.map((j: { id: number }) => j.id)).toEqual([...made].reverse());

      const byName = await request(app.app).get('/api/jobs?q=ilse').set(a('admin')).expect(200);
      expect(byName.body.items.map((j: { customerName: string }) => j.customerName)).toEqual(['Ilse Brandt', 'Ilse Varga']);
      const byAddress = await request(app.app).get('/api/jobs?q=2%20quarry').set(a()).expect(200);
      expect(byAddress.body.items.map((j: { id: number }) => j.id)).toEqual([made[1]]);
      const open = await request(app.app).get('/api/jobs?status=open&q=ilse').set(a()).expect(200);
      expect(open.body.items.map((j: { id: number }) => j.id)).toEqual([made[2]]);
      const paged = await request(app.app).get('/api/jobs?page=2&pageSize=2').set(a()).expect(200);
      expect(paged.body).toMatchObject({ total: 3, page: 2, pageSize: 2 });
      expect(paged.body.items.map((j: { id: number }) => j.id)).toEqual([made[0]]);
      // A typed % is a character to find, not a wildcard.
      expect((await request(app.app).get('/api/jobs?q=%25').set(a()).expect(200)).body.total).toBe(0);
      await request(app.app).get('/api/jobs?status=archived').set(a()).expect(400);
      await request(app.app).get('/api/jobs?pageSize=0').set(a()).expect(400);
    } finally {
      await app.close();
    }
  });
});

describe('GET/PATCH /api/jobs/:id', () => {
  it('when a job is edited, then the fields change and the history keeps who changed what, before and after', async () => {
    const created = (
      await request(t.app)
        .post('/api/jobs')
        .set(auth('tech'))
        .send(job({ contactPhone: '555-0100' }))
        .expect(201)
    ).body;
    const patched = await request(t.app)
      .patch(`/api/jobs/${created.id}`)
      .set(auth('estimator'))
      .send({ siteAddress: '15 Larkspur Row, Fenwick', contactPhone: null, status: 'closed' })
      .expect(200);
    expect(patched.body).toMatchObject({ siteAddress: '15 Larkspur Row, Fenwick', contactPhone: null, status: 'closed' });

    const read = await request(t.app).get(`/api/jobs/${created.id}`).set(auth('tech')).expect(200);
    expect(read.body.history).toHaveLength(2);
    expect(read.body.history[1].by).toEqual({ id: t.users.estimator.id, name: t.users.estimator.name });
    expect(read.body.history[1].changes).toEqual(
      expect.arrayContaining([
        { field: 'siteAddress', from: '14 Larkspur Row, Fenwick', to: '15 Larkspur Row, Fenwick' },
        { field: 'contactPhone', from: '555-0100', to: null },
        { field: 'status', from: 'open', to: 'closed' },
      ]),
    );
  });

  it('when the job does not exist or the patch is bad, then 404, 400 or 422', async () => {
    await request(t.app).get('/api/jobs/999999').set(auth()).expect(404);
    await request(t.app).get('/api/jobs/abc').set(auth()).expect(400);
    const created = (await request(t.app).post('/api/jobs').set(auth()).send(job()).expect(201)).body;
    await request(t.app).patch(`/api/jobs/${created.id}`).set(auth()).send({ status: 'archived' }).expect(422);
    await request(t.app).patch(`/api/jobs/${created.id}`).set(auth()).send({}).expect(422);
    await request(t.app).patch(`/api/jobs/${created.id}`).set(auth()).send({ createdBy: 1 }).expect(422);
  });
});
