import { z } from 'zod';
import type { CheckResult, Verdict } from '../rules/types';
import { ControlsSchema, ElectricalSchema, LineSetSchema, partRef, SiteSchema } from './check';
import { AirHandlerSpecSchema, IndoorCoilSpecSchema, MeteringDeviceSpecSchema } from './equipment';
import { isoDate, REFRIGERANT_IDS } from './fields';

/**
 * Priced options on a job, repair or replace, and the customer proposal (issue 11, items 2–4).
 * Estimators and admins only: a tech gets 403 on every route below (job reads stay as they are).
 *
 * Routes and shapes:
 * - GET    /api/jobs/:id/options?<EnergyQuery>       → { items: OptionView[], chosenOptionId: number | null }
 * - POST   /api/jobs/:id/options  OptionInput         → 201 OptionView   (a 4th option → 409 `option-limit`)
 * - GET    /api/options/:id?<EnergyQuery>            → OptionView
 * - PATCH  /api/options/:id  OptionPatch { revision, …any OptionInput field, reprice? } → OptionView (409 when stale)
 * - DELETE /api/options/:id                           → 204
 * - POST   /api/options/:id/choose                    → { chosenOptionId, option: OptionView } (the customer's choice, on the job)
 * - POST   /api/options/:id/make-record               → 201 the draft matched-system record (as POST /api/jobs/:id/systems)
 * - POST   /api/jobs/:id/repair-or-replace  RepairOrReplaceInput → RepairOrReplaceResult
 * - GET    /api/jobs/:id/proposal.pdf?<EnergyQuery>&paper=letter|a4 → application/pdf
 * - POST   /api/jobs/:id/proposal/send  ProposalSendBody → { emailId, messageId, to } (mail failure → 502, nothing recorded as sent; a second send within a minute → 409 `recently-sent` unless `confirm: true`)
 * - GET    /api/settings/shop → ShopSettingsResponse; PUT /api/settings/shop ShopSettings (admin) → ShopSettingsResponse
 *
 * Money is whole cents throughout. Lines for catalog parts are priced from the best current price
 * when saved and kept as that SNAPSHOT; `currentPriceDiffers` says when today's best price is different.
 */

// ---------- lines ----------

/** Equipment lines come from the option's parts; the rest are extras and free lines. */
export const EQUIPMENT_LINE_KINDS = ['outdoor-unit', 'indoor-coil', 'air-handler', 'metering'] as const;
export const EXTRA_LINE_KINDS = ['filter-drier', 'line-set', 'pad', 'disconnect', 'refrigerant', 'material', 'fee'] as const;
export const OPTION_LINE_KINDS = [...EQUIPMENT_LINE_KINDS, ...EXTRA_LINE_KINDS] as const;
export type OptionLineKind = (typeof OPTION_LINE_KINDS)[number];
export const PRICE_SOURCES = ['price-list', 'typed'] as const;
export type PriceSource = (typeof PRICE_SOURCES)[number];

/**
 * One line as the estimator sends it. With `unitPriceCents` the price is kept as given (a `price-list`
 * line sent back unchanged keeps its snapshot); without it, `model` (or the part's model for equipment
 * lines) is priced from today's best price list entry. `taxable` defaults to true except for `fee`.
 */
export const OptionLineInputSchema = z
  .object({
    kind: z.enum(OPTION_LINE_KINDS),
    description: z.string().trim().max(200).optional(),
    model: z.string().trim().min(1).max(80).optional(),
    /** Each, ft of line set, or pounds of refrigerant. */
    quantity: z.number().positive().max(10000),
    unitPriceCents: z.number().int().min(0).max(100_000_000).optional(),
    priceSource: z.enum(PRICE_SOURCES).optional(),
    distributor: z.string().trim().max(120).optional(),
    effectiveFrom: isoDate.optional(),
    taxable: z.boolean().optional(),
    // What the view adds to a line: accepted so a line can be sent back as it was shown, and ignored.
    extendedCents: z.unknown().optional(),
    currentPriceDiffers: z.unknown().optional(),
    currentPrice: z.unknown().optional(),
  })
  .strict()
  .transform(({ extendedCents: _e, currentPriceDiffers: _d, currentPrice: _c, ...line }) => line);
export type OptionLineInput = z.infer<typeof OptionLineInputSchema>;

