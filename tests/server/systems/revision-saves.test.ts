import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { useFixtureApp } from '../../helpers/fixture-app';
import type { TestApp } from '../../helpers/test-app';
import { authFor, recordBody, type Fixture } from './system-fixtures';

let t: TestApp, f: Fixture;
useFixtureApp((app, fixture) => ([t, f] = [app, fixture]));

const auth = () => authFor(t, 'tech');
const create = async () => (await request(t.app).post(`/api/jobs/${f.jobId}/systems`).set(auth()).send(recordBody(f)).expect(201)).body as { id: number };
const finalize = (id: number, revision: number) =>
  request(t.app).post(`/api/systems/${id}/finalize`).set(auth()).send({ revision, openItemsReason: 'Left open for the test' }).expect(200);
const revisions = async (id: number) =>
  ((await request(t.app).get(`/api/systems/${id}`).set(auth()).expect(200)).body.revisions as { revision: number; status: string }[]).map(
    (r) => `${r.revision}:${r.status}`,
  );

describe('the answer to a save', () => {
  it('when a record is created, then the 201 answer is the record exactly as it then reads back', async () => {
    const made = await request(t.app).post(`/api/jobs/${f.jobId}/systems`).set(auth()).send(recordBody(f)).expect(201);
    const read = await request(t.app).get(`/api/systems/${made.body.id}`).set(auth()).expect(200);
    const { currentCheck: _today, ...stored } = read.body;
    expect(made.body).toEqual(stored);
  });
});

describe('every save is a revision', () => {
  it('when serials and then checklist items are saved one by one on a draft, then each save is its own revision carrying the counter', async () => {
    const { id } = await create();
    await request(t.app).patch(`/api/systems/${id}`).set(auth()).send({ revision: 1, serials: { outdoor: 'QX-REV-0002' } }).expect(200);
    await request(t.app).patch(`/api/systems/${id}`).set(auth()).send({ revision: 2, checklist: { 'filter-drier': { state: 'done' } } }).expect(200);
    const third = await request(t.app)
      .patch(`/api/systems/${id}`)
      .set(auth())
      .send({ revision: 3, checklist: { 'condensate-trap': { state: 'not-applicable', note: 'Condensate pump fitted' } } })
      .expect(200);
    expect(third.body).toMatchObject({ revision: 4, latestRevision: 4, serials: { outdoor: 'QX-REV-0002' } });
    expect(await revisions(id)).toEqual(['1:draft', '2:draft', '3:draft', '4:draft']);
    // Each earlier revision still reads as it was saved.
    const second = await request(t.app).get(`/api/systems/${id}/revisions/2`).set(auth()).expect(200);
    expect(second.body.checklist.find((c: { id: string }) => c.id === 'filter-drier').state).toBe('open');
  });

  it('when a draft save leaves out the revision counter or names a stale one, then 422 and 409, and no revision is written', async () => {
    const { id } = await create();
    const missing = await request(t.app).patch(`/api/systems/${id}`).set(auth()).send({ serials: { outdoor: 'QX-NO-REV' } }).expect(422);
    expect(missing.body.error.details.map((d: { path: string }) => d.path)).toContain('revision');
    await request(t.app).patch(`/api/systems/${id}`).set(auth()).send({ revision: 1, serials: { outdoor: 'QX-REV-A' } }).expect(200);
    const stale = await request(t.app).patch(`/api/systems/${id}`).set(auth()).send({ revision: 1, checklist: { 'filter-drier': { state: 'done' } } }).expect(409);
    expect(stale.body.error).toMatchObject({ code: 'stale-revision', details: { currentRevision: 2 } });
    const ahead = await request(t.app).patch(`/api/systems/${id}`).set(auth()).send({ revision: 5, serials: { outdoor: 'QX-REV-B' } }).expect(409);
    expect(ahead.body.error.code).toBe('stale-revision');
    expect(await revisions(id)).toEqual(['1:draft', '2:draft']);
  });

  it('when serials and checklist are saved on a final record, then each change is a new revision and the final one stays as it was', async () => {
    const { id } = await create();
    await finalize(id, 1);
    // A serial on the final record: PATCH is refused, a new revision is made.
    await request(t.app).patch(`/api/systems/${id}`).set(auth()).send({ revision: 1, serials: { outdoor: 'QX-FIN-0002' } }).expect(409);
    const serial = await request(t.app).post(`/api/systems/${id}/revisions`).set(auth()).send({ revision: 1, serials: { outdoor: 'QX-FIN-0002' } }).expect(201);
    expect(serial.body).toMatchObject({ revision: 2, status: 'draft' });
    await finalize(id, 2);
    // A checklist item on the record made final again: another revision, again from the one it started on.
    const stale = await request(t.app)
      .post(`/api/systems/${id}/revisions`)
      .set(auth())
      .send({ revision: 1, checklist: { 'filter-drier': { state: 'done' } } })
      .expect(409);
    expect(stale.body.error).toMatchObject({ code: 'stale-revision', details: { currentRevision: 2 } });
    const item = await request(t.app)
      .post(`/api/systems/${id}/revisions`)
      .set(auth())
      .send({ revision: 2, checklist: { 'filter-drier': { state: 'done' } } })
      .expect(201);
    expect(item.body).toMatchObject({ revision: 3, status: 'draft', serials: { outdoor: 'QX-FIN-0002' } });
    expect(await revisions(id)).toEqual(['1:final', '2:final', '3:draft']);
    const first = await request(t.app).get(`/api/systems/${id}/revisions/1`).set(auth()).expect(200);
    expect(first.body).toMatchObject({ status: 'final', serials: { outdoor: 'QX2611A04471' } });
    const second = await request(t.app).get(`/api/systems/${id}/revisions/2`).set(auth()).expect(200);
    expect(second.body.checklist.find((c: { id: string }) => c.id === 'filter-drier').state).toBe('open');
  });
});
