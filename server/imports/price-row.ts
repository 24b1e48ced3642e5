import { z } from 'zod';
import { blankToUndefined, isoDate, text } from '../../shared/schemas/fields';
import { todayIso } from '../catalog/dates';
import { priceCents, type DecimalConvention } from './price-number';

/** The fields of a price file (DESIGN.md §6), in template order. */
export const PRICE_FIELDS = ['model', 'price', 'effectiveFrom', 'description', 'currency'] as const;
export const PRICE_REQUIRED = ['model', 'price'] as const;

const MAX_PRICE_CENTS = 1_000_000_00; // a million dollars: anything above is a typo, not a part

/** A price cell (text under the file's decimal convention, or a typed number of dollars) to integer cents. */
function priceField(convention: DecimalConvention | null) {
  return z
    .unknown()
    .transform((value, ctx) => {
      const v = blankToUndefined(value);
      if (typeof v === 'number' && Number.isFinite(v)) return Math.round(v * 100);
      if (typeof v !== 'string') {
        ctx.addIssue({ code: 'custom', message: 'expected a price such as 1234.50 or $1,234.50' });
        return z.NEVER;
      }
      const read = priceCents(v, convention);
      if ('error' in read) {
        ctx.addIssue({ code: 'custom', message: read.error });
        return z.NEVER;
      }
      return read.cents;
    })
    .pipe(
      z
        .number()
        .int()
        .positive({ error: 'price must be more than zero' })
        .max(MAX_PRICE_CENTS, { error: 'price must be at most 1,000,000.00' }),
    );
}

/** One price row; `today` fills a blank effective date; `convention` is the file's decimal mark (null: unknown). */
export function priceRowSchema(today = todayIso(), convention: DecimalConvention | null = null) {
  return z.object({
    model: text(80),
    // Keyed by the field name so errors point at the price column; the value is integer cents.
    price: priceField(convention),
    effectiveFrom: z.preprocess((v) => blankToUndefined(v) ?? today, isoDate),
    description: text(300).optional(),
    currency: z.preprocess(
      (v) => {
        const b = blankToUndefined(v);
        return typeof b === 'string' ? b.trim().toUpperCase() : (b ?? 'USD');
      },
      z.string().regex(/^[A-Z]{3}$/, { error: 'currency must be a three-letter code such as USD' }),
    ),
  });
}
export type PriceRow = z.infer<ReturnType<typeof priceRowSchema>>;