/** A saved line (the snapshot) with what the view adds. */
export interface OptionLine {
  kind: OptionLineKind;
  description: string;
  model?: string;
  quantity: number;
  unitPriceCents: number;
  priceSource: PriceSource;
  distributor?: string;
  effectiveFrom?: string;
  taxable: boolean;
  /** round(quantity × unitPriceCents), half up to the cent. */
  extendedCents: number;
  /** Today's best price differs from the snapshot (price-list lines only; false for typed lines). */
  currentPriceDiffers: boolean;
  /** Today's best price when the line has a model with a current price; null when none. */
  currentPrice?: { distributor: string; priceCents: number; effectiveFrom: string } | null;
}

// ---------- option input ----------

const percent = (max: number) => z.number().min(0).max(max);

export const OptionInputSchema = z
  .object({
    /** The estimator's own words; no fixed tier names. */
    name: z.string().trim().min(1, { error: 'name the option' }).max(60),
    notes: z.string().trim().max(2000).optional(),
    /** The new outdoor unit: a catalog id. */
    outdoor: z.object({ id: z.number().int().positive() }).strict(),
    /** A catalog coil, or the existing coil kept (`kept: true`, by id or typed spec). */
    indoorCoil: partRef(IndoorCoilSpecSchema).optional(),
    /** The air handler or furnace, kept or new. */
    airHandler: partRef(AirHandlerSpecSchema).optional(),
    metering: partRef(MeteringDeviceSpecSchema).optional(),
    /** Facts for the check beyond the job's state (which comes from the job). */
    site: SiteSchema.omit({ state: true }).optional(),
    lineSet: LineSetSchema.optional(),
    electrical: ElectricalSchema.optional(),
    controls: ControlsSchema.optional(),
    /** Extras and free lines; equipment lines are added for every new catalog part unless one of that kind is given. */
    lines: z.array(OptionLineInputSchema).max(40).optional(),
    laborHours: z.number().min(0).max(500).optional(),
    /** Defaults to the shop's labor rate. */
    laborRateCents: z.number().int().min(0).max(10_000_000).optional(),
    /** Give markupPct or targetMarginPct (not both); neither → the shop default. */
    markupPct: percent(500).optional(),
    targetMarginPct: percent(95).optional(),
    /** Applied to taxable (equipment and material) lines at their selling price; labor is not taxed. */
    taxRatePct: percent(30).optional(),
  })
  .strict()
  .refine((o) => o.markupPct === undefined || o.targetMarginPct === undefined, {
    error: 'give a markup or a target margin, not both',
    path: ['targetMarginPct'],
  });
export type OptionInput = z.infer<typeof OptionInputSchema>;

const nullable = <T extends z.ZodType>(s: T) => z.union([z.null(), s]).optional();

/** PATCH /api/options/:id: the revision the edit started from and any field; null clears; `reprice` takes today's prices. */
export const OptionPatchSchema = z
  .object({
    revision: z.number().int().positive(),
    name: z.string().trim().min(1).max(60).optional(),
    notes: nullable(z.string().trim().max(2000)),
    outdoor: z.object({ id: z.number().int().positive() }).strict().optional(),
    indoorCoil: nullable(partRef(IndoorCoilSpecSchema)),
    airHandler: nullable(partRef(AirHandlerSpecSchema)),
    metering: nullable(partRef(MeteringDeviceSpecSchema)),
    site: nullable(SiteSchema.omit({ state: true })),
    lineSet: nullable(LineSetSchema),
    electrical: nullable(ElectricalSchema),
    controls: nullable(ControlsSchema),
    lines: z.array(OptionLineInputSchema).max(40).optional(),
    laborHours: z.number().min(0).max(500).optional(),
    laborRateCents: z.number().int().min(0).max(10_000_000).optional(),
    markupPct: nullable(percent(500)),
    targetMarginPct: nullable(percent(95)),
    taxRatePct: percent(30).optional(),
    /** Re-price every price-list line at today's best price. */
    reprice: z.boolean().optional(),
  })
  .strict();
export type OptionPatch = z.infer<typeof OptionPatchSchema>;

// ---------- energy query (existing system) ----------

const queryNumber = (min: number, max: number) =>
  z.preprocess(
    (v) => (v === '' || v === undefined ? undefined : typeof v === 'string' ? Number(v) : v),
    z.number().min(min).max(max).optional(),
  );

