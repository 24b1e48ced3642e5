import fc from 'fast-check';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { detectConvention, priceCents, PriceColumn, readPriceCell } from '../../../server/imports/price-number';
import { priceRowSchema, quickPriceRow } from '../../../server/imports/price-row';
import { createTestApp, type TestApp } from '../../helpers/test-app';

// Property-based checks of the importer (fast-check, bounded runs so `npm test` stays fast).
// Grouping and decimal marks per convention: Unicode CLDR number symbols (en-US, de-DE, fr-FR, de-CH).

const SEED_RUNS = { numRuns: 200 };

/** Writes integer cents the way a distributor of the given convention might. */
function formatCents(cents: number, convention: 'point' | 'comma', group: string, decimals: boolean, dollar: boolean): string {
  const whole = Math.floor(cents / 100);
  const frac = String(cents % 100).padStart(2, '0');
  const digits = String(whole);
  const grouped = group === '' ? digits : digits.replace(/\B(?=(\d{3})+(?!\d))/g, group);
  const text = decimals || cents % 100 !== 0 ? `${grouped}${convention === 'point' ? '.' : ','}${frac}` : grouped;
  return dollar && convention === 'point' ? `$${text}` : text;
}

describe('price number properties', () => {
  it('when any amount is written in a convention and read under that convention, then the same cents come back', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 99_999_999 }),
        fc.constantFrom('point' as const, 'comma' as const),
        fc.boolean(),
        fc.boolean(),
        fc.nat(3),
        (cents, convention, decimals, dollar, groupPick) => {
          const group = convention === 'point' ? ['', ',', ' ', "'"][groupPick] : ['', '.', ' ', "'"][groupPick];
          const cell = formatCents(cents, convention, group, decimals, dollar);
          expect(priceCents(cell, convention)).toEqual({ cents });
        },
      ),
      SEED_RUNS,
    );
  });

  it('when a column is written in one convention, then the detected convention is never the other one', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 1, max: 9_999_999 }), { minLength: 1, maxLength: 30 }), fc.constantFrom('point' as const, 'comma' as const), (amounts, convention) => {
        const group = convention === 'point' ? ',' : '.';
        const detected = detectConvention(amounts.map((c) => formatCents(c, convention, group, false, false))).convention;
        expect(detected === null || detected === convention).toBe(true);
      }),
      SEED_RUNS,
    );
  });

  it('when any text is read, then a cell that decides a convention has no other reading, and none throws', () => {
    fc.assert(
      fc.property(fc.stringMatching(/^[-$0-9.,' a-z]{0,14}$/), (cell) => {
        const reading = readPriceCell(cell);
        if (reading.kind === 'decides') {
          const other = reading.convention === 'point' ? 'comma' : 'point';
          expect(priceCents(cell, other)).toHaveProperty('error');
        }
      }),
      { numRuns: 500 },
    );
  });

  it('when a price column is read once, then it detects what detectConvention does and each quick cell is what priceCents gives', () => {
    const cell = fc.oneof(fc.stringMatching(/^[-$0-9.,' a-z]{0,14}$/), fc.constantFrom('', ' ', '12.50', '$1,234.50', '12,50', '1.234,50', '1,234', '1234', ' 99 '));
    fc.assert(
      fc.property(fc.array(cell, { maxLength: 40 }), fc.constantFrom('point' as const, 'comma' as const, null), (cells, convention) => {
        const column = new PriceColumn(cells.length, (i) => cells[i]);
        expect(column.detected).toEqual(detectConvention(cells));
        cells.forEach((c, i) => {
          const quick = column.centsAt(i, convention);
          // A cell the column does not vouch for goes through priceCents itself, so only vouched cells must agree.
          if (quick !== undefined) expect(priceCents(c, convention)).toEqual({ cents: quick });
        });
      }),
      { numRuns: 500 },
    );
  });

  it('when a row takes the quick path, then it gives exactly what the zod schema gives', () => {
    const cell = fc.oneof(fc.string({ maxLength: 12 }), fc.constantFrom('', ' ', '12.50', '1,234.50', '12,50', '2025-02-29', '2024-02-29', 'usd', 'EUR', ' x '));
    fc.assert(
      fc.property(fc.record({ model: cell, price: cell, effectiveFrom: cell, description: cell, currency: cell }, { requiredKeys: ['model', 'price'] }), fc.constantFrom('point' as const, 'comma' as const, null), (record, convention) => {
        // The importer leaves blank cells out of a row's input (import-parse.ts), so do the same here.
        const input = Object.fromEntries(Object.entries(record).filter(([, v]) => v !== undefined && v.trim() !== '')) as Record<string, string>;
        const quick = quickPriceRow(input, '2025-06-01', convention);
        if (quick === null) return;
        expect(priceRowSchema('2025-06-01', convention).parse(input)).toEqual(quick);
      }),
      { numRuns: 500 },
    );
  });
});

describe('importer API under arbitrary files', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(async () => {
    await t.close();
  });
  const count = async () => (await t.ctx.dataSource.query('SELECT (SELECT COUNT(*) FROM price_entries) AS prices, (SELECT COUNT(*) FROM outdoor_units) AS outdoor, (SELECT COUNT(*) FROM imports) AS imports'))[0] as { prices: number; outdoor: number; imports: number };

  // Cells drawn from the hostile classes: formulas, quotes, separators, control characters, long text, numbers in odd forms.
  const hostileCell = fc.oneof(
    fc.string({ maxLength: 20 }),
    fc.constantFrom('=1+2', '+SUM(A1)', '-3', '@cmd', '"', '""', ',', ';', '\t', '\r', '\n', '0x3', '1e1', 'Infinity', '2025-02-30', '-./', '12,50', '1.234,50', '1,234', 'R-454B', 'ac', '3'),
    fc.string({ minLength: 200, maxLength: 400 }),
  );
  const quote = (c: string) => (/[",\r\n;\t]/.test(c) || c.trim() !== c ? `"${c.replace(/"/g, '""')}"` : c);
  const headerPick = fc.constantFrom('model,price', 'model,price,effective_from', 'model,system_type,refrigerant,nominal_tons', 'price', 'model,model,price', '');

  it('when arbitrary files are committed, then there is never a 5xx and a refused upload changes nothing', async () => {
    let tried = 0;
    await fc.assert(
      fc.asyncProperty(headerPick, fc.array(fc.array(hostileCell, { minLength: 1, maxLength: 5 }), { minLength: 0, maxLength: 8 }), fc.boolean(), async (header, rows, raw) => {
        tried++;
        const text = `${header}\n${rows.map((r) => (raw ? r.join(',') : r.map(quote).join(','))).join('\n')}\n`;
        const kind = header.includes('system_type') ? 'outdoor-units' : 'prices';
        const before = await count();
        const res = await request(t.app)
          .post('/api/imports')
          .set('Authorization', `Bearer ${t.tokenFor('admin')}`)
          .field('kind', kind)
          .field('distributor', 'Fuzz Supply')
          .field('dryRun', 'false')
          .attach('file', Buffer.from(text), { filename: 'fuzz.csv', contentType: 'text/csv' });
        expect(res.status).toBeLessThan(500);
        const after = await count();
        if (res.status !== 201) {
          expect(res.body.error).toMatchObject({ code: expect.any(String), message: expect.any(String) });
          expect(after).toEqual(before);
          for (const e of res.body.error.details?.errors ?? []) {
            expect(e.row).toBeGreaterThanOrEqual(2);
            expect(e.message.length).toBeGreaterThan(0);
            expect(e.value.length).toBeLessThanOrEqual(80);
          }
        } else {
          const { counts } = res.body.import;
          expect(counts.rejected).toBe(0);
          expect(after.imports).toBe(before.imports + 1);
          const written = kind === 'prices' ? after.prices - before.prices : after.outdoor - before.outdoor;
          expect(written).toBe(counts.inserted);
        }
      }),
      { numRuns: 120 },
    );
    expect(tried).toBeGreaterThanOrEqual(120);
  });
});
