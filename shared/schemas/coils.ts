import { z } from 'zod';
import type { Finding, Verdict } from '../rules/types';
import { COIL_CONFIGURATIONS, COIL_MATERIALS, type IndoorCoilSpec, type RatedCombinationSpec } from './equipment';

/** Query and response of GET /api/coils/compatible (DESIGN.md §5, contract). */

/** A catalog id in a query: only the canonical spelling of a positive integer ("12", never "012" or "0x3"). */
const canonicalId = z
  .string()
  .regex(/^[1-9][0-9]{0,15}$/, { error: 'Expected a positive whole number.' })
  .transform(Number)
  .refine(Number.isSafeInteger, { error: 'Expected a positive whole number.' });

/** A query flag: only `true` or `false` (absent means false). */
const flag = z.enum(['true', 'false'], { error: 'Expected true or false.' }).transform((v) => v === 'true');

/** Empty query values count as absent, so a form can send every field. */
const optional = <T extends z.ZodType>(schema: T) => z.preprocess((v) => (v === '' ? undefined : v), schema.optional());

/** Most items one answer holds. */
export const COILS_MAX_LIMIT = 200;
export const COILS_DEFAULT_LIMIT = 50;

export const CoilsQuerySchema = z
  .object({
    outdoorUnitId: canonicalId,
    airHandlerId: optional(canonicalId),
    q: optional(z.string().trim().max(100)),
    limit: z.preprocess(
      (v) => (v === '' || v === undefined ? String(COILS_DEFAULT_LIMIT) : v),
      z
        .string()
        .regex(/^[1-9][0-9]{0,3}$/, { error: 'Expected a whole number from 1.' })
        .transform(Number)
        .refine((n) => n <= COILS_MAX_LIMIT, { error: `At most ${COILS_MAX_LIMIT}.` }),
    ),
    state: optional(z.string().trim().toUpperCase().regex(/^[A-Z]{2}$/, { error: 'state must be a two-letter code' })),
    configuration: optional(z.enum(COIL_CONFIGURATIONS)),
    material: optional(z.enum(COIL_MATERIALS)),
    cased: optional(flag),
    maxWidthIn: optional(
      z
        .string()
        .regex(/^\d{1,2}(\.\d{1,3})?$/, { error: 'Expected a width in inches, e.g. 17.5.' })
        .transform(Number)
        .refine((n) => n > 0, { error: 'Expected a width above 0.' }),
    ),
    ratedOnly: optional(flag),
    inStock: optional(flag),
    includeIncompatible: optional(flag),
  })
  .strict();
export type CoilsQuery = z.infer<typeof CoilsQuerySchema>;

/** The cheapest current distributor price of a coil. */
export interface CoilBestPrice {
  distributor: string;
  priceCents: number;
  effectiveFrom: string;
}

/** One coil with its verdict against the chosen outdoor unit (and air handler). */
export interface CompatibleCoil {
  coil: IndoorCoilSpec & { id: number; model: string };
  verdict: Verdict;
  findings: Finding[];
  ratedCombination?: RatedCombinationSpec;
  /** Whether the rated figures meet the site state's regional minimum; absent without a state or figures. */
  meetsRegionalMinimum?: boolean;
  bestPrice?: CoilBestPrice;
}

export interface CompatibleCoilsResponse {
  items: CompatibleCoil[];
  /** Every item that matched before `limit` cut the list. */
  total: number;
}
