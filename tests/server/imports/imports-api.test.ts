import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../helpers/test-app';

let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(async () => {
  await t.close();
});

const TABLES = ['outdoor_units', 'indoor_coils', 'air_handlers', 'metering_devices', 'rated_combinations', 'price_entries', 'distributors'];

/** Every catalog and price table's rows, for before/after comparison. */
async function snapshot() {
  const out: Record<string, unknown[]> = {};
  for (const table of TABLES) out[table] = await t.ctx.dataSource.query(`SELECT * FROM ${table} ORDER BY id`);
  return out;
}

function upload(fields: Record<string, string>, csv: string | Buffer, fileName = 'file.csv', role: 'admin' | 'tech' | 'estimator' = 'admin') {
  const req = request(t.app).post('/api/imports').set('Authorization', `Bearer ${t.tokenFor(role)}`);
  for (const [k, v] of Object.entries(fields)) req.field(k, v);
  return req.attach('file', Buffer.isBuffer(csv) ? csv : Buffer.from(csv), { filename: fileName, contentType: 'text/csv' });
}
const admin = (r: request.Test) => r.set('Authorization', `Bearer ${t.tokenFor('admin')}`);

const OUTDOOR = [
  'model,brand,system_type,refrigerant,nominal_tons,seer2,mca_amps,mocp_amps',
  'NV-24-A,Northvale,ac,R-454B,2,15.2,14,20',
  'NV-36-A,Northvale,ac,R-454B,3,15.2,19,30',
].join('\n');