/**
 * The existing system and the energy assumptions, as query parameters (GET options, proposal.pdf) or in a
 * body (repair-or-replace, proposal/send). Missing SEER2/HSPF2 are estimated from `existingAgeYears`
 * (the assumption is stated in words); hours and the kWh price default to the shop settings.
 */
export const EnergyQuerySchema = z.object({
  existingSeer2: queryNumber(5, 40),
  existingHspf2: queryNumber(3, 15),
  existingAgeYears: queryNumber(0, 60),
  /** The existing system is a heat pump (heating energy compared); defaults to the new unit's type. */
  existingHeatPump: z.preprocess((v) => (v === 'true' ? true : v === 'false' ? false : v), z.boolean().optional()),
  coolingHours: queryNumber(0, 8760),
  heatingHours: queryNumber(0, 8760),
  centsPerKwh: queryNumber(0, 200),
});
export type EnergyQuery = z.infer<typeof EnergyQuerySchema>;

// ---------- option view ----------

export interface OptionPrice {
  /** Σ extended cents of every line. */
  materialCostCents: number;
  /** round(laborHours × laborRateCents). */
  laborCostCents: number;
  costCents: number;
  pricing: 'markup' | 'margin';
  /** The markup or target margin applied, percent. */
  pct: number;
  /** Selling price of the lines (taxable and not) and of labor, each rounded to the cent. */
  materialSellCents: number;
  laborSellCents: number;
  subtotalCents: number;
  /** Selling price of the taxable lines, the rate and the tax (rounded half up to the cent). */
  taxableSellCents: number;
  taxRatePct: number;
  taxCents: number;
  /** What the customer pays: subtotal + tax. */
  totalCents: number;
  /** (subtotal − cost) / subtotal × 100, one decimal. */
  grossMarginPct: number;
  /** Plain words: how it was computed, tax scope and rounding. */
  notes: string[];
}

/** One season's kWh per year and cost per year in cents, existing system vs this option. */
export interface EnergyLeg {
  existingKwh: number;
  newKwh: number;
  savingKwh: number;
  existingCostCents: number;
  newCostCents: number;
  savingCents: number;
}

/** Why the cooling cost and payback are left out when the option has no SEER2 to divide by. */
export const NO_RATED_SEER2 = 'no rated SEER2 for this combination';

export interface EnergyComparison {
  /** Cooling, existing vs this option; null (never zeros) when the combination has no rated SEER2. */
  cooling: EnergyLeg | null;
  heating?: EnergyLeg;
  /** null when the cooling figure is not worked out. */
  annualSavingCents: number | null;
  /** Customer price / annual saving, one decimal; null when nothing is saved or the saving is not worked out. */
  paybackYears: number | null;
  paybackText: string;
  /** Present when a figure is left out, saying why (NO_RATED_SEER2). */
  notComputed?: string;
  existing: { seer2: number; hspf2?: number; basis: 'given' | 'estimated-from-age' | 'assumed-default' };
  /** Every assumption in words (hours, kWh price, capacity, existing efficiency). */
  assumptions: string[];
}

export interface OptionPartSummary {
  id?: number;
  model: string;
  brand?: string;
  kept: boolean;
  description: string;
}

export interface OptionView {
  id: number;
  jobId: number;
  name: string;
  notes: string | null;
  revision: number;
  chosen: boolean;
  input: OptionInput;
  parts: { outdoor: OptionPartSummary; indoorCoil?: OptionPartSummary; airHandler?: OptionPartSummary; metering?: OptionPartSummary };
  systemType: 'ac' | 'heat-pump';
  lines: OptionLine[];
  laborHours: number;
  laborRateCents: number;
  markupPct: number | null;
  targetMarginPct: number | null;
  taxRatePct: number;
  price: OptionPrice;
  /** The shared engine on the option's parts with the job's state. */
  check: Pick<CheckResult, 'verdict' | 'rulesVersion' | 'findings' | 'coverage'>;
  efficiency: {
    source: 'rated-combination' | 'outdoor-unit';
    sourceText: string;
    seer2?: number;
    eer2?: number;
    hspf2?: number;
    coolingBtuh: number;
    reference?: string;
  };
  regional: {
    state: string;
    regionName?: string;
    minimum?: { seer2: number; eer2?: number; hspf2?: number; basis: string };
    /** null when the state or the figures are unknown. */
    meets: boolean | null;
    shortfalls: string[];
  };
  rebateTiers: { name: string; met: boolean; missing: string[] }[];
  energy: EnergyComparison;
  createdAt: string;
  updatedAt: string;
}

