import { describe, expect, it } from 'vitest';
import { AppError } from '../../../server/lib/errors';
import { parseImportFile } from '../../../server/imports/import-parse';

const TODAY = '2025-06-01';
const csv = (text: string) => Buffer.from(text, 'utf8');
const parse = (kind: Parameters<typeof parseImportFile>[1], text: string | Buffer, mapping?: Record<string, string>) =>
  parseImportFile(typeof text === 'string' ? csv(text) : text, kind, mapping, TODAY);

function failure(fn: () => unknown): AppError {
  try {
    fn();
  } catch (e) {
    if (e instanceof AppError) return e;
    throw e;
  }
  throw new Error('expected an AppError');
}

const OUTDOOR_HEADER = 'model,brand,system_type,refrigerant,nominal_tons,seer2';

describe('importer: awkward price files', () => {
  it('when the file starts with a UTF-8 BOM and uses CRLF, then the first header still matches and rows parse', () => {
    const parsed = parse('prices', '\uFEFFmodel,price\r\nAB-100,10.00\r\nAB-200,20.50\r\n');
    expect(parsed.errors).toEqual([]);
    expect(parsed.rows.map((r) => r.values.price)).toEqual([1000, 2050]);
  });

  it('when prices are written "$1,234.50" in quoted fields, then they become integer cents', () => {
    const parsed = parse('prices', 'model,price,description\n"AB-100","$1,234.50","Coil, cased, 3 ton"\n');
    expect(parsed.rows[0].values).toMatchObject({ price: 123450, description: 'Coil, cased, 3 ton', currency: 'USD', effectiveFrom: TODAY });
  });

  it('when the file has blank lines and trailing delimiters, then they are skipped and row numbers stay file lines', () => {
    const parsed = parse('prices', 'model,price,\n\nAB-100,10,\n   \nAB-200,abc,\n');
    expect(parsed.rowCount).toBe(2);
    expect(parsed.rows).toHaveLength(1);
    expect(parsed.rows[0].line).toBe(3);
    expect(parsed.errors).toEqual([{ row: 5, column: 'price', value: 'abc', message: expect.stringContaining('price') }]);
  });

  it('when a model appears twice for the same effective date, then the second is rejected naming the first; another date is fine', () => {
    const parsed = parse('prices', 'model,price,effective_from\nAB-100,10,2025-01-01\nab 100,11,2025-01-01\nAB-100,12,2025-09-01\n');
    expect(parsed.rows).toHaveLength(2);
    expect(parsed.errors).toEqual([{ row: 3, column: 'model', value: 'ab 100', message: expect.stringContaining('row 2') }]);
  });

  it('when headers are in another case, order and spelling, then aliases match them', () => {
    const parsed = parse('prices', 'Unit Price,Part #,EFFECTIVE DATE\n99.99,XY-1,2025-02-03\n');
    expect(parsed.rows[0].values).toMatchObject({ model: 'XY-1', price: 9999, effectiveFrom: '2025-02-03' });
  });

  it('when the price column has a name we do not know, then a 422 lists the columns found and the fields needed; a mapping fixes it', () => {
    const text = 'Item Code,Net Each\nXY-1,5\n';
    const error = failure(() => parse('prices', text));
    expect(error.status).toBe(422);
    expect(error.details).toMatchObject({ foundColumns: ['Item Code', 'Net Each'], missingFields: ['model', 'price'] });
    const mapped = parse('prices', text, { 'Item Code': 'model', 'Net Each': 'price' });
    expect(mapped.rows[0].values).toMatchObject({ model: 'XY-1', price: 500 });
  });

  it('when an effective date is not a real date or the price is negative, then the row is rejected with its column', () => {
    const parsed = parse('prices', 'model,price,effective_from\nA1,10,2025-02-30\nA2,-5,2025-02-01\n');
    expect(parsed.errors.map((e) => [e.row, e.column])).toEqual([
      [2, 'effective_from'],
      [3, 'price'],
    ]);
  });

  it('when effective dates fall on leap days, then the Gregorian rule decides which are real', () => {
    // Gregorian calendar (ISO 8601): leap years divide by 4, except centuries not divisible by 400.
    const parsed = parse('prices', 'model,price,effective_from\nL1,10,2024-02-29\nL2,10,2000-02-29\nL3,10,2025-02-29\nL4,10,2100-02-29\nL5,10,2025-04-31\nL6,10,2025-13-01\n');
    expect(parsed.errors.map((e) => e.row)).toEqual([4, 5, 6, 7]);
  });
});

