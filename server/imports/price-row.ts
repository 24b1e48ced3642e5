import { z } from 'zod';
import { blankToUndefined, isoDate, isRealIsoDate, text } from '../../shared/schemas/fields';
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

function trimmed(v: string | undefined): string | undefined {
  if (v === undefined) return undefined;
  const t = v.trim();
  return t === '' ? undefined : t;
}

/**
 * The common case of a price row without zod: a row every field of which is plainly valid gives the
 * same values priceRowSchema would; anything else gives null and goes through the schema for its
 * reasons. Zod costs most of a 100k-row import (a property test keeps the two in step).
 */
export function quickPriceRow(input: Record<string, string>, today: string, convention: DecimalConvention | null): PriceRow | null {
  if (input.price === undefined) return null;
  const read = priceCents(input.price, convention);
  if ('error' in read) return null;
  return quickPriceFields(input.model, read.cents, input.effectiveFrom, input.description, input.currency, today);
}

// A file repeats a few effective dates many times: each is checked once, and every row shares one
// string for it (100k copies of "2025-01-01" are a lot of garbage-collector work). Bounded: cleared when full.
const KNOWN_DATES = new Map<string, string>();
const MAX_KNOWN_DATES = 4096;

/** The date itself (a shared copy) when it is a real ISO calendar date, else undefined. */
function realDate(value: string): string | undefined {
  const known = KNOWN_DATES.get(value);
  if (known !== undefined) return known;
  if (!isRealIsoDate(value)) return undefined;
  if (KNOWN_DATES.size >= MAX_KNOWN_DATES) KNOWN_DATES.clear();
  KNOWN_DATES.set(value, value);
  return value;
}

/**
 * quickPriceRow for a price already read to cents (PriceColumn reads the column once): the row's
 * cells as written (undefined when blank), or null when any of them needs the schema.
 */
export function quickPriceFields(
  modelCell: string | undefined,
  cents: number,
  effectiveCell: string | undefined,
  descriptionCell: string | undefined,
  currencyCell: string | undefined,
  today: string,
): PriceRow | null {
  const model = trimmed(modelCell);
  if (model === undefined || model.length > 80) return null;
  if (!Number.isInteger(cents) || cents <= 0 || cents > MAX_PRICE_CENTS) return null;
  const effectiveFrom = realDate(trimmed(effectiveCell) ?? today);
  if (effectiveFrom === undefined) return null;
  const description = trimmed(descriptionCell);
  if (description !== undefined && description.length > 300) return null;
  const currency = trimmed(currencyCell)?.toUpperCase() ?? 'USD';
  if (currency !== 'USD' && !/^[A-Z]{3}$/.test(currency)) return null;
  // The same keys, in the same order, as the schema's output (a row with no description has no key for it).
  return description !== undefined ? { model, price: cents, effectiveFrom, description, currency } : { model, price: cents, effectiveFrom, currency };
}
