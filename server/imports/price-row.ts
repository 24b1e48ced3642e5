import { z } from 'zod';
import { blankToUndefined, isoDate, text } from '../../shared/schemas/fields';
import { todayIso } from '../catalog/dates';

/** The fields of a price file (DESIGN.md §6), in template order. */
export const PRICE_FIELDS = ['model', 'price', 'effectiveFrom', 'description', 'currency'] as const;
export const PRICE_REQUIRED = ['model', 'price'] as const;

const MAX_PRICE_CENTS = 1_000_000_00; // a million dollars: anything above is a typo, not a part

/** "1234.5", "$1,234.50", " 1 234,00 " → integer cents; anything else is left for zod to refuse. */
export function priceToCents(value: unknown): unknown {
  const v = blankToUndefined(value);
  if (typeof v === 'number') return Math.round(v * 100);
  if (typeof v !== 'string') return v;
  const cleaned = v.trim().replace(/^\$|^USD\s*/i, '').replace(/[,\s]/g, '');
  if (!/^-?\d+(\.\d+)?$/.test(cleaned)) return v;
  return Math.round(Number(cleaned) * 100);
}

const DAYS_IN_MONTH = [31, 29, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

/** A YYYY-MM-DD that names a real day (Gregorian leap years); arithmetic, not Date: it runs per row. */
function realDate(value: string) {
  const year = Number(value.slice(0, 4));
  const month = Number(value.slice(5, 7));
  const day = Number(value.slice(8, 10));
  if (month < 1 || month > 12 || day < 1) return false;
  const leap = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
  return day <= (month === 2 && !leap ? 28 : DAYS_IN_MONTH[month - 1]);
}

/** One price row; `today` fills a blank effective date. */
export function priceRowSchema(today = todayIso()) {
  return z.object({
    model: text(80),
    // Keyed by the field name so errors point at the price column; the value is integer cents.
    price: z.preprocess(
      priceToCents,
      z
        .number({ error: 'expected a price such as 1234.50 or $1,234.50' })
        .int()
        .positive({ error: 'price must be more than zero' })
        .max(MAX_PRICE_CENTS, { error: 'price must be at most 1,000,000.00' }),
    ),
    effectiveFrom: z.preprocess((v) => blankToUndefined(v) ?? today, isoDate.refine(realDate, { error: 'not a real calendar date' })),
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
