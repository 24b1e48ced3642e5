import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CompatibleCoil } from '../../../shared/schemas/coils';
import { revertImport, uploadImport } from '../../../server/imports/imports.service';
import { createTestApp, type TestApp } from '../../helpers/test-app';

let t: TestApp;
type Kind = 'outdoor-units' | 'indoor-coils' | 'air-handlers' | 'rated-combinations' | 'prices';
const load = (kind: Kind, csv: string, distributor?: string) =>
  uploadImport(t.ctx, { buffer: Buffer.from(csv), fileName: `${kind}.csv`, kind, distributor, dryRun: false, userId: t.users.admin.id });
const auth = (role: 'tech' | 'estimator' | 'admin' = 'estimator') => ({ Authorization: `Bearer ${t.tokenFor(role)}` });
const get = (query: Record<string, string | number | boolean>, role: 'tech' | 'estimator' | 'admin' = 'estimator') =>
  request(t.app).get('/api/coils/compatible').query(query).set(auth(role));
const idOf: Record<string, number> = {};
const models = (items: CompatibleCoil[]) => items.map((i) => i.coil.model);

beforeAll(async () => {
  t = await createTestApp();
  // Invented models. A 3-ton R-410A heat pump (36,000 Btu/h) and an air handler rated 1200 CFM: 400 CFM/ton,
  // inside the common 350–450 CFM/ton band (common practice, no source).
  await load('outdoor-units', 'model,system_type,refrigerant,nominal_tons,metering_required,seer2,eer2,hspf2\nQX-HP36,heat-pump,R-410A,3,txv,14.3,11.7,7.5\nQX-AC60,ac,R-454B,5,txv,13.4,9.8,\n');
  await load('air-handlers', 'model,kind,min_tons,max_tons,airflow_cfm,refrigerants\nQX-AH36,air-handler,2,4,1200,R-410A\n');
  // Constructed so that: CL-A and CL-B and CL-C and CL-E cover 3 tons for R-410A with a bidirectional TXV;
  // CL-R410-SMALL's range (1.5–2.5 t) excludes 3 tons (coil-range blocker); CL-454 lists only R-454B
  // (refrigerant-listing blocker, UL 60335-2-40 listing).
  await load(
    'indoor-coils',
    [
      'model,brand,description,configuration,cased,material,min_tons,max_tons,refrigerants,metering_type,metering_refrigerant,metering_bidirectional,width_in',
      'CL-A36,Northwind,cased upflow coil,upflow,yes,aluminum,2.5,3.5,R-410A,txv,R-410A,yes,17.5',
      'CL-B36,Northwind,slab coil,horizontal,no,copper,2.5,3.5,R-410A,txv,R-410A,yes,21',
      'CL-C36,Eastmere,multi-position cased coil,multi-position,yes,copper,2,4,R-410A;R-454B,txv,R-410A,yes,24.5',
      'CL-E36,Eastmere,upflow coil,upflow,no,aluminum,3,3,R-410A,txv,R-410A,yes,',
      'CL-R410-SMALL,Northwind,small coil,upflow,yes,aluminum,1.5,2.5,R-410A,txv,R-410A,yes,14',
      'CL-454,Northwind,A2L coil,upflow,yes,aluminum,2.5,3.5,R-454B,txv,R-454B,yes,17.5',
    ].join('\n'),
  );
  // Constructed so that only CL-C36 has a rated combination with QX-HP36 (AHRI 210/240 rates matched systems).
  await load('rated-combinations', 'outdoor_model,indoor_model,seer2,eer2,hspf2,reference\nQX-HP36,CL-C36,15.2,12.1,7.8,QX-REF-1\n');
  for (const kind of ['outdoor-units', 'air-handlers', 'indoor-coils'] as const) {
    const res = await request(t.app).get(`/api/catalog/${kind}`).query({ pageSize: 100 }).set(auth());
    for (const item of res.body.items) idOf[item.model] = item.id;
  }
});
afterAll(async () => {
  await t.close();
});

