import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Finding } from '../../../shared/rules/types';
import { uploadImport } from '../../../server/imports/imports.service';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { airHandler1200, coil410a, heatPump410a, inline } from './check-bodies';

let t: TestApp;
const ids: Record<string, number> = {};

const load = (kind: 'outdoor-units' | 'indoor-coils' | 'rated-combinations', csv: string) =>
  uploadImport(t.ctx, { buffer: Buffer.from(csv), fileName: `${kind}.csv`, kind, dryRun: false, userId: t.users.admin.id });
const auth = (role: 'tech' | 'admin' = 'tech') => ({ Authorization: `Bearer ${t.tokenFor(role)}` });
const post = (body: object) => request(t.app).post('/api/checks').set(auth()).send(body);

beforeAll(async () => {
  t = await createTestApp();
  // Invented models. MCA 21.2 A / MOCP 35 A: NEC 440.32 / 440.22(A) worked values (values.json EL-04, EL-05).
  await load('outdoor-units', 'model,system_type,refrigerant,nominal_tons,metering_required,mca_amps,mocp_amps,seer2\nZK-HP36,heat-pump,R-410A,3,txv,21.2,35,15.2\n');
  await load('indoor-coils', 'model,min_tons,max_tons,refrigerants,metering_type,metering_refrigerant,metering_bidirectional\nZK-CL36,2.5,3.5,R-410A,txv,R-410A,yes\n');
  await load('rated-combinations', 'outdoor_model,indoor_model,seer2,eer2,hspf2,reference\nZK-HP36,ZK-CL36,15.2,12,7.8,ZK-REF-1\n');
  for (const kind of ['outdoor-units', 'indoor-coils'] as const) {
    const res = await request(t.app).get(`/api/catalog/${kind}`).set(auth());
    ids[kind] = res.body.items[0].id;
  }
});
afterAll(async () => {
  await t.close();
});

describe('POST /api/checks with catalog parts', () => {
  it('when both parts are catalog ids with a rated combination, then the combination is found and reported', async () => {
    const res = await post({ scope: 'new-system', site: { state: 'OH' }, outdoor: { id: ids['outdoor-units'] }, indoorCoil: { id: ids['indoor-coils'] } }).expect(200);
    const rules = res.body.findings.map((f: Finding) => f.ruleId);
    expect(rules).toContain('rating.rated-combination');
    expect(rules).not.toContain('rating.no-rated-combination');
    expect(res.body.computed.ratedCombination).toMatchObject({ outdoorModel: 'ZK-HP36', indoorModel: 'ZK-CL36', seer2: 15.2 });
  });

  it('when a catalog id mixes with an inline spec, then the catalog part resolves and no rated combination is claimed for the typed coil', async () => {
    const res = await post({ scope: 'new-system', outdoor: { id: ids['outdoor-units'] }, indoorCoil: inline({ ...coil410a, model: 'ZK-TYPED-1' }) }).expect(200);
    expect(res.body.findings.map((f: Finding) => f.ruleId)).toContain('rating.no-rated-combination');
    // MCA 21.2 A .. MOCP 35 A holds the standard ratings 25, 30, 35 A (NEC 240.6(A), values.json EL-03)
    expect(res.body.computed.breakerRange.standardSizes).toEqual([25, 30, 35]);
  });

  it('when a catalog id does not exist, then 422 names the part', async () => {
    const res = await post({ scope: 'new-system', outdoor: { id: ids['outdoor-units'] }, indoorCoil: { id: 987654 } }).expect(422);
    expect(res.body.error.details).toEqual([{ path: 'indoorCoil.id', message: expect.stringContaining('987654') }]);
  });
});

describe('rule settings change a check', () => {
  it('when an admin narrows the CFM/ton band to 410–450, then 400 CFM/ton becomes an airflow finding; restoring it clears it', async () => {
    const body = { scope: 'new-system', outdoor: inline(heatPump410a), indoorCoil: inline(coil410a), airHandler: inline(airHandler1200) };
    const before = await post(body).expect(200);
    // 1200 CFM / 3 tons = 400 CFM/ton, inside the default 350–450 band (common practice, no source)
    expect(before.body.findings.map((f: Finding) => f.ruleId)).not.toContain('airflow.per-ton');

    const current = await request(t.app).get('/api/settings/rules').set(auth()).expect(200);
    const narrowed = { settings: { ...current.body.settings, cfmPerTonMin: 410 }, transitionRules: current.body.transitionRules };
    await request(t.app).put('/api/settings/rules').set(auth('admin')).send(narrowed).expect(200);
    const after = await post(body).expect(200);
    const airflow = after.body.findings.find((f: Finding) => f.ruleId === 'airflow.per-ton');
    expect(airflow?.severity).not.toBe('info');
    expect(airflow?.detail).toContain('400');

    await request(t.app).put('/api/settings/rules').set(auth('admin')).send({ settings: current.body.settings, transitionRules: current.body.transitionRules }).expect(200);
    const restored = await post(body).expect(200);
    expect(restored.body.findings.map((f: Finding) => f.ruleId)).not.toContain('airflow.per-ton');
  });
});
