import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Finding } from '../../../shared/rules/types';
import type { CompatibleCoil } from '../../../shared/schemas/coils';
import { GROUP_PROBE_MIN } from '../../../server/coils/coil-evaluations';
import { compatibleCoils } from '../../../server/coils/coils.service';
import { revertImport, uploadImport } from '../../../server/imports/imports.service';
import { createTestApp, type TestApp } from '../../helpers/test-app';

/**
 * The coil search keeps work between requests (rule results per search context and per group of like
 * coils, a best-price book per price version and day). These tests show each is dropped when what it
 * was worked out from changes: an import committed or reverted, the shop's settings saved, the day.
 */

let t: TestApp;
type Kind = 'outdoor-units' | 'indoor-coils' | 'air-handlers' | 'rated-combinations' | 'prices';
const load = (kind: Kind, csv: string, distributor?: string) =>
  uploadImport(t.ctx, { buffer: Buffer.from(csv), fileName: `${kind}.csv`, kind, distributor, dryRun: false, userId: t.users.admin.id });
const auth = (role: 'estimator' | 'admin' = 'estimator') => ({ Authorization: `Bearer ${t.tokenFor(role)}` });
const idOf: Record<string, number> = {};
const search = async (query: Record<string, string | number | boolean> = {}) => {
  const res = await request(t.app)
    .get('/api/coils/compatible')
    .query({ outdoorUnitId: idOf['KV-HP36'], ...query })
    .set(auth())
    .expect(200);
  return { items: res.body.items as CompatibleCoil[], total: res.body.total as number, byModel: new Map((res.body.items as CompatibleCoil[]).map((i) => [i.coil.model, i])) };
};
const COIL_HEADER = 'model,configuration,cased,material,min_tons,max_tons,refrigerants,metering_type,metering_refrigerant,metering_bidirectional,width_in';

beforeAll(async () => {
  t = await createTestApp();
  // Invented models. A 3-ton R-410A heat pump; an air handler at 1200 CFM is 400 CFM/ton, inside the
  // default 350–450 CFM/ton band (common practice, no source; shared/rules/settings.ts).
  await load('outdoor-units', 'model,system_type,refrigerant,nominal_tons,metering_required,seer2,eer2,hspf2\nKV-HP36,heat-pump,R-410A,3,txv,14.3,11.7,7.5\n');
  await load('air-handlers', 'model,kind,min_tons,max_tons,airflow_cfm,refrigerants\nKV-AH36,air-handler,2,4,1200,R-410A\n');
  // KV-TWIN-A…H differ only in model: a group of like coils big enough to share its findings
  // (GROUP_PROBE_MIN); only A has a rated combination.
  const twins = 'ABCDEFGH'.split('').map((x) => `KV-TWIN-${x},upflow,yes,aluminum,2.5,3.5,R-410A,txv,R-410A,yes,17.5`);
  expect(twins.length).toBeGreaterThanOrEqual(GROUP_PROBE_MIN);
  await load('indoor-coils', [COIL_HEADER, ...twins, 'KV-MOVER,horizontal,no,copper,2.5,3.5,R-410A,txv,R-410A,yes,21'].join('\n'));
  await load('rated-combinations', 'outdoor_model,indoor_model,seer2,eer2,hspf2,reference\nKV-HP36,KV-TWIN-A,15.2,12.1,7.8,KV-REF-1\n');
  for (const kind of ['outdoor-units', 'air-handlers'] as const) {
    const res = await request(t.app).get(`/api/catalog/${kind}`).query({ pageSize: 100 }).set(auth());
    for (const item of res.body.items) idOf[item.model] = item.id;
  }
});
afterAll(async () => {
  await t.close();
});

describe('GET /api/coils/compatible: coils that differ only in model', () => {
  it('when a group of like coils differ only in model and one is rated, then each keeps its own rating and its own words', async () => {
    const { items, byModel } = await search();
    const a = byModel.get('KV-TWIN-A')!;
    const b = byModel.get('KV-TWIN-B')!;
    // Figures as constructed in the rated-combinations file above.
    expect(a.ratedCombination).toMatchObject({ seer2: 15.2, reference: 'KV-REF-1' });
    expect(b.ratedCombination).toBeUndefined();
    expect(items[0].coil.model).toBe('KV-TWIN-A');
    const noRating = (item: CompatibleCoil) => item.findings.filter((f: Finding) => f.ruleId === 'rating.no-rated-combination');
    expect(noRating(a)).toEqual([]);
    expect(noRating(b)).toHaveLength(1);
    expect(noRating(b)[0].detail).toContain('KV-TWIN-B');
    expect(JSON.stringify(b.findings)).not.toContain('KV-TWIN-A');
    // The other twins read like B, each with its own model.
    expect(items.filter((i) => i.coil.model.startsWith('KV-TWIN-')).map((i) => noRating(i)[0]?.detail.includes(i.coil.model) ?? i.coil.model === 'KV-TWIN-A')).toEqual(Array(8).fill(true));
  });

  it('when the same search is asked twice, then the second answer equals the first', async () => {
    const first = await search({ airHandlerId: idOf['KV-AH36'], state: 'OH', includeIncompatible: true });
    const second = await search({ airHandlerId: idOf['KV-AH36'], state: 'OH', includeIncompatible: true });
    expect(second).toEqual(first);
  });
});