describe('imports API', () => {
  it('when a preview is committed and then reverted, then the catalog and price tables are exactly as before', async () => {
    await upload({ kind: 'outdoor-units', dryRun: 'false' }, OUTDOOR).expect(201);
    await upload({ kind: 'prices', distributor: 'Harbor Supply', dryRun: 'false' }, 'model,price,effective_from\nNV-24-A,1500,2024-01-01\n').expect(201);
    const before = await snapshot();

    const changed = OUTDOOR.replace('NV-36-A,Northvale,ac,R-454B,3,15.2,19,30', 'NV-36-A,Northvale,ac,R-454B,3,16,19,30') + '\nNV-48-A,Northvale,ac,R-454B,4,15,26,40\n';
    const preview = await upload({ kind: 'outdoor-units', dryRun: 'true' }, changed).expect(201);
    expect(preview.body.import).toMatchObject({ status: 'preview', counts: { rows: 3, inserted: 1, updated: 1, unchanged: 1, rejected: 0 } });
    expect(await snapshot()).toEqual(before);

    const prices = await upload({ kind: 'prices', distributor: 'Harbor Supply', dryRun: 'true' }, 'model,price,effective_from\nNV-24-A,1600,2024-01-01\nNV-36-A,"$2,100.00",2024-01-01\nZZ-UNKNOWN,5,2024-01-01\n').expect(201);
    expect(prices.body.import.counts).toMatchObject({ rows: 3, inserted: 2, updated: 1, unmatched: 1 });

    const committed = await admin(request(t.app).post(`/api/imports/${preview.body.import.id}/commit`)).expect(200);
    expect(committed.body.import.status).toBe('committed');
    await admin(request(t.app).post(`/api/imports/${prices.body.import.id}/commit`)).expect(200);
    expect(await snapshot()).not.toEqual(before);

    await admin(request(t.app).post(`/api/imports/${prices.body.import.id}/revert`)).expect(200);
    await admin(request(t.app).post(`/api/imports/${preview.body.import.id}/revert`)).expect(200);
    expect(await snapshot()).toEqual(before);
  });

  it('when an earlier import is reverted while a later one changed its rows, then it is refused with 409', async () => {
    const first = await upload({ kind: 'outdoor-units', dryRun: 'false' }, OUTDOOR).expect(201);
    await upload({ kind: 'outdoor-units', dryRun: 'false' }, OUTDOOR.replace('15.2,14,20', '16,14,20')).expect(201);
    const res = await admin(request(t.app).post(`/api/imports/${first.body.import.id}/revert`)).expect(409);
    expect(res.body.error.code).toBe('conflict');
  });

  it('when a dryRun=false upload has one bad row, then nothing is written and the row error is returned', async () => {
    const before = await snapshot();
    const res = await upload({ kind: 'outdoor-units', dryRun: 'false' }, `${OUTDOOR}\nNV-60-A,Northvale,ac,R-12,5,15,30,50\n`).expect(422);
    expect(res.body.error.details.errors).toEqual([{ row: 4, column: 'refrigerant', value: 'R-12', message: expect.any(String) }]);
    expect(await snapshot()).toEqual(before);
    const history = await admin(request(t.app).get('/api/imports')).expect(200);
    expect(history.body.imports).toEqual([]);
  });

  it('when a preview with a rejected row is committed, then the valid rows land and the rejected one stays listed', async () => {
    const preview = await upload({ kind: 'outdoor-units', dryRun: 'true' }, `${OUTDOOR}\nBAD,Northvale,ac,R-32,0,15,30,50\n`).expect(201);
    expect(preview.body.import.counts).toMatchObject({ rows: 3, inserted: 2, rejected: 1 });
    const committed = await admin(request(t.app).post(`/api/imports/${preview.body.import.id}/commit`)).expect(200);
    expect(committed.body.import.errors).toHaveLength(1);
    expect(await t.ctx.dataSource.query('SELECT model FROM outdoor_units ORDER BY model')).toEqual([{ model: 'NV-24-A' }, { model: 'NV-36-A' }]);
  });

  it('when the same preview is committed twice, then the second is a 409; reverting a preview is a 409 too', async () => {
    const preview = await upload({ kind: 'outdoor-units', dryRun: 'true' }, OUTDOOR).expect(201);
    const id = preview.body.import.id;
    await admin(request(t.app).post(`/api/imports/${id}/revert`)).expect(409);
    await admin(request(t.app).post(`/api/imports/${id}/commit`)).expect(200);
    await admin(request(t.app).post(`/api/imports/${id}/commit`)).expect(409);
    await admin(request(t.app).post(`/api/imports/${id}/revert`)).expect(200);
    await admin(request(t.app).post(`/api/imports/${id}/revert`)).expect(409);
  });

  it('when a tech or an estimator uploads or lists, then it is 403; signed out it is 401', async () => {
    await upload({ kind: 'outdoor-units', dryRun: 'true' }, OUTDOOR, 'x.csv', 'tech').expect(403);
    await upload({ kind: 'outdoor-units', dryRun: 'true' }, OUTDOOR, 'x.csv', 'estimator').expect(403);
    await request(t.app).get('/api/imports').set('Authorization', `Bearer ${t.tokenFor('estimator')}`).expect(403);
    await request(t.app).get('/api/imports').expect(401);
  });

  it('when a distributor file needs a mapping, then the mapping is remembered and reused on the next upload', async () => {
    const file = 'Item Code,Net Each\nNV-24-A,12.5\n';
    const refused = await upload({ kind: 'prices', distributor: 'Ridge Parts', dryRun: 'true' }, file).expect(422);
    expect(refused.body.error.details.foundColumns).toEqual(['Item Code', 'Net Each']);
    await upload({ kind: 'prices', distributor: 'Ridge Parts', dryRun: 'true', mapping: JSON.stringify({ 'Item Code': 'model', 'Net Each': 'price' }) }, file).expect(201);
    const again = await upload({ kind: 'prices', distributor: 'Ridge Parts', dryRun: 'true' }, file).expect(201);
    expect(again.body.import).toMatchObject({ distributor: 'Ridge Parts', counts: { rows: 1, inserted: 1, unmatched: 1 } });
  });

  it('when files are unreadable or mis-typed, then the status says so (415, 422, 400)', async () => {
    await upload({ kind: 'prices', distributor: 'D', dryRun: 'true' }, Buffer.from([0x50, 0x4b, 0x03, 0x04, 0, 0, 0]), 'prices.csv').expect(415);
    await upload({ kind: 'prices', distributor: 'D', dryRun: 'true' }, 'model,price\nA,1\n', 'prices.xlsx').expect(415);
    await upload({ kind: 'prices', dryRun: 'true' }, 'model,price\nA,1\n').expect(422);
    await upload({ kind: 'gadgets', dryRun: 'true' }, 'model,price\nA,1\n').expect(422);
    await upload({ kind: 'prices', distributor: 'D', dryRun: 'true', mapping: '{not json' }, 'model,price\nA,1\n').expect(400);
    await upload({ kind: 'prices', distributor: 'D', dryRun: 'true' }, '').expect(422);
  });

  it('when history is listed, then it is newest first, and a template downloads as CSV', async () => {
    await upload({ kind: 'outdoor-units', dryRun: 'true' }, OUTDOOR).expect(201);
    await upload({ kind: 'prices', distributor: 'Harbor Supply', dryRun: 'true' }, 'model,price\nNV-24-A,1\n').expect(201);
    const list = await admin(request(t.app).get('/api/imports')).expect(200);
    expect(list.body.imports.map((i: { kind: string }) => i.kind)).toEqual(['prices', 'outdoor-units']);
    const one = await admin(request(t.app).get(`/api/imports/${list.body.imports[0].id}`)).expect(200);
    expect(one.body.import.distributor).toBe('Harbor Supply');
    const template = await admin(request(t.app).get('/api/imports/templates/prices')).expect(200);
    expect(template.headers['content-type']).toContain('text/csv');
    expect(template.text.split('\n')[0]).toContain('model');
  });
});
