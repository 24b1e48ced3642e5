import request from 'supertest';
import type { Role } from '../../../shared/schemas/auth';
import { uploadImport } from '../../../server/imports/imports.service';
import type { TestApp } from '../../helpers/test-app';

/**
 * Catalog rows and a job for the record tests, built here (never the demo seed). Models, distributors
 * and people are invented. MCA 21.2 A / MOCP 35 A: NEC 440.32 / 440.22(A) worked values (values.json EL-04, EL-05).
 */
export const OUTDOOR_CSV =
  'model,brand,system_type,refrigerant,nominal_tons,cooling_btuh,metering_required,mca_amps,mocp_amps,seer2,eer2,hspf2\nQX-HP36-B,Quillon,heat-pump,R-410A,3,35000,txv,21.2,35,15.2,11.7,7.8\n';
export const COIL_CSV =
  'model,brand,min_tons,max_tons,refrigerants,metering_type,metering_refrigerant,metering_bidirectional\nQX-CL36-B,Quillon,2.5,3.5,R-410A,txv,R-410A,yes\n';
// 15.2 SEER2 / 11.7 EER2 / 7.8 HSPF2: invented rated figures, chosen above the DOE 2023 Southeast split heat
// pump minimums of 14.3 SEER2 and 7.5 HSPF2 (10 CFR 430.32(c), values.json EFF-06).
export const RATED_CSV =
  'outdoor_model,indoor_model,cooling_btuh,seer2,eer2,hspf2,reference\nQX-HP36-B,QX-CL36-B,35000,15.2,11.7,7.8,QX-REF-0042\n';

export interface Fixture {
  outdoorId: number;
  coilId: number;
  jobId: number;
}

export const authFor = (t: TestApp, role: Role = 'tech') => ({ Authorization: `Bearer ${t.tokenFor(role)}` });

/** Loads the invented catalog and prices, and creates one job. */
export async function buildFixture(t: TestApp): Promise<Fixture> {
  const load = (kind: 'outdoor-units' | 'indoor-coils' | 'rated-combinations' | 'prices', csv: string, distributor?: string) =>
    uploadImport(t.ctx, { buffer: Buffer.from(csv), fileName: `${kind}.csv`, kind, dryRun: false, userId: t.users.admin.id, distributor });
  await load('outdoor-units', OUTDOOR_CSV);
  await load('indoor-coils', COIL_CSV);
  await load('rated-combinations', RATED_CSV);
  // Two distributors: the cheaper current price wins; a future-dated row is scheduled, not current.
  await load('prices', 'model,price,effective_from\nQX-HP36-B,3200.00,2025-01-01\nQX-CL36-B,900.00,2025-01-01\n', 'Tarn Supply');
  await load('prices', 'model,price,effective_from\nQX-HP36-B,3100.00,2025-02-01\nQX-HP36-B,100.00,2099-01-01\n', 'Wexmoor Parts');
  const outdoor = await request(t.app).get('/api/catalog/outdoor-units').set(authFor(t));
  const coil = await request(t.app).get('/api/catalog/indoor-coils').set(authFor(t));
  const job = await request(t.app)
    .post('/api/jobs')
    .set(authFor(t))
    .send({ customerName: 'Odile Franz', siteAddress: '7 Cinder Hill Rd', state: 'GA' })
    .expect(201);
  return { outdoorId: outdoor.body.items[0].id, coilId: coil.body.items[0].id, jobId: job.body.id };
}

/** A record body: the catalog heat pump and coil in an attic, with a line set and a circuit. */
export function recordBody(f: Fixture, over: object = {}) {
  return {
    scope: 'new-system',
    installDate: '2026-11-20',
    site: { state: 'GA', indoorLocation: 'attic' },
    outdoor: { id: f.outdoorId },
    indoorCoil: { id: f.coilId },
    // 1200 CFM on 3 tons = 400 CFM/ton (common practice, no source)
    airHandler: { spec: { model: 'QX-AH-12', kind: 'air-handler', minTons: 2, maxTons: 4, airflowCfm: 1200 } },
    lineSet: { liquidOdIn: 0.375, suctionOdIn: 0.875, lengthFt: 25 },
    // 30 A breaker and 10 AWG copper: within MCA 21.2 / MOCP 35 (NEC 240.6(A), Table 310.16 60 °C 30 A)
    electrical: { breakerAmps: 30, wireAwg: 10, wireMaterial: 'copper' },
    serials: { outdoor: 'QX2611A04471', indoorCoil: 'QC2610B00913' },
    ...over,
  };
}

/**
 * The admin narrows the shop's airflow band to 410–450 CFM/ton, an invented band that puts the fixture's
 * 400 CFM/ton outside it (the default 350–450 holds it: common practice, no source).
 */
export async function narrowAirflowBand(t: TestApp): Promise<void> {
  const admin = authFor(t, 'admin');
  const current = await request(t.app).get('/api/settings/rules').set(admin).expect(200);
  await request(t.app)
    .put('/api/settings/rules')
    .set(admin)
    .send({ settings: { ...current.body.settings, cfmPerTonMin: 410 }, transitionRules: current.body.transitionRules })
    .expect(200);
}
