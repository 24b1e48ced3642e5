import request from 'supertest';
import { describe, expect, it } from 'vitest';
import type { Role } from '../../../shared/schemas/auth';
import { uploadImport } from '../../../server/imports/imports.service';
import { useFixtureApp } from '../../helpers/fixture-app';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { authFor, buildFixture, narrowAirflowBand, OUTDOOR_CSV, recordBody, type Fixture } from './system-fixtures';

/*
 * What a save answers (PATCH /api/systems/:id, POST …/revisions): the revision written, as GET reads it back
 * without the lists (readings, photos, revisions), and checked against the catalog and settings of the moment
 * even when the same content was checked before.
 */

let t: TestApp, f: Fixture;
useFixtureApp((app, fixture) => ([t, f] = [app, fixture]));

const create = (app: TestApp, fx: Fixture) =>
  request(app.app).post(`/api/jobs/${fx.jobId}/systems`).set(authFor(app, 'tech')).send(recordBody(fx)).expect(201);

/** GET of a record as `role` reads it, without what a save does not answer. */
async function readBack(app: TestApp, id: number, role: Role) {
  const {
    currentCheck: _today,
    readings: _r,
    attachments: _a,
    revisions: _v,
    ...rest
  } = (await request(app.app).get(`/api/systems/${id}`).set(authFor(app, role)).expect(200)).body;
  return rest;
}

describe('the answer of a save', () => {
  it('when a tech and then an estimator save serials, then each answer is the record as that role reads it back, amounts for the office only', async () => {
    const made = (await create(t, f)).body;
    const byTech = await request(t.app)
      .patch(`/api/systems/${made.id}`)
      .set(authFor(t, 'tech'))
      .send({ revision: 1, serials: { outdoor: 'QX2611A05001' } })
      .expect(200);
    expect(byTech.headers['content-type']).toMatch(/^application\/json/);
    expect(byTech.body).toEqual(await readBack(t, made.id, 'tech'));
    expect(byTech.body).toMatchObject({ revision: 2, latestRevision: 2, status: 'draft', serials: { outdoor: 'QX2611A05001' } });
    expect(byTech.body.prices.parts.outdoor).toEqual({ distributor: 'Wexmoor Parts', effectiveFrom: expect.any(String), inStock: true });
    expect(byTech.body).not.toHaveProperty('revisions');

    const byOffice = await request(t.app)
      .patch(`/api/systems/${made.id}`)
      .set(authFor(t, 'estimator'))
      .send({ revision: 2, label: 'Attic' })
      .expect(200);
    expect(byOffice.body).toEqual(await readBack(t, made.id, 'estimator'));
    // 3100.00 + 900.00: the cheapest current prices of the fixture (system-fixtures.ts)
    expect(byOffice.body.prices.totalCents).toBe(400000);
    expect(byOffice.body.savedBy).toEqual({ id: t.users.estimator.id, name: t.users.estimator.name });
    expect(byOffice.body.createdBy).toEqual({ id: t.users.tech.id, name: t.users.tech.name });
  });

  it('when a final record takes a change as a new revision, then 201 with the draft revision as it reads back', async () => {
    const made = (await create(t, f)).body;
    await request(t.app)
      .post(`/api/systems/${made.id}/finalize`)
      .set(authFor(t, 'tech'))
      .send({ revision: 1, openItemsReason: 'Left open for the test' })
      .expect(200);
    const revised = await request(t.app)
      .post(`/api/systems/${made.id}/revisions`)
      .set(authFor(t, 'tech'))
      .send({ revision: 1, serials: { indoorCoil: 'QC2610B00999' } })
      .expect(201);
    expect(revised.body).toEqual(await readBack(t, made.id, 'tech'));
    expect(revised.body).toMatchObject({ revision: 2, status: 'draft', serials: { outdoor: 'QX2611A04471', indoorCoil: 'QC2610B00999' } });
  });

  it('when a tech edits serials, then a checklist item, then the label in a row, then each revision keeps the edits before it', async () => {
    const made = (await create(t, f)).body;
    const a = authFor(t, 'tech');
    await request(t.app)
      .patch(`/api/systems/${made.id}`)
      .set(a)
      .send({ revision: 1, serials: { outdoor: 'QX2611A09001' } })
      .expect(200);
    await request(t.app)
      .patch(`/api/systems/${made.id}`)
      .set(a)
      .send({ revision: 2, checklist: { 'filter-drier': { state: 'done' } } })
      .expect(200);
    const third = (await request(t.app).patch(`/api/systems/${made.id}`).set(a).send({ revision: 3, label: 'Hall closet' }).expect(200))
      .body;
    expect(third).toMatchObject({ revision: 4, label: 'Hall closet', serials: { outdoor: 'QX2611A09001', indoorCoil: 'QC2610B00913' } });
    expect(third.checklist.find((c: { id: string }) => c.id === 'filter-drier')).toMatchObject({ state: 'done' });
    expect(third.request).toEqual((await request(t.app).get(`/api/systems/${made.id}/revisions/1`).set(a).expect(200)).body.request);
  });
});