describe('importer: awkward catalog files', () => {
  it('when a refrigerant is unknown or tons are negative or absurd, then each row is rejected with column and value', () => {
    const parsed = parse(
      'outdoor-units',
      `${OUTDOOR_HEADER}\nOK-1,Brandless,ac,410A,3,15.2\nBAD-1,Brandless,ac,R-12,3,14\nBAD-2,Brandless,ac,R-32,-2,14\nBAD-3,Brandless,ac,R-32,300,14\n`,
    );
    expect(parsed.rows.map((r) => r.values.refrigerant)).toEqual(['R-410A']);
    expect(parsed.errors.map((e) => [e.row, e.column, e.value])).toEqual([
      [3, 'refrigerant', 'R-12'],
      [4, 'nominal_tons', '-2'],
      [5, 'nominal_tons', '300'],
    ]);
    expect(parsed.rejected).toBe(3);
  });

  it('when a required column is missing, then the file is refused with a 422 naming it', () => {
    const error = failure(() => parse('outdoor-units', 'model,brand,refrigerant,nominal_tons\nA,B,R-32,3\n'));
    expect(error.status).toBe(422);
    expect(error.message).toContain('system_type');
  });

  it('when the same model is written twice with different punctuation, then the second is a duplicate', () => {
    const parsed = parse('outdoor-units', `${OUTDOOR_HEADER}\nQX-30.A,B,ac,R-32,3,15\nqx 30/a,B,ac,R-32,3,15\n`);
    expect(parsed.errors).toEqual([{ row: 3, column: 'model', value: 'qx 30/a', message: expect.stringContaining('row 2') }]);
  });

  it('when coil lists and yes/no cells use the usual spellings, then they parse to lists and booleans', () => {
    const parsed = parse(
      'indoor-coils',
      'Model,Min Tons,Max Tons,Refrigerants,Metering Type,Cased,A2L Listed\nC-1,2,3,"R-32; 454B",txv,Y,true\n',
    );
    expect(parsed.rows[0].values).toMatchObject({ refrigerants: ['R-32', 'R-454B'], cased: true, a2lListed: true });
  });

  it('when a quoted field spans two lines, then the next row keeps its true line number', () => {
    const parsed = parse('outdoor-units', `model,system_type,refrigerant,nominal_tons,description\nA1,ac,R-32,2,"two\nlines"\nA2,ac,R-99,2,x\n`);
    expect(parsed.errors[0].row).toBe(4);
  });
});

describe('importer: unreadable files', () => {
  it('when the file is empty, then it is a 422 saying a header row is expected', () => {
    const error = failure(() => parse('prices', ''));
    expect(error.status).toBe(422);
    expect(error.message).toMatch(/header row/);
  });

  it('when a binary file is named .csv, then it is a 415', () => {
    const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d, 0x49, 0x48, 0x44, 0x52]);
    expect(failure(() => parse('prices', png)).status).toBe(415);
  });

  it('when a file is over 20 MB, then it is a 413', () => {
    const big = Buffer.alloc(20 * 1024 * 1024 + 1, 'a');
    expect(failure(() => parse('prices', big)).status).toBe(413);
  });

  it('when a file holds only a header, then it is a 422', () => {
    expect(failure(() => parse('prices', 'model,price\n')).status).toBe(422);
  });
});
