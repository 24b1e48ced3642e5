import { ShopSettingsSchema, type ShopSettings, type ShopSettingsResponse } from '@/shared/schemas/options';

/** Number settings as the admin types them; money in dollars, everything else in the unit its label names. */
export type ShopNumberKey = Exclude<keyof ShopSettings, 'pricing' | 'rebateTiers'>;

export interface ShopTierDraft {
  name: string;
  seer2: string;
  eer2: string;
  hspf2: string;
  note: string;
}

export interface ShopSettingsDraft {
  pricing: ShopSettings['pricing'];
  values: Record<ShopNumberKey, string>;
  tiers: ShopTierDraft[];
}

export interface ShopField {
  key: ShopNumberKey;
  label: string;
  /** Typed in dollars, stored in cents. */
  money?: boolean;
}

export const LABOR_FIELD: ShopField = { key: 'laborRateCents', label: 'Labor rate ($ per hour)', money: true };
export const MARKUP_FIELD: ShopField = { key: 'markupPct', label: 'Markup on cost (%)' };
export const MARGIN_FIELD: ShopField = { key: 'targetMarginPct', label: 'Target margin of the price (%)' };
export const TAX_FIELD: ShopField = { key: 'taxRatePct', label: 'Sales tax rate (%)' };
export const REPAIR_FIELD: ShopField = { key: 'repairReplaceThreshold', label: 'Repair-or-replace threshold (age in years × repair in $)' };
export const ENERGY_FIELDS: ShopField[] = [
  { key: 'coolingHoursPerYear', label: 'Cooling full-load hours per year' },
  { key: 'heatingHoursPerYear', label: 'Heating full-load hours per year' },
  { key: 'centsPerKwh', label: 'Electricity price (¢ per kWh)' },
];
const ALL_FIELDS: ShopField[] = [LABOR_FIELD, MARKUP_FIELD, MARGIN_FIELD, TAX_FIELD, REPAIR_FIELD, ...ENERGY_FIELDS];
const fieldOf = (key: string) => ALL_FIELDS.find((f) => f.key === key);

export const MAX_REBATE_TIERS = 20;
/** `short` is what a narrow phone shows on the box (under a "Minimum ratings" caption); `label` is read aloud and used in errors. */
export const TIER_FIELDS = [
  { key: 'name', label: 'Tier name', short: 'Tier name' },
  { key: 'seer2', label: 'Minimum SEER2', short: 'SEER2' },
  { key: 'eer2', label: 'Minimum EER2', short: 'EER2' },
  { key: 'hspf2', label: 'Minimum HSPF2', short: 'HSPF2' },
  { key: 'note', label: 'Note (optional)', short: 'Note (optional)' },
] as const satisfies readonly { key: keyof ShopTierDraft; label: string; short: string }[];

/** Cents as dollars to type: 9500 → "95.00". */
export function dollarsText(cents: number): string {
  return (cents / 100).toFixed(2);
}

/** Cents as dollars to read: 10000000 → "$100,000.00". */
export function dollarsWords(cents: number): string {
  return `$${(cents / 100).toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 })}`;
}

/** Typed dollars as whole cents: "$1,250.5" → 125050; blank → undefined; not a number → NaN (the schema refuses it). */
export function centsOf(text: string): number | undefined {
  const t = text.trim().replace(/^\$/, '').replace(/,/g, '').trim();
  if (t === '') return undefined;
  const n = Number(t);
  // Rounded to the cent so 95.1 (9509.999… in binary) is 9510.
  return Number.isFinite(n) ? Math.round(n * 100) : NaN;
}

function numberOf(text: string): number | undefined {
  const t = text.trim().replace(/,/g, '');
  if (t === '') return undefined;
  return Number(t);
}

const asText = (n: number | undefined) => (n === undefined ? '' : String(n));

/** A field's value shown the way it is typed: money in dollars. */
export function valueText(field: ShopField, value: number): string {
  return field.money ? dollarsText(value) : String(value);
}

/** The hint under a field: its default in the field's own unit. */
export function defaultHint(field: ShopField, defaults: ShopSettings | undefined): string | undefined {
  if (!defaults) return undefined;
  const value = defaults[field.key];
  return field.money ? `Default ${dollarsWords(value)}` : `Default ${value}`;
}

