import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { sql } from '../../helpers/sql';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  // A small catalog so price rows have models to match (invented models).
  await upload({ kind: 'outdoor-units', dryRun: 'false' }, 'model,system_type,refrigerant,nominal_tons\nQV-24,ac,R-454B,2\nQV-36,ac,R-454B,3\n').expect(201);
});
afterAll(async () => {
  await t.close();
});

function upload(fields: Record<string, string>, body: string | Buffer, fileName = 'file.csv') {
  const req = request(t.app).post('/api/imports').set('Authorization', `Bearer ${t.tokenFor('admin')}`);
  for (const [k, v] of Object.entries(fields)) req.field(k, v);
  return req.attach('file', Buffer.isBuffer(body) ? body : Buffer.from(body), { filename: fileName, contentType: 'text/csv' });
}
const get = (path: string) => request(t.app).get(path).set('Authorization', `Bearer ${t.tokenFor('admin')}`);
const prices = (distributor: string, csv: string, extra: Record<string, string> = {}) => upload({ kind: 'prices', distributor, dryRun: 'true', ...extra }, csv);
const storedPrices = async (distributor: string) =>
  await sql<{ model: string; priceCents: number }>(t.ctx.dataSource, 'SELECT p.model, p."priceCents" FROM price_entries p JOIN distributors d ON d.id = p."distributorId" WHERE d.name = ? ORDER BY p.model', [distributor]);

describe('price number formats', () => {
  it('when a file writes decimal commas, then the preview says so and each amount is read in cents, never 100× off', async () => {
    // Decimal comma with point or space grouping: CLDR de-DE / fr-FR number symbols.
    const res = await prices('Comma Supply', 'model;price\nQV-24;12,50\nQV-36;"1.234,50"\nQV-48;" 1 234,00 "\n').expect(201);
    expect(res.body.import).toMatchObject({ decimalConvention: 'comma', decimalSource: 'file', counts: { rejected: 0 } });
    await request(t.app).post(`/api/imports/${res.body.import.id}/commit`).set('Authorization', `Bearer ${t.tokenFor('admin')}`).expect(200);
    expect(await storedPrices('Comma Supply')).toEqual([
      { model: 'QV-24', priceCents: 1250 },
      { model: 'QV-36', priceCents: 123450 },
      { model: 'QV-48', priceCents: 123400 },
    ]);
  });

  it('when "1,234" is the only kind of amount in a file, then it is rejected as ambiguous with its row', async () => {
    const res = await prices('Unknown Supply', 'model,price\nQV-24,"1,234"\nQV-36,99\n').expect(201);
    expect(res.body.import.decimalConvention).toBeNull();
    expect(res.body.import.errors).toEqual([{ row: 2, column: 'price', value: '1,234', message: expect.stringContaining('ambiguous') }]);
  });

  it('when the distributor is remembered as decimal comma, then its next file with only "1.234" reads 1,234.00', async () => {
    await prices('Remembered Supply', 'model;price\nQV-24;12,50\n').expect(201);
    const res = await prices('Remembered Supply', 'model;price\nQV-24;1.234\n').expect(201);
    expect(res.body.import).toMatchObject({ decimalConvention: 'comma', decimalSource: 'saved', counts: { rejected: 0 } });
  });

  it('when the admin chooses the decimal point, then a decimal-comma cell is refused rather than read', async () => {
    const res = await prices('Chosen Supply', 'model,price\nQV-24,"12,50"\nQV-36,"1,234"\n', { decimalConvention: 'point' }).expect(201);
    expect(res.body.import).toMatchObject({ decimalConvention: 'point', decimalSource: 'chosen' });
    expect(res.body.import.errors.map((e: { row: number }) => e.row)).toEqual([2]);
  });

  it('when one file mixes conventions, then the minority rows are rejected and none is stored at another scale', async () => {
    const res = await prices('Mixed Supply', 'model,price\nQV-24,12.50\nQV-36,7.25\nQV-48,"3,10"\n', { dryRun: 'false' }).expect(422);
    expect(res.body.error.details.errors).toEqual([{ row: 4, column: 'price', value: '3,10', message: expect.stringContaining('1.234,50') }]);
    expect(await storedPrices('Mixed Supply')).toEqual([]);
  });

  it('when decimalConvention is not a known word, then it is a 422', async () => {
    await prices('Any Supply', 'model,price\nQV-24,1\n', { decimalConvention: 'dot' }).expect(422);
  });
});

describe('catalog field validation', () => {
  it.each([
    ['manufacture_date', '2025-02-30'],
    ['manufacture_date', '2025-13-45'],
    ['nominal_tons', '0x3'],
    ['nominal_tons', '1e1'],
    ['nominal_tons', 'Infinity'],
    ['nominal_tons', ' 3 4'],
    ['nominal_tons', '2,5'],
    ['phase', '0x3'],
  ])('when an outdoor unit row has %s = %j, then that row is rejected with the column and a reason', async (column, value) => {
    const cells: Record<string, string> = { model: 'QV-60', system_type: 'ac', refrigerant: 'R-454B', nominal_tons: '5', manufacture_date: '2024-01-01', phase: '1' };
    cells[column] = value;
    const csv = `${Object.keys(cells).join(',')}\n${Object.values(cells).map((v) => `"${v}"`).join(',')}\n`;
    const res = await upload({ kind: 'outdoor-units', dryRun: 'true' }, csv).expect(201);
    expect(res.body.import.counts.rejected).toBe(1);
    expect(res.body.import.errors).toEqual([{ row: 2, column, value, message: expect.any(String) }]);
  });

  it.each(['-./', '***', ' - '])('when a model is %j (no letter or digit), then the row is rejected', async (model) => {
    const res = await upload({ kind: 'outdoor-units', dryRun: 'true' }, `model,system_type,refrigerant,nominal_tons\n"${model}",ac,R-454B,2\nQC-1,ac,R-454B,2\n`).expect(201);
    expect(res.body.import.counts).toMatchObject({ rows: 2, rejected: 1, inserted: 1 });
    expect(res.body.import.errors[0]).toMatchObject({ row: 2, column: 'model', message: expect.stringContaining('letter or digit') });
  });
});

