import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { R410A_TXV_ON_TARGET } from '../../helpers/charge-readings';
import { useFixtureApp } from '../../helpers/fixture-app';
import type { TestApp } from '../../helpers/test-app';
import { authFor, recordBody, type Fixture } from './system-fixtures';

let t: TestApp, f: Fixture;
useFixtureApp((app, fixture) => ([t, f] = [app, fixture]));

const auth = (role: 'tech' | 'admin' = 'tech') => authFor(t, role);
const newRecord = async () => (await request(t.app).post(`/api/jobs/${f.jobId}/systems`).set(auth()).send(recordBody(f)).expect(201)).body;

// Right on target (tests/helpers/charge-readings.ts: 10 °F superheat, 10 °F subcooling), with indoor and outdoor conditions.
const charge = { ...R410A_TXV_ON_TARGET, indoorWbF: 63, indoorDbF: 75, outdoorDbF: 88 };

describe('POST /api/systems/:id/readings', () => {
  it('when charge readings are posted, then superheat and subcooling are computed and stored with who, when and the conditions', async () => {
    const made = await newRecord();
    const res = await request(t.app)
      .post(`/api/systems/${made.id}/readings`)
      .set(auth())
      .send({ label: 'Before adjustment', takenAt: '2026-11-20T15:04:00Z', charge })
      .expect(201);
    expect(res.body.results.charge.superheatF).toBeCloseTo(10, 0);
    expect(res.body.results.charge.subcoolingF).toBeCloseTo(10, 0);
    // 10 °F target subcooling when the unit gives none: the shared default (common practice, no source)
    expect(res.body.results.charge.targetSubcoolingF).toBe(10);
    expect(res.body.results.charge.verdict).toBe('on-target');
    expect(res.body).toMatchObject({
      takenAt: '2026-11-20T15:04:00.000Z',
      label: 'Before adjustment',
      takenBy: { id: t.users.tech.id },
      input: { charge: { outdoorDbF: 88, indoorWbF: 63 } },
    });

    // A second set after a charge adjustment: 4 °F subcooling is well under the 10 °F target (±3 °F band, common practice)
    await request(t.app)
      .post(`/api/systems/${made.id}/readings`)
      .set(auth())
      .send({ label: 'After adjustment', charge: { ...charge, liquidLineF: 96 } })
      .expect(201);
    const read = await request(t.app).get(`/api/systems/${made.id}`).set(auth()).expect(200);
    expect(read.body.readings.map((r: { label: string }) => r.label)).toEqual(['Before adjustment', 'After adjustment']);
    expect(read.body.readings[1].results.charge.verdict).toBe('off-target');
  });

  it('when an evacuation and a nitrogen test are posted, then each carries pass, fail or not judged with its numbers', async () => {
    const made = await newRecord();
    // 500 microns target, 1,000-micron decay limit over 10 minutes: shop defaults (common practice, values.json EV-01)
    const pass = await request(t.app)
      .post(`/api/systems/${made.id}/readings`)
      .set(auth())
      .send({ evacuation: { finalMicrons: 380, decayMicrons: 640, holdMinutes: 10 } })
      .expect(201);
    expect(pass.body.results.evacuation).toMatchObject({ passed: true, message: expect.stringContaining('640') });
    const fail = await request(t.app)
      .post(`/api/systems/${made.id}/readings`)
      .set(auth())
      .send({ evacuation: { finalMicrons: 380, decayMicrons: 2400, holdMinutes: 10 } })
      .expect(201);
    expect(fail.body.results.evacuation.passed).toBe(false);
    // 15-minute minimum hold and 1 psi gauge allowance (common practice, values.json EV-02)
    const n2 = await request(t.app)
      .post(`/api/systems/${made.id}/readings`)
      .set(auth())
      .send({ pressureTest: { pressurePsig: 300, holdMinutes: 30, dropPsig: 0 } })
      .expect(201);
    expect(n2.body.results.pressureTest.passed).toBe(true);
    const short = await request(t.app)
      .post(`/api/systems/${made.id}/readings`)
      .set(auth())
      .send({ pressureTest: { pressurePsig: 300, holdMinutes: 5, dropPsig: 0 } })
      .expect(201);
    expect(short.body.results.pressureTest.passed).toBeNull();
  });

  it('when the body is empty or out of range, then 422; when the record is final, then 409 and nothing is added', async () => {
    const made = await newRecord();
    await request(t.app).post(`/api/systems/${made.id}/readings`).set(auth()).send({}).expect(422);
    const bad = await request(t.app)
      .post(`/api/systems/${made.id}/readings`)
      .set(auth())
      .send({ charge: { ...charge, suctionPsig: 5000 } })
      .expect(422);
    expect(bad.body.error.details.map((d: { path: string }) => d.path)).toEqual(['charge.suctionPsig']);
    await request(t.app).post('/api/systems/999999/readings').set(auth()).send({ charge }).expect(404);
    await request(t.app).post(`/api/systems/${made.id}/finalize`).set(auth()).send({ revision: 1, openItemsReason: 'Test' }).expect(200);
    const refused = await request(t.app).post(`/api/systems/${made.id}/readings`).set(auth()).send({ charge }).expect(409);
    expect(refused.body.error.code).toBe('record-final');
    expect((await request(t.app).get(`/api/systems/${made.id}`).set(auth())).body.readings).toEqual([]);
  });
});