export function draftOf(data: Pick<ShopSettingsResponse, 'settings'>): ShopSettingsDraft {
  const s = data.settings;
  return {
    pricing: s.pricing,
    values: Object.fromEntries(ALL_FIELDS.map((f) => [f.key, valueText(f, s[f.key])])) as Record<ShopNumberKey, string>,
    tiers: s.rebateTiers.map((t) => ({ name: t.name, seer2: asText(t.seer2), eer2: asText(t.eer2), hspf2: asText(t.hspf2), note: t.note ?? '' })),
  };
}

export const emptyTier = (): ShopTierDraft => ({ name: '', seer2: '', eer2: '', hspf2: '', note: '' });

/** The parts of a zod issue the words need. */
interface IssueLike {
  code: string;
  message: string;
  path: PropertyKey[];
  minimum?: unknown;
  maximum?: unknown;
}

const plainLabel = (label: string) => label.replace(/\s*\([^)]*\)\s*$/, '').toLowerCase();

/** A schema issue in plain words, in the unit the admin typed (dollars for money). */
export function plainShopError(issue: IssueLike, raw: string | undefined, label: string | undefined, money = false): string {
  const name = label ? plainLabel(label) : undefined;
  const bound = (v: unknown) => (money && typeof v === 'number' ? dollarsWords(v) : String(v));
  if (raw === undefined || raw.trim() === '') return name ? `Required: enter the ${name}.` : 'Required.';
  if (issue.code === 'invalid_type') return money ? 'Enter an amount in dollars, such as 95 or 87.50.' : 'Enter a number, such as 15 or 12.5.';
  if (issue.code === 'too_small') return `Too small: enter ${bound(issue.minimum)} or more.`;
  if (issue.code === 'too_big') return issue.path.at(-1) === 'name' || issue.path.at(-1) === 'note' ? 'Too long: shorten it.' : `Too big: enter ${bound(issue.maximum)} or less.`;
  const t = issue.message.trim().replace(/\.$/, '');
  return `${t.charAt(0).toUpperCase()}${t.slice(1)}.`;
}

/** Validates the draft with the server's own schema; errors keyed by path ("laborRateCents", "rebateTiers.0.seer2"). */
export function bodyOf(draft: ShopSettingsDraft): { ok: true; body: ShopSettings } | { ok: false; errors: Record<string, string> } {
  const body: Record<string, unknown> = { pricing: draft.pricing, rebateTiers: draft.tiers.map(tierBody) };
  for (const f of ALL_FIELDS) body[f.key] = f.money ? centsOf(draft.values[f.key]) : numberOf(draft.values[f.key]);
  const result = ShopSettingsSchema.safeParse(body);
  if (result.success) return { ok: true, body: result.data };
  const errors: Record<string, string> = {};
  for (const issue of result.error.issues) {
    const key = issue.path.join('.');
    if (errors[key]) continue;
    const [head, index, tierKey] = issue.path;
    if (head === 'rebateTiers' && typeof index === 'number' && typeof tierKey === 'string') {
      const tier = draft.tiers[index];
      const raw = tier?.[tierKey as keyof ShopTierDraft];
      // The "at least one figure" rule sits on seer2 with the box empty: its own words, not "required".
      errors[key] = issue.code === 'custom' ? plainShopError(issue, 'given', undefined) : plainShopError(issue, raw, TIER_FIELDS.find((t) => t.key === tierKey)?.label);
    } else {
      const field = fieldOf(String(head));
      errors[key] = plainShopError(issue, field ? draft.values[field.key] : 'given', field?.label, field?.money);
    }
  }
  return { ok: false, errors };
}

function tierBody(t: ShopTierDraft) {
  const tier: Record<string, unknown> = { name: t.name };
  for (const k of ['seer2', 'eer2', 'hspf2'] as const) {
    const n = numberOf(t[k]);
    if (n !== undefined) tier[k] = n;
  }
  if (t.note.trim() !== '') tier.note = t.note;
  return tier;
}
