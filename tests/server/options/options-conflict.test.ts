import request from 'supertest';
import { describe, expect, it } from 'vitest';
import type { OptionView } from '../../../shared/schemas/options';
import { useFixtureApp } from '../../helpers/fixture-app';
import type { TestApp } from '../../helpers/test-app';
import { authFor, type Fixture } from '../systems/system-fixtures';

let t: TestApp, f: Fixture;
useFixtureApp((app, fixture) => ([t, f] = [app, fixture]));

const est = () => authFor(t, 'estimator');

describe('a stale option save', () => {
  it('when a save names an old revision, then the 409 carries the option as it now stands, as a record conflict does', async () => {
    const created = await request(t.app)
      .post(`/api/jobs/${f.jobId}/options`)
      .set(est())
      .send({ name: 'Heat pump', outdoor: { id: f.outdoorId }, indoorCoil: { id: f.coilId }, laborHours: 5 })
      .expect(201);
    const id = (created.body as OptionView).id;
    await request(t.app).patch(`/api/options/${id}`).set(est()).send({ revision: 1, name: 'Theirs', laborHours: 7 }).expect(200);
    const stale = await request(t.app).patch(`/api/options/${id}`).set(est()).send({ revision: 1, name: 'Mine' }).expect(409);
    expect(stale.body.error).toMatchObject({ code: 'conflict', details: { revision: 2, currentRevision: 2 } });
    const current = stale.body.error.details.current as OptionView;
    expect(current).toMatchObject({ id, name: 'Theirs', revision: 2, laborHours: 7 });
    expect(current.price.totalCents).toBeGreaterThan(0);
    // The stale save changed nothing.
    const read = await request(t.app).get(`/api/options/${id}`).set(est()).expect(200);
    expect(read.body).toMatchObject({ name: 'Theirs', revision: 2 });
  });
});
