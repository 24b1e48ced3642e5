import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { NO_RATED_SEER2, type OptionView, type RepairOrReplaceResult } from '../../../shared/schemas/options';
import { uploadImport } from '../../../server/imports/imports.service';
import { useFixtureApp } from '../../helpers/fixture-app';
import type { TestApp } from '../../helpers/test-app';
import { authFor, type Fixture } from '../systems/system-fixtures';

let t: TestApp, f: Fixture;
useFixtureApp((app, fixture) => ([t, f] = [app, fixture]));

const est = () => authFor(t, 'estimator');

/** An invented air conditioner (and an invented price) with no SEER2 of its own and no rated combination with the fixture's coil. */
async function unratedOutdoorId(): Promise<number> {
  const csv =
    'model,brand,system_type,refrigerant,nominal_tons,cooling_btuh,metering_required,mca_amps,mocp_amps\nQX-AC30-U,Quillon,ac,R-410A,2.5,29000,txv,17.1,25\n';
  const load = (kind: 'outdoor-units' | 'prices', body: string, distributor?: string) =>
    uploadImport(t.ctx, { buffer: Buffer.from(body), fileName: `${kind}.csv`, kind, dryRun: false, userId: t.users.admin.id, distributor });
  await load('outdoor-units', csv);
  await load('prices', 'model,price,effective_from\nQX-AC30-U,2400.00,2025-01-01\n', 'Tarn Supply');
  const res = await request(t.app).get('/api/catalog/outdoor-units').query({ q: 'QX-AC30-U' }).set(est()).expect(200);

  return (res.body.items as { id: number; model: string }[]).find((u) => u.model === 'QX-AC30-U')!.id;
}

const optionWith = async (outdoorId: number, name: string) => {
  const res = await request(t.app)
    .post(`/api/jobs/${f.jobId}/options`)
    .set(est())
    .send({
      name,
      outdoor: { id: outdoorId },
      indoorCoil: { id: f.coilId },
      laborHours: 4,
      laborRateCents: 9500,
      markupPct: 35,
      taxRatePct: 0,
    });
  expect(res.status).toBe(201);
  return res.body as OptionView;
};

describe('an option whose combination has no rated SEER2', () => {
  it('when it is read, then the yearly cooling cost and the payback are left out with the reason, never $0', async () => {
    const o = await optionWith(await unratedOutdoorId(), 'Unrated pairing');
    expect(o.efficiency.seer2).toBeUndefined();
    expect(o.energy.cooling).toBeNull();
    expect(o.energy.annualSavingCents).toBeNull();
    expect(o.energy.paybackYears).toBeNull();
    expect(o.energy.notComputed).toBe('no rated SEER2 for this combination');
    expect(o.energy.paybackText).toContain(NO_RATED_SEER2);
    expect(o.energy.assumptions.join(' ')).toContain(NO_RATED_SEER2);
  });

  it('when the job is weighed for repair or replace, then that option has no saving and no payback and the arithmetic says why', async () => {
    const res = await request(t.app)
      .post(`/api/jobs/${f.jobId}/repair-or-replace`)
      .set(est())
      .send({ ageYears: 16, repairQuoteCents: 120_000 })
      .expect(200);
    const body = res.body as RepairOrReplaceResult;
    const unrated = body.options.find((o) => o.name === 'Unrated pairing')!;
    expect(unrated).toMatchObject({ annualSavingCents: null, paybackYears: null });
    expect(body.arithmetic.join(' ')).toContain('Unrated pairing');
    expect(body.arithmetic.join(' ')).toContain('saving not worked out');
  });

  it('when the combination is rated, then the cooling cost is still worked out beside it', async () => {
    const o = await optionWith(f.outdoorId, 'Rated pairing');
    expect(o.energy.cooling?.newCostCents).toBeGreaterThan(0);
    expect(o.energy.notComputed).toBeUndefined();
  });
});