describe('GET /api/coils/compatible: kept work follows the catalog', () => {
  it('when a coil import that changes a coil commits and is then reverted, then the next searches see each catalog', async () => {
    expect((await search()).byModel.has('KV-MOVER')).toBe(true);
    // 1.5–2.5 tons no longer holds the 3-ton outdoor unit: the coil-range blocker (constructed).
    const shrink = await load('indoor-coils', `${COIL_HEADER}\nKV-MOVER,horizontal,no,copper,1.5,2.5,R-410A,txv,R-410A,yes,21\n`);
    const after = await search();
    expect(after.byModel.has('KV-MOVER')).toBe(false);
    const all = await search({ includeIncompatible: true });
    expect(all.byModel.get('KV-MOVER')!.findings.map((f) => f.ruleId)).toContain('capacity.coil-range');
    await revertImport(t.ctx, shrink.id);
    const back = await search();
    expect(back.byModel.get('KV-MOVER')).toMatchObject({ coil: { minTons: 2.5, maxTons: 3.5 } });
  });

  it('when a rated-combination import commits and is then reverted, then the rated coil and the sort follow', async () => {
    const added = await load('rated-combinations', 'outdoor_model,indoor_model,seer2,eer2,hspf2,reference\nKV-HP36,KV-MOVER,16,12.5,8,KV-REF-2\n');
    const rated = await search({ ratedOnly: true });
    expect(rated.items.map((i) => i.coil.model).sort()).toEqual(['KV-MOVER', 'KV-TWIN-A']);
    await revertImport(t.ctx, added.id);
    const again = await search({ ratedOnly: true });
    expect(again.items.map((i) => i.coil.model)).toEqual(['KV-TWIN-A']);
  });

  it('when a price import commits and is then reverted, then the best price and inStock follow', async () => {
    // Invented distributor and prices.
    expect((await search({ inStock: true })).total).toBe(0);
    const prices = await load('prices', 'model,price,effective_from\nKV-TWIN-B,512.00,2025-01-01\nKV-MOVER,499.00,2099-01-01\n', 'Lakeside Supply');
    const priced = await search({ inStock: true });
    // KV-MOVER's only price is scheduled for 2099: not current, so not in stock.
    expect(priced.items.map((i) => i.coil.model)).toEqual(['KV-TWIN-B']);
    expect(priced.items[0].bestPrice).toEqual({ distributor: 'Lakeside Supply', priceCents: 51200, effectiveFrom: '2025-01-01' });
    // On a later day the scheduled price is current: the book is kept per day.
    const later = await compatibleCoils(t.ctx, { outdoorUnitId: idOf['KV-HP36'], limit: 50, inStock: true }, '2099-06-01');
    expect(later.items.find((i) => i.coil.model === 'KV-MOVER')?.bestPrice).toEqual({ distributor: 'Lakeside Supply', priceCents: 49900, effectiveFrom: '2099-01-01' });
    expect((await search({ inStock: true })).items.map((i) => i.coil.model)).toEqual(['KV-TWIN-B']);
    await revertImport(t.ctx, prices.id);
    expect((await search({ inStock: true })).total).toBe(0);
    expect((await search()).byModel.get('KV-TWIN-B')!.bestPrice).toBeUndefined();
  });
});

describe('GET /api/coils/compatible: kept work follows the settings', () => {
  it('when an admin narrows the airflow band, then the next search shows the airflow caution, and not after a reset', async () => {
    const airflow = async () => (await search({ airHandlerId: idOf['KV-AH36'] })).byModel.get('KV-TWIN-B')!.findings.filter((f) => f.ruleId === 'airflow.per-ton' && f.severity === 'caution');
    expect(await airflow()).toEqual([]);
    const current = await request(t.app).get('/api/settings/rules').set(auth('admin')).expect(200);
    const put = (settings: object) => request(t.app).put('/api/settings/rules').set(auth('admin')).send({ settings, transitionRules: current.body.transitionRules }).expect(200);
    // 1200 CFM over 3 tons is 400 CFM/ton, under a 420 CFM/ton floor (constructed band).
    await put({ ...current.body.settings, cfmPerTonMin: 420, cfmPerTonMax: 480 });
    expect(await airflow()).toHaveLength(1);
    await put(current.body.settings);
    expect(await airflow()).toEqual([]);
  });
});
