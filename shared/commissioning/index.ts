export { evaluateReadings, ReadingInputError, CHARGING_CAUTION, A2L_CAUTION, VALVE_SUPERHEAT_MAX_F, VALVE_SUPERHEAT_MIN_F, FIXED_ORIFICE_HIGH_SUBCOOLING_F } from './evaluate';
export { evaluateEvacuation, evaluatePressureTest, temperatureDropPsi, MIN_NITROGEN_HOLD_MINUTES, GAUGE_ALLOWANCE_PSI, type EvacuationInput, type PressureTestInput, type TestVerdict } from './evacuation';
export { DEFAULT_COMMISSIONING_SETTINGS, resolveCommissioningSettings, type CommissioningSettings, type CommissioningSettingsInput } from './settings';
export { checkTargetSuperheat, targetSuperheatF, TARGET_SUPERHEAT_LIMITS, TARGET_SUPERHEAT_RELATION, type TargetSuperheatCheck } from './target-superheat';
export { wetBulbF } from '../psychrometrics/wet-bulb';
