import Papa from 'papaparse';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { IMPORT_KINDS } from '../../../shared/schemas/equipment';
import { errorsCsv, neutralizeCell } from '../../../server/imports/csv-export';
import { createTestApp, type TestApp } from '../../helpers/test-app';

// CSV injection: OWASP "CSV Injection" guidance lists =, +, -, @, tab (0x09) and CR (0x0D) as the
// leading characters a spreadsheet may run as a formula; a leading apostrophe makes the cell text.
const FORMULA_START = /^[=+\-@\t\r]/;

describe('neutralizeCell', () => {
  it.each(['=1+2', '+SUM(A1)', '-3', '@cmd', '\t=x', '\r=x'])('when a cell is %j, then it gets a leading apostrophe', (cell) => {
    expect(neutralizeCell(cell)).toBe(`'${cell}`);
  });
  it.each(['QV-24', '12.50', '', "'already", ' =spaced'])('when a cell is %j, then it is left as it is', (cell) => {
    expect(neutralizeCell(cell)).toBe(cell);
  });
  it('when errors are written as CSV, then no parsed cell starts like a formula', () => {
    const csv = errorsCsv([{ row: 2, column: '=col', value: '@x', message: '-reason' }]);
    const cells = Papa.parse<string[]>(csv.trim()).data.flat();
    expect(cells.filter((c) => FORMULA_START.test(c))).toEqual([]);
  });
});

describe('CSV the app downloads', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(async () => {
    await t.close();
  });
  it.each(IMPORT_KINDS)('when the %s template is downloaded, then no cell starts like a formula', async (kind) => {
    const res = await request(t.app).get(`/api/imports/templates/${kind}`).set('Authorization', `Bearer ${t.tokenFor('admin')}`).buffer(true).parse((r, cb) => {
      let body = '';
      r.on('data', (c: Buffer) => (body += c.toString()));
      r.on('end', () => cb(null, body));
    });
    expect(res.status).toBe(200);
    const cells = Papa.parse<string[]>(String(res.body).trim()).data.flat();
    expect(cells.length).toBeGreaterThan(2);
    expect(cells.filter((c) => FORMULA_START.test(c))).toEqual([]);
  });
});
