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

function realDate(value: string) {
  const d = new Date(`${value}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === value;
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