describe('GET /api/coils/compatible: access and errors', () => {
  it('when no token is sent, then 401', async () => {
    await request(t.app).get('/api/coils/compatible').query({ outdoorUnitId: idOf['QX-HP36'] }).expect(401);
  });
  it('when a tech asks, then 403 (prices stay with the office)', async () => {
    const res = await get({ outdoorUnitId: idOf['QX-HP36'] }, 'tech').expect(403);
    expect(res.body.error.code).toBe('forbidden');
  });
  it('when an admin asks, then 200', async () => {
    await get({ outdoorUnitId: idOf['QX-HP36'] }, 'admin').expect(200);
  });
  it('when the outdoor unit or the air handler does not exist, then 404', async () => {
    await get({ outdoorUnitId: 987654 }).expect(404);
    const res = await get({ outdoorUnitId: idOf['QX-HP36'], airHandlerId: 987654 }).expect(404);
    expect(res.body.error).toMatchObject({ code: 'not-found' });
  });
  it.each([
    [{ outdoorUnitId: 'abc' }],
    [{ outdoorUnitId: '012' }],
    [{}],
    [{ outdoorUnitId: 1, limit: '0x3' }],
    [{ outdoorUnitId: 1, limit: 0 }],
    [{ outdoorUnitId: 1, limit: 201 }],
    [{ outdoorUnitId: 1, ratedOnly: 'yes please' }],
    [{ outdoorUnitId: 1, configuration: 'sideways' }],
    [{ outdoorUnitId: 1, maxWidthIn: '-3' }],
    [{ outdoorUnitId: 1, state: 'Ohio' }],
    [{ outdoorUnitId: 1, color: 'red' }],
  ])('when the parameters are %j, then 400 with no stack trace', async (query) => {
    const res = await get(query as Record<string, string>).expect(400);
    expect(res.body.error.code).toBe('bad-parameters');
    expect(JSON.stringify(res.body)).not.toContain(' at ');
  });
  it('when a parameter is repeated, then 400', async () => {
    await request(t.app).get(`/api/coils/compatible?outdoorUnitId=${idOf['QX-HP36']}&outdoorUnitId=2`).set(auth()).expect(400);
  });
});

describe('GET /api/coils/compatible: the list', () => {
  it('when a 3-ton R-410A heat pump and its kept air handler are given, then exactly the coils listed for R-410A whose range holds 3 tons are returned, in contract shape', async () => {
    const res = await get({ outdoorUnitId: idOf['QX-HP36'], airHandlerId: idOf['QX-AH36'] }).expect(200);
    // Constructed so that CL-R410-SMALL (range) and CL-454 (refrigerant) fail; the other four pass.
    expect(models(res.body.items).sort()).toEqual(['CL-A36', 'CL-B36', 'CL-C36', 'CL-E36']);
    expect(res.body.total).toBe(4);
    for (const item of res.body.items as CompatibleCoil[]) {
      expect(item.verdict).not.toBe('incompatible');
      expect(item.findings.every((f) => f.severity !== 'blocker')).toBe(true);
      expect(item.coil).toMatchObject({ id: expect.any(Number), model: expect.any(String), minTons: expect.any(Number) });
    }
  });
  it('when includeIncompatible=true, then the left-out coils follow, each with its blocker', async () => {
    const res = await get({ outdoorUnitId: idOf['QX-HP36'], includeIncompatible: true }).expect(200);
    const items = res.body.items as CompatibleCoil[];
    expect(items).toHaveLength(6);
    const small = items.find((i) => i.coil.model === 'CL-R410-SMALL')!;
    const a2l = items.find((i) => i.coil.model === 'CL-454')!;
    expect(small.verdict).toBe('incompatible');
    expect(small.findings.map((f) => f.ruleId)).toContain('capacity.coil-range');
    expect(a2l.findings.map((f) => f.ruleId)).toContain('refrigerant.coil-listing');
    // Passing coils come first.
    expect(items.slice(4).every((i) => i.verdict === 'incompatible')).toBe(true);
  });
  it('when the coil has a rated combination with the outdoor unit, then it is first with its figures and the regional check', async () => {
    const res = await get({ outdoorUnitId: idOf['QX-HP36'], state: 'oh' }).expect(200);
    const first = res.body.items[0] as CompatibleCoil;
    expect(first.coil.model).toBe('CL-C36');
    // Figures as constructed in the rated-combinations file above.
    expect(first.ratedCombination).toMatchObject({ seer2: 15.2, eer2: 12.1, hspf2: 7.8 });
    // Heat pump minimum SEER2 14.3, HSPF2 7.5 nationwide (10 CFR 430.32(c), 2023 levels): 15.2 / 7.8 meet it.
    expect(first.meetsRegionalMinimum).toBe(true);
    expect(res.body.items.slice(1).every((i: CompatibleCoil) => i.ratedCombination === undefined)).toBe(true);
  });
  it('when limit is 2, then two items come back and total still counts all', async () => {
    const res = await get({ outdoorUnitId: idOf['QX-HP36'], limit: 2 }).expect(200);
    expect(res.body.items).toHaveLength(2);
    expect(res.body.total).toBe(4);
  });
});