export interface OptionListResponse {
  items: OptionView[];
  chosenOptionId: number | null;
}

export const MAX_OPTIONS_PER_JOB = 3;

// ---------- repair or replace ----------

export const RepairOrReplaceInputSchema = EnergyQuerySchema.extend({
  ageYears: z.number().min(0).max(60),
  repairQuoteCents: z.number().int().min(0).max(100_000_000),
  refrigerant: z.enum(REFRIGERANT_IDS).optional(),
  refrigerantLbs: z.number().min(0).max(200).optional(),
  refrigerantCentsPerLb: z.number().int().min(0).max(1_000_000).optional(),
}).strict();
export type RepairOrReplaceInput = z.infer<typeof RepairOrReplaceInputSchema>;

export interface RepairOrReplaceResult {
  ageYears: number;
  repairQuoteCents: number;
  refrigerant?: string;
  refrigerantLbs: number;
  refrigerantCentsPerLb: number;
  refrigerantCostCents: number;
  /** Repair quote + refrigerant. */
  repairTotalCents: number;
  ruleOfThumb: {
    /** Age (years) × repair total (dollars). */
    product: number;
    threshold: number;
    exceeds: boolean;
    basis: 'common practice (no source)';
    text: string;
  };
  options: {
    optionId: number;
    name: string;
    totalCents: number;
    /** null when not worked out (no rated SEER2 for this combination). */
    annualSavingCents: number | null;
    paybackYears: number | null;
    verdict: Verdict;
  }[];
  recommendation: 'replace' | 'repair' | 'either';
  recommendationText: string;
  /** Each step of the arithmetic in words and numbers. */
  arithmetic: string[];
  /** E.g. old refrigerant scarcity, the safety note. */
  notes: string[];
}

// ---------- proposal ----------

export const ProposalSendSchema = z
  .object({
    to: z.email({ error: 'enter a valid e-mail' }).max(254),
    paper: z.enum(['letter', 'a4']).optional(),
    energy: EnergyQuerySchema.optional(),
    /** Send even though the proposal went out under a minute ago (otherwise 409 `recently-sent`). */
    confirm: z.boolean().optional(),
  })
  .strict();
export type ProposalSend = z.infer<typeof ProposalSendSchema>;

export interface ProposalSendResult {
  emailId: number;
  messageId: string | null;
  to: string;
}

// ---------- shop settings ----------

/** A rebate tier the shop tracks (its own list; demo tiers are invented). */
export const ShopRebateTierSchema = z
  .object({
    name: z.string().trim().min(1).max(80),
    seer2: z.number().min(8).max(40).optional(),
    eer2: z.number().min(5).max(25).optional(),
    hspf2: z.number().min(4).max(15).optional(),
    note: z.string().trim().max(300).optional(),
  })
  .strict()
  .refine((t) => t.seer2 !== undefined || t.eer2 !== undefined || t.hspf2 !== undefined, {
    error: 'a rebate tier needs at least one of SEER2, EER2, HSPF2',
    path: ['seer2'],
  });
export type ShopRebateTier = z.infer<typeof ShopRebateTierSchema>;

export const ShopSettingsSchema = z
  .object({
    laborRateCents: z.number().int().min(0).max(10_000_000),
    pricing: z.enum(['markup', 'margin']),
    markupPct: percent(500),
    targetMarginPct: percent(95),
    taxRatePct: percent(30),
    /** Replace when age (years) × repair (dollars) exceeds this: common practice (no source). */
    repairReplaceThreshold: z.number().min(0).max(1_000_000),
    coolingHoursPerYear: z.number().min(0).max(8760),
    heatingHoursPerYear: z.number().min(0).max(8760),
    centsPerKwh: z.number().min(0).max(200),
    rebateTiers: z.array(ShopRebateTierSchema).max(20),
  })
  .strict();
export type ShopSettings = z.infer<typeof ShopSettingsSchema>;

export interface ShopSettingsResponse {
  settings: ShopSettings;
  defaults: ShopSettings;
  updatedAt: string | null;
}