describe('the check of a save', () => {
  it('when the shop narrows the airflow band between two serial edits, then the second save is checked with the new band', async () => {
    const app = await createTestApp();
    try {
      const fx = await buildFixture(app);
      const a = authFor(app, 'tech');
      const made = (await create(app, fx)).body;
      const airflow = (body: { check: { findings: { ruleId: string }[] } }) =>
        body.check.findings.filter((x) => x.ruleId === 'airflow.per-ton');
      const first = (
        await request(app.app)
          .patch(`/api/systems/${made.id}`)
          .set(a)
          .send({ revision: 1, serials: { outdoor: 'QX2611A06001' } })
          .expect(200)
      ).body;
      // 400 CFM/ton sits inside the default 350–450 band (common practice, no source)
      expect(airflow(first)).toHaveLength(0);

      await narrowAirflowBand(app);

      const second = (
        await request(app.app)
          .patch(`/api/systems/${made.id}`)
          .set(a)
          .send({ revision: 2, serials: { outdoor: 'QX2611A06002' } })
          .expect(200)
      ).body;
      expect(airflow(second)).toHaveLength(1);
      expect((await request(app.app).get(`/api/systems/${made.id}`).set(a).expect(200)).body.check).toEqual(second.check);
    } finally {
      await app.close();
    }
  });

  it('when the outdoor unit is re-imported with a new MCA between two serial edits, then the second save stores the new spec', async () => {
    const app = await createTestApp();
    try {
      const fx = await buildFixture(app);
      const a = authFor(app, 'tech');
      const made = (await create(app, fx)).body;
      const first = (
        await request(app.app)
          .patch(`/api/systems/${made.id}`)
          .set(a)
          .send({ revision: 1, serials: { outdoor: 'QX2611A07001' } })
          .expect(200)
      ).body;
      expect(first.parts.outdoor.spec.mcaAmps).toBe(21.2);

      // 23.4 A: an invented corrected nameplate figure (no source), still within the 30 A circuit of the fixture
      await uploadImport(app.ctx, {
        buffer: Buffer.from(OUTDOOR_CSV.replace(',21.2,', ',23.4,')),
        fileName: 'outdoor-units.csv',
        kind: 'outdoor-units',
        dryRun: false,
        userId: app.users.admin.id,
      });

      const second = (
        await request(app.app)
          .patch(`/api/systems/${made.id}`)
          .set(a)
          .send({ revision: 2, serials: { outdoor: 'QX2611A07002' } })
          .expect(200)
      ).body;
      expect(second.parts.outdoor.spec.mcaAmps).toBe(23.4);
      expect((await request(app.app).get(`/api/systems/${made.id}/revisions/2`).set(a).expect(200)).body.parts.outdoor.spec.mcaAmps).toBe(
        21.2,
      );
    } finally {
      await app.close();
    }
  });
});
