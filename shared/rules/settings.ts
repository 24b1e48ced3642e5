import type { RuleSettings } from './types';

/**
 * Shop-tunable defaults. An admin's overrides (stored by the server) are merged over these.
 * 350–450 CFM/ton: common practice (no source) around the 400 CFM/ton design figure.
 * 10 °F subcooling when the unit gives none: common practice (no source).
 * 50 ft / 20 ft line-length and lift limits when a unit gives none: common practice (no source),
 * conservative figures typical of residential installation instructions.
 * Start-up readings: ±5 °F superheat (fixed orifice) and ±3 °F subcooling bands, a 500-micron
 * evacuation and a decay test that stays under 1,000 microns over 10 minutes: common practice (no source).
 * No default standard line length: long-line practice runs on the unit's own figure, or on one the
 * shop sets (50 ft is a common conservative choice, no source); without either it is a coverage note,
 * so a check without the new facts reads as before.
 */
export const DEFAULT_RULE_SETTINGS: RuleSettings = {
  cfmPerTonMin: 350,
  cfmPerTonMax: 450,
  defaultTargetSubcoolingF: 10,
  defaultMaxLineLengthFt: 50,
  defaultMaxLiftFt: 20,
  defaultStandardLineLengthFt: undefined,
  rebateTiers: [],
  superheatToleranceF: 5,
  subcoolingToleranceF: 3,
  evacuationTargetMicrons: 500,
  decayLimitMicrons: 1000,
  decayHoldMinutes: 10,
};

/** Merges stored overrides over the defaults, ignoring unknown keys. */
export function resolveSettings(overrides: Partial<RuleSettings> | undefined): RuleSettings {
  return { ...DEFAULT_RULE_SETTINGS, ...(overrides ?? {}) };
}