describe('GET /api/coils/compatible: filters and search', () => {
  const hp = () => idOf['QX-HP36'];
  it.each([
    [{ configuration: 'upflow' }, ['CL-A36', 'CL-E36']],
    [{ material: 'copper' }, ['CL-B36', 'CL-C36']],
    [{ cased: true }, ['CL-A36', 'CL-C36']],
    [{ cased: false }, ['CL-B36', 'CL-E36']],
    // Coils with no listed width are left out under a width limit; 17.5 and 21 fit within 21 in.
    [{ maxWidthIn: 21 }, ['CL-A36', 'CL-B36']],
    [{ ratedOnly: true }, ['CL-C36']],
  ])('when filtered by %j, then only %j remain', async (filter, expected) => {
    const res = await get({ outdoorUnitId: hp(), ...filter }).expect(200);
    expect(models(res.body.items).sort()).toEqual(expected);
  });
  it.each([
    ['cl-a36', 'CL-A36'], // case
    ['CLA36', 'CL-A36'], // missing dash
    ['CL-A6', 'CL-A36'], // a missing character
    ['cl a36', 'CL-A36'], // a space for the dash
  ])('when q is "%s", then %s is found', async (q, model) => {
    const res = await get({ outdoorUnitId: hp(), q }).expect(200);
    expect(models(res.body.items)).toContain(model);
  });
  it('when q names a brand or a description word, then only those coils come back', async () => {
    const brand = await get({ outdoorUnitId: hp(), q: 'eastmere' }).expect(200);
    expect(models(brand.body.items).sort()).toEqual(['CL-C36', 'CL-E36']);
    const word = await get({ outdoorUnitId: hp(), q: 'slab' }).expect(200);
    expect(models(word.body.items)).toEqual(['CL-B36']);
  });
  it('when q matches only an incompatible coil, then nothing is returned', async () => {
    const res = await get({ outdoorUnitId: hp(), q: 'CL-454' }).expect(200);
    expect(models(res.body.items)).not.toContain('CL-454');
  });
});

describe('GET /api/coils/compatible: best price and sort', () => {
  const byModel = async (query: Record<string, string | number | boolean> = {}) => {
    const res = await get({ outdoorUnitId: idOf['QX-HP36'], ...query }).expect(200);
    return { items: res.body.items as CompatibleCoil[], map: new Map((res.body.items as CompatibleCoil[]).map((i) => [i.coil.model, i])) };
  };

  it('when distributors list prices, then per distributor the latest not in the future counts, the cheapest wins, ties go to the most recent, and a reverted import stops counting', async () => {
    // Constructed prices (invented distributors). 2099 rows are scheduled (future), never current.
    await load('prices', 'model,price,effective_from\nCL-A36,900.00,2024-01-01\nCL-A36,700.00,2025-01-01\nCL-A36,100.00,2099-01-01\nCL-B36,500.00,2024-06-01\n', 'Harbor Supply');
    await load('prices', 'model,price,effective_from\nCL-A36,650.00,2023-01-01\nCL-A36,800.00,2025-02-01\nCL-B36,500.00,2025-03-01\n', 'Ridge Parts');
    const first = await byModel();
    const items = first.items;
    let map = first.map;
    // Harbor's latest current CL-A36 is 700 (2025-01-01; 100 is future), Ridge's is 800 (2025-02-01): 700 wins.
    expect(map.get('CL-A36')!.bestPrice).toEqual({ distributor: 'Harbor Supply', priceCents: 70000, effectiveFrom: '2025-01-01' });
    // Both at 500.00: the more recent (Ridge, 2025-03-01) wins the tie.
    expect(map.get('CL-B36')!.bestPrice).toEqual({ distributor: 'Ridge Parts', priceCents: 50000, effectiveFrom: '2025-03-01' });
    // No price for CL-E36: absent, and sorted after priced coils with the same rating and cautions.
    expect(map.get('CL-E36')!.bestPrice).toBeUndefined();
    expect(items[0].coil.model).toBe('CL-C36'); // rated first even with no price
    const unrated = items.slice(1).filter((i) => i.findings.filter((f) => f.severity === 'caution').length === 0);
    const prices = unrated.map((i) => i.bestPrice?.priceCents ?? Infinity);
    expect([...prices].sort((a, b) => a - b)).toEqual(prices);

    // A later Harbor file drops CL-A36 to 600; reverting it brings 700 back.
    const cut = await load('prices', 'model,price,effective_from\nCL-A36,600.00,2025-06-01\n', 'Harbor Supply');
    ({ map } = await byModel());
    expect(map.get('CL-A36')!.bestPrice?.priceCents).toBe(60000);
    await revertImport(t.ctx, cut.id);
    ({ map } = await byModel());
    expect(map.get('CL-A36')!.bestPrice?.priceCents).toBe(70000);
  });

  it('when inStock=true, then only coils with a current price remain', async () => {
    const { items } = await byModel({ inStock: true });
    expect(items.every((i) => i.bestPrice)).toBe(true);
    expect(models(items)).not.toContain('CL-E36');
  });
});
