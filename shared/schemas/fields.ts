import { z } from 'zod';

/**
 * Field helpers shared by catalog CSV rows, nameplate specs and API bodies.
 * Each accepts the typed value (JSON) or its text form (a CSV cell), so one schema serves both.
 */

export const REFRIGERANT_IDS = ['R-22', 'R-410A', 'R-32', 'R-454B', 'R-407C'] as const;
export type RefrigerantId = (typeof REFRIGERANT_IDS)[number];

const REFRIGERANT_BY_COMPACT = new Map<string, RefrigerantId>(REFRIGERANT_IDS.map((id) => [id.slice(2), id]));
/** Memo of spellings already seen: the rules engine asks for the same few names on every check. */
const refrigerantNameMemo = new Map<string, string>();

/** Normalises "r410a", "410A", "R-410A" to the trade spelling "R-410A"; other input is returned unchanged. */
export function normalizeRefrigerantName(value: unknown): unknown {
  if (typeof value !== 'string') return value;
  const known = refrigerantNameMemo.get(value);
  if (known !== undefined) return known;
  const compact = value.trim().toUpperCase().replace(/[\s-]/g, '').replace(/^R/, '');
  const result = REFRIGERANT_BY_COMPACT.get(compact) ?? value.trim();
  if (refrigerantNameMemo.size < 512) refrigerantNameMemo.set(value, result);
  return result;
}

/** Normalised model key for matching: upper case with spaces, dashes, dots and slashes removed. */
export function normalizeModel(model: string): string {
  return model.toUpperCase().replace(/[\s\-./]/g, '');
}

const TRUE_WORDS = new Set(['yes', 'y', 'true', '1']);
const FALSE_WORDS = new Set(['no', 'n', 'false', '0']);

/** Empty strings (blank CSV cells) become undefined so optional fields stay optional. */
export function blankToUndefined(value: unknown): unknown {
  if (value === null) return undefined;
  if (typeof value === 'string' && value.trim() === '') return undefined;
  return value;
}

function toBoolean(value: unknown): unknown {
  const v = blankToUndefined(value);
  if (typeof v !== 'string') return v;
  const word = v.trim().toLowerCase();
  if (TRUE_WORDS.has(word)) return true;
  if (FALSE_WORDS.has(word)) return false;
  return v;
}

/** Plain decimals ("3", "-2.5", ".5") or thousands grouped by commas ("1,234.5"); no hex, exponents or words. */
const DECIMAL_TEXT = /^[+-]?(?:\d+(?:\.\d+)?|\.\d+|\d{1,3}(?:,\d{3})+(?:\.\d+)?)$/;

/**
 * A number cell's text to its value, strictly: `Number()` alone would read "0x3" as 3, "1e1" as 10,
 * "2,5" (a decimal comma) as 25 once commas are dropped. Typed (JSON) numbers pass unchanged.
 */
export function parseDecimalText(value: string): number | undefined {
  const t = value.trim();
  if (!DECIMAL_TEXT.test(t)) return undefined;
  const n = Number(t.replace(/,/g, ''));
  return Number.isFinite(n) ? n : undefined;
}

function toNumber(value: unknown): unknown {
  const v = blankToUndefined(value);
  if (typeof v !== 'string') return v;
  return parseDecimalText(v) ?? v;
}

function toList(value: unknown): unknown {
  const v = blankToUndefined(value);
  if (typeof v !== 'string') return v;
  return v
    .split(';')
    .map((s) => s.trim())
    .filter((s) => s !== '');
}

export const refrigerant = z.preprocess(
  (v) => normalizeRefrigerantName(blankToUndefined(v)),
  z.enum(REFRIGERANT_IDS, { error: `refrigerant must be one of ${REFRIGERANT_IDS.join(', ')}` }),
);

export const refrigerantList = z.preprocess(toList, z.array(refrigerant).min(1));

export const yesNo = z.preprocess(toBoolean, z.boolean({ error: 'expected yes or no' }));

/** A number within [min, max]; accepts "1,234.5" text. */
export function numberIn(min: number, max: number) {
  return z.preprocess(
    toNumber,
    z.number({ error: 'expected a plain number such as 2.5 (no letters, exponents or decimal commas)' }).min(min, { error: `must be at least ${min}` }).max(max, { error: `must be at most ${max}` }),
  );
}

export function numberListIn(min: number, max: number) {
  return z.preprocess(toList, z.array(numberIn(min, max)).min(1));
}

export function enumOf<const T extends readonly [string, ...string[]]>(values: T) {
  return z.preprocess(
    (v) => {
      const b = blankToUndefined(v);
      return typeof b === 'string' ? b.trim().toLowerCase() : b;
    },
    z.enum(values, { error: `must be one of ${values.join(', ')}` }),
  );
}

export const text = (max = 200) => z.preprocess((v) => {
  const b = blankToUndefined(v);
  return typeof b === 'string' ? b.trim() : b;
}, z.string().min(1).max(max));

const DAYS_IN_MONTH = [31, 29, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
const ISO_DATE_SHAPE = /^\d{4}-\d{2}-\d{2}$/;

/** Whether a YYYY-MM-DD text names a real day (Gregorian leap years); arithmetic, not Date: it runs per CSV row. */
export function isRealIsoDate(value: string): boolean {
  if (!ISO_DATE_SHAPE.test(value)) return false;
  const year = Number(value.slice(0, 4));
  const month = Number(value.slice(5, 7));
  const day = Number(value.slice(8, 10));
  if (month < 1 || month > 12 || day < 1) return false;
  const leap = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
  return day <= (month === 2 && !leap ? 28 : DAYS_IN_MONTH[month - 1]);
}

/** A calendar date as YYYY-MM-DD that exists (2025-02-30 and 2025-13-45 do not). */
export const isoDate = z.preprocess(
  (v) => {
    const b = blankToUndefined(v);
    return typeof b === 'string' ? b.trim() : b;
  },
  z
    .string({ error: 'expected a date as YYYY-MM-DD' })
    .regex(ISO_DATE_SHAPE, { error: 'expected a date as YYYY-MM-DD' })
    // Only a well-formed date is checked against the calendar, so a malformed one reports one problem.
    .refine((v) => !ISO_DATE_SHAPE.test(v) || isRealIsoDate(v), { error: 'not a real calendar date' }),
);

/** Whether a model (or part) name has at least one letter or digit: "-./" normalises to nothing and matches nothing. */
export function hasModelCharacters(model: string): boolean {
  return /[\p{L}\p{N}]/u.test(model);
}

/** Tube outside diameter in inches (residential line sets run 1/4 to 1-5/8). */
export const tubeOdIn = numberIn(0.125, 2.125);
export const tons = numberIn(0.5, 25);
