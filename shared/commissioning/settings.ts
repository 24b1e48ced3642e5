import { DEFAULT_RULE_SETTINGS } from '../rules/settings';
import type { RuleSettings } from '../rules/types';

/** The shop settings the start-up readings are judged with (all required once resolved). */
export interface CommissioningSettings {
  /** ± band in °F around the fixed-orifice target superheat. */
  superheatToleranceF: number;
  /** ± band in °F around the target subcooling. */
  subcoolingToleranceF: number;
  /** Target subcooling in °F when the outdoor unit gives none. */
  defaultTargetSubcoolingF: number;
  /** Deepest vacuum in microns the evacuation must reach. */
  evacuationTargetMicrons: number;
  /** Highest microns the decay test may rise to. */
  decayLimitMicrons: number;
  /** Decay-test hold in minutes. */
  decayHoldMinutes: number;
}

/** What callers may pass: the shop's RuleSettings or any part of CommissioningSettings; gaps take the defaults. */
export type CommissioningSettingsInput = Partial<CommissioningSettings> | Partial<RuleSettings>;

const DEFAULTS = DEFAULT_RULE_SETTINGS;

export const DEFAULT_COMMISSIONING_SETTINGS: CommissioningSettings = {
  superheatToleranceF: DEFAULTS.superheatToleranceF ?? 5,
  subcoolingToleranceF: DEFAULTS.subcoolingToleranceF ?? 3,
  defaultTargetSubcoolingF: DEFAULTS.defaultTargetSubcoolingF,
  evacuationTargetMicrons: DEFAULTS.evacuationTargetMicrons ?? 500,
  decayLimitMicrons: DEFAULTS.decayLimitMicrons ?? 1000,
  decayHoldMinutes: DEFAULTS.decayHoldMinutes ?? 10,
};

/** The commissioning settings with every gap (undefined or not a finite number) filled from the defaults. */
export function resolveCommissioningSettings(input: CommissioningSettingsInput = {}): CommissioningSettings {
  const pick = (key: keyof CommissioningSettings): number => {
    const value = (input as Partial<CommissioningSettings>)[key];
    return typeof value === 'number' && Number.isFinite(value) ? value : DEFAULT_COMMISSIONING_SETTINGS[key];
  };
  return {
    superheatToleranceF: pick('superheatToleranceF'),
    subcoolingToleranceF: pick('subcoolingToleranceF'),
    defaultTargetSubcoolingF: pick('defaultTargetSubcoolingF'),
    evacuationTargetMicrons: pick('evacuationTargetMicrons'),
    decayLimitMicrons: pick('decayLimitMicrons'),
    decayHoldMinutes: pick('decayHoldMinutes'),
  };
}
