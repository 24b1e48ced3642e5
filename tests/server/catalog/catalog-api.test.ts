import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { uploadImport } from '../../../server/imports/imports.service';
import { currentPrices } from '../../../server/catalog/prices.service';
import { findRatedCombinations, toSpec } from '../../../server/catalog/catalog-specs';
import { OutdoorUnit } from '../../../server/catalog/outdoor-unit.entity';
import { createTestApp, type TestApp } from '../../helpers/test-app';

let t: TestApp;
const load = (kind: Parameters<typeof uploadImport>[1]['kind'], csv: string, distributor?: string) =>
  uploadImport(t.ctx, { buffer: Buffer.from(csv), fileName: `${kind}.csv`, kind, distributor, dryRun: false, userId: t.users.admin.id });

beforeAll(async () => {
  t = await createTestApp();
  // Invented equipment; engineering values are placeholders, the tests check lookup and filtering only.
  await load('outdoor-units', ['model,brand,description,system_type,refrigerant,nominal_tons', 'QA-36-X,Quillon,Quiet condenser,ac,R-454B,3', 'QA-24-X,Quillon,,ac,R-454B,2', 'QH-36-Y,Quillon,,heat-pump,R-410A,3'].join('\n'));
  await load('indoor-coils', ['model,brand,min_tons,max_tons,refrigerants,metering_type', 'QC-30,Quillon,2,3,R-454B;R-32,txv', 'QC-50,Quillon,4,5,R-410A,piston'].join('\n'));
  await load('rated-combinations', ['outdoor_model,indoor_model,seer2', 'qa 36 x,QC-30,16.1'].join('\n'));
  await load('prices', 'model,price,effective_from\nQA-36-X,3000,2020-01-01\nQA-36-X,3100,2021-01-01\nQA-36-X,9999,2099-01-01\n', 'Alpha Supply');
  await load('prices', 'model,price,effective_from\nQA-36-X,2950,2020-06-01\n', 'Beta Parts');
});
afterAll(async () => {
  await t.close();
});

const get = (url: string, role: 'tech' | 'estimator' | 'admin' = 'tech') => request(t.app).get(url).set('Authorization', `Bearer ${t.tokenFor(role)}`);

describe('catalog API', () => {
  it('when a tech lists outdoor units, then it gets a page with items, total, page and pageSize', async () => {
    const res = await get('/api/catalog/outdoor-units?pageSize=2').expect(200);
    expect(res.body).toMatchObject({ total: 3, page: 1, pageSize: 2 });
    expect(res.body.items).toHaveLength(2);
    expect(res.body.items[0]).not.toHaveProperty('importId');
    expect(res.body.items[0]).not.toHaveProperty('normalizedModel');
  });

  it('when q has a typo or a different punctuation, then fuzzy search still finds the model', async () => {
    const res = await get('/api/catalog/outdoor-units?q=QA36X').expect(200);
    expect(res.body.items[0].model).toBe('QA-36-X');
    const desc = await get('/api/catalog/outdoor-units?q=quiet%20condensr').expect(200);
    expect(desc.body.items.map((i: { model: string }) => i.model)).toContain('QA-36-X');
  });

  it('when filtered by refrigerant and tons, then outdoor units match exactly and coils by listing and range', async () => {
    const units = await get('/api/catalog/outdoor-units?refrigerant=454B&tons=3').expect(200);
    expect(units.body.items.map((i: { model: string }) => i.model)).toEqual(['QA-36-X']);
    const coils = await get('/api/catalog/indoor-coils?refrigerant=R-32&tons=2.5').expect(200);
    expect(coils.body.items.map((i: { model: string }) => i.model)).toEqual(['QC-30']);
    const none = await get('/api/catalog/indoor-coils?refrigerant=R-410A&tons=3').expect(200);
    expect(none.body.total).toBe(0);
  });

  it('when an item is opened, then it has its current price per distributor (not the future one) and its rated combinations', async () => {
    const list = await get('/api/catalog/outdoor-units?q=QA-36-X').expect(200);
    const res = await get(`/api/catalog/outdoor-units/${list.body.items[0].id}`, 'estimator').expect(200);
    expect(res.body.item.model).toBe('QA-36-X');
    expect(res.body.prices).toEqual([
      { distributor: 'Beta Parts', priceCents: 295000, currency: 'USD', effectiveFrom: '2020-06-01', inStock: true },
      { distributor: 'Alpha Supply', priceCents: 310000, currency: 'USD', effectiveFrom: '2021-01-01', inStock: true },
    ]);
    expect(res.body.ratedCombinations).toEqual([expect.objectContaining({ outdoorModel: 'qa 36 x', indoorModel: 'QC-30', seer2: 16.1 })]);
  });

  it('when a tech opens the same item, then each distributor shows as stocking it with no amount', async () => {
    const list = await get('/api/catalog/outdoor-units?q=QA-36-X').expect(200);
    const res = await get(`/api/catalog/outdoor-units/${list.body.items[0].id}`, 'tech').expect(200);
    expect(res.body.pricesVisible).toBe(false);
    expect(res.body.prices).toEqual([
      { distributor: 'Beta Parts', effectiveFrom: '2020-06-01', inStock: true },
      { distributor: 'Alpha Supply', effectiveFrom: '2021-01-01', inStock: true },
    ]);
    expect(JSON.stringify(res.body)).not.toMatch(/priceCents|295000|310000/);
  });

  it('when the kind is unknown, then 404; when parameters are bad, then 400; when signed out, then 401', async () => {
    await get('/api/catalog/widgets').expect(404);
    await get('/api/catalog/outdoor-units?tons=abc').expect(400);
    await get('/api/catalog/outdoor-units?pageSize=1000').expect(400);
    await get('/api/catalog/outdoor-units?refrigerant=R-12').expect(400);
    await get('/api/catalog/outdoor-units/0').expect(400);
    await get('/api/catalog/outdoor-units/99999').expect(404);
    await request(t.app).get('/api/catalog/outdoor-units').expect(401);
  });

  it('when a new import commits, then search sees the new item at once', async () => {
    await load('outdoor-units', 'model,system_type,refrigerant,nominal_tons\nZZ-NEW-1,ac,R-32,4\n');
    const res = await get('/api/catalog/outdoor-units?q=ZZ-NEW-1').expect(200);
    expect(res.body.items[0].model).toBe('ZZ-NEW-1');
  });

  it('when the service helpers are used, then toSpec drops bookkeeping, and prices and combinations resolve by normalised model', async () => {
    const unit = await t.ctx.dataSource.getRepository(OutdoorUnit).findOneByOrFail({ normalizedModel: 'QA36X' });
    const spec = toSpec('outdoor-units', unit);
    expect(spec).toEqual({ model: 'QA-36-X', brand: 'Quillon', description: 'Quiet condenser', systemType: 'ac', refrigerant: 'R-454B', nominalTons: 3 });
    expect((await currentPrices(t.ctx, 'qa-36-x', '2020-03-01')).map((p) => p.priceCents)).toEqual([300000]);
    expect(await findRatedCombinations(t.ctx, 'QA.36.X')).toEqual([{ outdoorModel: 'qa 36 x', indoorModel: 'QC-30', seer2: 16.1 }]);
  });
});