describe('bounded error reports', () => {
  it('when 1,000 rows each carry a 19 KB bad cell, then 500 errors are kept, each value cut to 80 characters, with the exact total', async () => {
    const big = 'x'.repeat(19_000);
    const lines = ['model,price'];
    for (let i = 0; i < 1000; i++) lines.push(`QV-${i},${big}`);
    const res = await prices('Bounded Supply', `${lines.join('\n')}\n`).expect(201);
    const view = res.body.import;
    expect(view.counts.rejected).toBe(1000);
    expect(view.errorsTotal).toBe(1000);
    expect(view.errors).toHaveLength(500);
    expect(view.errors.every((e: { value: string }) => e.value.length <= 80)).toBe(true);
    expect(JSON.stringify(res.body).length).toBeLessThan(200_000);

    const page = await get(`/api/imports/${view.id}/errors?page=3&pageSize=100`).expect(200);
    expect(page.body).toMatchObject({ page: 3, pageSize: 100, stored: 500, errorsTotal: 1000 });
    expect(page.body.errors).toHaveLength(100);
    expect(page.body.errors[0].row).toBe(202);
    const past = await get(`/api/imports/${view.id}/errors?page=9&pageSize=100`).expect(200);
    expect(past.body.errors).toEqual([]);

    const history = await get('/api/imports').expect(200);
    expect(history.body.imports.every((i: Record<string, unknown>) => !('errors' in i))).toBe(true);
    expect(JSON.stringify(history.body).length).toBeLessThan(50_000);
  });

  it.each([
    ['page', '0'],
    ['page', '-1'],
    ['page', '1e1'],
    ['page', '0x2'],
    ['page', 'abc'],
    ['pageSize', '600'],
    ['pageSize', '0'],
    ['pageSize', '2.5'],
  ])('when the error page query has %s=%j, then it is a 400', async (name, value) => {
    const res = await prices('Paging Supply', 'model,price\nQV-24,abc\n').expect(201);
    const bad = await get(`/api/imports/${res.body.import.id}/errors?${name}=${value}`).expect(400);
    expect(bad.body.error.code).toBe('bad-parameters');
  });

  it('when the rejected rows are downloaded, then formula-looking cells are neutralised', async () => {
    const res = await prices('Formula Supply', 'model,price\nQV-24,=HYPERLINK("x")\nQV-36,+1+2\nQV-48,@SUM(A1)\nQV-60,-3\n').expect(201);
    const csv = await get(`/api/imports/${res.body.import.id}/errors.csv`).expect(200).expect('content-type', /text\/csv/);
    const text = csv.text;
    // OWASP CSV injection guidance: a cell starting with = + - @ tab or CR is prefixed with a quote.
    for (const cell of ['=HYPERLINK', '+1+2', '@SUM', '-3']) {
      expect(text).toContain(`"'${cell}`);
      expect(text).not.toMatch(new RegExp(`(^|,)"?\\${cell[0]}${cell.slice(1, 3)}`, 'm'));
    }
  });
});

describe('content sniffing', () => {
  it.each([
    ['a PDF', Buffer.concat([Buffer.from('%PDF-1.7\n'), Buffer.from('model,price\nQV-24,1\n')])],
    ['a ZIP', Buffer.concat([Buffer.from([0x50, 0x4b, 0x03, 0x04]), Buffer.from('model,price\n')])],
    ['a PNG', Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(64, 1)])],
    ['random bytes', Buffer.from(Array.from({ length: 4096 }, (_, i) => (i * 131 + 7) % 256))],
  ])('when %s is uploaded as prices.csv with a text/csv type, then it is a 415 with the error shape', async (_what, bytes) => {
    const res = await prices('Sniff Supply', bytes as unknown as string).expect(415);
    expect(res.body.error).toMatchObject({ code: 'not-csv', message: expect.any(String) });
  });

  it('when a UTF-16 file with a BOM arrives, then it is read as text', async () => {
    const text = 'model\tprice\nQV-24\t12.50\n';
    const res = await prices('Utf16 Supply', Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(text, 'utf16le')]) as unknown as string).expect(201);
    expect(res.body.import.counts).toMatchObject({ rows: 1, rejected: 0 });
  });

  it('when a Windows-1252 file with curly quotes arrives, then it is read as text', async () => {
    const bytes = Buffer.from('model,price,description\nQV-24,12.50,\x93Quiet\x94 model caf\xe9\n', 'latin1');
    const res = await prices('Latin Supply', bytes as unknown as string).expect(201);
    expect(res.body.import.counts).toMatchObject({ rows: 1, rejected: 0 });
  });
});
