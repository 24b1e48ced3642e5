import type { RuleSettings, TransitionRule } from '@/shared/rules/types';
import { RulesSettingsBodySchema, type RulesSettingsBody, type RulesSettingsResponse } from '@/shared/schemas/settings';

/** The admin form's text values: settings as strings, transition rules with editable dates and notes. */
export interface RulesDraft {
  settings: Record<string, string>;
  rules: TransitionRule[];
}

export const SETTING_FIELDS: { key: keyof Omit<RuleSettings, 'rebateTiers'>; label: string }[] = [
  { key: 'cfmPerTonMin', label: 'Airflow band, low (CFM per ton)' },
  { key: 'cfmPerTonMax', label: 'Airflow band, high (CFM per ton)' },
  { key: 'defaultTargetSubcoolingF', label: 'Default target subcooling (°F)' },
  { key: 'defaultMaxLineLengthFt', label: 'Default max line length (ft)' },
  { key: 'defaultMaxLiftFt', label: 'Default max lift (ft)' },
  { key: 'defaultStandardLineLengthFt', label: 'Line length the factory charge covers, when the unit does not say (ft)' },
];

/** The hint under a setting: its default, or that the rule waits for the unit's own figure. */
export function defaultHint(value: number | undefined): string {
  return value === undefined ? 'No default: taken from the unit when it says' : `Default ${value}`;
}

/** Start-up readings settings, shown in their own section of Admin → Rules. */
export const COMMISSIONING_SETTING_FIELDS: typeof SETTING_FIELDS = [
  { key: 'superheatToleranceF', label: 'Superheat margin, ± (°F)' },
  { key: 'subcoolingToleranceF', label: 'Subcooling margin, ± (°F)' },
  { key: 'evacuationTargetMicrons', label: 'Evacuation target (microns)' },
  { key: 'decayLimitMicrons', label: 'Decay test limit (microns)' },
  { key: 'decayHoldMinutes', label: 'Decay test hold (minutes)' },
];

const ALL_SETTING_FIELDS = [...SETTING_FIELDS, ...COMMISSIONING_SETTING_FIELDS];

const text = (n: number | undefined) => (n === undefined ? '' : String(n));
const num = (s: string) => (s.trim() === '' ? undefined : Number(s.replace(/,/g, '')));

export function draftOf(data: RulesSettingsResponse): RulesDraft {
  return {
    settings: Object.fromEntries(ALL_SETTING_FIELDS.map((f) => [f.key, text(data.settings[f.key])])),
    rules: data.transitionRules.map((r) => ({ ...r })),
  };
}

/** Validates the draft with the server's own schema; errors keyed by path ("settings.cfmPerTonMax"). */
export function bodyOf(draft: RulesDraft): { ok: true; body: RulesSettingsBody } | { ok: false; errors: Record<string, string> } {
  const settings: Record<string, unknown> = Object.fromEntries(ALL_SETTING_FIELDS.map((f) => [f.key, num(draft.settings[f.key] ?? '')]));
  const rules = draft.rules.map((r) => {
    const { manufacturedBefore, ...rest } = r;
    return manufacturedBefore ? { ...rest, manufacturedBefore } : rest;
  });
  const result = RulesSettingsBodySchema.safeParse({ settings, transitionRules: rules });
  if (result.success) return { ok: true, body: result.data };
  const errors: Record<string, string> = {};
  for (const issue of result.error.issues) errors[issue.path.join('.')] ??= issue.message;
  return { ok: false, errors };
}

/** Where the rebate tiers live, as the Rules screen says it: checks use the shop's one list on Pricing. */
export function rebateTiersText(count: number): string {
  const set = count === 0 ? 'none is set up yet' : `${count} ${count === 1 ? 'is' : 'are'} set up`;
  return `Checks judge each combination against the shop's rebate tiers, kept with the prices on Admin → Pricing (${set}).`;
}
